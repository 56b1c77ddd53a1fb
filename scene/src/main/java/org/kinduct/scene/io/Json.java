package org.kinduct.scene.io;

import java.util.List;
import org.kinduct.scene.units.Texts;

/** A parsed JSON value that remembers where it starts in the text (1-based line and column). */
sealed interface Json permits Json.Obj, Json.Arr, Json.Str, Json.Num, Json.Bool, Json.Null {

    int line();

    int column();

    /** What this value is, for "got ..." messages. */
    String describe();

    /** An object; members keep their order, and repeated names are kept for the reader to report. */
    record Obj(List<Member> members, int line, int column) implements Json {
        @Override
        public String describe() {
            return "an object";
        }
    }

    /** One {@code "name": value} pair; the position is the name's. */
    record Member(String name, Json value, int line, int column) {
    }

    record Arr(List<Json> items, int line, int column) implements Json {
        @Override
        public String describe() {
            return "a list of " + items.size();
        }
    }

    record Str(String value, int line, int column) implements Json {
        @Override
        public String describe() {
            return Texts.quote(value);
        }
    }

    /** A number kept as written, so no precision is lost before the reader picks a type. */
    record Num(String text, boolean integral, int line, int column) implements Json {
        @Override
        public String describe() {
            return Texts.quote(text);
        }
    }

    record Bool(boolean value, int line, int column) implements Json {
        @Override
        public String describe() {
            return String.valueOf(value);
        }
    }

    record Null(int line, int column) implements Json {
        @Override
        public String describe() {
            return "null";
        }
    }
}

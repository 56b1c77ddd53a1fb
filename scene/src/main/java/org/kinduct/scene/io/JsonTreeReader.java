package org.kinduct.scene.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import java.io.IOException;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.regex.Pattern;
import org.kinduct.scene.units.Texts;

/**
 * Strict JSON (RFC 8259: no comments, NaN or trailing commas) to a {@link Json} tree with
 * positions, through Jackson's streaming parser.
 */
final class JsonTreeReader {

    /** Scene files nest about 7 deep; the limit keeps hostile input from exhausting the stack. */
    static final int MAX_DEPTH = 64;

    /** Jackson quotes offending tokens at length; a line of an error report should stay readable. */
    private static final int MAX_MESSAGE = 200;

    private static final Pattern SETTING_SOURCE = Pattern.compile(", from `[^`]*`");
    private static final Pattern SETTING_HINT = Pattern.compile(": enable `[^`]*` to allow");
    private static final Pattern COMMENT_HINT =
            Pattern.compile("\\(not recognized as one since Feature '\\w+' not enabled for parser\\)");

    private static final JsonFactory FACTORY = JsonFactory.builder()
            .streamReadConstraints(StreamReadConstraints.builder().maxNestingDepth(MAX_DEPTH).build())
            .build();

    private JsonTreeReader() {
    }

    /** The tree of {@code text}, or null after adding the syntax problem to {@code problems}. */
    static Json parse(String text, List<Problem> problems) {
        try (JsonParser parser = FACTORY.createParser(text)) {
            try {
                JsonToken first = parser.nextToken();
                if (first == null) {
                    problems.add(new Problem("", 1, 1, "empty input: expected a scene object { ... }"));
                    return null;
                }
                Json root = value(parser, first);
                if (parser.nextToken() != null) {
                    JsonLocation at = parser.currentTokenLocation();
                    problems.add(new Problem("", line(at), column(at), "unexpected text after the end of the scene"));
                    return null;
                }
                return root;
            } catch (JsonProcessingException e) {
                JsonLocation at = e.getLocation() != null ? e.getLocation() : parser.currentLocation();
                problems.add(new Problem(path(parser.getParsingContext(), parser.currentToken()), line(at), column(at),
                        "JSON syntax: " + Texts.printable(plain(e.getOriginalMessage()), MAX_MESSAGE)));
                return null;
            }
        } catch (IOException e) {
            // Reading from a String does no I/O; Jackson declares it for its streaming sources.
            problems.add(new Problem("", 1, 1, "cannot read the text: " + e.getMessage()));
            return null;
        }
    }

    private static Json value(JsonParser p, JsonToken token) throws IOException {
        if (token == null) {
            // Jackson reports an unclosed document itself; this guards the switch below.
            throw new JsonParseException(p, "unexpected end of input");
        }
        JsonLocation at = p.currentTokenLocation();
        int line = line(at);
        int column = column(at);
        return switch (token) {
            case START_OBJECT -> {
                List<Json.Member> members = new ArrayList<>();
                for (JsonToken t = p.nextToken(); t != JsonToken.END_OBJECT; t = p.nextToken()) {
                    JsonLocation nameAt = p.currentTokenLocation();
                    String name = p.currentName();
                    Json v = value(p, p.nextToken());
                    members.add(new Json.Member(name, v, line(nameAt), column(nameAt)));
                }
                yield new Json.Obj(List.copyOf(members), line, column);
            }
            case START_ARRAY -> {
                List<Json> items = new ArrayList<>();
                for (JsonToken t = p.nextToken(); t != JsonToken.END_ARRAY; t = p.nextToken()) {
                    items.add(value(p, t));
                }
                yield new Json.Arr(List.copyOf(items), line, column);
            }
            case VALUE_STRING -> new Json.Str(p.getText(), line, column);
            case VALUE_NUMBER_INT -> new Json.Num(p.getText(), true, line, column);
            case VALUE_NUMBER_FLOAT -> new Json.Num(p.getText(), false, line, column);
            case VALUE_TRUE -> new Json.Bool(true, line, column);
            case VALUE_FALSE -> new Json.Bool(false, line, column);
            case VALUE_NULL -> new Json.Null(line, column);
            default -> throw new JsonParseException(p, "unexpected " + token);
        };
    }

    /**
     * Where a syntax error struck, in the reader's path notation: inside the value of the last
     * field name read, or else in the container after its last complete member.
     */
    private static String path(JsonStreamContext context, JsonToken last) {
        Deque<String> parts = new ArrayDeque<>();
        for (JsonStreamContext c = context; c != null && !c.inRoot(); c = c.getParent()) {
            if (c.inArray() && c.hasCurrentIndex()) {
                parts.push("[" + c.getCurrentIndex() + "]");
            } else if (c.inObject() && c.getCurrentName() != null) {
                parts.push("." + c.getCurrentName());
            }
        }
        boolean afterCompleteMember = last != null && last != JsonToken.FIELD_NAME
                && last != JsonToken.START_OBJECT && last != JsonToken.START_ARRAY;
        if (afterCompleteMember && !parts.isEmpty()) {
            parts.removeLast();
        }
        String joined = String.join("", parts);
        return joined.startsWith(".") ? joined.substring(1) : joined;
    }

    /** Jackson's message without its hints about parser settings, which a file's author cannot change. */
    private static String plain(String message) {
        String m = String.valueOf(message);
        m = SETTING_SOURCE.matcher(m).replaceAll("");
        m = SETTING_HINT.matcher(m).replaceAll("");
        return COMMENT_HINT.matcher(m).replaceAll("(JSON has no comments)");
    }

    private static int line(JsonLocation at) {
        return Math.max(1, at.getLineNr());
    }

    private static int column(JsonLocation at) {
        return Math.max(1, at.getColumnNr());
    }
}

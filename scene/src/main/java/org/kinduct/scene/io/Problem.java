package org.kinduct.scene.io;

import java.io.Serializable;
import org.kinduct.scene.Checks;

/**
 * One thing wrong with a scene file.
 *
 * @param path JSON path of the offending value, e.g. {@code conductors[2].vertices[3]}; empty for
 *        the document as a whole
 * @param line 1-based line of the offending value (of the enclosing object for a missing field)
 * @param column 1-based column, counted in characters
 * @param message what is wrong and, where it helps, what was expected
 */
public record Problem(String path, int line, int column, String message) implements Serializable {

    public Problem {
        Checks.nonNull(path, "path");
        Checks.nonNull(message, "message");
        if (line < 1 || column < 1) {
            throw new IllegalArgumentException("line and column are 1-based, got " + line + ":" + column);
        }
    }

    /** {@code source:line:col: path: message}, the form compilers use, so editors can jump to it. */
    public String describe(String sourceName) {
        return sourceName + ":" + line + ":" + column + ": " + (path.isEmpty() ? "" : path + ": ") + message;
    }
}

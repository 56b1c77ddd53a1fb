package org.kinduct.scene.io;

/**
 * A field-map file that cannot be read as one, with the file, line and column of the first
 * problem (a ragged or broken grid would otherwise repeat one problem on every line).
 */
public class FieldMapFormatException extends Exception {

    private static final long serialVersionUID = 1L;

    private final String file;
    private final int line;
    private final int column;

    /**
     * @param line 1-based line, 0 when the problem concerns the file as a whole
     * @param column 1-based column in characters, 0 for a whole line or file
     */
    public FieldMapFormatException(String file, int line, int column, String detail) {
        super(file + (line > 0 ? ":" + line + (column > 0 ? ":" + column : "") : "") + ": " + detail);
        this.file = file;
        this.line = line;
        this.column = column;
    }

    public String file() {
        return file;
    }

    public int line() {
        return line;
    }

    public int column() {
        return column;
    }
}

package org.kinduct.scene.io;

import com.fasterxml.jackson.core.io.NumberInput;
import java.io.IOException;
import java.io.Reader;

/**
 * Reads comma-separated numbers field by field without building a string per line, so that a
 * map of millions of samples loads in well under a second and a file without line breaks cannot
 * exhaust memory: a field longer than {@link #MAX_FIELD} characters is an error. Blank lines and
 * lines starting with {@code #} are skipped; spaces around fields are ignored; lines end at
 * {@code \n}, {@code \r\n} or {@code \r}. Quoting is not supported: the files hold numbers and
 * plain column names.
 */
final class CsvScanner {

    /** Longest field accepted; the longest decimal a double ever needs is 24 characters. */
    static final int MAX_FIELD = 64;

    private static final int EOF = -1;

    private final Reader in;
    private final String file;
    private final char[] buffer = new char[1 << 16];
    private int position;
    private int limit;
    private final char[] field = new char[MAX_FIELD];
    private int fieldLength;
    private int line = 1;
    private long lineStart;
    private long consumed;
    private int fieldLine;
    private int fieldColumn;
    private boolean inRecord;
    private boolean recordEnded;

    CsvScanner(Reader in, String file) {
        this.in = in;
        this.file = file;
    }

    /** Moves to the next line that holds data; false at the end of the file. */
    boolean nextRecord() throws IOException, FieldMapFormatException {
        if (inRecord && !recordEnded) {
            skipLine();
        }
        inRecord = false;
        while (true) {
            skipSpaces();
            int c = peek();
            if (c == EOF) {
                return false;
            }
            if (c == '\n' || c == '\r') {
                endLine();
            } else if (c == '#' || (c == '\uFEFF' && line == 1)) {
                if (c == '#') {
                    skipLine();
                } else {
                    read();
                }
            } else {
                inRecord = true;
                recordEnded = false;
                return true;
            }
        }
    }

    /** Reads the next field of the current line; false at the end of the line. */
    boolean nextField() throws IOException, FieldMapFormatException {
        if (!inRecord || recordEnded) {
            return false;
        }
        skipSpaces();
        fieldLine = line;
        fieldColumn = (int) (here() - lineStart) + 1;
        fieldLength = 0;
        int trimmed = 0;
        while (true) {
            int c = peek();
            if (c == EOF || c == '\n' || c == '\r') {
                recordEnded = true;
                break;
            }
            read();
            if (c == ',') {
                break;
            }
            if (fieldLength == MAX_FIELD) {
                throw error(fieldLine, fieldColumn, "value longer than " + MAX_FIELD + " characters");
            }
            field[fieldLength++] = (char) c;
            if (c != ' ' && c != '\t') {
                trimmed = fieldLength;
            }
        }
        fieldLength = trimmed;
        return true;
    }

    /** The current field's text. */
    String text() {
        return new String(field, 0, fieldLength);
    }

    /** True when the current field's text is exactly {@code text}. */
    boolean textEquals(String text) {
        if (text.length() != fieldLength) {
            return false;
        }
        for (int i = 0; i < fieldLength; i++) {
            if (field[i] != text.charAt(i)) {
                return false;
            }
        }
        return true;
    }

    /** The current field as a finite number; an empty, non-numeric, NaN or infinite field is an error. */
    double number(String what) throws FieldMapFormatException {
        if (fieldLength == 0) {
            throw error(fieldLine, fieldColumn, "missing " + what);
        }
        double v;
        try {
            // Jackson's fast_float port, correctly rounded: most of a large map's load time was Double.parseDouble.
            v = NumberInput.parseDouble(text(), true);
        } catch (NumberFormatException e) {
            throw error(fieldLine, fieldColumn, what + " '" + text() + "' is not a number");
        }
        if (!Double.isFinite(v)) {
            throw error(fieldLine, fieldColumn, what + " is " + text() + "; every sample must be a finite number");
        }
        return v;
    }

    /** Line of the current field (1-based). */
    int line() {
        return fieldLine;
    }

    /** Column of the current field's first character (1-based). */
    int column() {
        return fieldColumn;
    }

    /** Characters consumed so far. */
    private long here() {
        return consumed + position;
    }

    FieldMapFormatException error(int atLine, int atColumn, String detail) {
        return new FieldMapFormatException(file, atLine, atColumn, detail);
    }

    /** An error at the current field. */
    FieldMapFormatException error(String detail) {
        return error(fieldLine, fieldColumn, detail);
    }

    private void skipSpaces() throws IOException {
        int c = peek();
        while (c == ' ' || c == '\t') {
            read();
            c = peek();
        }
    }

    private void skipLine() throws IOException {
        int c = peek();
        while (c != EOF && c != '\n' && c != '\r') {
            read();
            c = peek();
        }
        recordEnded = true;
    }

    /** Consumes one line break at the current position. */
    private void endLine() throws IOException {
        if (read() == '\r' && peek() == '\n') {
            read();
        }
        line++;
        lineStart = here();
    }

    private int peek() throws IOException {
        if (position == limit && !fill()) {
            return EOF;
        }
        return buffer[position];
    }

    private int read() throws IOException {
        int c = peek();
        if (c != EOF) {
            position++;
        }
        return c;
    }

    private boolean fill() throws IOException {
        consumed += limit;
        position = 0;
        limit = Math.max(0, in.read(buffer));
        return limit > 0;
    }
}

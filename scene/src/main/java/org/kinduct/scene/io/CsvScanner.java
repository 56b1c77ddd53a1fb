package org.kinduct.scene.io;

import com.fasterxml.jackson.core.io.NumberInput;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;

/**
 * Reads comma-separated numbers field by field from UTF-8 bytes, without decoding the file to
 * characters or building a string per line or per number, so that a map of millions of samples
 * loads in well under a second and a file without line breaks cannot exhaust memory: a field
 * longer than {@link #MAX_FIELD} bytes is an error. Separators, spaces and line breaks are ASCII,
 * so they are found in the bytes; a field's text is decoded (strictly) only when asked for, and
 * comment lines are skipped undecoded. Blank lines and lines starting with {@code #} are skipped;
 * spaces around fields are ignored; lines end at {@code \n}, {@code \r\n} or {@code \r}. Quoting
 * is not supported: the files hold numbers and plain column names. Columns count characters, not
 * bytes.
 */
final class CsvScanner {

    /** Longest field accepted, in bytes; the longest decimal a double ever needs is 24 characters. */
    static final int MAX_FIELD = 64;

    private static final int EOF = -1;
    /** The byte-order mark U+FEFF in UTF-8. */
    private static final byte[] BOM = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};

    private final InputStream in;
    private final String file;
    private final byte[] buffer = new byte[1 << 16];
    private int position;
    private int limit;
    private final byte[] field = new byte[MAX_FIELD];
    /** The current field as characters, for the number parser (numbers are ASCII). */
    private final char[] chars = new char[MAX_FIELD];
    private int fieldLength;
    private int line = 1;
    private long lineStart;
    /** UTF-8 continuation bytes on the current line so far: bytes that start no character. */
    private int lineContinuations;
    private long consumed;
    private int fieldLine;
    private int fieldColumn;
    private boolean inRecord;
    private boolean recordEnded;
    private boolean started;

    CsvScanner(InputStream in, String file) {
        this.in = in;
        this.file = file;
    }

    /** Moves to the next line that holds data; false at the end of the file. */
    boolean nextRecord() throws IOException {
        if (!started) {
            skipByteOrderMark();
        }
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
            } else if (c == '#') {
                skipLine();
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
        fieldColumn = (int) (here() - lineStart) - lineContinuations + 1;
        int length = 0;
        while (true) {
            // Find the field's end in the buffer first, then copy it at once: the loop is the load's hot spot.
            int p = position;
            while (p < limit) {
                byte c = buffer[p];
                if (c == ',' || c == '\n' || c == '\r') {
                    break;
                }
                p++;
            }
            int n = p - position;
            if (length + n > MAX_FIELD) {
                throw error(fieldLine, fieldColumn, "value longer than " + MAX_FIELD + " bytes");
            }
            System.arraycopy(buffer, position, field, length, n);
            length += n;
            position = p;
            if (p < limit) {
                if (buffer[p] == ',') {
                    position++;
                } else {
                    recordEnded = true;
                }
                break;
            }
            if (!fill()) {
                recordEnded = true;
                break;
            }
        }
        for (int i = 0; i < length; i++) {
            if ((field[i] & 0xC0) == 0x80) {
                lineContinuations++;
            }
        }
        while (length > 0 && (field[length - 1] == ' ' || field[length - 1] == '\t')) {
            length--;
        }
        fieldLength = length;
        return true;
    }

    /** The current field's text; bytes that are not UTF-8 are an error at the field. */
    String text() throws FieldMapFormatException {
        try {
            return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(field, 0, fieldLength))
                    .toString();
        } catch (CharacterCodingException e) {
            throw error(fieldLine, fieldColumn, "the text here is not UTF-8; save the file as UTF-8");
        }
    }

    /** The current field's bytes. */
    byte[] bytes() {
        return Arrays.copyOf(field, fieldLength);
    }

    /** True when the current field's bytes are exactly {@code bytes}. */
    boolean sameBytes(byte[] bytes) {
        return Arrays.equals(field, 0, fieldLength, bytes, 0, bytes.length);
    }

    /** The current field as a finite number; an empty, non-numeric, NaN or infinite field is an error. */
    double number(String what) throws FieldMapFormatException {
        if (fieldLength == 0) {
            throw error(fieldLine, fieldColumn, "missing " + what);
        }
        for (int i = 0; i < fieldLength; i++) {
            byte b = field[i];
            if (b < 0) {
                throw error(fieldLine, fieldColumn, what + " '" + text() + "' is not a number");
            }
            chars[i] = (char) b;
        }
        double v;
        try {
            // Jackson's fast_float port, correctly rounded: most of a large map's load time was Double.parseDouble.
            v = NumberInput.parseDouble(chars, 0, fieldLength, true);
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

    /** Bytes consumed so far. */
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

    /** A byte-order mark at the very start is not part of the first field, nor of its column. */
    private void skipByteOrderMark() throws IOException {
        started = true;
        for (byte b : BOM) {
            if (peek() != (b & 0xFF)) {
                return;
            }
            read();
        }
        lineStart = here();
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
        lineContinuations = 0;
    }

    private int peek() throws IOException {
        if (position == limit && !fill()) {
            return EOF;
        }
        return buffer[position] & 0xFF;
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

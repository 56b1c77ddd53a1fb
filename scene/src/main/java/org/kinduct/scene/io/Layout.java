package org.kinduct.scene.io;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.PrettyPrinter;
import java.io.IOException;
import java.util.ArrayDeque;
import java.util.Deque;

/**
 * Pretty printing for scene files: two-space indents, {@code "name": value}, one member or list
 * item per line, except that small containers the writer marks (points, sizes, vertices riding
 * another body) stay on one line: {@code [0.01, -0.002]}. Stateful: one instance per document.
 */
final class Layout implements PrettyPrinter {

    private static final String INDENT = "  ";

    /** For each open container: is it on one line? */
    private final Deque<Boolean> inline = new ArrayDeque<>();
    private boolean inlineNext;
    private int depth;

    /** Keeps the next object or array on one line, with everything inside it. */
    void inlineNext() {
        inlineNext = true;
    }

    @Override
    public void writeRootValueSeparator(JsonGenerator g) throws IOException {
        g.writeRaw('\n');
    }

    @Override
    public void writeStartObject(JsonGenerator g) throws IOException {
        open(g, '{');
    }

    @Override
    public void beforeObjectEntries(JsonGenerator g) throws IOException {
        first(g);
    }

    @Override
    public void writeObjectFieldValueSeparator(JsonGenerator g) throws IOException {
        g.writeRaw(": ");
    }

    @Override
    public void writeObjectEntrySeparator(JsonGenerator g) throws IOException {
        next(g);
    }

    @Override
    public void writeEndObject(JsonGenerator g, int nrOfEntries) throws IOException {
        close(g, '}', nrOfEntries);
    }

    @Override
    public void writeStartArray(JsonGenerator g) throws IOException {
        open(g, '[');
    }

    @Override
    public void beforeArrayValues(JsonGenerator g) throws IOException {
        first(g);
    }

    @Override
    public void writeArrayValueSeparator(JsonGenerator g) throws IOException {
        next(g);
    }

    @Override
    public void writeEndArray(JsonGenerator g, int nrOfValues) throws IOException {
        close(g, ']', nrOfValues);
    }

    private void open(JsonGenerator g, char bracket) throws IOException {
        boolean one = inlineNext || Boolean.TRUE.equals(inline.peek());
        inlineNext = false;
        inline.push(one);
        if (!one) {
            depth++;
        }
        g.writeRaw(bracket);
    }

    private void first(JsonGenerator g) throws IOException {
        if (!inline.getFirst()) {
            newLine(g);
        }
    }

    private void next(JsonGenerator g) throws IOException {
        if (inline.getFirst()) {
            g.writeRaw(", ");
        } else {
            g.writeRaw(',');
            newLine(g);
        }
    }

    private void close(JsonGenerator g, char bracket, int count) throws IOException {
        if (!inline.pop()) {
            depth--;
            if (count > 0) {
                newLine(g);
            }
        }
        g.writeRaw(bracket);
    }

    private void newLine(JsonGenerator g) throws IOException {
        g.writeRaw('\n');
        for (int i = 0; i < depth; i++) {
            g.writeRaw(INDENT);
        }
    }
}

package org.kinduct.scene.io;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.PrettyPrinter;
import java.io.IOException;
import java.util.ArrayDeque;
import java.util.Deque;

/**
 * Pretty printing for scene files: two-space indents, {@code "name": value}, one member or list
 * item per line, except that short arrays the writer marks (points, sizes) stay on one line:
 * {@code [0.01, -0.002]}. Stateful: one instance per document.
 */
final class Layout implements PrettyPrinter {

    private static final String INDENT = "  ";

    private final Deque<Boolean> inlineArrays = new ArrayDeque<>();
    private boolean inlineNext;
    private int depth;

    /** Keeps the next array on one line (and everything inside it). */
    void inlineNextArray() {
        inlineNext = true;
    }

    @Override
    public void writeRootValueSeparator(JsonGenerator g) throws IOException {
        g.writeRaw('\n');
    }

    @Override
    public void writeStartObject(JsonGenerator g) throws IOException {
        g.writeRaw('{');
        depth++;
    }

    @Override
    public void beforeObjectEntries(JsonGenerator g) throws IOException {
        newLine(g);
    }

    @Override
    public void writeObjectFieldValueSeparator(JsonGenerator g) throws IOException {
        g.writeRaw(": ");
    }

    @Override
    public void writeObjectEntrySeparator(JsonGenerator g) throws IOException {
        g.writeRaw(',');
        newLine(g);
    }

    @Override
    public void writeEndObject(JsonGenerator g, int nrOfEntries) throws IOException {
        depth--;
        if (nrOfEntries > 0) {
            newLine(g);
        }
        g.writeRaw('}');
    }

    @Override
    public void writeStartArray(JsonGenerator g) throws IOException {
        boolean inline = inlineNext || Boolean.TRUE.equals(inlineArrays.peek());
        inlineNext = false;
        inlineArrays.push(inline);
        if (!inline) {
            depth++;
        }
        g.writeRaw('[');
    }

    @Override
    public void beforeArrayValues(JsonGenerator g) throws IOException {
        if (!inlineArrays.getFirst()) {
            newLine(g);
        }
    }

    @Override
    public void writeArrayValueSeparator(JsonGenerator g) throws IOException {
        if (inlineArrays.getFirst()) {
            g.writeRaw(", ");
        } else {
            g.writeRaw(',');
            newLine(g);
        }
    }

    @Override
    public void writeEndArray(JsonGenerator g, int nrOfValues) throws IOException {
        if (!inlineArrays.pop()) {
            depth--;
            if (nrOfValues > 0) {
                newLine(g);
            }
        }
        g.writeRaw(']');
    }

    private void newLine(JsonGenerator g) throws IOException {
        g.writeRaw('\n');
        for (int i = 0; i < depth; i++) {
            g.writeRaw(INDENT);
        }
    }
}

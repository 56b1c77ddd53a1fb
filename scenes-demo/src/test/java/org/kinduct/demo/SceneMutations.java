package org.kinduct.demo;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Edits of a valid scene text that keep it JSON and mostly keep it a scene, so that a fuzzer
 * reaches the solver rather than stopping at the parser: numbers replaced by extremes, zeros,
 * neighbours' values, shifted or scaled; points of a list repeated, dropped or swapped; times made
 * huge or tiny; unit strings with long numbers. Each edit works on the positions of the text's
 * number tokens and point lists, found with Jackson's streaming parser.
 */
final class SceneMutations {

    private static final JsonFactory JSON = new JsonFactory();

    /** Values that break physics or numerics when they land in the wrong field. */
    private static final String[] EXTREMES = {
        "0", "-0.0", "1e-300", "-1e-300", "1e-12", "1e12", "1e100", "-1e100", "1e16", "1e300", "-273.15",
        "-274", "4.9e-324", "1e-9", "1e5", "2147483647", "0.5", "-1",
    };

    /** A number token or a point [x, y], with its place in the text and its JSON path. */
    private record Token(int start, int end, String path, String text) {
    }

    private SceneMutations() {
    }

    /** {@code text} after one to three random edits. */
    static String mutate(SplittableRandom r, String text) {
        String s = text;
        for (int edits = 1 + r.nextInt(3); edits > 0; edits--) {
            s = edit(r, s);
        }
        return s;
    }

    private static String edit(SplittableRandom r, String text) {
        List<Token> numbers = new ArrayList<>();
        List<Token> points = new ArrayList<>();
        scan(text, numbers, points);
        if (numbers.isEmpty()) {
            return text;
        }
        Token n = numbers.get(r.nextInt(numbers.size()));
        switch (r.nextInt(10)) {
            case 0:
            case 1:
                return replace(text, n, EXTREMES[r.nextInt(EXTREMES.length)]);
            case 2:
                return replace(text, n, numbers.get(r.nextInt(numbers.size())).text());
            case 3:
                return replace(text, n, json(Double.parseDouble(n.text()) * Math.pow(10, r.nextInt(-12, 13))));
            case 4:
                return replace(text, n, json(-Double.parseDouble(n.text())));
            case 5:
                return shiftAll(text, numbers, Math.pow(10, r.nextInt(1, 7)) * (r.nextBoolean() ? 1 : -1));
            case 6:
                return replace(text, n, "\"" + longNumber(r) + "\"");
            default:
                return points.isEmpty() ? text : editPoints(r, text, points);
        }
    }

    /** Repeats, drops, or swaps points of one list, or moves one point far away. */
    private static String editPoints(SplittableRandom r, String text, List<Token> points) {
        Token p = points.get(r.nextInt(points.size()));
        switch (r.nextInt(4)) {
            case 0:
                return text.substring(0, p.end()) + ", " + p.text() + text.substring(p.end());
            case 1: {
                Token q = sameList(r, points, p);
                if (q == p) {
                    return text;
                }
                Token first = p.start() < q.start() ? p : q;
                Token second = first == p ? q : p;
                return text.substring(0, first.start()) + second.text() + text.substring(first.end(), second.start())
                        + first.text() + text.substring(second.end());
            }
            case 2: {
                Token q = sameList(r, points, p);
                return text.substring(0, p.start()) + q.text() + text.substring(p.end());
            }
            default:
                double far = Math.pow(10, r.nextInt(-3, 6));
                return text.substring(0, p.start()) + "[" + far + ", " + (-far) + "]" + text.substring(p.end());
        }
    }

    /** A point of the same list as {@code p} (p itself if it is alone). */
    private static Token sameList(SplittableRandom r, List<Token> points, Token p) {
        String list = p.path().substring(0, p.path().lastIndexOf('['));
        List<Token> siblings = points.stream().filter(q -> q.path().startsWith(list + "[")
                && q.path().lastIndexOf('[') == p.path().lastIndexOf('[')).toList();
        return siblings.get(r.nextInt(siblings.size()));
    }

    /** Adds {@code offset} to every coordinate of every point: the scene moved far from the origin. */
    private static String shiftAll(String text, List<Token> numbers, double offset) {
        StringBuilder s = new StringBuilder(text);
        for (int i = numbers.size() - 1; i >= 0; i--) {
            Token n = numbers.get(i);
            if (n.path().matches(".*(vertices|outline|polygon|center|pivot|anchor|at)(\\[\\d+\\])*\\[[01]\\]$")) {
                s.replace(n.start(), n.end(), json(Double.parseDouble(n.text()) + offset));
            }
        }
        return s.toString();
    }

    /** A unit string whose number has many digits. */
    private static String longNumber(SplittableRandom r) {
        StringBuilder s = new StringBuilder("1");
        for (int i = r.nextInt(10, 5000); i > 0; i--) {
            s.append((char) ('0' + r.nextInt(10)));
        }
        return s.append(r.nextBoolean() ? " mm" : "e-3 s").toString();
    }

    /** {@code v} as a JSON number; out of range values stay JSON ("1e400"), which the reader refuses. */
    private static String json(double v) {
        return Double.isFinite(v) ? Double.toString(v) : (v > 0 ? "1e400" : "-1e400");
    }

    private static String replace(String text, Token t, String with) {
        return text.substring(0, t.start()) + with + text.substring(t.end());
    }

    /** The number tokens and the points [x, y] of {@code text}, in order. */
    private static void scan(String text, List<Token> numbers, List<Token> points) {
        try (JsonParser p = JSON.createParser(text)) {
            List<Integer> openArrays = new ArrayList<>();
            for (JsonToken t = p.nextToken(); t != null; t = p.nextToken()) {
                int at = (int) p.currentTokenLocation().getCharOffset();
                if (t == JsonToken.VALUE_NUMBER_INT || t == JsonToken.VALUE_NUMBER_FLOAT) {
                    numbers.add(new Token(at, at + p.getText().length(), path(p.getParsingContext()), p.getText()));
                } else if (t == JsonToken.START_ARRAY) {
                    openArrays.add(at);
                } else if (t == JsonToken.END_ARRAY) {
                    int start = openArrays.remove(openArrays.size() - 1);
                    String body = text.substring(start, at + 1);
                    String path = path(p.getParsingContext());
                    if (path.endsWith("]") && body.matches("\\[\\s*-?[0-9.eE+-]+,\\s*-?[0-9.eE+-]+\\s*\\]")) {
                        points.add(new Token(start, at + 1, path, body));
                    }
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String path(JsonStreamContext c) {
        StringBuilder s = new StringBuilder();
        for (; c != null && !c.inRoot(); c = c.getParent()) {
            s.insert(0, c.inArray() ? "[" + c.getCurrentIndex() + "]" : "." + c.getCurrentName());
        }
        return s.toString();
    }
}

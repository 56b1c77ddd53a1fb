package org.kinduct.study;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import org.kinduct.scene.path.SceneValue;
import org.kinduct.scene.path.SceneValues;

/**
 * One varied value of a study and the values it takes, from {@code PATH=SPEC}:
 * <ul>
 *   <li>{@code FROM..TO:N}: N values evenly spaced from FROM to TO, both included;</li>
 *   <li>{@code FROM..TO:N:log}: N values evenly spaced in the logarithm (FROM and TO of one sign);</li>
 *   <li>{@code V1,V2,…}: the values listed.</li>
 * </ul>
 * Values take units of the path's dimension ({@code '0.5 mm..3 mm:11'}); a bare number is SI.
 * A bare number beside values with units is refused (except 0), since {@code 1..3 mm} would
 * otherwise run from one metre.
 *
 * @param log true when the values are evenly spaced in their logarithm (plots use a log axis)
 */
public record Axis(SceneValue value, List<Double> values, boolean log) {

    /** Most values one axis may list. */
    public static final int MAX_VALUES = Design.MAX_POINTS;

    private static final Pattern BARE = Pattern.compile("\\s*[+\\-\u2212]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?\\s*");
    private static final Pattern RANGE = Pattern.compile("(.+?)\\.\\.(.+?):\\s*(\\d+)\\s*(:\\s*(\\w+)\\s*)?");

    public Axis {
        values = List.copyOf(values);
        if (values.isEmpty()) {
            throw new IllegalArgumentException(value.path() + ": no values");
        }
    }

    public String path() {
        return value.path();
    }

    /**
     * Reads {@code PATH=SPEC} against the scene's values.
     *
     * @throws IllegalArgumentException naming what is wrong and where
     */
    public static Axis parse(String text, SceneValues scene) {
        int eq = text.indexOf('=');
        if (eq < 0) {
            throw new IllegalArgumentException("'" + text + "': expected PATH=FROM..TO:N, PATH=FROM..TO:N:log or"
                    + " PATH=V1,V2,…");
        }
        SceneValue value = scene.find(text.substring(0, eq).strip());
        String spec = text.substring(eq + 1).strip();
        java.util.regex.Matcher range = RANGE.matcher(spec);
        Axis axis = range.matches() ? range(value, spec, range) : list(value, spec);
        if (value.whole()) {
            for (double v : axis.values) {
                if (v != Math.rint(v)) {
                    throw new IllegalArgumentException(value.path() + "=" + spec + ": " + value.path()
                            + " takes whole numbers, and this gives " + v + "; choose a count that steps by whole numbers");
                }
            }
        }
        return axis;
    }

    private static Axis range(SceneValue value, String spec, java.util.regex.Matcher m) {
        String where = value.path() + "=" + spec + ": ";
        long count;
        try {
            count = Long.parseLong(m.group(3));
        } catch (NumberFormatException e) {
            count = Long.MAX_VALUE;
        }
        if (count < 2 || count > MAX_VALUES) {
            throw new IllegalArgumentException(where + "a range takes 2 to " + MAX_VALUES + " values, got " + m.group(3));
        }
        boolean log = m.group(5) != null;
        if (log && !m.group(5).equals("log")) {
            throw new IllegalArgumentException(where + "unknown spacing '" + m.group(5) + "'; the only option is 'log'");
        }
        List<String> ends = List.of(m.group(1), m.group(2));
        double[] ab = read(value, ends, where);
        double a = ab[0];
        double b = ab[1];
        if (log && !(a * b > 0)) {
            throw new IllegalArgumentException(where + "log spacing needs both ends non-zero and of one sign");
        }
        int n = (int) count;
        List<Double> values = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            double f = (double) i / (n - 1);
            double v = log ? Math.signum(a) * Math.exp(Math.log(Math.abs(a)) + (Math.log(Math.abs(b)) - Math.log(Math.abs(a))) * f)
                    : a + (b - a) * f;
            values.add(i == 0 ? a : i == n - 1 ? b : v);
        }
        return new Axis(value, values, log);
    }

    private static Axis list(SceneValue value, String spec) {
        String where = value.path() + "=" + spec + ": ";
        if (spec.contains("..")) {
            throw new IllegalArgumentException(where + "a range needs a count: FROM..TO:N");
        }
        List<String> items = List.of(spec.split(",", -1));
        if (items.size() > MAX_VALUES) {
            throw new IllegalArgumentException(where + "more than " + MAX_VALUES + " values");
        }
        List<Double> values = new ArrayList<>();
        for (double v : read(value, items, where)) {
            values.add(v);
        }
        return new Axis(value, values, false);
    }

    private static double[] read(SceneValue value, List<String> items, String where) {
        boolean anyUnit = false;
        boolean bareNonZero = false;
        double[] out = new double[items.size()];
        for (int i = 0; i < out.length; i++) {
            String item = items.get(i);
            if (item.isBlank()) {
                throw new IllegalArgumentException(where + "empty value");
            }
            try {
                out[i] = value.parse(item);
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException(where + e.getMessage(), e);
            }
            boolean bare = BARE.matcher(item).matches();
            anyUnit |= !bare;
            bareNonZero |= bare && out[i] != 0;
        }
        if (anyUnit && bareNonZero && !value.whole()) {
            throw new IllegalArgumentException(where + "give every value a unit (or none): a bare number is in SI units,"
                    + " so '1..3 mm' would run from 1 m");
        }
        return out;
    }
}

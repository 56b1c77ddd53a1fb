package org.kinduct.scene;

/** The validation rules the records share; messages name the rule and the value. */
public final class Checks {

    private static final java.util.regex.Pattern ID = java.util.regex.Pattern.compile("[A-Za-z0-9_.\\-]{1,64}");

    private Checks() {
    }

    public static <T> T nonNull(T value, String what) {
        if (value == null) {
            throw new IllegalArgumentException(what + " is required");
        }
        return value;
    }

    public static double finite(double v, String what) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be a finite number, got " + v);
        }
        return v;
    }

    public static double positive(double v, String what) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be positive, got " + v);
        }
        return v;
    }

    public static double nonNegative(double v, String what) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be zero or positive, got " + v);
        }
        return v;
    }

    public static String id(String id, String what) {
        if (id == null || !ID.matcher(id).matches()) {
            throw new IllegalArgumentException(what + " id must be 1-64 letters, digits, '_', '-' or '.', got "
                    + (id == null ? "nothing" : "'" + id + "'"));
        }
        return id;
    }
}

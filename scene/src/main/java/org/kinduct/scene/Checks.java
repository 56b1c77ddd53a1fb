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

    /**
     * Smallest length a size may have (a magnet's side, a radius, a wire's diameter, a coil's
     * distance from the plane), metres: below it 1/size and size² overflow or underflow in the
     * solver, and no part of the plan-view model means anything.
     */
    public static final double SMALLEST_SIZE_M = 1e-9;

    /** A length that must be positive: at least {@link #SMALLEST_SIZE_M}. */
    public static double size(double v, String what) {
        if (!(v >= SMALLEST_SIZE_M) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be at least 1 nm, got " + v + " m");
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

package org.kinduct.ui.paint;

import java.util.Locale;

/** Short, unit-carrying text for the values the painter and the panels show. */
public final class Quantities {

    private static final String[] PREFIXES = {"p", "n", "µ", "m", "", "k", "M", "G"};

    private Quantities() {
    }

    public static String length(double m) {
        return eng(m, "m");
    }

    public static String bz(double t) {
        return eng(t, "T");
    }

    public static String voltage(double v) {
        return eng(v, "V");
    }

    public static String current(double a) {
        return eng(a, "A");
    }

    public static String flux(double wb) {
        return eng(wb, "Wb");
    }

    public static String force(double n) {
        return eng(n, "N");
    }

    public static String time(double s) {
        return eng(s, "s");
    }

    public static String resistance(double ohm) {
        return eng(ohm, "Ω");
    }

    /** Three significant digits with an SI prefix, e.g. 0.01234 V → "12.3 mV". */
    public static String eng(double value, String unit) {
        if (Double.isNaN(value)) {
            return "—";
        }
        if (value == 0 || Double.isInfinite(value)) {
            return (value == 0 ? "0" : Double.toString(value)) + " " + unit;
        }
        int exp3 = (int) Math.floor(Math.log10(Math.abs(value)) / 3);
        exp3 = Math.max(-4, Math.min(3, exp3));
        double scaled = value / Math.pow(1000, exp3);
        double mag = Math.abs(scaled);
        String digits = mag >= 100 ? String.format(Locale.ROOT, "%.0f", scaled)
                : mag >= 10 ? String.format(Locale.ROOT, "%.1f", scaled)
                : String.format(Locale.ROOT, "%.2f", scaled);
        return digits + " " + PREFIXES[exp3 + 4] + unit;
    }
}

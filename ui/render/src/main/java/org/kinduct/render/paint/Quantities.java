package org.kinduct.render.paint;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;

/** Short, unit-carrying text for the values the painter and the panels show ({@link Units} formatting). */
public final class Quantities {

    /**
     * Texts already made, by dimension and value: axis, legend and contour values recur frame after
     * frame, and exact decimal rounding costs tens of microseconds a value. Emptied when full.
     */
    private static final Map<Key, String> MADE = new ConcurrentHashMap<>();
    private static final int MADE_LIMIT = 4096;

    private record Key(Dimension dimension, double value) {
    }

    private Quantities() {
    }

    public static String length(double m) {
        return show(m, Dimension.LENGTH);
    }

    public static String bz(double t) {
        return show(t, Dimension.FLUX_DENSITY);
    }

    public static String voltage(double v) {
        return show(v, Dimension.VOLTAGE);
    }

    public static String current(double a) {
        return show(a, Dimension.CURRENT);
    }

    public static String flux(double wb) {
        return show(wb, Dimension.FLUX);
    }

    public static String force(double n) {
        return show(n, Dimension.FORCE);
    }

    public static String torque(double nm) {
        return show(nm, Dimension.TORQUE);
    }

    public static String power(double w) {
        return show(w, Dimension.POWER);
    }

    public static String currentDensity(double aPerM2) {
        return show(aPerM2, Dimension.CURRENT_DENSITY);
    }

    public static String velocity(double mps) {
        return show(mps, Dimension.VELOCITY);
    }

    public static String time(double s) {
        return show(s, Dimension.TIME);
    }

    /** "—" for a value that does not apply (NaN), else the formatted value. */
    private static String show(double v, Dimension d) {
        if (Double.isNaN(v)) {
            return "—";
        }
        Key key = new Key(d, v);
        String text = MADE.get(key);
        if (text == null) {
            text = Units.format(v, d);
            if (MADE.size() >= MADE_LIMIT) {
                MADE.clear();
            }
            MADE.put(key, text);
        }
        return text;
    }
}

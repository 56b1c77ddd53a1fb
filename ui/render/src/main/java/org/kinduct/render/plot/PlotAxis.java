package org.kinduct.render.plot;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.kinduct.render.view.NiceSteps;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Unit;

/**
 * One axis of a plot: a quantity named {@code name} in the SI unit {@code siUnit}, shown over
 * [min, max] on a linear or logarithmic scale, its ticks in the display unit that suits the
 * largest value ("mm" for stand-offs of a few millimetres).
 */
public final class PlotAxis {

    private final String name;
    private final boolean log;
    private final double min;
    private final double max;
    private final Unit shown;
    private final String unitText;

    /**
     * @param siUnit the SI unit symbol of the values ("m", "V"; "" for plain numbers); a unit of
     *        no known dimension (a ratio such as "V/(m/s)") is shown as it is, in SI
     */
    public PlotAxis(String name, String siUnit, boolean log, double min, double max) {
        if (!(max >= min) || !Double.isFinite(min) || !Double.isFinite(max)) {
            throw new IllegalArgumentException(name + ": no finite values to plot");
        }
        if (log && !(min > 0)) {
            throw new IllegalArgumentException(name + ": a log axis needs positive values");
        }
        this.name = name;
        this.log = log;
        double pad = max == min ? Math.max(Math.abs(max) * 0.05, 1e-300) : 0;
        this.min = log && pad > 0 ? min / 1.1 : min - pad;
        this.max = log && pad > 0 ? max * 1.1 : max + pad;
        Dimension d = dimensionOf(siUnit);
        this.shown = d == null ? null : displayUnit(d, Math.max(Math.abs(this.min), Math.abs(this.max)));
        this.unitText = shown == null ? siUnit : shown.symbol();
    }

    /** Axis label: "magnet-1.standoff (mm)". */
    public String label() {
        return unitText.isEmpty() ? name : name + " (" + unitText + ")";
    }

    /** Position of {@code v} along the axis, 0 at min and 1 at max. */
    public double fraction(double v) {
        return log ? Math.log(v / min) / Math.log(max / min) : (v - min) / (max - min);
    }

    public boolean log() {
        return log;
    }

    /** Tick values (SI) inside [min, max]: round steps, or on a log axis 1, 2, 5 × 10ⁿ (decades alone when many). */
    public List<Double> ticks() {
        List<Double> out = new ArrayList<>();
        if (log) {
            double decades = Math.log10(max / min);
            double[] mantissas = decades > 4 ? new double[] {1} : decades > 1.5 ? new double[] {1, 2, 5}
                    : new double[] {1, 1.5, 2, 3, 5, 7};
            for (int e = (int) Math.floor(Math.log10(min)); e <= (int) Math.ceil(Math.log10(max)); e++) {
                for (double m : mantissas) {
                    double v = m * Math.pow(10, e);
                    if (v >= min * (1 - 1e-12) && v <= max * (1 + 1e-12)) {
                        out.add(v);
                    }
                }
            }
            return out;
        }
        double step = max > min ? NiceSteps.atLeast((max - min) / 6) : 1;
        for (double v = Math.ceil(min / step - 1e-9) * step; v <= max + step * 1e-9; v += step) {
            out.add(Math.abs(v) < step * 1e-9 ? 0 : v);
        }
        return out;
    }

    /** A tick's text in the axis unit, up to four significant digits. */
    public String tickText(double si) {
        double v = shown == null ? si : shown.fromSi(si);
        String s = String.format(Locale.ROOT, "%.4g", v);
        if (s.contains("e")) {
            return s.replaceFirst("\\.?0+e", "e");
        }
        return s.contains(".") ? s.replaceFirst("\\.?0+$", "") : s;
    }

    private static Dimension dimensionOf(String siUnit) {
        for (Dimension d : Dimension.values()) {
            if (d.siUnit().symbol().equals(siUnit)) {
                return d;
            }
        }
        return null;
    }

    /** The largest display unit in which {@code largest} is at least 1 (else the smallest). */
    private static Unit displayUnit(Dimension d, double largest) {
        List<Unit> ladder = d.displayUnits();
        for (int i = ladder.size() - 1; i >= 0; i--) {
            if (Math.abs(ladder.get(i).fromSi(largest)) >= 1) {
                return ladder.get(i);
            }
        }
        return ladder.get(0);
    }
}

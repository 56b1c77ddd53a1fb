package org.kinduct.render.paint;

import java.util.Locale;
import org.kinduct.report.Labels;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.run.ResultScales;

/**
 * The texts of one plate's or channel's state at one instant, as the exported page's tables and
 * the editor's readout show them: each value read from the {@link SheetState} and against the
 * run's scales, so rounding noise reads 0 (see {@link ResultScales}).
 */
public final class SheetTexts {

    private SheetTexts() {
    }

    /** The force of the field on the eddy currents with its direction, "3.03 N ∠ 180°" (no angle when zero). */
    public static String drag(SheetState st, ResultScales scales) {
        Vec2 force = scales.force(st.forceN());
        double f = force.length();
        return Quantities.force(f) + (f > 0 ? " ∠ " + Labels.direction(force) : "");
    }

    public static String torque(SheetState st, ResultScales scales) {
        return Quantities.torque(scales.torque(st.torqueNm()));
    }

    public static String joule(SheetState st, ResultScales scales) {
        return Quantities.power(scales.power(st.joulePowerW()));
    }

    public static String peakCurrentDensity(SheetState st) {
        return Quantities.currentDensity(st.peakCurrentDensityAPerM2());
    }

    /** The magnetic Reynolds number to two digits. */
    public static String reynolds(SheetState st) {
        return String.format(Locale.ROOT, "%.2g", st.magneticReynolds());
    }

    /** "upper − lower": the pair's electrodes, voltage = φ(first) − φ(second). */
    public static String pair(SheetState.Pair p) {
        return p.plus() + " − " + p.minus();
    }

    /** The pair's voltage, starred when a moving field patch leaves the potentials without its w·A. */
    public static String voltage(SheetState st, SheetState.Pair p, ResultScales scales) {
        return Quantities.voltage(scales.emf(p.voltageV())) + (st.inducedFieldIncluded() ? "" : " *");
    }

    /** A channel pair's share of B·w·v̄, "84.6 %", or {@link Labels#NOT_APPLICABLE} (plates, one wall). */
    public static String endShorting(SheetState.Pair p) {
        return Double.isNaN(p.endShortingRatio()) ? Labels.NOT_APPLICABLE
                : String.format(Locale.ROOT, "%.1f %%", 100 * p.endShortingRatio());
    }
}

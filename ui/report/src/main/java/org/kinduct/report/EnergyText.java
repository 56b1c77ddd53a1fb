package org.kinduct.report;

import java.util.Locale;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.dynamics.EnergyAudit;

/** The energy audit of a simulated run as one line of text, for under the readout table. */
public final class EnergyText {

    private EnergyText() {
    }

    /**
     * "Energy over the run: work in …, Joule heat …, eddy-current heat …, damping …, Δ kinetic …, Δ potential …, Δ magnetic …,
     * residual … (x of the energy turned over)"; the residual in joules reads 0 below a billionth of
     * the energy turned over, where its ratio says all there is.
     */
    public static String of(EnergyAudit a) {
        double scale = a.turnedOverJ();
        String share = scale > 0 ? String.format(Locale.ROOT, " (%.1e of the energy turned over)",
                Math.abs(a.residualJ()) / scale) : "";
        return "Energy over the run: work in " + j(a.suppliedJ()) + ", Joule heat " + j(a.jouleJ())
                + ", eddy-current heat " + j(a.eddyJ()) + ", damping heat " + j(a.dampingJ()) + ", Δ kinetic " + j(a.deltaKineticJ())
                + ", Δ potential " + j(a.deltaPotentialJ()) + ", Δ magnetic " + j(a.deltaMagneticJ())
                + ", residual " + j(Units.withoutNoise(a.residualJ(), scale)) + share;
    }

    private static String j(double joules) {
        return Units.format(joules, Dimension.ENERGY);
    }
}

package org.kinduct.solver.dynamics;

import java.util.List;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.solver.SceneIndex;
import org.kinduct.solver.SourceFields;
import org.kinduct.solver.field.PlaneField;

/**
 * The power the drives of AC source coils put into the loops, −Σ_k I_k·N_k·Φ_c,k·di_c/dt, with
 * Φ_c,k the coil's flux through loop k per ampere of coil current (the coil's transformer EMF
 * −N_k·Φ_c,k·di_c/dt in loop k times the loop current; Griffiths, <i>Introduction to
 * Electrodynamics</i>, 4th ed., 2013, §7.2.3). The interaction energy of loop currents with the
 * sources is counted as this work, not as stored energy ({@link EnergyAudit}).
 */
final class CoilDrives {

    private final List<Source> sources;
    private final SceneIndex index;
    /** Each AC-driven coil with a steady 1 A drive instead (its field per ampere), null for the other sources. */
    private final Source.SourceCoil[] unitCoils;

    CoilDrives(SceneIndex index) {
        this.index = index;
        sources = index.scene().sources();
        unitCoils = new Source.SourceCoil[sources.size()];
        for (int s = 0; s < sources.size(); s++) {
            if (sources.get(s).alternates() && sources.get(s) instanceof Source.SourceCoil coil) {
                unitCoils[s] = new Source.SourceCoil(coil.id(), coil.body(), coil.shape(), coil.turns(),
                        coil.planeZM(), Source.Drive.dc(1));
            }
        }
    }

    /**
     * The drives' power at tS, watts, with the bodies at {@code poses}, loop currents
     * {@code current} and loop k at xs[k], ys[k].
     */
    double powerW(double tS, Pose[] poses, double[] current, LoopCircuits circuits, double[][] xs, double[][] ys) {
        double power = 0;
        for (int s = 0; s < unitCoils.length; s++) {
            if (unitCoils[s] == null) {
                continue;
            }
            double rate = ((Source.SourceCoil) sources.get(s)).drive().rateAt(tS);
            PlaneField unit = SourceFields.place(unitCoils[s], poses[index.sourceBody(s)], tS);
            for (int k = 0; k < circuits.count(); k++) {
                power -= current[k] * circuits.loop(k).turns() * unit.flux(xs[k], ys[k]) * rate;
            }
        }
        return power;
    }
}

package org.kinduct.solver.dynamics;

import java.util.List;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.solver.SceneIndex;
import org.kinduct.solver.SourceFields;
import org.kinduct.solver.field.PlaneField;

/**
 * The EMF per turn that changing sources induce in a loop held where it is, −∂Φ/∂t at fixed
 * points (the transformer EMF −∮ ∂A/∂t·dl; Griffiths, <i>Introduction to Electrodynamics</i>, 4th
 * ed., 2013, §7.1.3), by the central difference −[Φ(t + h) − Φ(t − h)]/(2h) over the
 * prescribed-motion step h, the sources' bodies carried to t ± h by
 * {@link FreeBodies#poseAround}: error h²/6·∂³Φ/∂t³ from truncation plus about ε·|Φ|/h from
 * rounding. Zero when no source moves or alternates.
 */
final class TransformerStencil {

    private final List<Source> sources;
    private final SceneIndex index;
    private final FreeBodies bodies;
    private final double stepS;
    /** True when some source moves or has an AC drive, so a loop held still sees a changing flux. */
    private final boolean sourcesVary;

    /** @param stepS the difference step h, seconds */
    TransformerStencil(SceneIndex index, FreeBodies bodies, double stepS) {
        this.index = index;
        this.bodies = bodies;
        this.stepS = stepS;
        sources = index.scene().sources();
        boolean varying = false;
        for (int s = 0; s < sources.size(); s++) {
            Motion motion = index.scene().bodies().get(index.sourceBody(s)).motion();
            varying |= !(motion instanceof Motion.Still) || sources.get(s).alternates();
        }
        sourcesVary = varying;
    }

    /** The stencil around tS with the bodies at {@code now}: the sources placed at tS ± h. */
    Around around(double tS, Pose[] now) {
        return sourcesVary ? new Around(fieldsAt(now, tS, tS - stepS), fieldsAt(now, tS, tS + stepS)) : null;
    }

    /**
     * −∂Φ/∂t per turn through a loop held at xs, ys, volts; {@code around} from {@link #around}
     * (null: nothing varies).
     */
    double emfPerTurn(Around around, double[] xs, double[] ys) {
        if (around == null) {
            return 0;
        }
        double before = 0;
        double after = 0;
        for (PlaneField field : around.before) {
            before += field.flux(xs, ys);
        }
        for (PlaneField field : around.after) {
            after += field.flux(xs, ys);
        }
        return -(after - before) / (2 * stepS);
    }

    /** The sources' fields at t − h and t + h. */
    record Around(PlaneField[] before, PlaneField[] after) {
    }

    private PlaneField[] fieldsAt(Pose[] now, double tS, double t) {
        PlaneField[] fields = new PlaneField[sources.size()];
        for (int s = 0; s < fields.length; s++) {
            fields[s] = SourceFields.place(sources.get(s), bodies.poseAround(index.sourceBody(s), now, tS, t), t);
        }
        return fields;
    }
}

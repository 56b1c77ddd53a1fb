package org.kinduct.solver;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/**
 * Solves every conductor of a scene at one instant; {@link SceneSolver} states the physics.
 * Holds the frames of the difference stencil around the instant so that all conductors share
 * them.
 */
final class InstantSolver {

    /** |EMF| at or below TERMINAL_ABS_V + TERMINAL_REL·(EMF scale) shows no + end and no current sense. */
    static final double TERMINAL_ABS_V = 1e-12;
    /** Relative part of the terminal threshold: fifty times the rounding noise of a time difference. */
    static final double TERMINAL_REL = 1e-9;
    /**
     * Disagreement is relative to the larger EMF but to no less than this fraction of the loop's
     * EMF scale, so that rounding noise around an EMF that cancels to nearly zero raises no alarm:
     * the flux method's noise is about 2e-11 of the scale, so this floor keeps it below 1e-6.
     */
    static final double DISAGREEMENT_FLOOR = 1e-4;

    private final SceneIndex index;
    private final double h;
    private final DifferenceStep.Pace pace;
    private final double fieldScaleT;
    private final List<PlacedConductor> placed;
    private final SceneField field;
    private final SceneField[] aroundAll;
    private final SceneField[] aroundVarying;
    private final SceneField[] aroundVaryingPhysical;
    private final Frame[] around;
    private final boolean anyVarying;
    private final boolean idealVarying;
    private final double pieceM;
    private final double tS;

    InstantSolver(SceneIndex index, DifferenceStep step, Kinematics kinematics, double tS) {
        this.index = index;
        this.tS = tS;
        Frame now = index.frame(kinematics, tS);
        List<Conductor> conductors = index.scene().conductors();
        placed = new ArrayList<>(conductors.size());
        for (int c = 0; c < conductors.size(); c++) {
            int n = index.vertexCount(c);
            PlacedConductor at = new PlacedConductor(new double[n], new double[n], new double[n], new double[n],
                    conductors.get(c) instanceof Conductor.Loop);
            index.place(c, now, at.xs(), at.ys());
            index.velocities(c, now, at.xs(), at.ys(), at.vx(), at.vy());
            placed.add(at);
        }
        field = now.all();
        pace = step.pace(index, now, placed);
        h = pace.stepS();
        fieldScaleT = index.fieldScaleT();

        int sources = index.sourceCount();
        boolean[] varying = new boolean[sources];
        boolean[] varyingPhysical = new boolean[sources];
        boolean any = false;
        boolean ideal = false;
        double piece = Double.POSITIVE_INFINITY;
        for (int s = 0; s < sources; s++) {
            varying[s] = varies(now, s);
            varyingPhysical[s] = varying[s] && now.field(s).hasPhysicalPotential();
            any |= varying[s];
            ideal |= varying[s] && !varyingPhysical[s];
            if (varyingPhysical[s]) {
                piece = Math.min(piece, index.reach(s).lengthM());
            }
        }
        anyVarying = any;
        idealVarying = ideal;
        pieceM = piece;

        around = new Frame[DifferenceStep.OFFSETS.length];
        aroundAll = new SceneField[around.length];
        aroundVarying = new SceneField[around.length];
        aroundVaryingPhysical = new SceneField[around.length];
        for (int k = 0; k < around.length; k++) {
            around[k] = index.frame(kinematics, tS + DifferenceStep.OFFSETS[k] * h);
            aroundAll[k] = around[k].all();
            aroundVarying[k] = around[k].only(varying);
            aroundVaryingPhysical[k] = around[k].only(varyingPhysical);
        }
    }

    Snapshot solve() {
        List<Conductor> conductors = index.scene().conductors();
        List<ConductorState> states = new ArrayList<>(conductors.size());
        for (int c = 0; c < conductors.size(); c++) {
            Conductor conductor = conductors.get(c);
            states.add(conductor instanceof Conductor.Loop loop ? loop(c, loop) : wire(c, conductor));
        }
        return new Snapshot(tS, states);
    }

    /**
     * A source varies at this instant when its body moves or turns, or its drive current changes;
     * a uniform field is unchanged by any motion.
     */
    private boolean varies(Frame now, int s) {
        Source source = index.scene().sources().get(s);
        if (source instanceof Source.UniformField) {
            return false;
        }
        if (source instanceof Source.SourceCoil coil && DifferenceStep.varies(coil.drive())) {
            return true;
        }
        var pose = now.pose(index.sourceBody(s));
        return pose.omegaRadPerS() != 0 || !pose.velocity().equals(Vec2.ZERO);
    }

    private ConductorState loop(int c, Conductor.Loop loop) {
        PlacedConductor at = placed.get(c);
        int turns = loop.turns();
        int n = at.xs().length;
        double flux = field.flux(at.xs(), at.ys());
        EdgeSums sums = EdgeSums.along(field, at);

        double[] moved = new double[around.length];
        double[] frozen = new double[around.length];
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int k = 0; k < around.length; k++) {
            index.place(c, around[k], xs, ys);
            moved[k] = aroundAll[k].flux(xs, ys);
            frozen[k] = anyVarying ? aroundVarying[k].flux(at.xs(), at.ys()) : 0;
        }
        double emfFlux = turns * DifferenceStep.negativeDerivative(moved, h);
        double transformer = anyVarying ? DifferenceStep.negativeDerivative(frozen, h) : 0;
        double emf = turns * (sums.motionalV() + transformer);
        double scale = turns * emfScale(at);
        double threshold = TERMINAL_ABS_V + TERMINAL_REL * scale;
        double denominator = Math.max(Math.max(Math.abs(emfFlux), Math.abs(emf)), DISAGREEMENT_FLOOR * scale);
        double disagreement = denominator > 0 ? Math.abs(emfFlux - emf) / denominator : 0;

        double resistance = turns * at.lengthM() * loop.wire().material().resistivityAt(loop.temperatureC())
                / loop.wire().crossSectionM2() + loop.loadOhm();
        if (!(resistance > 0)) {
            throw new IllegalArgumentException("loop '" + loop.id() + "' has no positive resistance at "
                    + loop.temperatureC() + " °C (" + resistance + " Ω): the resistivity model does not reach there");
        }
        List<Vec2> vertices = vertices(at);
        if (loop.open()) {
            return new ConductorState(loop.id(), ConductorState.Kind.LOOP, vertices, flux, turns * flux, emfFlux, emf,
                    emf, disagreement, terminal(emf, threshold), 0, Circulation.NONE, Vec2.ZERO, resistance, true);
        }
        double current = emf / resistance;
        double sense = Math.signum(current) * Math.signum(Polygons.signedArea(vertices));
        Circulation direction = Math.abs(emf) <= threshold || sense == 0 ? Circulation.NONE
                : sense > 0 ? Circulation.CCW : Circulation.CW;
        Vec2 force = new Vec2(turns * current * sums.forceXNPerA(), turns * current * sums.forceYNPerA());
        return new ConductorState(loop.id(), ConductorState.Kind.LOOP, vertices, flux, turns * flux, emfFlux, emf,
                emf, disagreement, Terminal.NONE, current, direction, force, resistance, true);
    }

    private ConductorState wire(int c, Conductor wire) {
        PlacedConductor at = placed.get(c);
        EdgeSums sums = EdgeSums.along(field, at);
        double induced = 0;
        if (aroundVaryingPhysical[0].size() > 0) {
            double[] lineIntegrals = new double[around.length];
            for (int k = 0; k < around.length; k++) {
                lineIntegrals[k] = PotentialIntegral.along(aroundVaryingPhysical[k], at, pieceM);
            }
            induced = DifferenceStep.negativeDerivative(lineIntegrals, h);
        }
        double emf = sums.motionalV() + induced;
        double threshold = TERMINAL_ABS_V + TERMINAL_REL * emfScale(at);
        return new ConductorState(wire.id(), ConductorState.Kind.WIRE, vertices(at), Double.NaN, Double.NaN,
                Double.NaN, emf, emf, 0, terminal(emf, threshold), 0, Circulation.NONE, Vec2.ZERO, Double.NaN,
                !idealVarying);
    }

    /**
     * EMF scale per turn, B·L²/T: every source's field scale summed, times the conductor's length
     * squared, over the scene's time scale T (see {@link DifferenceStep}). Since T ≤ ℓ/v and
     * T ≤ 1/(2πf), it bounds both the motional EMF B·L·v and the transformer EMF B·L²·2πf up to
     * the modest factor in B, and the rounding noise of every time difference, about
     * ε·B·L²/h = 1e5·ε·B·L²/T, is a fixed small fraction of it.
     */
    private double emfScale(PlacedConductor at) {
        double length = at.lengthM();
        return fieldScaleT * length * length / pace.timeScaleS();
    }

    private static Terminal terminal(double emf, double threshold) {
        return emf > threshold ? Terminal.LAST : emf < -threshold ? Terminal.FIRST : Terminal.NONE;
    }

    private static List<Vec2> vertices(PlacedConductor at) {
        List<Vec2> vertices = new ArrayList<>(at.xs().length);
        for (int i = 0; i < at.xs().length; i++) {
            vertices.add(new Vec2(at.xs()[i], at.ys()[i]));
        }
        return vertices;
    }
}

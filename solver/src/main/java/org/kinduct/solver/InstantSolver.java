package org.kinduct.solver;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.GradientField;

/**
 * Solves every conductor of a scene at one instant; {@link SceneSolver} states the physics.
 * Holds the frames of the difference stencil around the instant so that all conductors share
 * them.
 *
 * <p>A loop's flux is summed source by source, so that the stencil reuses what it already has:
 * where the loop stands still over the stencil the flux through it held where it is (transformer
 * term) is the flux through it as placed (flux rule), and a source whose field is the same at a
 * stencil time as now (same pose, no AC drive) gives the flux it gave now. Either way the sums run
 * over the sources in scene order, so a reused value gives the same bits as one computed afresh.
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
    /** The sources whose current changes with time, at each stencil time. */
    private final SceneField[] aroundDriven;
    /** Magnets and steady coils that move: their induced field along a wire is closed form. */
    private final boolean[] rigidlyMoving;
    private final PlacedInstant now;
    private final PlacedInstant[] around;
    private final boolean[] varying;
    /** unchanged[k][s]: source s has at stencil time k exactly the field it has now. */
    private final boolean[][] unchanged;
    private final boolean anyVarying;
    private final boolean idealVarying;
    private final double pieceM;
    private final double tS;
    private final PairMemo memo;

    InstantSolver(SceneIndex index, DifferenceStep step, Kinematics kinematics, double tS, PairMemo memo) {
        this.index = index;
        this.tS = tS;
        this.memo = memo;
        now = index.frame(kinematics, tS);
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
        varying = new boolean[sources];
        boolean[] drivenCoil = new boolean[sources];
        rigidlyMoving = new boolean[sources];
        boolean any = false;
        boolean ideal = false;
        double piece = Double.POSITIVE_INFINITY;
        for (int s = 0; s < sources; s++) {
            varying[s] = varies(s);
            boolean physical = now.field(s).hasPhysicalPotential();
            drivenCoil[s] = driven(s);
            rigidlyMoving[s] = varying[s] && physical && !drivenCoil[s];
            any |= varying[s];
            ideal |= varying[s] && !physical;
            if (drivenCoil[s]) {
                piece = Math.min(piece, index.reach(s).lengthM());
            }
        }
        anyVarying = any;
        idealVarying = ideal;
        pieceM = piece;

        around = new PlacedInstant[DifferenceStep.OFFSETS.length];
        aroundDriven = new SceneField[around.length];
        unchanged = new boolean[around.length][sources];
        for (int k = 0; k < around.length; k++) {
            around[k] = index.frame(kinematics, tS + DifferenceStep.OFFSETS[k] * h);
            aroundDriven[k] = around[k].only(drivenCoil);
            for (int s = 0; s < sources; s++) {
                int body = index.sourceBody(s);
                unchanged[k][s] = !drivenCoil[s] && samePlace(now.pose(body), around[k].pose(body));
            }
        }
    }

    /** True when source s is a coil whose current changes with time. */
    private boolean driven(int s) {
        return index.scene().sources().get(s).alternates();
    }

    /** A placed source depends on its body's pose only through the offset and the angle. */
    private static boolean samePlace(Pose a, Pose b) {
        return a.offset().equals(b.offset()) && a.angleRad() == b.angleRad();
    }

    /** Wires and loops; plates and channels are solved on their grids ({@code org.kinduct.solver.plate}). */
    Snapshot solve() {
        List<Conductor> conductors = index.scene().conductors();
        List<ConductorState> states = new ArrayList<>(conductors.size());
        for (int c = 0; c < conductors.size(); c++) {
            int index = c;
            conductors.get(c).match(new Conductor.Cases<Void>() {
                @Override
                public Void wire(Conductor.Wire wire) {
                    states.add(InstantSolver.this.wire(index, wire));
                    return null;
                }

                @Override
                public Void loop(Conductor.Loop loop) {
                    states.add(InstantSolver.this.loop(index, loop));
                    return null;
                }

                @Override
                public Void plate(Conductor.Plate plate) {
                    return null;
                }

                @Override
                public Void channel(Conductor.Channel channel) {
                    return null;
                }
            });
        }
        return new Snapshot(tS, states);
    }

    /**
     * A source varies at this instant when its body moves or turns, or its drive current changes;
     * a uniform field is unchanged by any motion.
     */
    private boolean varies(int s) {
        Source source = index.scene().sources().get(s);
        if (source instanceof Source.UniformField) {
            return false;
        }
        if (driven(s)) {
            return true;
        }
        var pose = now.pose(index.sourceBody(s));
        return pose.omegaRadPerS() != 0 || !pose.velocity().equals(Vec2.ZERO);
    }

    private ConductorState loop(int c, Conductor.Loop loop) {
        PlacedConductor at = placed.get(c);
        int turns = loop.turns();
        int n = at.xs().length;
        int sources = index.sourceCount();
        boolean[] paired = pairedSources(c);
        double[] fluxNow = new double[sources];
        double flux = 0;
        double stencilFlux = 0;
        double pairedRate = 0;
        double pairedMotional = 0;
        double pairedForceX = 0;
        double pairedForceY = 0;
        boolean anyStencil = false;
        for (int s = 0; s < sources; s++) {
            if (paired[s]) {
                RigidPair pair = memo.pair(index.scene().sources().get(s), (GradientField) now.field(s),
                        now.pose(index.sourceBody(s)), at, now.pose(index.vertexBody(c, 0)), tS);
                fluxNow[s] = pair.fluxWb();
                pairedRate += pair.fluxRateWbPerS();
                pairedMotional += pair.motionalV();
                pairedForceX += pair.forceXNPerA();
                pairedForceY += pair.forceYNPerA();
            } else {
                fluxNow[s] = now.field(s).flux(at.xs(), at.ys());
                stencilFlux += fluxNow[s];
                anyStencil = true;
            }
            flux += fluxNow[s];
        }
        boolean[] stencilMask = new boolean[sources];
        for (int s = 0; s < sources; s++) {
            stencilMask[s] = !paired[s];
        }
        EdgeSums sums = EdgeSums.along(now.only(stencilMask), at);

        double[] moved = new double[around.length];
        double[] frozen = new double[around.length];
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int k = 0; anyStencil && k < around.length; k++) {
            index.place(c, around[k], xs, ys);
            boolean still = Arrays.equals(xs, at.xs()) && Arrays.equals(ys, at.ys());
            for (int s = 0; s < sources; s++) {
                if (paired[s]) {
                    continue;
                }
                double placedFlux = still && unchanged[k][s] ? fluxNow[s] : around[k].field(s).flux(xs, ys);
                moved[k] += placedFlux;
                if (varying[s]) {
                    frozen[k] += still ? placedFlux : around[k].field(s).flux(at.xs(), at.ys());
                }
            }
        }
        double emfFlux = turns * (DifferenceStep.negativeDerivative(moved, h) - pairedRate);
        double transformer = anyVarying ? DifferenceStep.negativeDerivative(frozen, h) : 0;
        double emf = turns * (pairedMotional + sums.motionalV() + transformer);
        double scale = turns * emfScale(at);
        double threshold = TERMINAL_ABS_V + TERMINAL_REL * scale;
        double denominator = Math.max(Math.max(Math.abs(emfFlux), Math.abs(emf)), DISAGREEMENT_FLOOR * scale);
        double disagreement = DifferenceStep.smooth(stencilFlux, moved, DISAGREEMENT_FLOOR * scale / turns, h)
                ? (denominator > 0 ? Math.abs(emfFlux - emf) / denominator : 0)
                : Double.NaN;
        double forceX = pairedForceX + sums.forceXNPerA();
        double forceY = pairedForceY + sums.forceYNPerA();

        double resistance = LoopResistance.ohms(loop, at.lengthM());
        List<Vec2> vertices = vertices(at);
        if (loop.open()) {
            return new ConductorState(loop.id(), ConductorState.Kind.LOOP, vertices, flux, turns * flux, emfFlux, emf,
                    emf, disagreement, threshold, Terminal.of(emf, threshold), 0, Circulation.NONE, Vec2.ZERO,
                    resistance, Double.NaN, true);
        }
        double current = emf / resistance;
        Vec2 force = new Vec2(turns * current * forceX, turns * current * forceY);
        return new ConductorState(loop.id(), ConductorState.Kind.LOOP, vertices, flux, turns * flux, emfFlux, emf,
                emf, disagreement, threshold, Terminal.NONE, current,
                Circulation.of(current, Polygons.signedArea(vertices), threshold / resistance), force, resistance,
                Double.NaN, true);
    }

    /**
     * The sources whose share of loop {@code c} comes from one instant ({@link RigidPair}): the
     * loop rides one body, and the source keeps its strength (no AC drive) and has a closed-form
     * potential gradient that is smooth in the plane (a magnet face lying in the plane makes B_z
     * jump at its footprint's edge; such a magnet keeps the time difference, as do patches).
     */
    private boolean[] pairedSources(int c) {
        boolean[] paired = new boolean[index.sourceCount()];
        for (int i = 1; i < index.vertexCount(c); i++) {
            if (index.vertexBody(c, i) != index.vertexBody(c, 0)) {
                return paired;
            }
        }
        List<Source> sources = index.scene().sources();
        for (int s = 0; s < paired.length; s++) {
            paired[s] = now.field(s) instanceof GradientField && !driven(s) && !touchesPlane(sources.get(s));
        }
        return paired;
    }

    private static boolean touchesPlane(Source source) {
        return (source instanceof Source.BlockMagnet block && block.standoffM() == 0)
                || (source instanceof Source.CylinderMagnet cylinder && cylinder.standoffM() == 0);
    }

    private ConductorState wire(int c, Conductor wire) {
        PlacedConductor at = placed.get(c);
        EdgeSums sums = EdgeSums.along(field, at);
        double induced = 0;
        for (int s = 0; s < rigidlyMoving.length; s++) {
            if (rigidlyMoving[s]) {
                induced += RigidInduction.emf(now.field(s), now.pose(index.sourceBody(s)), at);
            }
        }
        if (aroundDriven[0].size() > 0) {
            double[] lineIntegrals = new double[around.length];
            for (int k = 0; k < around.length; k++) {
                lineIntegrals[k] = PotentialIntegral.along(aroundDriven[k], at, pieceM);
            }
            induced += DifferenceStep.negativeDerivative(lineIntegrals, h);
        }
        double emf = sums.motionalV() + induced;
        double threshold = TERMINAL_ABS_V + TERMINAL_REL * emfScale(at);
        return new ConductorState(wire.id(), ConductorState.Kind.WIRE, vertices(at), Double.NaN, Double.NaN,
                Double.NaN, emf, emf, 0, threshold, Terminal.of(emf, threshold), 0, Circulation.NONE, Vec2.ZERO,
                Double.NaN, Double.NaN, !idealVarying);
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

    private static List<Vec2> vertices(PlacedConductor at) {
        List<Vec2> vertices = new ArrayList<>(at.xs().length);
        for (int i = 0; i < at.xs().length; i++) {
            vertices.add(new Vec2(at.xs()[i], at.ys()[i]));
        }
        return vertices;
    }
}

package org.kinduct.solver;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.IntStream;
import org.kinduct.scene.Checks;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;

/**
 * Fields, flux, EMF, current and force for every conductor of a scene at given times,
 * quasi-statically (no self- or mutual inductance yet).
 *
 * <p><b>Loops</b> (N turns, vertices in order, counter-clockwise positive). Flux per turn
 * Φ = Σ_sources Φ_s(placed polygon), linkage λ = N·Φ, and the EMF twice:
 * <ul>
 *   <li>flux rule, −dλ/dt, by a five-point central difference in time (see
 *       {@link DifferenceStep} for the step and its error);</li>
 *   <li>motional method, N·[∮ (v × B)·dl − ∂Φ/∂t|frozen loop]: the first term exactly from the
 *       edges' B_z moments with each vertex moving with its own body ({@link EdgeSums}); the second,
 *       the transformer EMF −∮ ∂A/∂t·dl, as the same difference of the flux through the loop held
 *       where it is now, taken only over sources that move or are driven by AC.</li>
 * </ul>
 * The two agree for any motion and deformation of the contour (Leibniz rule for moving surfaces;
 * Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013, §7.1.3): in static fields
 * to rounding (the check reported as {@code disagreement}; see Thresholds). The motional value is
 * reported. A closed loop carries I = EMF/R with R = N·perimeter·ρ(T)/A_wire + R_load
 * (ρ(T) = ρ20·[1 + α20·(T − 20 °C)], IEC 60028 for copper), and feels F = N·I·∮ dl × B =
 * N·I·∮ B_z (dy, −dx). An open loop has EMF across its gap (the closing edge from last to first
 * vertex: EMF &gt; 0 makes the last vertex +), no current and no force.
 *
 * <p><b>Wires</b> (open polylines, first to last vertex): EMF = ∫ (v × B)·dl − ∫ ∂A/∂t·dl, the
 * second term over the wire held where it is: for magnets and steady coils on moving bodies in
 * closed form, [w·A] at the ends minus ∫ (w × B)·dl with w the source body's velocity field
 * ({@link RigidInduction}); for AC-driven coils from the difference in time of the line integral
 * of A ({@link PotentialIntegral}). A moving
 * field patch has no physical potential, so its induced field is left out and the state says so
 * ({@code inducedFieldIncluded = false}). Unlike a loop's, an open wire's EMF depends on the
 * frame: a wire moving past a still magnet and a magnet moving past a still wire differ by
 * u·A at the two ends (u the relative velocity), since ∇(u·A) = (u·∇)A + u × B; it is the EMF
 * along the wire itself, in the frame of the scene.
 *
 * <p><b>Thresholds.</b> Each conductor has an EMF scale N·B·L²/T: the sources' field scales summed
 * (B), its length (L) and the scene's time scale T ({@link DifferenceStep}). It bounds the EMF the
 * conductor could see up to the modest factor in B, and the rounding noise of every time
 * difference is a fixed fraction of it (about 2e-11). The + end and the current sense are shown
 * only when |EMF| exceeds 1e-12 V plus 1e-9 of the scale; the disagreement of the two methods is
 * relative to the larger EMF but to no less than 1e-4 of the scale, the flux method's resolution.
 * Over 5000 random loops moving through patches the relative disagreement had median 1e-10 and
 * maximum 4e-8.
 *
 * <p>Immutable; safe to share between threads if the {@link Kinematics} is.
 */
public final class SceneSolver {

    private final Kinematics kinematics;
    private final SceneIndex index;
    private final DifferenceStep step;
    private final PairMemo memo;

    /** Bodies follow their prescribed motions ({@link Kinematics#prescribed}). */
    public SceneSolver(Scene scene) {
        this(scene, Kinematics.prescribed(Checks.nonNull(scene, "scene")));
    }

    public SceneSolver(Scene scene, Kinematics kinematics) {
        this(scene, kinematics, PairMemo.NONE);
    }

    /** @param memo rigid pairs' integrals shared with the runs of other variants of the scene */
    public SceneSolver(Scene scene, Kinematics kinematics, PairMemo memo) {
        this.kinematics = Checks.nonNull(kinematics, "kinematics");
        this.index = new SceneIndex(Checks.nonNull(scene, "scene"));
        this.step = new DifferenceStep(scene);
        this.memo = Checks.nonNull(memo, "memo");
    }

    /** Every conductor's state at {@code tS}, seconds. */
    public Snapshot at(double tS) {
        Checks.finite(tS, "time");
        return new InstantSolver(index, step, kinematics, tS, memo).solve();
    }

    /**
     * States at t0, t0 + dt, …, up to t1 inclusive when (t1 − t0)/dt is a whole number within
     * rounding, else up to the last step before t1 ({@link TimeSpan#stepsBetween}); the instants
     * are solved on every core.
     */
    public List<Snapshot> series(double t0S, double t1S, double dtS) {
        return series(t0S, t1S, dtS, true);
    }

    /**
     * As {@link #series(double, double, double)}; with {@code parallel} false on the calling
     * thread alone, for an interactive caller that leaves the other cores to its display.
     */
    public List<Snapshot> series(double t0S, double t1S, double dtS, boolean parallel) {
        int steps = TimeSpan.stepsBetween(t0S, t1S, dtS);
        // Instants are independent and this solver is immutable: they may be solved on every core.
        IntStream k = IntStream.rangeClosed(0, steps);
        return (parallel ? k.parallel() : k).mapToObj(i -> at(t0S + i * dtS)).toList();
    }

    /** The summed field of all sources at {@code tS}, e.g. for a B_z map. */
    public SceneField fieldAt(double tS) {
        Checks.finite(tS, "time");
        return index.frame(kinematics, tS).all();
    }

    /**
     * The summed field of the sources named in {@code sourceIds} at {@code tS} (ids the scene does
     * not have are ignored): a map can compute still and moving sources apart, and by
     * superposition the parts add up to {@link #fieldAt}.
     */
    public SceneField fieldOf(double tS, Set<String> sourceIds) {
        Checks.finite(tS, "time");
        List<Source> sources = index.scene().sources();
        boolean[] chosen = new boolean[sources.size()];
        for (int s = 0; s < chosen.length; s++) {
            chosen[s] = sourceIds.contains(sources.get(s).id());
        }
        return index.frame(kinematics, tS).only(chosen);
    }

    /** Where {@code conductor}'s vertices are at {@code tS}, each moved by the body it rides. */
    public List<Vec2> placedVertices(Conductor conductor, double tS) {
        Checks.finite(tS, "time");
        List<Vec2> placed = new ArrayList<>(conductor.vertices().size());
        for (Conductor.Vertex vertex : conductor.vertices()) {
            placed.add(kinematics.poseAt(vertex.bodyOr(conductor.body()), tS).place(vertex.at()));
        }
        return placed;
    }
}

package org.kinduct.solver.run;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Kinematics;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.circuit.InductanceAtStart;
import org.kinduct.solver.dynamics.EnergyAudit;

/**
 * One run of a scene, the single result every output reads: the samples on the window's grid
 * (per conductor and per free body), the further instants asked for, the energy audit of a
 * coupled run, the inductances at the start, what self-crossing loops pick up from alternating
 * coils ({@link AlternatingPickup}), the plan that made it, and the scales against which shown
 * values are read. Table, CSV, JSON, picture, callouts and plots of one state all read it,
 * so they agree by construction. Immutable.
 */
public final class RunResult {

    private final Scene scene;
    private final RunPlan plan;
    private final List<Snapshot> samples;
    private final List<Snapshot> extras;
    private final EnergyAudit audit;
    private final InductanceAtStart inductance;
    private final ResultScales scales;
    private final List<AlternatingPickup> alternating;

    RunResult(Scene scene, RunPlan plan, List<Snapshot> samples, List<Snapshot> extras, EnergyAudit audit,
              InductanceAtStart inductance) {
        this(scene, plan, samples, extras, audit, inductance, List.of());
    }

    private RunResult(Scene scene, RunPlan plan, List<Snapshot> samples, List<Snapshot> extras, EnergyAudit audit,
                      InductanceAtStart inductance, List<AlternatingPickup> alternating) {
        if (samples.isEmpty()) {
            throw new IllegalArgumentException("a run has at least one sample");
        }
        this.scene = scene;
        this.plan = plan;
        this.samples = List.copyOf(samples);
        this.extras = List.copyOf(extras);
        this.audit = audit;
        this.inductance = inductance;
        List<Snapshot> all = new java.util.ArrayList<>(this.samples);
        all.addAll(this.extras);
        this.scales = ResultScales.of(all);
        this.alternating = List.copyOf(alternating);
    }

    /** This result with what its self-crossing loops pick up from the alternating coils. */
    RunResult withAlternatingPickup(List<AlternatingPickup> pickup) {
        return new RunResult(scene, plan, samples, extras, audit, inductance, pickup);
    }

    /**
     * What loop {@code loopId} and each of its lobes pick up from the scene's alternating-current
     * coils alone, at the samples; empty unless the loop crosses itself and the scene has such coils.
     */
    public Optional<AlternatingPickup> alternatingPickup(String loopId) {
        return alternating.stream().filter(p -> p.loopId().equals(loopId)).findFirst();
    }

    public Scene scene() {
        return scene;
    }

    public RunPlan plan() {
        return plan;
    }

    /** The samples on the grid t0 + k·dt, in time order. */
    public List<Snapshot> samples() {
        return samples;
    }

    /** The energy audit over the whole run; empty for quasi-static instants, which have none. */
    public Optional<EnergyAudit> audit() {
        return Optional.ofNullable(audit);
    }

    public InductanceAtStart inductanceAtStart() {
        return inductance;
    }

    /** The largest magnitudes of the run's quantities, against which shown values are read. */
    public ResultScales scales() {
        return scales;
    }

    /** True when a body moves under forces in this run. */
    public boolean hasFreeBodies() {
        return !samples.get(0).freeBodies().isEmpty();
    }

    /**
     * The state at exactly {@code tS}: a grid sample or a further instant asked for.
     *
     * @throws IllegalArgumentException when the run did not sample {@code tS}
     */
    public Snapshot at(double tS) {
        for (Snapshot s : extras) {
            if (s.tS() == tS) {
                return s;
            }
        }
        Snapshot near = nearest(tS);
        if (near.tS() != tS) {
            throw new IllegalArgumentException("the run has no sample at t = " + tS + " s");
        }
        return near;
    }

    /** The grid sample nearest to {@code tS} (the first or last outside the window). */
    public Snapshot nearest(double tS) {
        int i = lowerIndex(tS);
        if (i + 1 < samples.size() && tS - samples.get(i).tS() > samples.get(i + 1).tS() - tS) {
            return samples.get(i + 1);
        }
        return samples.get(i);
    }

    /** Index of the last sample at or before tS (0 before the first). */
    private int lowerIndex(double tS) {
        int lo = 0;
        int hi = samples.size() - 1;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (samples.get(mid).tS() <= tS) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    /**
     * Where every body is at any time of the run: prescribed bodies on their motions, free bodies
     * cubic-Hermite interpolated between the samples from their positions and velocities (Foley
     * &amp; van Dam, <i>Computer Graphics</i>, 2nd ed., 1990, §11.2), so drawn motion is smooth
     * and exact at the samples; held at the first and last sample outside the run.
     */
    public Kinematics kinematics() {
        Map<String, Body> bodies = scene.bodiesById();
        return (bodyId, tS) -> {
            Body body = bodies.get(bodyId);
            if (body == null) {
                throw new IllegalArgumentException("scene '" + scene.name() + "' has no body '" + bodyId + "'");
            }
            return body.motion() instanceof Motion.Free ? freePose(bodyId, tS) : body.poseAt(tS);
        };
    }

    /** Every free body's pose at {@code tS}, interpolated as {@link #kinematics()} does. */
    public Map<String, Pose> freePosesAt(double tS) {
        Map<String, Pose> out = new HashMap<>();
        for (String id : samples.get(0).freeBodies().keySet()) {
            out.put(id, freePose(id, tS));
        }
        return out;
    }

    private Pose freePose(String bodyId, double tS) {
        int i = lowerIndex(tS);
        Pose a = samples.get(i).freeBodies().get(bodyId);
        if (a == null) {
            throw new IllegalArgumentException("body '" + bodyId + "' is not simulated in this run");
        }
        if (i + 1 >= samples.size() || tS <= samples.get(i).tS()) {
            return a;
        }
        Pose b = samples.get(i + 1).freeBodies().get(bodyId);
        double h = samples.get(i + 1).tS() - samples.get(i).tS();
        double s = (tS - samples.get(i).tS()) / h;
        double[] x = hermite(a.offset().x(), a.velocity().x(), b.offset().x(), b.velocity().x(), s, h);
        double[] y = hermite(a.offset().y(), a.velocity().y(), b.offset().y(), b.velocity().y(), s, h);
        double[] q = hermite(a.angleRad(), a.omegaRadPerS(), b.angleRad(), b.omegaRadPerS(), s, h);
        return new Pose(a.pivot(), new Vec2(x[0], y[0]), q[0], new Vec2(x[1], y[1]), q[1]);
    }

    /** Value and time derivative of the cubic through (p0, v0) at s = 0 and (p1, v1) at s = 1, segment length h. */
    private static double[] hermite(double p0, double v0, double p1, double v1, double s, double h) {
        double m0 = v0 * h;
        double m1 = v1 * h;
        double s2 = s * s;
        double s3 = s2 * s;
        double value = (2 * s3 - 3 * s2 + 1) * p0 + (s3 - 2 * s2 + s) * m0 + (-2 * s3 + 3 * s2) * p1 + (s3 - s2) * m1;
        double dds = (6 * s2 - 6 * s) * p0 + (3 * s2 - 4 * s + 1) * m0 + (-6 * s2 + 6 * s) * p1 + (3 * s2 - 2 * s) * m1;
        return new double[] {value, dds / h};
    }
}

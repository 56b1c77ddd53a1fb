package org.kinduct.render.field;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.CoupledSimulation;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.dynamics.Sample;
import org.kinduct.solver.dynamics.Trajectory;

/**
 * The editor's numbers for a scene with free bodies: one {@link CoupledSimulation} run over the
 * scene's time window, made by the first thread that asks (never the UI thread: the view model
 * asks from its workers) and shared by every later question; the attached {@link RunMonitor}
 * follows its progress and can stop it. Conductor states are those of the nearest sample; poses
 * between samples are cubic Hermite interpolated from the sampled positions and velocities (Foley &amp; van Dam, <i>Computer Graphics</i>, 2nd ed., 1990, §11.2), so the
 * animation is smooth and exact at the samples. The field map places sources by the same poses.
 */
public final class TrajectoryEvaluator implements SceneEvaluator {

    /** At most this many samples per run, whatever the scene's time step. */
    static final int MAX_SAMPLES = 2000;

    private final Scene scene;
    private volatile RunMonitor monitor = RunMonitor.NONE;
    /** Asks whichever monitor is attached at the moment, so a run in progress follows a change of monitor. */
    private final RunMonitor attached = new RunMonitor() {
        @Override
        public void progress(double fractionDone) {
            monitor.progress(fractionDone);
        }

        @Override
        public boolean cancelled() {
            return monitor.cancelled();
        }
    };
    private Trajectory trajectory;
    private SceneSolver placed;
    /** Places every body by its drawn motion (free bodies at rest): exact for sources that ride no free body. */
    private final SceneSolver prescribed;

    public TrajectoryEvaluator(Scene scene) {
        this.scene = scene;
        this.prescribed = new SceneSolver(scene);
    }

    public Scene scene() {
        return scene;
    }

    /** True when a body of {@code scene} moves under forces, so the scene needs a simulation. */
    public static boolean needsSimulation(Scene scene) {
        return scene.bodies().stream().anyMatch(b -> b.motion() instanceof Motion.Free);
    }

    /** The sampling step of the run: the scene's step, coarsened so a run has at most {@value #MAX_SAMPLES} samples. */
    public static double stepS(TimeSpan span) {
        return Math.max(span.dtS(), (span.t1S() - span.t0S()) / MAX_SAMPLES);
    }

    @Override
    public void monitor(RunMonitor monitor) {
        this.monitor = Objects.requireNonNull(monitor);
    }

    /**
     * The simulated run, computed on first use; throws what the simulation throws, and
     * {@link org.kinduct.solver.dynamics.SimulationCancelledException} when the monitor stopped it
     * (the next call starts it again). It runs half a step past t1 so the last sample is not lost
     * to rounding of the sample grid.
     */
    public synchronized Trajectory trajectory() {
        if (trajectory == null) {
            TimeSpan span = scene.time();
            double step = stepS(span);
            trajectory = new CoupledSimulation(CoupledSimulation.DEFAULT_RELATIVE_TOLERANCE)
                    .simulate(scene, span.t0S(), span.t1S() + step / 2, step, attached);
            Map<String, Body> bodies = scene.bodiesById();
            placed = new SceneSolver(scene, (bodyId, tS) -> bodies.get(bodyId).motion() instanceof Motion.Free
                    ? pose(bodyId, tS) : bodies.get(bodyId).poseAt(tS));
        }
        return trajectory;
    }

    @Override
    public Snapshot at(double tS) {
        Sample s = trajectory().samples().get(nearest(tS));
        return new Snapshot(s.tS(), s.conductors());
    }

    /** The run's own samples within [t0, t1]; the requested step is not used, the run has one. */
    @Override
    public List<Snapshot> series(double t0S, double t1S, double dtS) {
        List<Snapshot> out = new ArrayList<>();
        for (Sample s : trajectory().samples()) {
            if (s.tS() >= t0S - 1e-12 && s.tS() <= t1S + 1e-12) {
                out.add(new Snapshot(s.tS(), s.conductors()));
            }
        }
        return out;
    }

    @Override
    public BzField fieldAt(double tS) {
        trajectory();
        return placed.fieldAt(tS)::bz;
    }

    @Override
    public BzField fieldOf(double tS, Set<String> sourceIds) {
        boolean free = scene.sources().stream().anyMatch(s -> sourceIds.contains(s.id())
                && scene.body(s.body()).orElseThrow().motion() instanceof Motion.Free);
        if (!free) {
            // Prescribed placement is exact for these sources and needs no run.
            return prescribed.fieldOf(tS, sourceIds)::bz;
        }
        trajectory();
        return placed.fieldOf(tS, sourceIds)::bz;
    }

    @Override
    public Map<String, Pose> posesAt(double tS) {
        trajectory();
        Map<String, Pose> out = new HashMap<>();
        for (Body b : scene.bodies()) {
            if (b.motion() instanceof Motion.Free) {
                out.put(b.id(), pose(b.id(), tS));
            }
        }
        return out;
    }

    @Override
    public Optional<EnergyAudit> audit() {
        return Optional.of(trajectory().audit());
    }

    private int nearest(double tS) {
        List<Sample> samples = trajectory.samples();
        int i = lowerIndex(tS);
        if (i + 1 < samples.size() && tS - samples.get(i).tS() > samples.get(i + 1).tS() - tS) {
            return i + 1;
        }
        return i;
    }

    /** Index of the last sample at or before tS (0 before the first). */
    private int lowerIndex(double tS) {
        List<Sample> samples = trajectory.samples();
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

    /** Body {@code bodyId}'s pose at tS, Hermite-interpolated between the samples around it, held outside the run. */
    private Pose pose(String bodyId, double tS) {
        List<Sample> samples = trajectory.samples();
        int i = lowerIndex(tS);
        Pose a = samples.get(i).pose(bodyId);
        if (i + 1 >= samples.size() || tS <= samples.get(i).tS()) {
            return a;
        }
        Pose b = samples.get(i + 1).pose(bodyId);
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

package org.kinduct.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.solver.dynamics.CoupledSimulation;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.dynamics.Sample;
import org.kinduct.solver.dynamics.Trajectory;

/**
 * What the reports print: the conductor states per time and, where known, each closed loop's
 * self-inductance per time; for a coupled run also the free bodies per time, the energy audit
 * and the circuit model used.
 *
 * @param selfInductanceH per time (same order as {@code series}), closed loop id → L in henries;
 *        empty maps where it was not computed
 * @param freeBodies per time, the free bodies' states in scene order (empty lists without free bodies)
 * @param audit the run's energy audit, null for quasi-static instants
 * @param circuitModel the run's circuit model, null for quasi-static instants
 */
public record SolveResults(List<Snapshot> series, List<Map<String, Double>> selfInductanceH,
                           List<List<BodyState>> freeBodies, EnergyAudit audit, CircuitModel circuitModel) {

    /**
     * A free body at one time: where its pivot is, its angle, its pivot's velocity and its angular
     * speed (SI).
     */
    public record BodyState(String id, Vec2 positionM, double angleRad, Vec2 velocityMps, double omegaRadPerS) {
    }

    public SolveResults {
        series = List.copyOf(series);
        selfInductanceH = List.copyOf(selfInductanceH);
        freeBodies = List.copyOf(freeBodies);
        if (selfInductanceH.size() != series.size() || freeBodies.size() != series.size()) {
            throw new IllegalArgumentException("one inductance map and one body list per time are needed");
        }
    }

    /** Quasi-static instants with no body states and no audit. */
    public static SolveResults instants(List<Snapshot> series, List<Map<String, Double>> selfInductanceH) {
        return new SolveResults(series, selfInductanceH, series.stream().map(s -> List.<BodyState>of()).toList(),
                null, null);
    }

    /**
     * The coupled run of {@code scene} over [t0, t1] sampled every dt, at the default tolerance, as
     * {@code kinduct solve} does it for a time window.
     */
    public static SolveResults run(Scene scene, double t0S, double t1S, double dtS, CircuitModel model) {
        return of(scene, new CoupledSimulation(CoupledSimulation.DEFAULT_RELATIVE_TOLERANCE, model)
                .simulate(scene, t0S, t1S, dtS));
    }

    /** A coupled run of {@code scene}. */
    public static SolveResults of(Scene scene, Trajectory run) {
        List<Snapshot> series = new ArrayList<>();
        List<Map<String, Double>> inductance = new ArrayList<>();
        List<List<BodyState>> bodies = new ArrayList<>();
        for (Sample s : run.samples()) {
            series.add(new Snapshot(s.tS(), s.conductors()));
            inductance.add(s.selfInductanceH());
            List<BodyState> free = new ArrayList<>();
            for (Body b : scene.bodies()) {
                if (b.motion() instanceof Motion.Free) {
                    Pose p = s.pose(b.id());
                    free.add(new BodyState(b.id(), p.pivot().plus(p.offset()), p.angleRad(), p.velocity(),
                            p.omegaRadPerS()));
                }
            }
            bodies.add(free);
        }
        return new SolveResults(series, inductance, bodies, run.audit(), run.circuitModel());
    }

    /** Self-inductance of conductor {@code id} at time index {@code i}, henries; NaN where not known. */
    public double inductanceH(int i, String id) {
        Double l = selfInductanceH.get(i).get(id);
        return l == null ? Double.NaN : l;
    }

    /** True when any free body moves in this run. */
    public boolean hasFreeBodies() {
        return freeBodies.stream().anyMatch(b -> !b.isEmpty());
    }
}

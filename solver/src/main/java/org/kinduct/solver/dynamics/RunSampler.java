package org.kinduct.solver.dynamics;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;
import org.kinduct.scene.Body;
import org.kinduct.scene.Pose;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.Snapshot;

/**
 * The step handler that makes a run's samples as the integrator passes their times, from its
 * dense output: free bodies' poses from the state, conductor states from the quasi-static solver
 * run on the integrated motion (EMF by both methods, flux, resistance, wires and open loops as
 * there), with each closed loop's current and force replaced by the coupled ones (its sense by
 * the one rule, {@link ConductorState#withCurrent}), and every closed loop's self-inductance where
 * it is now.
 */
final class RunSampler implements ODEStepHandler {

    private final CoupledEquations equations;
    private final SampleTimes times;
    private final Map<String, Integer> loopIndex = new HashMap<>();
    private final List<Snapshot> samples;
    private final List<Snapshot> extras = new ArrayList<>();
    private int next;

    RunSampler(CoupledEquations equations, SampleTimes times) {
        this.equations = equations;
        this.times = times;
        samples = new ArrayList<>(times.gridCount());
        LoopCircuits circuits = equations.circuits();
        for (int k = 0; k < circuits.count(); k++) {
            loopIndex.put(circuits.loop(k).id(), k);
        }
    }

    @Override
    public void handleStep(ODEStateInterpolator step) {
        // The integrator ends exactly at the last sample time, so every one is reached.
        double end = step.getCurrentState().getTime();
        for (; next < times.count() && times.time(next) <= end; next++) {
            double t = times.time(next);
            Snapshot sample = sample(t, step.getInterpolatedState(t).getPrimaryState());
            (times.onGrid(next) ? samples : extras).add(sample);
        }
    }

    /** The samples on the grid t0 + k·dt, in time order. */
    List<Snapshot> samples() {
        return samples;
    }

    /** The samples at the further instants, in time order. */
    List<Snapshot> extras() {
        return extras;
    }

    private Snapshot sample(double tS, double[] y) {
        CoupledEquations.Evaluation now = equations.evaluate(tS, y);
        FreeBodies bodies = equations.bodies();
        List<Body> sceneBodies = equations.index().scene().bodies();
        Map<String, Pose> free = new HashMap<>();
        for (int b = 0; b < bodies.count(); b++) {
            if (bodies.isFree(b)) {
                free.put(sceneBodies.get(b).id(), now.poses()[b]);
            }
        }
        // The quasi-static model's evaluation has no inductance matrix: it is computed here for the report.
        double[][] inductance = now.inductance() != null ? now.inductance()
                : equations.circuits().inductance(now.poses());
        Snapshot quasiStatic = new SceneSolver(equations.index().scene(), bodies.kinematicsAround(tS, now.poses()))
                .at(tS);
        List<ConductorState> states = new ArrayList<>();
        for (ConductorState c : quasiStatic.conductors()) {
            Integer k = loopIndex.get(c.id());
            states.add(k == null ? c
                    : c.withInductance(inductance[k][k]).withCurrent(now.current()[k], now.loopForce()[k]));
        }
        return new Snapshot(tS, states, free);
    }
}

package org.kinduct.study;

import java.util.List;
import org.kinduct.report.metrics.Metric;
import org.kinduct.scene.Checks;
import org.kinduct.scene.Scene;
import org.kinduct.solver.dynamics.CircuitModel;

/**
 * What to optimise: the scene, the values to choose within their bounds, the metric to maximise
 * or minimise, the constraints on other metrics, the samples the metrics read (from
 * {@code fromS}), the circuit model, the method, and the most runs to spend.
 */
public record Optimisation(Scene scene, List<Bound> bounds, Metric goal, boolean maximise, List<Constraint> constraints,
                           double fromS, CircuitModel circuit, Method method, int maxEvaluations) {

    /** Most runs one optimisation may spend. */
    public static final int MAX_EVALUATIONS = 100_000;

    /** The search: Brent's method for one value, BOBYQA or CMA-ES (Hipparchus) for several. */
    public enum Method {
        /** BOBYQA for two or more values, Brent for one (BOBYQA needs at least two). */
        AUTO,
        /** Powell's BOBYQA: quadratic models in a trust region, within the bounds. */
        BOBYQA,
        /** Hansen's CMA-ES: an evolving population, robust on rough or many-peaked metrics. */
        CMAES
    }

    public Optimisation {
        Checks.nonNull(scene, "scene");
        bounds = List.copyOf(bounds);
        constraints = List.copyOf(constraints);
        Checks.nonNull(goal, "goal");
        Checks.nonNull(circuit, "circuit model");
        Checks.nonNull(method, "method");
        if (bounds.isEmpty()) {
            throw new IllegalArgumentException("an optimisation chooses at least one value (--vary PATH=LO..HI)");
        }
        if (method == Method.BOBYQA && bounds.size() < 2) {
            throw new IllegalArgumentException("BOBYQA needs at least two values to choose; for one, the default"
                    + " method uses Brent's");
        }
        if (maxEvaluations < 2 || maxEvaluations > MAX_EVALUATIONS) {
            throw new IllegalArgumentException("the number of runs must be 2 to " + MAX_EVALUATIONS + ", got "
                    + maxEvaluations);
        }
        for (int i = 0; i < bounds.size(); i++) {
            for (int j = 0; j < i; j++) {
                if (bounds.get(i).value().path().equals(bounds.get(j).value().path())) {
                    throw new IllegalArgumentException(bounds.get(i).value().path() + " is varied twice");
                }
            }
            Bound b = bounds.get(i);
            b.value().write(scene, b.lower());
            b.value().write(scene, b.upper());
        }
    }

    /** The scene with the bounded values set at search coordinates {@code u}. */
    Scene sceneAt(double[] u) {
        Scene s = scene;
        for (int i = 0; i < u.length; i++) {
            s = bounds.get(i).value().write(s, bounds.get(i).at(u[i]));
        }
        return s;
    }
}

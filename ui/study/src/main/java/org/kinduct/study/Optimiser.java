package org.kinduct.study;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.optim.InitialGuess;
import org.hipparchus.optim.MaxEval;
import org.hipparchus.optim.SimpleBounds;
import org.hipparchus.optim.nonlinear.scalar.GoalType;
import org.hipparchus.optim.nonlinear.scalar.ObjectiveFunction;
import org.hipparchus.optim.nonlinear.scalar.noderiv.BOBYQAOptimizer;
import org.hipparchus.optim.nonlinear.scalar.noderiv.CMAESOptimizer;
import org.hipparchus.optim.univariate.BrentOptimizer;
import org.hipparchus.optim.univariate.SearchInterval;
import org.hipparchus.optim.univariate.UnivariateObjectiveFunction;
import org.hipparchus.random.MersenneTwister;
import org.kinduct.report.metrics.Metric;
import org.kinduct.solver.PairMemo;
import org.kinduct.solver.dynamics.RunMonitor;

/**
 * Searches the bounded values for the best goal metric that meets the constraints, with
 * Hipparchus' derivative-free optimisers: Brent's method for one value (Brent, <i>Algorithms for
 * Minimization without Derivatives</i>, 1973), Powell's BOBYQA (Cambridge report DAMTP 2009/NA06)
 * or Hansen's CMA-ES for several. Every run is one {@code kinduct solve} of the edited scene.
 *
 * <p>The search sees the goal scaled by its value at the start, plus {@value #PENALTY} times the
 * square of each constraint's relative violation: a smooth penalty that BOBYQA's quadratic
 * models follow (an exact, kinked penalty stalled them on the limit), whose optimum breaks a
 * limit by about the multiplier over twice the weight, 1e-6 or less. A point the model refuses counts as
 * {@value #REFUSED}. The answer is the best evaluated point that meets every constraint, so what
 * is reported has been run and meets them whatever the search did.
 */
public final class Optimiser {

    /** Weight of the squared relative violation of a constraint against the goal's relative change. */
    static final double PENALTY = 1e6;
    /** Search value of a point the model refuses: far worse than any penalised point near the start. */
    static final double REFUSED = 1e6;
    /** Search coordinates are in [0, 1]; stop when they are known to this. */
    static final double U_TOLERANCE = 1e-7;
    /** BOBYQA's first trust-region radius in search coordinates: a fifth of each range. */
    static final double FIRST_RADIUS = 0.2;
    /** BOBYQA restarts from its best point, and their first radius in search coordinates. */
    static final int RESTARTS = 3;
    static final double RESTART_RADIUS = 0.01;
    /** CMA-ES: first step size in search coordinates, and the seed of its random numbers (runs repeat exactly). */
    static final double CMAES_SIGMA = 0.3;
    static final long CMAES_SEED = 20_260_101L;

    /** Told of every run, in order. */
    public interface Listener {
        void evaluated(Evaluation e);
    }

    /**
     * One run: the chosen values (SI), the goal and each constraint's metric (NaN when refused),
     * and whether it meets every constraint.
     */
    public record Evaluation(int number, double[] values, double goal, double[] constrained, boolean feasible,
                             String error) {
    }

    /** Every run in order, and the index of the best feasible one (−1 when none met the constraints). */
    public record Result(List<Evaluation> history, int best) {
        public Result {
            history = List.copyOf(history);
        }
    }

    private final Optimisation o;
    private final Listener listener;
    private final List<Evaluation> history = new ArrayList<>();
    private final Map<List<Double>, Double> seen = new HashMap<>();
    /** Integrals of the sources and loops the bounded values leave alone, shared by every evaluation. */
    private final PairMemo memo = new PairMemo();
    private double goalScale = Double.NaN;

    public Optimiser(Optimisation optimisation, Listener listener) {
        this.o = optimisation;
        this.listener = listener;
    }

    public Result run() {
        int n = o.bounds().size();
        double[] start = new double[n];
        Arrays.fill(start, 0.5);
        Optimisation.Method method = o.method() == Optimisation.Method.AUTO
                ? (n == 1 ? null : Optimisation.Method.BOBYQA) : o.method();
        try {
            if (method == null) {
                new BrentOptimizer(U_TOLERANCE, U_TOLERANCE).optimize(new MaxEval(o.maxEvaluations()),
                        new UnivariateObjectiveFunction(u -> searchValue(new double[] {u})), GoalType.MINIMIZE,
                        new SearchInterval(0, 1, 0.5));
            } else if (method == Optimisation.Method.BOBYQA) {
                bobyqa(start, FIRST_RADIUS);
                // Restarts from the best point with a small region: where a limit is active the
                // penalty's kink spoils the first quadratic models, and a fresh local model moves
                // along the limit again.
                for (int restart = 0; restart < RESTARTS && history.size() < o.maxEvaluations(); restart++) {
                    int before = history.size();
                    bobyqa(bestU(), RESTART_RADIUS);
                    if (history.size() == before) {
                        break;
                    }
                }
            } else {
                double[] sigma = new double[n];
                Arrays.fill(sigma, CMAES_SIGMA);
                new CMAESOptimizer(o.maxEvaluations(), Double.NEGATIVE_INFINITY, true, 0, 0,
                        new MersenneTwister(CMAES_SEED), false, (iteration, previous, current) ->
                        Math.abs(previous.getValue() - current.getValue()) <= 1e-9 * Math.abs(current.getValue()))
                        .optimize(new MaxEval(o.maxEvaluations()), new ObjectiveFunction(this::searchValue),
                                GoalType.MINIMIZE, new InitialGuess(start), unitBox(n),
                                new CMAESOptimizer.Sigma(sigma), new CMAESOptimizer.PopulationSize(4 + (int) (3 * Math.log(n))));
            }
        } catch (MathIllegalStateException budgetSpent) {
            // The run budget is spent: the best point evaluated so far is the answer.
        }
        return new Result(history, best());
    }

    private void bobyqa(double[] start, double radius) {
        int n = start.length;
        new BOBYQAOptimizer(2 * n + 1, radius, U_TOLERANCE).optimize(new MaxEval(o.maxEvaluations() - history.size()),
                new ObjectiveFunction(this::searchValue), GoalType.MINIMIZE, new InitialGuess(start), unitBox(n));
    }

    /** Search coordinates of the point with the lowest search value so far. */
    private double[] bestU() {
        List<Double> best = null;
        for (Map.Entry<List<Double>, Double> e : seen.entrySet()) {
            if (best == null || e.getValue() < seen.get(best)) {
                best = e.getKey();
            }
        }
        return best.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static SimpleBounds unitBox(int n) {
        double[] lo = new double[n];
        double[] hi = new double[n];
        Arrays.fill(hi, 1);
        return new SimpleBounds(lo, hi);
    }

    /** The value the search minimises at search coordinates u; each distinct u is run once. */
    private double searchValue(double[] u) {
        List<Double> key = Arrays.stream(u).boxed().toList();
        Double known = seen.get(key);
        if (known != null) {
            return known;
        }
        Evaluation e = evaluate(u);
        double value;
        if (e.error() != null) {
            value = REFUSED;
        } else {
            if (Double.isNaN(goalScale)) {
                goalScale = Math.abs(e.goal()) > 0 ? Math.abs(e.goal()) : 1;
            }
            value = (o.maximise() ? -e.goal() : e.goal()) / goalScale;
            if (Double.isNaN(value)) {
                value = REFUSED;
            }
            for (int c = 0; c < o.constraints().size(); c++) {
                double v = o.constraints().get(c).violation(e.constrained()[c]);
                value += PENALTY * v * v;
            }
        }
        seen.put(key, value);
        return value;
    }

    private Evaluation evaluate(double[] u) {
        double[] values = new double[u.length];
        for (int i = 0; i < u.length; i++) {
            values[i] = o.bounds().get(i).at(u[i]);
        }
        List<Metric> metrics = new ArrayList<>();
        metrics.add(o.goal());
        o.constraints().forEach(c -> metrics.add(c.metric()));
        Evaluation e;
        try {
            double[] read = PointRun.read(o.sceneAt(u), metrics, o.fromS(), o.circuit(), RunMonitor.NONE, true,
                    memo);
            double[] constrained = Arrays.copyOfRange(read, 1, read.length);
            boolean feasible = !Double.isNaN(read[0]);
            for (int c = 0; c < constrained.length; c++) {
                feasible &= o.constraints().get(c).met(constrained[c]);
            }
            e = new Evaluation(history.size() + 1, values, read[0], constrained, feasible, null);
        } catch (IllegalArgumentException refused) {
            double[] none = new double[o.constraints().size()];
            Arrays.fill(none, Double.NaN);
            e = new Evaluation(history.size() + 1, values, Double.NaN, none, false, refused.getMessage());
        }
        history.add(e);
        listener.evaluated(e);
        return e;
    }

    private int best() {
        int best = -1;
        for (int i = 0; i < history.size(); i++) {
            Evaluation e = history.get(i);
            if (e.feasible() && (best < 0 || (o.maximise() ? e.goal() > history.get(best).goal()
                    : e.goal() < history.get(best).goal()))) {
                best = i;
            }
        }
        return best;
    }
}

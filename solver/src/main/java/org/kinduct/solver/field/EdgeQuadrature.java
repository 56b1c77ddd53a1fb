package org.kinduct.solver.field;

import java.util.Arrays;

/**
 * Globally adaptive Gauss–Kronrod integration along straight edges: one open segment, or all
 * edges of a closed polygon at once.
 *
 * <p>Each panel is integrated with the 21-point Kronrod rule and its embedded 10-point Gauss
 * rule (nodes and weights of QUADPACK's {@code qk21}: R. Piessens, E. de Doncker-Kapenga,
 * C. W. Überhuber &amp; D. K. Kahaner, <i>QUADPACK</i>, Springer 1983), or, where the caller states
 * that the integrand's singularities keep at least three panel lengths away
 * ({@link Breaks#clearanceM}: a magnet off the plane, a coil), with the 15-point pair of {@code qk15}
 * (a third fewer evaluations for the same accuracy there; see {@code panel}). The panel's error estimate
 * is |Kronrod − Gauss| (pessimistic: the Gauss rule's error, while the Kronrod value is returned)
 * plus a guard for the slivers between the outermost nodes and the panel's ends, where a jump is
 * invisible to both rules: f is also evaluated at both ends and compared with the polynomial
 * through the 21 nodes. The panel with the largest estimate is bisected until the summed estimate
 * is at most {@code relativeTolerance}·|integral|, or the evaluation budget is spent (QUADPACK's
 * globally adaptive scheme QAG, without its error rescaling and extrapolation); halves that
 * claim far less error than the change they made to their parent's value inherit that change as
 * their estimate. Hipparchus' iterative Legendre–Gauss integrator refines uniformly over the
 * whole interval, which wastes most of a budget on a polygon whose trouble sits near one point
 * (an edge passing just over a coil filament or a magnet's edge), and has no embedded error
 * estimate; hence this small integrator.
 *
 * <p>Accuracy: for integrands analytic near the edge (sources at a distance from the plane
 * comparable to the panel lengths) the error is far below the tolerance. Peaks of width w on the
 * edge (a filament at height w) are resolved by bisection down to panels ~w long, which costs
 * about 46·log2(edge/w) evaluations. Integrable singularities (a magnet face lying in the plane:
 * jumps of B_z and logarithmic kinks of A at the footprint's edges) converge only linearly in the
 * panel size. Where the caller knows them ({@link Breaks}), the first panels end at those points, so
 * the trouble sits at panel ends, where bisection resolves it in a few dozen evaluations and the
 * panels move with it as the path moves (a difference in time of such integrals then stays
 * smooth). Otherwise such integrals stop at the budget with the error reported in
 * {@link Estimate#errorEstimate()}. When the integral cancels to well below the size of its parts
 * (a loop far from the source), the tolerance is floored at {@value #CANCELLATION_FLOOR} times the
 * sum of the parts' magnitudes, the most that rounding of the integrand allows.
 */
public final class EdgeQuadrature {

    /** Tolerance and budget the plane fields use: about 1e-10 relative. */
    public static final EdgeQuadrature STANDARD = new EdgeQuadrature(1e-10, 20_000);

    /** Points of the larger Kronrod rule. */
    static final int KRONROD_POINTS = 21;
    /** Evaluations of a panel at most: the larger rule's points and the two ends. */
    static final int PANEL_EVALUATIONS = KRONROD_POINTS + 2;
    /** Relative rounding level of the integrands (closed forms of a few ulp, summed). */
    static final double CANCELLATION_FLOOR = 1e-13;
    /** A panel shorter than this (in the edge parameter s ∈ [0, 1]) is not bisected further. */
    private static final double SMALLEST_PANEL = 1e-13;
    /** Kronrod abscissae on [−1, 1], non-negative half; the odd entries are the Gauss nodes (qk21). */
    private static final double[] XGK = {
        0.995657163025808080735527280689003, 0.973906528517171720077964012084452,
        0.930157491355708226001207180059508, 0.865063366688984510732096688423493,
        0.780817726586416897063717578345042, 0.679409568299024406234327365114874,
        0.562757134668604683339000099272694, 0.433395394129247190799265943165784,
        0.294392862701460198131126603103866, 0.148874338981631210884826001129720, 0};
    private static final double[] WGK = {
        0.011694638867371874278064396062192, 0.032558162307964727478818972459390,
        0.054755896574351996031381300244580, 0.075039674810919952767043140916190,
        0.093125454583697605535065465083366, 0.109387158802297641899210590325805,
        0.123491976262065851077958109831074, 0.134709217311473325928054001771707,
        0.142775938577060080797094273138717, 0.147739104901338491374841515972068,
        0.149445554002916905664936468389821};
    /** Gauss weights for XGK[1], XGK[3], ..., XGK[9]. */
    private static final double[] WG = {
        0.066671344308688137593568809893332, 0.149451349150580593145776339657697,
        0.219086362515982043995534934228163, 0.269266719309996355091226921569469,
        0.295524224714752870173892994651338};

    /** Kronrod abscissae of the 15-point rule, non-negative half; the odd entries are the 7-point Gauss nodes (qk15). */
    private static final double[] XGK15 = {
        0.991455371120812639206854697526329, 0.949107912342758524526189684047851,
        0.864864423359769072789712788640926, 0.741531185599394439863864773280788,
        0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
        0.207784955007898467600689403773245, 0};
    private static final double[] WGK15 = {
        0.022935322010529224963732008058970, 0.063092092629978553290700663189204,
        0.104790010322250183839876322541518, 0.140653259715525918745189590510238,
        0.169004726639267902826583426598550, 0.190350578064785409913256402421014,
        0.204432940075298892414161999234649, 0.209482141084727828012999174891714};
    /** Gauss weights for XGK15[1], XGK15[3], XGK15[5] and the centre. */
    private static final double[] WG7 = {
        0.129484966168869693270611432679082, 0.279705391489276667901467771423780,
        0.381830050505118944950369775488975, 0.417959183673469387755102040816327};

    /** The 21-point rule, with the guard at the panel's ends. */
    static final Rule K21 = new Rule(XGK, WGK, WG);
    /** The 15-point rule, for panels far from the integrand's singularities ({@link Breaks#clearanceM}). */
    static final Rule K15 = new Rule(XGK15, WGK15, WG7);

    /**
     * A Gauss–Kronrod pair on [−1, 1]: the Kronrod nodes in ascending order with both rules' weights
     * in that order (zero Gauss weight at the Kronrod-only nodes), and L_j(1), the Lagrange basis
     * polynomials of the nodes at the upper end (for the guard).
     */
    static final class Rule {
        final int points;
        final double[] nodes;
        final double[] kronrodWeights;
        final double[] gaussWeights;
        final double[] upperEndLagrange;
        /** The outermost node: the slivers between it and the ends are 1 − outermost wide. */
        final double outermost;

        /** From QUADPACK's tables: non-negative Kronrod abscissae, largest first, their weights, and the Gauss weights. */
        private Rule(double[] xgk, double[] wgk, double[] wg) {
            points = 2 * xgk.length - 1;
            nodes = new double[points];
            kronrodWeights = new double[points];
            gaussWeights = new double[points];
            upperEndLagrange = new double[points];
            outermost = xgk[0];
            for (int j = 0; j < xgk.length; j++) {
                int below = j;
                int above = points - 1 - j;
                nodes[below] = -xgk[j];
                nodes[above] = xgk[j];
                kronrodWeights[below] = wgk[j];
                kronrodWeights[above] = wgk[j];
                double gauss = j % 2 == 1 ? wg[j / 2] : 0;
                gaussWeights[below] = gauss;
                gaussWeights[above] = gauss;
            }
            for (int j = 0; j < points; j++) {
                double basis = 1;
                for (int m = 0; m < points; m++) {
                    if (m != j) {
                        basis *= (1 - nodes[m]) / (nodes[j] - nodes[m]);
                    }
                }
                upperEndLagrange[j] = basis;
            }
        }
    }

    /** The integrand along an edge. */
    @FunctionalInterface
    public interface EdgeIntegrand {
        /**
         * Value at (x, y) on an edge whose vector (end − start) is (dx, dy), metres; for a line
         * integral of a vector field V, return V·(dx, dy) so that ∫₀¹ f ds = ∫ V·dl.
         */
        double value(double x, double y, double dx, double dy);
    }

    /** Where the integrand jumps or kinks along an edge, known to the caller. */
    @FunctionalInterface
    public interface Breaks {
        /** No known trouble anywhere. */
        Breaks NONE = (ax, ay, bx, by) -> NO_BREAKS;

        /** Parameters s in (0, 1), ascending, of the trouble on the segment from (ax, ay) to (bx, by). */
        double[] along(double ax, double ay, double bx, double by);

        /**
         * A lower bound on the distance, metres, from the segment to the nearest point where the
         * integrand stops being analytic (a source's currents or charges); 0 when unknown. A panel
         * at least its own length from that point has no jump or spike for the end guard to catch,
         * and one at least {@value EdgeQuadrature#FAR_PANELS} lengths away is integrated by the 15-point rule
         * (see {@link EdgeQuadrature}).
         */
        default double clearanceM(double ax, double ay, double bx, double by) {
            return 0;
        }
    }

    /** Panel lengths of clearance from which the 15-point rule is used. */
    static final double FAR_PANELS = 3;

    private static final double[] NO_BREAKS = {};

    /** Several integrands along an edge at once, sharing their evaluation at each node. */
    @FunctionalInterface
    public interface EdgeIntegrands {
        /**
         * Writes the integrands' values at (x, y) on an edge whose vector is (dx, dy) to
         * {@code out[0..components-1]}; see {@link EdgeIntegrand}.
         */
        void values(double x, double y, double dx, double dy, double[] out);
    }

    /**
     * A line integral over a polygon's edges, with its first moment and error estimate.
     *
     * @param value ∫₀¹ f ds summed over the edges
     * @param firstMoment ∫₀¹ s·f ds summed over the edges (s the parameter along each edge)
     * @param errorEstimate estimated absolute error of {@code value} (and of the first moment,
     *                      when that was controlled)
     * @param evaluations integrand evaluations spent
     * @param converged false when the budget ran out before the tolerance was met
     */
    public record Estimate(double value, double firstMoment, double errorEstimate, int evaluations,
                           boolean converged) {
    }

    private final double relativeTolerance;
    private final int maxEvaluations;

    /**
     * @param relativeTolerance target relative error, in (0, 1)
     * @param maxEvaluations evaluation budget for the refinement; the first pass ({@value #PANEL_EVALUATIONS}
     *                       evaluations per edge) is always made
     */
    public EdgeQuadrature(double relativeTolerance, int maxEvaluations) {
        if (!(relativeTolerance > 0 && relativeTolerance < 1)) {
            throw new IllegalArgumentException("relative tolerance must lie in (0, 1), got " + relativeTolerance);
        }
        if (maxEvaluations < PANEL_EVALUATIONS) {
            throw new IllegalArgumentException("evaluation budget must be at least " + PANEL_EVALUATIONS + ", got "
                    + maxEvaluations);
        }
        this.relativeTolerance = relativeTolerance;
        this.maxEvaluations = maxEvaluations;
    }

    /** Σ over the edges of the closed polygon (vertex i to i + 1, last back to first) of ∫₀¹ f ds. */
    public Estimate closedPath(EdgeIntegrand f, double[] xs, double[] ys) {
        return closedPath(f, xs, ys, Breaks.NONE);
    }

    /** As {@link #closedPath(EdgeIntegrand, double[], double[])}, with the first panels split at {@code breaks}. */
    public Estimate closedPath(EdgeIntegrand f, double[] xs, double[] ys, Breaks breaks) {
        requireClosedPath(xs, ys);
        Run run = new Run(scalar(f), 1, xs, ys, xs.length, false, breaks);
        return run.integrate();
    }

    /**
     * Σ over the edges of the closed polygon of ∫₀¹ f_c ds for each of {@code out.length}
     * integrands at once, written to {@code out}. Each integral meets the tolerance on its own
     * (relative to its value, or to {@value #CANCELLATION_FLOOR} times the sum of its parts'
     * magnitudes); the panel refined next is the one furthest over any integrand's share.
     *
     * @return the first integrand's estimate; converged only when every integrand's is
     */
    public Estimate closedPath(EdgeIntegrands f, double[] xs, double[] ys, double[] out) {
        return closedPath(f, xs, ys, out, Breaks.NONE);
    }

    /** As {@link #closedPath(EdgeIntegrands, double[], double[], double[])}, with the first panels split at {@code breaks}. */
    public Estimate closedPath(EdgeIntegrands f, double[] xs, double[] ys, double[] out, Breaks breaks) {
        requireClosedPath(xs, ys);
        Run run = new Run(f, out.length, xs, ys, xs.length, false, breaks);
        Estimate first = run.integrate();
        System.arraycopy(run.sums0, 0, out, 0, out.length);
        return first;
    }

    /**
     * ∫₀¹ f ds and ∫₀¹ s·f ds along the segment from (ax, ay) to (bx, by); the error of both
     * moments is controlled.
     */
    public Estimate segment(EdgeIntegrand f, double ax, double ay, double bx, double by) {
        return segment(f, ax, ay, bx, by, Breaks.NONE);
    }

    /** As {@link #segment(EdgeIntegrand, double, double, double, double)}, with the first panels split at {@code breaks}. */
    public Estimate segment(EdgeIntegrand f, double ax, double ay, double bx, double by, Breaks breaks) {
        return new Run(scalar(f), 1, new double[] {ax, bx}, new double[] {ay, by}, 1, true, breaks).integrate();
    }

    private static EdgeIntegrands scalar(EdgeIntegrand f) {
        return (x, y, dx, dy, out) -> out[0] = f.value(x, y, dx, dy);
    }

    private static void requireClosedPath(double[] xs, double[] ys) {
        if (xs.length != ys.length || xs.length < 2) {
            throw new IllegalArgumentException("a closed path needs matching coordinate arrays of at least 2 "
                    + "vertices, got " + xs.length + " x and " + ys.length + " y");
        }
    }

    /**
     * QUADPACK's test for an integrand whose rounding noise, not the rule, limits the error
     * (routine {@code dqage}, its {@code iroff1}/{@code iroff2} counters and error flag 2; Piessens
     * et al. 1983, §4.3): a bisection that changes the panel's value by no more than 1e-5 of it
     * while removing less than 1 % of its error, six times, or that raises the error, twenty times
     * once ten panels exist, means that further bisection only samples the noise. The integral is
     * then as good as its integrand allows and is returned as not converged, instead of spending
     * the budget (closed-form fields far from their source lose digits to cancellation; a loop a
     * few hundred millimetres from a magnet spent 20 000 evaluations per integral on that noise).
     */
    private static final class Roundoff {
        private int unchanged;
        private int growing;

        /**
         * @param resolved false when a half's error estimate is as large as its integral of |f|
         *        (the rule sees nothing yet; QUADPACK's {@code defabs} guard)
         */
        void bisected(double parentValue, double parentError, double halvesValue, double halvesError,
                      boolean resolved, int panels) {
            if (!resolved) {
                return;
            }
            if (Math.abs(parentValue - halvesValue) <= 1e-5 * Math.abs(halvesValue) && halvesError >= 0.99 * parentError) {
                unchanged++;
            }
            if (panels > 10 && halvesError > parentError) {
                growing++;
            }
        }

        boolean detected() {
            return unchanged >= 6 || growing >= 20;
        }
    }

    /**
     * The state of one integration; panels live in parallel primitive arrays, the values of the
     * {@code k} integrands of panel i at [i·k, i·k + k).
     */
    private final class Run {
        private final EdgeIntegrands f;
        private final int k;
        private final double[] xs;
        private final double[] ys;
        private final int edges;
        private final boolean controlFirstMoment;
        private final Breaks breaks;
        /** Per edge, its length and its clearance from the integrand's singularities, metres. */
        private final double[] edgeLength;
        private final double[] clearance;
        private final Roundoff roundoff = new Roundoff();
        private int evaluations;

        private int count;
        private int[] edge;
        private double[] lo;
        private double[] hi;
        private double[] moment0;
        private double[] moment1;
        private double[] magnitude;
        private double[] error;
        private final double[] nodeValues;
        private final double[] point;
        private final double[] k0;
        private final double[] k1;
        private final double[] g0;
        private final double[] g1;
        private final double[] abs;
        private final double[] atLo;
        private final double[] atHi;
        final double[] sums0;
        private final double[] sums1;
        private final double[] parts;
        private final double[] totalError;

        Run(EdgeIntegrands f, int k, double[] xs, double[] ys, int edges, boolean controlFirstMoment, Breaks breaks) {
            this.f = f;
            this.breaks = breaks;
            this.k = k;
            this.xs = xs;
            this.ys = ys;
            this.edges = edges;
            this.controlFirstMoment = controlFirstMoment;
            edgeLength = new double[edges];
            clearance = new double[edges];
            for (int e = 0; e < edges; e++) {
                int next = e + 1 == xs.length ? 0 : e + 1;
                double dx = xs[next] - xs[e];
                double dy = ys[next] - ys[e];
                edgeLength[e] = Math.sqrt(dx * dx + dy * dy);
                clearance[e] = breaks.clearanceM(xs[e], ys[e], xs[next], ys[next]);
            }
            int capacity = 2 * edges + 2;
            edge = new int[capacity];
            lo = new double[capacity];
            hi = new double[capacity];
            moment0 = new double[capacity * k];
            moment1 = new double[capacity * k];
            magnitude = new double[capacity * k];
            error = new double[capacity * k];
            nodeValues = new double[KRONROD_POINTS * k];
            point = new double[k];
            k0 = new double[k];
            k1 = new double[k];
            g0 = new double[k];
            g1 = new double[k];
            abs = new double[k];
            atLo = new double[k];
            atHi = new double[k];
            sums0 = new double[k];
            sums1 = new double[k];
            parts = new double[k];
            totalError = new double[k];
        }

        Estimate integrate() {
            Estimate estimate = refine();
            WorkTally.add(evaluations);
            return estimate;
        }

        private Estimate refine() {
            for (int e = 0; e < edges; e++) {
                int next = e + 1 == xs.length ? 0 : e + 1;
                double start = 0;
                for (double s : breaks.along(xs[e], ys[e], xs[next], ys[next])) {
                    if (count == edge.length) {
                        grow();
                    }
                    panel(count++, e, start, s);
                    start = s;
                }
                if (count == edge.length) {
                    grow();
                }
                panel(count++, e, start, 1);
            }
            while (true) {
                Arrays.fill(sums0, 0);
                Arrays.fill(sums1, 0);
                Arrays.fill(parts, 0);
                Arrays.fill(totalError, 0);
                for (int i = 0; i < count; i++) {
                    for (int c = 0; c < k; c++) {
                        int at = i * k + c;
                        sums0[c] += moment0[at];
                        sums1[c] += moment1[at];
                        parts[c] += magnitude[at];
                        totalError[c] += error[at];
                    }
                }
                boolean met = true;
                double worstShare = -1;
                int worst = -1;
                int worstIntegrand = 0;
                for (int c = 0; c < k; c++) {
                    double scale = controlFirstMoment ? Math.abs(sums0[c]) + Math.abs(sums1[c]) : Math.abs(sums0[c]);
                    double tolerance = Math.max(relativeTolerance * scale, CANCELLATION_FLOOR * parts[c]);
                    met &= totalError[c] <= tolerance;
                    for (int i = 0; i < count; i++) {
                        double e = error[i * k + c];
                        double panelShare = e == 0 ? 0 : e / tolerance;
                        if (panelShare > worstShare && hi[i] - lo[i] > SMALLEST_PANEL) {
                            worstShare = panelShare;
                            worst = i;
                            worstIntegrand = c;
                        }
                    }
                }
                if (met) {
                    return new Estimate(sums0[0], sums1[0], totalError[0], evaluations, true);
                }
                if (worst < 0 || evaluations + 2 * PANEL_EVALUATIONS > maxEvaluations || roundoff.detected()) {
                    return new Estimate(sums0[0], sums1[0], totalError[0], evaluations, false);
                }
                int at = worst * k + worstIntegrand;
                double parentValue = moment0[at];
                double parentError = error[at];
                int right = split(worst);
                int left = worst * k + worstIntegrand;
                int added = right * k + worstIntegrand;
                roundoff.bisected(parentValue, parentError, moment0[left] + moment0[added], error[left] + error[added],
                        error[left] < magnitude[left] && error[added] < magnitude[added], count);
            }
        }

        /** Bisects panel {@code i} into itself and a new panel; returns the new panel's index. */
        private int split(int i) {
            int e = edge[i];
            double a = lo[i];
            double b = hi[i];
            double mid = 0.5 * (a + b);
            if (count == edge.length) {
                grow();
            }
            double[] parent0 = Arrays.copyOfRange(moment0, i * k, i * k + k);
            double[] parent1 = Arrays.copyOfRange(moment1, i * k, i * k + k);
            int right = count++;
            panel(i, e, a, mid);
            panel(right, e, mid, b);
            for (int c = 0; c < k; c++) {
                distrustSilentHalves(i * k + c, right * k + c, parent0[c], parent1[c]);
            }
            return right;
        }

        /**
         * A jump or spike between a panel's outermost node and its end is invisible to both rules
         * (both report zero error). When the halves of a split panel claim far less error than
         * the change their sum made to the parent's value, that change is the better estimate, so
         * each half carries half of it and is looked at again.
         */
        private void distrustSilentHalves(int left, int right, double parent0, double parent1) {
            double change = Math.abs(parent0 - moment0[left] - moment0[right]);
            if (controlFirstMoment) {
                change += Math.abs(parent1 - moment1[left] - moment1[right]);
            }
            if (change > 2 * (error[left] + error[right])) {
                error[left] = Math.max(error[left], change / 2);
                error[right] = Math.max(error[right], change / 2);
            }
        }

        /**
         * Kronrod and Gauss rules on [a, b] of edge e, stored as panel i. The error estimate is
         * |Kronrod − Gauss| plus a bound on what both rules miss in the slivers between the
         * outermost nodes and the ends: how far f at each end departs from the polynomial through
         * the nodes, times the sliver's width. For smooth f that departure is of the order of the
         * rule's own error; a jump in a sliver (invisible to both rules) shows up in full. A panel
         * whose edge keeps a clearance of at least its length from the integrand's singularities
         * skips that guard (f is analytic on a disc around every point of it, so nothing hides in a
         * sliver), and at {@value EdgeQuadrature#FAR_PANELS} lengths it takes the 15-point rule:
         * f is then analytic inside the Bernstein ellipse of parameter ρ ≥ 6 + √37 ≈ 12 around
         * the panel, where the 7-point Gauss rule's error is below 5·M·ρ^−14/(ρ² − 1) ≈ 2e-17·M,
         * M the largest |f| there (L. N. Trefethen, "Is Gauss quadrature better than
         * Clenshaw–Curtis?", SIAM Rev. 50(1), 2008, Theorem 4.5), so its estimate |K15 − G7|
         * passes at once and the Kronrod value is better still.
         */
        private void panel(int i, int e, double a, double b) {
            int next = e + 1 == xs.length ? 0 : e + 1;
            double x0 = xs[e];
            double y0 = ys[e];
            double dx = xs[next] - x0;
            double dy = ys[next] - y0;
            double centre = 0.5 * (a + b);
            double half = 0.5 * (b - a);
            double panelM = (b - a) * edgeLength[e];
            boolean guarded = !(clearance[e] >= panelM);
            Rule rule = clearance[e] >= FAR_PANELS * panelM ? K15 : K21;
            Arrays.fill(k0, 0);
            Arrays.fill(k1, 0);
            Arrays.fill(g0, 0);
            Arrays.fill(g1, 0);
            Arrays.fill(abs, 0);
            for (int j = 0; j < rule.points; j++) {
                double s = centre + half * rule.nodes[j];
                f.values(x0 + s * dx, y0 + s * dy, dx, dy, point);
                double wk = rule.kronrodWeights[j];
                double wg = rule.gaussWeights[j];
                for (int c = 0; c < k; c++) {
                    double v = point[c];
                    nodeValues[j * k + c] = v;
                    k0[c] += wk * v;
                    k1[c] += wk * s * v;
                    abs[c] += wk * Math.abs(v);
                    g0[c] += wg * v;
                    g1[c] += wg * s * v;
                }
            }
            evaluations += rule.points;
            Arrays.fill(atLo, 0);
            Arrays.fill(atHi, 0);
            if (guarded) {
                guard(rule, x0 + a * dx, y0 + a * dy, x0 + b * dx, y0 + b * dy, dx, dy);
            }
            edge[i] = e;
            lo[i] = a;
            hi[i] = b;
            for (int c = 0; c < k; c++) {
                double missed = (1 - rule.outermost) * half * (atLo[c] + atHi[c]);
                int at = i * k + c;
                moment0[at] = k0[c] * half;
                moment1[at] = k1[c] * half;
                magnitude[at] = abs[c] * half;
                double err = Math.abs(k0[c] - g0[c]) * half + missed;
                // With s ≤ b ≤ 1 the first moment's sliver term is at most b times the zeroth's.
                error[at] = controlFirstMoment ? err + Math.abs(k1[c] - g1[c]) * half + b * missed : err;
            }
        }

        /**
         * The guard: f at both ends of the panel, (xa, ya) and (xb, yb), against the polynomial
         * through the nodes' values, into atLo and atHi as absolute departures.
         */
        private void guard(Rule rule, double xa, double ya, double xb, double yb, double dx, double dy) {
            int n = rule.points;
            for (int j = 0; j < n; j++) {
                double up = rule.upperEndLagrange[j];
                for (int c = 0; c < k; c++) {
                    atHi[c] += up * nodeValues[j * k + c];
                    atLo[c] += up * nodeValues[(n - 1 - j) * k + c];
                }
            }
            f.values(xa, ya, dx, dy, point);
            for (int c = 0; c < k; c++) {
                atLo[c] = Math.abs(point[c] - atLo[c]);
            }
            f.values(xb, yb, dx, dy, point);
            for (int c = 0; c < k; c++) {
                atHi[c] = Math.abs(point[c] - atHi[c]);
            }
            evaluations += 2;
        }

        private void grow() {
            int capacity = 2 * edge.length;
            edge = Arrays.copyOf(edge, capacity);
            lo = Arrays.copyOf(lo, capacity);
            hi = Arrays.copyOf(hi, capacity);
            moment0 = Arrays.copyOf(moment0, capacity * k);
            moment1 = Arrays.copyOf(moment1, capacity * k);
            magnitude = Arrays.copyOf(magnitude, capacity * k);
            error = Arrays.copyOf(error, capacity * k);
        }
    }
}

package org.kinduct.solver.sheet;

import org.kinduct.scene.Vec2;

/**
 * A transient run of a {@link Plate} in its own frame, any motion and any time-varying source
 * given as a {@link PlateSource}. Each mesh obeys R·ψ + d/dt(Φ_plate + Φ_sources) = 0, stepped by
 * the θ-method (Crank 1947 for θ = ½; e.g. Hairer &amp; Wanner, <i>Solving Ordinary Differential
 * Equations II</i>, 1996, §IV.3):
 * (L/Δt + θR)ψⁿ⁺¹ = (L/Δt − (1 − θ)R)ψⁿ − (Φ_sⁿ⁺¹ − Φ_sⁿ)/Δt, with L the plate's symmetric positive
 * definite inductance ({@link PlateKernel}) and R the mesh resistances, both symmetric positive:
 * unconditionally stable for θ ≥ ½ (A-stable), backward Euler (θ = 1) also damping the stiff
 * modes (L-stable). Both fluxes through mesh n are h² times B_z at the node (the plate's from
 * its sharpened kernel, see {@link PlateFieldOperator}): the lumped form of the finite-volume mesh
 * equation, second order. Each step is one flexible-GMRES solve started from the
 * previous ψ, preconditioned by the Fourier factor of the step and the resistive inverse.
 *
 * <p>Forces are in the plate's coordinates, from the sources' field at the filaments at the
 * step's end. Not thread-safe.
 */
public final class PlateTransient {

    private final Plate plate;
    private final PlateSource source;
    private final double theta;
    private double timeS;
    private double[] u;
    /** ψ one and two steps back, and the lengths of the steps that ended there, for the starting guess. */
    private double[] previous;
    private double previousDt = Double.NaN;
    private double[] beforePrevious;
    private double beforePreviousDt = Double.NaN;
    private double[] sourceFlux;
    private int lastIterations;
    private double lastResidual;
    private double cachedDt = Double.NaN;
    private Fgmres.Operator cachedPreconditioner;

    PlateTransient(Plate plate, PlateSource source, double t0S, double theta) {
        if (!(theta >= 0.5 && theta <= 1)) {
            throw new IllegalArgumentException("implicitness θ must lie in [½, 1] for stability, got " + theta);
        }
        if (!Double.isFinite(t0S)) {
            throw new IllegalArgumentException("start time must be finite, got " + t0S);
        }
        this.plate = plate;
        this.source = source;
        this.theta = theta;
        timeS = t0S;
        u = new double[plate.network.unknowns];
        sourceFlux = sourceFlux(t0S);
    }

    public double timeS() {
        return timeS;
    }

    /** Outer iterations of the last step. */
    public int lastIterations() {
        return lastIterations;
    }

    /**
     * Advances by one step.
     *
     * @param dtS step, seconds, positive
     * @return the state at the step's end
     */
    public PlateSolution step(double dtS) {
        advance(dtS);
        return state();
    }

    /**
     * Advances by one step without making the outputs ({@link #state()} makes them: one more FFT
     * convolution and the sources' field at every filament).
     */
    public void advance(double dtS) {
        if (!(dtS > 0) || !Double.isFinite(dtS)) {
            throw new IllegalArgumentException("time step must be positive and finite, got " + dtS + " s");
        }
        PlateNetwork network = plate.network;
        double[] next = sourceFlux(timeS + dtS);
        double resistance = 1 / (plate.conductor().sigmaSPerM() * plate.conductor().thicknessM());
        double[] psi = new double[network.nodeCount];
        double[] flux = new double[network.nodeCount];
        network.expand(u, psi);
        plate.field.apply(psi, flux);
        double[] b = new double[network.unknowns];
        network.gather(flux, b);
        for (int k = 0; k < b.length; k++) {
            b[k] = (b[k] - (next[k] - sourceFlux[k])) / dtS;
        }
        if (theta < 1) {
            network.addResistive(psi, -(1 - theta) * resistance, b);
        }
        Fgmres.Operator a = (x, y) -> {
            network.expand(x, psi);
            plate.field.apply(psi, flux);
            network.gather(flux, y);
            for (int k = 0; k < y.length; k++) {
                y[k] /= dtS;
            }
            network.addResistive(psi, theta * resistance, y);
        };
        if (dtS != cachedDt) {
            cachedPreconditioner = plate.stepPreconditioner(dtS, theta);
            cachedDt = dtS;
        }
        double[] x = startingGuess(dtS);
        PlateSolver settings = plate.settings();
        Fgmres.Outcome outcome = Fgmres.solve(a, cachedPreconditioner, b, x, settings.relativeTolerance(),
                settings.maxIterations(), plate.workspace(), "flexible GMRES (plate time step)");
        beforePrevious = previous;
        beforePreviousDt = previousDt;
        previous = u;
        previousDt = dtS;
        u = x;
        sourceFlux = next;
        timeS += dtS;
        lastIterations = outcome.iterations();
        lastResidual = outcome.relativeResidual();
    }

    /**
     * ψ extrapolated to the step's end through the last three states (a parabola) when the last two
     * steps were as long as this one, through the last two (a line) when the last one was, else ψ
     * now. The solve's tolerance does not depend on the guess; a smooth run's error after the
     * parabola is O(Δt³) instead of O(Δt²), which halved the outer iterations of a plate moving
     * under a magnet (6 to 3 on a 256² disc).
     */
    private double[] startingGuess(double dtS) {
        double[] x = u.clone();
        if (beforePrevious != null && dtS == previousDt && dtS == beforePreviousDt) {
            for (int k = 0; k < x.length; k++) {
                x[k] = 3 * (u[k] - previous[k]) + beforePrevious[k];
            }
        } else if (previous != null && dtS == previousDt) {
            for (int k = 0; k < x.length; k++) {
                x[k] += u[k] - previous[k];
            }
        }
        return x;
    }

    /** The state now: currents, the plate's field, the force of the sources' field. */
    public PlateSolution state() {
        PlateNetwork network = plate.network;
        double[] bz = new double[network.faceCount];
        for (int f = 0; f < bz.length; f++) {
            bz[f] = source.bzT(plate.faceX[f], plate.faceY[f], timeS);
        }
        return plate.solution(u, bz, Vec2.ZERO, EddyModel.SELF_FIELD, Double.NaN, lastIterations, lastResidual,
                null);
    }

    /** Flux of the sources through each unknown's meshes at time t, h²·B_z(node), webers. */
    private double[] sourceFlux(double t) {
        PlateNetwork network = plate.network;
        SheetGrid grid = plate.grid();
        double h = grid.cellM();
        double[] nodeFlux = new double[network.nodeCount];
        for (int j = 1; j < grid.ny(); j++) {
            double y = grid.originYM() + j * h;
            for (int i = 1; i < grid.nx(); i++) {
                int n = network.node(i, j);
                if (network.unknownOfNode[n] >= 0) {
                    nodeFlux[n] = h * h * source.bzT(grid.originXM() + i * h, y, t);
                }
            }
        }
        double[] flux = new double[network.unknowns];
        network.gather(nodeFlux, flux);
        return flux;
    }
}

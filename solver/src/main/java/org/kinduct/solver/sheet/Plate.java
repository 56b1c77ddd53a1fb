package org.kinduct.solver.sheet;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.PhysicalConstants;

/**
 * Eddy currents in a thin plate with the plate's own field, at any speed: a grid and material
 * prepared once (mesh network, FFT of the self-inductance kernel), then steady states for many
 * speeds or a transient run. Not thread-safe (it keeps work arrays); one per thread.
 *
 * <p>Model. In the plate (thickness d, conductivity σ) the sheet current is K = ∇ψ × ẑ =
 * (∂ψ/∂y, −∂ψ/∂x) with ψ in amperes, ψ = 0 on the outer edge and one constant in each hole (so
 * K·n = 0 on every edge and ∇·K = 0). Ohm's law in the moving material, K/(σd) = E + u × B, and
 * Faraday's law round any contour moving with the material, ∮(E + u × B)·dl = −d/dt ∫B_z dA
 * (Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013, §7.1.3), give
 * ∮ K·dl/(σd) = −dΦ/dt round every material loop, with B_z = B_z,sources + B_z,plate[ψ].
 *
 * <p>The plate's own field, and its sign. With the Fourier transform f̂(k) = ∫ f e^{−ik·r} d²r,
 * the vector potential of K δ(z) solves (∂²_z − k²)Â = −μ0 K̂ δ(z), so Â(k, z) = μ0 K̂
 * e^{−|k||z|}/(2|k|); B_z = ∂_x A_y − ∂_y A_x, and K̂ = (ik_yψ̂, −ik_xψ̂), so
 * B̂_z = ik_x Â_y − ik_y Â_x = μ0 e^{−|k||z|}(k_x² + k_y²)ψ̂/(2|k|) = +(μ0/2)|k| e^{−|k||z|} ψ̂.
 * A bump of positive ψ is a counter-clockwise current (K_y = −∂ψ/∂x &gt; 0 on its right flank),
 * whose field is +z inside, as the + sign says; ψ is the sheet's magnetic moment per unit area.
 * Lenz's law then follows from Faraday's: a rising B_z drives ψ &lt; 0 inside, whose field is −z
 * (checked by {@code PlateSelfFieldTest}). The total flux of the plate's field through its whole
 * plane is zero (the k = 0 value).
 *
 * <p>Discretization. ψ on the grid's nodes, each node a mesh of the cell-centre filaments of
 * {@link SheetSolver} ({@link PlateNetwork}): the resistive part is exactly the planar dual of the
 * cell-potential scheme, so at low speed this model and {@link SheetSolver} give the same currents.
 * The plate's flux through mesh n is taken with ψ spread as bilinear hats and weighted by the hat
 * of n: Φ_n = Σ L(n − m)ψ_m with the symmetric positive kernel of {@link PlateKernel}, applied as
 * an exact linear convolution by FFT ({@link PlateFieldOperator}); B_z of the plate at a node is
 * Φ_n/h² (its hat-weighted mean). Steady state in the sources' frame (uniform translation, or a
 * steady spin of a plate symmetric about its axis; for a finite plate translating, the geometry
 * is frozen at the instant, as in the resistive solve): the motional EMF of the total field
 * round each mesh, B_z at the midpoint of each filament (the plate's own field as the mean of the
 * two nodes there), gives (R − E_u·B_plate)·ψ = E_u·B_sources. Transient in the plate's frame:
 * R·ψ + d/dt(Φ_plate + Φ_sources) = 0, θ-method in time ({@link PlateTransient}).
 *
 * <p>Forces come from the sources' field only (a current exerts no net force on itself; the
 * discrete self-force of a translating plate is zero exactly, the plate's face field being an even
 * convolution), on the same filaments and samples as the EMFs, so for a steady rigid motion the
 * Joule power Σ R_f·I_f² equals the mechanical power −F·V − τ·ω to the solver's tolerance for
 * translation and to the grid's rotational asymmetry (measured, O(h²)) for spin.
 *
 * <p>Solver. Flexible GMRES ({@link Fgmres}), right-preconditioned by two steps: a Fourier
 * multiplier that inverts the motion term of an infinite sheet at the plate's B²-weighted mean
 * velocity (exactly the operator's symbol for uniform translation, wrong only near the edges),
 * then one multigrid V-cycle of the mesh resistances on the node grid
 * ({@link PlateNetwork#nodeResistive}). Measured on a 128² square plate under a dipole: 11–16
 * iterations for v/w ≤ 1, 24–38 for v/w from 3 to 100 (to 1e-8). Steady spin converges as
 * well up to a rim speed of about 2w and slowly above (the preconditioner is that of a
 * translation); a transient run reaches the steady spin there.
 *
 * <p>Model choice: below v/w = {@value #RESISTIVE_LIMIT_SPEED_RATIO} (v the fastest point of the
 * plate, w = 2/(μ0σd)) the own field changes the drag by less than (3/4)(v/w)² &lt; 1e-6 (Reitz's
 * law below), and {@link #steady(SheetDrive, Vec2)} uses the resistive limit; it reports which.
 *
 * <p>References: Reitz, J. Appl. Phys. 41, 2067 (1970), characteristic speed w and the drag and
 * lift of a magnet over a thin sheet; Maxwell, Proc. R. Soc. Lond. 20, 160 (1872), the receding
 * image of a suddenly applied field.
 */
public final class Plate {

    /** Below this v/w the steady solve takes the resistive limit. */
    public static final double RESISTIVE_LIMIT_SPEED_RATIO = 1e-3;

    private final SheetGrid grid;
    private final SheetConductor conductor;
    private final PlateSolver settings;
    final PlateNetwork network;
    final PlateFieldOperator field;
    /**
     * The time step's Fourier factor: circular, on a quarter of the exact operator's period. On a
     * 256² disc moving at w under a magnet (PlateSolverBenchmark) it took a step from 48 to 41 ms
     * (outer iterations 3 either way); the steady solves keep the exact period, as the circular
     * factor slowed the 40-speed curve from 9.7 to 10.7 s.
     */
    private final PlateFieldOperator stepFilter;
    /** Filament midpoints of the open faces, metres. */
    final double[] faceX;
    final double[] faceY;

    Plate(SheetGrid grid, SheetConductor conductor, PlateSolver settings) {
        this.grid = grid;
        this.conductor = conductor;
        this.settings = settings;
        network = new PlateNetwork(grid);
        field = new PlateFieldOperator(grid.nx(), grid.ny(), grid.cellM(), settings.padding());
        stepFilter = PlateFieldOperator.circular(grid.nx(), grid.ny(), grid.cellM());
        faceX = new double[network.faceCount];
        faceY = new double[network.faceCount];
        double h = grid.cellM();
        for (int f = 0; f < network.faceCount; f++) {
            int minus = network.minus[f];
            int i = minus % network.nodesX;
            int j = minus / network.nodesX;
            if (network.xFace[f]) {
                faceX[f] = grid.originXM() + i * h;
                faceY[f] = grid.originYM() + (j + 0.5) * h;
            } else {
                faceX[f] = grid.originXM() + (i - 0.5) * h;
                faceY[f] = grid.originYM() + j * h;
            }
        }
    }

    public SheetGrid grid() {
        return grid;
    }

    public SheetConductor conductor() {
        return conductor;
    }

    /** Characteristic speed w = 2/(μ0·σ·d) of the sheet, m/s (Reitz 1970). */
    public double characteristicSpeedMPerS() {
        return 2 / (PhysicalConstants.MU_0 * conductor.sigmaSPerM() * conductor.thicknessM());
    }

    /** Number of holes the grid resolves (each one unknown ψ). */
    public int holeCount() {
        return network.holes;
    }

    /** Steady state, the model chosen by v/w (see the class comment). */
    public PlateSolution steady(SheetDrive drive, Vec2 pivotM) {
        return steady(drive, pivotM, null, null);
    }

    /**
     * Steady state in the sources' frame.
     *
     * @param model the model to use, or null to choose by v/w
     * @param start a solution of this plate to start the iteration from (e.g. the previous speed
     *              of a sweep), or null
     */
    public PlateSolution steady(SheetDrive drive, Vec2 pivotM, EddyModel model, PlateSolution start) {
        return steadyFrom(drive, pivotM, model, start != null && start.plate() == this ? start.unknowns() : null);
    }

    /**
     * A force–speed curve: steady states at the given speeds (any order; sorted runs converge
     * fastest), each started from the previous two extrapolated linearly in speed (from the
     * previous one scaled by the speed ratio when there is only one). Each speed's model is chosen
     * by v/w as in {@link #steady(SheetDrive, Vec2)}.
     *
     * @param speedsMPerS the speeds, m/s
     * @param driveAtSpeed the drive at a speed (its fastest material speed should be that speed
     *                     for the model choice to mean what it says)
     */
    public List<PlateSolution> steadySweep(double[] speedsMPerS, DoubleFunction<SheetDrive> driveAtSpeed,
                                           Vec2 pivotM) {
        List<PlateSolution> solutions = new ArrayList<>(speedsMPerS.length);
        double[] previous = null;
        double previousSpeed = Double.NaN;
        double[] last = null;
        double lastSpeed = Double.NaN;
        for (double speed : speedsMPerS) {
            double[] guess = null;
            if (last != null && previous != null && lastSpeed != previousSpeed) {
                guess = new double[last.length];
                double slope = (speed - lastSpeed) / (lastSpeed - previousSpeed);
                for (int k = 0; k < guess.length; k++) {
                    guess[k] = last[k] + slope * (last[k] - previous[k]);
                }
            } else if (last != null && lastSpeed != 0) {
                guess = new double[last.length];
                for (int k = 0; k < guess.length; k++) {
                    guess[k] = last[k] * speed / lastSpeed;
                }
            }
            PlateSolution solution = steadyFrom(driveAtSpeed.apply(speed), pivotM, null, guess);
            solutions.add(solution);
            previous = last;
            previousSpeed = lastSpeed;
            last = solution.unknowns();
            lastSpeed = speed;
        }
        return solutions;
    }

    private PlateSolution steadyFrom(SheetDrive drive, Vec2 pivotM, EddyModel model, double[] guess) {
        double speedRatio = fastestSpeed(drive) / characteristicSpeedMPerS();
        EddyModel chosen = model != null ? model
                : speedRatio < RESISTIVE_LIMIT_SPEED_RATIO ? EddyModel.RESISTIVE_LIMIT : EddyModel.SELF_FIELD;
        FaceEmfs emfs = FaceEmfs.sample(grid, drive);
        int faces = network.faceCount;
        double[] emfExt = new double[faces];
        double[] bzExt = new double[faces];
        double[] flow = new double[faces];
        double h = grid.cellM();
        double weight = 0;
        double vx = 0;
        double vy = 0;
        double[] v = new double[2];
        for (int f = 0; f < faces; f++) {
            int k = network.familyIndex[f];
            emfExt[f] = network.xFace[f] ? emfs.emfX[k] : emfs.emfY[k];
            bzExt[f] = network.xFace[f] ? emfs.bzX[k] : emfs.bzY[k];
            double x = faceX[f];
            double y = faceY[f];
            flow[f] = network.xFace[f] ? drive.flowAcrossM2PerS(x - 0.5 * h, y, x + 0.5 * h, y)
                    : drive.flowAcrossM2PerS(x, y - 0.5 * h, x, y + 0.5 * h);
            drive.velocity(x, y, v);
            double w2 = bzExt[f] * bzExt[f] * network.open[f];
            weight += w2;
            vx += w2 * v[0];
            vy += w2 * v[1];
        }
        double[] u = new double[network.unknowns];
        int iterations;
        double residual;
        if (chosen == EddyModel.RESISTIVE_LIMIT) {
            SheetSolver resistive = new SheetSolver(SheetSolver.Method.MULTIGRID,
                    Math.max(settings.relativeTolerance() * 1e-2, 1e-14), 200);
            SheetSolution s = resistive.solve(grid, conductor, drive, pivotM, List.of());
            double[] nodes = new double[network.nodeCount];
            double d = conductor.thicknessM();
            for (int j = 0; j <= grid.ny(); j++) {
                for (int i = 0; i <= grid.nx(); i++) {
                    nodes[network.node(i, j)] = d * s.streamFunctionAPerM(i, j);
                }
            }
            for (int k = 0; k < network.unknowns; k++) {
                double sum = 0;
                for (int n : network.members[k]) {
                    sum += nodes[n];
                }
                u[k] = sum / network.members[k].length;
            }
            iterations = s.iterations();
            residual = s.relativeResidual();
        } else {
            double[] b = new double[network.unknowns];
            network.addMeshEmfs(emfExt, 1, b);
            SteadyOperator a = new SteadyOperator(flow);
            double meanVx = weight > 0 ? vx / weight : 0;
            double meanVy = weight > 0 ? vy / weight : 0;
            Fgmres.Operator m = preconditioner(motionMultiplier(meanVx, meanVy), 1);
            if (guess != null) {
                System.arraycopy(guess, 0, u, 0, u.length);
            }
            Fgmres.Outcome outcome = Fgmres.solve(a, m, b, u, settings.relativeTolerance(),
                    settings.maxIterations(), workspace(), "flexible GMRES (steady plate)");
            iterations = outcome.iterations();
            residual = outcome.relativeResidual();
        }
        return solution(u, bzExt, pivotM, chosen, speedRatio, iterations, residual, emfExt);
    }

    /** Builds the outputs of a solved ψ; {@code emfExt} per face, or null when no steady motion. */
    PlateSolution solution(double[] u, double[] bzExt, Vec2 pivotM, EddyModel model, double speedRatio,
                           int iterations, double residual, double[] emfExt) {
        double[] psi = new double[network.nodeCount];
        network.expand(u, psi);
        double[] flux = new double[network.nodeCount];
        field.apply(psi, flux);
        double h = grid.cellM();
        double[] bPlate = new double[network.nodeCount];
        for (int n = 0; n < flux.length; n++) {
            bPlate[n] = flux[n] / (h * h);
        }
        double sheet = conductor.sigmaSPerM() * conductor.thicknessM();
        double joule = 0;
        double fx = 0;
        double fy = 0;
        double torque = 0;
        double mechanical = 0;
        for (int f = 0; f < network.faceCount; f++) {
            double current = psi[network.plus[f]] - psi[network.minus[f]];
            joule += current * current / (sheet * network.open[f]);
            double force = current * bzExt[f] * h;
            if (network.xFace[f]) {
                // Filament along +x: force (0, −I·B·h).
                fy -= force;
                torque -= (faceX[f] - pivotM.x()) * force;
            } else {
                // Filament along +y: force (I·B·h, 0).
                fx += force;
                torque -= (faceY[f] - pivotM.y()) * force;
            }
            if (emfExt != null) {
                mechanical += current * emfExt[f];
            }
        }
        return new PlateSolution(this, u, psi, bPlate, new Vec2(fx, fy), torque, pivotM, joule,
                emfExt != null ? mechanical : Double.NaN, model, speedRatio, iterations, residual);
    }

    /** The steady operator (R − E_u·B_plate)·ψ on the unknowns. */
    private final class SteadyOperator implements Fgmres.Operator {
        private final double[] flow;
        private final double[] psi = new double[network.nodeCount];
        private final double[] flux = new double[network.nodeCount];
        private final double[] faceEmf = new double[network.faceCount];
        private final double resistance = 1 / (conductor.sigmaSPerM() * conductor.thicknessM());

        SteadyOperator(double[] flow) {
            this.flow = flow;
        }

        @Override
        public void apply(double[] x, double[] y) {
            network.expand(x, psi);
            field.apply(psi, flux);
            double area = grid.cellM() * grid.cellM();
            for (int f = 0; f < network.faceCount; f++) {
                double bz = 0.5 * (flux[network.plus[f]] + flux[network.minus[f]]) / area;
                faceEmf[f] = -bz * flow[f];
            }
            java.util.Arrays.fill(y, 0);
            network.addResistive(psi, resistance, y);
            network.addMeshEmfs(faceEmf, -1, y);
        }
    }

    /**
     * The infinite sheet's motion factor 1 + i·(V·sin θ)·L̂(θ)/(h·R̂(θ)) at velocity V, with R̂ the
     * five-point symbol 4(sin²(θx/2) + sin²(θy/2))/(σd): the steady operator's symbol over the
     * resistive one's. Its inverse is the multiplier returned.
     */
    private PlateFieldOperator.Multiplier motionMultiplier(double vx, double vy) {
        double h = grid.cellM();
        double sheet = conductor.sigmaSPerM() * conductor.thicknessM();
        return (tx, ty, l, out) -> {
            double sx = Math.sin(0.5 * tx);
            double sy = Math.sin(0.5 * ty);
            double r = 4 * (sx * sx + sy * sy) / sheet;
            if (r == 0) {
                out[0] = 1;
                out[1] = 0;
                return;
            }
            double im = (vx * Math.sin(tx) + vy * Math.sin(ty)) * l / (h * r);
            double den = 1 + im * im;
            out[0] = 1 / den;
            out[1] = -im / den;
        };
    }

    /** The factor 1 + L̂/(Δt·θ·R̂) of an implicit step, inverted. */
    private PlateFieldOperator.Multiplier stepMultiplier(double dtS, double theta) {
        double sheet = conductor.sigmaSPerM() * conductor.thicknessM();
        return (tx, ty, l, out) -> {
            double sx = Math.sin(0.5 * tx);
            double sy = Math.sin(0.5 * ty);
            double r = 4 * (sx * sx + sy * sy) / sheet;
            out[0] = r == 0 ? 0 : 1 / (1 + Math.max(l, 0) / (dtS * theta * r));
            out[1] = 0;
        };
    }

    /**
     * z = (scale·R)⁻¹·F⁻¹[m·F[r]]: the Fourier factor, then the resistive inverse on the nodes
     * ({@link PlateNetwork#nodeResistive}, one multigrid V-cycle: on a 256² plate it costs about
     * a tenth of conjugate gradients to 1e-2, for 13 outer iterations instead of 7 at low speed).
     */
    Fgmres.Operator preconditioner(PlateFieldOperator.Multiplier multiplier, double scale) {
        return preconditioner(field, multiplier, scale);
    }

    /** The preconditioner of an implicit time step of length {@code dtS}. */
    Fgmres.Operator stepPreconditioner(double dtS, double theta) {
        return preconditioner(stepFilter, stepMultiplier(dtS, theta), theta);
    }

    private Fgmres.Operator preconditioner(PlateFieldOperator filter, PlateFieldOperator.Multiplier multiplier,
                                           double scale) {
        PlateFieldOperator.Prepared m = filter.prepare(multiplier);
        double[] nodes = new double[network.nodeCount];
        double[] filtered = new double[network.nodeCount];
        double[] g = new double[network.unknowns];
        double sheet = conductor.sigmaSPerM() * conductor.thicknessM();
        return (r, z) -> {
            java.util.Arrays.fill(nodes, 0);
            for (int k = 0; k < network.unknowns; k++) {
                int[] members = network.members[k];
                double share = r[k] / members.length;
                for (int n : members) {
                    nodes[n] = share;
                }
            }
            filter.applyMultiplier(nodes, m, filtered);
            network.gather(filtered, g);
            network.nodeResistive(g, z, 0, 0);
            double factor = sheet / scale;
            for (int k = 0; k < z.length; k++) {
                z[k] *= factor;
            }
        };
    }

    /** Fastest material speed at a conducting cell's centre, m/s. */
    private double fastestSpeed(SheetDrive drive) {
        double[] v = new double[2];
        double fastest = 0;
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                if (grid.active(i, j)) {
                    drive.velocity(grid.centreXM(i), grid.centreYM(j), v);
                    fastest = Math.max(fastest, Math.hypot(v[0], v[1]));
                }
            }
        }
        return fastest;
    }

    /**
     * A transient run from ψ = 0 at {@code t0S} (no currents: the sources' field as it is then has
     * been there for ever).
     *
     * @param theta implicitness: 1 for backward Euler (first order, damps every mode), ½ for
     *              Crank–Nicolson (second order; stiff modes ring after a sudden change)
     */
    public PlateTransient transientRun(PlateSource source, double t0S, double theta) {
        return new PlateTransient(this, source, t0S, theta);
    }

    private Fgmres.Workspace workspace;

    /** The Krylov vectors, made once per plate. */
    Fgmres.Workspace workspace() {
        if (workspace == null) {
            workspace = new Fgmres.Workspace(network.unknowns, settings.restart());
        }
        return workspace;
    }

    PlateSolver settings() {
        return settings;
    }
}

package org.kinduct.solver.dynamics;

import java.util.Arrays;
import java.util.List;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;
import org.kinduct.scene.Checks;
import org.kinduct.scene.Scene;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.StateLayout.AuditTerm;
import org.kinduct.solver.dynamics.StateLayout.BodyDof;

/**
 * Coupled simulation of the loop circuits and the free bodies of a scene over [t0, t1].
 *
 * <p><b>Use.</b> {@code CoupledRun run = CoupledSimulation.run(scene, t0, t1, dt);} gives
 * {@link CoupledRun#samples()} at t0 + k·dt (k = 0, 1, … computed from the integer k, never by
 * adding dt up), each a {@link Snapshot} with every free body's {@link org.kinduct.scene.Pose} as
 * integrated and every conductor's {@link ConductorState} (flux, EMF by both methods and
 * resistance as the quasi-static solver reports them along the integrated motion; current, sense
 * and force of closed loops from the coupled circuit equations; the self-inductance of every
 * closed loop); samples at further instants on request; and {@link CoupledRun#audit()}, the
 * {@link EnergyAudit} of the whole run. Bad input (a loop whose
 * wires overlap, sides shorter than four wire radii) throws {@link IllegalArgumentException}.
 * A {@link RunMonitor} passed to {@link #simulate(Scene, double, double, double, List, RunMonitor)}
 * follows a long run's progress and can stop it ({@link SimulationCancelledException}).
 *
 * <p><b>Circuits.</b> Every closed loop k carries a current I_k obeying Faraday's law with its
 * own and mutual inductances: d/dt(Σ_j M_kj(q)·I_j + λ_ext,k) + R_k·I_k = 0, where λ_ext,k is its
 * linkage with the scene's sources (magnets, coils with their prescribed currents, field patches,
 * uniform fields) and M(q) comes from {@link org.kinduct.solver.circuit.LoopInductance} for the
 * loops where they are. The state variable is the total linkage Ψ_k = Σ_j M_kj I_j + λ_ext,k, so
 * dΨ_k/dt = −R_k·I_k and I = M⁻¹(Ψ − λ_ext): neither dM/dt nor dλ_ext/dt is differenced, and the
 * right-hand side stays continuous where a loop enters a field patch (the flux has a kink there,
 * the EMF a jump) (Jackson, <i>Classical Electrodynamics</i>, 3rd ed., 1999, §5.15–5.17;
 * Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013, §7.2). Open loops and wires
 * carry no current; source coils are current-driven. As all L → 0 the current follows the
 * quasi-static I = EMF/R, lagging it by the time constants L/R. Small L/R makes the equations
 * stiff: the explicit integrator then needs steps of a few L/R (a single-turn 10 cm copper loop
 * has L/R of tens of microseconds; a 200-turn pickup into 10 kΩ about 0.1 µs). That is what
 * {@link CircuitModel} is for: {@link CircuitModel#QUASI_STATIC} drops the circuit states and
 * takes I_k = EMF_k/R_k, with EMF_k = N_k·(motional EMF of the moving edges, from the same edge
 * sums as the forces, + transformer EMF of moving or alternating sources at the loop held
 * still), and {@link CircuitModel#AUTO} (the default) picks the inductive model only when the
 * largest L/R exceeds a tenth of the sampling step — see there for why.
 *
 * <p><b>Free bodies</b> ({@link org.kinduct.scene.Motion.Free}): the pivot is taken as the centre
 * of mass; m·a = F_applied(t) + m·g − c·v + Σ springs + F_mag, and, when the inertia I_p about the
 * pivot is positive, I_p·α = τ_mag (otherwise rotation is locked; there is no rotational
 * damping). g is {@link Scene#gravity()}. Springs are linear (Hooke) between the pivot and a fixed
 * anchor or another body's pivot; the reaction acts on that body. The magnetic force on a loop
 * edge from each source is N·I·∫ dl × B (from its B_z moments), its torque about the body's pivot
 * likewise; the reaction (force and torque) acts on the source's body, so free magnets and coils
 * are pushed back. Forces between loop currents, and the force of a loop that changes shape on
 * itself (½·I²·dL/dx on a bar sliding on rails, even when it is the scene's only loop), are the
 * gradient of ½IᵀMI at constant currents, by central differences; holders of prescribed bodies
 * supply −½·Iᵀ(dM/dt)I against them. Edges whose ends ride different bodies (a bar sliding on
 * rails) are contacts: their force is taken by the guide, not applied to a body. Forces between
 * sources (magnet on magnet) are not modelled. Prescribed and free bodies mix.
 *
 * <p><b>Plates and channels</b> that ride a free body, or lie under a source that does, are solved
 * at every evaluation in the resistive limit ({@link org.kinduct.solver.plate.SheetBrakes}): their
 * drag and torque act on their body, each moving source body takes minus its sources' share, and
 * their Joule heat is booked as its own audit term (a channel's pump work as holding work, AC
 * coils' share as drive work). Under a field that jumps in the plane (a patch's rim) their drag
 * has kinks as the grid crosses the rim, and the run integrates at a relative tolerance of at
 * most {@value #SHEETS_AT_FIELD_EDGES_TOLERANCE}.
 *
 * <p><b>Integration.</b> The equations are {@code CoupledEquations} over the named state layout
 * {@code StateLayout}, put together from parts with one job each (free-body mechanics, loop
 * circuits, edge forces, transformer stencil, inductive forces, coil drives, energy ledger); the
 * samples come from the step handler {@code RunSampler}. Hipparchus' Dormand–Prince 8(5,3),
 * steps at most dt, relative tolerance relTol on the body states with absolute tolerances relTol
 * times the loops' size (and its ratio to the run's duration for speeds); on each loop's Ψ_k an
 * absolute tolerance only, relTol·L_kk·{@value #CURRENT_SCALE_A} A, because Ψ_k is dominated by
 * the external linkage and a tolerance relative to it would leave I with an error of
 * relTol·|λ_ext|/L. Samples come from the integrator's dense output; currents are then good to
 * about 1e-7 relative at the default tolerance, positions and speeds to about 1e-9.
 *
 * <p><b>Energy audit</b> ({@link EnergyAudit}): applied, holding and drive work, Joule and damping
 * heat, integrated alongside the state, and the changes of kinetic, potential and magnetic
 * energy; its residual is about 1e-9 of the heat where loop–loop forces play no part, 1e-4 where
 * they do (their differences); where a single loop's self-force is the only such force it is
 * far smaller (measured 3e-14 for a free bar braking on rails). In the quasi-static model there
 * is no magnetic energy and no loop–loop force, and the Joule heat equals the mechanical work the
 * braking forces take out (exactly, for loops riding one body each over still sources:
 * I·EMF_motional = −F·v edge by edge); a transformer EMF from moving sources is a central
 * difference, good to about 1e-8.
 */
public final class CoupledSimulation {

    /** Default relative tolerance of the integration. */
    public static final double DEFAULT_RELATIVE_TOLERANCE = 1e-10;
    /** Current scale for the absolute tolerance of the loop states, amperes. */
    private static final double CURRENT_SCALE_A = 1e-3;
    /**
     * The loosest relative tolerance of a run in which a plate or channel moves a free body across
     * a field's edge (a patch's rim): its drag is then only piecewise linear in the pose, with a
     * kink each time a cell's segment crosses the edge (thousands a second for a spinning disc),
     * and at 1e-10 the integrator shrinks its steps at every kink (measured: 10 000 evaluations
     * for a quarter of the window that takes 1100 at 1e-6). The drag's own lattice error there
     * is some 1e-3.
     */
    static final double SHEETS_AT_FIELD_EDGES_TOLERANCE = 1e-6;
    /** Time step for the difference quotients of prescribed motion, as a fraction of the sampling step. */
    private static final double DIFFERENCE_STEP_FRACTION = 1e-4;

    private final double relTol;
    private final CircuitModel circuitModel;

    /** Simulates {@code scene} at the default tolerance with the AUTO circuit model; see {@link #simulate}. */
    public static CoupledRun run(Scene scene, double t0S, double t1S, double dtS) {
        return new CoupledSimulation(DEFAULT_RELATIVE_TOLERANCE).simulate(scene, t0S, t1S, dtS);
    }

    /** @param relativeTolerance relative tolerance of the integration, e.g. {@value #DEFAULT_RELATIVE_TOLERANCE} */
    public CoupledSimulation(double relativeTolerance) {
        this(relativeTolerance, CircuitModel.AUTO);
    }

    /**
     * @param relativeTolerance relative tolerance of the integration, e.g. {@value #DEFAULT_RELATIVE_TOLERANCE}
     * @param circuitModel how loop currents are computed
     */
    public CoupledSimulation(double relativeTolerance, CircuitModel circuitModel) {
        this.relTol = Checks.positive(relativeTolerance, "relative tolerance");
        this.circuitModel = Checks.nonNull(circuitModel, "circuit model");
    }

    /**
     * Simulates {@code scene} from t0 to t1, sampling at t0 + i·dt up to t1 (t1 itself when it is
     * on that grid); the energy audit covers the whole of [t0, t1].
     */
    public CoupledRun simulate(Scene scene, double t0S, double t1S, double dtS) {
        return simulate(scene, t0S, t1S, dtS, List.of(), RunMonitor.NONE);
    }

    /**
     * As {@link #simulate(Scene, double, double, double)}, with samples also at {@code extraS}
     * (instants within [t0, t1] that need not lie on the grid; they change no other number), and
     * reporting its progress to {@code monitor} and stopping when it asks: the run then throws
     * {@link SimulationCancelledException} before the next evaluation of the equations, so at
     * most one integrator step is begun after the request. The monitor changes no number of the
     * result.
     */
    public CoupledRun simulate(Scene scene, double t0S, double t1S, double dtS, List<Double> extraS,
                               RunMonitor monitor) {
        Checks.nonNull(scene, "scene");
        Checks.finite(t0S, "t0");
        Checks.positive(dtS, "dt");
        Checks.nonNull(monitor, "monitor");
        if (!(t1S > t0S)) {
            throw new IllegalArgumentException("t1 must be after t0, got t0 = " + t0S + " s, t1 = " + t1S + " s");
        }
        SampleTimes times = SampleTimes.of(t0S, t1S, dtS, extraS);
        double endS = Math.max(t1S, times.last());
        stopIfCancelled(monitor, t0S, t0S, endS);
        double hS = DIFFERENCE_STEP_FRACTION * dtS;
        CoupledEquations equations = new CoupledEquations(scene, t0S, hS, circuitModel.resolveFor(scene, t0S, dtS),
                t -> stopIfCancelled(monitor, t, t0S, endS));
        double[] y0 = equations.initialState();
        // The stop request is polled at every evaluation of the equations.
        OrdinaryDifferentialEquation watched = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return equations.getDimension();
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                stopIfCancelled(monitor, t, t0S, endS);
                return equations.computeDerivatives(t, y);
            }
        };
        double tol = equations.sheetsUnderFieldEdges() ? Math.max(relTol, SHEETS_AT_FIELD_EDGES_TOLERANCE) : relTol;
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12 * (endS - t0S), dtS,
                absoluteTolerances(equations, y0, t0S, endS, tol), relativeTolerances(equations.layout(), tol));
        // Samples are made as the integrator passes their times, so the progress counts their cost too.
        RunSampler sampler = new RunSampler(equations, times);
        integrator.addStepHandler(sampler);
        // Added after the sampler, so a step's samples are made before its progress is reported.
        integrator.addStepHandler(new ODEStepHandler() {
            @Override
            public void handleStep(ODEStateInterpolator step) {
                double fraction = (step.getCurrentState().getTime() - t0S) / (endS - t0S);
                monitor.progress(Math.min(fraction, 1));
            }

            @Override
            public void finish(ODEStateAndDerivative end) {
                monitor.progress(1);
            }
        });
        ODEStateAndDerivative last = integrator.integrate(watched, new ODEState(t0S, y0), endS);
        EnergyAudit audit = equations.audit(equations.evaluate(t0S, y0),
                equations.evaluate(last.getTime(), last.getPrimaryState()), last.getPrimaryState());
        return new CoupledRun(sampler.samples(), sampler.extras(), audit, equations.circuitModel());
    }

    private static void stopIfCancelled(RunMonitor monitor, double tS, double t0S, double t1S) {
        if (monitor.cancelled()) {
            throw new SimulationCancelledException(tS, t0S, t1S);
        }
    }

    private static double[] relativeTolerances(StateLayout layout, double relTol) {
        double[] rel = new double[layout.dimension()];
        // Body states only: the loop states get an absolute tolerance, the energy integrals none.
        Arrays.fill(rel, 0, layout.bodyStates(), relTol);
        return rel;
    }

    /**
     * Absolute tolerances: relTol times a length scale (the loops' extent, else 1 m) for
     * positions, its ratio to the run's duration for velocities, 1 rad and 1/duration for angles
     * and ω, and L_kk·{@value #CURRENT_SCALE_A} A for loop k's circuit state. The energy
     * integrals are not error-controlled: they ride on the steps the state needs.
     */
    private static double[] absoluteTolerances(CoupledEquations equations, double[] y0, double t0S, double t1S,
                                               double relTol) {
        StateLayout layout = equations.layout();
        double length = equations.circuits().lengthScaleM();
        double duration = t1S - t0S;
        double[] abs = new double[layout.dimension()];
        for (int b = 0; b < equations.bodies().count(); b++) {
            if (!layout.free(b)) {
                continue;
            }
            abs[layout.of(b, BodyDof.X)] = relTol * length;
            abs[layout.of(b, BodyDof.Y)] = relTol * length;
            abs[layout.of(b, BodyDof.ANGLE)] = relTol;
            abs[layout.of(b, BodyDof.VX)] = relTol * length / duration;
            abs[layout.of(b, BodyDof.VY)] = relTol * length / duration;
            abs[layout.of(b, BodyDof.OMEGA)] = relTol / duration;
        }
        // Computed for every run: a loop whose inductance cannot be computed is refused here, before any step.
        double[][] inductance = equations.circuits().inductance(equations.bodies().poses(t0S, y0));
        for (int k = 0; k < layout.loopStates(); k++) {
            abs[layout.loop(k)] = relTol * inductance[k][k] * CURRENT_SCALE_A;
        }
        for (AuditTerm term : AuditTerm.values()) {
            abs[layout.audit(term)] = Double.MAX_VALUE;
        }
        return abs;
    }
}

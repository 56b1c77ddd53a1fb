package org.kinduct.solver.dynamics;

import java.util.function.DoubleConsumer;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.SceneIndex;
import org.kinduct.solver.dynamics.StateLayout.AuditTerm;
import org.kinduct.solver.field.PlaneField;

/**
 * The coupled equations dy/dt = f(t, y) of a scene's free bodies and loop circuits in the
 * {@link StateLayout}; the physics is stated in {@link CoupledSimulation}. Each evaluation puts
 * together the parts, each with one job: {@link FreeBodies} (poses, non-magnetic forces,
 * Newton's law, holders' power), {@link LoopCircuits} (placement, inductance, resistance,
 * linkage, currents), {@link EdgeForces} (motional EMF and forces of the sources on the loop
 * edges, with reactions), {@link TransformerStencil} (EMF of changing sources in a loop held
 * still, quasi-static model), {@link InductiveForces} (forces from ½·IᵀMI, inductive model),
 * {@link CoilDrives} (power of AC source coils), {@link SheetDrags} (drag of plates and channels,
 * with reactions) and {@link EnergyLedger} (the audit integrals).
 *
 * <p><b>Circuit state.</b> For the {@link CircuitModel#INDUCTIVE} model, loop k's state is its
 * total linkage less its external linkage at the start, Ψ_k − λ_ext,k(t0) with Ψ_k = Σ_j M_kj I_j +
 * λ_ext,k, and Faraday's law makes its rate −R_k·I_k. The constant shift keeps the state's rounding
 * at the scale of the loop's own flux L·I, not of a large steady external flux, whose last bits
 * would otherwise drift over many steps and read as a current (measured: 1 µA in a loop gliding
 * inside a uniform 0.5 T region). The currents are I = M⁻¹(Ψ − λ_ext) = M⁻¹[(Ψ − λ_ext(t0)) −
 * (λ_ext − λ_ext(t0))]. The {@link CircuitModel#QUASI_STATIC} model has no circuit states:
 * I_k = N_k·(motional EMF + transformer EMF)/R_k.
 */
final class CoupledEquations implements OrdinaryDifferentialEquation {

    private final CircuitModel circuitModel;
    private final SceneIndex index;
    private final StateLayout layout;
    private final FreeBodies bodies;
    private final LoopCircuits circuits;
    private final EdgeForces edges;
    private final TransformerStencil transformer;
    private final InductiveForces inductiveForces;
    private final CoilDrives drives;
    private final SheetDrags sheets;
    private final EnergyLedger ledger;
    /** Called with t before each plate or channel solve: the run's stop check. */
    private final DoubleConsumer beforeSheetSolve;
    /** Each closed loop's external linkage at t0, webers: the shift of its circuit state (inductive model). */
    private final double[] startLinkage;
    private final double[] initialState;

    /** One evaluation at (t, y): the right-hand side and what the samples and the audit report. */
    record Evaluation(double tS, Pose[] poses, double[] current, Vec2[] loopForce, double[][] inductance,
                      double[] derivative) {
    }

    /**
     * @param t0S start of the run, seconds: the state starts there with free bodies as drawn
     *        moving at their initial velocities, no loop current and nothing spent yet
     * @param timeStepS time step of the difference quotients of prescribed motion, seconds
     * @param circuitModel INDUCTIVE or QUASI_STATIC ({@link CircuitModel#resolveFor} resolves AUTO)
     * @param beforeSheetSolve called with t before each plate or channel solve; may throw to stop the run
     */
    CoupledEquations(Scene scene, double t0S, double timeStepS, CircuitModel circuitModel,
                     DoubleConsumer beforeSheetSolve) {
        if (circuitModel == CircuitModel.AUTO) {
            throw new IllegalArgumentException("the coupled equations need a resolved circuit model, not AUTO");
        }
        this.circuitModel = circuitModel;
        index = new SceneIndex(scene);
        circuits = new LoopCircuits(index);
        layout = new StateLayout(FreeBodies.freeIn(scene), inductive() ? circuits.count() : 0);
        bodies = new FreeBodies(index, layout);
        edges = new EdgeForces(index);
        transformer = new TransformerStencil(index, bodies, timeStepS);
        inductiveForces = new InductiveForces(circuits, bodies, timeStepS);
        drives = new CoilDrives(index);
        sheets = new SheetDrags(index);
        this.beforeSheetSolve = beforeSheetSolve;
        ledger = new EnergyLedger(layout);

        initialState = new double[layout.dimension()];
        bodies.writeInitialState(initialState);
        Pose[] poses = bodies.poses(t0S, initialState);
        PlaneField[] fields = index.fields(poses, t0S);
        startLinkage = new double[layout.loopStates()];
        for (int k = 0; k < startLinkage.length; k++) {
            double[][] xy = circuits.place(k, poses);
            startLinkage[k] = circuits.externalLinkage(k, xy[0], xy[1], fields);
        }
        // No current at the start: Ψ_k = λ_ext,k(t0), so the shifted circuit states start at 0.
    }

    /** The circuit model of these equations (never AUTO). */
    CircuitModel circuitModel() {
        return circuitModel;
    }

    private boolean inductive() {
        return circuitModel == CircuitModel.INDUCTIVE;
    }

    StateLayout layout() {
        return layout;
    }

    FreeBodies bodies() {
        return bodies;
    }

    LoopCircuits circuits() {
        return circuits;
    }

    SceneIndex index() {
        return index;
    }

    /** True when a plate or channel in these equations lies under a field that jumps in the plane. */
    boolean sheetsUnderFieldEdges() {
        return sheets.present() && index.fieldJumpsInPlane();
    }

    /** The state at t0 (a copy). */
    double[] initialState() {
        return initialState.clone();
    }

    @Override
    public int getDimension() {
        return layout.dimension();
    }

    @Override
    public double[] computeDerivatives(double t, double[] y) {
        return evaluate(t, y).derivative();
    }

    /**
     * The stored energies at an evaluated state; no magnetic energy in the quasi-static model,
     * whose inductances are taken as zero.
     */
    EnergyLedger.Stored stored(Evaluation at) {
        double magnetic = inductive() ? LoopCircuits.magneticEnergyJ(at.inductance(), at.current()) : 0;
        return new EnergyLedger.Stored(bodies.kineticEnergyJ(at.poses()), bodies.potentialEnergyJ(at.poses()),
                magnetic);
    }

    /** The energy audit of a run from {@code first} to {@code last}. */
    EnergyAudit audit(Evaluation first, Evaluation last, double[] lastState) {
        return ledger.audit(lastState, stored(first), stored(last));
    }

    /** Evaluates the equations at (t, y). */
    Evaluation evaluate(double tS, double[] y) {
        Pose[] poses = bodies.poses(tS, y);
        PlaneField[] fields = index.fields(poses, tS);
        int n = circuits.count();
        double[] external = new double[n];
        double[] resistance = new double[n];
        double[][] xs = new double[n][];
        double[][] ys = new double[n][];
        EdgeForces.PerAmpereTurn[] perAmpereTurn = new EdgeForces.PerAmpereTurn[n];
        for (int k = 0; k < n; k++) {
            double[][] xy = circuits.place(k, poses);
            xs[k] = xy[0];
            ys[k] = xy[1];
            external[k] = circuits.externalLinkage(k, xs[k], ys[k], fields);
            resistance[k] = circuits.resistanceOhm(k, xs[k], ys[k]);
        }
        for (int k = 0; k < n; k++) {
            perAmpereTurn[k] = edges.along(circuits.conductor(k), xs[k], ys[k], poses, fields);
        }

        double[][] inductance = null;
        double[] current;
        if (inductive()) {
            inductance = circuits.inductance(poses);
            double[] own = new double[n];
            for (int k = 0; k < n; k++) {
                own[k] = y[layout.loop(k)] - (external[k] - startLinkage[k]);
            }
            current = LoopCircuits.currents(inductance, own);
        } else {
            current = new double[n];
            TransformerStencil.Around around = n > 0 ? transformer.around(tS, poses) : null;
            for (int k = 0; k < n; k++) {
                double emf = circuits.loop(k).turns()
                        * (perAmpereTurn[k].motionalV + transformer.emfPerTurn(around, xs[k], ys[k]));
                current[k] = emf / resistance[k];
            }
        }

        BodyLoads loads = new BodyLoads(bodies.count());
        Vec2[] loopForce = new Vec2[n];
        for (int k = 0; k < n; k++) {
            loopForce[k] = perAmpereTurn[k].applyTo(circuits.loop(k).turns() * current[k], loads);
        }
        // Also for a single loop: one that changes shape (a bar on rails) pushes itself with ½·I²·dL/dq.
        double inductiveHolding = inductive() && inductiveForces.present()
                ? inductiveForces.apply(tS, poses, current, loads) : 0;
        SheetDrags.Power eddy = sheets.present() ? sheets.apply(tS, poses, loads, beforeSheetSolve)
                : SheetDrags.Power.NONE;
        FreeBodies.Power mechanical = bodies.addForces(tS, poses, loads);

        double[] derivative = new double[layout.dimension()];
        bodies.writeDerivatives(poses, loads, derivative);
        double joule = 0;
        for (int k = 0; k < n; k++) {
            if (inductive()) {
                derivative[layout.loop(k)] = -resistance[k] * current[k];
            }
            joule += resistance[k] * current[k] * current[k];
        }
        ledger.book(derivative, AuditTerm.APPLIED, mechanical.appliedW());
        ledger.book(derivative, AuditTerm.HOLDING,
                inductiveHolding + bodies.holdingPowerW(poses, loads) + eddy.pumpW());
        ledger.book(derivative, AuditTerm.DRIVE, drives.powerW(tS, poses, current, circuits, xs, ys) + eddy.driveW());
        ledger.book(derivative, AuditTerm.JOULE, joule);
        ledger.book(derivative, AuditTerm.EDDY, eddy.jouleW());
        ledger.book(derivative, AuditTerm.DAMPING, mechanical.dampingW());
        return new Evaluation(tS, poses, current, loopForce, inductance, derivative);
    }
}

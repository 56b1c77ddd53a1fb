package org.kinduct.solver.run;

import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.solver.circuit.InductanceAtStart;
import org.kinduct.solver.dynamics.CircuitModel;

/**
 * How a window is computed, decided once per scene and request, for the editor, the exports and
 * the command line alike:
 * <ul>
 *   <li>{@link Method#COUPLED}, one coupled run ({@link org.kinduct.solver.dynamics.CoupledSimulation}),
 *       when a body moves under forces or the loops' circuit model resolves to INDUCTIVE (their
 *       currents then depend on the history, not only on the instant);</li>
 *   <li>{@link Method#INSTANTS} otherwise: each instant solved on its own, quasi-statically
 *       (I = EMF/R), so any instant can be solved exactly and the instants in parallel.</li>
 * </ul>
 *
 * @param circuit INDUCTIVE or QUASI_STATIC, never AUTO
 */
public record RunPlan(Method method, CircuitModel circuit) {

    public enum Method { INSTANTS, COUPLED }

    public RunPlan {
        if (circuit == CircuitModel.AUTO) {
            throw new IllegalArgumentException("a plan holds a resolved circuit model, not AUTO");
        }
    }

    /**
     * The plan for {@code scene} and {@code request}, with the loops' inductances at the start.
     *
     * @throws IllegalArgumentException when the circuit model cannot be chosen (a closed loop's
     *         inductance is unknown and a run needs it), naming the loop and the reason
     */
    static RunPlan choose(Scene scene, RunRequest request, InductanceAtStart inductance) {
        boolean free = scene.bodies().stream().anyMatch(b -> b.motion() instanceof Motion.Free);
        CircuitModel requested = request.circuit();
        if (requested == CircuitModel.AUTO && !free && !inductance.allSelfKnown()) {
            // Quasi-static instants need no inductance; the table says why L is missing.
            return new RunPlan(Method.INSTANTS, CircuitModel.QUASI_STATIC);
        }
        CircuitModel model = requested == CircuitModel.AUTO
                ? requested.resolve(inductance.largestTimeConstantS(), request.window().dtS()) : requested;
        boolean coupled = free || model == CircuitModel.INDUCTIVE;
        return new RunPlan(coupled ? Method.COUPLED : Method.INSTANTS, model);
    }

    public boolean coupled() {
        return method == Method.COUPLED;
    }
}

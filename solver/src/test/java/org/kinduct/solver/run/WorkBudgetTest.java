package org.kinduct.solver.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.field.EdgeQuadrature;
import org.kinduct.solver.field.WorkTally;

/**
 * The bound on a coupled run's work counts field evaluations as well as steps: a run whose
 * integrator steps are few but each very costly (a loop metres long sweeping over a magnet at a
 * millimetre, found by the fuzzer: 66 000 evaluations a step, minutes within its step budget) is
 * stopped once its projected evaluations exceed what its samples allow.
 */
class WorkBudgetTest {

    /** A spike at the edge's middle that the quadrature chases until its budget runs out. */
    private static final EdgeQuadrature.EdgeIntegrand SPIKE = (x, y, dx, dy) -> 1 / (x * x + 1e-30);

    /** Makes at least {@code evaluations} integrand evaluations on this thread; returns how many. */
    private static long spend(long evaluations) {
        long before = WorkTally.onThisThread();
        while (WorkTally.onThisThread() - before < evaluations) {
            EdgeQuadrature.STANDARD.segment(SPIKE, -1, 0, 1, 0);
        }
        return WorkTally.onThisThread() - before;
    }

    @Test
    void theTallyCountsEveryEvaluationOfAnIntegral() {
        long before = WorkTally.onThisThread();
        EdgeQuadrature.Estimate e = EdgeQuadrature.STANDARD.segment(SPIKE, -1, 0, 1, 0);
        assertEquals(e.evaluations(), WorkTally.onThisThread() - before);
    }

    @Test
    void aRunProjectedBeyondItsEvaluationsIsStoppedWithTheReason() {
        WorkBudget budget = new WorkBudget(RunMonitor.NONE, 3);
        long spent = spend(WorkBudget.PROJECT_AFTER_EVALUATIONS);
        double fraction = 0.9 * spent / WorkBudget.LEAST_EVALUATIONS; // projects to 1/0.9 of the allowance
        budget.progress(fraction);
        assertTrue(budget.cancelled());
        assertTrue(budget.exceeded());
        assertTrue(budget.reason(1e-3).startsWith("the coupled run would need more than the 1.00e+08 field"
                + " evaluations allowed here"), budget.reason(1e-3));
    }

    @Test
    void aRunWhoseFirstStepSpendsTheWholeAllowanceStopsBeforeAnyProgress() {
        WorkBudget budget = new WorkBudget(RunMonitor.NONE, 3);
        spend(WorkBudget.LEAST_EVALUATIONS / 2);
        assertFalse(budget.cancelled(), "half the allowance");
        spend(WorkBudget.LEAST_EVALUATIONS / 2 + 1);
        assertTrue(budget.cancelled(), "the whole allowance, with no step done");
        assertTrue(budget.reason(1e-3).startsWith("the coupled run would need more than the 1.00e+08 field"
                + " evaluations allowed here"), budget.reason(1e-3));
    }

    @Test
    void aRunWithinItsEvaluationsGoesOn() {
        WorkBudget budget = new WorkBudget(RunMonitor.NONE, 3);
        long spent = spend(WorkBudget.PROJECT_AFTER_EVALUATIONS);
        budget.progress(1.1 * spent / WorkBudget.LEAST_EVALUATIONS); // projects to 1/1.1 of the allowance
        assertFalse(budget.cancelled());
    }

    @Test
    void theAllowanceGrowsWithTheSamples() {
        int samples = 1000; // 1e10 evaluations allowed
        WorkBudget budget = new WorkBudget(RunMonitor.NONE, samples);
        long spent = spend(WorkBudget.PROJECT_AFTER_EVALUATIONS);
        budget.progress(0.9 * spent / WorkBudget.LEAST_EVALUATIONS);
        assertFalse(budget.cancelled(), "1.1e8 projected of 1e10 allowed");
        budget.progress(0.9 * spent / (WorkBudget.MAX_EVALUATIONS_PER_SAMPLE * samples));
        assertTrue(budget.cancelled(), "1.1e10 projected of 1e10 allowed");
    }
}

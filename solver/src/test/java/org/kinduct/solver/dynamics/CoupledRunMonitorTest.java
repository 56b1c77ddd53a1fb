package org.kinduct.solver.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;

/** Progress reports and stopping of a coupled run. */
class CoupledRunMonitorTest {

    private static final double T1_S = 0.2;
    private static final double DT_S = 0.004;
    private static final double STOP_AT = 0.3;

    /** Counts the polls and records the progress of a run; asks it to stop once the progress reaches {@code stopAt}. */
    private static final class Recorder implements RunMonitor {
        final double stopAt;
        final List<Double> fractions = new ArrayList<>();
        /** Polls made before the fraction first reached each reported value, in step with {@link #fractions}. */
        final List<Long> pollsAtReport = new ArrayList<>();
        long polls;
        long pollsAfterStop;
        int reportsAfterStop;
        boolean stopRequested;

        Recorder(double stopAt) {
            this.stopAt = stopAt;
        }

        @Override
        public void progress(double fractionDone) {
            reportsAfterStop += stopRequested ? 1 : 0;
            fractions.add(fractionDone);
            pollsAtReport.add(polls);
            stopRequested |= fractionDone >= stopAt;
        }

        @Override
        public boolean cancelled() {
            polls++;
            pollsAfterStop += stopRequested ? 1 : 0;
            return stopRequested;
        }
    }

    /**
     * A 100-turn loop dropped into a field region under gravity: a free body and an inductive
     * circuit, so every part of the coupled equations is evaluated.
     */
    private static Scene fallingLoop() {
        double w = 0.05;
        double h = 1.0;
        List<Conductor.Vertex> outline = List.of(Conductor.Vertex.at(0, 0), Conductor.Vertex.at(w, 0),
                Conductor.Vertex.at(w, h), Conductor.Vertex.at(0, h));
        Conductor.Loop loop = new Conductor.Loop("coil", "frame", outline, 100,
                WireSpec.of(Material.COPPER, 0.5e-3), false, 10, 20);
        Body frame = new Body("frame", null, new Vec2(w / 2, h / 2), Motion.Free.ofMass(0.02));
        Source.FieldPatch region = new Source.FieldPatch("region", Body.FIXED,
                List.of(new Vec2(-10, -10), new Vec2(10, -10), new Vec2(10, 0), new Vec2(-10, 0)), 0.5);
        return new Scene("falling loop", "", List.of(frame), List.of(region), List.of(loop),
                new TimeSpan(0, T1_S, DT_S)).withGravity(new Vec2(0, -9.81));
    }

    @ParameterizedTest
    @EnumSource(names = {"INDUCTIVE", "QUASI_STATIC"})
    void aMonitorThatNeverStopsTheRunChangesNoNumber(CircuitModel circuitModel) {
        CoupledSimulation simulation = new CoupledSimulation(CoupledSimulation.DEFAULT_RELATIVE_TOLERANCE, circuitModel);
        Recorder watching = new Recorder(Double.POSITIVE_INFINITY);

        CoupledRun plain = simulation.simulate(fallingLoop(), 0, T1_S, DT_S);
        CoupledRun watched = simulation.simulate(fallingLoop(), 0, T1_S, DT_S, List.of(), watching);

        // Records compare doubles bit for bit (Double.compare), so this is "the same numbers".
        assertEquals(plain, watched);
        assertTrue(watching.polls > 0, "the monitor was asked");
    }

    @Test
    void progressRisesFromNearZeroToExactlyOneWithinTheUnitInterval() {
        Recorder watching = new Recorder(Double.POSITIVE_INFINITY);

        new CoupledSimulation(CoupledSimulation.DEFAULT_RELATIVE_TOLERANCE).simulate(fallingLoop(), 0, T1_S, DT_S, List.of(),
                watching);

        List<Double> f = watching.fractions;
        // Steps are at most dt, so there is a report at least every dt/(t1 − t0) of the window.
        assertTrue(f.size() >= T1_S / DT_S, "reports: " + f.size());
        assertTrue(f.get(0) > 0 && f.get(0) <= DT_S / T1_S * (1 + 1e-12), "first report " + f.get(0));
        for (int i = 1; i < f.size(); i++) {
            assertTrue(f.get(i) >= f.get(i - 1), "report " + i + " fell from " + f.get(i - 1) + " to " + f.get(i));
            assertTrue(f.get(i) <= 1, "report " + i + " = " + f.get(i));
        }
        assertEquals(1.0, f.get(f.size() - 1));
    }

    @Test
    void aRunAskedToStopAtThirtyPercentThrowsBeforeItsNextEvaluation() {
        CoupledSimulation simulation = new CoupledSimulation(CoupledSimulation.DEFAULT_RELATIVE_TOLERANCE);
        Recorder complete = new Recorder(Double.POSITIVE_INFINITY);
        simulation.simulate(fallingLoop(), 0, T1_S, DT_S, List.of(), complete);
        Recorder stopping = new Recorder(STOP_AT);

        SimulationCancelledException e = assertThrows(SimulationCancelledException.class,
                () -> simulation.simulate(fallingLoop(), 0, T1_S, DT_S, List.of(), stopping));

        assertTrue(e.getMessage().startsWith("simulation cancelled at t = "), e.getMessage());
        assertEquals(1, stopping.pollsAfterStop, "evaluations after the request: the poll that stops is the last");
        assertEquals(0, stopping.reportsAfterStop);
        double reached = stopping.fractions.get(stopping.fractions.size() - 1);
        assertTrue(reached >= STOP_AT && reached < STOP_AT + DT_S / T1_S, "stopped at " + reached);
        // The same run without a stop had made the same number of evaluations by then: the stop came at 30 %.
        int at = complete.fractions.indexOf(reached);
        assertEquals(complete.pollsAtReport.get(at) + 1, stopping.polls);
        assertTrue(stopping.polls < 0.5 * complete.polls, stopping.polls + " of " + complete.polls + " evaluations");
    }

    @Test
    void aMonitorThatHasAlreadyStoppedPreventsTheRun() {
        Recorder stopped = new Recorder(0);
        stopped.stopRequested = true;
        CoupledSimulation simulation = new CoupledSimulation(CoupledSimulation.DEFAULT_RELATIVE_TOLERANCE);

        SimulationCancelledException e = assertThrows(SimulationCancelledException.class,
                () -> simulation.simulate(fallingLoop(), 0, T1_S, DT_S, List.of(), stopped));

        assertEquals("simulation cancelled at t = 0.0 s of [0.0, " + T1_S + "] s", e.getMessage());
        assertEquals(1, stopped.polls);
        assertTrue(stopped.fractions.isEmpty(), "no progress: " + stopped.fractions);
    }
}

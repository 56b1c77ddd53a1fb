package org.kinduct.report.metrics;

import java.util.List;
import java.util.Optional;
import org.kinduct.scene.Conductor;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.RunResult;

/**
 * The power I²·R_load into a closed loop's load resistor at each sample of a window, and its means:
 * over the window, and over the whole cycles of the current at its end ({@link SteadyCycles}), the
 * steady state a harvester's designer asks for once the build-up is over.
 */
public final class LoadPower {

    private final double[] times;
    private final double[] currentA;
    private final double[] powerW;

    private LoadPower(ConductorSeries series, double loadOhm) {
        times = series.times;
        currentA = series.currentA;
        powerW = new double[currentA.length];
        for (int i = 0; i < powerW.length; i++) {
            powerW[i] = currentA[i] * currentA[i] * loadOhm;
        }
    }

    /** The load power of closed loop {@code loopId} over the whole of {@code run}. */
    public static LoadPower of(RunResult run, String loopId) {
        return of(run, run.samples(), loopId);
    }

    static LoadPower of(RunResult run, List<Snapshot> window, String loopId) {
        return new LoadPower(new ConductorSeries(window, loopId),
                ((Conductor.Loop) run.scene().conductor(loopId).orElseThrow()).loadOhm());
    }

    /** Time average over the window (trapezoidal rule). */
    public double average() {
        return Window.timeAverage(times, powerW);
    }

    /** ∫ I²·R_load dt over the window (trapezoidal rule). */
    public double integral() {
        return Window.integral(times, powerW);
    }

    /** Time average over the {@link #cycles()}; NaN when there are none. */
    public double steady() {
        return cycles().map(c -> c.mean(times, powerW)).orElse(Double.NaN);
    }

    /** The whole cycles of the current in the window's last quarter, if any. */
    public Optional<SteadyCycles> cycles() {
        return SteadyCycles.of(times, currentA);
    }

    /** Relative change of the mean load power from one of {@code cycles} to the next (0 once steady). */
    public double changePerCycle(SteadyCycles cycles) {
        return cycles.changePerCycle(times, powerW);
    }
}

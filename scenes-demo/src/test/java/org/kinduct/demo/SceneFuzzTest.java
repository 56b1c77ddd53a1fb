package org.kinduct.demo;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.io.Problem;
import org.kinduct.scene.io.SceneFormatException;
import org.kinduct.scene.io.SceneJson;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.run.RunFailedException;
import org.kinduct.solver.run.RunRequest;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;

/**
 * Loader and solver together on mutated demo scenes ({@link SceneMutations}): every input must
 * either be refused with problems located in the text (line and message), or load and solve with
 * a finite value for every quantity that applies, or — for what only shows while running, such as
 * a response far faster than the sampling step — be stopped by the run with
 * {@link RunFailedException} stating the reason. Anything else — any other exception, a NaN or
 * infinite result, an input that takes longer than the deadline — fails, with the seed to replay
 * it. The deadline, 60 s, guards against a run without end on an idle machine (runs are bounded in
 * work, {@code run.WorkBudget}, to about half a minute there); on a loaded machine
 * {@code -Dkinduct.fuzz.deadline=S} gives the inputs more wall-clock time.
 *
 * <p>{@code -Dkinduct.fuzz.inputs=N} sets the number of inputs; the {@code fuzz} Maven profile runs
 * 100 000. Each input is solved over its first {@value #STEPS} steps.
 */
class SceneFuzzTest {

    private static final long FIRST_SEED = 0x5eed_f00dL;
    private static final int INPUTS = Integer.getInteger("kinduct.fuzz.inputs", 300);
    /** Inputs of the range to skip, so that a long run can be split between processes ({@code -Dkinduct.fuzz.skip=50000}). */
    private static final int SKIP = Integer.getInteger("kinduct.fuzz.skip", 0);
    /** Seeds to replay instead of the range ({@code -Dkinduct.fuzz.seeds=1592652005,1592652203}). */
    private static final String REPLAY = System.getProperty("kinduct.fuzz.seeds", "");
    private static final int STEPS = 2;
    private static final long DEADLINE_S = Long.getLong("kinduct.fuzz.deadline", 60);
    private static final int SHOWN_FAILURES = 20;
    /** Inputs between progress lines. */
    private static final int PROGRESS_EVERY = 1000;

    enum Outcome { REFUSED, SOLVED, STOPPED }

    @Test
    void everyInputIsSolvedFiniteOrRefusedWithALocatedMessage() {
        List<String> texts = Demos.names().stream().map(n -> SceneJson.write(Demos.load(n))).toList();
        List<String> failures = new ArrayList<>();
        Map<Outcome, Integer> outcomes = new EnumMap<>(Outcome.class);
        long slowestNs = 0;
        long slowestSeed = 0;
        long first = FIRST_SEED + SKIP;
        int tried = 0;
        long[] seeds = REPLAY.isBlank() ? java.util.stream.LongStream.range(first, first + INPUTS).toArray()
                : java.util.Arrays.stream(REPLAY.split(",", -1)).mapToLong(t -> Long.parseLong(t.strip())).toArray();
        for (long seed : seeds) {
            SplittableRandom r = new SplittableRandom(seed);
            String input = SceneMutations.mutate(r, texts.get(r.nextInt(texts.size())));
            long start = System.nanoTime();
            try {
                outcomes.merge(outcome(input), 1, Integer::sum);
            } catch (RuntimeException | AssertionError e) {
                failures.add("seed " + seed + ": " + e);
                System.out.println("fuzz: failed: seed " + seed + ": " + e);
            }
            long ns = System.nanoTime() - start;
            if (ns > slowestNs) {
                slowestNs = ns;
                slowestSeed = seed;
            }
            tried++;
            if (tried % PROGRESS_EVERY == 0 && tried < seeds.length) {
                report(tried, outcomes, failures.size(), slowestNs, slowestSeed);
            }
        }
        report(seeds.length, outcomes, failures.size(), slowestNs, slowestSeed);
        assertTrue(failures.isEmpty(), failures.size() + " of " + seeds.length + " inputs failed, e.g.:\n"
                + String.join("\n", failures.subList(0, Math.min(SHOWN_FAILURES, failures.size()))));
    }

    /** Prints the outcomes so far: a long run shows its progress, and a stopped one its figures. */
    private static void report(int tried, Map<Outcome, Integer> outcomes, int failed, long slowestNs, long slowestSeed) {
        System.out.printf("fuzz: %d inputs: %d refused with a located message, %d solved finite, %d stopped by the"
                        + " run with the reason, %d failed; slowest %.2f s (seed %d)%n", tried,
                outcomes.getOrDefault(Outcome.REFUSED, 0), outcomes.getOrDefault(Outcome.SOLVED, 0),
                outcomes.getOrDefault(Outcome.STOPPED, 0), failed, slowestNs / 1e9, slowestSeed);
    }

    /** What the loader and the solver make of {@code input}; throws when it is neither outcome. */
    static Outcome outcome(String input) {
        Scene scene;
        try {
            scene = SceneJson.read(input, "fuzz.json");
        } catch (SceneFormatException e) {
            int lines = input.split("\n", -1).length;
            for (Problem p : e.problems()) {
                assertTrue(p.line() <= lines && !p.message().isBlank(), () -> "badly located: " + p);
            }
            return Outcome.REFUSED;
        }
        TimeSpan own = scene.time();
        TimeSpan start = new TimeSpan(own.t0S(), Math.min(own.t1S(), own.at(STEPS)), own.dtS());
        long deadline = System.nanoTime() + DEADLINE_S * 1_000_000_000L;
        RunMonitor patience = new RunMonitor() {
            @Override
            public boolean cancelled() {
                return System.nanoTime() > deadline;
            }
        };
        RunResult run;
        try {
            run = new SceneRun(scene, new RunRequest(start, CircuitModel.AUTO, List.of()), patience, false).result();
        } catch (RunFailedException e) {
            assertTrue(e.getMessage() != null && e.getMessage().length() > 40, () -> "no reason given: " + e);
            return Outcome.STOPPED;
        }
        for (Snapshot s : run.samples()) {
            for (ConductorState c : s.conductors()) {
                requireFinite(c);
            }
        }
        return Outcome.SOLVED;
    }

    private static void requireFinite(ConductorState c) {
        List<Double> values = new ArrayList<>(List.of(c.emfV(), c.emfMotionalV(), c.noiseV(), c.currentA(),
                c.forceN().x(), c.forceN().y()));
        if (c.kind() == ConductorState.Kind.LOOP) {
            values.addAll(List.of(c.fluxWb(), c.linkageWb(), c.emfFluxV(), c.resistanceOhm()));
        }
        for (double v : values) {
            assertTrue(Double.isFinite(v), () -> "conductor " + c.id() + " has a non-finite value: " + c);
        }
    }
}

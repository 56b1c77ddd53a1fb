package org.kinduct.solver.run;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.IntStream;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Kinematics;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.Snapshot;

/**
 * What a loop that crosses itself into lobes (a gradiometer's figure-eight) picks up from the
 * scene's alternating-current coils alone, beside what each of its lobes would pick up from them as
 * a loop of its own (the loop's turns, open): the loop's rejection of that field, the figure a
 * gradiometer is built for. Part of the one run, at its samples, so every output states the same
 * figure. Immutable.
 *
 * @param loopId the loop
 * @param frequencyHz the drive frequency of those coils (of the largest amplitude, when they differ)
 * @param loopEmfV the loop's EMF from those coils alone, at each of the run's samples
 * @param lobeEmfV per lobe, its EMF from those coils alone at each sample
 */
public record AlternatingPickup(String loopId, double frequencyHz, double[] loopEmfV, double[][] lobeEmfV) {

    /** The loop's largest |EMF| from the alternating coils over the samples from index {@code from} on. */
    public double loopPeakV(int from) {
        return peak(loopEmfV, from);
    }

    /** The largest |EMF| any one lobe picks up from them alone over the samples from index {@code from} on. */
    public double lobePeakV(int from) {
        double largest = 0;
        for (double[] lobe : lobeEmfV) {
            largest = Math.max(largest, peak(lobe, from));
        }
        return largest;
    }

    /**
     * The loop's rejection of the alternating field over the samples from index {@code from} on: the
     * largest pickup of one lobe alone against its own, 20·log10 of the ratio in dB (the usual measure
     * of a common-mode rejection, common practice); infinite when the lobes cancel exactly.
     */
    public double rejectionDb(int from) {
        return 20 * Math.log10(lobePeakV(from) / loopPeakV(from));
    }

    private static double peak(double[] values, int from) {
        double largest = 0;
        for (int i = from; i < values.length; i++) {
            largest = Math.max(largest, Math.abs(values[i]));
        }
        return largest;
    }

    /**
     * One per loop of {@code scene} that crosses itself and rides one body (its vertices on the loop's
     * own) and whose lobes are loops the model takes, when the scene has coils driven with alternating current; solved at the times of
     * {@code samples} by the scene's own solver with those coils alone, bodies placed by
     * {@code kinematics}.
     */
    static List<AlternatingPickup> of(Scene scene, List<Snapshot> samples, Kinematics kinematics, boolean parallel) {
        List<Source> alternating = scene.sources().stream()
                .filter(s -> s instanceof Source.SourceCoil coil && coil.drive().alternates()).toList();
        List<AlternatingPickup> out = new ArrayList<>();
        if (alternating.isEmpty()) {
            return out;
        }
        double frequencyHz = alternating.stream().map(s -> ((Source.SourceCoil) s).drive())
                .max((a, b) -> Double.compare(Math.abs(a.amplitudeA()), Math.abs(b.amplitudeA()))).orElseThrow()
                .frequencyHz();
        for (Conductor c : scene.conductors()) {
            if (!(c instanceof Conductor.Loop loop) || !onOneBody(loop)) {
                continue;
            }
            List<List<Vec2>> lobes = Lobes.of(loop.vertices().stream().map(Conductor.Vertex::at).toList());
            if (lobes.size() < 2) {
                continue;
            }
            List<Conductor> probes = new ArrayList<>(List.of(open(loop, loop.id(), loop.vertices())));
            try {
                for (int k = 0; k < lobes.size(); k++) {
                    probes.add(open(loop, "lobe-" + k,
                            lobes.get(k).stream().map(v -> new Conductor.Vertex(v, null)).toList()));
                }
            } catch (IllegalArgumentException unbuildable) {
                // A lobe whose corners round onto each other (a vertex 2·10⁹ m out, found by fuzzing)
                // is no loop to solve: that loop gets no rejection figure; its own EMF is the run's.
                continue;
            }
            SceneSolver solver = new SceneSolver(scene.withSources(alternating).withConductors(probes), kinematics);
            IntStream each = IntStream.range(0, samples.size());
            List<Snapshot> solved = (parallel ? each.parallel() : each).mapToObj(i -> solver.at(samples.get(i).tS()))
                    .toList();
            double[][] emf = new double[probes.size()][samples.size()];
            for (int i = 0; i < samples.size(); i++) {
                for (int p = 0; p < probes.size(); p++) {
                    emf[p][i] = solved.get(i).conductors().get(p).emfV();
                }
            }
            out.add(new AlternatingPickup(loop.id(), frequencyHz, emf[0],
                    Arrays.copyOfRange(emf, 1, emf.length)));
        }
        return out;
    }

    /** A loop whose vertices all ride its own body: its lobes keep their shape. */
    private static boolean onOneBody(Conductor.Loop loop) {
        return loop.vertices().stream().allMatch(v -> v.body() == null || v.body().equals(loop.body()));
    }

    private static Conductor.Loop open(Conductor.Loop loop, String id, List<Conductor.Vertex> vertices) {
        return new Conductor.Loop(id, loop.body(), vertices, loop.turns(), loop.wire(), true, 0, loop.temperatureC());
    }
}

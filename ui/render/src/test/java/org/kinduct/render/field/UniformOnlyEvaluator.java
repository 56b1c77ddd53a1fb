package org.kinduct.render.field;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.atomic.AtomicInteger;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.solver.Snapshot;

/**
 * A test evaluator for scenes whose only sources are uniform fields (B_z is their sum, exactly)
 * and that have no conductors; counts how often the field is asked for.
 */
final class UniformOnlyEvaluator implements SceneEvaluator {

    static final AtomicInteger FIELD_CALLS = new AtomicInteger();

    private final Map<String, Double> bz = new HashMap<>();

    UniformOnlyEvaluator(Scene scene) {
        for (Source s : scene.sources()) {
            if (!(s instanceof Source.UniformField u)) {
                throw new IllegalArgumentException("test evaluator handles uniform fields only, got " + s.id());
            }
            bz.put(u.id(), u.bzT());
        }
    }

    @Override
    public Snapshot at(double tS) {
        return new Snapshot(tS, List.of());
    }

    @Override
    public List<Snapshot> series(double t0S, double t1S, double dtS) {
        List<Snapshot> out = new ArrayList<>();
        for (double t = t0S; t <= t1S + dtS / 2; t += dtS) {
            out.add(at(t));
        }
        return out;
    }

    @Override
    public BzField fieldAt(double tS) {
        return fieldOf(tS, bz.keySet());
    }

    @Override
    public BzField fieldOf(double tS, Set<String> sourceIds) {
        FIELD_CALLS.incrementAndGet();
        double sum = 0;
        for (String id : sourceIds) {
            sum += bz.getOrDefault(id, 0.0);
        }
        double total = sum;
        return (x, y) -> total;
    }
}

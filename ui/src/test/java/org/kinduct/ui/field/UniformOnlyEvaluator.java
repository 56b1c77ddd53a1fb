package org.kinduct.ui.field;

import java.util.ArrayList;
import java.util.List;
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

    private final double bz;

    UniformOnlyEvaluator(Scene scene) {
        double sum = 0;
        for (Source s : scene.sources()) {
            if (!(s instanceof Source.UniformField u)) {
                throw new IllegalArgumentException("test evaluator handles uniform fields only, got " + s.id());
            }
            sum += u.bzT();
        }
        bz = sum;
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
        FIELD_CALLS.incrementAndGet();
        return (x, y) -> bz;
    }
}

package org.kinduct.ui.field;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.stream.IntStream;
import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.ui.paint.FieldRaster;

/**
 * Computes B_z maps for display off the UI thread. Requests coalesce: while one map is being
 * computed only the newest waiting request is kept. Sources that never change (on still bodies,
 * constant drive) are evaluated once per grid and cached; only the rest is re-evaluated per
 * frame. Rows are computed in parallel.
 *
 * <p>Results go to {@code deliver} through {@code deliverOn} (the UI thread in the app, the same
 * thread in tests); each carries the revision and time it was computed for, so the receiver can
 * drop stale ones.
 */
public final class FieldMapper {

    /** Fraction of samples kept for the automatic colour limit. */
    private static final double AUTO_PERCENTILE = 0.98;
    private static final int MAX_CELLS = 1_200_000;

    private final Function<Scene, SceneEvaluator> evaluators;
    private final Executor work;
    private final Executor deliverOn;
    private final Consumer<FieldRaster> deliver;
    private final Consumer<RuntimeException> failure;
    private final AtomicReference<MapRequest> waiting = new AtomicReference<>();
    private final Object runLock = new Object();
    private boolean running;
    private StaticCache cache;

    public FieldMapper(Function<Scene, SceneEvaluator> evaluators, Executor work, Executor deliverOn,
                       Consumer<FieldRaster> deliver, Consumer<RuntimeException> failure) {
        this.evaluators = Objects.requireNonNull(evaluators);
        this.work = Objects.requireNonNull(work);
        this.deliverOn = Objects.requireNonNull(deliverOn);
        this.deliver = Objects.requireNonNull(deliver);
        this.failure = Objects.requireNonNull(failure);
    }

    /** Asks for a map; replaces any request still waiting. */
    public void request(MapRequest r) {
        waiting.set(r);
        synchronized (runLock) {
            if (running) {
                return;
            }
            running = true;
        }
        work.execute(this::drain);
    }

    private void drain() {
        while (true) {
            MapRequest r = waiting.getAndSet(null);
            if (r == null) {
                synchronized (runLock) {
                    if (waiting.get() == null) {
                        running = false;
                        return;
                    }
                }
                continue;
            }
            try {
                FieldRaster raster = compute(r);
                deliverOn.execute(() -> deliver.accept(raster));
            } catch (RuntimeException e) {
                deliverOn.execute(() -> failure.accept(e));
            }
        }
    }

    /** Computes one map on the calling thread. */
    public FieldRaster compute(MapRequest r) {
        double cell = r.stepPx() / r.view().pxPerM();
        int cols = Math.max(1, (int) Math.ceil(r.view().widthPx() / r.stepPx()) + 1);
        int rows = Math.max(1, (int) Math.ceil(r.view().heightPx() / r.stepPx()) + 1);
        if ((long) cols * rows > MAX_CELLS) {
            throw new IllegalArgumentException("field map of " + cols + " × " + rows + " is too large");
        }
        // Align the grid to multiples of the cell so the static cache survives small pans.
        double minX = Math.floor(r.view().minX() / cell) * cell;
        double maxY = Math.ceil(r.view().maxY() / cell) * cell;
        Grid grid = new Grid(minX, maxY, cell, cols, rows);
        Scene moving = part(r.scene(), false);
        Scene fixed = part(r.scene(), true);
        float[] values = staticValues(fixed, grid).clone();
        if (!moving.sources().isEmpty()) {
            add(values, evaluators.apply(moving).fieldAt(r.tS()), grid);
        }
        return new FieldRaster(minX, maxY, cell, cols, rows, values, autoLimit(values), r.revision(), r.tS());
    }

    private float[] staticValues(Scene fixed, Grid grid) {
        StaticCache c = cache;
        if (c != null && c.sources.equals(fixed.sources()) && c.grid.equals(grid)) {
            return c.values;
        }
        float[] values = new float[grid.cols * grid.rows];
        if (!fixed.sources().isEmpty()) {
            add(values, evaluators.apply(fixed).fieldAt(0), grid);
        }
        cache = new StaticCache(fixed.sources(), grid, values);
        return values;
    }

    private static void add(float[] values, SceneEvaluator.BzField field, Grid g) {
        IntStream.range(0, g.rows).parallel().forEach(row -> {
            double y = g.maxY - (row + 0.5) * g.cell;
            int base = row * g.cols;
            for (int col = 0; col < g.cols; col++) {
                values[base + col] += (float) field.bz(g.minX + (col + 0.5) * g.cell, y);
            }
        });
    }

    /** The sources that never change (still body, constant drive) when {@code fixed}, else the others. */
    static Scene part(Scene scene, boolean fixed) {
        List<Source> kept = new ArrayList<>();
        for (Source s : scene.sources()) {
            if (isStatic(scene, s) == fixed) {
                kept.add(s);
            }
        }
        return scene.withSources(kept).withConductors(List.of());
    }

    private static boolean isStatic(Scene scene, Source s) {
        Body body = scene.body(s.body()).orElseThrow();
        boolean still = body.motion() instanceof Motion.Still;
        if (s instanceof Source.SourceCoil coil) {
            return still && (coil.drive().amplitudeA() == 0 || coil.drive().frequencyHz() == 0);
        }
        return still;
    }

    /** A high percentile of |B_z|, so one hot spot next to a magnet does not wash out the rest. */
    static double autoLimit(float[] values) {
        int stride = Math.max(1, values.length / 20_000);
        float[] sample = new float[(values.length + stride - 1) / stride];
        int n = 0;
        for (int i = 0; i < values.length; i += stride) {
            float a = Math.abs(values[i]);
            if (Float.isFinite(a)) {
                sample[n++] = a;
            }
        }
        if (n == 0) {
            return 0;
        }
        Arrays.sort(sample, 0, n);
        return sample[Math.min(n - 1, (int) (AUTO_PERCENTILE * n))];
    }

    private record Grid(double minX, double maxY, double cell, int cols, int rows) {
    }

    private record StaticCache(List<Source> sources, Grid grid, float[] values) {
    }
}

package org.kinduct.render.field;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.Executor;
import java.util.function.Consumer;
import java.util.stream.IntStream;
import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.solver.SceneField;
import org.kinduct.solver.dynamics.SimulationCancelledException;
import org.kinduct.solver.run.SceneRun;
import org.kinduct.render.paint.FieldRaster;

/**
 * Computes B_z maps for display off the UI thread. Requests coalesce: while one map is being
 * computed only the newest waiting request is kept. Sources that never change (on still bodies,
 * constant drive) are evaluated once per grid and cached; only the rest is re-evaluated per
 * frame. Rows of large maps are computed in parallel.
 *
 * <p>Results go to {@code deliver} through {@code deliverOn} (the UI thread in the app, the same
 * thread in tests); each carries the revision and time it was computed for, so the receiver can
 * drop stale ones.
 */
public final class FieldMapper {

    /** Fraction of samples kept for the automatic colour limit. */
    private static final double AUTO_PERCENTILE = 0.98;
    private static final int MAX_CELLS = 1_200_000;
    private static final int PARALLEL_CELLS = 50_000;

    private final LatestOnly jobs;
    private final Executor deliverOn;
    private final Consumer<FieldRaster> deliver;
    private final Consumer<RuntimeException> failure;
    private StaticCache cache;
    /** How often the still sources were evaluated on a grid (the cache missed): tests read it. */
    int staticEvaluations;

    public FieldMapper(Executor work, Executor deliverOn, Consumer<FieldRaster> deliver,
                       Consumer<RuntimeException> failure) {
        this.jobs = new LatestOnly(work);
        this.deliverOn = Objects.requireNonNull(deliverOn);
        this.deliver = Objects.requireNonNull(deliver);
        this.failure = Objects.requireNonNull(failure);
    }

    /** Asks for a map; replaces any request still waiting. */
    public void request(MapRequest r) {
        jobs.submit(() -> {
            try {
                FieldRaster raster = compute(r);
                deliverOn.execute(() -> deliver.accept(raster));
            } catch (SimulationCancelledException e) {
                // An edit outdated the run this map waited for; the new revision asks for its own map.
            } catch (RuntimeException e) {
                deliverOn.execute(() -> failure.accept(e));
            }
        });
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
        // The run places every source, so a free magnet is mapped where the coupled run has it.
        SceneRun run = r.run();
        List<Source> still = new ArrayList<>();
        Set<String> moving = new HashSet<>();
        for (Source s : r.scene().sources()) {
            if (isStatic(r.scene(), s)) {
                still.add(s);
            } else {
                moving.add(s.id());
            }
        }
        float[] values = staticValues(run, r.scene().bodies(), still, grid).clone();
        if (!moving.isEmpty()) {
            add(values, run.fieldOf(r.tS(), moving), grid);
        }
        return new FieldRaster(minX, maxY, cell, cols, rows, values, autoLimit(values), peak(values), r.revision(), r.tS());
    }

    private float[] staticValues(SceneRun run, List<Body> bodies, List<Source> still, Grid grid) {
        StaticCache c = cache;
        if (c != null && c.bodies.equals(bodies) && c.sources.equals(still) && c.grid.equals(grid)) {
            return c.values;
        }
        float[] values = new float[grid.cols * grid.rows];
        staticEvaluations++;
        if (!still.isEmpty()) {
            Set<String> ids = new HashSet<>();
            still.forEach(s -> ids.add(s.id()));
            add(values, run.fieldOf(0, ids), grid);
        }
        cache = new StaticCache(bodies, still, grid, values);
        return values;
    }

    private static void add(float[] values, SceneField field, Grid g) {
        IntStream rows = IntStream.range(0, g.rows);
        // Small maps (coarse ones while playing) stay on one thread and leave the other core to painting.
        (g.cols * g.rows >= PARALLEL_CELLS ? rows.parallel() : rows).forEach(row -> {
            double y = g.maxY - (row + 0.5) * g.cell;
            int base = row * g.cols;
            for (int col = 0; col < g.cols; col++) {
                values[base + col] += (float) field.bz(g.minX + (col + 0.5) * g.cell, y);
            }
        });
    }

    private static boolean isStatic(Scene scene, Source s) {
        Body body = scene.body(s.body()).orElseThrow();
        return body.motion() instanceof Motion.Still && !s.alternates();
    }

    /** The largest finite |B_z|, tesla (0 without finite values). */
    static double peak(float[] values) {
        double peak = 0;
        for (float v : values) {
            if (Float.isFinite(v)) {
                peak = Math.max(peak, Math.abs(v));
            }
        }
        return peak;
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

    /** Still sources' values on a grid; the bodies place them, so they are part of the key. */
    private record StaticCache(List<Body> bodies, List<Source> sources, Grid grid, float[] values) {
    }
}

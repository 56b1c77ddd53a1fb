package org.kinduct.render.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Executor;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.solver.SceneField;
import org.kinduct.solver.run.SceneRun;
import org.kinduct.render.view.ViewTransform;

class FieldMapperTest {

    private static final double FIELD_TOL = 1e-7;
    private static final Executor SAME_THREAD = Runnable::run;

    private final List<FieldRaster> delivered = new ArrayList<>();
    private final List<RuntimeException> failures = new ArrayList<>();

    private FieldMapper mapper(Executor work) {
        return new FieldMapper(work, SAME_THREAD, delivered::add, failures::add);
    }

    private static SceneRun uniform(double... bz) {
        List<Source> sources = new ArrayList<>();
        for (int i = 0; i < bz.length; i++) {
            sources.add(new Source.UniformField("u" + i, bz[i]));
        }
        return new SceneRun(Scene.empty("u").withSources(sources));
    }

    @Test
    void mapCoversTheViewAndHoldsTheSumOfTheSources() {
        ViewTransform view = new ViewTransform(0.01, -0.02, 2000, 400, 300);
        FieldRaster r = mapper(SAME_THREAD).compute(new MapRequest(uniform(0.05, -0.02), 7, 0.5, view, 4));
        assertTrue(r.minX() <= view.minX() && r.maxX() >= view.maxX());
        assertTrue(r.minY() <= view.minY() && r.maxY() >= view.maxY());
        for (float v : r.bzT()) {
            assertEquals(0.03, v, FIELD_TOL);
        }
        assertEquals(7, r.revision());
        assertEquals(0.5, r.tS());
    }

    @Test
    void staticSourcesAreEvaluatedOncePerGrid() {
        FieldMapper m = mapper(SAME_THREAD);
        ViewTransform view = new ViewTransform(0, 0, 1000, 200, 100);
        SceneRun s = uniform(0.1);
        for (int i = 0; i < 5; i++) {
            m.compute(new MapRequest(s, 1, i * 0.1, view, 4));
        }
        assertEquals(1, m.staticEvaluations, "a still uniform field does not change with time");
        m.compute(new MapRequest(s, 1, 0, view.zoomedAt(0, 0, 2), 4));
        assertEquals(2, m.staticEvaluations, "a new grid needs a new evaluation");
    }

    @Test
    void waitingRequestsCoalesceToTheNewest() {
        List<Runnable> queue = new ArrayList<>();
        FieldMapper m = mapper(queue::add);
        ViewTransform view = new ViewTransform(0, 0, 1000, 100, 100);
        for (int rev = 1; rev <= 4; rev++) {
            m.request(new MapRequest(uniform(rev * 0.01), rev, 0, view, 10));
        }
        assertEquals(1, queue.size(), "one worker task drains all requests");
        queue.get(0).run();
        assertEquals(1, delivered.size(), "only the newest request was computed");
        assertEquals(4, delivered.get(0).revision());
    }

    @Test
    void failuresAreReportedNotThrown() {
        // A map of 4000 × 4000 one-pixel cells is more than the mapper takes.
        mapper(SAME_THREAD).request(new MapRequest(uniform(0.1), 1, 0, new ViewTransform(0, 0, 100, 4000, 4000), 1));
        assertEquals(1, failures.size());
        assertTrue(failures.get(0).getMessage().contains("too large"), failures.get(0).getMessage());
        assertTrue(delivered.isEmpty());
    }

    @Test
    void autoLimitIgnoresASingleHotSpot() {
        float[] v = new float[1000];
        java.util.Arrays.fill(v, 0.01f);
        v[3] = 50f;
        assertEquals(0.01, FieldMapper.autoLimit(v), FIELD_TOL);
    }

    /** A still field plus a magnet on a gliding body: the cached still part and the moving part add up to the exact field. */
    @Test
    void stillAndMovingSourcesAreEachCountedOnce() {
        Scene scene = Scene.empty("mixed")
                .withBodies(List.of(new Body("cart", "cart", Vec2.ZERO, new Motion.Glide(new Vec2(0.1, 0)))))
                .withSources(List.of(new Source.UniformField("earth", 0.02),
                        new Source.CylinderMagnet("disc", "cart", new Vec2(0, 0), 0.01, 0.005, 0.002,
                                Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z)));
        SceneRun run = new SceneRun(scene);
        FieldMapper m = mapper(SAME_THREAD);
        double t = 0.1;
        FieldRaster r = m.compute(new MapRequest(run, 1, t, new ViewTransform(0.01, 0, 4000, 200, 100), 4));
        SceneField exact = run.fieldAt(t);
        for (int row = 0; row < r.rows(); row += 5) {
            for (int col = 0; col < r.cols(); col += 5) {
                double want = exact.bz(r.centerX(col), r.centerY(row));
                assertEquals(want, r.bzT()[row * r.cols() + col], 1e-5 * Math.abs(want) + FIELD_TOL,
                        "cell " + row + ", " + col);
            }
        }
    }
}

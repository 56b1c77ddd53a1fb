package org.kinduct.ui.app;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import javafx.application.Platform;
import javafx.scene.canvas.Canvas;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Snapshot;
import org.kinduct.ui.edit.ShapeFactory;
import org.kinduct.ui.field.Evaluators;
import org.kinduct.ui.field.FieldMapper;
import org.kinduct.ui.field.MapRequest;
import org.kinduct.ui.field.SceneEvaluator;
import org.kinduct.ui.paint.ColourRange;
import org.kinduct.ui.paint.EditorMarks;
import org.kinduct.ui.paint.FieldRaster;
import org.kinduct.ui.paint.Frame;
import org.kinduct.ui.paint.Layer;
import org.kinduct.ui.paint.ScenePainter;
import org.kinduct.ui.view.ViewTransform;

/**
 * Measures paint time per frame for a 20-object scene with moving magnets on a 1280 × 800
 * canvas, all layers on: {@code java -cp … org.kinduct.ui.app.FrameTimeProbe [frames]}. Field maps
 * and snapshots are computed before each paint and timed separately, since the editor computes
 * them off the UI thread.
 */
public final class FrameTimeProbe {

    static final int WIDTH = 1280;
    static final int HEIGHT = 800;

    private FrameTimeProbe() {
    }

    public static void main(String[] args) throws Exception {
        int frames = args.length > 0 ? Integer.parseInt(args[0]) : 120;
        Platform.startup(() -> { });
        try {
            System.out.println(measure(frames));
        } finally {
            Platform.exit();
        }
    }

    /** Paints {@code frames} frames; returns a one-paragraph report. */
    static String measure(int frames) throws InterruptedException, ExecutionException {
        Scene scene = twentyObjects();
        SceneEvaluator evaluator = Evaluators.solver().apply(scene);
        ViewTransform view = new ViewTransform(0, 0, WIDTH / 0.32, WIDTH, HEIGHT);
        FieldMapper mapper = new FieldMapper(Evaluators.solver(), Runnable::run, Runnable::run, r -> { }, e -> { });
        Canvas canvas = onFx(() -> new Canvas(WIDTH, HEIGHT));
        double[] paint = new double[frames];
        double[] compute = new double[frames];
        for (int i = 0; i < frames; i++) {
            double t = scene.time().t1S() * i / frames;
            long c0 = System.nanoTime();
            FieldRaster raster = mapper.compute(new MapRequest(scene, 1, t, view, 4));
            Snapshot snap = evaluator.at(t);
            compute[i] = (System.nanoTime() - c0) * 1e-6;
            Frame f = new Frame(scene, t, snap, raster, view, EnumSet.allOf(Layer.class), ColourRange.automatic(),
                    EditorMarks.none(), "");
            paint[i] = onFx(() -> {
                long p0 = System.nanoTime();
                ScenePainter.draw(new FxSurface(canvas.getGraphicsContext2D(), WIDTH, HEIGHT), f);
                canvas.snapshot(null, null);
                return (System.nanoTime() - p0) * 1e-6;
            });
        }
        double[] warm = Arrays.copyOfRange(paint, Math.min(10, frames - 1), frames);
        Arrays.sort(warm);
        double[] maps = compute.clone();
        Arrays.sort(maps);
        return String.format(Locale.ROOT,
                "%d frames of a %d-object scene at %d×%d: paint+render median %.1f ms, 95th percentile %.1f ms; "
                        + "field map (4 px cells) + snapshot median %.1f ms on %d cores",
                frames, scene.sources().size() + scene.conductors().size(), WIDTH, HEIGHT,
                warm[warm.length / 2], warm[(int) (warm.length * 0.95)], maps[maps.length / 2],
                Runtime.getRuntime().availableProcessors());
    }

    private static <T> T onFx(java.util.concurrent.Callable<T> task) throws InterruptedException, ExecutionException {
        CompletableFuture<T> f = new CompletableFuture<>();
        Platform.runLater(() -> {
            try {
                f.complete(task.call());
            } catch (Exception e) {
                f.completeExceptionally(e);
            }
        });
        return f.get();
    }

    /** Ten magnets on two moving carriages and ten loops and wires: the frame-time reference scene. */
    static Scene twentyObjects() {
        List<Body> bodies = List.of(
                new Body("upper", "upper carriage", new Vec2(0, 0.05), new Motion.Oscillate(0.04, 1, 0, 0)),
                new Body("lower", "lower carriage", new Vec2(0, -0.05), new Motion.Glide(new Vec2(-0.05, 0))));
        List<Source> sources = new ArrayList<>();
        for (int i = 0; i < 5; i++) {
            double x = -0.1 + 0.05 * i;
            Source.Magnetization north = i % 2 == 0 ? Source.Magnetization.PLUS_Z : Source.Magnetization.MINUS_Z;
            sources.add(new Source.BlockMagnet("block-" + i, "upper", new Vec2(x, 0.05), 0.02, 0.01, 0.005, 0,
                    0.002, Source.Side.BELOW, 1.2, north));
            sources.add(new Source.CylinderMagnet("disc-" + i, "lower", new Vec2(x, -0.05), 0.008, 0.005, 0.002,
                    Source.Side.BELOW, 1.2, north));
        }
        List<Conductor> conductors = new ArrayList<>();
        for (int i = 0; i < 5; i++) {
            double x = -0.1 + 0.05 * i;
            conductors.add(Conductor.Loop.simple("loop-" + i, Body.FIXED, List.of(
                    Conductor.Vertex.at(x - 0.015, -0.01), Conductor.Vertex.at(x + 0.015, -0.01),
                    Conductor.Vertex.at(x + 0.015, 0.01), Conductor.Vertex.at(x - 0.015, 0.01)),
                    ShapeFactory.DEFAULT_WIRE));
            conductors.add(new Conductor.Wire("wire-" + i, Body.FIXED, List.of(
                    Conductor.Vertex.at(x - 0.01, 0.09), Conductor.Vertex.at(x + 0.01, 0.11))));
        }
        return new Scene("frame-time reference", "", bodies, sources, conductors, new TimeSpan(0, 1, 0.01));
    }
}

package org.kinduct.ui.app;

import java.util.ArrayList;
import java.util.Arrays;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import javafx.application.Platform;
import javafx.stage.Stage;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.ui.edit.CanvasGestures;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.ShapeFactory;
import org.kinduct.render.field.FieldMapper;
import org.kinduct.render.field.MapRequest;
import org.kinduct.solver.run.SceneRun;
import org.kinduct.render.paint.ColourRange;
import org.kinduct.render.paint.FieldBackdrop;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.view.ViewTransform;

/**
 * Measures the editor's frame time: the real {@link EditorCanvas} in a 1280 × 800 window plays a
 * 20-object scene with moving magnets, all layers on, field maps and backdrops computed by the
 * editor's own workers. JavaFX is told to pulse as fast as it can ({@code
 * javafx.animation.fullspeed}) rather than at 60 Hz, so the interval between frames is what a
 * frame costs, painting on the UI thread and rasterising on the render thread together.
 * {@code java -Dprism.order=sw -cp … org.kinduct.ui.app.FrameTimeProbe [frames]}.
 */
public final class FrameTimeProbe {

    static final int WIDTH = 1280;
    static final int HEIGHT = 800;
    private static final int WARM_UP_FRAMES = 240;
    private static final double SIXTY_HZ_MS = 1000.0 / 60;
    private static final int DRAG_WARM_UP_MOVES = 50;
    private static final int DRAG_MOVES = 200;

    private FrameTimeProbe() {
    }

    public static void main(String[] args) throws Exception {
        int frames = args.length > 0 ? Integer.parseInt(args[0]) : 300;
        System.setProperty("javafx.animation.fullspeed", "true");
        ShippedFonts.use();
        Platform.startup(() -> { });
        try {
            System.out.println(measure(frames));
        } finally {
            Platform.exit();
        }
    }

    /** Plays {@code frames} frames after a warm-up; returns a one-paragraph report. */
    static String measure(int frames) throws InterruptedException, ExecutionException, TimeoutException {
        Scene scene = twentyObjects();
        ExecutorService work = Executors.newFixedThreadPool(2, r -> {
            Thread t = new Thread(r, "probe-worker");
            t.setDaemon(true);
            return t;
        });
        ThreadCpu cpu = new ThreadCpu();
        double[] interval = new double[frames];
        double[] paint = new double[frames];
        double[] seriesS = {0};
        List<Double> solving = new ArrayList<>();
        CompletableFuture<Void> done = new CompletableFuture<>();
        EditorViewModel vm = onFx(() -> new EditorViewModel(scene, work, Platform::runLater));
        EditorCanvas canvas = onFx(() -> new EditorCanvas(vm, text -> { }));
        Stage stage = onFx(Stage::new);
        onFx(() -> {
            stage.setScene(new javafx.scene.Scene(canvas, WIDTH, HEIGHT));
            stage.show();
            vm.view().viewProperty().set(new ViewTransform(0, 0, WIDTH / 0.32, WIDTH, HEIGHT));
            vm.view().layers().addAll(EnumSet.allOf(Layer.class));
            vm.clock().speedProperty().set(0.25);
            vm.clock().playingProperty().set(true);
            int[] count = {-WARM_UP_FRAMES};
            long[] last = {0};
            long shown = System.nanoTime();
            canvas.onPainted(ms -> {
                long now = System.nanoTime();
                if (vm.results().currentResult().isEmpty()) {
                    // Playback proper is measured once the time series is solved; until then every
                    // frame's instant is solved on the workers, as right after an edit.
                    if (last[0] != 0) {
                        solving.add((now - last[0]) * 1e-6);
                    }
                    last[0] = now;
                    return;
                }
                if (seriesS[0] == 0) {
                    seriesS[0] = (now - shown) * 1e-9;
                }
                int i = count[0]++;
                if (i == 0) {
                    cpu.start();
                }
                if (i >= 0 && i < frames) {
                    interval[i] = (now - last[0]) * 1e-6;
                    paint[i] = ms;
                } else if (i == frames) {
                    cpu.stop();
                    vm.clock().playingProperty().set(false);
                    done.complete(null);
                }
                last[0] = now;
            });
            return null;
        });
        done.get(5, TimeUnit.MINUTES);
        double[] drag = dragLatency(vm, canvas);
        onFx(() -> {
            stage.close();
            return null;
        });
        work.shutdownNow();
        double[] offThread = offThreadWork(scene, 40);
        double[] meanwhile = solving.stream().mapToDouble(Double::doubleValue).toArray();
        return String.format(Locale.ROOT,
                "%d frames of a %d-object scene with moving magnets in a %d×%d editor canvas, software rendering, "
                        + "%d cores (median / 95th percentile, ms): frame time %.1f / %.1f (%.0f %% of frames within "
                        + "%.1f ms), of which painting on the UI thread %.1f / %.1f; processor time per frame "
                        + "(independent of other load): UI thread %.1f, render thread %.1f; off the UI thread per "
                        + "map: field map (4 px cells) + snapshot %.1f / %.1f, backdrop %.1f / %.1f; measured once "
                        + "the time series was solved (%.1f s after opening; frame time meanwhile %.1f / %.1f); "
                        + "dragging a loop, from a mouse move to the frame with its numbers: %.1f / %.1f ms "
                        + "(%.0f %% within %.1f ms)",
                frames, scene.sources().size() + scene.conductors().size(), WIDTH, HEIGHT,
                Runtime.getRuntime().availableProcessors(), median(interval), p95(interval),
                100 * within(interval, SIXTY_HZ_MS), SIXTY_HZ_MS, median(paint), p95(paint),
                cpu.perFrameMs("JavaFX Application Thread", frames), cpu.perFrameMs("QuantumRenderer-0", frames),
                offThread[0], offThread[1], offThread[2], offThread[3], seriesS[0], median(meanwhile), p95(meanwhile),
                median(drag), p95(drag), 100 * within(drag, SIXTY_HZ_MS), SIXTY_HZ_MS);
    }

    /**
     * Drags the middle loop by one pixel a move, the next move once the frame showing the last
     * one's numbers is painted; returns the wall-clock time of each measured move to that frame, ms.
     */
    private static double[] dragLatency(EditorViewModel vm, EditorCanvas canvas)
            throws InterruptedException, ExecutionException, TimeoutException {
        double[] latency = new double[DRAG_MOVES];
        CompletableFuture<Void> done = new CompletableFuture<>();
        onFx(() -> {
            vm.clock().resetTime();
            CanvasGestures g = canvas.gestures();
            ViewTransform v = vm.view().view();
            // The right side of the loop in the middle, which is fixed.
            double x0 = v.screenX(0.015);
            double y0 = v.screenY(0);
            g.pressed(x0, y0, CanvasGestures.Button.PRIMARY, false);
            int[] move = {-DRAG_WARM_UP_MOVES};
            long[] movedAt = {System.nanoTime()};
            g.dragged(x0 - 1, y0);
            canvas.onPainted(ms -> {
                if (done.isDone() || g.frame("").snapshot() == null) {
                    return;
                }
                long now = System.nanoTime();
                int i = move[0]++;
                if (i >= 0) {
                    latency[i] = (now - movedAt[0]) * 1e-6;
                }
                if (i + 1 == DRAG_MOVES) {
                    g.released();
                    done.complete(null);
                    return;
                }
                movedAt[0] = System.nanoTime();
                g.dragged(x0 - 2 - (i + DRAG_WARM_UP_MOVES) % 100, y0);
            });
            return null;
        });
        done.get(2, TimeUnit.MINUTES);
        return latency;
    }

    /** Median and 95th percentile of the map + snapshot and of the backdrop, over {@code n} times of the window. */
    private static double[] offThreadWork(Scene scene, int n) {
        SceneRun run = new SceneRun(scene);
        ViewTransform view = new ViewTransform(0, 0, WIDTH / 0.32, WIDTH, HEIGHT);
        FieldMapper mapper = new FieldMapper(Runnable::run, Runnable::run, r -> { }, e -> { });
        double[] compute = new double[n];
        double[] backdrop = new double[n];
        for (int i = 0; i < n; i++) {
            double t = scene.time().t1S() * i / n;
            long c0 = System.nanoTime();
            FieldRaster raster = mapper.compute(new MapRequest(run, 1, t, view, 4));
            run.instant(t);
            long c1 = System.nanoTime();
            FieldBackdrop.render(raster, view, ColourRange.automatic().scaleFor(raster), EnumSet.allOf(Layer.class));
            compute[i] = (c1 - c0) * 1e-6;
            backdrop[i] = (System.nanoTime() - c1) * 1e-6;
        }
        return new double[] {median(compute), p95(compute), median(backdrop), p95(backdrop)};
    }

    /** Processor time used by the UI and render threads between {@link #start} and {@link #stop}. */
    private static final class ThreadCpu {
        private static final List<String> THREADS = List.of("JavaFX Application Thread", "QuantumRenderer-0");
        private final ThreadMXBean bean = ManagementFactory.getThreadMXBean();
        private final Map<String, Long> started = new HashMap<>();
        private final Map<String, Long> used = new HashMap<>();

        void start() {
            THREADS.forEach(name -> started.put(name, cpuNanos(name)));
        }

        void stop() {
            THREADS.forEach(name -> used.put(name, cpuNanos(name) - started.get(name)));
        }

        double perFrameMs(String thread, int frames) {
            return used.getOrDefault(thread, 0L) * 1e-6 / frames;
        }

        private long cpuNanos(String name) {
            for (Thread t : Thread.getAllStackTraces().keySet()) {
                if (t.getName().equals(name)) {
                    return bean.getThreadCpuTime(t.getId());
                }
            }
            throw new IllegalStateException("no thread named " + name);
        }
    }

    private static double within(double[] ms, double limit) {
        int n = 0;
        for (double m : ms) {
            n += m <= limit ? 1 : 0;
        }
        return (double) n / ms.length;
    }

    private static double[] sorted(double[] ms) {
        double[] w = ms.clone();
        Arrays.sort(w);
        return w;
    }

    /** NaN when nothing was measured (no frame came while the series was solved, say). */
    private static double median(double[] ms) {
        double[] w = sorted(ms);
        return w.length == 0 ? Double.NaN : w[w.length / 2];
    }

    private static double p95(double[] ms) {
        double[] w = sorted(ms);
        return w.length == 0 ? Double.NaN : w[(int) (w.length * 0.95)];
    }

    private static <T> T onFx(Callable<T> task) throws InterruptedException, ExecutionException {
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

package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import javafx.application.Platform;
import javafx.geometry.Point2D;
import javafx.scene.control.Label;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.ShapeFactory;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The UI thread never waits for a run: while a coupled run of many seconds is under way on the
 * editor's workers, the mouse moves over the canvas (each move updates the cursor readout) and
 * every round trip through the UI thread stays short; an edit then stops the run at once, so the
 * new revision's short run is in promptly.
 */
@ExtendWith(ApplicationExtension.class)
class FxResponsivenessTest {

    /**
     * Round trips through the UI thread while the run goes on: the typical (median) one a frame
     * at 60 Hz, the 95th percentile a few frames, the worst under a second. A UI thread that waited
     * for one solve per mouse move would miss the first two; one that waited for the run (tens of
     * seconds), all three. The worst is loose because the shared build machine stalls a thread
     * now and then for a tenth of a second or more (measured: 172 ms once in 40 under a load of 9).
     */
    private static final long MEDIAN_ROUND_TRIP_MS = 17;
    private static final long P95_ROUND_TRIP_MS = 100;
    private static final long MAX_ROUND_TRIP_MS = 1000;
    private static final int PROBES = 40;
    /** The run outlasts the probes many times over, and an edit must free the workers within this. */
    private static final long CANCEL_WITHIN_S = 10;
    private static final long SEED = 20261205L;
    /** A round trip this long means the UI thread is stuck; the test stops waiting. */
    private static final long GIVE_UP_S = 5;

    @TempDir
    static Path home;

    private ExecutorService work;
    private ExecutorService io;
    private EditorViewModel vm;
    private EditorWindow window;

    /**
     * A magnet on a spring-held cart beside a 100-turn shorted loop whose L/R needs the inductive
     * model: one coupled run, sampled every 2 ms over 60 s. Deterministic, and tens of seconds to
     * run on one core.
     */
    static Scene longCoupledRun() {
        Motion.Free cart = new Motion.Free(0.02, 0, new Vec2(0.1, 0), 0, 0, Vec2.ZERO, Vec2.ZERO, 0,
                List.of(new Motion.Free.Spring(new Vec2(0, 0), null, 2, 0.1)));
        Source.BlockMagnet magnet = new Source.BlockMagnet("magnet", "cart", new Vec2(0.1, 0), 0.01, 0.02, 0.005, 0,
                0.001, Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
        Conductor.Loop loop = new Conductor.Loop("loop", Body.FIXED, List.of(Conductor.Vertex.at(0, 0),
                Conductor.Vertex.at(0.04, 0), Conductor.Vertex.at(0.04, 0.02), Conductor.Vertex.at(0, 0.02)), 100,
                ShapeFactory.DEFAULT_WIRE, false, 0, 20);
        return Scene.empty("long coupled run").withBodies(List.of(new Body("cart", "cart", new Vec2(0.1, 0), cart)))
                .withSources(List.of(magnet)).withConductors(List.of(loop)).withTime(new TimeSpan(0, 60, 0.002));
    }

    @Start
    void start(Stage stage) {
        work = Executors.newFixedThreadPool(2, r -> {
            Thread t = new Thread(r, "test-worker");
            t.setDaemon(true);
            return t;
        });
        // Left running: the window's autosave timer may still use it after the test.
        io = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "test-files");
            t.setDaemon(true);
            return t;
        });
        vm = new EditorViewModel(Scene.empty("untitled"), work, Platform::runLater);
        window = new EditorWindow(stage, vm, new JsonSceneStore(), new AppHome(home), io);
        stage.setScene(new javafx.scene.Scene(window.root(), 1100, 760));
        stage.show();
        vm.view().viewProperty().set(new ViewTransform(0.05, 0, 3000, window.canvas().getWidth(),
                window.canvas().getHeight()));
    }

    @AfterEach
    void stopWorkers() {
        work.shutdownNow();
    }

    /** Wall-clock time of one round trip through the UI thread, ms; {@code inProgress} gets whether the run still goes on. */
    private long roundTripMs(boolean[] inProgress) throws Exception {
        long t0 = System.nanoTime();
        try {
            WaitForAsyncUtils.asyncFx(() -> inProgress[0] = vm.results().simulatingProperty().get()
                    && vm.results().currentResult().isEmpty()).get(GIVE_UP_S, TimeUnit.SECONDS);
        } catch (TimeoutException e) {
            fail("the UI thread did not answer for " + GIVE_UP_S + " s: it waits for the run");
        }
        return (System.nanoTime() - t0) / 1_000_000;
    }

    @Test
    void theUiThreadAnswersPromptlyWhileACoupledRunGoesOnAndAnEditStopsIt(FxRobot robot) throws Exception {
        WaitForAsyncUtils.asyncFx(() -> vm.load(longCoupledRun(), null, false)).get(10, TimeUnit.SECONDS);
        try {
            WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> vm.results().simulationProgressProperty().get() > 0);
        } catch (TimeoutException e) {
            fail("no progress of the run within 30 s; the editor says: " + vm.statusProperty().get());
        }
        Label readout = robot.lookup("#cursor-readout").queryAs(Label.class);
        SplittableRandom random = new SplittableRandom(SEED);
        List<Long> roundTrips = new ArrayList<>();
        List<String> readouts = new ArrayList<>();
        boolean[] inProgress = {false};
        double progressBefore = vm.results().simulationProgressProperty().get();

        for (int i = 0; i < PROBES; i++) {
            Point2D at = robot.point(window.canvas()).atOffset(new Point2D(
                    random.nextDouble(-300, 300), random.nextDouble(-200, 200))).query();
            robot.moveTo(at);
            roundTrips.add(roundTripMs(inProgress));
            assertTrue(inProgress[0], "seed " + SEED + ": the run ended during the probes (probe " + i + ")");
            readouts.add(readout.getText());
        }
        double progressAfter = vm.results().simulationProgressProperty().get();

        long edited = System.nanoTime();
        WaitForAsyncUtils.asyncFx(() -> vm.document().apply("Shorter window",
                s -> s.withTime(new TimeSpan(0, 0.05, 0.002)))).get(10, TimeUnit.SECONDS);
        WaitForAsyncUtils.waitFor(CANCEL_WITHIN_S, TimeUnit.SECONDS, () -> vm.results().currentResult().isPresent());
        double cancelS = (System.nanoTime() - edited) * 1e-9;

        long worst = roundTrips.stream().mapToLong(Long::longValue).max().orElseThrow();
        System.out.printf(Locale.ROOT, "UI round trips during the run (%d mouse moves): median %d ms, worst %d ms;"
                        + " run progress %.0f %% → %.0f %% meanwhile; after the edit the new run was in after %.2f s%n",
                PROBES, roundTrips.stream().sorted().toList().get(PROBES / 2), worst, 100 * progressBefore,
                100 * progressAfter, cancelS);
        List<Long> sorted = roundTrips.stream().sorted().toList();
        assertTrue(sorted.get(PROBES / 2) <= MEDIAN_ROUND_TRIP_MS, "seed " + SEED + ": median of " + roundTrips);
        assertTrue(sorted.get(PROBES * 95 / 100) <= P95_ROUND_TRIP_MS, "seed " + SEED + ": 95th percentile of "
                + roundTrips);
        assertTrue(worst < MAX_ROUND_TRIP_MS, "seed " + SEED + ": round trips " + roundTrips);
        assertTrue(readouts.stream().distinct().count() > PROBES / 2, "the moves reached the canvas: " + readouts);
        assertFalse(WaitForAsyncUtils.asyncFx(() -> vm.results().simulatingProperty().get()).get(10, TimeUnit.SECONDS),
                "the new revision's run is done");
    }
}

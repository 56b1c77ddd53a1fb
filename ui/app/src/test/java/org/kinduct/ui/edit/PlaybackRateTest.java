package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayDeque;
import java.util.Queue;
import java.util.concurrent.Executor;
import org.junit.jupiter.api.Test;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;

/** Playback that falls behind the speed asked for says how fast it really goes, and why. */
class PlaybackRateTest {

    private static final Executor SAME_THREAD = Runnable::run;
    private static final ViewTransform SMALL_VIEW = new ViewTransform(0.05, 0, 1000, 80, 60);
    private static final double FRAME_60_HZ_S = 1.0 / 60;

    private static Scene scene() {
        return Fixtures.glidingMagnet().withTime(new TimeSpan(0, 1, 0.01));
    }

    private static EditorViewModel vm(Executor work) {
        EditorViewModel vm = new EditorViewModel(scene(), EditorViewModel::run, work, SAME_THREAD, System::nanoTime);
        vm.view().viewProperty().set(SMALL_VIEW);
        return vm;
    }

    private static void play(EditorViewModel vm, double frameS, double forS) {
        vm.clock().playingProperty().set(true);
        for (double t = 0; t < forS; t += frameS) {
            vm.clock().advance(frameS);
        }
    }

    @Test
    void playbackThatKeepsUpSaysNothing() {
        EditorViewModel vm = vm(SAME_THREAD);
        play(vm, FRAME_60_HZ_S, 1);
        assertEquals("", vm.playbackNoteProperty().get());
    }

    @Test
    void framesSlowerThanTheClockLetsOneMoveOnPlayAtAFractionAndSaySo() {
        EditorViewModel vm = vm(SAME_THREAD);
        // Each 0.25 s frame moves the time on by the clock's longest frame step, 0.1 s: 0.4 of real time.
        play(vm, 0.25, 1);
        assertEquals("playing at 0.40× — frames are slow", vm.playbackNoteProperty().get());
        vm.clock().playingProperty().set(false);
        assertEquals("", vm.playbackNoteProperty().get(), "paused, nothing to tell");
    }

    @Test
    void playbackWaitingForTheSolverSaysSoInsteadOfSeemingToRun() {
        Queue<Runnable> neverRun = new ArrayDeque<>();
        EditorViewModel vm = vm(neverRun::add);
        vm.clock().speedProperty().set(2);
        play(vm, FRAME_60_HZ_S, 1);
        assertEquals("playing — waiting: solving", vm.playbackNoteProperty().get());
    }
}

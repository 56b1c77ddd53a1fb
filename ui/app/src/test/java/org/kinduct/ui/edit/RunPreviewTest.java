package org.kinduct.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Scene;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.RunResult;

/**
 * While a long quasi-static window is computed, the time plot fills in from a coarse run whose
 * samples are the full run's instants, solved alike; it gives way to the full run.
 */
class RunPreviewTest {

    @Test
    void aCoarseRunOfTheSameInstantsComesFirstAndGivesWayToTheFullOne() {
        Scene sled = Demos.load("rail-sled"); // 0 … 160 ms in 1 ms steps
        List<RunResult> previews = new ArrayList<>();
        SceneResults results = new SceneResults(EditorViewModel::run, Runnable::run, Runnable::run, System::nanoTime,
                said -> { });
        results.previewProperty().addListener((o, was, now) -> {
            if (now != null) {
                previews.add(now);
            }
        });

        results.start(sled, 1);

        assertEquals(1, previews.size());
        RunResult coarse = previews.get(0);
        RunResult full = results.currentResult().orElseThrow();
        assertNull(results.previewProperty().get(), "the preview gives way to the full run");
        // 160 intervals at a stride of ceil(160 / 40) = 4: 41 samples, every fourth of the full run's.
        assertEquals(41, coarse.samples().size());
        assertEquals(161, full.samples().size());
        for (int k = 0; k < coarse.samples().size(); k++) {
            Snapshot c = coarse.samples().get(k);
            Snapshot f = full.samples().get(4 * k);
            assertEquals(f.tS(), c.tS(), 1e-15);
            double emf = f.conductors().get(0).emfV();
            assertEquals(emf, c.conductors().get(0).emfV(), 1e-12 * Math.max(1e-3, Math.abs(emf)), "t = " + f.tS());
        }
    }
}

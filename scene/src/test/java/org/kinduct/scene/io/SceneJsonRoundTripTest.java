package org.kinduct.scene.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.Collectors;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductivity;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.MeanFlow;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;

class SceneJsonRoundTripTest {

    private static final long FIRST_SEED = 20_261_201L;
    private static final int RANDOM_SCENES = 200;

    @Test
    void everyRecordVariantSurvivesWriteThenRead() throws SceneFormatException {
        Scene scene = SampleScenes.everyVariant();

        Scene back = SceneJson.read(SceneJson.write(scene), "every-variant.json", SampleScenes.FOLDER);

        assertEquals(scene, back);
    }

    @Test
    void sampleSceneReallyCoversEveryVariant() {
        // Guards the round-trip test above: a variant added to the model must be added to the sample.
        Scene scene = SampleScenes.everyVariant();
        List<Class<?>> motions = scene.bodies().stream().map(b -> b.motion().getClass()).distinct()
                .collect(Collectors.toList());
        List<Class<?>> sources = scene.sources().stream().map(Object::getClass).distinct()
                .collect(Collectors.toList());
        List<Class<?>> conductors = scene.conductors().stream().map(Object::getClass).distinct()
                .collect(Collectors.toList());

        assertEquals(Motion.class.getPermittedSubclasses().length, motions.size(), "motions " + motions);
        assertEquals(Source.class.getPermittedSubclasses().length, sources.size(), "sources " + sources);
        assertEquals(Conductor.class.getPermittedSubclasses().length, conductors.size(), "conductors " + conductors);
        List<Class<?>> conductivities = scene.conductors().stream().filter(c -> c instanceof Conductor.Plate)
                .map(c -> ((Conductor.Plate) c).conductivity().getClass()).distinct().collect(Collectors.toList());
        List<Class<?>> flows = scene.conductors().stream().filter(c -> c instanceof Conductor.Channel)
                .map(c -> ((Conductor.Channel) c).flow().getClass()).distinct().collect(Collectors.toList());
        assertEquals(Conductivity.class.getPermittedSubclasses().length, conductivities.size(), "conductivities");
        assertEquals(MeanFlow.class.getPermittedSubclasses().length, flows.size(), "flows " + flows);
    }

    @Test
    void fixedFrameIsImplicitAndNotWritten() {
        String text = SceneJson.write(SampleScenes.everyVariant());

        assertTrue(!text.contains("\"id\": \"" + Body.FIXED + "\""), text);
    }

    @Test
    void writtenTextIsIndentedWithPointsOnOneLine() {
        String text = SceneJson.write(SampleScenes.everyVariant());

        assertTrue(text.startsWith("{\n  \"format\": \"kinduct-scene\",\n  \"version\": 1,\n"), text);
        assertTrue(text.contains("\"pivot\": [0.01, 0.02]"), text);
        assertTrue(text.contains("\"size\": [0.01, 0.005, 0.003]"), text);
        assertTrue(text.endsWith("}\n"), text);
    }

    static LongStream seeds() {
        return LongStream.range(FIRST_SEED, FIRST_SEED + RANDOM_SCENES);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void randomScenesSurviveWriteThenReadExactly(long seed) {
        Scene scene = SampleScenes.random(new SplittableRandom(seed));
        String text = SceneJson.write(scene);
        try {
            Scene back = SceneJson.read(text, "random.json");
            assertEquals(scene, back, () -> "seed " + seed + ", text:\n" + text);
        } catch (SceneFormatException e) {
            fail("seed " + seed + ": written scene does not read back:\n" + e.getMessage() + "\ntext:\n" + text);
        }
    }
}

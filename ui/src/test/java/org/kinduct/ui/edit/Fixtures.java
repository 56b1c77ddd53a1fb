package org.kinduct.ui.edit;

import java.util.List;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/** Small scenes shared by the edit tests. */
final class Fixtures {

    private Fixtures() {
    }

    /** A 40 mm × 20 mm loop at the origin and a block magnet beside it. */
    static Scene loopAndMagnet() {
        Conductor.Loop loop = Conductor.Loop.simple("loop", Body.FIXED, List.of(
                Conductor.Vertex.at(0, 0), Conductor.Vertex.at(0.04, 0), Conductor.Vertex.at(0.04, 0.02),
                Conductor.Vertex.at(0, 0.02)), ShapeFactory.DEFAULT_WIRE);
        Source.BlockMagnet magnet = new Source.BlockMagnet("magnet", Body.FIXED, new Vec2(0.1, 0), 0.01, 0.02, 0.005,
                0, 0.001, Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
        return Scene.empty("fixture").withConductors(List.of(loop)).withSources(List.of(magnet));
    }
}

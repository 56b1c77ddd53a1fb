package org.kinduct.ui.edit;

import java.util.List;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;

/** Small scenes shared by the edit tests. */
final class Fixtures {

    static final double CART_MASS_KG = 0.02;
    static final double CART_SPRING_N_PER_M = 2;
    static final double CART_V0_M_PER_S = 0.1;

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

    /** {@link #loopAndMagnet()} with the magnet gliding towards the loop at 50 mm/s, over 1 s. */
    static Scene glidingMagnet() {
        return SceneEdits.setMotion(loopAndMagnet(), "magnet", new Motion.Glide(new Vec2(-0.05, 0)), new Vec2(0.1, 0));
    }

    /**
     * A magnet on a free cart held by a spring along x (anchor 100 mm to the left, rest length
     * 100 mm), starting at rest length with speed {@link #CART_V0_M_PER_S}, over 0.5 s; with the
     * loop of {@link #loopAndMagnet()} wound to 100 turns beside it when {@code withLoop}.
     */
    static Scene springCart(boolean withLoop) {
        Motion.Free free = new Motion.Free(CART_MASS_KG, 0, new Vec2(CART_V0_M_PER_S, 0), 0, 0, Vec2.ZERO, Vec2.ZERO,
                0, List.of(new Motion.Free.Spring(new Vec2(0, 0), null, CART_SPRING_N_PER_M, 0.1)));
        Source.BlockMagnet magnet = new Source.BlockMagnet("magnet", "cart", new Vec2(0.1, 0), 0.01, 0.02, 0.005,
                0, 0.001, Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
        Scene s = Scene.empty("spring cart").withBodies(List.of(new Body("cart", "cart", new Vec2(0.1, 0), free)))
                .withSources(List.of(magnet)).withTime(new TimeSpan(0, 0.5, 0.002));
        if (withLoop) {
            // 100 turns, no load: L/R of about a millisecond, so the run takes seconds, not minutes.
            Conductor.Loop one = (Conductor.Loop) loopAndMagnet().conductors().get(0);
            s = s.withConductors(List.of(new Conductor.Loop(one.id(), one.body(), one.vertices(), 100, one.wire(),
                    false, 0, one.temperatureC())));
        }
        return s;
    }
}

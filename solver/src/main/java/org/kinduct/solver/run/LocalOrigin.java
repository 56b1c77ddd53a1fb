package org.kinduct.solver.run;

import java.util.List;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Scenes;
import org.kinduct.scene.Vec2;

/**
 * The point a scene is solved about. A double holds a coordinate X to about 1e-16·X, and every
 * flux, EMF and inductance is built from differences of coordinates: a 1 cm loop 100 km from
 * (0, 0) keeps only about ten of its sixteen digits through each step. Moved next to (0, 0), the
 * scene keeps them (the move itself is exact for coordinates within a factor two of the centre,
 * Sterbenz's lemma). Scenes drawn about (0, 0) are left where they are.
 */
final class LocalOrigin {

    /** Scenes whose centre lies farther from (0, 0) than this many times their size are moved. */
    static final double FAR_SIZES = 100;

    private LocalOrigin() {
    }

    /** The centre of the drawn positions' box when it lies far from (0, 0) for the scene's size, else (0, 0). */
    static Vec2 of(Scene scene) {
        List<Vec2> positions = Scenes.positions(scene);
        if (positions.isEmpty()) {
            return Vec2.ZERO;
        }
        Polygons.Box box = Polygons.box(positions);
        Vec2 centre = box.centre();
        double size = box.extentM();
        return centre.length() > FAR_SIZES * size ? centre : Vec2.ZERO;
    }
}

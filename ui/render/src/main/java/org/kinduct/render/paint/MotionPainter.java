package org.kinduct.render.paint;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;

/**
 * How the bodies move at this instant: an arrow along each moving body's velocity from the middle
 * of what it carries, labelled with its speed, and its angular speed where it turns, so a reader
 * sees what moves which way without the scene file.
 */
final class MotionPainter {

    private static final int COLOUR = 0xFF00695C;
    private static final double ARROW_PX = 38;
    private static final double FONT = 11;

    private MotionPainter() {
    }

    static void draw(Surface s, ViewTransform v, Scene scene, Placement placement, LabelPlacer placer) {
        for (Body body : scene.bodies()) {
            if (Body.FIXED.equals(body.id())) {
                continue;
            }
            List<Vec2> carried = carried(scene, body.id(), placement);
            if (carried.isEmpty()) {
                continue;
            }
            Pose pose = placement.pose(body.id());
            Vec2 centre = SourcePainter.centroid(carried);
            double x = v.screenX(centre.x());
            double y = v.screenY(centre.y());
            // The velocity of the carried objects' middle: the pivot's plus ω × r.
            Vec2 velocity = pose.velocityAt(centre);
            String text = "";
            if (velocity.length() > 0) {
                double dx = velocity.x() / velocity.length();
                double dy = -velocity.y() / velocity.length();
                s.stroke(COLOUR);
                s.fill(COLOUR);
                s.lineWidth(2.5);
                s.dash();
                s.beginPath();
                s.moveTo(x, y);
                s.lineTo(x + dx * (ARROW_PX - 6), y + dy * (ARROW_PX - 6));
                s.strokePath();
                Glyphs.arrowHead(s, x + dx * ARROW_PX, y + dy * ARROW_PX, dx, dy, 10);
                text = "v " + Units.format(velocity.length(), Dimension.VELOCITY);
            }
            if (pose.omegaRadPerS() != 0) {
                text += (text.isEmpty() ? "" : ", ") + "ω " + Units.format(Math.abs(pose.omegaRadPerS()),
                        Dimension.ANGULAR_SPEED) + (pose.omegaRadPerS() > 0 ? " ↺" : " ↻");
            }
            if (!text.isEmpty()) {
                double w = s.textWidth(text, FONT, false) + 8;
                LabelPlacer.Box box = placer.placeAround(x + ARROW_PX / 2, y + 14, w, 16);
                s.fill(Palette.LABEL_BOX);
                s.fillRect(box.x(), box.y(), box.w(), box.h());
                s.fill(COLOUR);
                s.text(text, box.centerX(), box.centerY(), FONT, false, Surface.Anchor.CENTER);
            }
        }
    }

    /** Where the conductors' vertices and the sources' outlines that ride {@code bodyId} are now. */
    private static List<Vec2> carried(Scene scene, String bodyId, Placement placement) {
        List<Vec2> pts = new ArrayList<>();
        for (Conductor c : scene.conductors()) {
            List<Vec2> now = placement.vertices(c);
            for (int i = 0; i < now.size(); i++) {
                if (c.vertices().get(i).bodyOr(c.body()).equals(bodyId)) {
                    pts.add(now.get(i));
                }
            }
        }
        for (Source src : scene.sources()) {
            if (src.body().equals(bodyId)) {
                pts.addAll(SourcePainter.outline(src, placement));
            }
        }
        return pts;
    }
}

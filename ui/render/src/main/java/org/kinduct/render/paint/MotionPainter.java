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
    /** Half the width of an arrow's head, which is twice this long. */
    private static final double HEAD_HALF_PX = 5;
    private static final double FONT = 11;

    private MotionPainter() {
    }

    /** One moving body's mark on screen: the arrow's start, its direction (zero without one), and the label. */
    private record Mark(double x, double y, double dx, double dy, String text) {
        boolean hasArrow() {
            return dx != 0 || dy != 0;
        }
    }

    /** Keeps labels placed before {@link #draw} (the sources') off the velocity arrows. */
    static void reserveArrows(ViewTransform v, Scene scene, Placement placement, LabelPlacer placer) {
        for (Mark m : marks(v, scene, placement)) {
            if (m.hasArrow()) {
                placer.reserveLine(m.x(), m.y(), m.x() + m.dx() * ARROW_PX, m.y() + m.dy() * ARROW_PX, HEAD_HALF_PX);
            }
        }
    }

    static void draw(Surface s, ViewTransform v, Scene scene, Placement placement, LabelPlacer placer) {
        for (Mark m : marks(v, scene, placement)) {
            double x = m.x();
            double y = m.y();
            if (m.hasArrow()) {
                s.stroke(COLOUR);
                s.fill(COLOUR);
                s.lineWidth(2.5);
                s.dash();
                s.beginPath();
                s.moveTo(x, y);
                s.lineTo(x + m.dx() * (ARROW_PX - 6), y + m.dy() * (ARROW_PX - 6));
                s.strokePath();
                Glyphs.arrowHead(s, x + m.dx() * ARROW_PX, y + m.dy() * ARROW_PX, m.dx(), m.dy(), 2 * HEAD_HALF_PX);
            }
            if (!m.text().isEmpty()) {
                double w = s.textWidth(m.text(), FONT, false) + 8;
                LabelPlacer.Box box = placer.placeAround(x + ARROW_PX / 2, y + 14, w, 16);
                s.fill(Palette.LABEL_BOX);
                s.fillRect(box.x(), box.y(), box.w(), box.h());
                s.fill(COLOUR);
                s.text(m.text(), box.centerX(), box.centerY(), FONT, false, Surface.Anchor.CENTER);
            }
        }
    }

    /** The marks of the moving bodies that carry something. */
    private static List<Mark> marks(ViewTransform v, Scene scene, Placement placement) {
        List<Mark> out = new ArrayList<>();
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
            // The velocity of the carried objects' middle: the pivot's plus ω × r.
            Vec2 velocity = pose.velocityAt(centre);
            // Beside the rim speed of a spinning body, rounding of ω × r at its middle is not a speed.
            double reach = 0;
            for (Vec2 p : carried) {
                reach = Math.max(reach, p.minus(centre).length());
            }
            double speed = Units.withoutNoise(velocity.length(),
                    pose.velocity().length() + Math.abs(pose.omegaRadPerS()) * reach);
            double dx = 0;
            double dy = 0;
            String text = "";
            if (speed > 0) {
                dx = velocity.x() / speed;
                dy = -velocity.y() / speed;
                text = "v " + Units.format(speed, Dimension.VELOCITY);
            }
            if (pose.omegaRadPerS() != 0) {
                text += (text.isEmpty() ? "" : ", ") + "ω " + Units.format(Math.abs(pose.omegaRadPerS()),
                        Dimension.ANGULAR_SPEED) + (pose.omegaRadPerS() > 0 ? " ↺" : " ↻");
            }
            out.add(new Mark(v.screenX(centre.x()), v.screenY(centre.y()), dx, dy, text));
        }
        return out;
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

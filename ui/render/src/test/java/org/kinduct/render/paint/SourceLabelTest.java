package org.kinduct.render.paint;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Proxy;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/** Where the painter puts a magnet's pole label and a field patch's mark: whole, and off the conductors. */
class SourceLabelTest {

    private static final double W = 800;
    private static final double H = 600;
    /** 2000 px/m, the origin at the centre of the view. */
    private static final ViewTransform VIEW = new ViewTransform(0, 0, 2000, W, H);
    /** Half the width of a conductor as drawn, its halo included. */
    private static final double CONDUCTOR_HALF_PX = 2.75;
    private static final EnumSet<Layer> LAYERS = EnumSet.of(Layer.SOURCES, Layer.CONDUCTORS);

    /** One drawn text's box, estimated at 0.6 em per character as {@code textWidth} reports it. */
    private record TextBox(String text, double x, double y, double w, double h) {
        /** Whether this box touches the axis-parallel segment from a to b (scene metres) as drawn. */
        boolean touches(Vec2 a, Vec2 b) {
            double x0 = Math.min(VIEW.screenX(a.x()), VIEW.screenX(b.x())) - CONDUCTOR_HALF_PX;
            double x1 = Math.max(VIEW.screenX(a.x()), VIEW.screenX(b.x())) + CONDUCTOR_HALF_PX;
            double y0 = Math.min(VIEW.screenY(a.y()), VIEW.screenY(b.y())) - CONDUCTOR_HALF_PX;
            double y1 = Math.max(VIEW.screenY(a.y()), VIEW.screenY(b.y())) + CONDUCTOR_HALF_PX;
            return x < x1 && x + w > x0 && y < y1 && y + h > y0;
        }
    }

    /** What the painter drew: texts, straight segments (screen px) and filled dots' centres. */
    private record Drawing(List<TextBox> texts, List<double[]> segments, List<double[]> dots) {
    }

    private static List<TextBox> texts(Scene scene) {
        return texts(scene, LAYERS);
    }

    private static List<TextBox> texts(Scene scene, EnumSet<Layer> layers) {
        return draw(scene, layers).texts();
    }

    private static Drawing draw(Scene scene, EnumSet<Layer> layers) {
        Drawing out = new Drawing(new ArrayList<>(), new ArrayList<>(), new ArrayList<>());
        double[] pen = new double[2];
        Surface s = (Surface) Proxy.newProxyInstance(Surface.class.getClassLoader(), new Class<?>[] {Surface.class},
                (proxy, method, args) -> switch (method.getName()) {
                    case "width" -> W;
                    case "height" -> H;
                    case "textWidth" -> 0.6 * (double) args[1] * ((String) args[0]).length();
                    case "moveTo" -> {
                        pen[0] = (double) args[0];
                        pen[1] = (double) args[1];
                        yield null;
                    }
                    case "lineTo" -> {
                        out.segments().add(new double[] {pen[0], pen[1], (double) args[0], (double) args[1]});
                        pen[0] = (double) args[0];
                        pen[1] = (double) args[1];
                        yield null;
                    }
                    case "fillOval" -> {
                        out.dots().add(new double[] {(double) args[0], (double) args[1]});
                        yield null;
                    }
                    case "text" -> {
                        String text = (String) args[0];
                        double x = (double) args[1];
                        double y = (double) args[2];
                        double size = (double) args[3];
                        double w = 0.6 * size * text.length();
                        double top = switch ((Surface.Anchor) args[5]) {
                            case BOTTOM_CENTER, BOTTOM_LEFT, BOTTOM_RIGHT -> y - size;
                            case TOP_CENTER, TOP_LEFT, TOP_RIGHT -> y;
                            default -> y - size / 2;
                        };
                        double left = switch ((Surface.Anchor) args[5]) {
                            case LEFT, TOP_LEFT, BOTTOM_LEFT -> x;
                            case RIGHT, TOP_RIGHT, BOTTOM_RIGHT -> x - w;
                            default -> x - w / 2;
                        };
                        out.texts().add(new TextBox(text, left, top, w, size));
                        yield null;
                    }
                    default -> null;
                });
        ScenePainter.draw(s, new Picture(scene, 0, null, null, VIEW, layers, ColourRange.automatic(),
                EditorMarks.none(), ""));
        return out;
    }

    /** The drawn segments that end on screen point (x, y). */
    private static List<double[]> segmentsEndingAt(Drawing d, double x, double y) {
        return d.segments().stream().filter(g -> Math.abs(g[2] - x) < 1e-9 && Math.abs(g[3] - y) < 1e-9).toList();
    }

    private static Source.BlockMagnet magnet(double x, double y) {
        return new Source.BlockMagnet("m", Body.FIXED, new Vec2(x, y), 0.03, 0.03, 0.005, 0, 0.001,
                Source.Side.BELOW, 1.2, Source.Magnetization.MINUS_Z);
    }

    private static Conductor.Wire wire(Vec2 a, Vec2 b) {
        return new Conductor.Wire("w", Body.FIXED, List.of(new Conductor.Vertex(a, null), new Conductor.Vertex(b, null)));
    }

    private static List<TextBox> named(List<TextBox> all, String... texts) {
        List<String> wanted = List.of(texts);
        return all.stream().filter(t -> wanted.contains(t.text())).toList();
    }

    @Test
    void aWireAcrossAMagnetsCentreDoesNotRunThroughItsPoleLabel() {
        Scene scene = Scene.empty("t").withSources(List.of(magnet(0, 0)))
                .withConductors(List.of(wire(new Vec2(-0.1, 0), new Vec2(0.1, 0))));
        List<TextBox> pole = named(texts(scene), "S", "M −z");
        assertEquals(2, pole.size(), pole.toString());
        for (TextBox t : pole) {
            assertFalse(t.touches(new Vec2(-0.1, 0), new Vec2(0.1, 0)), t + " lies on the wire");
        }
    }

    @Test
    void aMagnetByTheEdgeOfTheViewKeepsItsWholePoleLabelInView() {
        // Centre 2 px inside the right edge: a label centred there would be cut in half.
        double x = VIEW.sceneX(W - 2);
        List<TextBox> pole = named(texts(Scene.empty("t").withSources(List.of(magnet(x, 0)))), "S", "M −z");
        assertEquals(2, pole.size(), pole.toString());
        for (TextBox t : pole) {
            assertTrue(t.x() >= 0 && t.x() + t.w() <= W, t + " is cut off");
        }
    }

    @Test
    void aMagnetLabelStaysOnItsCentreWhenNothingIsInTheWay() {
        List<TextBox> pole = named(texts(Scene.empty("t").withSources(List.of(magnet(0, 0)))), "S");
        assertEquals(VIEW.screenX(0), pole.get(0).x() + pole.get(0).w() / 2, 1e-9);
    }

    @Test
    void aPoleLabelPushedAwayByConductorsGetsALeaderToItsMagnetsCentre() {
        // Nine wires 5 px apart across the magnet's centre: the 30 px label cannot sit within 20 px of it.
        List<Conductor> wires = new ArrayList<>();
        for (int k = -4; k <= 4; k++) {
            double y = k * 0.0025;
            wires.add(new Conductor.Wire("w" + k, Body.FIXED, List.of(new Conductor.Vertex(new Vec2(-0.1, y), null),
                    new Conductor.Vertex(new Vec2(0.1, y), null))));
        }
        Drawing d = draw(Scene.empty("t").withSources(List.of(magnet(0, 0))).withConductors(wires), LAYERS);
        double cx = VIEW.screenX(0);
        double cy = VIEW.screenY(0);
        TextBox pole = named(d.texts(), "S").get(0);
        List<double[]> leaders = segmentsEndingAt(d, cx, cy);
        assertEquals(1, leaders.size(), "one leader to the magnet's centre");
        double[] g = leaders.get(0);
        // The label's box as the painter sizes it (the wider of "S" and "M −z", 6 px margin, 30 px tall),
        // centred 16 px below the top of the pole letter; the leader leaves its point nearest the centre.
        LabelPlacer.Box box = new LabelPlacer.Box(pole.x() + pole.w() / 2 - (0.6 * 11 * 4 + 6) / 2, pole.y() + 1,
                0.6 * 11 * 4 + 6, 30);
        assertEquals(box.nearestX(cx), g[0], 1e-9);
        assertEquals(box.nearestY(cy), g[1], 1e-9);
        assertTrue(box.distanceTo(cx, cy) > 20, "the label had to move off the wires: " + box);
        assertTrue(d.dots().stream().anyMatch(p -> p[0] == cx && p[1] == cy), "a dot marks the centre");
    }

    @Test
    void aPoleLabelOnItsMagnetsCentreHasNoLeader() {
        Drawing d = draw(Scene.empty("t").withSources(List.of(magnet(0, 0))), LAYERS);
        assertEquals(List.of(), segmentsEndingAt(d, VIEW.screenX(0), VIEW.screenY(0)));
    }

    @Test
    void aWireAcrossACoilsCentreDoesNotRunThroughItsTurnCount() {
        Source.SourceCoil coil = new Source.SourceCoil("floor", Body.FIXED,
                new Source.CoilShape.Circle(Vec2.ZERO, 0.1), 10, -0.3, Source.Drive.dc(1));
        Scene scene = Scene.empty("t").withSources(List.of(coil))
                .withConductors(List.of(wire(new Vec2(-0.1, 0), new Vec2(0.1, 0))));
        List<TextBox> turns = named(texts(scene), "10 turns");
        assertEquals(1, turns.size(), turns.toString());
        assertFalse(turns.get(0).touches(new Vec2(-0.1, 0), new Vec2(0.1, 0)), turns + " lies on the wire");
    }

    @Test
    void aCoilWhoseCentreIsOutOfViewHasNoTurnCountAtTheEdge() {
        Source.SourceCoil coil = new Source.SourceCoil("floor", Body.FIXED,
                new Source.CoilShape.Circle(new Vec2(1, 0), 0.9), 10, -0.3, Source.Drive.dc(1));
        assertEquals(List.of(), named(texts(Scene.empty("t").withSources(List.of(coil))), "10 turns"));
    }

    @Test
    void aVelocityArrowFromAFieldPatchsCentreDoesNotRunThroughItsMark() {
        Source.FieldPatch patch = new Source.FieldPatch("gap", Body.FIXED, List.of(new Vec2(-0.02, -0.025),
                new Vec2(0.02, -0.025), new Vec2(0.02, 0.025), new Vec2(-0.02, 0.025)), 0.5);
        // A short rod gliding to the right, its middle on the patch's centre: the arrow starts there.
        Body cart = new Body("cart", "cart", Vec2.ZERO, new org.kinduct.scene.Motion.Glide(new Vec2(0.5, 0)));
        Conductor.Wire rod = new Conductor.Wire("rod", "cart", List.of(new Conductor.Vertex(new Vec2(0, -0.001), null),
                new Conductor.Vertex(new Vec2(0, 0.001), null)));
        Scene scene = Scene.empty("t").withBodies(List.of(cart)).withSources(List.of(patch))
                .withConductors(List.of(rod));
        List<TextBox> value = named(texts(scene, EnumSet.of(Layer.SOURCES, Layer.CONDUCTORS, Layer.MOTION)),
                Quantities.bz(0.5));
        assertEquals(1, value.size());
        // The arrow runs 38 px to the right of the centre, its head 5 px to each side.
        double ax = VIEW.screenX(0);
        double ay = VIEW.screenY(0);
        TextBox t = value.get(0);
        boolean onArrow = t.x() < ax + 38 + 5 && t.x() + t.w() > ax - 5 && t.y() < ay + 5 && t.y() + t.h() > ay - 5;
        assertFalse(onArrow, t + " lies on the velocity arrow");
    }

    @Test
    void aLoopEdgeAcrossAFieldPatchsCentreDoesNotRunThroughItsMark() {
        Source.FieldPatch patch = new Source.FieldPatch("gap", Body.FIXED, List.of(new Vec2(-0.02, -0.025),
                new Vec2(0.02, -0.025), new Vec2(0.02, 0.025), new Vec2(-0.02, 0.025)), 0.5);
        // The loop's right edge runs up the patch's centre line, x = 0.
        List<Vec2> corners = List.of(new Vec2(-0.06, -0.01), new Vec2(0, -0.01), new Vec2(0, 0.01),
                new Vec2(-0.06, 0.01));
        Conductor.Loop loop = Conductor.Loop.simple("rails", Body.FIXED, corners.stream()
                .map(p -> new Conductor.Vertex(p, null)).toList(),
                org.kinduct.scene.WireSpec.of(org.kinduct.scene.Material.COPPER, 1e-3));
        Scene scene = Scene.empty("t").withSources(List.of(patch)).withConductors(List.of(loop));
        List<TextBox> value = named(texts(scene), Quantities.bz(0.5));
        assertEquals(1, value.size());
        for (int i = 0; i < corners.size(); i++) {
            assertFalse(value.get(0).touches(corners.get(i), corners.get((i + 1) % corners.size())),
                    value + " lies on the loop's edge " + i);
        }
    }
}

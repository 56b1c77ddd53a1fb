package org.kinduct.render.paint;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.lang.reflect.Proxy;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductivity;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.SceneRun;

/**
 * A plate as the painter draws it: the two senses of its eddies on the sides of the pole where
 * Lenz's law puts them, its hole left open, |J| colours only when asked, and the + disc at the
 * positive electrode.
 */
class SheetPainterTest {

    private static final double W = 800;
    private static final double H = 400;
    private static final ViewTransform VIEW = new ViewTransform(0, 0, 8000, W, H);
    private static final double POLE_M = 0.006;

    /**
     * A 80 × 30 mm aluminium strip with a hole near its left end, gliding in +x under a round pole
     * of B out of the board, with electrodes on its upper and lower edges and the pair top − bottom.
     */
    private static Scene scene() {
        List<Vec2> pole = new ArrayList<>();
        for (int k = 0; k < 64; k++) {
            pole.add(Vec2.polar(POLE_M, 2 * Math.PI * k / 64));
        }
        List<Vec2> hole = List.of(new Vec2(-0.034, -0.004), new Vec2(-0.028, -0.004), new Vec2(-0.028, 0.004),
                new Vec2(-0.034, 0.004));
        Conductor.Plate strip = new Conductor.Plate("strip", "slide", List.of(new Vec2(-0.04, -0.015),
                new Vec2(0.04, -0.015), new Vec2(0.04, 0.015), new Vec2(-0.04, 0.015)), List.of(hole), 0.002,
                new Conductivity.OfMaterial(Material.ALUMINIUM, 20),
                List.of(new Conductor.Electrode("top", new Vec2(0.003, 0.015)),
                        new Conductor.Electrode("bottom", new Vec2(0.003, -0.015))),
                List.of(new Conductor.ElectrodePair("top", "bottom")), OptionalDouble.empty());
        return new Scene("strip", "", List.of(new Body("slide", "slide", Vec2.ZERO,
                new Motion.Glide(new Vec2(0.5, 0)))), List.of(new Source.FieldPatch("pole", Body.FIXED, pole, 0.4)),
                List.of(strip), new TimeSpan(0, 0.01, 0.01));
    }

    private static BufferedImage paint(Scene scene, Snapshot snap, Set<Layer> layers) {
        BufferedImage img = new BufferedImage((int) W, (int) H, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        ScenePainter.draw(new Java2dSurface(g, W, H), new Picture(scene, 0, snap, null, VIEW, layers,
                ColourRange.automatic(), EditorMarks.none(), ""));
        g.dispose();
        return img;
    }

    /** Pixels of {@code colour} (to a few levels, as anti-aliasing leaves line cores) in x ∈ [x0, x1) of the image. */
    private static int count(BufferedImage img, int colour, int x0, int x1) {
        int n = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = x0; x < x1; x++) {
                int p = img.getRGB(x, y);
                boolean near = true;
                for (int c = 0; c < 24; c += 8) {
                    near &= Math.abs((p >> c & 0xFF) - (colour >> c & 0xFF)) <= 6;
                }
                n += near ? 1 : 0;
            }
        }
        return n;
    }

    @Test
    void eddiesAheadOfThePoleTurnClockwiseAndBehindItCounterClockwise() {
        Scene scene = scene();
        Snapshot snap = new SceneRun(scene).instant(0);
        BufferedImage img = paint(scene, snap, EnumSet.of(Layer.CONDUCTORS, Layer.EDDY_CURRENTS));
        int centre = (int) VIEW.screenX(0);
        // Seen from the strip the pole runs in −x: ahead of it (left) the flux grows and the eddy
        // turns clockwise, behind it counter-clockwise (Lenz's law; Griffiths, Introduction to
        // Electrodynamics, 4th ed., 2013, §7.1.3), drawn in the two colours.
        int clockwiseLeft = count(img, Streamlines.CW, 0, centre);
        int clockwiseRight = count(img, Streamlines.CW, centre, (int) W);
        int counterLeft = count(img, Streamlines.CCW, 0, centre);
        int counterRight = count(img, Streamlines.CCW, centre, (int) W);
        assertTrue(clockwiseLeft > 10 * clockwiseRight, "clockwise lines " + clockwiseLeft + " left, " + clockwiseRight
                + " right");
        assertTrue(counterRight > 10 * counterLeft, "counter-clockwise lines " + counterLeft + " left, " + counterRight
                + " right");
    }

    @Test
    void currentDensityColoursOnlyWhenAskedAndNeverInTheHole() {
        Scene scene = scene();
        Snapshot snap = new SceneRun(scene).instant(0);
        // A point of the strip beside the pole, where the current is strong, and one in the hole.
        int sx = (int) VIEW.screenX(0);
        int sy = (int) VIEW.screenY(-0.009);
        int hx = (int) VIEW.screenX(-0.031);
        int hy = (int) VIEW.screenY(0);
        BufferedImage plain = paint(scene, snap, EnumSet.of(Layer.CONDUCTORS));
        BufferedImage coloured = paint(scene, snap, EnumSet.of(Layer.CONDUCTORS, Layer.CURRENT_DENSITY));
        assertTrue(plain.getRGB(sx, sy) != coloured.getRGB(sx, sy), "|J| colours the strip when asked");
        assertEquals(plain.getRGB(hx, hy), coloured.getRGB(hx, hy), "the hole stays clear");
        assertEquals(0xFFFAFAF7, plain.getRGB(hx, hy) | 0xFF000000, "the hole shows the background, not the tint");
    }

    @Test
    void calloutNamesThePairsVoltageAndItsPositiveElectrode() {
        Scene scene = scene();
        Snapshot snap = new SceneRun(scene).instant(0);
        List<String> texts = new ArrayList<>();
        Surface s = (Surface) Proxy.newProxyInstance(Surface.class.getClassLoader(), new Class<?>[] {Surface.class},
                (proxy, method, args) -> switch (method.getName()) {
                    case "width" -> W;
                    case "height" -> H;
                    case "textWidth" -> 0.6 * (double) args[1] * ((String) args[0]).length();
                    case "text" -> {
                        texts.add((String) args[0]);
                        yield null;
                    }
                    default -> null;
                });
        ScenePainter.draw(s, new Picture(scene, 0, snap, null, VIEW, EnumSet.of(Layer.LENZ, Layer.CALLOUTS),
                ColourRange.automatic(), EditorMarks.none(), ""));
        String positive = snap.sheet("strip").orElseThrow().pairs().get(0).positive().orElseThrow();
        assertTrue(texts.stream().anyMatch(t -> t.startsWith("U top−bottom ") && t.contains("+ at " + positive)),
                texts.toString());
        assertTrue(texts.stream().anyMatch(t -> t.startsWith("top ") && t.endsWith("V")), "electrode label: " + texts);
    }
}

package org.kinduct.ui.app;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.util.EnumSet;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.canvas.Canvas;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Circulation;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.Terminal;
import org.kinduct.ui.edit.ShapeFactory;
import org.kinduct.render.paint.ColourRange;
import org.kinduct.render.paint.EditorMarks;
import org.kinduct.render.paint.FieldBackdrop;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.paint.Picture;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.view.ViewTransform;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Shows a hand-made frame on a real JavaFX canvas the way the editor does and checks pixels: the heat map's sign
 * colours and where the polarity discs and the induced-field symbol land.
 */
@ExtendWith(ApplicationExtension.class)
class PainterPixelTest {

    private static final int W = 400;
    private static final int H = 300;
    /** Luminance below which a pixel counts as the dark "+" disc, above which as the light "−" disc. */
    private static final double DARK = 80;
    private static final double LIGHT = 200;
    private static final ViewTransform VIEW = new ViewTransform(0, 0, 1000, W, H);

    @Start
    void start(Stage stage) {
        stage.show();
    }

    /** B_z = +0.1 T left of x = 0, −0.1 T right of it. */
    private static FieldRaster halves() {
        int cols = 40;
        int rows = 30;
        float[] v = new float[cols * rows];
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < cols; c++) {
                v[r * cols + c] = c < cols / 2 ? 0.1f : -0.1f;
            }
        }
        return new FieldRaster(-0.2, 0.15, 0.01, cols, rows, v, 0.1, 0.1f, 1, 0);
    }

    private static PixelReader render(Scene scene, Snapshot snap, String name) throws Exception {
        return render(scene, snap, name, false);
    }

    /** Shows a frame the way the editor does, the field layers from a backdrop when asked. */
    private static PixelReader render(Scene scene, Snapshot snap, String name, boolean backdrop) throws Exception {
        EnumSet<Layer> layers = EnumSet.of(Layer.HEAT_MAP, Layer.CONDUCTORS, Layer.LENZ);
        Picture f = new Picture(scene, 0, snap, halves(), VIEW, layers, ColourRange.automatic(), EditorMarks.none(), "");
        FieldBackdrop drawn = backdrop ? FieldBackdrop.render(halves(), VIEW, ColourRange.automatic().scaleFor(halves()), layers) : null;
        WritableImage img = WaitForAsyncUtils.asyncFx(() -> {
            Canvas c = new Canvas(W, H);
            new CanvasFrames(c).show(f, drawn);
            return c.snapshot(null, null);
        }).get(20, TimeUnit.SECONDS);
        File out = new File("target/" + name + ".png");
        ImageIO.write(SwingFXUtils.fromFXImage(img, null), "png", out);
        return img.getPixelReader();
    }

    private static double luminance(int argb) {
        return 0.299 * ((argb >> 16) & 0xFF) + 0.587 * ((argb >> 8) & 0xFF) + 0.114 * (argb & 0xFF);
    }

    private static int red(int argb) {
        return (argb >> 16) & 0xFF;
    }

    private static int blue(int argb) {
        return argb & 0xFF;
    }

    private static ConductorState wireState(List<Vec2> pts, Terminal plus) {
        return new ConductorState("w", ConductorState.Kind.WIRE, pts, Double.NaN, Double.NaN, Double.NaN, 1, 1, 0, 0,
                plus, 0, Circulation.NONE, Vec2.ZERO, Double.NaN, Double.NaN, true);
    }

    @ParameterizedTest(name = "from a backdrop: {0}")
    @ValueSource(booleans = {false, true})
    void heatMapIsWarmWhereFieldComesOutAndCoolWhereItGoesIn(boolean backdrop) throws Exception {
        PixelReader px = render(Scene.empty("empty"), null, "pixel-heatmap-" + backdrop, backdrop);
        int out = px.getArgb((int) VIEW.screenX(-0.15), (int) VIEW.screenY(0.1));
        int in = px.getArgb((int) VIEW.screenX(0.15), (int) VIEW.screenY(0.1));
        assertTrue(red(out) > blue(out) + 40, "B_z > 0 (out of the screen) is amber: " + Integer.toHexString(out));
        assertTrue(blue(in) > red(in) + 40, "B_z < 0 (into the screen) is blue: " + Integer.toHexString(in));
    }

    @Test
    void plusDiscSitsAtTheEndTheSolverNamesPositive() throws Exception {
        List<Vec2> pts = List.of(new Vec2(0.05, -0.08), new Vec2(0.05, 0.08));
        Conductor.Wire wire = new Conductor.Wire("w", Body.FIXED,
                pts.stream().map(p -> new Conductor.Vertex(p, null)).toList());
        Scene scene = Scene.empty("wire").withConductors(List.of(wire));
        for (Terminal plus : List.of(Terminal.LAST, Terminal.FIRST)) {
            PixelReader px = render(scene, new Snapshot(0, List.of(wireState(pts, plus))), "pixel-wire-" + plus);
            // The only wire: its discs have the largest EMF, radius 11 px, drawn 16 px beyond each end.
            int x = (int) VIEW.screenX(0.05) + 5;
            int top = px.getArgb(x, (int) VIEW.screenY(0.08) - 16 + 5);
            int bottom = px.getArgb(x, (int) VIEW.screenY(-0.08) + 16 + 5);
            int plusPixel = plus == Terminal.LAST ? top : bottom;
            int minusPixel = plus == Terminal.LAST ? bottom : top;
            assertTrue(luminance(plusPixel) < DARK, plus + ": + disc is dark, got " + Integer.toHexString(plusPixel));
            assertTrue(luminance(minusPixel) > LIGHT, plus + ": − disc is light, got " + Integer.toHexString(minusPixel));
        }
    }

    @Test
    void inducedFieldSymbolFollowsTheCurrentSense() throws Exception {
        List<Vec2> pts = List.of(new Vec2(-0.15, -0.1), new Vec2(-0.05, -0.1), new Vec2(-0.05, 0), new Vec2(-0.15, 0));
        Conductor.Loop loop = Conductor.Loop.simple("l", Body.FIXED,
                pts.stream().map(p -> new Conductor.Vertex(p, null)).toList(), ShapeFactory.DEFAULT_WIRE);
        Scene scene = Scene.empty("loop").withConductors(List.of(loop));
        int cx = (int) VIEW.screenX(-0.1);
        int cy = (int) VIEW.screenY(-0.05);
        for (Circulation sense : List.of(Circulation.CCW, Circulation.CW)) {
            double current = sense == Circulation.CCW ? 0.5 : -0.5;
            ConductorState st = new ConductorState("l", ConductorState.Kind.LOOP, pts, 1e-3, 1e-3, -1, -1, -1, 0, 0,
                    Terminal.NONE, current, sense, Vec2.ZERO, 2, Double.NaN, true);
            PixelReader px = render(scene, new Snapshot(0, List.of(st)), "pixel-loop-" + sense);
            // ⊙ has a filled centre dot; ⊗ has a cross whose arms pass 3 px diagonally off the centre.
            int centre = px.getArgb(cx, cy);
            int diagonal = px.getArgb(cx + 3, cy + 3);
            if (sense == Circulation.CCW) {
                assertTrue(luminance(centre) < DARK, "⊙ dot at the centre of a counter-clockwise loop");
                assertTrue(luminance(diagonal) > DARK, "no cross arm for ⊙");
            } else {
                assertTrue(luminance(diagonal) < DARK, "⊗ arm off the centre of a clockwise loop");
            }
        }
    }
}

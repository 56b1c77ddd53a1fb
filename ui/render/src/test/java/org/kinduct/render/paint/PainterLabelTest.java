package org.kinduct.render.paint;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Proxy;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.function.DoubleBinaryOperator;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.render.view.ViewTransform;

/** Where the painter puts contour and axis labels, and how big it draws current arrows. */
class PainterLabelTest {

    private static final double W = 800;
    private static final double H = 600;
    private static final ViewTransform VIEW = new ViewTransform(0, 0, 2000, W, H);
    private static final double CELL_M = 0.0005;

    /** One drawn text: its string, anchor point and size. */
    private record Text(String text, double x, double y, double size) {
    }

    /** Draws a frame on a surface that only records its texts (widths estimated at 0.6 em per character). */
    private static List<Text> texts(FieldRaster raster, EnumSet<Layer> layers) {
        List<Text> out = new ArrayList<>();
        Surface s = (Surface) Proxy.newProxyInstance(Surface.class.getClassLoader(), new Class<?>[] {Surface.class},
                (proxy, method, args) -> switch (method.getName()) {
                    case "width" -> W;
                    case "height" -> H;
                    case "textWidth" -> 0.6 * (double) args[1] * ((String) args[0]).length();
                    case "text" -> {
                        out.add(new Text((String) args[0], (double) args[1], (double) args[2], (double) args[3]));
                        yield null;
                    }
                    default -> null;
                });
        ScenePainter.draw(s, new Picture(Scene.empty("t"), 0, null, raster, VIEW, layers, ColourRange.automatic(),
                EditorMarks.none(), ""));
        return out;
    }

    private static FieldRaster raster(DoubleBinaryOperator bz) {
        int cols = (int) (W / (VIEW.pxPerM() * CELL_M));
        int rows = (int) (H / (VIEW.pxPerM() * CELL_M));
        float[] v = new float[cols * rows];
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < cols; c++) {
                v[r * cols + c] = (float) bz.applyAsDouble(VIEW.minX() + (c + 0.5) * CELL_M,
                        VIEW.maxY() - (r + 0.5) * CELL_M);
            }
        }
        return new FieldRaster(VIEW.minX(), VIEW.maxY(), CELL_M, cols, rows, v, 0.5, 0.5, 0, 0);
    }

    private static List<Text> contourLabels(List<Text> all) {
        return all.stream().filter(t -> t.text().endsWith("mT")).toList();
    }

    @Test
    void anIdealPatchEdgeWhereEveryLevelCrowdsGetsNoContourLabels() {
        // 0.5 T inside a 100 mm × 80 mm patch, nothing outside: the levels 100…400 mT all run along its edge.
        FieldRaster step = raster((x, y) -> Math.abs(x) < 0.05 && Math.abs(y) < 0.04 ? 0.5 : 0);
        assertTrue(contourLabels(texts(step, EnumSet.of(Layer.CONTOURS))).isEmpty());
    }

    @Test
    void wellSpacedLevelsAreStillLabelled() {
        // A gentle ramp, 0.5 T over the view's width: the levels lie 80 px apart.
        FieldRaster ramp = raster((x, y) -> x / 0.2 * 0.5);
        assertFalse(contourLabels(texts(ramp, EnumSet.of(Layer.CONTOURS))).isEmpty());
    }

    @Test
    void twoLabelsOfOneLevelNameDifferentStretchesOfIt() {
        // The same ramp: each level is a straight vertical line the full height of the view.
        FieldRaster ramp = raster((x, y) -> x / 0.2 * 0.5);
        List<Text> labels = contourLabels(texts(ramp, EnumSet.of(Layer.CONTOURS)));
        for (int i = 0; i < labels.size(); i++) {
            for (int j = i + 1; j < labels.size(); j++) {
                Text a = labels.get(i);
                Text b = labels.get(j);
                if (a.text().equals(b.text())) {
                    assertTrue(Math.hypot(a.x() - b.x(), a.y() - b.y()) >= 200, a + " and " + b);
                }
            }
        }
    }

    @Test
    void axisAndContourLabelsAreLargeEnoughForPrintAndKeepOutOfTheTimeBox() {
        FieldRaster ramp = raster((x, y) -> x / 0.2 * 0.5);
        List<Text> all = texts(ramp, EnumSet.of(Layer.CONTOURS, Layer.GRID, Layer.TIME));
        List<Text> labels = all.stream().filter(t -> t.text().endsWith("m") || t.text().endsWith("mT")).toList();
        assertFalse(labels.isEmpty());
        for (Text t : labels) {
            // 11 units on a 600-unit page printed 16 cm wide: 11 × 160 / 600 mm = 2.93 mm = 8.3 pt ≥ 8 pt
            // (1 pt = 0.3528 mm, common practice in typesetting).
            assertTrue(t.size() * 160.0 / 600 / 0.3528 >= 8, t.toString());
            boolean inTimeBox = t.x() < 156 && t.y() < 26 + 2 && t.y() > 6 - t.size();
            assertFalse(inTimeBox, t + " is under the time box");
        }
    }

    @Test
    void axisValuesNeitherTouchEachOtherNorHideUnderTheScaleBarNorRunOffTheEdge() {
        FieldRaster ramp = raster((x, y) -> x / 0.2 * 0.5);
        List<Text> axis = texts(ramp, EnumSet.of(Layer.GRID, Layer.SCALE_BAR)).stream()
                .filter(t -> t.size() == ScenePainter.LABEL_FONT).toList();
        assertTrue(axis.size() > 4, axis.toString());
        List<double[]> boxes = new ArrayList<>();
        for (Text t : axis) {
            double w = 0.6 * t.size() * t.text().length();
            double h = t.size() + 2;
            // x values hang from y = 30 (top-left anchor); y values stand at x = 4 (bottom-left anchor).
            double top = t.x() == 4 ? t.y() - h : t.y();
            boxes.add(new double[] {t.x(), top, w, h});
            assertTrue(t.x() >= 0 && t.x() + w <= W && top >= 0 && top + h <= H, t + " is cut off");
            boolean underBar = t.x() < 8 + 180 && t.x() + w > 8 && top < H - 4 && top + h > H - 44;
            assertFalse(underBar, t + " is under the scale bar");
        }
        for (int i = 0; i < boxes.size(); i++) {
            for (int j = i + 1; j < boxes.size(); j++) {
                double[] a = boxes.get(i);
                double[] b = boxes.get(j);
                boolean overlap = a[0] < b[0] + b[2] && b[0] < a[0] + a[2] && a[1] < b[1] + b[3] && b[1] < a[1] + a[3];
                assertFalse(overlap, axis.get(i) + " touches " + axis.get(j));
            }
        }
    }

    @Test
    void contourLabelsNeverCoverAnAxisValue() {
        // Steep enough that many levels cross the top row of x values and the left column of y values.
        FieldRaster ramp = raster((x, y) -> (x + y) / 0.05 * 0.5);
        List<Text> all = texts(ramp, EnumSet.of(Layer.CONTOURS, Layer.GRID));
        List<double[]> axis = new ArrayList<>();
        List<double[]> contour = new ArrayList<>();
        for (Text t : all) {
            double w = 0.6 * t.size() * t.text().length();
            if (t.text().endsWith("mT")) {
                // Centred on its spot.
                contour.add(new double[] {t.x() - w / 2, t.y() - t.size() / 2, w, t.size()});
            } else if (t.text().endsWith("m")) {
                double top = t.x() == 4 ? t.y() - t.size() - 2 : t.y();
                axis.add(new double[] {t.x(), top, w, t.size() + 2});
            }
        }
        assertFalse(contour.isEmpty() || axis.isEmpty(), all.toString());
        for (double[] c : contour) {
            for (double[] a : axis) {
                boolean overlap = c[0] < a[0] + a[2] && a[0] < c[0] + c[2] && c[1] < a[1] + a[3] && a[1] < c[1] + c[3];
                assertFalse(overlap, java.util.Arrays.toString(c) + " covers " + java.util.Arrays.toString(a));
            }
        }
    }

    @Test
    void currentArrowsShrinkOnLoopsThatAreSmallOnScreen() {
        List<Vec2> square10mm = List.of(new Vec2(0, 0), new Vec2(0.01, 0), new Vec2(0.01, 0.01), new Vec2(0, 0.01));
        // 10 mm at 2000 px/m is 20 px across: the smallest arrows.
        assertEquals(0.4, ConductorPainter.arrowScale(VIEW, square10mm), 1e-12);
        assertEquals(1, ConductorPainter.arrowScale(new ViewTransform(0, 0, 40_000, W, H), square10mm), 1e-12);
        assertEquals(0.75, ConductorPainter.arrowScale(new ViewTransform(0, 0, 12_000, W, H), square10mm), 1e-12);
    }
}

package org.kinduct.render.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.demo.Demos;
import org.kinduct.render.paint.Surface;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Scene;

/** What a printed page promises: the box asked for, and text no smaller than 8 pt at 16 cm wide. */
class PageGeometryTest {

    /** The page printed 16 cm wide (a column of a design note): 1 unit = 160 mm / WIDTH. */
    private static final double PRINT_WIDTH_MM = 160;
    /** 1 pt = 25.4/72 mm (the PostScript point; common practice in print). */
    private static final double POINT_MM = 25.4 / 72;
    private static final double SMALLEST_PT = 8;

    static List<String> demos() {
        return Demos.names();
    }

    @Test
    void aChosenBoxIsExactlyTheMapsExtent() {
        Scene scene = ExportFixtures.rodInUniformField();
        SnapshotOptions options = ExportFixtures.options(0.05, 1200, 150, new ViewChoice.Box(-0.05, -0.03, 0.05, 0.03));
        SnapshotPage page = SnapshotPage.layout(scene, new Exporter(scene, options).snapshot(), List.of(), options);
        ViewTransform v = page.mapView();
        assertEquals(-0.05, v.minX(), 1e-12);
        assertEquals(0.05, v.maxX(), 1e-12);
        assertEquals(-0.03, v.minY(), 1e-12);
        assertEquals(0.03, v.maxY(), 1e-12);
    }

    @ParameterizedTest
    @MethodSource("demos")
    void noTextIsSmallerThanEightPointsWhenThePageIsPrintedSixteenCentimetresWide(String demo) {
        Scene scene = Demos.load(demo);
        SnapshotOptions options = ExportFixtures.options(scene.time().t0S(), 1200, 150, new ViewChoice.Fit());
        Exporter export = new Exporter(scene, options);
        SnapshotPage page = SnapshotPage.layout(scene, export.snapshot(), List.of("remark"), List.of("caution"),
                export.result().scales(), null, options);
        Recorder texts = new Recorder(page.height());
        page.draw(texts, null);
        double mmPerUnit = PRINT_WIDTH_MM / SnapshotPage.WIDTH;
        assertTrue(!texts.sizes.isEmpty(), "the page has text");
        for (int i = 0; i < texts.sizes.size(); i++) {
            double pt = texts.sizes.get(i) * mmPerUnit / POINT_MM;
            assertTrue(pt >= SMALLEST_PT - 1e-9, demo + ": \"" + texts.words.get(i) + "\" prints at " + pt + " pt");
        }
    }

    /** Records the size of every text drawn; draws nothing. */
    private static final class Recorder implements Surface {
        final List<Double> sizes = new ArrayList<>();
        final List<String> words = new ArrayList<>();
        private final double height;

        Recorder(double height) {
            this.height = height;
        }

        @Override
        public void text(String text, double x, double y, double sizePx, boolean bold, Anchor anchor) {
            if (!text.isBlank()) {
                sizes.add(sizePx);
                words.add(text);
            }
        }

        @Override
        public double textWidth(String text, double sizePx, boolean bold) {
            return org.kinduct.render.paint.TextMetrics.width(text, sizePx, bold);
        }

        @Override
        public double width() {
            return SnapshotPage.WIDTH;
        }

        @Override
        public double height() {
            return height;
        }

        @Override
        public void save() {
        }

        @Override
        public void restore() {
        }

        @Override
        public void translate(double dx, double dy) {
        }

        @Override
        public void rotate(double angleRad) {
        }

        @Override
        public void clipRect(double x, double y, double w, double h) {
        }

        @Override
        public void stroke(int argb) {
        }

        @Override
        public void fill(int argb) {
        }

        @Override
        public void lineWidth(double px) {
        }

        @Override
        public void dash(double... px) {
        }

        @Override
        public void beginPath() {
        }

        @Override
        public void moveTo(double x, double y) {
        }

        @Override
        public void lineTo(double x, double y) {
        }

        @Override
        public void closePath() {
        }

        @Override
        public void strokePath() {
        }

        @Override
        public void fillPath() {
        }

        @Override
        public void fillRect(double x, double y, double w, double h) {
        }

        @Override
        public void strokeRect(double x, double y, double w, double h) {
        }

        @Override
        public void fillOval(double cx, double cy, double r) {
        }

        @Override
        public void strokeOval(double cx, double cy, double r) {
        }

        @Override
        public void image(int[] argb, int cols, int rows, double x, double y, double w, double h) {
        }
    }
}

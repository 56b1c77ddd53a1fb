package org.kinduct.ui.paint;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.ui.view.NiceSteps;
import org.kinduct.ui.view.ViewTransform;

/**
 * Draws a whole {@link Frame} on a {@link Surface}: field colours, grid, contours, symbols,
 * sources, conductors, polarity and current overlays, value labels, legend and scale bar.
 * Stateless; the live view and every export call the same {@link #draw}.
 */
public final class ScenePainter {

    static final double FONT = 12;
    private static final double SYMBOL_SPACING_PX = 42;
    private static final double SYMBOL_MIN_FRACTION = 0.04;
    private static final int MAX_CONTOUR_LEVELS_PER_SIDE = 5;
    private static final double CONTOUR_CELL_PX = 4;
    /** A contour label needs this much room from the lines of other levels. */
    private static final double CONTOUR_CLEAR_PX = 16;
    /**
     * Axis and contour label size: 11 units print at 8.3 pt when an export page (600 units) is
     * placed 16 cm wide (1 pt = 0.3528 mm), the smallest size we allow in print.
     */
    static final double LABEL_FONT = 11;
    /** The "t = …" box in the top-left corner; axis labels keep out of it. */
    private static final LabelPlacer.Box HEADER = new LabelPlacer.Box(6, 6, 150, 20);

    private ScenePainter() {
    }

    public static void draw(Surface s, Frame f) {
        ViewTransform v = f.view();
        s.save();
        s.clipRect(0, 0, s.width(), s.height());
        s.fill(Palette.BACKGROUND);
        s.fillRect(0, 0, s.width(), s.height());
        double limit = f.range().limitFor(f.raster());
        if (f.shows(Layer.HEAT_MAP) && f.raster() != null) {
            heatMap(s, v, f.raster(), limit);
        }
        if (f.shows(Layer.GRID)) {
            grid(s, v);
        }
        LabelPlacer placer = new LabelPlacer(s.width(), s.height());
        LabelPlacer.Box legendBox = f.shows(Layer.LEGEND) ? legendBox(s) : null;
        if (legendBox != null) {
            placer.reserve(legendBox);
        }
        placer.reserve(new LabelPlacer.Box(0, 0, HEADER.x() + HEADER.w() + 14, HEADER.y() + HEADER.h()));
        if (f.shows(Layer.SCALE_BAR)) {
            placer.reserve(new LabelPlacer.Box(8, s.height() - 44, 180, 40));
        }
        Placement placement = Placement.of(f.scene(), f.tS(), f.poses());
        if (f.shows(Layer.SOURCES)) {
            SourcePainter.draw(s, v, f.scene(), placement, f.marks(), placer);
        }
        if (f.shows(Layer.CONDUCTORS)) {
            ConductorPainter.drawConductors(s, v, f.scene(), placement, f.marks());
        }
        if (f.shows(Layer.LENZ) && f.snapshot() != null) {
            ConductorPainter.drawLenz(s, v, f.scene(), f.snapshot(), placer);
        }
        List<Runnable> labels = new ArrayList<>();
        if (f.shows(Layer.CALLOUTS) && f.snapshot() != null) {
            ConductorPainter.placeCallouts(s, v, f.scene(), f.snapshot(), placer, labels);
        }
        if (f.raster() != null && (f.shows(Layer.CONTOURS) || f.shows(Layer.SYMBOLS))) {
            if (f.shows(Layer.SYMBOLS)) {
                symbols(s, v, f.raster(), limit);
            }
            if (f.shows(Layer.CONTOURS)) {
                contours(s, v, f.raster(), limit, placer, labels);
            }
        }
        ConductorPainter.drawMarks(s, v, f.marks());
        labels.forEach(Runnable::run);
        if (f.shows(Layer.SCALE_BAR)) {
            scaleBar(s, v);
        }
        if (legendBox != null) {
            legend(s, legendBox, limit, f.shows(Layer.CONTOURS) ? contourStep(limit) : 0, f.raster() != null);
        }
        header(s, f);
        s.restore();
    }

    /** Contour spacing for a colour limit: a round value giving at most five levels per sign. */
    public static double contourStep(double limit) {
        return NiceSteps.atLeast(limit / MAX_CONTOUR_LEVELS_PER_SIDE);
    }

    private static void heatMap(Surface s, ViewTransform v, FieldRaster r, double limit) {
        int[] argb = new int[r.cols() * r.rows()];
        float[] bz = r.bzT();
        for (int i = 0; i < argb.length; i++) {
            argb[i] = DivergingScale.argb(bz[i], limit);
        }
        double x = v.screenX(r.minX());
        double y = v.screenY(r.maxY());
        s.image(argb, r.cols(), r.rows(), x, y, v.screenX(r.maxX()) - x, v.screenY(r.minY()) - y);
    }

    private static void grid(Surface s, ViewTransform v) {
        double major = NiceSteps.atLeast(90 / v.pxPerM());
        double mantissa = major / Math.pow(10, Math.floor(Math.log10(major) + 1e-9));
        double minor = major / (Math.round(mantissa) == 2 ? 4 : 5);
        s.dash();
        if (minor * v.pxPerM() >= 9) {
            gridLines(s, v, minor, Palette.GRID_MINOR, 1);
        }
        gridLines(s, v, major, Palette.GRID_MAJOR, 1);
        s.fill(Palette.AXIS);
        s.fillRect(Math.round(v.screenX(0)), 0, 1, s.height());
        s.fillRect(0, Math.round(v.screenY(0)), s.width(), 1);
        s.fill(Palette.MUTED);
        for (double x = Math.ceil(v.minX() / major) * major; x <= v.maxX(); x += major) {
            axisLabel(s, Quantities.length(snap(x, major)), v.screenX(x) + 3, 30, false);
        }
        for (double y = Math.ceil(v.minY() / major) * major; y <= v.maxY(); y += major) {
            axisLabel(s, Quantities.length(snap(y, major)), 4, v.screenY(y) - 2, true);
        }
    }

    /** An axis label with its top-left (or bottom-left) corner at (x, y), left out where the "t = …" box is. */
    private static void axisLabel(Surface s, String text, double x, double y, boolean bottom) {
        double top = bottom ? y - LABEL_FONT - 2 : y;
        LabelPlacer.Box box = new LabelPlacer.Box(x, top, s.textWidth(text, LABEL_FONT, false), LABEL_FONT + 2);
        if (!box.overlaps(HEADER, 2)) {
            s.text(text, x, y, LABEL_FONT, false, bottom ? Surface.Anchor.BOTTOM_LEFT : Surface.Anchor.TOP_LEFT);
        }
    }

    private static double snap(double value, double step) {
        return Math.abs(value) < step * 1e-6 ? 0 : value;
    }

    /** Axis-parallel lines as one-pixel rectangles: far cheaper than stroked paths on a software pipeline. */
    private static void gridLines(Surface s, ViewTransform v, double step, int colour, double width) {
        s.fill(colour);
        for (double x = Math.ceil(v.minX() / step) * step; x <= v.maxX(); x += step) {
            s.fillRect(Math.round(v.screenX(x)), 0, width, s.height());
        }
        for (double y = Math.ceil(v.minY() / step) * step; y <= v.maxY(); y += step) {
            s.fillRect(0, Math.round(v.screenY(y)), s.width(), width);
        }
    }

    private static void symbols(Surface s, ViewTransform v, FieldRaster r, double limit) {
        double r0 = 6;
        for (double sy = SYMBOL_SPACING_PX / 2; sy < s.height(); sy += SYMBOL_SPACING_PX) {
            for (double sx = SYMBOL_SPACING_PX / 2; sx < s.width(); sx += SYMBOL_SPACING_PX) {
                double b = r.sample(v.sceneX(sx), v.sceneY(sy));
                if (!(Math.abs(b) >= SYMBOL_MIN_FRACTION * limit)) {
                    continue;
                }
                double size = r0 * (0.6 + 0.4 * Math.min(1, Math.abs(b) / limit));
                Glyphs.fieldSymbol(s, sx, sy, size, b > 0, 0xB0202020);
            }
        }
    }

    private static void contours(Surface s, ViewTransform v, FieldRaster fine, double limit, LabelPlacer placer,
                                 List<Runnable> labels) {
        double step = contourStep(limit);
        // Segments of about CONTOUR_CELL_PX keep the path short; the lines are for reading levels, not for numbers.
        FieldRaster r = fine.decimated((int) Math.round(CONTOUR_CELL_PX / (fine.cellM() * v.pxPerM())));
        s.dash();
        List<List<double[]>> mids = new ArrayList<>();
        List<String> texts = new ArrayList<>();
        for (int k = -MAX_CONTOUR_LEVELS_PER_SIDE; k <= MAX_CONTOUR_LEVELS_PER_SIDE; k++) {
            if (k == 0) {
                continue;
            }
            double level = k * step;
            List<double[]> segs = new ArrayList<>();
            s.stroke(k > 0 ? 0xC0402000 : 0xC0001A40);
            s.lineWidth(1);
            s.beginPath();
            Contours.lines(r, level, (xs, ys, n) -> {
                s.moveTo(v.screenX(xs[0]), v.screenY(ys[0]));
                for (int i = 1; i < n; i++) {
                    double a = v.screenX(xs[i]);
                    double b = v.screenY(ys[i]);
                    s.lineTo(a, b);
                    if (segs.size() < 4000) {
                        segs.add(new double[] {(a + v.screenX(xs[i - 1])) / 2, (b + v.screenY(ys[i - 1])) / 2});
                    }
                }
            });
            s.strokePath();
            mids.add(segs);
            texts.add(Quantities.bz(level));
        }
        for (int i = 0; i < mids.size(); i++) {
            labelContour(s, mids, i, texts.get(i), placer, labels);
        }
    }

    /**
     * Up to two labels for level {@code level}, where they collide with nothing already placed and
     * no other level passes close by: where levels crowd (the edge of an ideal field patch, the rim
     * of a magnet) a label could not say which line it names.
     */
    private static void labelContour(Surface s, List<List<double[]>> mids, int level, String text,
                                     LabelPlacer placer, List<Runnable> labels) {
        List<double[]> own = mids.get(level);
        double w = s.textWidth(text, LABEL_FONT, false) + 4;
        double h = LABEL_FONT + 3;
        int placed = 0;
        for (int i = 0; i < own.size() && placed < 2; i += Math.max(1, own.size() / 7)) {
            double[] m = own.get(i);
            LabelPlacer.Box b = new LabelPlacer.Box(m[0] - w / 2, m[1] - h / 2, w, h);
            if (b.x() < 0 || b.y() < 0 || b.x() + w > s.width() || b.y() + h > s.height() || !placer.isFree(b)
                    || crowded(mids, level, m)) {
                continue;
            }
            placer.reserve(b);
            placed++;
            labels.add(() -> {
                s.fill(0xD9FFFFFF);
                s.fillRect(b.x(), b.y(), b.w(), b.h());
                s.fill(Palette.INK);
                s.text(text, b.centerX(), b.centerY(), LABEL_FONT, false, Surface.Anchor.CENTER);
            });
        }
    }

    /** True when a line of another level passes within {@value #CONTOUR_CLEAR_PX} px of the point. */
    private static boolean crowded(List<List<double[]>> mids, int level, double[] at) {
        double r2 = CONTOUR_CLEAR_PX * CONTOUR_CLEAR_PX;
        for (int j = 0; j < mids.size(); j++) {
            if (j == level) {
                continue;
            }
            for (double[] p : mids.get(j)) {
                double dx = p[0] - at[0];
                double dy = p[1] - at[1];
                if (dx * dx + dy * dy < r2) {
                    return true;
                }
            }
        }
        return false;
    }

    private static void scaleBar(Surface s, ViewTransform v) {
        double len = NiceSteps.atMost(140 / v.pxPerM());
        double px = len * v.pxPerM();
        double x = 16;
        double y = s.height() - 18;
        s.fill(Palette.LABEL_BOX);
        s.fillRect(x - 6, y - 24, Math.max(px, 60) + 12, 32);
        s.stroke(Palette.INK);
        s.lineWidth(2);
        s.dash();
        s.beginPath();
        s.moveTo(x, y - 5);
        s.lineTo(x, y);
        s.lineTo(x + px, y);
        s.lineTo(x + px, y - 5);
        s.strokePath();
        s.fill(Palette.INK);
        s.text(Quantities.length(len), x + px / 2, y - 7, FONT, false, Surface.Anchor.BOTTOM_CENTER);
    }

    private static LabelPlacer.Box legendBox(Surface s) {
        double w = 178;
        double h = 218;
        return new LabelPlacer.Box(s.width() - w - 10, s.height() - h - 10, w, h);
    }

    private static void legend(Surface s, LabelPlacer.Box box, double limit, double contourStep, boolean hasMap) {
        s.fill(Palette.LABEL_BOX);
        s.fillRect(box.x(), box.y(), box.w(), box.h());
        s.stroke(Palette.LABEL_EDGE);
        s.lineWidth(1);
        s.dash();
        s.strokeRect(box.x(), box.y(), box.w(), box.h());
        double x = box.x() + 12;
        double top = box.y() + 46;
        double barH = 120;
        s.fill(Palette.INK);
        s.text("B_z (normal to plane)", x, box.y() + 8, FONT, true, Surface.Anchor.TOP_LEFT);
        int n = 64;
        int[] bar = new int[n];
        for (int i = 0; i < n; i++) {
            bar[i] = DivergingScale.argbAt(1 - 2.0 * i / (n - 1));
        }
        s.image(bar, 1, n, x, top, 16, barH);
        s.stroke(Palette.INK);
        s.strokeRect(x, top, 16, barH);
        double tx = x + 24;
        s.fill(Palette.INK);
        s.text("+" + Quantities.bz(limit), tx, top, FONT, false, Surface.Anchor.LEFT);
        s.text("0", tx, top + barH / 2, FONT, false, Surface.Anchor.LEFT);
        s.text("−" + Quantities.bz(limit), tx, top + barH, FONT, false, Surface.Anchor.LEFT);
        Glyphs.fieldSymbol(s, x + 8, top - 12, 6, true, Palette.INK);
        s.fill(Palette.INK);
        s.text("out of screen", x + 20, top - 12, 11, false, Surface.Anchor.LEFT);
        Glyphs.fieldSymbol(s, x + 8, top + barH + 13, 6, false, Palette.INK);
        s.fill(Palette.INK);
        s.text("into screen", x + 20, top + barH + 13, 11, false, Surface.Anchor.LEFT);
        s.fill(Palette.MUTED);
        String foot = !hasMap ? "computing field…" : contourStep > 0 ? "contours every " + Quantities.bz(contourStep) : "";
        s.text(foot, x, box.y() + box.h() - 8, 11, false, Surface.Anchor.BOTTOM_LEFT);
    }

    private static void header(Surface s, Frame f) {
        s.fill(Palette.LABEL_BOX);
        s.fillRect(HEADER.x(), HEADER.y(), HEADER.w(), HEADER.h());
        s.fill(Palette.INK);
        s.text("t = " + Quantities.time(f.tS()), 12, 16, FONT, true, Surface.Anchor.LEFT);
        if (!f.note().isEmpty()) {
            double w = s.textWidth(f.note(), FONT, false) + 12;
            s.fill(0xE0202020);
            s.fillRect(s.width() - w - 6, 6, w, 20);
            s.fill(0xFFFFFFFF);
            s.text(f.note(), s.width() - 12, 16, FONT, false, Surface.Anchor.RIGHT);
        }
    }
}

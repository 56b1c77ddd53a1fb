package org.kinduct.render.paint;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.kinduct.render.view.NiceSteps;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.render.view.ViewTransform;

/**
 * Draws a whole {@link Picture} on a {@link Surface}: the {@link FieldLayers} (colours, contours,
 * symbols), grid, sources, conductors, polarity and current overlays, value and contour labels,
 * legend and scale bar. Stateless; the live view and every export call the same {@link #draw}.
 */
public final class ScenePainter {

    static final double FONT = 12;
    /**
     * Axis and contour label size: 11 units print at 8.3 pt when an export page (600 units) is
     * placed 16 cm wide (1 pt = 0.3528 mm), the smallest size we allow in print.
     */
    static final double LABEL_FONT = 11;
    /** Half the width of a conductor as drawn with its halo ({@link ConductorPainter}). */
    private static final double CONDUCTOR_HALF_WIDTH_PX = 3;
    /** The "t = …" box in the top-left corner; axis labels keep out of it. */
    private static final LabelPlacer.Box HEADER = new LabelPlacer.Box(6, 6, 150, 20);
    private static final double LEGEND_W = 178;
    private static final double LEGEND_H = 250;
    private static final double LEGEND_GAP = 10;
    /** Width the colour legend takes from the right edge of the view, gap included. */
    public static final double LEGEND_SPAN_PX = LEGEND_W + LEGEND_GAP;
    /** Two labels of one level at least this far apart, so they name different stretches of it. */
    private static final double SAME_LEVEL_LABEL_GAP_PX = 200;
    /** Contour labels per level at most. */
    private static final int LABELS_PER_LEVEL = 2;

    private ScenePainter() {
    }

    public static void draw(Surface s, Picture f) {
        draw(s, f, null);
    }

    /**
     * Draws {@code f}, taking the field layers from {@code backdrop} when it shows the same ones
     * (the live view renders it off the UI thread), else drawing them from the frame's map.
     */
    public static void draw(Surface s, Picture f, FieldBackdrop backdrop) {
        ViewTransform v = f.view();
        s.save();
        s.clipRect(0, 0, s.width(), s.height());
        s.fill(Palette.BACKGROUND);
        s.fillRect(0, 0, s.width(), s.height());
        ColourScale scale = f.range().scaleFor(f.raster());
        Set<Layer> field = FieldLayers.applicable(f.layers(), f.scene());
        List<FieldLayers.ContourLabel> contourLabels = backdrop != null && backdrop.shows(field)
                ? backdrop.drawOn(s, v) : FieldLayers.draw(s, v, f.raster(), scale, field);
        boolean caution = field.contains(Layer.CAUTION) && f.raster() != null
                && f.raster().peakT() >= FieldLayers.CAUTION_T;
        // Boxes the header, scale bar and legend will cover: no label is drawn under them.
        List<LabelPlacer.Box> fixed = new ArrayList<>();
        if (f.shows(Layer.TIME)) {
            fixed.add(new LabelPlacer.Box(0, 0, HEADER.x() + HEADER.w() + 14, HEADER.y() + HEADER.h()));
        }
        if (f.shows(Layer.SCALE_BAR)) {
            fixed.add(new LabelPlacer.Box(8, s.height() - 44, 180, 40));
        }
        LabelPlacer.Box legendBox = f.shows(Layer.LEGEND) ? legendBox(s) : null;
        if (legendBox != null) {
            fixed.add(legendBox);
        }
        double peakJ = f.shows(Layer.CURRENT_DENSITY) ? SheetPainter.peakCurrentDensity(f.snapshot()) : 0;
        LabelPlacer.Box densityKey = peakJ > 0 && legendBox != null ? new LabelPlacer.Box(legendBox.x(),
                legendBox.y() - CurrentDensityMap.KEY_H - 6, CurrentDensityMap.KEY_W, CurrentDensityMap.KEY_H) : null;
        if (densityKey != null) {
            fixed.add(densityKey);
        }
        List<AxisValue> axisValues = f.shows(Layer.GRID) ? grid(s, v, fixed) : List.of();
        LabelPlacer placer = new LabelPlacer(s.width(), s.height());
        fixed.forEach(placer::reserveText);
        // Labels keep off the axis values where they can; a label that finds no other room hides the
        // values it lands on rather than a pole label or a callout (the grid still tells the scale).
        axisValues.forEach(a -> placer.reserve(a.box()));
        Placement placement = Placement.of(f.scene(), f.tS(), f.freeBodies());
        List<Runnable> sourceLabels = f.shows(Layer.SOURCES)
                ? SourcePainter.draw(s, v, f.scene(), placement, f.marks(), placer) : List.of();
        SheetPainter.drawInterior(s, v, f, placement);
        if (f.shows(Layer.CONDUCTORS)) {
            ConductorPainter.drawConductors(s, v, f.scene(), placement, f.marks());
            keepLabelsOffConductors(v, f.scene(), placement, placer);
        }
        if (f.shows(Layer.LENZ) && f.snapshot() != null) {
            ConductorPainter.drawLenz(s, v, f.scene(), f.snapshot(), placer);
            SheetPainter.drawLenz(s, v, f, placement, placer);
        }
        // Source labels keep off the velocity arrows, and are placed before the velocity labels, so
        // a magnet keeps its label on its centre and those move instead.
        if (f.shows(Layer.MOTION)) {
            MotionPainter.reserveArrows(v, f.scene(), placement, placer);
        }
        // Callouts, the largest labels, are placed before the small ones, which find room around them
        // (a pole label pushed aside keeps a leader to its magnet); all are drawn last, on top.
        List<Runnable> labels = new ArrayList<>();
        if (f.shows(Layer.CALLOUTS) && f.snapshot() != null) {
            ConductorPainter.placeCallouts(s, v, f.scene(), placement, f.snapshot(), f.scales(), placer, labels);
        }
        sourceLabels.forEach(Runnable::run);
        if (f.shows(Layer.MOTION)) {
            MotionPainter.draw(s, v, f.scene(), placement, placer);
            SheetPainter.drawFlow(s, v, f, placement, placer);
        }
        contourLabels.forEach(c -> placeContourLabel(s, c, placer, labels));
        for (AxisValue a : axisValues) {
            if (!placer.labelOver(a.box())) {
                LabelPlacer.Box b = a.box();
                s.fill(Palette.VALUE_BACKING);
                s.fillRect(b.x() - 1, b.y(), b.w() + 2, b.h());
                s.fill(Palette.MUTED);
                s.text(a.text(), a.x(), a.y(), LABEL_FONT, false,
                        a.bottom() ? Surface.Anchor.BOTTOM_LEFT : Surface.Anchor.TOP_LEFT);
            }
        }
        ConductorPainter.drawMarks(s, v, f.marks());
        labels.forEach(Runnable::run);
        if (f.shows(Layer.SCALE_BAR)) {
            scaleBar(s, v);
        }
        if (legendBox != null) {
            legend(s, legendBox, scale, f.shows(Layer.CONTOURS), caution, f.raster() != null);
        }
        if (densityKey != null) {
            CurrentDensityMap.key(s, densityKey.x(), densityKey.y(), peakJ);
        }
        header(s, f);
        s.restore();
    }

    /** Conductors' lines (as drawn, halo included) are kept free of labels, which would hide where they run. */
    private static void keepLabelsOffConductors(ViewTransform v, Scene scene, Placement placement,
                                                LabelPlacer placer) {
        for (Conductor c : scene.conductors()) {
            List<Vec2> pts = placement.vertices(c);
            int edges = c instanceof Conductor.Loop ? pts.size() : pts.size() - 1;
            for (int i = 0; i < edges; i++) {
                Vec2 a = pts.get(i);
                Vec2 b = pts.get((i + 1) % pts.size());
                placer.reserveLine(v.screenX(a.x()), v.screenY(a.y()), v.screenX(b.x()), v.screenY(b.y()),
                        CONDUCTOR_HALF_WIDTH_PX);
            }
        }
    }

    /** An axis value: its text, anchor point (bottom-left for y values, top-left for x values) and box. */
    private record AxisValue(String text, double x, double y, boolean bottom, LabelPlacer.Box box) {
    }

    /**
     * Draws the grid lines and returns the axis values to write, leaving out a value that would be
     * cut off or touch a box of {@code taken} or another value (each kept value joins {@code taken}).
     */
    private static List<AxisValue> grid(Surface s, ViewTransform v, List<LabelPlacer.Box> taken) {
        double major = NiceSteps.atLeast(90 / v.pxPerM());
        double mantissa = major / Math.pow(10, Math.floor(Math.log10(major) + 1e-9));
        double minor = major / (Math.round(mantissa) == 2 ? 4 : 5);
        s.dash();
        if (minor * v.pxPerM() >= 9) {
            gridLines(s, v, minor, Palette.GRID_MINOR, 1);
        }
        gridLines(s, v, major, Palette.GRID_MAJOR, 1);
        s.fill(Palette.AXIS);
        s.fillRect(Math.rint(v.screenX(0)), 0, 1, s.height());
        s.fillRect(0, Math.rint(v.screenY(0)), s.width(), 1);
        List<AxisValue> values = new ArrayList<>();
        for (double y = Math.ceil(v.minY() / major) * major; y <= v.maxY(); y += major) {
            axisValue(s, Quantities.length(snap(y, major)), 4, v.screenY(y) - 2, true, taken, values);
        }
        for (double x = Math.ceil(v.minX() / major) * major; x <= v.maxX(); x += major) {
            axisValue(s, Quantities.length(snap(x, major)), v.screenX(x) + 3, 30, false, taken, values);
        }
        return values;
    }

    /** Adds the axis value at (x, y) to {@code values} unless it would be cut off or touch a taken box. */
    private static void axisValue(Surface s, String text, double x, double y, boolean bottom,
                                  List<LabelPlacer.Box> taken, List<AxisValue> values) {
        double top = bottom ? y - LABEL_FONT - 2 : y;
        LabelPlacer.Box box = new LabelPlacer.Box(x, top, s.textWidth(text, LABEL_FONT, false), LABEL_FONT + 2);
        boolean inside = box.x() + box.w() <= s.width() && box.y() >= 0 && box.y() + box.h() <= s.height();
        if (inside && taken.stream().noneMatch(t -> box.overlaps(t, 2))) {
            taken.add(box);
            values.add(new AxisValue(text, x, y, bottom, box));
        }
    }

    private static double snap(double value, double step) {
        return Math.abs(value) < step * 1e-6 ? 0 : value;
    }

    /** Axis-parallel lines as one-pixel rectangles: far cheaper than stroked paths on a software pipeline. */
    private static void gridLines(Surface s, ViewTransform v, double step, int colour, double width) {
        s.fill(colour);
        for (double x = Math.ceil(v.minX() / step) * step; x <= v.maxX(); x += step) {
            s.fillRect(Math.rint(v.screenX(x)), 0, width, s.height());
        }
        for (double y = Math.ceil(v.minY() / step) * step; y <= v.maxY(); y += step) {
            s.fillRect(0, Math.rint(v.screenY(y)), s.width(), width);
        }
    }

    /** Up to {@value #LABELS_PER_LEVEL} labels of a contour level, on spots nothing placed so far covers. */
    private static void placeContourLabel(Surface s, FieldLayers.ContourLabel label, LabelPlacer placer,
                                          List<Runnable> labels) {
        double w = s.textWidth(label.text(), LABEL_FONT, false) + 4;
        double h = LABEL_FONT + 3;
        List<double[]> placed = new ArrayList<>();
        for (int i = 0; i < label.spots().size() && placed.size() < LABELS_PER_LEVEL; i++) {
            double[] m = label.spots().get(i);
            LabelPlacer.Box b = new LabelPlacer.Box(m[0] - w / 2, m[1] - h / 2, w, h);
            if (b.x() < 0 || b.y() < 0 || b.x() + w > s.width() || b.y() + h > s.height() || !placer.isFree(b)
                    || placed.stream().anyMatch(p -> Math.hypot(p[0] - m[0], p[1] - m[1]) < SAME_LEVEL_LABEL_GAP_PX)) {
                continue;
            }
            placer.reserveText(b);
            placed.add(m);
            labels.add(() -> {
                s.fill(Palette.VALUE_BACKING);
                s.fillRect(b.x(), b.y(), b.w(), b.h());
                s.fill(Palette.INK);
                s.text(label.text(), b.centerX(), b.centerY(), LABEL_FONT, false, Surface.Anchor.CENTER);
            });
        }
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
        return new LabelPlacer.Box(s.width() - LEGEND_SPAN_PX, s.height() - LEGEND_H - LEGEND_GAP, LEGEND_W, LEGEND_H);
    }

    /**
     * The colour key: the scale's bar from ⊙ (out of the screen) to ⊗ (into it), its levels
     * marked where the scale puts them (decades on a logarithmic scale), the darker ends beyond
     * the limit that mark saturated field, and what kind of scale it is.
     */
    private static void legend(Surface s, LabelPlacer.Box box, ColourScale scale, boolean contours, boolean caution,
                               boolean hasMap) {
        s.fill(Palette.LABEL_BOX);
        s.fillRect(box.x(), box.y(), box.w(), box.h());
        s.stroke(Palette.LABEL_EDGE);
        s.lineWidth(1);
        s.dash();
        s.strokeRect(box.x(), box.y(), box.w(), box.h());
        double x = box.x() + 12;
        double top = box.y() + 54;
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
        saturationEnd(s, x, top, true);
        saturationEnd(s, x, top + barH, false);
        double tx = x + 24;
        s.fill(Palette.INK);
        s.text("0", tx, top + barH / 2, LABEL_FONT, false, Surface.Anchor.LEFT);
        // Each level's label, skipping those that would crowd the one above (a log scale's decades near 0).
        double lastY = Double.NEGATIVE_INFINITY;
        for (double level : scale.levels()) {
            double y = top + barH / 2 * (1 - scale.fraction(level));
            if (y - lastY >= LABEL_FONT && barH / 2 - (y - top) >= LABEL_FONT) {
                s.text("+" + Quantities.bz(level), tx, y, LABEL_FONT, false, Surface.Anchor.LEFT);
                s.text("−" + Quantities.bz(level), tx, top + barH - (y - top), LABEL_FONT, false, Surface.Anchor.LEFT);
                s.stroke(Palette.INK);
                s.beginPath();
                s.moveTo(x + 16, y);
                s.lineTo(x + 20, y);
                s.moveTo(x + 16, top + barH - (y - top));
                s.lineTo(x + 20, top + barH - (y - top));
                s.strokePath();
                lastY = y;
            }
        }
        Glyphs.fieldSymbol(s, x + 8, top - 18, 6, true, Palette.INK);
        s.fill(Palette.INK);
        s.text("out of screen", x + 20, top - 18, LABEL_FONT, false, Surface.Anchor.LEFT);
        Glyphs.fieldSymbol(s, x + 8, top + barH + 19, 6, false, Palette.INK);
        s.fill(Palette.INK);
        s.text("into screen", x + 20, top + barH + 19, LABEL_FONT, false, Surface.Anchor.LEFT);
        s.fill(Palette.MUTED);
        if (!hasMap) {
            s.text("computing field…", x, box.y() + box.h() - 8, LABEL_FONT, false, Surface.Anchor.BOTTOM_LEFT);
            return;
        }
        // The triangles past the bar's ends are the usual mark of a saturated key.
        s.text(scale.description(), x, box.y() + box.h() - 36, LABEL_FONT, false, Surface.Anchor.BOTTOM_LEFT);
        if (contours) {
            s.text("contours at the marks", x, box.y() + box.h() - 22, LABEL_FONT, false, Surface.Anchor.BOTTOM_LEFT);
        }
        if (caution) {
            double y = box.y() + box.h() - 12;
            s.stroke(0xFFB00020);
            s.lineWidth(1.5);
            s.dash(6, 3);
            s.beginPath();
            s.moveTo(x, y);
            s.lineTo(x + 18, y);
            s.strokePath();
            s.dash();
            s.fill(0xFFB00020);
            s.text("0.5 mT caution line", x + 24, y, LABEL_FONT, false, Surface.Anchor.LEFT);
        }
    }

    /** A small triangle past the bar's end in the saturated colour: field beyond the scale's limit. */
    private static void saturationEnd(Surface s, double x, double endY, boolean positive) {
        double dir = positive ? -1 : 1;
        s.fill(DivergingScale.saturated(positive));
        s.beginPath();
        s.moveTo(x, endY);
        s.lineTo(x + 16, endY);
        s.lineTo(x + 8, endY + dir * 8);
        s.closePath();
        s.fillPath();
    }

    private static void header(Surface s, Picture f) {
        if (f.shows(Layer.TIME)) {
            s.fill(Palette.LABEL_BOX);
            s.fillRect(HEADER.x(), HEADER.y(), HEADER.w(), HEADER.h());
            s.fill(Palette.INK);
            s.text("t = " + Quantities.time(f.tS()), 12, 16, FONT, true, Surface.Anchor.LEFT);
        }
        if (!f.note().isEmpty()) {
            double w = s.textWidth(f.note(), FONT, false) + 12;
            s.fill(0xE0202020);
            s.fillRect(s.width() - w - 6, 6, w, 20);
            s.fill(0xFFFFFFFF);
            s.text(f.note(), s.width() - 12, 16, FONT, false, Surface.Anchor.RIGHT);
        }
    }
}

package org.kinduct.render.paint;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;

/**
 * The layers drawn from a field map alone: colours, contour lines and the ⊙/⊗ lattice. They
 * depend on the map, the view and the colour limit but not on conductors or time, so the live
 * view draws them once per map into a {@link FieldBackdrop} off the UI thread, while exports draw
 * them straight onto their surface (vector lines in SVG).
 */
public final class FieldLayers {

    /** The layers this class draws. */
    public static final Set<Layer> LAYERS = Set.of(Layer.HEAT_MAP, Layer.CONTOURS, Layer.SYMBOLS, Layer.CAUTION);
    /**
     * |B_z| of the caution line around strong magnets, tesla: 0.5 mT, the line long used to mark
     * where people with implanted medical devices should not go (ICNIRP, Health Phys. 96(4),
     * 504–514, 2009, static-field guidance; lower levels may apply locally). Only the component
     * normal to the drawing plane is known here; |B| is at least as large.
     */
    public static final double CAUTION_T = 0.5e-3;
    private static final int CAUTION_COLOUR = 0xFFB00020;

    private static final double SYMBOL_SPACING_PX = 42;
    private static final double SYMBOL_MIN_FRACTION = 0.04;
    private static final double CONTOUR_CELL_PX = 4;
    /** A contour label needs this much room from the lines of other levels. */
    private static final double CONTOUR_CLEAR_PX = 10;
    /** Label spots tried per level, spread along its lines (where levels crowd, few are free). */
    private static final int SPOTS_PER_LEVEL = 60;
    private static final int MAX_SEGMENTS_PER_LEVEL = 4000;

    private FieldLayers() {
    }

    /**
     * Where a contour level may carry its label: screen points on its lines that no other level
     * passes close to (where levels crowd, at the edge of an ideal field patch or the rim of a
     * magnet, a label could not say which line it names).
     */
    public record ContourLabel(String text, List<double[]> spots) {
        public ContourLabel {
            spots = List.copyOf(spots);
        }
    }

    /**
     * Draws the field layers of {@code shown} from {@code raster}; returns the contour labels to
     * place once the rest of the picture has claimed its room (empty without contours).
     */
    public static List<ContourLabel> draw(Surface s, ViewTransform v, FieldRaster raster, ColourScale scale,
                                          Set<Layer> shown) {
        if (raster == null) {
            return List.of();
        }
        if (shown.contains(Layer.HEAT_MAP)) {
            heatMap(s, v, raster, scale);
        }
        if (shown.contains(Layer.SYMBOLS)) {
            symbols(s, v, raster, scale);
        }
        if (shown.contains(Layer.CAUTION) && raster.peakT() >= CAUTION_T) {
            caution(s, v, raster);
        }
        return shown.contains(Layer.CONTOURS) ? contours(s, v, raster, scale) : List.of();
    }

    /**
     * The layers of {@code shown} that apply to {@code scene}: the caution line only where there is
     * a magnet (an ideal field patch's edge is no place to warn about).
     */
    public static Set<Layer> applicable(Set<Layer> shown, Scene scene) {
        if (!shown.contains(Layer.CAUTION) || scene.sources().stream().anyMatch(FieldLayers::isMagnet)) {
            return shown;
        }
        Set<Layer> without = shown.isEmpty() ? EnumSet.noneOf(Layer.class) : EnumSet.copyOf(shown);
        without.remove(Layer.CAUTION);
        return without;
    }

    private static boolean isMagnet(Source s) {
        return s.match(new Source.Cases<>() {
            @Override
            public Boolean patch(Source.FieldPatch patch) {
                return false;
            }

            @Override
            public Boolean uniform(Source.UniformField uniform) {
                return false;
            }

            @Override
            public Boolean block(Source.BlockMagnet block) {
                return true;
            }

            @Override
            public Boolean cylinder(Source.CylinderMagnet cylinder) {
                return true;
            }

            @Override
            public Boolean coil(Source.SourceCoil coil) {
                return false;
            }

            /** A map is a measured or simulated real magnet (or coil), so its 0.5 mT line is worth a caution too. */
            @Override
            public Boolean map(Source.FieldMap map) {
                return true;
            }
        });
    }

    /** Dashed lines where |B_z| = {@link #CAUTION_T}, both signs. */
    private static void caution(Surface s, ViewTransform v, FieldRaster fine) {
        FieldRaster r = fine.decimated((int) Math.round(CONTOUR_CELL_PX / (fine.cellM() * v.pxPerM())));
        s.stroke(CAUTION_COLOUR);
        s.lineWidth(1.5);
        s.dash(6, 3);
        for (double level : new double[] {-CAUTION_T, CAUTION_T}) {
            s.beginPath();
            Contours.lines(r, level, (xs, ys, n) -> {
                s.moveTo(v.screenX(xs[0]), v.screenY(ys[0]));
                for (int i = 1; i < n; i++) {
                    s.lineTo(v.screenX(xs[i]), v.screenY(ys[i]));
                }
            });
            s.strokePath();
        }
        s.dash();
    }

    private static void heatMap(Surface s, ViewTransform v, FieldRaster r, ColourScale scale) {
        int[] argb = new int[r.cols() * r.rows()];
        float[] bz = r.bzT();
        for (int i = 0; i < argb.length; i++) {
            argb[i] = scale.argb(bz[i]);
        }
        double x = v.screenX(r.minX());
        double y = v.screenY(r.maxY());
        s.image(argb, r.cols(), r.rows(), x, y, v.screenX(r.maxX()) - x, v.screenY(r.minY()) - y);
    }

    private static void symbols(Surface s, ViewTransform v, FieldRaster r, ColourScale scale) {
        double r0 = 6;
        for (double sy = SYMBOL_SPACING_PX / 2; sy < s.height(); sy += SYMBOL_SPACING_PX) {
            for (double sx = SYMBOL_SPACING_PX / 2; sx < s.width(); sx += SYMBOL_SPACING_PX) {
                double b = r.sample(v.sceneX(sx), v.sceneY(sy));
                double f = Math.abs(scale.fraction(b));
                if (!(f >= SYMBOL_MIN_FRACTION)) {
                    continue;
                }
                double size = r0 * (0.6 + 0.4 * Math.min(1, f));
                Glyphs.fieldSymbol(s, sx, sy, size, b > 0, 0xB0202020);
            }
        }
    }

    private static List<ContourLabel> contours(Surface s, ViewTransform v, FieldRaster fine, ColourScale scale) {
        List<Double> levels = new ArrayList<>();
        for (double level : scale.levels()) {
            levels.add(-level);
            levels.add(level);
        }
        // Segments of about CONTOUR_CELL_PX keep the path short; the lines are for reading levels, not for numbers.
        FieldRaster r = fine.decimated((int) Math.round(CONTOUR_CELL_PX / (fine.cellM() * v.pxPerM())));
        s.dash();
        List<List<double[]>> mids = new ArrayList<>();
        List<String> texts = new ArrayList<>();
        for (double level : levels) {
            List<double[]> segs = new ArrayList<>();
            s.stroke(level > 0 ? 0xC0402000 : 0xC0001A40);
            s.lineWidth(1);
            s.beginPath();
            Contours.lines(r, level, (xs, ys, n) -> {
                s.moveTo(v.screenX(xs[0]), v.screenY(ys[0]));
                for (int i = 1; i < n; i++) {
                    double a = v.screenX(xs[i]);
                    double b = v.screenY(ys[i]);
                    s.lineTo(a, b);
                    if (segs.size() < MAX_SEGMENTS_PER_LEVEL) {
                        segs.add(new double[] {(a + v.screenX(xs[i - 1])) / 2, (b + v.screenY(ys[i - 1])) / 2});
                    }
                }
            });
            s.strokePath();
            mids.add(segs);
            texts.add(Quantities.bz(level));
        }
        LevelGrid near = new LevelGrid(mids);
        List<ContourLabel> labels = new ArrayList<>();
        for (int i = 0; i < mids.size(); i++) {
            List<double[]> own = mids.get(i);
            List<double[]> spots = new ArrayList<>();
            for (int j = 0; j < own.size(); j += Math.max(1, own.size() / SPOTS_PER_LEVEL)) {
                if (!near.crowded(i, own.get(j))) {
                    spots.add(own.get(j));
                }
            }
            labels.add(new ContourLabel(texts.get(i), spots));
        }
        return labels;
    }

    /**
     * Contour points of every level bucketed in squares of {@value #CONTOUR_CLEAR_PX} px, so the
     * question "does another level pass close by?" looks at nine squares instead of every point.
     */
    private static final class LevelGrid {
        private final Map<Long, List<double[]>> squares = new HashMap<>();

        LevelGrid(List<List<double[]>> mids) {
            for (int level = 0; level < mids.size(); level++) {
                for (double[] p : mids.get(level)) {
                    squares.computeIfAbsent(key(square(p[0]), square(p[1])), k -> new ArrayList<>())
                            .add(new double[] {p[0], p[1], level});
                }
            }
        }

        /** True when a line of another level passes within {@value #CONTOUR_CLEAR_PX} px of the point. */
        boolean crowded(int level, double[] at) {
            double r2 = CONTOUR_CLEAR_PX * CONTOUR_CLEAR_PX;
            long cx = square(at[0]);
            long cy = square(at[1]);
            for (long dx = -1; dx <= 1; dx++) {
                for (long dy = -1; dy <= 1; dy++) {
                    for (double[] p : squares.getOrDefault(key(cx + dx, cy + dy), List.of())) {
                        double ex = p[0] - at[0];
                        double ey = p[1] - at[1];
                        if (p[2] != level && ex * ex + ey * ey < r2) {
                            return true;
                        }
                    }
                }
            }
            return false;
        }

        private static long square(double px) {
            return (long) Math.floor(px / CONTOUR_CLEAR_PX);
        }

        private static long key(long x, long y) {
            return (x << 32) ^ (y & 0xFFFFFFFFL);
        }
    }
}

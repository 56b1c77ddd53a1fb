package org.kinduct.render.paint;

import java.util.List;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.StreamLattice;

/**
 * |J| over a plate or channel in a sequential colour scale of its own (dark violet through teal to
 * yellow, after the viridis map of van der Walt and Smith, 2015: light where the current is
 * strong, and unlike the B_z map's amber and blue), drawn in the conductor's frame and clear
 * outside it and in its holes. |J| = |∇ψ| from the stored lattice, so it is smoothed over the
 * lattice's step; the scale's top is the solution's peak |J|.
 */
final class CurrentDensityMap {

    /** Viridis at 0, ¼, ½, ¾ and 1 (matplotlib's table, rounded). */
    private static final int[] STOPS = {0x440154, 0x3B528B, 0x21918C, 0x5EC962, 0xFDE725};
    private static final int ALPHA = 0xE6;
    /** Image pixels are about this many screen pixels. */
    private static final double PIXEL_PX = 3;
    private static final int MOST_PIXELS = 400;
    static final double KEY_W = 178;
    static final double KEY_H = 38;

    private CurrentDensityMap() {
    }

    /** Colour of |J| at {@code fraction} of the scale's top (clamped to [0, 1]). */
    static int argb(double fraction) {
        double f = Math.max(0, Math.min(1, fraction)) * (STOPS.length - 1);
        int k = Math.min(STOPS.length - 2, (int) Math.floor(f));
        double t = f - k;
        int a = STOPS[k];
        int b = STOPS[k + 1];
        int r = (int) Math.round(((a >> 16) & 0xFF) * (1 - t) + ((b >> 16) & 0xFF) * t);
        int g = (int) Math.round(((a >> 8) & 0xFF) * (1 - t) + ((b >> 8) & 0xFF) * t);
        int bl = (int) Math.round((a & 0xFF) * (1 - t) + (b & 0xFF) * t);
        return ALPHA << 24 | r << 16 | g << 8 | bl;
    }

    /**
     * Draws |J| of {@code psi} over the conductor whose drawn outline and holes are given, against
     * {@code topAPerM2}, on a raster in the conductor's frame turned with its body.
     */
    static void draw(Surface s, SheetFrame frame, double pxPerM, StreamLattice psi, List<Vec2> outline,
                     List<List<Vec2>> holes, double topAPerM2) {
        if (!(topAPerM2 > 0)) {
            return;
        }
        double x0 = psi.x0M();
        double y0 = psi.y0M();
        double width = (psi.nx() - 1) * psi.stepM();
        double height = (psi.ny() - 1) * psi.stepM();
        int cols = (int) Math.max(2, Math.min(MOST_PIXELS, Math.ceil(width * pxPerM / PIXEL_PX)));
        int rows = (int) Math.max(2, Math.min(MOST_PIXELS, Math.ceil(height * pxPerM / PIXEL_PX)));
        int[] argb = new int[cols * rows];
        double[] g = new double[2];
        for (int r = 0; r < rows; r++) {
            double qy = y0 + height * (rows - r - 0.5) / rows;
            for (int c = 0; c < cols; c++) {
                double qx = x0 + width * (c + 0.5) / cols;
                Vec2 q = new Vec2(qx, qy);
                if (!Polygons.contains(outline, q) || holes.stream().anyMatch(h -> Polygons.contains(h, q))) {
                    continue;
                }
                SheetFrame.gradient(psi, qx, qy, g);
                argb[r * cols + c] = argb(Math.hypot(g[0], g[1]) / topAPerM2);
            }
        }
        s.save();
        s.translate(frame.screenX(x0, y0 + height), frame.screenY(x0, y0 + height));
        s.rotate(-frame.angleRad());
        s.image(argb, cols, rows, 0, 0, width * pxPerM, height * pxPerM);
        s.restore();
    }

    /** The key: the scale's bar from 0 to its top, in a box at (x, y). */
    static void key(Surface s, double x, double y, double topAPerM2) {
        s.fill(Palette.LABEL_BOX);
        s.fillRect(x, y, KEY_W, KEY_H);
        s.stroke(Palette.LABEL_EDGE);
        s.lineWidth(1);
        s.dash();
        s.strokeRect(x, y, KEY_W, KEY_H);
        s.fill(Palette.INK);
        s.text("|J| in plates and channels", x + 8, y + 4, ScenePainter.LABEL_FONT, true, Surface.Anchor.TOP_LEFT);
        int n = 64;
        int[] bar = new int[n];
        for (int i = 0; i < n; i++) {
            bar[i] = argb(i / (n - 1.0)) | 0xFF000000;
        }
        double barX = x + 8;
        double barW = 70;
        s.image(bar, n, 1, barX, y + 21, barW, 10);
        s.stroke(Palette.INK);
        s.strokeRect(barX, y + 21, barW, 10);
        s.fill(Palette.INK);
        s.text("0", barX - 1, y + 26, ScenePainter.LABEL_FONT, false, Surface.Anchor.RIGHT);
        s.text(Quantities.currentDensity(topAPerM2) + " (peak)", barX + barW + 4, y + 26, ScenePainter.LABEL_FONT,
                false, Surface.Anchor.LEFT);
    }
}

package org.kinduct.render.paint;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.kinduct.render.view.ViewTransform;

/**
 * The {@link FieldLayers} of one field map drawn once into an opaque, view-sized image, so the
 * live view repaints at playback speed with one image copy instead of redrawing colours and
 * contour lines every frame. Rendered off the UI thread with Java2D; needs no display.
 *
 * @param argb opaque {@code 0xAARRGGBB} pixels, row 0 at the top; never changed after rendering
 * @param view the view it was drawn for
 * @param layers the field layers it shows
 * @param labels contour labels still to place, in {@code view}'s screen coordinates
 */
public record FieldBackdrop(int[] argb, int width, int height, ViewTransform view, Set<Layer> layers,
                            List<FieldLayers.ContourLabel> labels) {

    public FieldBackdrop {
        if (width < 1 || height < 1 || argb.length != width * height) {
            throw new IllegalArgumentException("backdrop of " + width + " × " + height + " needs "
                    + width * height + " pixels, got " + argb.length);
        }
        layers = layers.isEmpty() ? EnumSet.noneOf(Layer.class) : EnumSet.copyOf(layers);
        labels = List.copyOf(labels);
    }

    /** Draws the field layers of {@code shown} from {@code raster} for {@code view}. */
    public static FieldBackdrop render(FieldRaster raster, ViewTransform view, ColourScale scale, Set<Layer> shown) {
        int w = Math.max(1, (int) Math.ceil(view.widthPx()));
        int h = Math.max(1, (int) Math.ceil(view.heightPx()));
        // Pre-multiplied pixels draw fastest; the image is opaque, so they equal plain ARGB.
        BufferedImage image = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB_PRE);
        int[] pixels = ((DataBufferInt) image.getRaster().getDataBuffer()).getData();
        Arrays.fill(pixels, Palette.BACKGROUND);
        Set<Layer> field = fieldLayersOf(shown);
        if (field.contains(Layer.HEAT_MAP) && raster != null) {
            colours(pixels, w, h, view, raster, scale);
        }
        Set<Layer> lines = EnumSet.copyOf(field);
        lines.remove(Layer.HEAT_MAP);
        Graphics2D g = image.createGraphics();
        List<FieldLayers.ContourLabel> labels;
        try {
            labels = FieldLayers.draw(new Java2dSurface(g, w, h), view, raster, scale, lines);
        } finally {
            g.dispose();
        }
        return new FieldBackdrop(pixels, w, h, view, field, labels);
    }

    /**
     * The field colours, one per pixel, from B_z interpolated bilinearly between the map's cell
     * centres and then coloured (so in-between colours are those of in-between fields). A loop of
     * our own because Java2D's general image scaling took three times as long for a 1280 × 800 view.
     */
    private static void colours(int[] out, int w, int h, ViewTransform v, FieldRaster r, ColourScale scale) {
        int[] c0 = new int[w];
        int[] c1 = new int[w];
        float[] wx = new float[w];
        boolean[] inX = new boolean[w];
        for (int px = 0; px < w; px++) {
            double x = v.sceneX(px + 0.5);
            double f = (x - r.minX()) / r.cellM() - 0.5;
            inX[px] = x >= r.minX() && x <= r.maxX();
            int c = (int) Math.floor(f);
            c0[px] = Math.max(0, Math.min(r.cols() - 1, c));
            c1[px] = Math.max(0, Math.min(r.cols() - 1, c + 1));
            wx[px] = (float) (f - c);
        }
        float[] bz = r.bzT();
        for (int py = 0; py < h; py++) {
            double y = v.sceneY(py + 0.5);
            if (y < r.minY() || y > r.maxY()) {
                continue;
            }
            double f = (r.maxY() - y) / r.cellM() - 0.5;
            int row = (int) Math.floor(f);
            int base0 = Math.max(0, Math.min(r.rows() - 1, row)) * r.cols();
            int base1 = Math.max(0, Math.min(r.rows() - 1, row + 1)) * r.cols();
            float wy = (float) (f - row);
            int at = py * w;
            for (int px = 0; px < w; px++) {
                if (!inX[px]) {
                    continue;
                }
                float top = bz[base0 + c0[px]] + (bz[base0 + c1[px]] - bz[base0 + c0[px]]) * wx[px];
                float bottom = bz[base1 + c0[px]] + (bz[base1 + c1[px]] - bz[base1 + c0[px]]) * wx[px];
                int argb = scale.argb(top + (bottom - top) * wy);
                if (argb >>> 24 != 0) {
                    out[at + px] = argb;
                }
            }
        }
    }

    /** The field layers among {@code shown}. */
    public static Set<Layer> fieldLayersOf(Set<Layer> shown) {
        EnumSet<Layer> field = EnumSet.noneOf(Layer.class);
        for (Layer l : shown) {
            if (FieldLayers.LAYERS.contains(l)) {
                field.add(l);
            }
        }
        return field;
    }

    /** Whether this backdrop shows exactly the field layers a frame with {@code shown} wants. */
    public boolean shows(Set<Layer> shown) {
        return layers.equals(fieldLayersOf(shown));
    }

    /**
     * Draws the image where it belongs in {@code v}: in place when {@code v} is the view it was
     * drawn for, else moved and stretched until a new one arrives (while panning and zooming).
     * Returns the contour labels that still fit {@code v}: none while stretched.
     */
    List<FieldLayers.ContourLabel> drawOn(Surface s, ViewTransform v) {
        double x0 = v.screenX(view.sceneX(0));
        double y0 = v.screenY(view.sceneY(0));
        double scale = v.pxPerM() / view.pxPerM();
        s.image(argb, width, height, x0, y0, width * scale, height * scale);
        return v.equals(view) ? labels : List.of();
    }
}

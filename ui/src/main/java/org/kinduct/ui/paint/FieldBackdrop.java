package org.kinduct.ui.paint;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.kinduct.ui.view.ViewTransform;

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
    public static FieldBackdrop render(FieldRaster raster, ViewTransform view, double limit, Set<Layer> shown) {
        int w = Math.max(1, (int) Math.ceil(view.widthPx()));
        int h = Math.max(1, (int) Math.ceil(view.heightPx()));
        // Pre-multiplied pixels draw fastest; the image is opaque, so they equal plain ARGB.
        BufferedImage image = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB_PRE);
        Set<Layer> field = fieldLayersOf(shown);
        Graphics2D g = image.createGraphics();
        List<FieldLayers.ContourLabel> labels;
        try {
            Surface s = new Java2dSurface(g, w, h);
            s.fill(Palette.BACKGROUND);
            s.fillRect(0, 0, w, h);
            labels = FieldLayers.draw(s, view, raster, limit, field);
        } finally {
            g.dispose();
        }
        int[] pixels = ((DataBufferInt) image.getRaster().getDataBuffer()).getData();
        return new FieldBackdrop(pixels, w, h, view, field, labels);
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

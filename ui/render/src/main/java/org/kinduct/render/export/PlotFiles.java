package org.kinduct.render.export;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import org.kinduct.render.paint.Java2dSurface;
import org.kinduct.render.plot.Plot;

/** A {@link Plot} as PNG bytes or an SVG document, drawn by the same calls. */
public final class PlotFiles {

    /** PNG pixels per drawing unit: 1800 px wide for the 900-unit page. */
    private static final double PNG_SCALE = 2;
    private static final int DPI = 200;

    private PlotFiles() {
    }

    public static byte[] png(Plot plot) {
        int w = (int) Math.round(Plot.WIDTH * PNG_SCALE);
        int h = (int) Math.round(Plot.HEIGHT * PNG_SCALE);
        BufferedImage image = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, w, h);
            g.scale(PNG_SCALE, PNG_SCALE);
            plot.draw(new Java2dSurface(g, Plot.WIDTH, Plot.HEIGHT));
        } finally {
            g.dispose();
        }
        return PngFiles.encode(image, DPI);
    }

    public static String svg(Plot plot) {
        SvgSurface s = new SvgSurface(Plot.WIDTH, Plot.HEIGHT);
        plot.draw(s);
        return s.document(plot.title(), Plot.WIDTH);
    }
}

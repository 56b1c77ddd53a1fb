package org.kinduct.render.plot;

import org.kinduct.render.paint.Surface;

/** A chart of study results, drawn on any {@link Surface} (PNG and SVG alike). */
public sealed interface Plot permits LinePlot, MapPlot {

    /** Page size in drawing units (the PNG scales them up). */
    double WIDTH = 900;
    double HEIGHT = 600;

    String title();

    void draw(Surface s);
}

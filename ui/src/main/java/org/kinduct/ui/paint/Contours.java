package org.kinduct.ui.paint;

/**
 * Contour segments of a {@link FieldRaster} by marching squares (W. E. Lorensen and H. E. Cline,
 * "Marching cubes", SIGGRAPH 1987, in its two-dimensional form), with linear interpolation along
 * cell edges. Saddle cells are resolved by the cell-centre average. Display only.
 */
public final class Contours {

    /** Receives one segment in scene metres. */
    public interface SegmentSink {
        void segment(double x1, double y1, double x2, double y2);
    }

    private Contours() {
    }

    public static void trace(FieldRaster r, double level, SegmentSink sink) {
        float[] v = r.bzT();
        int cols = r.cols();
        double[] px = new double[4];
        double[] py = new double[4];
        for (int row = 0; row + 1 < r.rows(); row++) {
            double yTop = r.centerY(row);
            double yBot = r.centerY(row + 1);
            for (int col = 0; col + 1 < cols; col++) {
                double a = v[row * cols + col] - level;          // top-left
                double b = v[row * cols + col + 1] - level;      // top-right
                double c = v[(row + 1) * cols + col + 1] - level; // bottom-right
                double d = v[(row + 1) * cols + col] - level;    // bottom-left
                int mask = (a > 0 ? 8 : 0) | (b > 0 ? 4 : 0) | (c > 0 ? 2 : 0) | (d > 0 ? 1 : 0);
                if (mask == 0 || mask == 15 || Double.isNaN(a + b + c + d)) {
                    continue;
                }
                double xl = r.centerX(col);
                double xr = r.centerX(col + 1);
                int n = 0;
                // Edge crossings in order top, right, bottom, left.
                if ((a > 0) != (b > 0)) {
                    px[n] = xl + (xr - xl) * a / (a - b);
                    py[n++] = yTop;
                }
                if ((b > 0) != (c > 0)) {
                    px[n] = xr;
                    py[n++] = yTop + (yBot - yTop) * b / (b - c);
                }
                if ((c > 0) != (d > 0)) {
                    px[n] = xr + (xl - xr) * c / (c - d);
                    py[n++] = yBot;
                }
                if ((d > 0) != (a > 0)) {
                    px[n] = xl;
                    py[n++] = yBot + (yTop - yBot) * d / (d - a);
                }
                if (n == 2) {
                    sink.segment(px[0], py[0], px[1], py[1]);
                } else if (n == 4) {
                    boolean centreHigh = (a + b + c + d) / 4 > 0;
                    boolean topLeftHigh = a > 0;
                    if (centreHigh == topLeftHigh) {
                        sink.segment(px[0], py[0], px[1], py[1]);
                        sink.segment(px[2], py[2], px[3], py[3]);
                    } else {
                        sink.segment(px[0], py[0], px[3], py[3]);
                        sink.segment(px[1], py[1], px[2], py[2]);
                    }
                }
            }
        }
    }
}

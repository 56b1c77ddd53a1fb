package org.kinduct.render.paint;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Contour lines of a {@link FieldRaster} by marching squares (W. E. Lorensen and H. E. Cline,
 * "Marching cubes", SIGGRAPH 1987, in its two-dimensional form), with linear interpolation along
 * cell edges. Saddle cells are resolved by the cell-centre average. Display only.
 */
public final class Contours {

    /** Receives one segment in scene metres. */
    public interface SegmentSink {
        void segment(double x1, double y1, double x2, double y2);
    }

    /** Receives one connected line, {@code n} points in scene metres (closed lines repeat their first point). */
    public interface LineSink {
        void line(double[] xs, double[] ys, int n);
    }

    /** A segment between the crossings on two cell edges, each edge named by a unique id. */
    private interface EdgeSink {
        void segment(int edgeA, double xa, double ya, int edgeB, double xb, double yb);
    }

    private Contours() {
    }

    public static void trace(FieldRaster r, double level, SegmentSink sink) {
        traceEdges(r, level, (ea, xa, ya, eb, xb, yb) -> sink.segment(xa, ya, xb, yb));
    }

    /**
     * The same contour as {@link #trace}, joined into lines: neighbouring cells compute a shared
     * crossing once per edge, so segments are linked through edge ids, not through coordinates.
     * Fewer, longer paths are much cheaper to stroke.
     */
    public static void lines(FieldRaster r, double level, LineSink sink) {
        List<int[]> edges = new ArrayList<>();
        Map<Integer, double[]> at = new HashMap<>();
        Map<Integer, int[]> touching = new HashMap<>();
        traceEdges(r, level, (ea, xa, ya, eb, xb, yb) -> {
            int index = edges.size();
            edges.add(new int[] {ea, eb});
            at.putIfAbsent(ea, new double[] {xa, ya});
            at.putIfAbsent(eb, new double[] {xb, yb});
            link(touching, ea, index);
            link(touching, eb, index);
        });
        boolean[] used = new boolean[edges.size()];
        double[] xs = new double[edges.size() + 2];
        double[] ys = new double[edges.size() + 2];
        List<Integer> forward = new ArrayList<>();
        List<Integer> backward = new ArrayList<>();
        for (int start = 0; start < edges.size(); start++) {
            if (used[start]) {
                continue;
            }
            used[start] = true;
            forward.clear();
            backward.clear();
            walk(edges, touching, used, start, edges.get(start)[1], forward);
            walk(edges, touching, used, start, edges.get(start)[0], backward);
            int n = 0;
            for (int i = backward.size() - 1; i >= 0; i--) {
                double[] p = at.get(backward.get(i));
                xs[n] = p[0];
                ys[n++] = p[1];
            }
            for (int e : new int[] {edges.get(start)[0], edges.get(start)[1]}) {
                double[] p = at.get(e);
                xs[n] = p[0];
                ys[n++] = p[1];
            }
            for (int e : forward) {
                double[] p = at.get(e);
                xs[n] = p[0];
                ys[n++] = p[1];
            }
            sink.line(xs, ys, n);
        }
    }

    private static void link(Map<Integer, int[]> touching, int edge, int segment) {
        int[] pair = touching.get(edge);
        if (pair == null) {
            touching.put(edge, new int[] {segment, -1});
        } else {
            pair[1] = segment;
        }
    }

    /** Follows the chain from {@code segment} through {@code edge}, appending the far edges it reaches. */
    private static void walk(List<int[]> edges, Map<Integer, int[]> touching, boolean[] used, int segment, int edge,
                             List<Integer> out) {
        int current = segment;
        int through = edge;
        while (true) {
            int[] pair = touching.get(through);
            int next = pair[0] == current ? pair[1] : pair[0];
            if (next < 0 || used[next]) {
                return;
            }
            used[next] = true;
            int[] e = edges.get(next);
            through = e[0] == through ? e[1] : e[0];
            out.add(through);
            current = next;
        }
    }

    private static void traceEdges(FieldRaster r, double level, EdgeSink sink) {
        float[] v = r.bzT();
        int cols = r.cols();
        double[] px = new double[4];
        double[] py = new double[4];
        int[] id = new int[4];
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
                // Edge ids: 2·(node index) for the edge to the right of a node, +1 for the edge below it.
                int n = 0;
                if ((a > 0) != (b > 0)) {
                    id[n] = 2 * (row * cols + col);
                    px[n] = xl + (xr - xl) * a / (a - b);
                    py[n++] = yTop;
                }
                if ((b > 0) != (c > 0)) {
                    id[n] = 2 * (row * cols + col + 1) + 1;
                    px[n] = xr;
                    py[n++] = yTop + (yBot - yTop) * b / (b - c);
                }
                if ((c > 0) != (d > 0)) {
                    id[n] = 2 * ((row + 1) * cols + col);
                    px[n] = xl + (xr - xl) * d / (d - c);
                    py[n++] = yBot;
                }
                if ((d > 0) != (a > 0)) {
                    id[n] = 2 * (row * cols + col) + 1;
                    px[n] = xl;
                    py[n++] = yTop + (yBot - yTop) * a / (a - d);
                }
                if (n == 2) {
                    sink.segment(id[0], px[0], py[0], id[1], px[1], py[1]);
                } else if (n == 4) {
                    boolean centreHigh = (a + b + c + d) / 4 > 0;
                    boolean topLeftHigh = a > 0;
                    if (centreHigh == topLeftHigh) {
                        sink.segment(id[0], px[0], py[0], id[1], px[1], py[1]);
                        sink.segment(id[2], px[2], py[2], id[3], px[3], py[3]);
                    } else {
                        sink.segment(id[0], px[0], py[0], id[3], px[3], py[3]);
                        sink.segment(id[1], px[1], py[1], id[2], px[2], py[2]);
                    }
                }
            }
        }
    }
}

package org.kinduct.solver.sheet;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import org.apache.commons.geometry.core.partitioning.Split;
import org.apache.commons.geometry.euclidean.twod.LineConvexSubset;
import org.apache.commons.geometry.euclidean.twod.Lines;
import org.apache.commons.geometry.euclidean.twod.RegionBSPTree2D;
import org.apache.commons.geometry.euclidean.twod.Vector2D;
import org.apache.commons.numbers.core.Precision;

/**
 * Area fractions and face apertures of a Cartesian grid laid over a region, by Commons Geometry:
 * the region's BSP tree is split along grid lines, halving the block of cells each time, so that a
 * block wholly inside or outside is settled at once and only the blocks the edge passes through
 * are split down to single cells (about (cells along the edge)·log(cells) splits of small trees).
 * A cut cell's piece is the region clipped to its square; its boundary segments lying on a side of
 * the square are the open parts of that side as seen from this cell. The aperture of a face is
 * what both cells see open, so that an outline edge lying exactly on a grid line closes the face.
 */
final class CutCells {

    private static final int EMPTY = 0;
    private static final int FULL = 1;
    private static final int CUT = 2;
    /** A block whose piece misses less than this fraction of its area is full. */
    private static final double FULL_TOLERANCE = 1e-12;

    private static final int WEST = 0;
    private static final int EAST = 1;
    private static final int SOUTH = 2;
    private static final int NORTH = 3;

    private final int nx;
    private final int ny;
    private final double cellM;
    private final double x0;
    private final double y0;
    private final double epsilon;
    private final Precision.DoubleEquivalence precision;
    private final int[] state;
    final double[] areaFraction;
    /** Per cut cell, the open intervals of its four sides: [side][2k], [side][2k + 1]. */
    private final Map<Integer, double[][]> openSides = new HashMap<>();

    private CutCells(int nx, int ny, double cellM, double x0, double y0, Precision.DoubleEquivalence precision,
                     double epsilon) {
        this.nx = nx;
        this.ny = ny;
        this.cellM = cellM;
        this.x0 = x0;
        this.y0 = y0;
        this.precision = precision;
        this.epsilon = epsilon;
        state = new int[nx * ny];
        areaFraction = new double[nx * ny];
    }

    /** Classifies and measures every cell of the grid over {@code region}. */
    static CutCells of(RegionBSPTree2D region, int nx, int ny, double cellM, double x0, double y0,
                       Precision.DoubleEquivalence precision, double epsilon) {
        CutCells cells = new CutCells(nx, ny, cellM, x0, y0, precision, epsilon);
        cells.fill(region, 0, nx, 0, ny);
        return cells;
    }

    private void fill(RegionBSPTree2D piece, int i0, int i1, int j0, int j1) {
        if (piece == null || piece.isEmpty()) {
            return;
        }
        double block = (double) (i1 - i0) * (j1 - j0) * cellM * cellM;
        double size = piece.getSize();
        if (!(size > FULL_TOLERANCE * block)) {
            return;
        }
        if (size >= (1 - FULL_TOLERANCE) * block) {
            for (int j = j0; j < j1; j++) {
                for (int i = i0; i < i1; i++) {
                    state[i + nx * j] = FULL;
                    areaFraction[i + nx * j] = 1;
                }
            }
            return;
        }
        if (i1 - i0 == 1 && j1 - j0 == 1) {
            int c = i0 + nx * j0;
            state[c] = CUT;
            areaFraction[c] = size / (cellM * cellM);
            openSides.put(c, sides(piece, i0, j0));
            return;
        }
        // A line's minus side is on its left: left of an upward line, above a rightward one.
        if (i1 - i0 >= j1 - j0) {
            int mid = (i0 + i1) >>> 1;
            Split<RegionBSPTree2D> split = piece.split(
                    Lines.fromPointAndDirection(Vector2D.of(x0 + mid * cellM, y0), Vector2D.Unit.PLUS_Y, precision));
            fill(split.getMinus(), i0, mid, j0, j1);
            fill(split.getPlus(), mid, i1, j0, j1);
        } else {
            int mid = (j0 + j1) >>> 1;
            Split<RegionBSPTree2D> split = piece.split(
                    Lines.fromPointAndDirection(Vector2D.of(x0, y0 + mid * cellM), Vector2D.Unit.PLUS_X, precision));
            fill(split.getPlus(), i0, i1, j0, mid);
            fill(split.getMinus(), i0, i1, mid, j1);
        }
    }

    /** The boundary segments of a cell's piece that lie on its sides, as intervals along each side. */
    private double[][] sides(RegionBSPTree2D piece, int i, int j) {
        double west = x0 + i * cellM;
        double south = y0 + j * cellM;
        double[][] open = new double[4][0];
        for (LineConvexSubset segment : piece.getBoundaries()) {
            Vector2D a = segment.getStartPoint();
            Vector2D b = segment.getEndPoint();
            if (near(a.getX(), west) && near(b.getX(), west)) {
                open[WEST] = append(open[WEST], a.getY(), b.getY());
            } else if (near(a.getX(), west + cellM) && near(b.getX(), west + cellM)) {
                open[EAST] = append(open[EAST], a.getY(), b.getY());
            } else if (near(a.getY(), south) && near(b.getY(), south)) {
                open[SOUTH] = append(open[SOUTH], a.getX(), b.getX());
            } else if (near(a.getY(), south + cellM) && near(b.getY(), south + cellM)) {
                open[NORTH] = append(open[NORTH], a.getX(), b.getX());
            }
        }
        return open;
    }

    private boolean near(double a, double b) {
        return Math.abs(a - b) <= epsilon;
    }

    private static double[] append(double[] intervals, double a, double b) {
        double[] grown = Arrays.copyOf(intervals, intervals.length + 2);
        grown[intervals.length] = Math.min(a, b);
        grown[intervals.length + 1] = Math.max(a, b);
        return grown;
    }

    /**
     * Open fraction of the face at x = x0 + i·h between cells (i − 1, j) and (i, j); 0 on the
     * grid's border.
     */
    double apertureX(int i, int j) {
        if (i == 0 || i == nx) {
            return 0;
        }
        double lo = y0 + j * cellM;
        return shared(i - 1 + nx * j, EAST, i + nx * j, WEST, lo);
    }

    /** Open fraction of the face at y = y0 + j·h between cells (i, j − 1) and (i, j). */
    double apertureY(int i, int j) {
        if (j == 0 || j == ny) {
            return 0;
        }
        double lo = x0 + i * cellM;
        return shared(i + nx * (j - 1), NORTH, i + nx * j, SOUTH, lo);
    }

    /** Length both cells see open on their common side, as a fraction of the cell size. */
    private double shared(int a, int sideA, int b, int sideB, double lo) {
        if (state[a] == EMPTY || state[b] == EMPTY) {
            return 0;
        }
        double[] whole = {lo, lo + cellM};
        double[] fromA = state[a] == FULL ? whole : openSides.get(a)[sideA];
        double[] fromB = state[b] == FULL ? whole : openSides.get(b)[sideB];
        double overlap = 0;
        for (int p = 0; p < fromA.length; p += 2) {
            for (int q = 0; q < fromB.length; q += 2) {
                overlap += Math.max(0, Math.min(fromA[p + 1], fromB[q + 1]) - Math.max(fromA[p], fromB[q]));
            }
        }
        return Math.min(1, overlap / cellM);
    }
}

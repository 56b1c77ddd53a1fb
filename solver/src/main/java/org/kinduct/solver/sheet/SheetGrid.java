package org.kinduct.solver.sheet;

import java.util.ArrayDeque;
import org.apache.commons.geometry.euclidean.twod.RegionBSPTree2D;
import org.apache.commons.geometry.euclidean.twod.Vector2D;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Vec2;

/**
 * A cut-cell grid over a {@link SheetShape}: square cells of side h on a Cartesian grid centred on
 * the outline's bounding box, each with the fraction of its area that conducts, and each face
 * with the fraction of its length that is open (its aperture); the boundary closes the rest.
 * Cell (i, j) spans [x0 + i·h, x0 + (i + 1)·h] × [y0 + j·h, y0 + (j + 1)·h].
 *
 * <p>Small cells: a cell whose conducting area is below {@value #SMALL_CELL_FRACTION} of a full
 * cell is left out and its faces closed. The scheme keeps current balance per cell and never
 * divides by a cell's area, so small cells are stable; what needs a rule is a cell the edge only
 * grazes (a sliver in a corner, a tip between two grid lines), which hangs on faces of almost zero
 * length and makes the matrix nearly singular. A straight edge leaves a cell of area fraction α
 * at least one face open over about √(2α) of its length, so with this threshold every cell kept
 * is tied to a neighbour through at least ~1/700 of a face, while a cell left out is a notch of
 * at most that depth, which changes the potential by about √(2α)·h·|∇φ| at the notch and less
 * than a dipole's share of that away from it, far below the discretization error. Larger thresholds cost accuracy: leaving out cells below 1e-3 or
 * 1e-2 raised the largest potential error in the cut cells of the convergence test's turned
 * square (256 cells) from 1.9e-4 to 5.6e-4 and 1.9e-3. Merging cells into a neighbour at the
 * usual thresholds of 0.1 to 0.5 was not tried: it moves a cell's centre by up to a cell, which
 * for two-point fluxes means first-order errors on the faces the merged cell keeps. After that
 * the cells must form one connected piece through open faces (a neck narrower than the cells
 * can split them); otherwise the constructor throws.
 *
 * <p>Limit: a hole or gap narrower than a cell is not resolved: conductor on both sides of it in
 * one cell shares that cell's potential.
 */
public final class SheetGrid {

    /** Cells conducting less than this fraction of their area are left out (see the class comment). */
    public static final double SMALL_CELL_FRACTION = 1e-6;
    /**
     * Most cells over the outline's box: four times what a file may ask for (two halvings of the
     * automatic size for a narrow neck stay within it), so that no shape exhausts memory
     * (a 1 km sliver of a plate once asked for 4 GB).
     */
    public static final long MOST_CELLS = 4L * Conductor.Sheet.MOST_CELLS;

    private final SheetShape shape;
    private final int nx;
    private final int ny;
    private final double cellM;
    private final double x0;
    private final double y0;
    private final double[] areaFraction;
    private final double[] apertureX;
    private final double[] apertureY;
    private final int activeCount;
    /** The conductor as a region, kept for finding the edge near an electrode. */
    private final RegionBSPTree2D region;

    private SheetGrid(SheetShape shape, double cellM) {
        if (!(cellM > 0) || !Double.isFinite(cellM)) {
            throw new IllegalArgumentException("cell size must be positive and finite, got " + cellM + " m");
        }
        double[] box = shape.boundingBox();
        double width = box[2] - box[0];
        double height = box[3] - box[1];
        long cellsX = Math.max(1, (long) Math.ceil(width / cellM * (1 - 1e-12)));
        long cellsY = Math.max(1, (long) Math.ceil(height / cellM * (1 - 1e-12)));
        if (cellsX * cellsY > MOST_CELLS) {
            throw new IllegalArgumentException("cell size " + cellM + " m gives " + cellsX + " × " + cellsY
                    + " cells over the outline's box, more than the " + MOST_CELLS + " a grid may have");
        }
        this.shape = shape;
        this.cellM = cellM;
        nx = (int) cellsX;
        ny = (int) cellsY;
        x0 = 0.5 * (box[0] + box[2]) - 0.5 * nx * cellM;
        y0 = 0.5 * (box[1] + box[3]) - 0.5 * ny * cellM;
        region = shape.region();
        CutCells cells = CutCells.of(region, nx, ny, cellM, x0, y0, shape.precision(),
                SheetShape.RELATIVE_EPSILON * shape.extentM());
        areaFraction = cells.areaFraction;
        apertureX = new double[(nx + 1) * ny];
        apertureY = new double[nx * (ny + 1)];
        for (int c = 0; c < areaFraction.length; c++) {
            if (areaFraction[c] < SMALL_CELL_FRACTION) {
                areaFraction[c] = 0;
            }
        }
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i <= nx; i++) {
                boolean both = i > 0 && i < nx && areaFraction[i - 1 + nx * j] > 0 && areaFraction[i + nx * j] > 0;
                apertureX[i + (nx + 1) * j] = both ? cells.apertureX(i, j) : 0;
            }
        }
        for (int j = 0; j <= ny; j++) {
            for (int i = 0; i < nx; i++) {
                boolean both = j > 0 && j < ny && areaFraction[i + nx * (j - 1)] > 0 && areaFraction[i + nx * j] > 0;
                apertureY[i + nx * j] = both ? cells.apertureY(i, j) : 0;
            }
        }
        activeCount = checkConnected();
    }

    /** A grid of square cells of side {@code cellM} over the shape's bounding box. */
    public static SheetGrid withCellSize(SheetShape shape, double cellM) {
        return new SheetGrid(shape, cellM);
    }

    /** A grid with {@code cells} cells along the longer side of the shape's bounding box. */
    public static SheetGrid withCells(SheetShape shape, int cells) {
        if (cells < 1) {
            throw new IllegalArgumentException("need at least one cell along the longer side, got " + cells);
        }
        return new SheetGrid(shape, shape.extentM() / cells);
    }

    /** Counts the conducting cells and requires them to be one piece through open faces. */
    private int checkConnected() {
        int first = -1;
        int count = 0;
        for (int c = 0; c < areaFraction.length; c++) {
            if (areaFraction[c] > 0) {
                count++;
                if (first < 0) {
                    first = c;
                }
            }
        }
        if (count == 0) {
            throw new IllegalArgumentException("cells of " + cellM + " m leave no conducting cell; use smaller cells");
        }
        boolean[] seen = new boolean[areaFraction.length];
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        queue.add(first);
        seen[first] = true;
        int reached = 0;
        while (!queue.isEmpty()) {
            int c = queue.poll();
            reached++;
            int i = c % nx;
            int j = c / nx;
            visit(seen, queue, apertureX(i, j), c - 1);
            visit(seen, queue, apertureX(i + 1, j), c + 1);
            visit(seen, queue, apertureY(i, j), c - nx);
            visit(seen, queue, apertureY(i, j + 1), c + nx);
        }
        if (reached != count) {
            throw new IllegalArgumentException("cells of " + cellM + " m split the sheet into separate pieces ("
                    + reached + " of " + count + " cells connected): a neck or gap is narrower than a cell; use"
                    + " smaller cells");
        }
        return count;
    }

    private static void visit(boolean[] seen, ArrayDeque<Integer> queue, double aperture, int c) {
        if (aperture > 0 && !seen[c]) {
            seen[c] = true;
            queue.add(c);
        }
    }

    public SheetShape shape() {
        return shape;
    }

    /** Cells along x. */
    public int nx() {
        return nx;
    }

    /** Cells along y. */
    public int ny() {
        return ny;
    }

    /** Side h of a cell, metres. */
    public double cellM() {
        return cellM;
    }

    /** x of the grid's left edge, metres. */
    public double originXM() {
        return x0;
    }

    /** y of the grid's bottom edge, metres. */
    public double originYM() {
        return y0;
    }

    /** x of the centre of cells in column i, metres. */
    public double centreXM(int i) {
        return x0 + (i + 0.5) * cellM;
    }

    /** y of the centre of cells in row j, metres. */
    public double centreYM(int j) {
        return y0 + (j + 0.5) * cellM;
    }

    /** Conducting fraction of cell (i, j)'s area; 0 outside and for cells left out. */
    public double areaFraction(int i, int j) {
        return areaFraction[i + nx * j];
    }

    /** Whether cell (i, j) carries an unknown potential. */
    public boolean active(int i, int j) {
        return areaFraction[i + nx * j] > 0;
    }

    /** Open fraction of the face x = x0 + i·h between cells (i − 1, j) and (i, j), 0 ≤ i ≤ nx. */
    public double apertureX(int i, int j) {
        return apertureX[i + (nx + 1) * j];
    }

    /** Open fraction of the face y = y0 + j·h between cells (i, j − 1) and (i, j), 0 ≤ j ≤ ny. */
    public double apertureY(int i, int j) {
        return apertureY[i + nx * j];
    }

    /** Number of cells that carry an unknown. */
    public int activeCount() {
        return activeCount;
    }

    /** Conducting area of the cells kept, m². */
    public double areaM2() {
        double sum = 0;
        for (double f : areaFraction) {
            sum += f;
        }
        return sum * cellM * cellM;
    }

    /** The point of the sheet's edge (outline or a hole) nearest to {@code p}. */
    Vec2 nearestEdgePoint(Vec2 p) {
        Vector2D q;
        // The tree caches derived data on first use; one caller at a time.
        synchronized (region) {
            q = region.project(Vector2D.of(p.x(), p.y()));
        }
        return new Vec2(q.getX(), q.getY());
    }
}

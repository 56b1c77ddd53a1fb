package org.kinduct.scene;

import java.util.Arrays;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

/**
 * B_z samples on a regular grid: sample (i, j) lies at (x0 + i·dx, y0 + j·dy) in the frame the
 * map was drawn in, i = 0 … nx − 1 along x, j = 0 … ny − 1 along y. Samples are stored row by
 * row from the lowest y, x fastest. Immutable; equal when geometry, layout and every sample are
 * equal (so a scene read back from its file equals the scene written).
 *
 * @see Source.FieldMap
 */
public final class FieldGrid {

    /** Largest number of samples accepted: 200 MB of doubles, far beyond any scan or export seen in practice. */
    public static final long MAX_SAMPLES = 25_000_000L;
    /** Fewest samples along each axis: a cubic needs a neighbour on both sides or an extrapolated one (Keys 1981). */
    public static final int MIN_SAMPLES_PER_AXIS = 3;

    /** How the samples are written in the file. */
    public enum Layout {
        /** Rows {@code x, y, B_z} with units in the header, as {@code kinduct export --field-csv} writes. */
        POINTS,
        /** A plain matrix of B_z, one file row per y; origin, spacing and unit come from the scene. */
        MATRIX
    }

    private final Layout layout;
    private final int nx;
    private final int ny;
    private final double x0M;
    private final double y0M;
    private final double dxM;
    private final double dyM;
    private final double fileUnitT;
    private final double[] bzT;
    private final double peakT;
    private final int hash;
    /** Values computed once from the samples by other layers (interpolation tables), by their type. */
    private final Map<Class<?>, Object> derived = new ConcurrentHashMap<>();

    /**
     * @param fileUnitT tesla per number in the file's B_z column (1e-3 for mT); kept so that a
     *        matrix can be written back into its scene, informational for points
     * @param bzT samples in tesla, row by row from the lowest y, x fastest; taken over, not
     *        copied (a large map would otherwise be held twice while loading), so the caller must
     *        not change it afterwards
     */
    public FieldGrid(Layout layout, int nx, int ny, double x0M, double y0M, double dxM, double dyM, double fileUnitT,
                     double[] bzT) {
        Checks.nonNull(layout, "layout");
        if (nx < MIN_SAMPLES_PER_AXIS || ny < MIN_SAMPLES_PER_AXIS) {
            throw new IllegalArgumentException("a field map needs at least " + MIN_SAMPLES_PER_AXIS
                    + " samples along x and along y, got " + nx + " × " + ny);
        }
        if ((long) nx * ny > MAX_SAMPLES) {
            throw new IllegalArgumentException("a field map may hold at most " + MAX_SAMPLES + " samples, got " + nx
                    + " × " + ny);
        }
        Checks.finite(x0M, "map origin x");
        Checks.finite(y0M, "map origin y");
        Checks.positive(dxM, "map spacing x");
        Checks.positive(dyM, "map spacing y");
        Checks.positive(fileUnitT, "B_z unit");
        Checks.nonNull(bzT, "samples");
        if (bzT.length != nx * ny) {
            throw new IllegalArgumentException("a " + nx + " × " + ny + " map needs " + nx * ny + " samples, got "
                    + bzT.length);
        }
        double peak = 0;
        for (int k = 0; k < bzT.length; k++) {
            if (!Double.isFinite(bzT[k])) {
                throw new IllegalArgumentException("B_z sample " + k % nx + ", " + k / nx + " is not a finite number: "
                        + bzT[k]);
            }
            peak = Math.max(peak, Math.abs(bzT[k]));
        }
        this.layout = layout;
        this.nx = nx;
        this.ny = ny;
        this.x0M = x0M;
        this.y0M = y0M;
        this.dxM = dxM;
        this.dyM = dyM;
        this.fileUnitT = fileUnitT;
        this.bzT = bzT;
        this.peakT = peak;
        this.hash = Arrays.hashCode(new double[] {nx, ny, x0M, y0M, dxM, dyM, fileUnitT}) * 31
                + Arrays.hashCode(this.bzT) + layout.hashCode();
    }

    public Layout layout() {
        return layout;
    }

    /** Samples along x. */
    public int nx() {
        return nx;
    }

    /** Samples along y. */
    public int ny() {
        return ny;
    }

    /** x of the first column, metres. */
    public double x0M() {
        return x0M;
    }

    /** y of the first row, metres. */
    public double y0M() {
        return y0M;
    }

    public double dxM() {
        return dxM;
    }

    public double dyM() {
        return dyM;
    }

    /** x of the last column, metres. */
    public double x1M() {
        return x0M + (nx - 1) * dxM;
    }

    /** y of the last row, metres. */
    public double y1M() {
        return y0M + (ny - 1) * dyM;
    }

    /** Tesla per number in the file's B_z values. */
    public double fileUnitT() {
        return fileUnitT;
    }

    /** Sample at column i, row j, tesla. */
    public double at(int i, int j) {
        return bzT[j * nx + i];
    }

    /** The largest |B_z| of any sample, tesla. */
    public double peakT() {
        return peakT;
    }

    /**
     * The value of type {@code type} computed from this grid by {@code make}, computed on first
     * use and then kept as long as the grid: the solver's interpolation tables are made once per
     * map, not once per instant. The model itself attaches no meaning to it.
     */
    public <T> T derived(Class<T> type, Function<FieldGrid, T> make) {
        return type.cast(derived.computeIfAbsent(type, k -> make.apply(this)));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof FieldGrid g && hash == g.hash && layout == g.layout && nx == g.nx && ny == g.ny
                && Double.compare(x0M, g.x0M) == 0 && Double.compare(y0M, g.y0M) == 0
                && Double.compare(dxM, g.dxM) == 0 && Double.compare(dyM, g.dyM) == 0
                && Double.compare(fileUnitT, g.fileUnitT) == 0 && Arrays.equals(bzT, g.bzT);
    }

    @Override
    public int hashCode() {
        return hash;
    }

    @Override
    public String toString() {
        return "FieldGrid[" + layout + " " + nx + "×" + ny + " from (" + x0M + ", " + y0M + ") step (" + dxM + ", "
                + dyM + ")]";
    }
}

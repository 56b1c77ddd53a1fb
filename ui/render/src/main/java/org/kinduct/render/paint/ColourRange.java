package org.kinduct.render.paint;

/**
 * The user's choice of colour scale for B_z: automatic from the map, or pinned to a limit in
 * tesla; logarithmic (the default: the fields of magnets span decades) or linear.
 */
public record ColourRange(boolean auto, double manualLimitT, ColourScale.Kind kind) {

    public ColourRange {
        if (!(manualLimitT > 0) || !Double.isFinite(manualLimitT)) {
            throw new IllegalArgumentException("colour limit must be positive, got " + manualLimitT + " T");
        }
        if (kind == null) {
            throw new IllegalArgumentException("a colour scale kind is required");
        }
    }

    public static ColourRange automatic() {
        return new ColourRange(true, 0.1, ColourScale.Kind.LOG);
    }

    /**
     * The scale for {@code raster}: pinned, or from the map — a logarithmic scale topped at its
     * strongest field rounded up to a round value, a linear one at a high percentile (so one hot
     * spot does not wash out the rest); the pinned limit when there is no data.
     */
    public ColourScale scaleFor(FieldRaster raster) {
        if (auto && raster != null) {
            double top = kind == ColourScale.Kind.LOG ? raster.peakT() : raster.autoLimitT();
            if (top > 0) {
                return new ColourScale(kind, kind == ColourScale.Kind.LOG ? roundUp(top) : top);
            }
        }
        return new ColourScale(kind, manualLimitT);
    }

    /** The smallest 1, 2 or 5 × 10ⁿ at or above {@code v}. */
    private static double roundUp(double v) {
        double decade = Math.pow(10, Math.floor(Math.log10(v)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * decade >= v * (1 - 1e-12)) {
                return m * decade;
            }
        }
        return 10 * decade;
    }

    /** The same choice with a scale of this kind. */
    public ColourRange withKind(ColourScale.Kind newKind) {
        return new ColourRange(auto, manualLimitT, newKind);
    }
}

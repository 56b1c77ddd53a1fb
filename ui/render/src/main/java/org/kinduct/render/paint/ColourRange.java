package org.kinduct.render.paint;

/** Symmetric colour limits for B_z: automatic from the data, or a fixed limit in tesla. */
public record ColourRange(boolean auto, double manualLimitT) {

    public ColourRange {
        if (!(manualLimitT > 0) || !Double.isFinite(manualLimitT)) {
            throw new IllegalArgumentException("colour limit must be positive, got " + manualLimitT + " T");
        }
    }

    public static ColourRange automatic() {
        return new ColourRange(true, 0.1);
    }

    /** The limit to use for {@code raster} (falls back to the manual one when there is no data). */
    public double limitFor(FieldRaster raster) {
        if (auto && raster != null && raster.autoLimitT() > 0) {
            return raster.autoLimitT();
        }
        return manualLimitT;
    }
}

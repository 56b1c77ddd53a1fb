package org.kinduct.solver.field;

import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;

/**
 * Placeholder for the field kernels of block magnets, cylinder magnets and source coils, so the
 * solver compiles before they land. The real class replaces this one.
 */
public final class PhysicalSources {

    private PhysicalSources() {
    }

    /** The field of {@code source} riding a body at {@code pose}, at time {@code tS}. */
    public static PlaneField place(Source source, Pose pose, double tS) {
        throw new UnsupportedOperationException("physical sources land with the field kernels");
    }
}

package org.kinduct.solver;

import java.util.List;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/**
 * What the difference step and the quadrature need to know of a source: a drawn anchor point, the
 * source's extent around it (so a turning source's far edge counts at |ω|·extent) and the
 * shortest length over which its field changes in the plane, metres.
 */
record SourceReach(Vec2 anchor, double extentM, double lengthM) {

    /** Null for a uniform field, which neither moves nor has a length. */
    static SourceReach of(Source source) {
        if (source instanceof Source.FieldPatch patch) {
            return ofOutline(patch.outline(), Double.POSITIVE_INFINITY);
        }
        if (source instanceof Source.BlockMagnet block) {
            return new SourceReach(block.center(), 0.5 * Math.hypot(block.sizeXM(), block.sizeYM()),
                    Math.min(Math.min(block.sizeXM(), block.sizeYM()), block.heightM()) + block.standoffM());
        }
        if (source instanceof Source.CylinderMagnet cylinder) {
            return new SourceReach(cylinder.center(), cylinder.radiusM(),
                    Math.min(2 * cylinder.radiusM(), cylinder.heightM()) + cylinder.standoffM());
        }
        if (source instanceof Source.SourceCoil coil) {
            double plane = Math.abs(coil.planeZM());
            if (coil.shape() instanceof Source.CoilShape.Circle circle) {
                return new SourceReach(circle.center(), circle.radiusM(), Math.min(circle.radiusM(), plane));
            }
            return ofOutline(((Source.CoilShape.Polygon) coil.shape()).vertices(), plane);
        }
        return null;
    }

    private static SourceReach ofOutline(List<Vec2> outline, double lengthCapM) {
        Vec2 anchor = outline.get(0);
        double extent = 0;
        double shortest = lengthCapM;
        for (int i = 0; i < outline.size(); i++) {
            extent = Math.max(extent, outline.get(i).minus(anchor).length());
            shortest = Math.min(shortest, outline.get((i + 1) % outline.size()).minus(outline.get(i)).length());
        }
        return new SourceReach(anchor, extent, shortest);
    }
}

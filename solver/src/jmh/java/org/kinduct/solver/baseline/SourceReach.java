package org.kinduct.solver.baseline;

import java.util.List;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.baseline.field.PhysicalConstants;

/**
 * What the difference step, the quadrature and the noise thresholds need to know of a source: a
 * drawn anchor point, the source's extent around it (so a turning source's far edge counts at
 * |ω|·extent), the shortest length over which its field changes in the plane (metres; infinite for
 * a uniform field) and the order of magnitude of its strongest B_z there (tesla).
 *
 * <p>Field scales: a patch or uniform field its own B_z; a magnet its remanence (the field of a
 * uniformly magnetized body stays below Br outside it); a coil N·μ0·I_max/(2π·d) with d the
 * smaller of its plane distance and size, the field of a straight filament at distance d
 * (Biot–Savart; Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013, §5.2.2).
 */
record SourceReach(Vec2 anchor, double extentM, double lengthM, double fieldT) {

    static SourceReach of(Source source) {
        return source.match(new Source.Cases<>() {
            @Override
            public SourceReach patch(Source.FieldPatch patch) {
                return ofOutline(patch.outline(), Double.POSITIVE_INFINITY, Math.abs(patch.bzT()));
            }

            @Override
            public SourceReach uniform(Source.UniformField uniform) {
                return new SourceReach(Vec2.ZERO, 0, Double.POSITIVE_INFINITY, Math.abs(uniform.bzT()));
            }

            @Override
            public SourceReach block(Source.BlockMagnet block) {
                return new SourceReach(block.center(), 0.5 * Math.hypot(block.sizeXM(), block.sizeYM()),
                        Math.min(Math.min(block.sizeXM(), block.sizeYM()), block.heightM()) + block.standoffM(),
                        block.remanenceT());
            }

            @Override
            public SourceReach cylinder(Source.CylinderMagnet cylinder) {
                return new SourceReach(cylinder.center(), cylinder.radiusM(),
                        Math.min(2 * cylinder.radiusM(), cylinder.heightM()) + cylinder.standoffM(),
                        cylinder.remanenceT());
            }

            @Override
            public SourceReach coil(Source.SourceCoil coil) {
                return ofCoil(coil);
            }

            @Override
            public SourceReach map(Source.FieldMap map) {
                throw new UnsupportedOperationException("the baseline solver predates field maps");
            }
        });
    }

    private static SourceReach ofCoil(Source.SourceCoil coil) {
        double plane = Math.abs(coil.planeZM());
        double amps = coil.turns() * (Math.abs(coil.drive().dcA()) + Math.abs(coil.drive().amplitudeA()));
        return coil.shape().match(new Source.CoilShape.Cases<>() {
            @Override
            public SourceReach polygon(Source.CoilShape.Polygon polygon) {
                SourceReach outline = ofOutline(polygon.vertices(), plane, 0);
                return new SourceReach(outline.anchor(), outline.extentM(), outline.lengthM(),
                        PhysicalConstants.MU_0 * amps / (2 * Math.PI * outline.lengthM()));
            }

            @Override
            public SourceReach circle(Source.CoilShape.Circle circle) {
                double length = Math.min(circle.radiusM(), plane);
                return new SourceReach(circle.center(), circle.radiusM(), length,
                        PhysicalConstants.MU_0 * amps / (2 * Math.PI * length));
            }
        });
    }

    private static SourceReach ofOutline(List<Vec2> outline, double lengthCapM, double fieldT) {
        Vec2 anchor = outline.get(0);
        double extent = 0;
        double shortest = lengthCapM;
        for (int i = 0; i < outline.size(); i++) {
            extent = Math.max(extent, outline.get(i).minus(anchor).length());
            shortest = Math.min(shortest, outline.get((i + 1) % outline.size()).minus(outline.get(i)).length());
        }
        return new SourceReach(anchor, extent, shortest, fieldT);
    }
}

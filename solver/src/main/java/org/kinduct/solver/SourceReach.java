package org.kinduct.solver;

import java.util.List;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

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

    /** μ0 to the precision a scale needs (CODATA 2018 differs by 5e-10 relative). */
    private static final double MU0_SCALE = 4e-7 * Math.PI;

    static SourceReach of(Source source) {
        if (source instanceof Source.FieldPatch patch) {
            return ofOutline(patch.outline(), Double.POSITIVE_INFINITY, Math.abs(patch.bzT()));
        }
        if (source instanceof Source.UniformField uniform) {
            return new SourceReach(Vec2.ZERO, 0, Double.POSITIVE_INFINITY, Math.abs(uniform.bzT()));
        }
        if (source instanceof Source.BlockMagnet block) {
            return new SourceReach(block.center(), 0.5 * Math.hypot(block.sizeXM(), block.sizeYM()),
                    Math.min(Math.min(block.sizeXM(), block.sizeYM()), block.heightM()) + block.standoffM(),
                    block.remanenceT());
        }
        if (source instanceof Source.CylinderMagnet cylinder) {
            return new SourceReach(cylinder.center(), cylinder.radiusM(),
                    Math.min(2 * cylinder.radiusM(), cylinder.heightM()) + cylinder.standoffM(),
                    cylinder.remanenceT());
        }
        Source.SourceCoil coil = (Source.SourceCoil) source;
        double plane = Math.abs(coil.planeZM());
        double amps = coil.turns() * (Math.abs(coil.drive().dcA()) + Math.abs(coil.drive().amplitudeA()));
        if (coil.shape() instanceof Source.CoilShape.Circle circle) {
            double length = Math.min(circle.radiusM(), plane);
            return new SourceReach(circle.center(), circle.radiusM(), length, MU0_SCALE * amps / (2 * Math.PI * length));
        }
        SourceReach outline = ofOutline(((Source.CoilShape.Polygon) coil.shape()).vertices(), plane, 0);
        return new SourceReach(outline.anchor(), outline.extentM(), outline.lengthM(),
                MU0_SCALE * amps / (2 * Math.PI * outline.lengthM()));
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

package org.kinduct.solver.baseline;

import java.util.List;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.baseline.field.PatchField;
import org.kinduct.solver.baseline.field.PhysicalSources;
import org.kinduct.solver.baseline.field.PlaneField;
import org.kinduct.solver.baseline.field.UniformField;

/** Places a scene source at a body pose and time, giving its field in the drawing plane. */
public final class SourceFields {

    private SourceFields() {
    }

    /**
     * The field of {@code source} when its body is at {@code pose}, at time {@code tS} (coil
     * currents follow their drive). Field patches and uniform fields are evaluated here; magnets
     * and coils by {@link PhysicalSources}.
     */
    public static PlaneField place(Source source, Pose pose, double tS) {
        return source.match(new Source.Cases<>() {
            @Override
            public PlaneField patch(Source.FieldPatch patch) {
                List<Vec2> outline = patch.outline();
                double[] xs = new double[outline.size()];
                double[] ys = new double[outline.size()];
                for (int i = 0; i < xs.length; i++) {
                    Vec2 p = pose.place(outline.get(i));
                    xs[i] = p.x();
                    ys[i] = p.y();
                }
                return new PatchField(xs, ys, patch.bzT());
            }

            @Override
            public PlaneField uniform(Source.UniformField uniform) {
                return new UniformField(uniform.bzT());
            }

            @Override
            public PlaneField block(Source.BlockMagnet block) {
                return PhysicalSources.block(block, pose);
            }

            @Override
            public PlaneField cylinder(Source.CylinderMagnet cylinder) {
                return PhysicalSources.cylinder(cylinder, pose);
            }

            @Override
            public PlaneField coil(Source.SourceCoil coil) {
                return PhysicalSources.coil(coil, pose, tS);
            }

            @Override
            public PlaneField map(Source.FieldMap map) {
                throw new UnsupportedOperationException("the baseline solver predates field maps");
            }
        });
    }
}

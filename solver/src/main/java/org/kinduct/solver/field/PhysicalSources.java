package org.kinduct.solver.field;

import java.util.List;

import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/** Places the physical sources of a scene (magnets and source coils) as plane fields. */
public final class PhysicalSources {

    private PhysicalSources() {
    }

    /**
     * The field of {@code source} at time {@code tS} with its body at {@code pose}: drawn centres
     * and vertices go through {@link Pose#place}, a block magnet's angle adds the pose's angle,
     * a magnet's z range follows from its stand-off and side, its remanence is signed by its
     * magnetization, and a coil carries turns × drive current at {@code tS}.
     *
     * @throws IllegalArgumentException for idealized sources (field patches, uniform fields),
     *                                  which the solver core evaluates itself
     */
    public static PlaneField place(Source source, Pose pose, double tS) {
        if (source instanceof Source.BlockMagnet m) {
            Vec2 c = pose.place(m.center());
            return new BlockMagnetField(c.x(), c.y(), m.angleRad() + pose.angleRad(), m.sizeXM(), m.sizeYM(),
                    zLow(m.side(), m.standoffM(), m.heightM()), zHigh(m.side(), m.standoffM(), m.heightM()),
                    signed(m.remanenceT(), m.magnetization()));
        }
        if (source instanceof Source.CylinderMagnet m) {
            Vec2 c = pose.place(m.center());
            return new CylinderMagnetField(c.x(), c.y(), m.radiusM(),
                    zLow(m.side(), m.standoffM(), m.heightM()), zHigh(m.side(), m.standoffM(), m.heightM()),
                    signed(m.remanenceT(), m.magnetization()));
        }
        if (source instanceof Source.SourceCoil coil) {
            double ampereTurns = coil.turns() * coil.drive().currentAt(tS);
            if (coil.shape() instanceof Source.CoilShape.Circle circle) {
                Vec2 c = pose.place(circle.center());
                return new CircleCoilField(c.x(), c.y(), circle.radiusM(), coil.planeZM(), ampereTurns);
            }
            List<Vec2> vertices = ((Source.CoilShape.Polygon) coil.shape()).vertices();
            double[] xs = new double[vertices.size()];
            double[] ys = new double[vertices.size()];
            for (int i = 0; i < xs.length; i++) {
                Vec2 p = pose.place(vertices.get(i));
                xs[i] = p.x();
                ys[i] = p.y();
            }
            return new PolygonCoilField(xs, ys, coil.planeZM(), ampereTurns);
        }
        throw new IllegalArgumentException("source '" + source.id() + "' is a " + source.getClass().getSimpleName()
                + ", not a magnet or source coil");
    }

    /** Bottom face z: below the plane the far face, above it the near one. */
    private static double zLow(Source.Side side, double standoffM, double heightM) {
        return side == Source.Side.BELOW ? -(standoffM + heightM) : standoffM;
    }

    private static double zHigh(Source.Side side, double standoffM, double heightM) {
        return side == Source.Side.BELOW ? -standoffM : standoffM + heightM;
    }

    private static double signed(double remanenceT, Source.Magnetization magnetization) {
        return magnetization == Source.Magnetization.PLUS_Z ? remanenceT : -remanenceT;
    }
}

package org.kinduct.solver.baseline.field;

import java.util.List;

import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/** Places the physical sources of a scene (magnets and source coils) as plane fields. */
public final class PhysicalSources {

    private PhysicalSources() {
    }

    /**
     * The field of a block magnet whose body is at {@code pose}: its drawn centre goes through
     * {@link Pose#place}, its angle adds the pose's angle, its z range follows from its stand-off
     * and side, its remanence is signed by its magnetization.
     */
    public static PlaneField block(Source.BlockMagnet m, Pose pose) {
        Vec2 c = pose.place(m.center());
        return new BlockMagnetField(c.x(), c.y(), m.angleRad() + pose.angleRad(), m.sizeXM(), m.sizeYM(),
                zLow(m.side(), m.standoffM(), m.heightM()), zHigh(m.side(), m.standoffM(), m.heightM()),
                signed(m.remanenceT(), m.magnetization()));
    }

    /** The field of a cylinder magnet whose body is at {@code pose}, placed as {@link #block}. */
    public static PlaneField cylinder(Source.CylinderMagnet m, Pose pose) {
        Vec2 c = pose.place(m.center());
        return new CylinderMagnetField(c.x(), c.y(), m.radiusM(),
                zLow(m.side(), m.standoffM(), m.heightM()), zHigh(m.side(), m.standoffM(), m.heightM()),
                signed(m.remanenceT(), m.magnetization()));
    }

    /** The field of a source coil whose body is at {@code pose}, carrying turns × drive current at {@code tS}. */
    public static PlaneField coil(Source.SourceCoil coil, Pose pose, double tS) {
        double ampereTurns = coil.turns() * coil.drive().currentAt(tS);
        return coil.shape().match(new Source.CoilShape.Cases<>() {
            @Override
            public PlaneField polygon(Source.CoilShape.Polygon polygon) {
                List<Vec2> vertices = polygon.vertices();
                double[] xs = new double[vertices.size()];
                double[] ys = new double[vertices.size()];
                for (int i = 0; i < xs.length; i++) {
                    Vec2 p = pose.place(vertices.get(i));
                    xs[i] = p.x();
                    ys[i] = p.y();
                }
                return new PolygonCoilField(xs, ys, coil.planeZM(), ampereTurns);
            }

            @Override
            public PlaneField circle(Source.CoilShape.Circle circle) {
                Vec2 c = pose.place(circle.center());
                return new CircleCoilField(c.x(), c.y(), circle.radiusM(), coil.planeZM(), ampereTurns);
            }
        });
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

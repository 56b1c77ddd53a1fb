package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.junit.jupiter.api.Named;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Body;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Source;
import org.kinduct.scene.Source.CoilShape;
import org.kinduct.scene.Source.Drive;
import org.kinduct.scene.Source.Magnetization;
import org.kinduct.scene.Source.Side;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.SourceFields;

class PhysicalSourcesTest {

    private static final long SEED = 0x5EED_0800L;
    private static final double ULP_LEVEL = 1e-12;
    private static final Drive AC = new Drive(0.5, 2.0, 50, 0.3);

    static Stream<Named<Source>> sources() {
        return Stream.of(
                Named.of("block magnet below", new Source.BlockMagnet("m1", Body.FIXED, Vec2.of(0.01, -0.004),
                        0.02, 0.01, 0.005, 0.3, 0.002, Side.BELOW, 1.2, Magnetization.PLUS_Z)),
                Named.of("cylinder magnet above, -z", new Source.CylinderMagnet("m2", Body.FIXED, Vec2.of(-0.003, 0.006),
                        0.007, 0.004, 0.003, Side.ABOVE, 1.1, Magnetization.MINUS_Z)),
                Named.of("polygon coil", new Source.SourceCoil("c1", Body.FIXED, new CoilShape.Polygon(List.of(
                        Vec2.of(0, 0), Vec2.of(0.02, 0.002), Vec2.of(0.015, 0.018), Vec2.of(-0.004, 0.012))),
                        30, -0.003, AC)),
                Named.of("circle coil", new Source.SourceCoil("c2", Body.FIXED,
                        new CoilShape.Circle(Vec2.of(0.004, 0.001), 0.011), 20, 0.004, AC)));
    }

    @ParameterizedTest
    @MethodSource("sources")
    void posedFieldIsTheDrawnFieldSeenFromTheMovedFrame(Source source) {
        long seed = SEED;
        SplittableRandom r = new SplittableRandom(seed);
        Vec2 pivot = Vec2.of(0.005, -0.002);
        double t = 0.0123;
        for (int c = 0; c < 10; c++) {
            Pose pose = new Pose(pivot, Vec2.of(r.nextDouble(-0.05, 0.05), r.nextDouble(-0.05, 0.05)),
                    r.nextDouble(-Math.PI, Math.PI), Vec2.ZERO, 0);
            PlaneField posed = SourceFields.place(source, pose, t);
            PlaneField drawn = SourceFields.place(source, Pose.rest(pivot), t);
            Vec2 p = Vec2.of(r.nextDouble(-0.08, 0.08), r.nextDouble(-0.08, 0.08));
            // A rigid motion carries the field along: B_z(p) = B_z_drawn(g⁻¹p) and A(p) = R·A_drawn(g⁻¹p),
            // with g⁻¹p = pivot + R(−θ)(p − pivot − offset).
            Vec2 back = pivot.plus(p.minus(pivot).minus(pose.offset()).rotate(-pose.angleRad()));
            double bz = drawn.bz(back.x(), back.y());
            assertEquals(bz, posed.bz(p.x(), p.y()), ULP_LEVEL * Math.abs(bz) + 1e-18, "seed " + seed + " case " + c);
            double[] aDrawn = new double[2];
            double[] aPosed = new double[2];
            drawn.potential(back.x(), back.y(), aDrawn);
            posed.potential(p.x(), p.y(), aPosed);
            Vec2 turned = Vec2.of(aDrawn[0], aDrawn[1]).rotate(pose.angleRad());
            double scale = Math.hypot(aDrawn[0], aDrawn[1]);
            assertEquals(turned.x(), aPosed[0], ULP_LEVEL * scale, "seed " + seed + " case " + c);
            assertEquals(turned.y(), aPosed[1], ULP_LEVEL * scale, "seed " + seed + " case " + c);
        }
    }

    @Test
    void blockMagnetStandoffAndSideGiveThePublishedOnAxisField() {
        double a = 0.02;
        double b = 0.01;
        double thickness = 0.005;
        double s = 0.002;
        // On-axis check form of the charge model (Camacho & Sosa, Rev. Mex. Fís. E 59, 2013):
        // B_z = (Br/π)[atan(ab/(2s√(4s²+a²+b²))) − atan(ab/(2(s+L)√(4(s+L)²+a²+b²)))].
        double far = s + thickness;
        double expected = 1.2 / Math.PI * (Math.atan(a * b / (2 * s * Math.sqrt(4 * s * s + a * a + b * b)))
                - Math.atan(a * b / (2 * far * Math.sqrt(4 * far * far + a * a + b * b))));
        for (Side side : Side.values()) {
            for (Magnetization m : Magnetization.values()) {
                Source.BlockMagnet magnet = new Source.BlockMagnet("m", Body.FIXED, Vec2.of(0.01, 0.02), a, b,
                        thickness, 0.7, s, side, 1.2, m);
                double sign = m == Magnetization.PLUS_Z ? 1 : -1;
                double actual = SourceFields.place(magnet, Pose.rest(Vec2.ZERO), 0).bz(0.01, 0.02);
                assertEquals(sign * expected, actual, ULP_LEVEL * expected, side + " " + m);
            }
        }
    }

    @Test
    void cylinderMagnetStandoffAndSideGiveThePublishedOnAxisField() {
        double radius = 0.006;
        double length = 0.01;
        double s = 0.003;
        // On the axis (Camacho & Sosa 2013): B_z = (Br/2)[(L + s)/√(R² + (L + s)²) − s/√(R² + s²)].
        double expected = 1.1 / 2 * ((length + s) / Math.hypot(radius, length + s) - s / Math.hypot(radius, s));
        for (Side side : Side.values()) {
            Source.CylinderMagnet magnet = new Source.CylinderMagnet("m", Body.FIXED, Vec2.of(-0.01, 0.0), radius,
                    length, s, side, 1.1, Magnetization.PLUS_Z);
            double actual = SourceFields.place(magnet, Pose.rest(Vec2.ZERO), 0).bz(-0.01, 0);
            assertEquals(expected, actual, ULP_LEVEL * expected, side.toString());
        }
    }

    @Test
    void coilCarriesTurnsTimesDriveCurrentAtTheGivenTime() {
        double radius = 0.011;
        double z = 0.004;
        int turns = 20;
        double t = 0.0123;
        Source.SourceCoil coil = new Source.SourceCoil("c", Body.FIXED, new CoilShape.Circle(Vec2.ZERO, radius),
                turns, z, AC);
        // Centre-axis field of N turns: μ0 N I a²/(2(a² + z²)^{3/2}) (Griffiths ch. 5), I = i(t).
        double current = 0.5 + 2.0 * Math.sin(2 * Math.PI * 50 * t + 0.3);
        double expected = PhysicalConstants.MU_0 * turns * current * radius * radius
                / (2 * Math.pow(radius * radius + z * z, 1.5));
        double actual = SourceFields.place(coil, Pose.rest(Vec2.ZERO), t).bz(0, 0);
        assertEquals(expected, actual, ULP_LEVEL * Math.abs(expected));
    }
}

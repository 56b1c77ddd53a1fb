package org.kinduct.solver.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * A cylinder magnet's interpolated jet ({@link RadialTable}) against its closed forms, which are
 * checked against the published on-axis field and a numerical stack of loops in
 * {@code CylinderMagnetFieldTest}: seeded random distances from 1e-4 of the radius to the table's
 * reach, log-spread, for magnets close to the plane and far from it, above and below it.
 */
class RadialTableTest {

    private static final long SEED = 0x7AB1_E5L;
    private static final int CASES = 20_000;
    /**
     * Measured worst departures: A_φ 2.3e-12 of itself and B_z 3.2e-13 of the field's size
     * (|B_z| + |A_φ/ρ|), both for magnets whose stand-off exceeds their radius, where the two faces'
     * terms cancel and the closed forms' rounding at the interpolation points is what remains; 1e-13
     * and below for magnets near the plane.
     */
    private static final double A_LEVEL = 5e-12;
    private static final double BZ_LEVEL = 1e-12;

    @ParameterizedTest
    @CsvSource({"0.008, -0.007, -0.002", "0.008, 0.003, 0.010", "0.005, -0.0205, -0.0005", "0.010, -0.050, -0.030",
        "0.002, 0.00001, 0.004"})
    void theJetFollowsTheClosedFormsOutToTheTablesReach(double radius, double zLow, double zHigh) {
        CylinderMagnetField exact = new CylinderMagnetField(0, 0, radius, zLow, zHigh, 1.2, false);
        CylinderMagnetField tabulated = new CylinderMagnetField(0, 0, radius, zLow, zHigh, 1.2);
        double reach = RadialTable.REACH_SIZES * (radius + Math.max(Math.abs(zLow), Math.abs(zHigh)));
        SplittableRandom r = new SplittableRandom(SEED);
        double[] both = new double[2];
        double[] jet = new double[GradientField.JET_SIZE];
        for (int c = 0; c < CASES; c++) {
            double rho = radius * Math.exp(r.nextDouble(Math.log(1e-4), Math.log(0.999 * reach / radius)));
            double angle = r.nextDouble(0, 2 * Math.PI);
            exact.exactBoth(rho, both);
            tabulated.jet(rho * Math.cos(angle), rho * Math.sin(angle), jet);
            double aPhi = -Math.sin(angle) * jet[0] + Math.cos(angle) * jet[1];
            String where = "seed " + SEED + " case " + c + " at rho/a " + rho / radius;
            assertEquals(both[0], aPhi, A_LEVEL * Math.abs(both[0]), "A_phi " + where);
            assertEquals(both[1], jet[6], BZ_LEVEL * (Math.abs(both[1]) + Math.abs(both[0] / rho)), "B_z " + where);
        }
    }

    @ParameterizedTest
    @CsvSource({"0.008, -0.005, 0", "0.008, 0, 0.004"})
    void aFaceInThePlaneHasNoTable(double radius, double zLow, double zHigh) {
        assertNull(RadialTable.of(radius, zLow, zHigh));
    }
}

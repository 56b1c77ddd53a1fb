package org.kinduct.solver.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * A field switched on suddenly over a still thin sheet: the sheet's response is the field of an
 * image receding at the speed w = 2/(μ0σd) (Maxwell, "On the induction of electric currents in an
 * infinite plane sheet of uniform conductivity", Proc. R. Soc. Lond. 20, 160–168, 1872).
 *
 * <p>Derivation (infinite sheet, f̂(k) = ∫ f e^{−ik·r} d²r): per mode, Faraday's and Ohm's laws give
 * −∂B̂_z/∂t = k²ψ̂/(σd) = w|k|·β̂ with β̂ = (μ0/2)|k|ψ̂ the sheet's field in its plane and
 * B̂_z = B̂_s + β̂. A source switched on at t = 0 is shielded at once, β̂(0⁺) = −B̂_s, and then
 * β̂ = −B̂_s·e^{−w|k|t}. A source at height h has B̂_s(k, z) = C(k)·e^{−|k|(h − z)} below it, so
 * β̂ = −C·e^{−|k|(h + w·t)}: in the sheet's plane its field is minus the source's own field taken
 * a distance w·t below the plane, B_plate(x, y, t) = −B_z,source(x, y, z = −w·t); below the sheet
 * the same holds at every depth, as if the source had moved up by w·t.
 *
 * <p>The solver: a square plate of side 16h under a dipole at height h, cells h/8, backward Euler.
 */
class MaxwellImageTest {

    private static final double MOMENT_AM2 = 1;
    private static final double HEIGHT_M = 0.005;
    private static final SheetConductor PLATE = SheetConductor.plate(3.5e7, 0.001);

    /** The plate's field at the nodes within 3h of the axis at time h/w, after {@code steps} steps. */
    private static double[] fieldAtOneImageHeight(Plate plate, int steps) {
        double w = plate.characteristicSpeedMPerS();
        PlateTransient run = plate.transientRun(
                PlateSource.scaled(SheetFixtures.dipole(MOMENT_AM2, 0, 0, HEIGHT_M), t -> t > 0 ? 1 : 0), 0, 1);
        double dt = HEIGHT_M / w / steps;
        PlateSolution s = null;
        for (int k = 0; k < steps; k++) {
            s = run.step(dt);
        }
        assertEquals(HEIGHT_M / w, run.timeS(), 1e-12 * HEIGHT_M / w);
        return near(plate, s::plateFieldT);
    }

    private interface NodeField {
        double at(int i, int j);
    }

    private static double[] near(Plate plate, NodeField field) {
        SheetGrid g = plate.grid();
        double h = g.cellM();
        double[] out = new double[(g.nx() + 1) * (g.ny() + 1)];
        for (int j = 0; j <= g.ny(); j++) {
            for (int i = 0; i <= g.nx(); i++) {
                double x = g.originXM() + i * h;
                double y = g.originYM() + j * h;
                out[i + (g.nx() + 1) * j] = x * x + y * y < 9 * HEIGHT_M * HEIGHT_M ? field.at(i, j) : Double.NaN;
            }
        }
        return out;
    }

    /** Largest deviation from the receding image, over the image field's peak. */
    private static double error(double[] field, double[] image) {
        double worst = 0;
        double peak = 0;
        for (int n = 0; n < field.length; n++) {
            if (!Double.isNaN(image[n])) {
                worst = Math.max(worst, Math.abs(field[n] - image[n]));
                peak = Math.max(peak, Math.abs(image[n]));
            }
        }
        return worst / peak;
    }

    @Test
    void theInducedFieldIsAnImageRecedingAtTheCharacteristicSpeed() {
        SheetGrid grid = SheetGrid.withCellSize(SheetShape.of(SheetFixtures.square(8 * HEIGHT_M, 0)), HEIGHT_M / 8);
        Plate plate = PlateSolver.standard().prepare(grid, PLATE);
        double h = grid.cellM();
        // At t = h/w the image is at depth h + w·t = 2h: B_plate = −B_dipole(x, y, −h).
        double[] image = near(plate, (i, j) -> -PlateFixtures.dipoleBz(MOMENT_AM2, HEIGHT_M,
                grid.originXM() + i * h, grid.originYM() + j * h, -HEIGHT_M));
        int[] steps = {16, 32, 64};
        double[][] fields = new double[steps.length][];
        double[] errors = new double[steps.length];
        System.out.println("receding image at w·t = h, within 3h of the axis:  steps   max error / peak");
        for (int k = 0; k < steps.length; k++) {
            fields[k] = fieldAtOneImageHeight(plate, steps[k]);
            errors[k] = error(fields[k], image);
            System.out.printf("                                                   %3d     %.3e%n", steps[k], errors[k]);
        }
        // Backward Euler is first order: the error halves with the step (measured ratios 1.8, 1.9).
        for (int k = 1; k < steps.length; k++) {
            double ratio = errors[k - 1] / errors[k];
            assertTrue(ratio > 1.6 && ratio < 2.2, "error ratio " + ratio);
        }
        // Richardson's extrapolation of the two finest runs removes the first-order term; what is
        // left is the grid's error, the finite plate's and the second-order remainder.
        double[] extrapolated = new double[image.length];
        for (int n = 0; n < image.length; n++) {
            extrapolated[n] = 2 * fields[2][n] - fields[1][n];
        }
        double remaining = error(extrapolated, image);
        System.out.printf("extrapolated to zero step: %.3e%n", remaining);
        assertTrue(remaining < 0.01, "extrapolated error " + remaining);
        assertTrue(errors[2] < 0.04, "64 steps: " + errors[2]);
    }
}

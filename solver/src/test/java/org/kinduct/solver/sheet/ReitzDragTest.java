package org.kinduct.solver.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.PhysicalConstants;

/**
 * Drag and lift of a small vertical dipole m at height h over a thin sheet moving at v, against
 * Reitz (J. Appl. Phys. 41, 2067, 1970; formulas recalled, not read from the paper, so derived
 * here and checked by quadrature): with w = 2/(μ0·σ·d) and F_image = 3μ0m²/(32π·h⁴),
 * F_L = F_image·(1 − w/√(v² + w²)), F_D = (w/v)·F_L.
 *
 * <p>Derivation, infinite sheet moving at v along x under the dipole (the sources' frame), with
 * f̂(k) = ∫ f e^{−ik·r} d²r. The dipole's field in the plane is B̂_s = (μ0m/2)|k|e^{−|k|h} (its
 * flux through the whole plane is 0 and its axial value μ0m/(2πh³) is recovered by the inverse
 * transform). Faraday's and Ohm's laws for the stream function (see {@link Plate}):
 * ∇²ψ/(σd) = v·∂_x(B_s + B_p), B̂_p = (μ0/2)|k|ψ̂, so
 * −k²ψ̂·μ0w/2 = ik_x·v·(B̂_s + (μ0/2)|k|ψ̂) and the sheet's field at z = 0 is
 * B̂_p = −ik_x·v·B̂_s/(w|k| + ik_x·v), above it B̂_p·e^{−|k|z}. The force on the dipole is
 * m∇B_p,z at (0, 0, h): with k_x = k·cos θ,
 * F_x = (μ0m²/2)·(2π)⁻²∫₀^∞ k³e^{−2kh} dk ∫₀^{2π} v·w·cos²θ/(w² + v²cos²θ) dθ and
 * F_z = (μ0m²/2)·(2π)⁻²∫₀^∞ k³e^{−2kh} dk ∫₀^{2π} v²cos²θ/(w² + v²cos²θ) dθ; with
 * ∫k³e^{−2kh} = 3/(8h⁴) and ∫₀^{2π} dθ/(w² + v²cos²θ) = 2π/(w√(w² + v²)) these are Reitz's F_D
 * (the dipole dragged along with the sheet, the sheet braked) and F_L (repulsive). Both are
 * evaluated here by Hipparchus quadrature, independently of the closed forms.
 *
 * <p>The solver sees a square plate of side 16h under the dipole (the finite plate loses about 1e-3
 * of the drag at low speed, measured in {@link DipoleDragTest} for a disc); lift from ψ's filament
 * currents in the dipole's in-plane field ({@link PlateFixtures#verticalForceOnPlateN}).
 */
class ReitzDragTest {

    private static final double MOMENT_AM2 = 1;
    private static final double HEIGHT_M = 0.005;
    private static final double SIGMA_S_PER_M = 3.5e7;
    private static final double THICKNESS_M = 0.001;
    private static final double MU0 = PhysicalConstants.MU_0;
    private static final double W = 2 / (MU0 * SIGMA_S_PER_M * THICKNESS_M);
    private static final double F_IMAGE = 3 * MU0 * MOMENT_AM2 * MOMENT_AM2 / (32 * Math.PI * Math.pow(HEIGHT_M, 4));
    /** The brief's bar for the curve: 1 %. Measured at h/8: at most 0.68 % (drag), 0.6 % (lift). */
    private static final double CURVE_TOLERANCE = 0.01;

    private static double reitzLift(double v) {
        return F_IMAGE * (1 - W / Math.hypot(v, W));
    }

    private static double reitzDrag(double v) {
        return W / v * reitzLift(v);
    }

    private static Plate plate(int cellsPerHeight, double halfSideHeights) {
        SheetShape square = SheetShape.of(SheetFixtures.square(halfSideHeights * HEIGHT_M, 0));
        SheetGrid grid = SheetGrid.withCellSize(square, HEIGHT_M / cellsPerHeight);
        return PlateSolver.standard().prepare(grid, SheetConductor.plate(SIGMA_S_PER_M, THICKNESS_M));
    }

    private static SheetDrive drive(double v) {
        return SheetDrive.rigid(SheetFixtures.dipole(MOMENT_AM2, 0, 0, HEIGHT_M), new Vec2(v, 0), 0, Vec2.ZERO);
    }

    @Test
    void reitzsClosedFormsAreTheirFourierIntegrals() {
        IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(16, 1e-14, 1e-300);
        // ∫₀^∞ k³ e^{−2kh} dk with k = t/(1 − t).
        double radial = integrator.integrate(1_000_000, t -> {
            double k = t / (1 - t);
            return k * k * k * Math.exp(-2 * k * HEIGHT_M) / ((1 - t) * (1 - t));
        }, 0, 1);
        assertEquals(3 / (8 * Math.pow(HEIGHT_M, 4)), radial, 1e-10 * radial, "radial integral");
        for (double ratio : new double[] {0.01, 0.3, 1, 10, 100}) {
            double v = ratio * W;
            double drag = integrator.integrate(1_000_000, t -> {
                double c = Math.cos(t);
                return v * W * c * c / (W * W + v * v * c * c);
            }, 0, 2 * Math.PI);
            double lift = integrator.integrate(1_000_000, t -> {
                double c = Math.cos(t);
                return v * v * c * c / (W * W + v * v * c * c);
            }, 0, 2 * Math.PI);
            double scale = MU0 * MOMENT_AM2 * MOMENT_AM2 / 2 / (4 * Math.PI * Math.PI) * radial;
            assertEquals(reitzDrag(v), scale * drag, 1e-9 * reitzDrag(v), "drag at v/w = " + ratio);
            assertEquals(reitzLift(v), scale * lift, 1e-9 * reitzLift(v), "lift at v/w = " + ratio);
        }
    }

    @Test
    void dragAndLiftFollowReitzFromSlowToFastAndTheDragPeaksWhereHeSays() {
        Plate plate = plate(8, 8);
        double[] ratios = {0.01, 0.1, 0.3, 0.6, 0.9, 1.27, 1.8, 3, 10, 30, 100};
        double[] speeds = new double[ratios.length];
        for (int k = 0; k < ratios.length; k++) {
            speeds[k] = ratios[k] * W;
        }
        List<PlateSolution> solutions = plate.steadySweep(speeds, ReitzDragTest::drive, Vec2.ZERO);
        System.out.println("Reitz curve, square plate 16h, cells h/8:   v/w     F_D/Reitz   F_L/Reitz   P_J/P_mech − 1   iterations");
        double[] drag = new double[ratios.length];
        for (int k = 0; k < ratios.length; k++) {
            PlateSolution s = solutions.get(k);
            assertSame(EddyModel.SELF_FIELD, s.model());
            double v = speeds[k];
            drag[k] = -s.forceN().x();
            double lift = -PlateFixtures.verticalForceOnPlateN(s, MOMENT_AM2, HEIGHT_M);
            double mechanical = -s.forceN().x() * v;
            System.out.printf("                                          %7.2f   %.5f     %.5f     %+.1e         %d%n",
                    ratios[k], drag[k] / reitzDrag(v), lift / reitzLift(v), s.joulePowerW() / mechanical - 1,
                    s.iterations());
            assertEquals(1, drag[k] / reitzDrag(v), CURVE_TOLERANCE, "drag at v/w = " + ratios[k]);
            assertEquals(1, lift / reitzLift(v), CURVE_TOLERANCE, "lift at v/w = " + ratios[k]);
            // Steady state: Joule power is the power the motion delivers, at every speed.
            assertEquals(mechanical, s.joulePowerW(), 1e-6 * mechanical, "power balance at v/w = " + ratios[k]);
            assertEquals(0, s.forceN().y(), 1e-7 * F_IMAGE, "no side force on the axis of symmetry");
        }
        // The peak: a parabola in log v through the largest drag and its neighbours.
        int top = 0;
        for (int k = 1; k < drag.length; k++) {
            if (drag[k] > drag[top]) {
                top = k;
            }
        }
        double x0 = Math.log(ratios[top - 1]);
        double x1 = Math.log(ratios[top]);
        double x2 = Math.log(ratios[top + 1]);
        double y0 = drag[top - 1];
        double y1 = drag[top];
        double y2 = drag[top + 1];
        double peak = Math.exp(x1 - 0.5 * ((x1 - x0) * (x1 - x0) * (y1 - y2) - (x1 - x2) * (x1 - x2) * (y1 - y0))
                / ((x1 - x0) * (y1 - y2) - (x1 - x2) * (y1 - y0)));
        // Reitz: (w/v)(1 − w/√(v² + w²)) is largest at v/w = 1.272 (0.3003·F_image), found numerically.
        System.out.printf("drag peak at v/w = %.3f (Reitz 1.272), %.4f F_image (Reitz 0.3003)%n", peak,
                drag[top] / F_IMAGE);
        assertEquals(1.272, peak, 0.05 * 1.272, "peak speed");
    }

    @Test
    void lowSpeedLimitIsTheResistiveSolve() {
        Plate plate = plate(4, 8);
        double v = 1e-3 * W;
        PlateSolution self = plate.steady(drive(v), Vec2.ZERO, EddyModel.SELF_FIELD, null);
        assertSame(EddyModel.RESISTIVE_LIMIT, plate.steady(drive(0.9e-3 * W), Vec2.ZERO).model(),
                "below v/w = 1e-3 the resistive limit is chosen");
        assertSame(EddyModel.SELF_FIELD, plate.steady(drive(1.1e-3 * W), Vec2.ZERO).model(),
                "above it the own field is kept");
        PlateSolution limit = plate.steady(drive(v), Vec2.ZERO, EddyModel.RESISTIVE_LIMIT, null);
        SheetSolution sheet = SheetSolver.multigrid().solve(plate.grid(),
                SheetConductor.plate(SIGMA_S_PER_M, THICKNESS_M), drive(v), Vec2.ZERO, List.of());
        // The resistive-limit model is SheetSolver's solve, drag and all.
        assertEquals(sheet.forceN().x(), limit.forceN().x(), 1e-9 * Math.abs(sheet.forceN().x()));
        // Reitz's factor between the two at v/w = 1e-3: 2(w/v)²(1 − 1/√(1 + (v/w)²)) = 1 − 7.5e-7.
        double factor = 2e6 * (1 - 1 / Math.sqrt(1 + 1e-6));
        double ratio = self.forceN().x() / limit.forceN().x();
        System.out.printf("v/w = 1e-3: self-field drag / resistive drag = %.9f (Reitz %.9f)%n", ratio, factor);
        assertEquals(factor, ratio, 1e-6);
        // The stream-function model's peak |J| in the resistive limit is the cell solve's, cut cells
        // included (with its own field J changes at first order in v/w, the eddies' lag: 2.5e-4 here).
        assertEquals(sheet.peakCurrentDensityAPerM2(), limit.peakCurrentDensityAPerM2(),
                1e-7 * sheet.peakCurrentDensityAPerM2(), "peak |J|");
        // And both approach F_image·v/(2w) = 3μ0²m²σdv/(128πh⁴), less the finite plate's share.
        double limitDrag = 3 * MU0 * MU0 * MOMENT_AM2 * MOMENT_AM2 * SIGMA_S_PER_M * THICKNESS_M * v
                / (128 * Math.PI * Math.pow(HEIGHT_M, 4));
        assertEquals(F_IMAGE * v / (2 * W), limitDrag, 1e-12 * limitDrag, "the two forms of the limit");
        assertEquals(1, -limit.forceN().x() / limitDrag, 2e-3, "low-speed drag against Reitz's limit");
    }

    /**
     * Where the current crowds along a slanted edge (a dipole over the rim of a disc), the peak |J|
     * is in a cut cell: the stream-function model in the resistive limit gives the cell solve's.
     */
    @Test
    void peakCurrentDensityAtACutEdgeIsTheCellSolves() {
        SheetShape disc = SheetShape.of(SheetShape.regularPolygon(Vec2.ZERO, 4 * HEIGHT_M, 37));
        SheetGrid grid = SheetGrid.withCellSize(disc, HEIGHT_M / 4);
        Plate plate = PlateSolver.standard().prepare(grid, SheetConductor.plate(SIGMA_S_PER_M, THICKNESS_M));
        SheetDrive rim = SheetDrive.rigid(SheetFixtures.dipole(MOMENT_AM2, 3.8 * HEIGHT_M, 0.5 * HEIGHT_M, 0.3 * HEIGHT_M),
                new Vec2(0.1, 0.05), 0, Vec2.ZERO);
        SheetSolution sheet = SheetSolver.multigrid().solve(grid, SheetConductor.plate(SIGMA_S_PER_M, THICKNESS_M),
                rim, Vec2.ZERO, List.of());
        PlateSolution limit = plate.steady(rim, Vec2.ZERO, EddyModel.RESISTIVE_LIMIT, null);
        double peak = 0;
        boolean cut = false;
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                double jxy = Math.hypot(sheet.currentDensityXAPerM2(i, j), sheet.currentDensityYAPerM2(i, j));
                if (grid.active(i, j) && jxy > peak) {
                    peak = jxy;
                    cut = grid.apertureX(i, j) < 1 || grid.apertureX(i + 1, j) < 1 || grid.apertureY(i, j) < 1
                            || grid.apertureY(i, j + 1) < 1;
                }
            }
        }
        assertTrue(cut, "the peak is in a cut cell");
        assertEquals(sheet.peakCurrentDensityAPerM2(), limit.peakCurrentDensityAPerM2(), 1e-7 * peak, "peak |J|");
    }

    @Test
    void dragConvergesAtSecondOrderWithTheCells() {
        double v = 10 * W;
        System.out.println("grid convergence at v/w = 10, square 16h:  h/cell   F_D/Reitz − 1   F_L/Reitz − 1");
        double[] dragErrors = new double[2];
        int[] resolutions = {4, 8};
        for (int k = 0; k < resolutions.length; k++) {
            PlateSolution s = plate(resolutions[k], 8).steady(drive(v), Vec2.ZERO);
            dragErrors[k] = -s.forceN().x() / reitzDrag(v) - 1;
            double liftError = -PlateFixtures.verticalForceOnPlateN(s, MOMENT_AM2, HEIGHT_M) / reitzLift(v) - 1;
            System.out.printf("                                             %d      %+.3e      %+.3e%n", resolutions[k],
                    dragErrors[k], liftError);
        }
        // Measured: +3.25e-2 at h/4, +6.0e-3 at h/8, a ratio of 5.4 (second order, with some of the
        // finite plate's share left at h/8).
        double ratio = dragErrors[0] / dragErrors[1];
        System.out.printf("error ratio h/4 : h/8 = %.2f%n", ratio);
        assertTrue(ratio > 3.5 && ratio < 7, "error ratio " + ratio);
    }
}

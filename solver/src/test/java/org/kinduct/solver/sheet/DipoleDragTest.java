package org.kinduct.solver.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleBinaryOperator;
import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.PhysicalConstants;

/**
 * Low-speed drag of a small vertical dipole m at height h over a large thin sheet moving at v.
 *
 * <p>Reitz (J. Appl. Phys. 41, 2067, 1970) gives, for a sheet whose currents' own field is kept,
 * F_L = (3μ0m²/(32πh⁴))·(1 − w/√(v² + w²)) and F_D = (w/v)·F_L with w = 2/(μ0·σ·d). For v ≪ w,
 * 1 − w/√(v² + w²) → v²/(2w²), so F_D → 3μ0m²·v/(64πh⁴·w) = 3μ0²m²·σ·d·v/(128π·h⁴), the
 * resistive limit this solver computes.
 *
 * <p>The same from any circularly symmetric B_z on an infinite sheet moving along x: with
 * E = (0, −vB), ∇·J = 0 gives in Fourier space φ̂ = i·v·k_y·B̂/k² and Ĵ_y = −σ·v·B̂·k_x²/k², so
 * by Parseval F_x = d∫J_y·B dA = −σ·d·v∫|B̂|²·(k_x²/k²) d²k/(2π)², and the angular mean of k_x²/k²
 * is ½: F = ½·σ·d·v·∫B_z² dA. For the dipole, B_z = μ0m(2h² − ρ²)/(4π(h² + ρ²)^{5/2}) and
 * ∫B_z² dA = π(μ0m/4π)²·h⁻⁴·∫₀^∞ (2 − t)²/(1 + t)⁵ dt = π(μ0m/4π)²·(3/4)/h⁴
 * = 3μ0²m²/(64π·h⁴) (with ρ² = h²t, then s = 1 + t: ∫₁^∞ (9s⁻⁵ − 6s⁻⁴ + s⁻³) ds = 9/4 − 2 + 1/2).
 */
class DipoleDragTest {

    private static final double MOMENT_AM2 = 1.5;
    private static final double HEIGHT_M = 0.005;
    private static final double SIGMA_S_PER_M = 3.5e7;
    private static final double THICKNESS_M = 0.001;
    private static final double SPEED_M_PER_S = 0.5;
    private static final double MU0 = PhysicalConstants.MU_0;

    private static double closedFormIntegralT2M2() {
        return 3 * MU0 * MU0 * MOMENT_AM2 * MOMENT_AM2 / (64 * Math.PI * Math.pow(HEIGHT_M, 4));
    }

    @Test
    void squaredFieldIntegralMatchesTheClosedForm() {
        DoubleBinaryOperator bz = SheetFixtures.dipole(MOMENT_AM2, 0, 0, HEIGHT_M);
        // ∫ 2πρ B_z(ρ)² dρ over [0, ∞) with ρ = h·tan θ, Hipparchus' adaptive Gauss–Legendre.
        IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(8, 1e-13, 0);
        double numeric = integrator.integrate(1_000_000, theta -> {
            double rho = HEIGHT_M * Math.tan(theta);
            double b = bz.applyAsDouble(rho, 0);
            double jacobian = HEIGHT_M / (Math.cos(theta) * Math.cos(theta));
            return 2 * Math.PI * rho * b * b * jacobian;
        }, 0, Math.PI / 2);
        assertEquals(closedFormIntegralT2M2(), numeric, 1e-11 * closedFormIntegralT2M2());
    }

    private static double dragN(double plateM, int cellsPerHeight) {
        SheetShape plate = SheetShape.of(SheetShape.regularPolygon(Vec2.ZERO, plateM, 256));
        SheetGrid grid = SheetGrid.withCellSize(plate, HEIGHT_M / cellsPerHeight);
        SheetSolution solution = SheetSolver.multigrid().solve(grid, SheetConductor.plate(SIGMA_S_PER_M, THICKNESS_M),
                SheetDrive.rigid(SheetFixtures.dipole(MOMENT_AM2, 0, 0, HEIGHT_M), new Vec2(SPEED_M_PER_S, 0), 0,
                        Vec2.ZERO), Vec2.ZERO, List.of());
        return -solution.forceN().x();
    }

    @Test
    void dragApproachesReitzsLowSpeedLimitAsThePlateGrows() {
        double expected = 0.5 * SIGMA_S_PER_M * THICKNESS_M * SPEED_M_PER_S * closedFormIntegralT2M2();
        assertEquals(3 * MU0 * MU0 * MOMENT_AM2 * MOMENT_AM2 * SIGMA_S_PER_M * THICKNESS_M * SPEED_M_PER_S
                / (128 * Math.PI * Math.pow(HEIGHT_M, 4)), expected, 1e-15 * expected, "the two forms of the limit");

        System.out.println("grid (a = 10h):  h/cell   F/F_Reitz");
        double[] grid = new double[3];
        int[] resolutions = {2, 4, 8};
        for (int k = 0; k < resolutions.length; k++) {
            grid[k] = dragN(10 * HEIGHT_M, resolutions[k]) / expected;
            System.out.printf("                 %2d       %.9f%n", resolutions[k], grid[k]);
        }
        // Measured: the change from h/4 to h/8 is 3e-7. The face samples of a smooth field give
        // a lattice sum of B_z² that converges faster than any power once the cells resolve h, and
        // the x ↔ y symmetry of the grid keeps the discrete k_x²/k² mean at ½.
        assertEquals(grid[2], grid[1], 1e-6, "h/4 against h/8");

        System.out.println("plate size (h/4):  a/h   F/F_Reitz     1 − F/F_Reitz");
        double[] sizes = {5, 10, 20, 40};
        double[] deficits = new double[sizes.length];
        for (int k = 0; k < sizes.length; k++) {
            deficits[k] = 1 - dragN(sizes[k] * HEIGHT_M, 4) / expected;
            System.out.printf("                   %3.0f   %.9f   %.3e%n", sizes[k], 1 - deficits[k], deficits[k]);
        }
        for (int k = 1; k < sizes.length; k++) {
            // Measured ratios 14.5, 15.7, 16.1: the deficit falls like a⁻⁴.
            double ratio = deficits[k - 1] / deficits[k];
            assertTrue(ratio > 13 && ratio < 17, "deficit ratio " + ratio + " doubling to a/h = " + sizes[k]);
            assertTrue(deficits[k] > 0, "a finite plate drags less than an infinite one");
        }
        // a/h = 40: the a⁻⁴ tail predicts 2.3e-6 still missing, plus 3e-7 from the grid.
        assertEquals(1, 1 - deficits[3], 5e-6, "largest plate against Reitz's limit");
    }
}

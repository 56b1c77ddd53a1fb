package org.kinduct.solver.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kinduct.scene.Vec2;

/**
 * A plate wholly inside a uniform field: rigid motion makes v × B = B_z·(v_y, −v_x) the gradient of
 * B_z·(V_y·x − V_x·y + ω|r − p|²/2), so it drives no current, whatever the outline and holes
 * (standard result; for rotation, the Faraday disc without a closing circuit: Griffiths,
 * <i>Introduction to Electrodynamics</i>, 4th ed., 2013, §7.1.2, from memory). The midpoint EMFs
 * of the scheme are exact for a linear velocity, so the discrete solution is exactly a potential:
 * only the solver's residual and rounding remain.
 */
class SheetUniformFieldTest {

    private static final double BZ_T = 0.4;
    private static final double SIGMA_S_PER_M = 3.5e7;
    private static final double THICKNESS_M = 0.002;
    /** Near the rounding floor of the residual on these grids. */
    private static final double SOLVER_TOLERANCE = 1e-12;
    /**
     * Allowance for what the residual and rounding leave, relative to the scale of the currents
     * and forces a field edge would drive (σ·v·B and σ·d·v·B²·area): measured about 1e-12.
     */
    private static final double ROUNDING = 1e-10;

    @ParameterizedTest
    @CsvSource({"0.7, -0.4, 0", "0, 0, 25", "0.3, 0.9, -12"})
    void rigidMotionInAUniformFieldDrivesNoCurrent(double vx, double vy, double omega) {
        SheetShape plate = new SheetShape(SheetShape.regularPolygon(new Vec2(0.01, -0.02), 0.05, 64),
                List.of(SheetShape.regularPolygon(new Vec2(0.02, -0.01), 0.012, 5)));
        Vec2 pivot = new Vec2(-0.03, 0.015);
        SheetGrid grid = SheetGrid.withCells(plate, 96);
        SheetSolution solution = new SheetSolver(SheetSolver.Method.MULTIGRID, SOLVER_TOLERANCE, 100).solve(grid,
                SheetConductor.plate(SIGMA_S_PER_M, THICKNESS_M),
                SheetDrive.rigid((x, y) -> BZ_T, new Vec2(vx, vy), omega, pivot), pivot, List.of());
        double speed = Math.hypot(vx, vy) + Math.abs(omega) * 0.1;
        double currentScale = SIGMA_S_PER_M * speed * BZ_T;
        double forceScale = currentScale * THICKNESS_M * BZ_T * grid.areaM2();
        System.out.printf("uniform field, v = (%s, %s) m/s, ω = %s rad/s: peak J %.2e of σvB, |F| %.2e of σdvB²A,"
                + " |τ| %.2e of that times 0.1 m%n", vx, vy, omega,
                solution.peakCurrentDensityAPerM2() / currentScale, solution.forceN().length() / forceScale,
                Math.abs(solution.torqueNm()) / (forceScale * 0.1));
        assertTrue(solution.peakCurrentDensityAPerM2() <= ROUNDING * currentScale,
                "peak J " + solution.peakCurrentDensityAPerM2() + " A/m²");
        assertEquals(0, solution.forceN().length(), ROUNDING * forceScale, "drag");
        assertEquals(0, solution.torqueNm(), ROUNDING * forceScale * 0.1, "torque");
        assertEquals(0, solution.joulePowerW(), ROUNDING * ROUNDING * forceScale * speed, "Joule power");
    }
}

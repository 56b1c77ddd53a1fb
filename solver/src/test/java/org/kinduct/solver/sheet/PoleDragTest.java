package org.kinduct.solver.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Vec2;

/**
 * Drag on a plate moving under a small circular pole of uniform B_z, radius R. On an infinite plate
 * the drag is ½·σ·d·v·B²·πR²: half of what the EMF v·B would drive with nowhere for the charge to
 * go, because the current returns outside the pole (Smythe, "On eddy currents in a rotating disk",
 * AIEE Trans. 61, 1942; Wouterse, "Critical torque and speed of eddy current brake with widely
 * separated soft iron poles", IEE Proc. B 138(4), 153–158, 1991, whose correction factor tends to ½
 * for an infinite disc).
 *
 * <p>For a disc plate of radius a with the pole at its centre the finite size is exact too:
 * inside the pole E = v×B = (0, −vB) is uniform, so φ = A·r·sinθ inside and (C/r + D·r)·sinθ
 * outside; continuity at R, the jump ∂φ/∂r|out − ∂φ/∂r|in = [E·r̂] = vB·sinθ, and J_r = 0 at
 * r = a give A = −(vB/2)(1 + R²/a²), C = −vBR²/2, D = C/a², so J = −(σvB/2)(1 − R²/a²)·ŷ in
 * the pole and F = −½·σ·d·v·B²·πR²·(1 − R²/a²)·x̂ (derived here; it is Smythe's factor
 * 1 − R²a²/(a² − r0²)² at r0 = 0, see {@link SpinningDiscTest}). B_z jumps at the pole's rim, so
 * the face samples see the pole's area with a lattice error and convergence is irregular, about
 * first order: the tolerances below come from the measured tables.
 */
class PoleDragTest {

    private static final double POLE_M = 0.005;
    private static final double BZ_T = 0.5;
    private static final double SPEED_M_PER_S = 2;
    private static final double SIGMA_S_PER_M = 3.5e7;
    private static final double THICKNESS_M = 0.001;
    private static final int SIDES = 256;

    private static double infinitePlateDragN() {
        return 0.5 * SIGMA_S_PER_M * THICKNESS_M * SPEED_M_PER_S * BZ_T * BZ_T * Math.PI * POLE_M * POLE_M;
    }

    /** Drag (positive, against the motion) on a disc of radius a with cells of R/perPole. */
    private static double dragN(double discM, int cellsPerPoleRadius) {
        SheetShape disc = SheetShape.of(SheetShape.regularPolygon(Vec2.ZERO, discM, SIDES));
        SheetGrid grid = SheetGrid.withCellSize(disc, POLE_M / cellsPerPoleRadius);
        SheetSolution solution = SheetSolver.multigrid().solve(grid, SheetConductor.plate(SIGMA_S_PER_M, THICKNESS_M),
                SheetDrive.rigid(SheetFixtures.pole(BZ_T, 0, 0, POLE_M), new Vec2(SPEED_M_PER_S, 0), 0, Vec2.ZERO),
                Vec2.ZERO, List.of());
        assertEquals(0, solution.forceN().y(), 1e-9 * infinitePlateDragN(), "no side force by symmetry");
        return -solution.forceN().x();
    }

    @Test
    void dragApproachesHalfTheBlockedValueAsThePlateGrows() {
        double fInf = infinitePlateDragN();
        System.out.println("plate size (R/h = 16):  a/R   F/F∞        1 − R²/a²   difference");
        double previous = 0;
        for (double size : new double[] {2, 4, 8, 16}) {
            double ratio = dragN(size * POLE_M, 16) / fInf;
            double finite = 1 - 1 / (size * size);
            System.out.printf("                        %4.0f  %.6f    %.6f    %+.2e%n", size, ratio, finite,
                    ratio - finite);
            // The finite-disc law within the grid error at R/h = 16, which the grid table below
            // measures as −0.76 % at a/R = 4 (here −0.5 % to −0.8 % for every size).
            assertEquals(finite, ratio, 0.01, "a/R = " + size);
            assertTrue(ratio > previous, "drag grows with the plate, a/R = " + size);
            previous = ratio;
        }
        // a/R = 16: 1 − F/F∞ = 1.2 %, the finite-size 0.4 % plus the grid's 0.8 %.
        assertEquals(1, previous, 0.013, "largest plate against the infinite-plate drag");
    }

    @Test
    void dragConvergesToTheFiniteDiscLawUnderGridRefinement() {
        double size = 4;
        double expected = infinitePlateDragN() * (1 - 1 / (size * size));
        System.out.println("grid (a/R = 4):  R/h   F/(F∞(1 − R²/a²))   error");
        int[] resolutions = {4, 8, 16, 32, 64};
        double[] ratios = new double[resolutions.length];
        for (int k = 0; k < resolutions.length; k++) {
            ratios[k] = dragN(size * POLE_M, resolutions[k]) / expected;
            System.out.printf("                 %3d   %.6f            %+.2e%n", resolutions[k], ratios[k],
                    ratios[k] - 1);
            if (k > 0) {
                assertTrue(Math.abs(ratios[k] - 1) < Math.abs(ratios[k - 1] - 1),
                        "error shrinks, R/h = " + resolutions[k]);
            }
        }
        double[] cells = {1.0 / 8, 1.0 / 16, 1.0 / 32, 1.0 / 64};
        double[] errors = {ratios[1] - 1, ratios[2] - 1, ratios[3] - 1, ratios[4] - 1};
        double order = SheetFixtures.observedOrder(cells, errors);
        // First-order Richardson over the two finest grids: the limit.
        double extrapolated = 2 * ratios[4] - ratios[3];
        System.out.printf("observed order %.2f (R/h 8 to 64); first-order extrapolation %.5f%n", order, extrapolated);
        // Measured 1.3: the rim's jump of B_z makes the scheme first order there, with lattice scatter.
        assertTrue(order > 1 && order < 2, "observed order " + order);
        assertEquals(0.0026, 1 - ratios[4], 0.001, "error at R/h = 64, measured 0.26 %");
        // The extrapolation removes the first-order part; what is left (measured 7e-5) is scatter
        // of the order of the last step's change (0.25 %) times its irregularity.
        assertEquals(1, extrapolated, 1e-3, "extrapolated limit");
    }
}

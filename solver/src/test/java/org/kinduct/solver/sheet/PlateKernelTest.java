package org.kinduct.solver.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.kinduct.solver.field.PhysicalConstants;

/** The plate's self-inductance kernel and its FFT convolution. */
class PlateKernelTest {

    @Test
    void rayQuadratureHasConverged() {
        for (int[] d : new int[][] {{0, 0}, {1, 0}, {1, 1}, {2, 1}, {3, 2}, {12, 5}}) {
            double coarse = PlateKernel.near(d[0], d[1], 16);
            double fine = PlateKernel.near(d[0], d[1], 40);
            // Measured: at most 5e-16 apart; ℓ(0, 0) = 0.4625.
            assertEquals(fine, coarse, 1e-14, "offset " + d[0] + ", " + d[1]);
        }
    }

    @Test
    void farFormAgreesWithTheQuadratureWhereItTakesOver() {
        double worst = 0;
        for (int b = 0; b <= PlateKernel.NEAR; b++) {
            double near = PlateKernel.near(PlateKernel.NEAR, b, PlateKernel.ANGLE_POINTS);
            double far = PlateKernel.far(PlateKernel.NEAR, b);
            worst = Math.max(worst, Math.abs(far / near - 1));
        }
        System.out.printf("kernel: far form against quadrature at Chebyshev radius %d: %.1e relative%n",
                PlateKernel.NEAR, worst);
        // Truncation about 8/r⁶ relative (the next moment term): 3e-6 at r = 12.
        assertTrue(worst < 3e-6, "far form off by " + worst);
        // The dipole tail: ℓ → −(1 + (3/2)·⟨x²⟩·3/r²)/(4π r³) ≈ −(1 + 1.5/r²)/(4π r³), ⟨x²⟩ = 1/3.
        double dipole = -1 / (4 * Math.PI * 1e6);
        assertEquals(dipole * (1 + 1.5e-4), PlateKernel.value(100, 0), 1e-7 * Math.abs(dipole));
    }

    @Test
    void latticeSumIsZeroAsAPlanarCurrentSendsNoNetFluxThroughItsPlane() {
        int radius = 1500;
        double sum = 0;
        for (int i = -radius; i <= radius; i++) {
            for (int j = -radius; j <= radius; j++) {
                sum += PlateKernel.value(i, j);
            }
        }
        // Beyond the square the tail is −(1/4π)∬ r⁻³ dA = −(1/4π)·4√2/R over the square's outside
        // (∫₀^{2π} max(|cos θ|, |sin θ|) dθ = 4√2), with R the half-side reached by the cells.
        double tail = -4 * Math.sqrt(2) / (4 * Math.PI * (radius + 0.5));
        System.out.printf("kernel: lattice sum %.3e against ℓ(0) = %.4f%n", sum + tail, PlateKernel.value(0, 0));
        assertEquals(0, sum + tail, 1e-7 * PlateKernel.value(0, 0));
    }

    @Test
    void fftConvolutionIsTheLinearOneWhateverThePadding() {
        int nx = 13;
        int ny = 9;
        double h = 2e-3;
        SplittableRandom random = new SplittableRandom(7);
        double[] psi = new double[(nx + 1) * (ny + 1)];
        for (int j = 1; j < ny; j++) {
            for (int i = 1; i < nx; i++) {
                psi[i + (nx + 1) * j] = random.nextDouble(-1, 1);
            }
        }
        double[] minimal = new double[psi.length];
        double[] wide = new double[psi.length];
        new PlateFieldOperator(nx, ny, h, 2).apply(psi, minimal);
        new PlateFieldOperator(nx, ny, h, 5).apply(psi, wide);
        double worst = 0;
        double widest = 0;
        double scale = 0;
        for (int j = 0; j <= ny; j++) {
            for (int i = 0; i <= nx; i++) {
                double direct = 0;
                for (int q = 1; q < ny; q++) {
                    for (int p = 1; p < nx; p++) {
                        direct += PhysicalConstants.MU_0 * h * PlateFieldOperator.sharpened(i - p, j - q)
                                * psi[p + (nx + 1) * q];
                    }
                }
                int n = i + (nx + 1) * j;
                worst = Math.max(worst, Math.abs(minimal[n] - direct));
                widest = Math.max(widest, Math.abs(wide[n] - minimal[n]));
                scale = Math.max(scale, Math.abs(direct));
            }
        }
        System.out.printf("FFT convolution: against the direct sum %.1e, padding 2 against 5 %.1e (relative)%n",
                worst / scale, widest / scale);
        assertEquals(0, worst, 1e-13 * scale);
        assertEquals(0, widest, 1e-13 * scale);
    }

    @Test
    void aUniformStreamFunctionIsASquareLoopWithItsCentreField() {
        System.out.println("square loop (ψ = 1 A inside): cells   B_centre / (2√2 μ0 I/(π a))");
        double previous = Double.NaN;
        for (int n : new int[] {16, 32, 64}) {
            double h = 1e-3;
            double[] psi = new double[(n + 1) * (n + 1)];
            for (int j = 1; j < n; j++) {
                for (int i = 1; i < n; i++) {
                    psi[i + (n + 1) * j] = 1;
                }
            }
            double[] flux = new double[psi.length];
            new PlateFieldOperator(n, n, h, 2).apply(psi, flux);
            double centre = flux[n / 2 + (n + 1) * (n / 2)] / (h * h);
            // The hats ramp ψ from 1 to 0 over the outer cells: the current runs half a cell in.
            double side = (n - 1) * h;
            // Centre of a square loop of side a: four segments, each μ0I/(4π(a/2))·2 sin 45°
            // (Griffiths, Introduction to Electrodynamics, 4th ed., 2013, §5.2.2).
            double expected = 2 * Math.sqrt(2) * PhysicalConstants.MU_0 / (Math.PI * side);
            double error = centre / expected - 1;
            System.out.printf("                                     %3d     1 %+.2e%n", n, error);
            assertTrue(centre > 0, "a counter-clockwise current's field points out of the screen");
            if (!Double.isNaN(previous)) {
                // The band's width h against the side: the error falls like (h/a)².
                assertTrue(Math.abs(previous / error) > 3.5, "error ratio " + previous / error);
            }
            previous = error;
        }
        assertTrue(Math.abs(previous) < 2e-3, "64 cells: " + previous);
    }

    /**
     * The circular operator (the time step's preconditioner factor) has a period of 64 nodes on a
     * 64² grid, a quarter of the exact one's area: a single mesh current at node 8 of the middle row
     * gives the exact flux at every node less than half the period away (offsets up to 31), none at
     * offset 32 (the kernel is cut there), and beyond, the wrapped image's: node 60 lies 52 to the
     * right, or 12 to the left across the period, where the even kernel gives node 20's flux.
     */
    @Test
    void theCircularOperatorMatchesTheExactOneOutToHalfItsPeriodAndWrapsBeyond() {
        int n = 64;
        double h = 1e-3;
        int nodes = n + 1;
        int row = nodes * (n / 2);
        double[] psi = new double[nodes * nodes];
        psi[8 + row] = 1;
        double[] exact = new double[psi.length];
        double[] circular = new double[psi.length];
        new PlateFieldOperator(n, n, h, 2).apply(psi, exact);
        PlateFieldOperator.circular(n, n, h).apply(psi, circular);
        double scale = Math.abs(exact[8 + row]);
        for (int d = 0; d < 32; d++) {
            assertEquals(exact[8 + d + row], circular[8 + d + row], 1e-12 * scale, "offset " + d);
        }
        assertEquals(0, circular[40 + row], 1e-12 * scale, "offset 32");
        assertEquals(exact[20 + row], circular[60 + row], 1e-12 * scale, "offset 52, wrapped to -12");
    }

    @Test
    void multiplierFollowsTheFourierConventionOfTheDerivatives() {
        int n = 10;
        PlateFieldOperator field = new PlateFieldOperator(n, n, 1e-3, 2);
        SplittableRandom random = new SplittableRandom(3);
        double[] f = new double[(n + 1) * (n + 1)];
        for (int j = 1; j < n; j++) {
            for (int i = 1; i < n; i++) {
                f[i + (n + 1) * j] = random.nextDouble(-1, 1);
            }
        }
        double[] out = new double[f.length];
        // i·sin θx multiplies e^{iθx·i}: it is the central difference (f(i + 1) − f(i − 1))/2.
        field.applyMultiplier(f, (tx, ty, l, z) -> {
            z[0] = 1;
            z[1] = Math.sin(tx) + 0.5 * Math.sin(ty);
        }, out);
        for (int j = 1; j < n; j++) {
            for (int i = 1; i < n; i++) {
                int k = i + (n + 1) * j;
                double expected = f[k] + 0.5 * (f[k + 1] - f[k - 1]) + 0.25 * (f[k + n + 1] - f[k - n - 1]);
                assertEquals(expected, out[k], 1e-13, "node " + i + ", " + j);
            }
        }
    }
}

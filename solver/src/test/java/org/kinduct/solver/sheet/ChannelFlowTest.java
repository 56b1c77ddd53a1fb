package org.kinduct.solver.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Stream;
import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Vec2;

/**
 * Electromagnetic flow measurement in a channel with insulating walls (Shercliff, <i>The Theory of
 * Electromagnetic Flow-Measurement</i>, Cambridge, 1962): a uniform field over the whole channel
 * gives U = B·w·v̄ between wall electrodes for every profile (the EMF across any line from wall to
 * wall is B times the flow through it, and with J = 0 that is the voltage); a field of finite
 * length Lb gives less, approaching B·w·v̄ as Lb grows.
 */
class ChannelFlowTest {

    private static final double WIDTH_M = 0.02;
    private static final double SPEED_M_PER_S = 0.8;
    private static final double BZ_T = 0.3;
    private static final double SIGMA_S_PER_M = 1e6;
    private static final double DEPTH_M = 0.01;
    private static final double TOLERANCE = 1e-12;
    /** What the solver tolerance leaves in a voltage that is exact for the scheme: measured 2e-14. */
    private static final double SOLVER_LEVEL = 1e-11;

    private static SheetSolution solve(ChannelFlow channel, SheetGrid grid, java.util.function.DoubleBinaryOperator bz,
                                       double stationM) {
        return new SheetSolver(SheetSolver.Method.MULTIGRID, TOLERANCE, 100).solve(grid,
                SheetConductor.liquid(SIGMA_S_PER_M, DEPTH_M, WIDTH_M), channel.drive(bz), Vec2.ZERO,
                channel.electrodes(stationM));
    }

    static Stream<Arguments> profilesAndAngles() {
        return Stream.of(ChannelFlow.Profile.values())
                .flatMap(p -> Stream.of(Arguments.of(p, 0.0), Arguments.of(p, 0.5), Arguments.of(p, 2.2)));
    }

    @ParameterizedTest
    @MethodSource("profilesAndAngles")
    void uniformFieldGivesTheIdealVoltageForEveryProfile(ChannelFlow.Profile profile, double angleRad) {
        Vec2 start = new Vec2(0.013, -0.007);
        ChannelFlow channel = new ChannelFlow(start, start.plus(Vec2.polar(0.15, angleRad)), WIDTH_M, SPEED_M_PER_S,
                profile);
        SheetGrid grid = SheetGrid.withCellSize(channel.shape(), WIDTH_M / 12);
        SheetSolution solution = solve(channel, grid, (x, y) -> BZ_T, 0.061);
        // Shercliff 1962: U = B·w·v̄ whatever the profile.
        double ideal = BZ_T * WIDTH_M * SPEED_M_PER_S;
        assertEquals(ideal, ChannelFlow.voltageV(solution), SOLVER_LEVEL * ideal, profile + " at " + angleRad + " rad");
        assertEquals(ideal, channel.idealVoltageV(BZ_T), 1e-16 * ideal);
        assertEquals(ChannelFlow.voltageV(solution) / ideal, channel.endShortingRatio(solution, BZ_T), 1e-16);
        assertTrue(solution.peakCurrentDensityAPerM2() <= SOLVER_LEVEL * SIGMA_S_PER_M * SPEED_M_PER_S * BZ_T,
                "no current: " + solution.peakCurrentDensityAPerM2() + " A/m²");
    }

    /**
     * Plug flow under a field uniform over |x| &lt; Lb/2 (all across the width) in an endless
     * channel: inside, ∇·(v × B) = 0, so φ is harmonic with ∂φ/∂y = −vB·H(x) on both walls (H the
     * patch's indicator). With φ = ∫A(k)·sinh(ky)·e^{ikx} dk and Ĥ(k) = sin(kLb/2)/(πk), the centre
     * voltage is (4vB/π)∫₀^∞ sin(kLb/2)·tanh(kw/2)/k² dk; expanding tanh(z) = Σ 2z/(z² + ((n − ½)π)²)
     * and using ∫₀^∞ sin(ak)/(k(k² + β²)) dk = π(1 − e^{−aβ})/(2β²) gives
     * U/(B·w·v̄) = 1 − (8/π²)·Σ_{n odd} e^{−nπLb/(2w)}/n² (derived here).
     */
    private static double endlessChannelRatio(double fieldLengthOverWidth) {
        double sum = 0;
        for (int n = 1; n < 201; n += 2) {
            sum += Math.exp(-n * Math.PI * fieldLengthOverWidth / 2) / (n * n);
        }
        return 1 - 8 / (Math.PI * Math.PI) * sum;
    }

    @Test
    void finiteFieldShortsTheEndsAsTheFourierSeriesSays() {
        System.out.println("plug flow, field over Lb:  Lb/w   U/Bwv̄ (w/20)  (w/40)      Richardson   series");
        double previous = 0;
        for (double lengthRatio : new double[] {0.5, 1, 2, 4}) {
            // Walls 5w beyond the field on each side: the ends' effect, ~e^{−5π}, is below 2e-7.
            double lengthM = (lengthRatio + 10) * WIDTH_M;
            ChannelFlow channel = new ChannelFlow(new Vec2(-lengthM / 2, 0), new Vec2(lengthM / 2, 0), WIDTH_M,
                    SPEED_M_PER_S, ChannelFlow.Profile.PLUG);
            double half = lengthRatio * WIDTH_M / 2;
            java.util.function.DoubleBinaryOperator field = (x, y) -> Math.abs(x) < half ? BZ_T : 0;
            double ideal = BZ_T * WIDTH_M * SPEED_M_PER_S;
            double coarse = ChannelFlow.voltageV(
                    solve(channel, SheetGrid.withCellSize(channel.shape(), WIDTH_M / 20), field, lengthM / 2)) / ideal;
            double fine = ChannelFlow.voltageV(
                    solve(channel, SheetGrid.withCellSize(channel.shape(), WIDTH_M / 40), field, lengthM / 2)) / ideal;
            double extrapolated = (4 * fine - coarse) / 3;
            double series = endlessChannelRatio(lengthRatio);
            System.out.printf("                           %4.1f   %.7f     %.7f   %.7f    %.7f%n", lengthRatio, coarse,
                    fine, extrapolated, series);
            // Second order: errors 2e-3 … 2e-5 at w/20 fall fourfold (measured 3.94 … 4.0) to w/40;
            // the patch's ends lie on grid lines and the voltage is read far from them.
            double errorRatio = (coarse - series) / (fine - series);
            assertTrue(errorRatio > 3.5 && errorRatio < 4.5, "error ratio " + errorRatio + ", Lb/w = " + lengthRatio);
            // What the extrapolation leaves, measured at most 9e-6 (Lb/w = 0.5).
            assertEquals(series, extrapolated, 2e-5, "second-order extrapolation, Lb/w = " + lengthRatio);
            assertTrue(fine < 1 && fine > previous, "below the ideal voltage and rising with Lb");
            previous = fine;
        }
    }

    @ParameterizedTest
    @EnumSource(ChannelFlow.Profile.class)
    void finiteFieldVoltageRisesToTheIdealOneForEveryProfile(ChannelFlow.Profile profile) {
        System.out.println(profile + ":  Lb/w   U/Bwv̄");
        double previous = 0;
        double[] lengths = {0.5, 1, 2, 4, 8};
        for (double lengthRatio : lengths) {
            double lengthM = (lengthRatio + 10) * WIDTH_M;
            ChannelFlow channel = new ChannelFlow(new Vec2(-lengthM / 2, 0), new Vec2(lengthM / 2, 0), WIDTH_M,
                    SPEED_M_PER_S, profile);
            double half = lengthRatio * WIDTH_M / 2;
            SheetGrid grid = SheetGrid.withCellSize(channel.shape(), WIDTH_M / 20);
            double ratio = ChannelFlow.voltageV(solve(channel, grid, (x, y) -> Math.abs(x) < half ? BZ_T : 0,
                    lengthM / 2)) / (BZ_T * WIDTH_M * SPEED_M_PER_S);
            System.out.printf("          %4.1f   %.7f%n", lengthRatio, ratio);
            assertTrue(ratio > previous && ratio < 1, "monotone rise below the ideal voltage at Lb/w = " + lengthRatio);
            previous = ratio;
        }
        // Lb = 8w: the plug flow's series leaves 2.8e-6; measured for all profiles below 1e-5.
        assertEquals(1, previous, 2e-5, "limit");
    }

    @ParameterizedTest
    @EnumSource(ChannelFlow.Profile.class)
    void velocityFieldFollowsTheProfileAndCarriesTheMeanFlow(ChannelFlow.Profile profile) {
        Vec2 start = new Vec2(0.01, 0.02);
        Vec2 along = Vec2.polar(1, 0.7);
        ChannelFlow channel = new ChannelFlow(start, start.plus(along.times(0.1)), WIDTH_M, SPEED_M_PER_S, profile);
        // Wall to wall along the left normal: flow to the right of that line is along +t̂.
        Vec2 left = along.perp().times(WIDTH_M / 2);
        Vec2 station = start.plus(along.times(0.04));
        double flow = channel.flowAcrossM2PerS(station.minus(left).x(), station.minus(left).y(), station.plus(left).x(),
                station.plus(left).y());
        assertEquals(SPEED_M_PER_S * WIDTH_M, flow, 1e-15, "flow per unit depth is v̄·w");
        // Independent: Hipparchus' Gauss–Legendre of the sampled speed across the width; the 1/7
        // law's infinite slope at the walls limits it to about 1e-6.
        double[] v = new double[2];
        double integral = new IterativeLegendreGaussIntegrator(16, 1e-9, 0).integrate(10_000_000, s -> {
            Vec2 p = station.plus(along.perp().times(s));
            channel.velocity(p.x(), p.y(), v);
            assertEquals(0, v[0] * along.y() - v[1] * along.x(), 1e-15, "velocity along the channel");
            return v[0] * along.x() + v[1] * along.y();
        }, -WIDTH_M / 2, WIDTH_M / 2);
        assertEquals(SPEED_M_PER_S * WIDTH_M, integral, 1e-6 * SPEED_M_PER_S * WIDTH_M, "mean speed v̄");
        Vec2 outside = station.plus(along.perp().times(0.6 * WIDTH_M));
        channel.velocity(outside.x(), outside.y(), v);
        assertEquals(0, Math.hypot(v[0], v[1]), 0, "no flow beyond the wall");
    }

    @Test
    void stationsOffTheChannelAreRejected() {
        ChannelFlow channel = new ChannelFlow(Vec2.ZERO, new Vec2(0.1, 0), WIDTH_M, SPEED_M_PER_S,
                ChannelFlow.Profile.PLUG);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> channel.electrodes(0.2));
        assertTrue(e.getMessage().contains("electrode station must lie along the channel"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> new ChannelFlow(Vec2.ZERO, Vec2.ZERO, WIDTH_M, SPEED_M_PER_S, ChannelFlow.Profile.PLUG));
        assertEquals(List.of("left", "right"), channel.electrodes(0.05).stream().map(Electrode::name).toList());
    }
}

package org.kinduct.solver.plate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.MeanFlow;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.SheetState;

/**
 * Liquid channels through the whole path, scene → run → result, against electromagnetic flow
 * measurement (Shercliff, <i>The Theory of Electromagnetic Flow-Measurement</i>, Cambridge, 1962):
 * with B uniform over the whole channel the wall electrodes read U = B·w·v̄ for every profile; a
 * field of finite length Lb reads less, rising towards B·w·v̄ as Lb grows.
 */
class ChannelResultsTest {

    private static final double WIDTH_M = 0.02;
    private static final double MEAN_M_PER_S = 1.5;
    private static final double BZ_T = 0.25;
    /** Tap water of 500 µS/cm. */
    private static final double SIGMA_S_PER_M = 0.05;

    /**
     * A channel along x from −L/2 to L/2, wall electrodes "left" (y = +w/2) and "right" (y = −w/2)
     * at x = 0 and the pair right − left, under a field region of length {@code fieldM} across it.
     */
    private static Scene channel(Conductor.Channel.Profile profile, double lengthM, double fieldM, double meanMPerS,
                                 OptionalDouble cellM) {
        double half = lengthM / 2;
        Conductor.Channel duct = new Conductor.Channel("duct", Body.FIXED, new Vec2(-half, 0), new Vec2(half, 0),
                WIDTH_M, 0.01, SIGMA_S_PER_M, profile, new MeanFlow.Steady(meanMPerS),
                List.of(new Conductor.Electrode("left", new Vec2(0, WIDTH_M / 2)),
                        new Conductor.Electrode("right", new Vec2(0, -WIDTH_M / 2))),
                List.of(new Conductor.ElectrodePair("right", "left")), cellM);
        Source field = new Source.FieldPatch("pole", Body.FIXED,
                PlateScenes.rectangle(-fieldM / 2, -WIDTH_M, fieldM / 2, WIDTH_M), BZ_T);
        return PlateScenes.scene(List.of(), List.of(field), List.of(duct));
    }

    @ParameterizedTest
    @EnumSource(Conductor.Channel.Profile.class)
    void fieldOverTheWholeChannelGivesBwvForEveryProfile(Conductor.Channel.Profile profile) {
        double length = 12 * WIDTH_M;
        SheetState duct = PlateScenes.sheet(channel(profile, length, 1.2 * length, MEAN_M_PER_S,
                OptionalDouble.empty()), 0, "duct");
        double ideal = BZ_T * WIDTH_M * MEAN_M_PER_S;
        SheetState.Pair pair = PlateScenes.pair(duct, "right");
        // v × B = v̄·B·(x̂ × ẑ) = −v̄·B·ŷ pushes positive charge to the right wall (y < 0).
        assertEquals(ideal, pair.voltageV(), 1e-10 * ideal, "Shercliff's B·w·v̄, " + profile);
        assertEquals(Optional.of("right"), pair.positive());
        assertEquals(ideal, pair.idealVoltageV(), 1e-15 * ideal, "B at the electrodes' midpoint times w·v̄");
        assertEquals(1, pair.endShortingRatio(), 1e-10, "no end shorting");
        assertEquals(MEAN_M_PER_S, duct.meanVelocityMPerS(), 0);
    }

    /**
     * Plug flow in an endless channel under a field of length Lb (all across the width): by Fourier
     * analysis U/(B·w·v̄) = 1 − (8/π²)·Σ_{n odd} e^{−nπLb/(2w)}/n², derived in the sheet solver's
     * channel test ({@code ChannelFlowTest}) from Shercliff's boundary-value problem.
     */
    private static double endlessChannelRatio(double fieldOverWidth) {
        double sum = 0;
        for (int n = 1; n < 201; n += 2) {
            sum += Math.exp(-n * Math.PI * fieldOverWidth / 2) / (n * n);
        }
        return 1 - 8 / (Math.PI * Math.PI) * sum;
    }

    @Test
    void fieldOfFiniteLengthShortsTheEndsAsTheFourierSeriesSays() {
        System.out.println("plug flow through the scene:  Lb/w   U/Bwv̄      series");
        double previous = 0;
        for (double lengthRatio : new double[] {1, 2, 4}) {
            // Walls 5w beyond the field at each end: their effect, ~e^{−5π}, is below 2e-7.
            Scene scene = channel(Conductor.Channel.Profile.PLUG, (lengthRatio + 10) * WIDTH_M,
                    lengthRatio * WIDTH_M, MEAN_M_PER_S, OptionalDouble.of(WIDTH_M / 40));
            double ratio = PlateScenes.pair(PlateScenes.sheet(scene, 0, "duct"), "right").endShortingRatio();
            double series = endlessChannelRatio(lengthRatio);
            System.out.printf("                               %4.1f   %.6f   %.6f%n", lengthRatio, ratio, series);
            // Second-order error at w/40, measured by the sheet tests at 5e-4 and below for Lb ≥ w.
            assertEquals(series, ratio, 5e-4, "Lb/w = " + lengthRatio);
            assertTrue(ratio > previous && ratio < 1, "rises below the ideal voltage");
            previous = ratio;
        }
    }

    @ParameterizedTest
    @EnumSource(Conductor.Channel.Profile.class)
    void voltageRisesMonotonicallyTowardsBwvAsTheFieldLengthens(Conductor.Channel.Profile profile) {
        double previous = 0;
        for (double lengthRatio : new double[] {0.5, 1, 2, 4, 8}) {
            Scene scene = channel(profile, (lengthRatio + 10) * WIDTH_M, lengthRatio * WIDTH_M, MEAN_M_PER_S,
                    OptionalDouble.empty());
            double ratio = PlateScenes.pair(PlateScenes.sheet(scene, 0, "duct"), "right").endShortingRatio();
            assertTrue(ratio > previous && ratio < 1, profile + ": U/Bwv̄ = " + ratio + " at Lb/w = " + lengthRatio);
            previous = ratio;
        }
        // Lb = 8w: the plug series leaves 2.8e-6; the automatic cells (w/12) add their error.
        assertEquals(1, previous, 1e-4, profile + " at Lb = 8w");
    }

    @Test
    void pulsatingFlowReadsAtEachInstantWhatSteadyFlowAtThatMeanVelocityReads() {
        // Resistive limit, quasi-static: the voltage follows v̄(t) = 1 + 0.5·sin(2π·2t) m/s at once
        // (the liquid's own field, which would make it lag, is what the limit neglects).
        double length = 8 * WIDTH_M;
        Conductor.Channel steady = (Conductor.Channel) channel(Conductor.Channel.Profile.LAMINAR, length,
                2 * WIDTH_M, 1, OptionalDouble.empty()).conductor("duct").orElseThrow();
        Conductor.Channel pulsing = new Conductor.Channel("duct", Body.FIXED, steady.start(), steady.end(),
                steady.widthM(), steady.depthM(), steady.sigmaSPerM(), steady.profile(),
                new MeanFlow.Sinusoid(1, 0.5, 2, 0), steady.electrodes(), steady.pairs(), steady.cellM());
        Scene base = channel(Conductor.Channel.Profile.LAMINAR, length, 2 * WIDTH_M, 1, OptionalDouble.empty());
        double perMeanVelocity = PlateScenes.pair(PlateScenes.sheet(base, 0, "duct"), "right").voltageV();
        for (double t : new double[] {0.05, 0.125, 0.3}) {
            double mean = 1 + 0.5 * Math.sin(2 * Math.PI * 2 * t);
            SheetState duct = PlateScenes.sheet(base.withConductors(List.of(pulsing)), t, "duct");
            assertEquals(mean, duct.meanVelocityMPerS(), 1e-15);
            assertEquals(perMeanVelocity * mean, PlateScenes.pair(duct, "right").voltageV(),
                    1e-9 * perMeanVelocity * mean, "t = " + t);
        }
    }

    @Test
    void reversingTheFlowReversesTheVoltageAndItsPositiveElectrode() {
        Scene forward = channel(Conductor.Channel.Profile.TURBULENT, 8 * WIDTH_M, 2 * WIDTH_M, MEAN_M_PER_S,
                OptionalDouble.empty());
        Scene backward = channel(Conductor.Channel.Profile.TURBULENT, 8 * WIDTH_M, 2 * WIDTH_M, -MEAN_M_PER_S,
                OptionalDouble.empty());
        SheetState.Pair there = PlateScenes.pair(PlateScenes.sheet(forward, 0, "duct"), "right");
        SheetState.Pair back = PlateScenes.pair(PlateScenes.sheet(backward, 0, "duct"), "right");
        // The problem is linear in v × B: everything odd in v flips exactly (to the solve's residual).
        assertEquals(-there.voltageV(), back.voltageV(), 1e-9 * Math.abs(there.voltageV()));
        assertEquals(Optional.of("right"), there.positive());
        assertEquals(Optional.of("left"), back.positive());
        assertEquals(there.endShortingRatio(), back.endShortingRatio(), 1e-9, "the share of B·w·v̄ is even in v");
    }
}

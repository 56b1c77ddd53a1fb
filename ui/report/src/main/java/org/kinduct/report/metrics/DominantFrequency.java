package org.kinduct.report.metrics;

import org.hipparchus.complex.Complex;
import org.hipparchus.transform.DftNormalization;
import org.hipparchus.transform.FastFourierTransformer;
import org.hipparchus.transform.TransformType;
import org.kinduct.scene.units.Units;

/**
 * The frequency of the largest peak of a uniformly sampled signal's amplitude spectrum: the mean
 * is removed, the samples are padded with zeros to the smallest power of two at least
 * {@value #PADDING} times their number (so the spectrum is read on a grid {@value #PADDING} times
 * finer than 1/T, T the span of the samples), and the bin of largest magnitude above zero
 * frequency gives f = k/(N·Δt). Its resolution is therefore 1/(N·Δt) ≤ 1/({@value #PADDING}·T).
 * Hipparchus' radix-2 FFT (Cooley–Tukey).
 */
final class DominantFrequency {

    static final int PADDING = 8;

    private DominantFrequency() {
    }

    /**
     * The frequency of the largest spectral peak.
     *
     * @param values samples at a constant spacing {@code dtS}
     * @return hertz; 0 when the signal is constant (its spread about the mean below
     *     {@link Units#NOISE_FRACTION} of its size, rounding only: a steady EMF's spectrum is noise)
     *     or has fewer than two samples
     */
    static double of(double[] values, double dtS) {
        int n = values.length;
        if (n < 2) {
            return 0;
        }
        double mean = 0;
        for (double v : values) {
            mean += v / n;
        }
        double spread = 0;
        double magnitude = 0;
        for (double v : values) {
            spread = Math.max(spread, Math.abs(v - mean));
            magnitude = Math.max(magnitude, Math.abs(v));
        }
        if (Units.withoutNoise(spread, magnitude) == 0) {
            return 0;
        }
        int size = Integer.highestOneBit(PADDING * n - 1) << 1;
        double[] padded = new double[size];
        for (int i = 0; i < n; i++) {
            padded[i] = values[i] - mean;
        }
        Complex[] spectrum = new FastFourierTransformer(DftNormalization.STANDARD).transform(padded, TransformType.FORWARD);
        int best = 0;
        double largest = 0;
        for (int k = 1; k <= size / 2; k++) {
            double height = spectrum[k].norm();
            if (height > largest) {
                largest = height;
                best = k;
            }
        }
        return best / (size * dtS);
    }
}

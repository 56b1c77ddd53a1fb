package org.kinduct.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

/**
 * The metrics of README "Metrics", computed from the results JSON of {@code kinduct solve}
 * (written for the tests apart from the production code, from the definitions alone): each
 * sweep point must give what an independent solve of the edited scene gives.
 */
final class SolveJsonMetrics {

    private final JsonNode root;

    SolveJsonMetrics(String json) throws IOException {
        root = new ObjectMapper().readTree(json);
    }

    /** The metric {@code key} of {@code id} (null for the scene) with load resistance {@code loadOhm} (loops). */
    double metric(String key, String id, double loadOhm) {
        if (key.equals("audit_residual")) {
            JsonNode a = root.path("energy_audit");
            return a.isObject() ? a.path("residual_J").asDouble() : Double.NaN;
        }
        if (List.of("final_speed", "terminal_speed", "settling_time").contains(key)) {
            return body(key, id);
        }
        if (key.equals("final_spin")) {
            double[] omega = {Double.NaN};
            root.path("bodies").forEach(b -> {
                if (b.path("id").asText().equals(id)) {
                    omega[0] = Math.abs(b.path("omega_radps").asDouble());
                }
            });
            return omega[0];
        }
        if (List.of("mean_drag", "mean_eddy_power", "peak_pair_voltage").contains(key)) {
            return sheet(key, id);
        }
        List<JsonNode> s = new ArrayList<>();
        root.path("samples").forEach(n -> {
            if (n.path("id").asText().equals(id)) {
                s.add(n);
            }
        });
        int n = s.size();
        double[] t = new double[n];
        double[] emf = new double[n];
        double[] current = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = s.get(i).path("t").asDouble();
            emf[i] = s.get(i).path("emf_V").asDouble();
            current[i] = s.get(i).path("current_A").asDouble();
        }
        switch (key) {
            case "peak_emf":
                return max(abs(emf));
            case "rms_emf": {
                double sum = 0;
                for (double e : emf) {
                    sum += e * e;
                }
                return Math.sqrt(sum / n);
            }
            case "peak_to_peak_emf":
                return max(emf) + max(negate(emf));
            case "peak_time": {
                int best = 0;
                for (int i = 1; i < n; i++) {
                    if (Math.abs(emf[i]) > Math.abs(emf[best])) {
                        best = i;
                    }
                }
                return t[best];
            }
            case "dominant_frequency":
                return dominantFrequency(emf, (t[n - 1] - t[0]) / (n - 1));
            case "flux_swing": {
                double[] linkage = new double[n];
                for (int i = 0; i < n; i++) {
                    linkage[i] = s.get(i).path("linkage_Wb").asDouble();
                }
                return max(linkage) + max(negate(linkage));
            }
            case "peak_current":
                return max(abs(current));
            case "mean_load_power": {
                double[] p = new double[n];
                for (int i = 0; i < n; i++) {
                    p[i] = current[i] * current[i] * loadOhm;
                }
                return trapezoid(t, p) / (t[n - 1] - t[0]);
            }
            case "steady_load_power":
                return steadyMean(t, current, loadOhm);
            case "load_energy": {
                double[] p = new double[n];
                for (int i = 0; i < n; i++) {
                    p[i] = current[i] * current[i] * loadOhm;
                }
                return trapezoid(t, p);
            }
            case "joule_heat": {
                double[] p = new double[n];
                for (int i = 0; i < n; i++) {
                    p[i] = current[i] * current[i] * s.get(i).path("resistance_Ohm").asDouble();
                }
                return trapezoid(t, p);
            }
            case "peak_force": {
                double[] f = new double[n];
                for (int i = 0; i < n; i++) {
                    JsonNode force = s.get(i).path("force_N");
                    f[i] = Math.hypot(force.get(0).asDouble(), force.get(1).asDouble());
                }
                return max(f);
            }
            default:
                throw new IllegalArgumentException(key);
        }
    }

    private double body(String key, String id) {
        List<Double> t = new ArrayList<>();
        List<Double> v = new ArrayList<>();
        root.path("bodies").forEach(b -> {
            if (b.path("id").asText().equals(id)) {
                t.add(b.path("t").asDouble());
                v.add(Math.hypot(b.path("velocity_mps").get(0).asDouble(), b.path("velocity_mps").get(1).asDouble()));
            }
        });
        int n = v.size();
        double last = v.get(n - 1);
        if (key.equals("final_speed")) {
            return last;
        }
        if (key.equals("settling_time")) {
            double band = 0.02 * (last != 0 ? last : max(v.stream().mapToDouble(Double::doubleValue).toArray()));
            int k = n - 1;
            while (k > 0 && Math.abs(v.get(k - 1) - last) <= band) {
                k--;
            }
            // The body's first sample is the run's start (a scene may have no wire or loop samples).
            return t.get(k) - t.get(0);
        }
        // Aitken's Δ² on the speeds a tenth of the window apart, ending at the last sample.
        int step = (int) Math.max(1, Math.round((n - 1) * 0.1));
        double a = v.get(n - 1 - 2 * step);
        double b = v.get(n - 1 - step);
        double c = last;
        if (Math.abs(b - a) <= 1e-9 * Math.abs(c) && Math.abs(c - b) <= 1e-9 * Math.abs(c)) {
            return c;
        }
        if (Math.signum(b - a) != Math.signum(c - b) || Math.abs(c - b) >= Math.abs(b - a)) {
            return Double.NaN;
        }
        return Math.max(0, c - (c - b) * (c - b) / ((c - b) - (b - a)));
    }

    /**
     * Largest |DFT| bin above zero of the mean-free signal zero-padded to the power of two ≥ 8n, by direct
     * summation; 0 for a steady signal, whose spread about the mean is below 1e-9 of its largest value.
     */
    private static double dominantFrequency(double[] x, double dt) {
        int n = x.length;
        int size = Integer.highestOneBit(8 * n - 1) << 1;
        double mean = 0;
        for (double v : x) {
            mean += v / n;
        }
        double spread = 0;
        double largestValue = 0;
        for (double v : x) {
            spread = Math.max(spread, Math.abs(v - mean));
            largestValue = Math.max(largestValue, Math.abs(v));
        }
        if (spread < 1e-9 * largestValue) {
            return 0;
        }
        int best = 0;
        double largest = 0;
        for (int k = 1; k <= size / 2; k++) {
            double re = 0;
            double im = 0;
            for (int i = 0; i < n; i++) {
                double phase = -2 * Math.PI * ((long) k * i % size) / size;
                re += (x[i] - mean) * Math.cos(phase);
                im += (x[i] - mean) * Math.sin(phase);
            }
            double m = Math.hypot(re, im);
            if (m > largest * (1 + 1e-12)) {
                largest = m;
                best = k;
            }
        }
        return best / (size * dt);
    }

    /**
     * Mean of I²·R between the first and last upward zero crossing of I (crossings interpolated
     * linearly; one counts only after I fell below −1e-6 of its largest magnitude) in the last quarter
     * of the samples, the power interpolated linearly between samples (exact integrals); NaN with fewer
     * than two such crossings.
     */
    private static double steadyMean(double[] t, double[] current, double loadOhm) {
        int n = t.length;
        double largest = max(abs(current));
        List<Double> ups = new ArrayList<>();
        boolean below = false;
        for (int i = 0; i + 1 < n; i++) {
            below = below || current[i] < -1e-6 * largest;
            if (below && current[i] < 0 && current[i + 1] >= 0) {
                double at = t[i] + (t[i + 1] - t[i]) * (-current[i]) / (current[i + 1] - current[i]);
                if (at >= t[n - 1] - 0.25 * (t[n - 1] - t[0])) {
                    ups.add(at);
                }
                below = false;
            }
        }
        if (ups.size() < 2) {
            return Double.NaN;
        }
        double[] p = new double[n];
        for (int i = 0; i < n; i++) {
            p[i] = current[i] * current[i] * loadOhm;
        }
        double a = ups.get(0);
        double b = ups.get(ups.size() - 1);
        return (runningIntegral(t, p, b) - runningIntegral(t, p, a)) / (b - a);
    }

    /** ∫ from t[0] to x of the samples' linear interpolant: whole trapezoids, then the part of the next. */
    private static double runningIntegral(double[] t, double[] y, double x) {
        double sum = 0;
        int k = 0;
        while (t[k + 1] < x) {
            sum += (t[k + 1] - t[k]) * (y[k] + y[k + 1]) / 2;
            k++;
        }
        double slope = (y[k + 1] - y[k]) / (t[k + 1] - t[k]);
        return sum + y[k] * (x - t[k]) + slope * (x - t[k]) * (x - t[k]) / 2;
    }

    private static double trapezoid(double[] t, double[] y) {
        double sum = 0;
        for (int i = 0; i + 1 < t.length; i++) {
            sum += (t[i + 1] - t[i]) * (y[i] + y[i + 1]) / 2;
        }
        return sum;
    }

    private static double[] abs(double[] v) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = Math.abs(v[i]);
        }
        return out;
    }

    private static double[] negate(double[] v) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = -v[i];
        }
        return out;
    }

    private static double max(double[] v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double x : v) {
            m = Math.max(m, x);
        }
        return m;
    }

    /** A plate or channel metric from the JSON's "plates" entries of {@code id}. */
    private double sheet(String key, String id) {
        List<JsonNode> p = new ArrayList<>();
        root.path("plates").forEach(n -> {
            if (n.path("id").asText().equals(id)) {
                p.add(n);
            }
        });
        int n = p.size();
        double[] t = new double[n];
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            JsonNode e = p.get(i);
            t[i] = e.path("t").asDouble();
            switch (key) {
                case "mean_drag" -> v[i] = Math.hypot(e.path("drag_N").get(0).asDouble(), e.path("drag_N").get(1).asDouble());
                case "mean_eddy_power" -> v[i] = e.path("joule_W").asDouble();
                default -> {
                    JsonNode pairs = e.path("pairs");
                    if (pairs.isEmpty()) {
                        return Double.NaN;
                    }
                    v[i] = Math.abs(pairs.get(0).path("voltage_V").asDouble());
                }
            }
        }
        return key.equals("peak_pair_voltage") ? max(v) : trapezoid(t, v) / (t[n - 1] - t[0]);
    }
}

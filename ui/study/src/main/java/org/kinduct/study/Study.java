package org.kinduct.study;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import org.kinduct.report.Labels;
import org.kinduct.report.metrics.Metric;
import org.kinduct.scene.Checks;
import org.kinduct.scene.Scene;
import org.kinduct.scene.io.SceneJson;
import org.kinduct.solver.dynamics.CircuitModel;

/**
 * A design study: a scene, the points to run it at ({@link Design}), the metrics to read from
 * each run, the time from which they read the samples ({@code fromS}, −∞ for all), and the
 * circuit model asked for (as {@code kinduct solve --circuit}).
 */
public record Study(Scene scene, Design design, List<Metric> metrics, double fromS, CircuitModel circuit) {

    public Study {
        Checks.nonNull(scene, "scene");
        Checks.nonNull(design, "design");
        metrics = List.copyOf(metrics);
        if (metrics.isEmpty()) {
            throw new IllegalArgumentException("a study reads at least one metric (--metric)");
        }
        if (Double.isNaN(fromS) || fromS == Double.POSITIVE_INFINITY) {
            throw new IllegalArgumentException("the start time of the metrics must be a time, got " + fromS);
        }
        Checks.nonNull(circuit, "circuit model");
        for (Axis a : design.axes()) {
            for (double v : a.values()) {
                a.value().write(scene, v);
            }
        }
    }

    /** The scene at point {@code k}: the axes' values written into the study's scene in axis order. */
    public Scene sceneAt(int k) {
        double[] values = design.at(k);
        Scene s = scene;
        for (int i = 0; i < values.length; i++) {
            s = design.axes().get(i).value().write(s, values[i]);
        }
        return s;
    }

    /** What a result file states about this study. */
    public Header header() {
        List<Header.Varied> varied = new ArrayList<>();
        for (Axis a : design.axes()) {
            varied.add(new Header.Varied(a.path(), a.value().dimension().siUnit().symbol(), a.log(), a.values()));
        }
        List<Header.Read> read = new ArrayList<>();
        for (Metric m : metrics) {
            read.add(new Header.Read(m.text(), m.unit()));
        }
        return new Header(hash(), scene.name(), design.mode().word(), fromS, Labels.circuitModel(circuit),
                design.size(), varied, read);
    }

    /**
     * SHA-256 of everything that decides the results: the scene as the file format writes it, the
     * varied paths with every value (shortest exact decimal form), the mode, the metrics, their
     * start time and the circuit model. Parts of one study carry the same hash; any change to
     * these gives another.
     */
    String hash() {
        StringBuilder text = new StringBuilder(SceneJson.write(scene)).append('\n');
        for (Axis a : design.axes()) {
            text.append("vary ").append(a.path()).append(a.log() ? " log" : "").append(' ').append(a.values()).append('\n');
        }
        text.append("mode ").append(design.mode().word()).append('\n');
        for (Metric m : metrics) {
            text.append("metric ").append(m.text()).append('\n');
        }
        text.append("from ").append(fromS).append("\ncircuit ").append(circuit).append('\n');
        try {
            byte[] digest = MessageDigest.getInstance("SHA-256").digest(text.toString().getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(digest);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }
}

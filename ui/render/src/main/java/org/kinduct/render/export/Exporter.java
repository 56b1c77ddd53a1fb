package org.kinduct.render.export;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;
import org.kinduct.report.CautionCheck;
import org.kinduct.report.RunSummary;
import org.kinduct.solver.run.ResultScales;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.io.SceneFiles;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.run.RunRequest;
import org.kinduct.solver.run.RunResult;
import org.kinduct.solver.run.SceneRun;
import org.kinduct.report.EnergyText;
import org.kinduct.render.field.FieldMapper;
import org.kinduct.render.field.MapRequest;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.paint.Java2dSurface;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.paint.LineChart;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.render.view.ViewTransform;

/**
 * Everything one export produces for a scene: the annotated snapshot as PNG and SVG, the time
 * series and field map as CSV, and the results JSON. JavaFX-free, so the command line can use it
 * without a display. Every file reads the one run of the scene ({@link SceneRun}): its window
 * (the scene's own, stretched to reach the snapshot's instant if that lies beyond) sampled as
 * {@code kinduct solve} samples it, with the snapshot's instant sampled exactly; solved lazily
 * and once.
 */
public final class Exporter {

    /** Display samples of the field map, output pixels per sample, as the editor's fine map. */
    private static final int MAP_STEP_PX = 2;
    /** Most samples in the exported map; wider images sample more coarsely. */
    private static final double MAX_MAP_SAMPLES = 1.0e6;

    /** The files to write; null where none is wanted. */
    public record Targets(Path png, Path svg, Path pdf, Path seriesCsv, Path fieldCsv, Path json) {

        /** No file yet; add them with the {@code withX} methods. */
        public static Targets none() {
            return new Targets(null, null, null, null, null, null);
        }

        public Targets withPng(Path file) {
            return new Targets(file, svg, pdf, seriesCsv, fieldCsv, json);
        }

        public Targets withSvg(Path file) {
            return new Targets(png, file, pdf, seriesCsv, fieldCsv, json);
        }

        public Targets withPdf(Path file) {
            return new Targets(png, svg, file, seriesCsv, fieldCsv, json);
        }

        public Targets withSeriesCsv(Path file) {
            return new Targets(png, svg, pdf, file, fieldCsv, json);
        }

        public Targets withFieldCsv(Path file) {
            return new Targets(png, svg, pdf, seriesCsv, file, json);
        }

        public Targets withJson(Path file) {
            return new Targets(png, svg, pdf, seriesCsv, fieldCsv, file);
        }

        /** The files named, in the order they are written. */
        public List<Path> files() {
            return java.util.stream.Stream.of(png, svg, pdf, seriesCsv, fieldCsv, json)
                    .filter(java.util.Objects::nonNull).toList();
        }

        public boolean isEmpty() {
            return files().isEmpty();
        }
    }

    private final Scene scene;
    private final SnapshotOptions options;
    private final SceneRun run;
    private SnapshotPage page;
    private FieldRaster raster;

    public Exporter(Scene scene, SnapshotOptions options) {
        this(scene, options, RunMonitor.NONE);
    }

    /**
     * @param monitor follows the run's progress and may stop it
     * @throws IllegalArgumentException when the snapshot's instant lies before the scene's start
     */
    public Exporter(Scene scene, SnapshotOptions options, RunMonitor monitor) {
        this.scene = scene;
        this.options = options;
        RunRequest window = RunRequest.of(scene);
        this.run = new SceneRun(scene, options.instant() instanceof ExportInstant.At at ? window.alsoAt(at.tS()) : window,
                monitor, true);
    }

    /** Writes every target atomically; a target that fails is left as it was. Returns the files written. */
    public List<Path> write(Targets targets) throws IOException {
        List<Path> written = new ArrayList<>();
        if (targets.png() != null) {
            write(targets.png(), png(), written);
        }
        if (targets.svg() != null) {
            write(targets.svg(), svg().getBytes(StandardCharsets.UTF_8), written);
        }
        if (targets.pdf() != null) {
            write(targets.pdf(), pdf(), written);
        }
        if (targets.seriesCsv() != null) {
            write(targets.seriesCsv(), DataFiles.seriesCsv(run.result().samples()).getBytes(StandardCharsets.UTF_8),
                    written);
        }
        if (targets.fieldCsv() != null) {
            write(targets.fieldCsv(), fieldCsv().getBytes(StandardCharsets.UTF_8), written);
        }
        if (targets.json() != null) {
            write(targets.json(), DataFiles.resultsJson(run.result()).getBytes(StandardCharsets.UTF_8), written);
        }
        return written;
    }

    private static void write(Path file, byte[] bytes, List<Path> written) throws IOException {
        SceneFiles.writeAtomically(file, bytes);
        written.add(file);
    }

    /** The snapshot as an opaque image {@code widthPx} wide. */
    public BufferedImage image() {
        SnapshotPage p = page();
        double k = scale();
        BufferedImage img = new BufferedImage(options.widthPx(), (int) Math.ceil(p.height() * k),
                BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            // The last pixel row may reach past the page's height: give it the paper colour too.
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, img.getWidth(), img.getHeight());
            g.scale(k, k);
            p.draw(new Java2dSurface(g, SnapshotPage.WIDTH, p.height()), raster());
        } finally {
            g.dispose();
        }
        return img;
    }

    /** The snapshot as PNG bytes with the chosen resolution in its metadata. */
    public byte[] png() {
        return PngFiles.encode(image(), options.dpi());
    }

    /** The snapshot as an SVG document. */
    public String svg() {
        SnapshotPage p = page();
        SvgSurface s = new SvgSurface(SnapshotPage.WIDTH, p.height());
        p.draw(s, raster());
        return s.document(title(), options.widthPx());
    }

    /** The snapshot as a one-page vector PDF with its fonts embedded, the page {@link SnapshotPage#WIDTH} points wide. */
    public byte[] pdf() {
        SnapshotPage p = page();
        PdfSurface s = new PdfSurface(SnapshotPage.WIDTH, p.height(), title());
        p.draw(s, raster());
        return s.finish();
    }

    private String title() {
        return (scene.name().isEmpty() ? "Kinduct scene" : scene.name()) + " at t = " + snapshot().tS() + " s";
    }

    /** B_z over the box the snapshot's map shows, exactly evaluated. */
    public String fieldCsv() {
        ViewTransform v = page().mapView();
        return DataFiles.fieldCsv(run.fieldAt(snapshot().tS()), new ViewChoice.Box(v.minX(), v.minY(), v.maxX(),
                v.maxY()));
    }

    /** The state the snapshot shows: the run's sample at exactly the chosen instant. */
    public Snapshot snapshot() {
        return options.instant().in(run.result());
    }

    /** The run every exported file reads. */
    public RunResult result() {
        return run.result();
    }

    /** The page every picture of this export draws (package-private: tests measure it). */
    SnapshotPage page() {
        if (page == null) {
            RunResult result = run.result();
            List<Snapshot> checked = new ArrayList<>(result.samples());
            checked.add(snapshot());
            List<String> remarks = new ArrayList<>(RunSummary.lines(result));
            result.audit().map(EnergyText::of).ifPresent(remarks::add);
            page = SnapshotPage.layout(scene, snapshot(), remarks,
                    CautionCheck.lines(scene, checked), result.scales(), waveform(result), options);
        }
        return page;
    }

    /**
     * Every wire's and loop's EMF and every electrode pair's voltage over the run, noise read as 0,
     * with the snapshot's instant marked; for a scene with neither (plates without electrodes), the
     * force on each plate and channel, or the torque when every one rides a spinning body; null
     * when there is nothing to plot or only one sample.
     */
    private LineChart.Content waveform(RunResult result) {
        List<Snapshot> samples = result.samples();
        if (samples.size() < 2) {
            return null;
        }
        double[] t = samples.stream().mapToDouble(Snapshot::tS).toArray();
        List<LineChart.Series> lines = new ArrayList<>();
        Snapshot first = samples.get(0);
        for (ConductorState c : first.conductors()) {
            lines.add(new LineChart.Series(c.id(), t, series(samples, s -> result.scales().emf(
                    s.conductor(c.id()).orElseThrow().emfV()))));
        }
        for (SheetState sheet : first.sheets()) {
            for (int p = 0; p < sheet.pairs().size(); p++) {
                int pair = p;
                SheetState.Pair named = sheet.pairs().get(p);
                lines.add(new LineChart.Series(sheet.id() + " " + named.plus() + "−" + named.minus(), t,
                        series(samples, s -> result.scales().emf(s.sheet(sheet.id()).orElseThrow().pairs().get(pair)
                                .voltageV()))));
            }
        }
        if (!lines.isEmpty()) {
            boolean emf = !first.conductors().isEmpty();
            boolean pairs = lines.size() > first.conductors().size();
            String title = emf && pairs ? "EMF and electrode voltages over the run"
                    : emf ? "EMF over the run" : "Electrode voltages over the run";
            return new LineChart.Content(title, lines, "t", Dimension.TIME, emf && !pairs ? "EMF" : "V", Dimension.VOLTAGE,
                    snapshot().tS());
        }
        if (!first.sheets().isEmpty() && first.sheets().stream().allMatch(this::spins)) {
            for (SheetState sheet : first.sheets()) {
                lines.add(new LineChart.Series(sheet.id(), t, series(samples, s -> result.scales().torque(
                        s.sheet(sheet.id()).orElseThrow().torqueNm()))));
            }
            return new LineChart.Content("Torque on the plates over the run (the braking torque)", lines, "t",
                    Dimension.TIME, "τ", Dimension.TORQUE, snapshot().tS());
        }
        for (SheetState sheet : first.sheets()) {
            lines.add(new LineChart.Series(sheet.id(), t, series(samples, s -> Units.withoutNoise(
                    s.sheet(sheet.id()).orElseThrow().forceN().length(), result.scales().forceN()))));
        }
        return lines.isEmpty() ? null : new LineChart.Content("Force on the plates over the run (the drag)", lines,
                "t", Dimension.TIME, "F", Dimension.FORCE, snapshot().tS());
    }

    /** Whether a plate or channel rides a spinning body (a spin, or a free body started turning): its torque is what brakes it. */
    private boolean spins(SheetState sheet) {
        Motion motion = scene.conductor(sheet.id()).flatMap(c -> scene.body(c.body())).orElseThrow().motion();
        return motion instanceof Motion.Spin || (motion instanceof Motion.Free free && free.initialOmegaRadPerS() != 0);
    }

    private static double[] series(List<Snapshot> samples, ToDoubleFunction<Snapshot> value) {
        return samples.stream().mapToDouble(value).toArray();
    }

    /** Output pixels per page unit. */
    private double scale() {
        return options.widthPx() / SnapshotPage.WIDTH;
    }

    /** The field map in output resolution, or null when no layer shows the field. */
    private FieldRaster raster() {
        if (raster == null && (options.layers().contains(Layer.HEAT_MAP) || options.layers().contains(Layer.CONTOURS)
                || options.layers().contains(Layer.SYMBOLS))) {
            ViewTransform v = page().mapView();
            double k = scale();
            ViewTransform device = new ViewTransform(v.centerX(), v.centerY(), v.pxPerM() * k, v.widthPx() * k,
                    v.heightPx() * k);
            int step = (int) Math.max(MAP_STEP_PX,
                    Math.ceil(Math.sqrt(device.widthPx() * device.heightPx() / MAX_MAP_SAMPLES)));
            FieldMapper mapper = new FieldMapper(Runnable::run, Runnable::run, r -> { }, e -> { });
            raster = mapper.compute(new MapRequest(run, 0, snapshot().tS(), device, step));
        }
        return raster;
    }
}

package org.kinduct.render.export;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.kinduct.report.CautionCheck;
import org.kinduct.report.ResultScales;
import org.kinduct.scene.Scene;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.io.SceneFiles;
import org.kinduct.solver.Snapshot;
import org.kinduct.report.EnergyText;
import org.kinduct.render.field.Evaluators;
import org.kinduct.render.field.SceneEvaluator;
import org.kinduct.render.field.FieldMapper;
import org.kinduct.render.field.MapRequest;
import org.kinduct.render.paint.FieldRaster;
import org.kinduct.render.paint.Java2dSurface;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.view.ViewTransform;

/**
 * Everything one export produces for a scene: the annotated snapshot as PNG and SVG, the time
 * series and field map as CSV, and the results JSON. JavaFX-free, so the command line can use it
 * without a display. Solves lazily and once: the snapshot at the chosen time, the series over
 * the scene's time window (for the data files and the voltage caution).
 */
public final class Exporter {

    /** Display samples of the field map, output pixels per sample, as the editor's fine map. */
    private static final int MAP_STEP_PX = 2;
    /** Most samples in the exported map; wider images sample more coarsely. */
    private static final double MAX_MAP_SAMPLES = 1.0e6;

    /** The files to write; null where none is wanted. */
    public record Targets(Path png, Path svg, Path seriesCsv, Path fieldCsv, Path json) {
        public boolean isEmpty() {
            return png == null && svg == null && seriesCsv == null && fieldCsv == null && json == null;
        }
    }

    private final Scene scene;
    private final SnapshotOptions options;
    /** The editor's evaluator: instant solves, or the coupled run for scenes with free bodies. */
    private final SceneEvaluator evaluator;
    private Snapshot snapshot;
    private List<Snapshot> series;
    private SnapshotPage page;
    private FieldRaster raster;

    public Exporter(Scene scene, SnapshotOptions options) {
        this.scene = scene;
        this.options = options;
        this.evaluator = Evaluators.solver().apply(scene);
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
        if (targets.seriesCsv() != null) {
            write(targets.seriesCsv(), DataFiles.seriesCsv(series()).getBytes(StandardCharsets.UTF_8), written);
        }
        if (targets.fieldCsv() != null) {
            write(targets.fieldCsv(), fieldCsv().getBytes(StandardCharsets.UTF_8), written);
        }
        if (targets.json() != null) {
            write(targets.json(), DataFiles.resultsJson(scene).getBytes(StandardCharsets.UTF_8), written);
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
        String title = (scene.name().isEmpty() ? "Kinduct scene" : scene.name()) + " at t = " + options.tS() + " s";
        return s.document(title, options.widthPx());
    }

    /** B_z over the box the snapshot's map shows, exactly evaluated. */
    public String fieldCsv() {
        ViewTransform v = page().mapView();
        return DataFiles.fieldCsv(evaluator.fieldAt(options.tS()), new ViewChoice.Box(v.minX(), v.minY(), v.maxX(),
                v.maxY()));
    }

    public Snapshot snapshot() {
        if (snapshot == null) {
            snapshot = evaluator.at(options.tS());
        }
        return snapshot;
    }

    /** States over the scene's own time window. */
    public List<Snapshot> series() {
        if (series == null) {
            TimeSpan span = scene.time();
            series = evaluator.series(span.t0S(), span.t1S(), span.dtS());
        }
        return series;
    }

    private SnapshotPage page() {
        if (page == null) {
            List<Snapshot> checked = new ArrayList<>(series());
            checked.add(snapshot());
            page = SnapshotPage.layout(scene, snapshot(), evaluator.posesAt(options.tS()),
                    evaluator.audit().map(EnergyText::of).stream().toList(), CautionCheck.lines(scene, checked),
                    ResultScales.of(checked), options);
        }
        return page;
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
            FieldMapper mapper = new FieldMapper(s -> evaluator, Runnable::run, Runnable::run, r -> { },
                    e -> { });
            raster = mapper.compute(new MapRequest(scene, 0, options.tS(), device, step));
        }
        return raster;
    }
}

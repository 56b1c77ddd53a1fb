package org.kinduct.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.concurrent.Callable;
import org.kinduct.report.Version;
import org.kinduct.scene.Scene;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.render.export.ExportInstant;
import org.kinduct.render.export.Exporter;
import org.kinduct.render.export.SnapshotOptions;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.export.ViewChoice;
import org.kinduct.solver.run.RunFailedException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code kinduct export}: annotated snapshot (PNG, SVG) and data files (CSV, JSON), without a display. */
@Command(name = "export", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Export an annotated snapshot at one instant and the scene's data, without a display.",
                "Times and lengths accept units, e.g. --at '350 ms', --view '-5 cm,-3 cm,5 cm,3 cm'.",
                "The series CSV and the JSON cover the scene's own time window."})
final class ExportCommand implements Callable<Integer> {

    @Mixin
    SceneInput input;

    @Option(names = "--at", paramLabel = "peak|peak:ID|TIME", defaultValue = "peak",
            description = {"Instant shown: the largest |EMF| of any conductor (default), of conductor ID,",
                    "or a time (a coupled run is sampled there exactly)."})
    String at;

    @Option(names = "--png", paramLabel = "FILE", description = "Annotated snapshot as PNG.")
    Path png;

    @Option(names = "--svg", paramLabel = "FILE", description = "Annotated snapshot as SVG.")
    Path svg;

    @Option(names = "--pdf", paramLabel = "FILE", description = "Annotated snapshot as a vector PDF page (fonts embedded).")
    Path pdf;

    @Option(names = "--width", paramLabel = "PX", description = "Image width in pixels (default: ${DEFAULT-VALUE}).",
            defaultValue = "" + SnapshotOptions.DEFAULT_WIDTH_PX)
    int widthPx;

    @Option(names = "--dpi", paramLabel = "N", description = "Resolution stored in the PNG (default: ${DEFAULT-VALUE}).",
            defaultValue = "" + SnapshotOptions.DEFAULT_DPI)
    int dpi;

    @Option(names = "--view", paramLabel = "fit|x0,y0,x1,y1",
            description = "Whole scene (default), or the box with these corners in metres.", defaultValue = "fit")
    String view;

    @Option(names = "--csv", paramLabel = "FILE", description = "Time series, one row per time (wide CSV).")
    Path seriesCsv;

    @Option(names = "--field-csv", paramLabel = "FILE", description = "B_z map of the view: x_m, y_m, Bz_T.")
    Path fieldCsv;

    @Option(names = "--json", paramLabel = "FILE", description = "Results as by 'kinduct solve --format json'.")
    Path json;

    @Option(names = "--current-density", description = {"Colour plates and channels by |J|",
            "(hides the field map under them; the streamlines stay)."})
    boolean currentDensity;

    // The Ctrl-C watch acts by being open over the run; its body never names it.
    @SuppressWarnings("try")
    @Override
    public Integer call() {
        Exporter.Targets targets = Exporter.Targets.none().withPng(png).withSvg(svg).withPdf(pdf)
                .withSeriesCsv(seriesCsv).withFieldCsv(fieldCsv).withJson(json);
        if (targets.isEmpty()) {
            throw new BadInputException("nothing to export: give at least one of --png, --svg, --pdf, --csv,"
                    + " --field-csv, --json");
        }
        OutputTargets.requireDistinct(input.file(), OutputTargets.of("--png", png, "--svg", svg, "--csv", seriesCsv,
                "--field-csv", fieldCsv, "--json", json));
        Scene scene = input.load();
        SnapshotOptions options;
        try {
            ExportInstant instant = ExportInstant.parse(at, text -> Units.parse(text, Dimension.TIME));
            options = SnapshotOptions.standard(instant, widthPx, dpi, viewChoice(view), LocalDate.now(ZoneId.systemDefault()), Version.text());
            if (currentDensity) {
                options = options.withLayer(Layer.CURRENT_DENSITY);
            }
        } catch (IllegalArgumentException e) {
            throw new BadInputException(e.getMessage());
        }
        CliMonitor monitor = CliMonitor.forThisProcess();
        try (Interruption watch = Interruption.watch(monitor)) {
            for (Path written : new Exporter(scene, options, monitor).write(targets)) {
                System.out.println("wrote " + written);
            }
        } catch (IOException | IllegalArgumentException e) {
            throw new BadInputException(e.getMessage());
        } catch (RunFailedException e) {
            throw new BadInputException(input.name() + ": " + e.getMessage());
        } finally {
            monitor.done();
        }
        return KinductMain.OK;
    }

    /** {@code fit}, or four comma-separated lengths x0, y0, x1, y1. */
    static ViewChoice viewChoice(String text) {
        if (text.strip().equalsIgnoreCase("fit")) {
            return new ViewChoice.Fit();
        }
        String[] parts = text.split(",", -1);
        if (parts.length != 4) {
            throw new IllegalArgumentException("--view: expected 'fit' or four lengths x0,y0,x1,y1, got '" + text + "'");
        }
        double[] v = new double[4];
        for (int i = 0; i < 4; i++) {
            try {
                v[i] = Units.parse(parts[i].strip(), Dimension.LENGTH);
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("--view corner " + (i + 1) + ": " + e.getMessage(), e);
            }
        }
        try {
            return new ViewChoice.Box(v[0], v[1], v[2], v[3]);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("--view: " + e.getMessage(), e);
        }
    }
}

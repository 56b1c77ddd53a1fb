package org.kinduct.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.kinduct.render.export.PlotFiles;
import org.kinduct.render.plot.Plot;
import org.kinduct.scene.io.SceneFiles;
import org.kinduct.study.StudyCsv;
import org.kinduct.study.StudyJson;
import org.kinduct.study.StudyTable;
import picocli.CommandLine.Option;

/**
 * Where a study's table goes: CSV and JSON files, and a plot as PNG or SVG; the CSV to standard
 * output when no file is named. Every file is written atomically.
 */
final class StudyOutputs {

    @Option(names = "--csv", paramLabel = "FILE", description = "One row per point: varied values, metrics, error.")
    Path csv;

    @Option(names = "--json", paramLabel = "FILE", description = "The same rows with the study's description (merge reads it).")
    Path json;

    @Option(names = "--png", paramLabel = "FILE", description = "Plot: metrics against one varied value, or a map over two.")
    Path png;

    @Option(names = "--svg", paramLabel = "FILE", description = "The same plot as SVG.")
    Path svg;

    @Option(names = "--plot", paramLabel = "METRIC", split = ";", description = {"Metrics to plot, as given to --metric",
            "(default: the first, and those in its unit beside it)."})
    List<String> plot = new ArrayList<>();

    boolean plots() {
        return png != null || svg != null;
    }

    /** Checks before a long run that the plot asked for can be drawn from such a table. */
    void checkPlot(StudyTable shape) {
        if (!plots()) {
            return;
        }
        if (shape.shard() != null) {
            throw new BadInputException("--png/--svg: a part of a study has no plot; merge the parts and plot the whole");
        }
        try {
            StudyPlots.check(shape.header(), plot);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("--plot: " + e.getMessage());
        }
    }

    /** Writes every requested file, and the CSV to standard output when no file is named. */
    List<Path> write(StudyTable table) {
        List<Path> written = new ArrayList<>();
        if (csv == null && json == null && !plots()) {
            Output.deliver(StudyCsv.write(table), null);
            return written;
        }
        save(csv, StudyCsv.write(table).getBytes(StandardCharsets.UTF_8), written);
        save(json, StudyJson.write(table).getBytes(StandardCharsets.UTF_8), written);
        if (plots() && table.shard() == null && !table.rows().isEmpty()) {
            Plot chart = chart(table);
            save(png, png == null ? null : PlotFiles.png(chart), written);
            save(svg, svg == null ? null : PlotFiles.svg(chart).getBytes(StandardCharsets.UTF_8), written);
        }
        return written;
    }

    private Plot chart(StudyTable table) {
        try {
            return StudyPlots.of(table, plot);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("--plot: " + e.getMessage());
        }
    }

    private static void save(Path file, byte[] bytes, List<Path> written) {
        if (file == null) {
            return;
        }
        try {
            SceneFiles.writeAtomically(file, bytes);
            written.add(file);
        } catch (IOException e) {
            throw new BadInputException("cannot write " + file + ": " + e.getMessage());
        }
    }
}

package org.kinduct.ui.app;

import java.io.ByteArrayInputStream;
import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicReference;
import javafx.application.Platform;
import javafx.geometry.Insets;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.TextField;
import javafx.scene.image.Image;
import javafx.scene.image.ImageView;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Stage;
import javafx.stage.Window;
import org.kinduct.cli.StudyPlots;
import org.kinduct.render.export.PlotFiles;
import org.kinduct.render.plot.Plot;
import org.kinduct.report.metrics.Metric;
import org.kinduct.scene.io.SceneFiles;
import org.kinduct.scene.units.Units;
import org.kinduct.study.Row;
import org.kinduct.study.Shard;
import org.kinduct.study.Study;
import org.kinduct.study.StudyRunner;
import org.kinduct.study.StudyTable;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.ValueSweep;

/**
 * Edit ▸ Vary a value…: one value of the scene over a range, a metric read from each run, the
 * points run one at a time on a thread of their own (the UI thread never waits), the plot and
 * the list of points growing as they finish; a point of the list loads that variant into the
 * editor as an undoable edit, and the plot saves as PNG or SVG, as {@code kinduct sweep} draws it.
 */
final class SweepWindow {

    private final EditorViewModel vm;
    private final Stage stage = new Stage();
    private final ComboBox<String> path = new ComboBox<>();
    private final TextField range = new TextField();
    private final ComboBox<String> metric = new ComboBox<>();
    private final Button run = new Button("Run");
    private final Button stop = new Button("Stop");
    private final ProgressBar progress = new ProgressBar(0);
    private final Label status = new Label();
    private final ImageView plot = new ImageView();
    private final ListView<String> points = new ListView<>();
    private final Button load = new Button("Load this variant");
    private final Button save = new Button("Save plot…");
    /** Runs the points and renders the plot: never the UI thread. */
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "value-sweep");
        t.setDaemon(true);
        return t;
    });
    private Study study;
    /** Counts the runs started: reports of an earlier run are dropped. */
    private long generation;
    private StudyRunner runner;
    private List<Row> rows = List.of();
    private Plot shown;

    private SweepWindow(Window owner, EditorViewModel vm, String objectId) {
        this.vm = vm;
        org.kinduct.scene.Scene scene = vm.scene();
        path.getItems().setAll(ValueSweep.paths(scene, objectId));
        path.setId("sweep-path");
        path.valueProperty().addListener((o, was, now) -> {
            if (now != null) {
                range.setText(ValueSweep.defaultRange(vm.scene(), now));
            }
        });
        range.setId("sweep-range");
        range.setPromptText("FROM..TO:N, FROM..TO:N:log or V1,V2,…");
        metric.getItems().setAll(ValueSweep.metrics(scene));
        metric.setEditable(true);
        metric.setId("sweep-metric");
        if (!metric.getItems().isEmpty()) {
            metric.setValue(metric.getItems().get(0));
        }
        if (!path.getItems().isEmpty()) {
            path.setValue(path.getItems().get(0));
        }
        run.setId("sweep-run");
        run.setDefaultButton(true);
        run.setOnAction(e -> start());
        stop.setId("sweep-stop");
        stop.setDisable(true);
        stop.setOnAction(e -> stopRun());
        points.setId("sweep-points");
        load.setId("sweep-load");
        load.disableProperty().bind(points.getSelectionModel().selectedItemProperty().isNull());
        load.setOnAction(e -> loadVariant());
        save.setDisable(true);
        save.setOnAction(e -> savePlot());
        status.setId("sweep-status");
        status.setWrapText(true);
        plot.setFitWidth(560);
        plot.setPreserveRatio(true);

        GridPane form = new GridPane();
        form.setHgap(8);
        form.setVgap(6);
        form.addRow(0, new Label("Value"), path);
        form.addRow(1, new Label("Range"), range);
        form.addRow(2, new Label("Metric"), metric);
        path.setMaxWidth(Double.MAX_VALUE);
        range.setPrefColumnCount(24);
        metric.setMaxWidth(Double.MAX_VALUE);
        progress.setMaxWidth(Double.MAX_VALUE);
        HBox.setHgrow(progress, Priority.ALWAYS);
        HBox buttons = new HBox(8, run, stop, progress);
        points.setPrefHeight(160);
        HBox listButtons = new HBox(8, load, save);
        VBox root = new VBox(8, form, buttons, status, plot, points, listButtons);
        root.setPadding(new Insets(10));
        stage.setTitle("Vary a value" + (objectId == null ? "" : " of " + objectId));
        stage.initOwner(owner);
        stage.setScene(new Scene(root, 600, 760));
        stage.setOnHidden(e -> {
            stopRun();
            worker.shutdown();
        });
    }

    /** Opens the window for the selected object ({@code objectId}, or null for the whole scene). */
    static SweepWindow show(Window owner, EditorViewModel vm, String objectId) {
        SweepWindow w = new SweepWindow(owner, vm, objectId);
        w.stage.show();
        return w;
    }

    private void start() {
        if (path.getValue() == null || metric.getValue() == null) {
            status.setText("Choose a value and a metric.");
            return;
        }
        Study s;
        try {
            s = ValueSweep.study(vm.scene(), path.getValue(), range.getText(), List.of(metric.getValue().strip()));
        } catch (IllegalArgumentException e) {
            status.setText(e.getMessage());
            return;
        }
        study = s;
        long gen = ++generation;
        rows = List.of();
        points.getItems().clear();
        plot.setImage(null);
        save.setDisable(true);
        progress.setProgress(0);
        run.setDisable(true);
        stop.setDisable(false);
        status.setText(String.format(Locale.ROOT, "Running %d points…", s.design().size()));
        AtomicReference<StudyRunner> running = new AtomicReference<>();
        StudyRunner r = new StudyRunner(s, Shard.WHOLE, 1, (row, done, total) -> {
            // Called on the point's thread: the plot is drawn here, the UI only shows it.
            List<Row> finished = running.get().finished();
            Plot p = plotOf(s, finished, done == total);
            byte[] png = p == null ? null : PlotFiles.png(p);
            Platform.runLater(() -> showProgress(gen, s, finished, p, png, done, total));
        });
        running.set(r);
        runner = r;
        worker.execute(() -> {
            String end;
            try {
                List<Row> all = r.run();
                end = r.complete() ? "Done: " + all.size() + " points." : "Stopped after " + all.size() + " points.";
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                end = "Stopped.";
            } catch (RuntimeException e) {
                end = "The sweep stopped: " + e.getMessage();
            }
            String said = end;
            Platform.runLater(() -> {
                if (generation == gen) {
                    status.setText(said);
                    run.setDisable(false);
                    stop.setDisable(true);
                }
            });
        });
    }

    private static Plot plotOf(Study s, List<Row> finished, boolean complete) {
        try {
            return StudyPlots.of(new StudyTable(s.header(), null, complete, finished), List.of());
        } catch (IllegalArgumentException e) {
            return null; // no point has a value yet
        }
    }

    private void showProgress(long gen, Study s, List<Row> finished, Plot p, byte[] png, int done, int total) {
        if (generation != gen) {
            return;
        }
        rows = finished;
        progress.setProgress((double) done / total);
        status.setText(String.format(Locale.ROOT, "%d of %d points", done, total));
        List<String> lines = new ArrayList<>();
        var axis = s.design().axes().get(0);
        Metric read = s.metrics().get(0);
        for (Row row : finished) {
            String value = Units.format(row.values()[0], axis.value().dimension());
            String result = row.error() != null ? "not run: " + row.error()
                    : Double.isNaN(row.metrics()[0]) ? "—" : value(row.metrics()[0], read);
            lines.add(axis.path() + " = " + value + "   →   " + read.text() + " = " + result);
        }
        points.getItems().setAll(lines);
        if (png != null) {
            shown = p;
            plot.setImage(new Image(new ByteArrayInputStream(png)));
            save.setDisable(false);
        }
    }

    /** A metric's value in its unit's display form; a ratio as a plain number with its unit symbol. */
    private static String value(double v, Metric m) {
        return m instanceof Metric.Term t ? Units.format(v, t.kind().dimension())
                : String.format(Locale.ROOT, "%.4g %s", v, m.unit()).strip();
    }

    private void stopRun() {
        if (runner != null) {
            runner.stop();
        }
    }

    /** Replaces the scene with the chosen point's variant, as one undoable edit. */
    private void loadVariant() {
        int i = points.getSelectionModel().getSelectedIndex();
        if (i < 0 || i >= rows.size()) {
            return;
        }
        Row row = rows.get(i);
        org.kinduct.scene.Scene variant = study.sceneAt(row.point());
        String what = study.design().axes().get(0).path() + " = "
                + Units.format(row.values()[0], study.design().axes().get(0).value().dimension());
        vm.document().apply("Load variant " + what, s -> variant);
    }

    private void savePlot() {
        Plot p = shown;
        FileChooser chooser = new FileChooser();
        chooser.setTitle("Save plot");
        chooser.getExtensionFilters().addAll(new FileChooser.ExtensionFilter("PNG image", "*.png"),
                new FileChooser.ExtensionFilter("SVG drawing", "*.svg"));
        File file = chooser.showSaveDialog(stage);
        if (file == null || p == null) {
            return;
        }
        worker.execute(() -> {
            String said;
            try {
                byte[] bytes = file.getName().toLowerCase(Locale.ROOT).endsWith(".svg")
                        ? PlotFiles.svg(p).getBytes(StandardCharsets.UTF_8) : PlotFiles.png(p);
                SceneFiles.writeAtomically(file.toPath(), bytes);
                said = "Saved " + file;
            } catch (IOException e) {
                said = "Could not save the plot: " + e.getMessage();
            }
            String text = said;
            Platform.runLater(() -> status.setText(text));
        });
    }
}

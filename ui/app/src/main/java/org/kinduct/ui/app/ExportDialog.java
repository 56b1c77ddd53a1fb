package org.kinduct.ui.app;

import org.kinduct.render.export.ExportInstant;
import org.kinduct.render.export.Exporter;
import org.kinduct.render.export.SnapshotOptions;
import org.kinduct.render.export.ViewChoice;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import javafx.application.Platform;
import javafx.geometry.Insets;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.RadioButton;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.stage.FileChooser;
import javafx.stage.Window;
import org.kinduct.report.Version;
import org.kinduct.scene.Scene;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.ExportTimes;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.paint.Quantities;

/**
 * The editor's export dialog: format, size, resolution, view and time, then a file chooser. It
 * remembers the last choices ({@link ExportPreferences}, read and written on the {@code io}
 * executor) and exports off the UI thread, reporting in the editor's status line.
 */
public final class ExportDialog {

    private final Window owner;
    private final EditorViewModel vm;
    private final Path home;
    private final Executor io;
    private final ComboBox<ExportPreferences.Format> format = new ComboBox<>();
    private final TextField width = new TextField();
    private final TextField dpi = new TextField();
    private final ComboBox<String> time = new ComboBox<>();
    private final RadioButton currentView = new RadioButton("Current view");
    private final RadioButton wholeScene = new RadioButton("Whole scene");
    private Choice chosen;
    /** The instants offered, for the scene and the time shown when the dialog opened. */
    private List<ExportTimes.Choice> instants = List.of();

    private ExportDialog(Window owner, EditorViewModel vm, Path home, Executor io) {
        this.owner = owner;
        this.vm = vm;
        this.home = home;
        this.io = io;
    }

    /**
     * Shows the dialog for the editor's scene, view and time, once the choices kept in
     * {@code home} are read (on {@code io}).
     */
    public static void show(Window owner, EditorViewModel vm, Path home, Executor io) {
        ExportDialog dialog = new ExportDialog(owner, vm, home, io);
        Futures.watch(CompletableFuture.supplyAsync(() -> ExportPreferences.load(home), io)
                .thenAcceptAsync(dialog::run, Platform::runLater));
    }

    private void run(ExportPreferences prefs) {
        Dialog<ButtonType> d = new Dialog<>();
        d.initOwner(owner);
        d.setTitle("Export");
        d.setHeaderText("Annotated snapshot or data of \"" + sceneName(vm.scene()) + "\"");
        ButtonType export = new ButtonType("Export…", ButtonBar.ButtonData.OK_DONE);
        d.getDialogPane().getButtonTypes().addAll(export, ButtonType.CANCEL);
        d.getDialogPane().setId("export-dialog");
        format.getItems().setAll(ExportPreferences.Format.values());
        format.setValue(prefs.format());
        format.setId("export-format");
        width.setText(Integer.toString(prefs.widthPx()));
        width.setId("export-width");
        dpi.setText(Integer.toString(prefs.dpi()));
        dpi.setId("export-dpi");
        // The instant that answers "how many volts" by default; a conductor's peak, the time shown,
        // or any time typed as --at takes it, on request.
        instants = ExportTimes.of(vm.scene(), vm.clock().time());
        time.getItems().setAll(instants.stream().map(ExportTimes.Choice::label).toList());
        time.setEditable(true);
        time.setValue(instants.get(0).label());
        time.setPromptText("peak, peak:ID or a time such as 50 ms");
        time.setTooltip(new Tooltip("Choose, or type what kinduct export --at takes: peak, peak:ID or a time"));
        time.setMaxWidth(Double.MAX_VALUE);
        time.setId("export-time");
        ToggleGroup views = new ToggleGroup();
        currentView.setToggleGroup(views);
        wholeScene.setToggleGroup(views);
        (prefs.wholeScene() ? wholeScene : currentView).setSelected(true);
        GridPane grid = new GridPane();
        grid.setHgap(10);
        grid.setVgap(8);
        grid.setPadding(new Insets(12));
        grid.addRow(0, new Label("Export"), format);
        grid.addRow(1, new Label("Width (pixels)"), width);
        grid.addRow(2, new Label("Resolution (dpi)"), dpi);
        grid.addRow(3, new Label("Shows"), new HBox(12, currentView, wholeScene));
        grid.addRow(4, new Label("At time"), time);
        Label note = new Label("Time series and JSON cover the scene's whole time window.");
        note.setWrapText(true);
        grid.add(note, 0, 5, 2, 1);
        Runnable enable = () -> {
            boolean image = format.getValue() == ExportPreferences.Format.PNG
                    || format.getValue() == ExportPreferences.Format.SVG
                    || format.getValue() == ExportPreferences.Format.PDF;
            width.setDisable(!image);
            dpi.setDisable(format.getValue() != ExportPreferences.Format.PNG);
        };
        format.setOnAction(e -> enable.run());
        enable.run();
        d.getDialogPane().setContent(grid);
        d.getDialogPane().lookupButton(export).addEventFilter(javafx.event.ActionEvent.ACTION, e -> {
            chosen = read();
            if (chosen == null) {
                e.consume();
            }
        });
        d.showAndWait().filter(b -> b == export).ifPresent(b -> chooseAndExport(chosen, prefs.folder()));
    }

    /** The dialog's values as options, or null after telling the user what is wrong. */
    private Choice read() {
        try {
            int w = Integer.parseInt(width.getText().strip());
            int r = Integer.parseInt(dpi.getText().strip());
            ExportInstant t = ExportTimes.parse(time.getEditor().getText(), instants);
            ViewChoice view = wholeScene.isSelected() ? new ViewChoice.Fit() : new ViewChoice.Current(vm.view().view());
            EnumSet<Layer> layers = vm.view().layers().isEmpty() ? EnumSet.noneOf(Layer.class)
                    : EnumSet.copyOf(vm.view().layers());
            SnapshotOptions options = new SnapshotOptions(t, w, r, view, layers, vm.view().rangeProperty().get(),
                    LocalDate.now(ZoneId.systemDefault()), Version.text());
            return new Choice(format.getValue(), options);
        } catch (NumberFormatException e) {
            vm.say("Export: width and resolution must be whole numbers");
        } catch (IllegalArgumentException e) {
            vm.say("Export: " + e.getMessage());
        }
        return null;
    }

    private record Choice(ExportPreferences.Format format, SnapshotOptions options) {
    }

    private void chooseAndExport(Choice c, Path lastFolder) {
        FileChooser chooser = new FileChooser();
        chooser.setTitle("Export " + c.format());
        String ext = c.format().extension();
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter(c.format().toString(), "*." + ext));
        Path folder = lastFolder != null ? lastFolder : vm.document().file() != null
                ? vm.document().file().toAbsolutePath().getParent() : null;
        if (folder != null && Files.isDirectory(folder)) {
            chooser.setInitialDirectory(folder.toFile());
        }
        chooser.setInitialFileName(baseName(vm.scene(), c) + "." + ext);
        File file = chooser.showSaveDialog(owner);
        if (file == null) {
            return;
        }
        Path target = file.toPath();
        remember(c, target.toAbsolutePath().getParent());
        Scene scene = vm.scene();
        vm.say("Exporting " + target.getFileName() + "…");
        Thread worker = new Thread(() -> {
            String message;
            try {
                new Exporter(scene, c.options()).write(targets(c.format(), target));
                message = "Exported " + target.getFileName();
            } catch (IOException | RuntimeException e) {
                message = "Export failed: " + e.getMessage();
            }
            String shown = message;
            Platform.runLater(() -> vm.say(shown));
        }, "kinduct-export");
        worker.setDaemon(true);
        worker.start();
    }

    private void remember(Choice c, Path folder) {
        ExportPreferences prefs = new ExportPreferences(c.format(), c.options().widthPx(), c.options().dpi(),
                c.options().view() instanceof ViewChoice.Fit, folder);
        io.execute(() -> {
            try {
                prefs.save(home);
            } catch (IOException e) {
                Platform.runLater(() -> vm.say("Could not keep the export settings: " + e.getMessage()));
            }
        });
    }

    static Exporter.Targets targets(ExportPreferences.Format format, Path file) {
        return switch (format) {
            case PNG -> Exporter.Targets.none().withPng(file);
            case SVG -> Exporter.Targets.none().withSvg(file);
            case PDF -> Exporter.Targets.none().withPdf(file);
            case SERIES_CSV -> Exporter.Targets.none().withSeriesCsv(file);
            case FIELD_CSV -> Exporter.Targets.none().withFieldCsv(file);
            case JSON -> Exporter.Targets.none().withJson(file);
        };
    }

    private static String sceneName(Scene scene) {
        return scene.name().isEmpty() ? "untitled" : scene.name();
    }

    /** "-t50.0ms" for a time, "-peak" or "-peak-pickup" for a peak. */
    private static String instantSuffix(ExportInstant instant) {
        if (instant instanceof ExportInstant.At at) {
            return "-t" + Quantities.time(at.tS()).replaceAll("[^A-Za-z0-9.]", "");
        }
        String id = ((ExportInstant.Peak) instant).conductorId();
        return "-peak" + (id == null ? "" : "-" + id.replaceAll("[^A-Za-z0-9]+", "-"));
    }

    /** A file name from the scene's name and the instant, e.g. {@code rod-on-a-cart-t50ms}. */
    private static String baseName(Scene scene, Choice c) {
        String slug = sceneName(scene).toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-|-$", "");
        String suffix = switch (c.format()) {
            case SERIES_CSV -> "-series";
            case JSON -> "-results";
            case FIELD_CSV -> "-field" + instantSuffix(c.options().instant());
            default -> instantSuffix(c.options().instant());
        };
        return (slug.isEmpty() ? "scene" : slug) + suffix;
    }
}

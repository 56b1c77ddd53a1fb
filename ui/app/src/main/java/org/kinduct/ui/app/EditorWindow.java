package org.kinduct.ui.app;

import java.nio.file.Path;
import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import javafx.animation.KeyFrame;
import javafx.animation.Timeline;
import javafx.application.Platform;
import javafx.beans.binding.Bindings;
import javafx.collections.ListChangeListener;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.control.Alert;
import javafx.scene.control.Button;
import javafx.scene.control.CheckMenuItem;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ProgressIndicator;
import javafx.scene.control.Separator;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.Slider;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TextField;
import javafx.scene.control.TextInputDialog;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import javafx.util.Duration;
import org.kinduct.demo.Demos;
import org.kinduct.render.paint.ColourRange;
import org.kinduct.render.paint.ColourScale;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.paint.Quantities;
import org.kinduct.report.EnergyText;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.run.RunResult;
import org.kinduct.ui.edit.DemoBrowserModel;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.FieldMaps;
import org.kinduct.ui.edit.PlaybackClock;
import org.kinduct.ui.edit.PlotSeries;
import org.kinduct.ui.edit.SceneDocument;
import org.kinduct.ui.edit.ShapeFactory;
import org.kinduct.ui.edit.ToolKind;
import org.kinduct.ui.edit.ViewSettings;

/** The main window: menus, tool bar, canvas, properties, time controls, plot, table and status line. */
final class EditorWindow {

    static final Duration AUTOSAVE_EVERY = Duration.seconds(30);
    private static final double ROTATE_STEP_RAD = Math.toRadians(15);
    private static final double HELP_WIDTH_PX = 640;
    /** The first tool of each group after the selection tool; a separator stands before each. */
    private static final Set<ToolKind> GROUP_STARTS = EnumSet.of(ToolKind.WIRE, ToolKind.PATCH, ToolKind.PLATE);
    private static final Insets TOOL_PADDING = new Insets(4, 6, 4, 6);

    private final Stage stage;
    private final EditorViewModel vm;
    private final AppHome home;
    private final Executor io;
    private final DocumentFiles files;
    private final BorderPane root = new BorderPane();
    private final EditorCanvas canvas;
    private final Label cursorLabel = new Label();
    private final Label statusLabel = new Label();
    private final Menu recentMenu = new Menu("Recent files");
    private final TextField entry = new TextField();
    private CompletableFuture<DemoBrowser> demoBrowser;

    /**
     * @param io runs file reading and writing, one job at a time, off the UI thread
     */
    EditorWindow(Stage stage, EditorViewModel vm, SceneStore store, AppHome home, Executor io) {
        this.stage = stage;
        this.vm = vm;
        this.home = home;
        this.io = io;
        this.files = new DocumentFiles(vm, store, home, new Autosave(home.dir()), new FxFileDialogs(stage), io,
                Platform::runLater);
        this.canvas = new EditorCanvas(vm, cursorLabel::setText);
        canvas.setId("editor-canvas");
        statusLabel.setId("status");
        statusLabel.textProperty().bind(vm.statusProperty());
        cursorLabel.setId("cursor-readout");

        VBox top = new VBox(menuBar(), toolBar(), new DescriptionStrip(vm.document()));
        root.setTop(top);

        StackPane canvasStack = new StackPane(canvas, numericEntry());
        StackPane.setAlignment(entry, Pos.BOTTOM_CENTER);
        StackPane.setMargin(entry, new Insets(0, 0, 50, 0));

        PropertiesPanel properties = new PropertiesPanel(vm);
        SplitPane centre = new SplitPane(canvasStack, properties);
        centre.setDividerPositions(0.76);
        SplitPane.setResizableWithParent(properties, false);

        TimePlot plot = new TimePlot(vm);
        ComboBox<PlotSeries.Quantity> plotWhat = new ComboBox<>();
        plotWhat.setId("plot-quantity");
        plotWhat.getItems().setAll(PlotSeries.Quantity.values());
        plotWhat.setValue(PlotSeries.Quantity.EMF);
        plotWhat.setOnAction(e -> plot.setQuantity(plotWhat.getValue()));
        Runnable fit = () -> plotWhat.setValue(PlotSeries.fitting(vm.scene(), plotWhat.getValue()));
        vm.document().sceneProperty().addListener((obs, old, scene) -> fit.run());
        fit.run();
        VBox plotBox = new VBox(2, plotWhat, plot);
        VBox.setVgrow(plot, Priority.ALWAYS);
        ReadoutTable table = new ReadoutTable(vm);
        SheetReadoutTable sheets = new SheetReadoutTable(vm);
        VBox tableBox = new VBox(2, table, sheets, inductanceLine(), energyLine());
        VBox.setVgrow(table, Priority.ALWAYS);
        VBox.setVgrow(sheets, Priority.ALWAYS);
        SplitPane lower = new SplitPane(plotBox, tableBox);
        // The table's eight columns take more room than the plot needs.
        lower.setDividerPositions(0.34);
        lower.setPrefHeight(200);

        SplitPane vertical = new SplitPane(centre, lower);
        vertical.setOrientation(Orientation.VERTICAL);
        vertical.setDividerPositions(0.72);
        root.setCenter(vertical);

        HBox status = new HBox(18, cursorLabel, statusLabel);
        status.setPadding(new Insets(3, 8, 3, 8));
        status.setStyle("-fx-background-color: #ecece8;");
        root.setBottom(new VBox(timeBar(), status));

        Timeline autosave = new Timeline(new KeyFrame(AUTOSAVE_EVERY, e -> files.autosave()));
        autosave.setCycleCount(Timeline.INDEFINITE);
        autosave.play();
        stage.titleProperty().bind(vm.document().titleProperty());
        files.recent().addListener((ListChangeListener<Path>) c -> refreshRecent());
        refreshRecent();
    }

    BorderPane root() {
        return root;
    }

    EditorCanvas canvas() {
        return canvas;
    }

    DocumentFiles files() {
        return files;
    }

    /** The box for typed lengths and coordinates while drawing. */
    private TextField numericEntry() {
        entry.setId("numeric-entry");
        entry.setPromptText("Type a length or x, y and press Enter");
        entry.setMaxWidth(300);
        entry.setOnAction(e -> {
            String error = canvas.gestures().typed(entry.getText());
            if (error.isEmpty()) {
                entry.clear();
                canvas.requestFocus();
            } else {
                vm.say("Entry: " + error);
            }
        });
        // Shown only once the user types while drawing, so it never sits where the next click goes.
        entry.visibleProperty().bind(vm.view().toolProperty().isNotEqualTo(ToolKind.SELECT)
                .and(entry.focusedProperty().or(entry.textProperty().isNotEmpty())));
        entry.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ESCAPE) {
                entry.clear();
                canvas.requestFocus();
            }
        });
        canvas.setOnKeyTyped(e -> {
            String ch = e.getCharacter();
            if (canvas.gestures().isDrawing() && !ch.isEmpty() && "0123456789.-".indexOf(ch.charAt(0)) >= 0) {
                entry.setText(ch);
                entry.requestFocus();
                entry.positionCaret(1);
            }
        });
        return entry;
    }

    // ---- menus ----

    /** Edit ▸ Vary a value…, of the one selected object, or of the whole scene. */
    private void varyValue() {
        Set<String> selection = vm.document().selection();
        SweepWindow.show(stage, vm, selection.size() == 1 ? selection.iterator().next() : null);
    }

    /** File ▸ Save; the save's own chain reports a failure. */
    private void save() {
        var unused = files.save();
    }

    /** File ▸ Save as…; the save's own chain reports a failure. */
    private void saveAs() {
        var unused = files.saveAs();
    }

    private MenuBar menuBar() {
        SceneDocument document = vm.document();
        ViewSettings view = vm.view();
        PlaybackClock clock = vm.clock();
        Menu file = new Menu("File");
        file.getItems().addAll(
                item("New scene", "Shortcut+N", files::newScene),
                item("Open…", "Shortcut+O", files::openChosen),
                recentMenu,
                item("Open demo…", null, this::browseDemos),
                new SeparatorMenuItem(),
                item("Save", "Shortcut+S", this::save),
                item("Save as…", "Shortcut+Shift+S", this::saveAs),
                item("Export…", "Shortcut+E", () -> ExportDialog.show(stage, vm, home.dir(), io)),
                new SeparatorMenuItem(),
                item("Quit", "Shortcut+Q", () -> files.quit(stage::close)));
        MenuItem undo = item("Undo", "Shortcut+Z", document::undo);
        undo.disableProperty().bind(document.canUndoProperty().not());
        MenuItem redo = item("Redo", "Shortcut+Shift+Z", document::redo);
        redo.disableProperty().bind(document.canRedoProperty().not());
        Menu edit = new Menu("Edit");
        edit.getItems().addAll(undo, redo, new SeparatorMenuItem(),
                item("Delete", null, document::deleteSelection),
                item("Duplicate", "Shortcut+D", canvas.gestures()::duplicateSelection),
                item("Rotate 15° left", "Shortcut+R", () -> document.rotateSelection(ROTATE_STEP_RAD, vm.seen())),
                item("Rotate 15° right", "Shortcut+Shift+R",
                        () -> document.rotateSelection(-ROTATE_STEP_RAD, vm.seen())),
                item("Select all", "Shortcut+A", document::selectAll),
                new SeparatorMenuItem(),
                item("Add uniform background field", null,
                        () -> document.add("Add background field", ShapeFactory::addBackground)),
                item("Add field map…", null, files::addFieldMap),
                item("Earth's field…", null, () -> EarthFieldDialog.show(stage, document)),
                new SeparatorMenuItem(),
                item("Vary a value…", "Shortcut+Shift+V", this::varyValue));
        Menu viewMenu = new Menu("View");
        viewMenu.getItems().add(item("Zoom to fit  (F)", null, vm::zoomToFit));
        viewMenu.getItems().add(new SeparatorMenuItem());
        for (Layer layer : Layer.values()) {
            CheckMenuItem c = new CheckMenuItem(layer.label());
            c.setSelected(view.layers().contains(layer));
            c.selectedProperty().addListener((obs, was, on) -> {
                if (on) {
                    view.layers().add(layer);
                } else {
                    view.layers().remove(layer);
                }
                vm.maps().request(FieldMaps.Quality.FINE);
            });
            viewMenu.getItems().add(c);
        }
        CheckMenuItem grid = new CheckMenuItem("Snap to grid");
        grid.selectedProperty().bindBidirectional(view.snapToGridProperty());
        CheckMenuItem angles = new CheckMenuItem("Snap to 15° steps");
        angles.selectedProperty().bindBidirectional(view.snapAnglesProperty());
        CheckMenuItem autoRange = new CheckMenuItem("Automatic colour range");
        autoRange.setSelected(view.rangeProperty().get().auto());
        autoRange.selectedProperty().addListener((obs, was, on) -> view.rangeProperty().set(
                new ColourRange(on, view.rangeProperty().get().manualLimitT(), view.rangeProperty().get().kind())));
        CheckMenuItem logScale = new CheckMenuItem("Logarithmic colour scale");
        logScale.setSelected(view.rangeProperty().get().kind() == ColourScale.Kind.LOG);
        logScale.selectedProperty().addListener((obs, was, on) -> view.rangeProperty().set(view.rangeProperty().get()
                .withKind(on ? ColourScale.Kind.LOG : ColourScale.Kind.LINEAR)));
        view.rangeProperty().addListener((obs, old, r) -> {
            autoRange.setSelected(r.auto());
            logScale.setSelected(r.kind() == ColourScale.Kind.LOG);
        });
        viewMenu.getItems().addAll(new SeparatorMenuItem(), autoRange, logScale,
                item("Fixed colour limit…", null, this::askLimit), new SeparatorMenuItem(), grid, angles,
                new SeparatorMenuItem(), item("Paint time overlay", "F12", canvas::toggleFrameTime));
        Menu play = new Menu("Motion");
        play.getItems().addAll(
                item("Play / pause  (K)", null, clock::togglePlaying),
                item("Step forward  (.)", null, () -> clock.step(1)),
                item("Step back  (,)", null, () -> clock.step(-1)),
                item("Back to start  (Home)", null, clock::resetTime));
        Menu help = new Menu("Help");
        help.getItems().addAll(
                item("Safety notes…", null, () -> info("Safety notes", HelpTexts.CAUTION)),
                item("Signs and overlays…", null, () -> info("Signs and overlays", HelpTexts.CONVENTIONS)),
                item("Mouse and keys…", null, () -> info("Mouse and keys", HelpTexts.KEYS)));
        help.setId("help-menu");
        MenuBar bar = new MenuBar(file, edit, viewMenu, play, help);
        bar.setId("menu-bar");
        return bar;
    }

    /** Asks for a fixed symmetric colour limit ("5 mT", "20 G"); refuses anything but a positive flux density. */
    private void askLimit() {
        ViewSettings view = vm.view();
        TextInputDialog d = new TextInputDialog(Quantities.bz(view.rangeProperty().get().scaleFor(vm.maps().raster())
                .limitT()));
        d.setTitle("Colour limit");
        d.setHeaderText("Colours saturate at ± this flux density");
        d.initOwner(stage);
        d.showAndWait().ifPresent(text -> {
            try {
                view.rangeProperty().set(new ColourRange(false, Units.parse(text, Dimension.FLUX_DENSITY),
                        view.rangeProperty().get().kind()));
            } catch (IllegalArgumentException e) {
                vm.say("Colour limit: " + e.getMessage());
            }
        });
    }

    /**
     * File ▸ Open demo…: the browser, made once (off this thread: it reads every demo) so its
     * thumbnails render only once.
     */
    private void browseDemos() {
        if (demoBrowser == null) {
            demoBrowser = CompletableFuture.supplyAsync(DemoBrowserModel::shipped, io)
                    .thenApplyAsync(DemoBrowser::new, Platform::runLater);
        }
        Futures.watch(demoBrowser.handleAsync((browser, failure) -> {
            if (failure != null) {
                // Asked for again next time.
                demoBrowser = null;
                vm.say("Could not read the demos: " + Futures.cause(failure).getMessage());
                return null;
            }
            browser.choose(stage).flatMap(e -> Demos.resource(e.name()))
                    .ifPresent(r -> files.afterAsking(() -> {
                        var unused = files.openDemo(r); // watched by its own chain
                    }));
            return null;
        }, Platform::runLater));
    }

    private static MenuItem item(String text, String accelerator, Runnable action) {
        MenuItem m = new MenuItem(text);
        if (accelerator != null) {
            m.setAccelerator(KeyCombination.keyCombination(accelerator));
        }
        m.setOnAction(e -> action.run());
        return m;
    }

    /**
     * The tools, in groups (selection; wires and loops; sources; plates and channels), wrapping
     * onto a second row in a narrow window rather than hiding tools behind an overflow button.
     */
    private FlowPane toolBar() {
        FlowPane bar = new FlowPane(4, 4);
        bar.getStyleClass().add("tool-bar");
        bar.setPadding(new Insets(4, 6, 4, 6));
        ToggleGroup tools = new ToggleGroup();
        for (ToolKind kind : ToolKind.values()) {
            if (GROUP_STARTS.contains(kind)) {
                bar.getChildren().add(new Separator(Orientation.VERTICAL));
            }
            ToggleButton b = new ToggleButton(kind.label());
            // A little narrower than the default, so every tool fits one row 1280 px wide.
            b.setPadding(TOOL_PADDING);
            b.setId("tool-" + kind.name().toLowerCase(Locale.ROOT).replace('_', '-'));
            b.setTooltip(new Tooltip(kind.help()));
            b.setToggleGroup(tools);
            b.setSelected(vm.view().toolProperty().get() == kind);
            b.setOnAction(e -> {
                vm.view().toolProperty().set(kind);
                if (kind != ToolKind.SELECT) {
                    vm.say(kind.label() + ": " + kind.help() + ". Type a length, or x, y, to place a point exactly.");
                }
                canvas.requestFocus();
            });
            vm.view().toolProperty().addListener((obs, old, t) -> b.setSelected(t == kind));
            bar.getChildren().add(b);
        }
        return bar;
    }

    private HBox timeBar() {
        PlaybackClock clock = vm.clock();
        Button play = new Button();
        play.setId("play");
        play.textProperty().bind(Bindings.when(clock.playingProperty()).then("Pause").otherwise("Play"));
        play.setOnAction(e -> clock.togglePlaying());
        Button back = new Button("◀ step");
        back.setOnAction(e -> clock.step(-1));
        Button fwd = new Button("step ▶");
        fwd.setId("step");
        fwd.setOnAction(e -> clock.step(1));
        Button reset = new Button("Start");
        reset.setOnAction(e -> clock.resetTime());
        ComboBox<Double> speed = new ComboBox<>();
        speed.setId("speed");
        speed.getItems().setAll(0.01, 0.1, 0.25, 0.5, 1.0, 2.0, 5.0, 10.0);
        speed.setValue(1.0);
        speed.setOnAction(e -> clock.speedProperty().set(speed.getValue()));
        speed.setTooltip(new Tooltip("Scene seconds per real second"));
        Slider scrubber = new Slider();
        scrubber.setId("scrubber");
        HBox.setHgrow(scrubber, Priority.ALWAYS);
        Runnable range = () -> {
            scrubber.setMin(vm.scene().time().t0S());
            scrubber.setMax(vm.scene().time().t1S());
        };
        range.run();
        vm.document().sceneProperty().addListener(o -> range.run());
        scrubber.setValue(clock.time());
        clock.timeProperty().addListener((obs, old, t) -> {
            if (!scrubber.isValueChanging() && Math.abs(scrubber.getValue() - t.doubleValue()) > 0) {
                scrubber.setValue(t.doubleValue());
            }
        });
        scrubber.valueProperty().addListener((obs, old, t) -> {
            if (Math.abs(t.doubleValue() - clock.time()) > 0) {
                clock.seek(t.doubleValue());
            }
        });
        Label time = new Label();
        time.setId("time-label");
        time.setMinWidth(140);
        time.textProperty().bind(Bindings.createStringBinding(
                () -> "t = " + Quantities.time(clock.time()) + " of " + Quantities.time(vm.scene().time().t1S()),
                clock.timeProperty(), vm.document().sceneProperty()));
        ProgressIndicator simulating = new ProgressIndicator();
        simulating.setId("simulating");
        simulating.setPrefSize(18, 18);
        simulating.setTooltip(new Tooltip("Simulating the free bodies; the last result is shown meanwhile"));
        simulating.visibleProperty().bind(vm.results().simulatingProperty());
        simulating.managedProperty().bind(vm.results().simulatingProperty());
        simulating.progressProperty().bind(vm.results().simulationProgressProperty());
        Label slow = new Label();
        slow.setId("playback-note");
        slow.setStyle("-fx-text-fill: #9a4a00;");
        slow.textProperty().bind(vm.playbackNoteProperty());
        slow.managedProperty().bind(slow.textProperty().isNotEmpty());
        HBox bar = new HBox(8, play, back, fwd, reset, new Label("speed ×"), speed, slow, scrubber, simulating, time);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(4, 8, 4, 8));
        return bar;
    }

    /**
     * Self- and mutual inductance of the closed loops at the run's start (the run's own, computed
     * off this thread), under the readout table.
     */
    private Label inductanceLine() {
        Label line = infoLine("inductance");
        Runnable update = () -> {
            line.setText(vm.results().inductanceLineProperty().get());
            line.setVisible(!line.getText().isEmpty());
            line.setManaged(line.isVisible());
        };
        vm.results().inductanceLineProperty().addListener(o -> update.run());
        update.run();
        return line;
    }

    /** The energy audit of a simulated run, under the readout table; hidden for prescribed motion. */
    private Label energyLine() {
        Label line = infoLine("energy-audit");
        Runnable update = () -> {
            var audit = vm.results().currentResult().flatMap(RunResult::audit);
            line.setText(audit.map(EnergyText::of).orElse(""));
            line.setVisible(audit.isPresent());
            line.setManaged(line.isVisible());
        };
        vm.results().resultProperty().addListener(o -> update.run());
        vm.document().sceneProperty().addListener(o -> update.run());
        update.run();
        return line;
    }

    private static Label infoLine(String id) {
        Label line = new Label();
        line.setId(id);
        line.setWrapText(true);
        line.setMinHeight(Region.USE_PREF_SIZE);
        line.setPadding(new Insets(2, 6, 2, 6));
        return line;
    }

    private void refreshRecent() {
        recentMenu.getItems().clear();
        for (Path p : files.recent()) {
            recentMenu.getItems().add(item(p.toString(), null, () -> files.afterAsking(() -> {
                var unused = files.open(p); // watched by its own chain
            })));
        }
        recentMenu.setDisable(files.recent().isEmpty());
    }

    private void info(String title, String text) {
        Alert a = new Alert(Alert.AlertType.INFORMATION);
        a.setTitle(title);
        a.setHeaderText(title);
        Label body = new Label(text);
        body.setWrapText(true);
        // A wrapping label asks for the width of its longest paragraph on one line; a set width
        // makes it wrap instead, so the dialog fits a 1280 × 800 screen.
        body.setPrefWidth(HELP_WIDTH_PX);
        body.setMinHeight(Region.USE_PREF_SIZE);
        a.getDialogPane().setContent(body);
        a.setResizable(true);
        a.initOwner(stage);
        a.show();
    }
}

package org.kinduct.ui.app;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import javafx.animation.KeyFrame;
import javafx.animation.Timeline;
import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.control.Alert;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.CheckMenuItem;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.Slider;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.ToolBar;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Stage;
import javafx.util.Duration;
import org.kinduct.scene.Scene;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.ToolKind;
import org.kinduct.ui.app.ExportDialog;
import org.kinduct.render.paint.Layer;
import org.kinduct.render.paint.Quantities;

/** The main window: menus, tool bar, canvas, properties, time controls, plot, table and status line. */
final class EditorWindow {

    static final Duration AUTOSAVE_EVERY = Duration.seconds(30);
    private static final double ROTATE_STEP_RAD = Math.toRadians(15);

    private final Stage stage;
    private final EditorViewModel vm;
    private final SceneStore store;
    private final AppHome home;
    private final BorderPane root = new BorderPane();
    private final EditorCanvas canvas;
    private final Label cursorLabel = new Label();
    private final Label statusLabel = new Label();
    private final Menu recentMenu = new Menu("Recent files");
    private final TextField entry = new TextField();
    private DemoBrowser demoBrowser;

    EditorWindow(Stage stage, EditorViewModel vm, SceneStore store, AppHome home) {
        this.stage = stage;
        this.vm = vm;
        this.store = store;
        this.home = home;
        this.canvas = new EditorCanvas(vm, cursorLabel::setText);
        canvas.setId("editor-canvas");
        statusLabel.setId("status");
        statusLabel.textProperty().bind(vm.statusProperty());
        cursorLabel.setId("cursor-readout");

        VBox top = new VBox(menuBar(), toolBar(), new DescriptionStrip(vm));
        root.setTop(top);

        entry.setId("numeric-entry");
        entry.setPromptText("Type a length or x, y and press Enter");
        entry.setMaxWidth(300);
        entry.setOnAction(e -> {
            String error = canvas.typed(entry.getText());
            if (error.isEmpty()) {
                entry.clear();
                canvas.requestFocus();
            } else {
                vm.say("Entry: " + error);
            }
        });
        // Shown only once the user types while drawing, so it never sits where the next click goes.
        entry.visibleProperty().bind(vm.toolProperty().isNotEqualTo(ToolKind.SELECT)
                .and(entry.focusedProperty().or(entry.textProperty().isNotEmpty())));
        entry.setOnKeyPressed(e -> {
            if (e.getCode() == javafx.scene.input.KeyCode.ESCAPE) {
                entry.clear();
                canvas.requestFocus();
            }
        });
        StackPane canvasStack = new StackPane(canvas, entry);
        StackPane.setAlignment(entry, Pos.BOTTOM_CENTER);
        StackPane.setMargin(entry, new Insets(0, 0, 50, 0));
        canvas.setOnKeyTyped(e -> {
            String ch = e.getCharacter();
            if (canvas.isDrawing() && !ch.isEmpty() && "0123456789.-".indexOf(ch.charAt(0)) >= 0) {
                entry.setText(ch);
                entry.requestFocus();
                entry.positionCaret(1);
            }
        });

        PropertiesPanel properties = new PropertiesPanel(vm);
        SplitPane centre = new SplitPane(canvasStack, properties);
        centre.setDividerPositions(0.76);
        SplitPane.setResizableWithParent(properties, false);

        TimePlot plot = new TimePlot(vm);
        ComboBox<org.kinduct.ui.edit.PlotSeries.Quantity> plotWhat = new ComboBox<>();
        plotWhat.setId("plot-quantity");
        plotWhat.getItems().setAll(org.kinduct.ui.edit.PlotSeries.Quantity.values());
        plotWhat.setValue(org.kinduct.ui.edit.PlotSeries.Quantity.EMF);
        plotWhat.setOnAction(e -> plot.setQuantity(plotWhat.getValue()));
        VBox plotBox = new VBox(2, plotWhat, plot);
        VBox.setVgrow(plot, Priority.ALWAYS);
        ReadoutTable table = new ReadoutTable(vm);
        VBox tableBox = new VBox(2, table, inductanceLine(), energyLine());
        VBox.setVgrow(table, Priority.ALWAYS);
        SplitPane lower = new SplitPane(plotBox, tableBox);
        lower.setDividerPositions(0.42);
        lower.setPrefHeight(200);

        SplitPane vertical = new SplitPane(centre, lower);
        vertical.setOrientation(Orientation.VERTICAL);
        vertical.setDividerPositions(0.72);
        root.setCenter(vertical);

        HBox status = new HBox(18, cursorLabel, statusLabel);
        status.setPadding(new Insets(3, 8, 3, 8));
        status.setStyle("-fx-background-color: #ecece8;");
        root.setBottom(new VBox(timeBar(), status));

        Timeline autosave = new Timeline(new KeyFrame(AUTOSAVE_EVERY, e -> autosave()));
        autosave.setCycleCount(Timeline.INDEFINITE);
        autosave.play();
        vm.fileProperty().addListener(o -> updateTitle());
        vm.dirtyProperty().addListener(o -> updateTitle());
        updateTitle();
        refreshRecent();
    }

    BorderPane root() {
        return root;
    }

    EditorCanvas canvas() {
        return canvas;
    }

    private void updateTitle() {
        Path f = vm.fileProperty().get();
        String name = f != null ? f.getFileName().toString()
                : vm.scene().name().isEmpty() ? "untitled" : vm.scene().name();
        stage.setTitle((vm.dirtyProperty().get() ? "• " : "") + name + " — Kinduct");
    }

    // ---- menus ----

    private MenuBar menuBar() {
        Menu file = new Menu("File");
        file.getItems().addAll(
                item("New scene", "Shortcut+N", this::newScene),
                item("Open…", "Shortcut+O", this::openDialog),
                recentMenu,
                item("Open demo…", null, this::browseDemos),
                new SeparatorMenuItem(),
                item("Save", "Shortcut+S", this::save),
                item("Save as…", "Shortcut+Shift+S", this::saveAs),
                item("Export…", "Shortcut+E", () -> ExportDialog.show(stage, vm, home.dir())),
                new SeparatorMenuItem(),
                item("Quit", "Shortcut+Q", () -> {
                    if (confirmDiscard()) {
                        stage.close();
                    }
                }));
        MenuItem undo = item("Undo", "Shortcut+Z", vm::undo);
        undo.disableProperty().bind(vm.canUndoProperty().not());
        MenuItem redo = item("Redo", "Shortcut+Shift+Z", vm::redo);
        redo.disableProperty().bind(vm.canRedoProperty().not());
        Menu edit = new Menu("Edit");
        edit.getItems().addAll(undo, redo, new SeparatorMenuItem(),
                item("Delete", null, canvas::deleteSelection),
                item("Duplicate", "Shortcut+D", canvas::duplicateSelection),
                item("Rotate 15° left", "Shortcut+R", () -> canvas.rotateSelection(ROTATE_STEP_RAD)),
                item("Rotate 15° right", "Shortcut+Shift+R", () -> canvas.rotateSelection(-ROTATE_STEP_RAD)),
                item("Select all", "Shortcut+A", this::selectAll),
                new SeparatorMenuItem(),
                item("Add uniform background field", null, this::addBackground));
        Menu view = new Menu("View");
        view.getItems().add(item("Zoom to fit  (F)", null, canvas::zoomToFit));
        view.getItems().add(new SeparatorMenuItem());
        for (Layer layer : Layer.values()) {
            CheckMenuItem c = new CheckMenuItem(layer.label());
            c.setSelected(vm.layers().contains(layer));
            c.selectedProperty().addListener((obs, was, on) -> {
                if (on) {
                    vm.layers().add(layer);
                } else {
                    vm.layers().remove(layer);
                }
                vm.requestField(EditorViewModel.MapQuality.FINE);
            });
            view.getItems().add(c);
        }
        CheckMenuItem grid = new CheckMenuItem("Snap to grid");
        grid.selectedProperty().bindBidirectional(vm.snapToGridProperty());
        CheckMenuItem angles = new CheckMenuItem("Snap to 15° steps");
        angles.selectedProperty().bindBidirectional(vm.snapAnglesProperty());
        CheckMenuItem autoRange = new CheckMenuItem("Automatic colour range");
        autoRange.setSelected(vm.rangeProperty().get().auto());
        autoRange.selectedProperty().addListener((obs, was, on) -> vm.rangeProperty().set(
                new org.kinduct.render.paint.ColourRange(on, vm.rangeProperty().get().manualLimitT(),
                        vm.rangeProperty().get().kind())));
        CheckMenuItem logScale = new CheckMenuItem("Logarithmic colour scale");
        logScale.setSelected(vm.rangeProperty().get().kind() == org.kinduct.render.paint.ColourScale.Kind.LOG);
        logScale.selectedProperty().addListener((obs, was, on) -> vm.rangeProperty().set(vm.rangeProperty().get()
                .withKind(on ? org.kinduct.render.paint.ColourScale.Kind.LOG : org.kinduct.render.paint.ColourScale.Kind.LINEAR)));
        vm.rangeProperty().addListener((obs, old, r) -> {
            autoRange.setSelected(r.auto());
            logScale.setSelected(r.kind() == org.kinduct.render.paint.ColourScale.Kind.LOG);
        });
        view.getItems().addAll(new SeparatorMenuItem(), autoRange, logScale,
                item("Fixed colour limit…", null, this::askLimit),
                new SeparatorMenuItem(), grid, angles, new SeparatorMenuItem(),
                item("Paint time overlay", "F12", canvas::toggleFrameTime));
        Menu play = new Menu("Motion");
        play.getItems().addAll(
                item("Play / pause  (K)", null, () -> vm.playingProperty().set(!vm.playingProperty().get())),
                item("Step forward  (.)", null, () -> vm.step(1)),
                item("Step back  (,)", null, () -> vm.step(-1)),
                item("Back to start  (Home)", null, vm::resetTime));
        Menu help = new Menu("Help");
        help.getItems().addAll(
                item("Safety notes…", null, () -> info("Safety notes", HelpTexts.CAUTION)),
                item("Signs and overlays…", null, () -> info("Signs and overlays", HelpTexts.CONVENTIONS)),
                item("Mouse and keys…", null, () -> info("Mouse and keys", HelpTexts.KEYS)));
        MenuBar bar = new MenuBar(file, edit, view, play, help);
        bar.setId("menu-bar");
        return bar;
    }

    /** Asks for a fixed symmetric colour limit ("5 mT", "20 G"); refuses anything but a positive flux density. */
    private void askLimit() {
        javafx.scene.control.TextInputDialog d = new javafx.scene.control.TextInputDialog(
                Quantities.bz(vm.rangeProperty().get().scaleFor(vm.rasterProperty().get()).limitT()));
        d.setTitle("Colour limit");
        d.setHeaderText("Colours saturate at ± this flux density");
        d.initOwner(stage);
        d.showAndWait().ifPresent(text -> {
            try {
                double limit = org.kinduct.scene.units.Units.parse(text,
                        org.kinduct.scene.units.Dimension.FLUX_DENSITY);
                vm.rangeProperty().set(new org.kinduct.render.paint.ColourRange(false, limit,
                        vm.rangeProperty().get().kind()));
            } catch (IllegalArgumentException e) {
                vm.say("Colour limit: " + e.getMessage());
            }
        });
    }

    /** File ▸ Open demo…: the browser, made once so its thumbnails render only once. */
    private void browseDemos() {
        if (demoBrowser == null) {
            demoBrowser = new DemoBrowser();
        }
        demoBrowser.choose(stage).flatMap(e -> org.kinduct.demo.Demos.resource(e.name())).ifPresent(r -> {
            if (confirmDiscard()) {
                openDemo(r);
            }
        });
    }

    private static MenuItem item(String text, String accelerator, Runnable action) {
        MenuItem m = new MenuItem(text);
        if (accelerator != null) {
            m.setAccelerator(KeyCombination.keyCombination(accelerator));
        }
        m.setOnAction(e -> action.run());
        return m;
    }

    private ToolBar toolBar() {
        ToolBar bar = new ToolBar();
        ToggleGroup tools = new ToggleGroup();
        for (ToolKind kind : ToolKind.values()) {
            ToggleButton b = new ToggleButton(kind.label());
            b.setId("tool-" + kind.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
            b.setTooltip(new Tooltip(kind.help()));
            b.setToggleGroup(tools);
            b.setSelected(vm.toolProperty().get() == kind);
            b.setOnAction(e -> {
                vm.toolProperty().set(kind);
                if (kind != ToolKind.SELECT) {
                    vm.say(kind.label() + ": " + kind.help() + ". Type a length, or x, y, to place a point exactly.");
                }
                canvas.requestFocus();
            });
            vm.toolProperty().addListener((obs, old, t) -> b.setSelected(t == kind));
            bar.getItems().add(b);
        }
        return bar;
    }

    private HBox timeBar() {
        Button play = new Button();
        play.setId("play");
        play.textProperty().bind(Bindings.when(vm.playingProperty()).then("Pause").otherwise("Play"));
        play.setOnAction(e -> vm.playingProperty().set(!vm.playingProperty().get()));
        Button back = new Button("◀ step");
        back.setOnAction(e -> vm.step(-1));
        Button fwd = new Button("step ▶");
        fwd.setId("step");
        fwd.setOnAction(e -> vm.step(1));
        Button reset = new Button("Start");
        reset.setOnAction(e -> vm.resetTime());
        ComboBox<Double> speed = new ComboBox<>();
        speed.setId("speed");
        speed.getItems().setAll(0.01, 0.1, 0.25, 0.5, 1.0, 2.0, 5.0, 10.0);
        speed.setValue(1.0);
        speed.setOnAction(e -> vm.speedProperty().set(speed.getValue()));
        speed.setTooltip(new Tooltip("Scene seconds per real second"));
        Slider scrubber = new Slider();
        scrubber.setId("scrubber");
        HBox.setHgrow(scrubber, Priority.ALWAYS);
        Runnable range = () -> {
            scrubber.setMin(vm.scene().time().t0S());
            scrubber.setMax(vm.scene().time().t1S());
        };
        range.run();
        vm.sceneProperty().addListener(o -> range.run());
        scrubber.setValue(vm.timeProperty().get());
        vm.timeProperty().addListener((obs, old, t) -> {
            if (!scrubber.isValueChanging() && Math.abs(scrubber.getValue() - t.doubleValue()) > 0) {
                scrubber.setValue(t.doubleValue());
            }
        });
        scrubber.valueProperty().addListener((obs, old, t) -> {
            if (Math.abs(t.doubleValue() - vm.timeProperty().get()) > 0) {
                vm.seek(t.doubleValue());
            }
        });
        Label time = new Label();
        time.setId("time-label");
        time.setMinWidth(140);
        time.textProperty().bind(Bindings.createStringBinding(
                () -> "t = " + Quantities.time(vm.timeProperty().get()) + " of " + Quantities.time(vm.scene().time().t1S()),
                vm.timeProperty(), vm.sceneProperty()));
        javafx.scene.control.ProgressIndicator simulating = new javafx.scene.control.ProgressIndicator();
        simulating.setId("simulating");
        simulating.setPrefSize(18, 18);
        simulating.setTooltip(new Tooltip("Simulating the free bodies; the last result is shown meanwhile"));
        simulating.visibleProperty().bind(vm.simulatingProperty());
        simulating.managedProperty().bind(vm.simulatingProperty());
        simulating.progressProperty().bind(vm.simulationProgressProperty());
        HBox bar = new HBox(8, play, back, fwd, reset, new Label("speed ×"), speed, scrubber, simulating, time);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(4, 8, 4, 8));
        return bar;
    }

    /** Self- and mutual inductance of the closed loops at the run's start (computed off this thread), under the readout table. */
    private Label inductanceLine() {
        Label line = new Label();
        line.setId("inductance");
        line.setWrapText(true);
        line.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        line.setPadding(new Insets(2, 6, 2, 6));
        Runnable update = () -> {
            line.setText(vm.inductanceLineProperty().get());
            line.setVisible(!line.getText().isEmpty());
            line.setManaged(line.isVisible());
        };
        vm.inductanceLineProperty().addListener(o -> update.run());
        update.run();
        return line;
    }

    /** The energy audit of a simulated run, under the readout table; hidden for prescribed motion. */
    private Label energyLine() {
        Label line = new Label();
        line.setId("energy-audit");
        line.setWrapText(true);
        line.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        line.setPadding(new Insets(2, 6, 2, 6));
        Runnable update = () -> {
            var audit = vm.currentResult().flatMap(org.kinduct.solver.run.RunResult::audit);
            line.setText(audit.map(org.kinduct.report.EnergyText::of).orElse(""));
            line.setVisible(audit.isPresent());
            line.setManaged(line.isVisible());
        };
        vm.resultProperty().addListener(o -> update.run());
        update.run();
        return line;
    }

    private void addBackground() {
        if (vm.apply("Add background field", org.kinduct.ui.edit.ShapeFactory::addBackground)) {
            List<org.kinduct.scene.Source> sources = vm.scene().sources();
            vm.select(Set.of(sources.get(sources.size() - 1).id()));
        }
    }

    private void selectAll() {
        Set<String> ids = new java.util.HashSet<>();
        vm.scene().sources().forEach(s -> ids.add(s.id()));
        vm.scene().conductors().forEach(c -> ids.add(c.id()));
        vm.select(ids);
    }

    // ---- files ----

    void newScene() {
        if (confirmDiscard()) {
            vm.load(Scene.empty("untitled"), null);
            canvas.zoomToFit();
        }
    }

    private void openDialog() {
        if (!confirmDiscard()) {
            return;
        }
        FileChooser chooser = chooser();
        java.io.File f = chooser.showOpenDialog(stage);
        if (f != null) {
            open(f.toPath());
        }
    }

    /** Opens a scene file; on failure the current scene stays and the message says what is wrong. */
    boolean open(Path file) {
        try {
            Scene s = store.read(file);
            vm.load(s, file);
            rememberRecent(file);
            canvas.zoomToFit();
            vm.say("Opened " + file.getFileName());
            return true;
        } catch (SceneStore.LoadFailure e) {
            vm.say("Could not open " + file.getFileName() + " — your scene is unchanged");
            error("Could not open " + file.getFileName(), e.getMessage());
            return false;
        }
    }

    void openDemo(String resource) {
        try {
            vm.load(store.readResource(resource), null);
            canvas.zoomToFit();
        } catch (SceneStore.LoadFailure e) {
            error("Could not open the demo " + resource, e.getMessage());
        }
    }

    private boolean save() {
        Path f = vm.fileProperty().get();
        return f == null ? saveAs() : saveTo(f);
    }

    private boolean saveAs() {
        FileChooser chooser = chooser();
        chooser.setInitialFileName(vm.scene().name().isEmpty() ? "scene.json" : vm.scene().name() + ".json");
        java.io.File f = chooser.showSaveDialog(stage);
        return f != null && saveTo(f.toPath());
    }

    boolean saveTo(Path file) {
        try {
            store.write(vm.scene(), file);
            vm.markSaved(file);
            rememberRecent(file);
            vm.say("Saved " + file.getFileName());
            return true;
        } catch (SceneStore.LoadFailure e) {
            error("Could not save " + file.getFileName(), e.getMessage());
            return false;
        }
    }

    private FileChooser chooser() {
        FileChooser chooser = new FileChooser();
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("Kinduct scenes (*.json)", "*.json"));
        Path f = vm.fileProperty().get();
        if (f != null && f.toAbsolutePath().getParent() != null) {
            chooser.setInitialDirectory(f.toAbsolutePath().getParent().toFile());
        }
        return chooser;
    }

    private void rememberRecent(Path file) {
        home.remember(file);
        refreshRecent();
    }

    private void refreshRecent() {
        List<Path> files = home.recent();
        recentMenu.getItems().clear();
        for (Path p : files) {
            recentMenu.getItems().add(item(p.toString(), null, () -> {
                if (confirmDiscard()) {
                    open(p);
                }
            }));
        }
        recentMenu.setDisable(files.isEmpty());
    }

    /** True when there is nothing unsaved, or the user saved or chose to discard it. */
    boolean confirmDiscard() {
        if (!vm.dirtyProperty().get()) {
            return true;
        }
        ButtonType saveIt = new ButtonType("Save", ButtonBar.ButtonData.YES);
        ButtonType discard = new ButtonType("Discard changes", ButtonBar.ButtonData.NO);
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, "The scene has unsaved changes.", saveIt, discard,
                ButtonType.CANCEL);
        a.setHeaderText("Save changes first?");
        a.initOwner(stage);
        Optional<ButtonType> answer = a.showAndWait();
        if (answer.isEmpty() || answer.get() == ButtonType.CANCEL) {
            return false;
        }
        return answer.get() == discard || save();
    }

    /** Writes the scene to the autosave file when it has unsaved changes. */
    void autosave() {
        if (!vm.dirtyProperty().get()) {
            return;
        }
        try {
            Files.createDirectories(home.dir());
            store.write(vm.scene(), home.autosave());
        } catch (java.io.IOException | SceneStore.LoadFailure e) {
            vm.say("Autosave failed: " + e.getMessage());
        }
    }

    /** Removes the autosave after a clean exit. */
    void clearAutosave() {
        try {
            Files.deleteIfExists(home.autosave());
        } catch (java.io.IOException e) {
            System.err.println("Kinduct: could not remove " + home.autosave() + ": " + e.getMessage());
        }
    }

    /** Offers to restore an autosave left by a session that did not end cleanly. */
    void offerRecovery() {
        Path auto = home.autosave();
        if (!Files.isRegularFile(auto)) {
            return;
        }
        Alert a = new Alert(Alert.AlertType.CONFIRMATION,
                "Kinduct found unsaved work from a session that did not close normally (" + auto + ").",
                new ButtonType("Recover", ButtonBar.ButtonData.YES), new ButtonType("Discard", ButtonBar.ButtonData.NO));
        a.setHeaderText("Recover unsaved work?");
        a.initOwner(stage);
        Optional<ButtonType> answer = a.showAndWait();
        if (answer.isPresent() && answer.get().getButtonData() == ButtonBar.ButtonData.YES) {
            try {
                vm.load(store.read(auto), null, true);
                canvas.zoomToFit();
                vm.say("Recovered unsaved work — save it under a name of your choice");
            } catch (SceneStore.LoadFailure e) {
                error("Could not recover the autosave", e.getMessage());
            }
        } else {
            clearAutosave();
        }
    }

    void error(String header, String details) {
        Alert a = new Alert(Alert.AlertType.ERROR);
        a.setTitle("Kinduct");
        a.setHeaderText(header);
        TextArea text = new TextArea(details);
        text.setId("error-details");
        text.setEditable(false);
        text.setWrapText(true);
        text.setPrefRowCount(8);
        a.getDialogPane().setContent(text);
        a.initOwner(stage);
        a.show();
    }

    private void info(String title, String text) {
        Alert a = new Alert(Alert.AlertType.INFORMATION);
        a.setTitle(title);
        a.setHeaderText(title);
        Label body = new Label(text);
        body.setWrapText(true);
        body.setMaxWidth(620);
        a.getDialogPane().setContent(body);
        a.initOwner(stage);
        a.show();
    }
}

package org.kinduct.ui.app;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.TextArea;
import javafx.stage.FileChooser;
import javafx.stage.Window;

/** The file actions' questions as JavaFX dialogs over the editor window. */
final class FxFileDialogs implements FileDialogs {

    private final Window owner;

    FxFileDialogs(Window owner) {
        this.owner = owner;
    }

    @Override
    public Optional<Path> fileToOpen(Path folder) {
        return Optional.ofNullable(chooser(folder).showOpenDialog(owner)).map(File::toPath);
    }

    @Override
    public Optional<Path> mapToOpen(Path folder) {
        FileChooser chooser = new FileChooser();
        chooser.setTitle("Add field map");
        chooser.getExtensionFilters().addAll(
                new FileChooser.ExtensionFilter("Field maps: x, y, B_z with units (*.csv, *.txt)", "*.csv", "*.txt"),
                new FileChooser.ExtensionFilter("All files", "*"));
        if (folder != null && Files.isDirectory(folder)) {
            chooser.setInitialDirectory(folder.toFile());
        }
        return Optional.ofNullable(chooser.showOpenDialog(owner)).map(File::toPath);
    }

    @Override
    public Optional<Path> fileToSave(Path folder, String suggestedName) {
        FileChooser chooser = chooser(folder);
        chooser.setInitialFileName(suggestedName);
        return Optional.ofNullable(chooser.showSaveDialog(owner)).map(File::toPath);
    }

    private static FileChooser chooser(Path folder) {
        FileChooser chooser = new FileChooser();
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("Kinduct scenes (*.json)", "*.json"));
        if (folder != null && Files.isDirectory(folder)) {
            chooser.setInitialDirectory(folder.toFile());
        }
        return chooser;
    }

    @Override
    public Unsaved unsavedChanges() {
        ButtonType save = new ButtonType("Save", ButtonBar.ButtonData.YES);
        ButtonType discard = new ButtonType("Discard changes", ButtonBar.ButtonData.NO);
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, "The scene has unsaved changes.", save, discard,
                ButtonType.CANCEL);
        a.setHeaderText("Save changes first?");
        a.initOwner(owner);
        Optional<ButtonType> answer = a.showAndWait();
        return answer.isEmpty() || answer.get() == ButtonType.CANCEL ? Unsaved.CANCEL
                : answer.get() == save ? Unsaved.SAVE : Unsaved.DISCARD;
    }

    @Override
    public Recovery offerRecovery(Path autosave, Path origin) {
        ButtonType recover = new ButtonType("Recover", ButtonBar.ButtonData.YES);
        ButtonType discard = new ButtonType("Discard", ButtonBar.ButtonData.NO);
        ButtonType later = new ButtonType("Not now", ButtonBar.ButtonData.CANCEL_CLOSE);
        String of = origin == null ? "a scene that was never saved" : origin.toString();
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, "Kinduct found unsaved work on " + of
                + " from a session that did not close normally (" + autosave + ").\n\n"
                + "Discard deletes it; Not now keeps it for the next start.", recover, discard, later);
        a.setHeaderText("Recover unsaved work?");
        a.getDialogPane().setId("recovery-offer");
        a.initOwner(owner);
        Optional<ButtonType> answer = a.showAndWait();
        return answer.isEmpty() || answer.get() == later ? Recovery.LATER
                : answer.get() == recover ? Recovery.RECOVER : Recovery.DISCARD;
    }

    @Override
    public void error(String header, String details) {
        Alert a = new Alert(Alert.AlertType.ERROR);
        a.setTitle("Kinduct");
        a.setHeaderText(header);
        TextArea text = new TextArea(details);
        text.setId("error-details");
        text.setEditable(false);
        text.setWrapText(true);
        text.setPrefRowCount(8);
        a.getDialogPane().setContent(text);
        a.initOwner(owner);
        a.show();
    }
}

package org.kinduct.ui.app;

import java.util.ArrayList;
import java.util.List;
import javafx.event.ActionEvent;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.stage.Window;
import org.kinduct.ui.edit.EarthFieldForm;
import org.kinduct.ui.edit.SceneDocument;

/**
 * Edit ▸ Earth's field…: the local geomagnetic elements and the board's orientation, with B_z
 * normal to the board shown as they are typed. OK adds the field as a uniform source, or updates
 * the scene's Earth field, as one undoable edit.
 */
final class EarthFieldDialog {

    private EarthFieldDialog() {
    }

    static void show(Window owner, SceneDocument document) {
        EarthFieldForm start = EarthFieldForm.of(document.scene());
        Dialog<ButtonType> d = new Dialog<>();
        d.initOwner(owner);
        d.setTitle("Earth's field");
        d.setHeaderText(start.updates() ? "Change the Earth's field of this scene" : "Add the Earth's field to this scene");
        ButtonType ok = new ButtonType(start.updates() ? "Update" : "Add", ButtonBar.ButtonData.OK_DONE);
        d.getDialogPane().getButtonTypes().addAll(ok, ButtonType.CANCEL);
        d.getDialogPane().setId("earth-dialog");

        GridPane grid = new GridPane();
        grid.setHgap(10);
        grid.setVgap(8);
        grid.setPadding(new Insets(12));
        List<TextField> fields = new ArrayList<>();
        for (int i = 0; i < EarthFieldForm.LABELS.size(); i++) {
            TextField f = new TextField(start.texts().get(i));
            f.setId("earth-" + i);
            fields.add(f);
            grid.addRow(i, new Label(EarthFieldForm.LABELS.get(i)), f);
        }
        ComboBox<String> face = new ComboBox<>();
        face.getItems().setAll(EarthFieldForm.FACES);
        face.setValue(start.face());
        face.setId("earth-face");
        int row = EarthFieldForm.LABELS.size();
        grid.addRow(row, new Label("Drawing seen on the board's face"), face);
        Label preview = new Label(start.preview());
        preview.setId("earth-preview");
        preview.setWrapText(true);
        grid.add(preview, 0, row + 1, 2, 1);
        Label where = new Label(EarthFieldForm.WHERE_TO_GET);
        where.setWrapText(true);
        where.setMaxWidth(460);
        grid.add(where, 0, row + 2, 2, 1);
        d.getDialogPane().setContent(grid);

        Button okButton = (Button) d.getDialogPane().lookupButton(ok);
        EarthFieldForm[] form = {start};
        Runnable refresh = () -> {
            form[0] = start.with(fields.stream().map(TextField::getText).toList(), face.getValue());
            preview.setText(form[0].preview());
            okButton.setDisable(!form[0].readable());
        };
        fields.forEach(f -> f.textProperty().addListener((obs, was, now) -> refresh.run()));
        face.valueProperty().addListener((obs, was, now) -> refresh.run());
        okButton.addEventFilter(ActionEvent.ACTION, e -> {
            if (!form[0].readable()) {
                e.consume();
            }
        });
        d.showAndWait().filter(b -> b == ok).ifPresent(b -> {
            String label = form[0].updates() ? "Change Earth's field" : "Add Earth's field";
            if (form[0].updates()) {
                document.apply(label, form[0].edit());
            } else {
                document.add(label, form[0].edit());
            }
        });
    }
}

package org.kinduct.ui.app;

import javafx.collections.SetChangeListener;
import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.layout.VBox;
import org.kinduct.ui.edit.EditorViewModel;

/** Properties of the selected object. */
final class PropertiesPanel extends VBox {

    private final EditorViewModel vm;
    private final Label title = new Label();

    PropertiesPanel(EditorViewModel vm) {
        this.vm = vm;
        setId("properties");
        setPadding(new Insets(8));
        setSpacing(6);
        setMinWidth(240);
        getChildren().add(title);
        vm.selection().addListener((SetChangeListener<String>) c -> rebuild());
        vm.sceneProperty().addListener(o -> rebuild());
        rebuild();
    }

    private void rebuild() {
        title.setText(vm.selection().isEmpty() ? "Nothing selected" : String.join(", ", vm.selection()));
    }
}

package org.kinduct.ui.app;

import javafx.scene.control.Label;
import javafx.scene.control.TitledPane;
import org.kinduct.scene.Scene;
import org.kinduct.ui.edit.SceneDocument;

/** A collapsible strip under the tool bar with the scene's description; hidden when there is none. */
final class DescriptionStrip extends TitledPane {

    DescriptionStrip(SceneDocument document) {
        setId("description-strip");
        Label text = new Label();
        text.setId("scene-description");
        text.setWrapText(true);
        text.setMaxWidth(Double.MAX_VALUE);
        text.setPadding(new javafx.geometry.Insets(2, 8, 2, 8));
        setContent(text);
        setAnimated(false);
        Runnable update = () -> {
            Scene s = document.scene();
            text.setText(s.description());
            setText(s.name().isEmpty() ? "About this scene" : s.name());
            setVisible(!s.description().isBlank());
            setManaged(isVisible());
        };
        document.sceneProperty().addListener(o -> update.run());
        update.run();
    }
}

package org.kinduct.ui.app;

import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import javafx.application.Platform;
import javafx.collections.MapChangeListener;
import javafx.embed.swing.SwingFXUtils;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.image.ImageView;
import javafx.scene.input.MouseButton;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.Window;
import org.kinduct.ui.edit.DemoBrowserModel;
import org.kinduct.render.export.Thumbnail;

/**
 * File ▸ Open demo…: the demos with a thumbnail (drawn by the export painter off the UI thread),
 * title and the opening of the description. Double-click or Open picks one.
 */
final class DemoBrowser {

    static final int THUMB_W = 176;
    static final int THUMB_H = 110;
    private static final double SUMMARY_W = 470;

    /** Renders thumbnails one at a time so the editor's own solving keeps the other core. */
    private static final ExecutorService RENDERER = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "kinduct-thumbnails");
        t.setDaemon(true);
        return t;
    });

    private final DemoBrowserModel model;

    /** Shows {@code model}'s demos; their thumbnails start rendering in the background at once. */
    DemoBrowser(DemoBrowserModel model) {
        this.model = model;
        model.renderThumbnails(s -> Thumbnail.render(s, THUMB_W, THUMB_H), RENDERER, Platform::runLater);
    }

    /** Shows the browser; the demo chosen, if any. */
    Optional<DemoBrowserModel.Entry> choose(Window owner) {
        Dialog<DemoBrowserModel.Entry> d = new Dialog<>();
        d.initOwner(owner);
        d.setTitle("Open demo");
        d.setHeaderText("Demo scenes — double-click one to open it");
        ButtonType open = new ButtonType("Open", ButtonBar.ButtonData.OK_DONE);
        d.getDialogPane().getButtonTypes().addAll(open, ButtonType.CANCEL);
        ListView<DemoBrowserModel.Entry> list = new ListView<>();
        list.setId("demo-list");
        list.getItems().setAll(model.entries());
        list.setPrefSize(720, 520);
        list.setCellFactory(v -> new EntryCell());
        model.thumbnails().addListener((MapChangeListener<String, java.awt.image.BufferedImage>) c -> list.refresh());
        model.chosenProperty().bind(list.getSelectionModel().selectedItemProperty());
        list.getSelectionModel().selectFirst();
        d.getDialogPane().lookupButton(open).disableProperty()
                .bind(list.getSelectionModel().selectedItemProperty().isNull());
        list.setOnMouseClicked(e -> {
            if (e.getButton() == MouseButton.PRIMARY && e.getClickCount() == 2 && model.chosenProperty().get() != null) {
                d.setResult(model.chosenProperty().get());
                d.close();
            }
        });
        d.getDialogPane().setContent(list);
        d.setResultConverter(b -> b == open ? model.chosenProperty().get() : null);
        Optional<DemoBrowserModel.Entry> answer = d.showAndWait();
        model.chosenProperty().unbind();
        return answer;
    }

    private final class EntryCell extends ListCell<DemoBrowserModel.Entry> {
        private final ImageView image = new ImageView();
        private final Label title = new Label();
        private final Label summary = new Label();
        private final HBox row;

        EntryCell() {
            title.setStyle("-fx-font-weight: bold; -fx-font-size: 13px;");
            summary.setWrapText(true);
            summary.setStyle("-fx-text-fill: #444444;");
            image.setFitWidth(THUMB_W);
            image.setFitHeight(THUMB_H);
            VBox text = new VBox(4, title, summary);
            HBox.setHgrow(text, Priority.ALWAYS);
            text.setMaxWidth(Double.MAX_VALUE);
            summary.setPrefWidth(SUMMARY_W);
            summary.setMaxWidth(SUMMARY_W);
            javafx.scene.layout.StackPane frame = new javafx.scene.layout.StackPane(image);
            frame.setMinSize(THUMB_W, THUMB_H);
            frame.setMaxSize(THUMB_W, THUMB_H);
            frame.setStyle("-fx-background-color: #e4e4e0;");
            row = new HBox(12, frame, text);
            row.setAlignment(Pos.CENTER_LEFT);
            row.setPadding(new Insets(4));
            row.setMinHeight(THUMB_H + 8);
        }

        @Override
        protected void updateItem(DemoBrowserModel.Entry e, boolean empty) {
            super.updateItem(e, empty);
            if (empty || e == null) {
                setGraphic(null);
                return;
            }
            title.setText(e.title());
            summary.setText(e.summary());
            java.awt.image.BufferedImage thumb = model.thumbnails().get(e.name());
            image.setImage(thumb == null ? null : SwingFXUtils.toFXImage(thumb, null));
            setGraphic(row);
        }
    }
}

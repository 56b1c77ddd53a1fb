package org.kinduct.ui.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.function.Function;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.scene.control.Label;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.Tooltip;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.Text;
import org.kinduct.ui.edit.EditorViewModel;

/**
 * A results table of text columns: long headings take two lines; columns widen to their widest
 * text (they never shrink while values change, so playback does not make them jump) and the table
 * scrolls sideways rather than cutting text; every heading and cell tells its full text in a
 * tooltip. Choosing a row selects its object in the editor.
 *
 * @param <R> one row's values
 */
abstract class WideningTable<R> extends TableView<R> {

    /** Room a cell or heading needs beyond its text: padding, borders, the sort arrow's gap. */
    private static final double CELL_MARGIN_PX = 16;
    /** Column headings are set in bold (the default style sheet's). */
    private static final Font HEADING_FONT = Font.font(Font.getDefault().getFamily(), FontWeight.BOLD,
            Font.getDefault().getSize());

    private final ObservableList<R> rows = FXCollections.observableArrayList();
    private final List<Column<R>> columns = new ArrayList<>();

    /** A column's heading, what it explains in its tooltip, and its cell text. */
    private record Column<R>(TableColumn<R, String> table, String heading, Function<R, String> text) {
    }

    /** @param idOf the id of the object a row is about, selected when the row is chosen */
    WideningTable(EditorViewModel vm, Function<R, String> idOf) {
        setItems(rows);
        setColumnResizePolicy(TableView.UNCONSTRAINED_RESIZE_POLICY);
        getSelectionModel().selectedItemProperty().addListener((obs, old, row) -> {
            if (row != null && !vm.document().selection().contains(idOf.apply(row))) {
                vm.document().select(Set.of(idOf.apply(row)));
            }
        });
    }

    /** Adds a column whose cells read {@code text} of their row. */
    final void column(String heading, String explanation, Function<R, String> text) {
        TableColumn<R, String> c = new TableColumn<>();
        Label head = new Label(heading);
        head.setTooltip(new Tooltip(heading.replace('\n', ' ') + ": " + explanation));
        c.setGraphic(head);
        c.setCellValueFactory(cd -> new ReadOnlyStringWrapper(text.apply(cd.getValue())));
        c.setCellFactory(col -> new TippedCell<>());
        c.setSortable(false);
        columns.add(new Column<>(c, heading, text));
        getColumns().add(c);
    }

    /** Shows {@code now}, replacing rows in place when their number stays, so the selection and scroll stay. */
    final void showRows(List<R> now) {
        if (rows.size() == now.size()) {
            for (int i = 0; i < now.size(); i++) {
                rows.set(i, now.get(i));
            }
        } else {
            rows.setAll(now);
        }
        widen(now);
    }

    /** Clears the rows; another scene is coming (or nothing could be solved), and its rows size the columns afresh. */
    final void clearRows() {
        rows.clear();
        columns.forEach(c -> c.table().setPrefWidth(0));
        widen(List.of());
    }

    /** Widens each column to its heading and widest text now shown. */
    private void widen(List<R> shown) {
        for (Column<R> c : columns) {
            double w = 0;
            for (String line : c.heading().split("\n", -1)) {
                w = Math.max(w, textWidth(line, HEADING_FONT));
            }
            for (R r : shown) {
                w = Math.max(w, textWidth(c.text().apply(r), Font.getDefault()));
            }
            double needed = Math.ceil(w + CELL_MARGIN_PX);
            if (needed > c.table().getPrefWidth()) {
                c.table().setPrefWidth(needed);
            }
        }
    }

    private static double textWidth(String s, Font font) {
        Text t = new Text(s);
        t.setFont(font);
        return t.getLayoutBounds().getWidth();
    }

    /** A cell whose tooltip holds its full text, for a column the user has made narrower. */
    private static final class TippedCell<R> extends TableCell<R, String> {
        private final Tooltip tip = new Tooltip();

        @Override
        protected void updateItem(String item, boolean empty) {
            super.updateItem(item, empty);
            setText(empty ? null : item);
            tip.setText(item);
            setTooltip(empty || item == null ? null : tip);
        }
    }
}

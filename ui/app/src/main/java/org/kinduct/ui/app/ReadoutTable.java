package org.kinduct.ui.app;

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
import org.kinduct.render.paint.Quantities;
import org.kinduct.report.Labels;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.ResultScales;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.SceneResults;

/**
 * One row per conductor at the instant shown: flux linkage, both EMF methods and whether they
 * agree, current, polarity or sense, force; the words are those of {@link Labels}. Long headings
 * take two lines; columns widen to their widest text (they never shrink while values change, so
 * playback does not make them jump) and the table scrolls sideways rather than cutting text; every
 * heading and cell tells its full text in a tooltip.
 */
final class ReadoutTable extends TableView<ReadoutTable.Row> {

    /** Room a cell or heading needs beyond its text: padding, borders, the sort arrow's gap. */
    private static final double CELL_MARGIN_PX = 16;
    /** Column headings are set in bold (the default style sheet's). */
    private static final Font HEADING_FONT = Font.font(Font.getDefault().getFamily(), FontWeight.BOLD,
            Font.getDefault().getSize());

    /** A conductor's state, and whether it is a closed loop (whose current and sense apply). */
    record Row(ConductorState state, boolean closedLoop) {
    }

    private final EditorViewModel vm;
    private final ObservableList<Row> rows = FXCollections.observableArrayList();
    private final List<Column> columns;
    private final Label placeholder = new Label();
    /** The run's largest values, against which the shown ones are read (rounding noise reads 0). */
    private ResultScales scales = ResultScales.of(List.of());

    /** A column's heading, what it explains in its tooltip, and its cell text. */
    private record Column(TableColumn<Row, String> table, String heading, Function<Row, String> text) {
    }

    ReadoutTable(EditorViewModel vm) {
        this.vm = vm;
        setItems(rows);
        setId("readouts");
        setPlaceholder(placeholder);
        setColumnResizePolicy(TableView.UNCONSTRAINED_RESIZE_POLICY);
        columns = List.of(
                column("Conductor", "The conductor's id", r -> r.state().id()),
                column("Flux linkage\nN·Φ", "Flux through one turn times the turns (loops)",
                        r -> loop(r, Quantities.flux(scales.flux(r.state().linkageWb())))),
                column("EMF,\nflux rule", "−dλ/dt, the rate of change of the flux linkage (loops): the check on the"
                        + " next column", r -> loop(r, Quantities.voltage(scales.emf(r.state().emfFluxV())))),
                column("EMF, motion +\ninduced field", "∮(v × B − ∂A/∂t)·dl: the EMF of moving through the field"
                        + " plus that of the induced electric field (the only EMF of a loop at rest beside an AC"
                        + " coil). The EMF reported everywhere, positive along the vertex order",
                        r -> Quantities.voltage(scales.emf(r.state().emfMotionalV()))),
                column("Methods\nagree", "Whether the two EMF columns agree, with their relative difference; an"
                        + " open wire has one method, and where a loop edge crosses a field edge there is no check",
                        r -> Labels.agreement(r.state())),
                column("Current", "Current along the vertex order (closed loops)",
                        r -> closed(r, Quantities.current(scales.current(r.state().currentA())))),
                column("Polarity /\nsense", "Wires and open loops: which end is +. Closed loops: the current's"
                        + " sense on screen", r -> Labels.polarityOrSense(r.state(), r.closedLoop())),
                column("Force\n(x, y)", "Magnetic force on a closed loop, in the plane", r -> closed(r, force(r))));
        columns.forEach(c -> getColumns().add(c.table()));
        SceneResults results = vm.results();
        results.snapshotProperty().addListener((obs, old, snap) -> show());
        results.resultProperty().addListener((obs, old, run) -> show());
        vm.document().sceneProperty().addListener((obs, old, scene) -> show());
        show();
        getSelectionModel().selectedItemProperty().addListener((obs, old, row) -> {
            if (row != null && !vm.document().selection().contains(row.state().id())) {
                vm.document().select(Set.of(row.state().id()));
            }
        });
    }

    private static String loop(Row r, String text) {
        return r.state().kind() == ConductorState.Kind.LOOP ? text : Labels.NOT_APPLICABLE;
    }

    private static String closed(Row r, String text) {
        return r.closedLoop() ? text : Labels.NOT_APPLICABLE;
    }

    private String force(Row r) {
        Vec2 f = scales.force(r.state().forceN());
        return Quantities.force(f.x()) + ", " + Quantities.force(f.y());
    }

    private void show() {
        Snapshot snap = vm.results().snapshot();
        Scene scene = vm.scene();
        placeholder.setText(emptyNote(scene));
        if (snap == null) {
            rows.clear();
            // Another scene is coming (or nothing could be solved): its rows size the columns afresh.
            columns.forEach(c -> c.table().setPrefWidth(0));
            widen(List.of());
            return;
        }
        scales = vm.results().scalesNow();
        List<Row> now = snap.conductors().stream().map(st -> new Row(st, scene.conductor(st.id())
                .map(c -> c instanceof Conductor.Loop loop && !loop.open()).orElse(false))).toList();
        if (rows.size() == now.size()) {
            for (int i = 0; i < now.size(); i++) {
                rows.set(i, now.get(i));
            }
        } else {
            rows.setAll(now);
        }
        widen(now);
    }

    /**
     * Why the table has no rows: its rows are wires and loops only, so a scene of plates and channels
     * alone is told where their figures are rather than left "solving" for good.
     */
    private static String emptyNote(Scene scene) {
        boolean filaments = scene.conductors().stream()
                .anyMatch(c -> c instanceof Conductor.Wire || c instanceof Conductor.Loop);
        if (filaments) {
            return "Solving…";
        }
        return scene.conductors().isEmpty() ? "No conductors: draw a wire or a loop"
                : "No wires or loops: drag and heat of plates and channels are in their callouts";
    }

    /** Widens each column to its heading and widest text now shown. */
    private void widen(List<Row> shown) {
        for (Column c : columns) {
            double w = 0;
            for (String line : c.heading().split("\n", -1)) {
                w = Math.max(w, textWidth(line, HEADING_FONT));
            }
            for (Row r : shown) {
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

    private Column column(String heading, String explanation, Function<Row, String> text) {
        TableColumn<Row, String> c = new TableColumn<>();
        Label head = new Label(heading);
        head.setTooltip(new Tooltip(heading.replace('\n', ' ') + ": " + explanation));
        c.setGraphic(head);
        c.setCellValueFactory(cd -> new ReadOnlyStringWrapper(text.apply(cd.getValue())));
        c.setCellFactory(col -> new TippedCell());
        c.setSortable(false);
        return new Column(c, heading, text);
    }

    /** A cell whose tooltip holds its full text, for a column the user has made narrower. */
    private static final class TippedCell extends TableCell<Row, String> {
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

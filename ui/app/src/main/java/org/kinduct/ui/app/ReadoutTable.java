package org.kinduct.ui.app;

import java.util.List;
import java.util.function.Function;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import org.kinduct.solver.run.ResultScales;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.SceneResults;
import org.kinduct.render.paint.Quantities;

/** One row per conductor: flux, both EMF methods and how well they agree, current, direction, force. */
final class ReadoutTable extends TableView<ConductorState> {

    /** Relative disagreement between the two EMF methods above which a row is flagged. */
    static final double AGREEMENT_TOLERANCE = 1e-3;

    private final ObservableList<ConductorState> rows = FXCollections.observableArrayList();
    /** The run's largest values, against which the shown ones are read (rounding noise reads 0). */
    private ResultScales scales = ResultScales.of(List.of());

    ReadoutTable(EditorViewModel vm) {
        setItems(rows);
        setId("readouts");
        setPlaceholder(new javafx.scene.control.Label("No conductors: draw a wire or a loop"));
        setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        getColumns().add(column("Conductor", ConductorState::id));
        getColumns().add(column("Flux linkage Φ·N", s -> Quantities.flux(scales.flux(s.linkageWb()))));
        getColumns().add(column("EMF −dΦ/dt", s -> Quantities.voltage(scales.emf(s.emfFluxV()))));
        getColumns().add(column("EMF ∮(v×B)·dl", s -> Quantities.voltage(scales.emf(s.emfMotionalV()))));
        getColumns().add(column("Agreement", ReadoutTable::agreement));
        getColumns().add(column("Current", s -> Quantities.current(scales.current(s.currentA()))));
        getColumns().add(column("Direction", ReadoutTable::direction));
        getColumns().add(column("Force (x, y)", s -> {
            Vec2 f = scales.force(s.forceN());
            return Quantities.force(f.x()) + ", " + Quantities.force(f.y());
        }));
        SceneResults results = vm.results();
        results.snapshotProperty().addListener((obs, old, snap) -> show(results));
        results.resultProperty().addListener((obs, old, run) -> show(results));
        show(results);
        getSelectionModel().selectedItemProperty().addListener((obs, old, row) -> {
            if (row != null && !vm.document().selection().contains(row.id())) {
                vm.document().select(java.util.Set.of(row.id()));
            }
        });
    }

    private void show(SceneResults results) {
        Snapshot snap = results.snapshot();
        if (snap == null) {
            rows.clear();
            return;
        }
        scales = results.scalesNow();
        if (rows.size() == snap.conductors().size()) {
            for (int i = 0; i < rows.size(); i++) {
                rows.set(i, snap.conductors().get(i));
            }
        } else {
            rows.setAll(snap.conductors());
        }
    }

    static String agreement(ConductorState s) {
        if (s.kind() == ConductorState.Kind.WIRE) {
            return s.inducedFieldIncluded() ? "wire: one method" : "wire: −∂A/∂t left out";
        }
        if (Double.isNaN(s.disagreement())) {
            return "no check at a kink";
        }
        return s.disagreement() <= AGREEMENT_TOLERANCE ? "agree"
                : String.format(java.util.Locale.ROOT, "DIFFER by %.2g", s.disagreement());
    }

    static String direction(ConductorState s) {
        return switch (s.positiveEnd()) {
            case LAST -> "+ at last vertex";
            case FIRST -> "+ at first vertex";
            case NONE -> switch (s.direction()) {
                case CCW -> "↺ counter-clockwise";
                case CW -> "↻ clockwise";
                case NONE -> "none";
            };
        };
    }

    private static TableColumn<ConductorState, String> column(String title, Function<ConductorState, String> f) {
        TableColumn<ConductorState, String> c = new TableColumn<>(title);
        c.setCellValueFactory(cd -> new ReadOnlyStringWrapper(f.apply(cd.getValue())));
        c.setSortable(false);
        return c;
    }
}

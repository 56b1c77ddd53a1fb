package org.kinduct.ui.app;

import java.util.List;
import javafx.scene.control.Label;
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
 * One row per wire or loop at the instant shown: flux linkage, both EMF methods and whether they
 * agree, current, polarity or sense, force; the words are those of {@link Labels}. Plates and
 * channels have a table of their own ({@link SheetReadoutTable}).
 */
final class ReadoutTable extends WideningTable<ReadoutTable.Row> {

    /** A conductor's state, and whether it is a closed loop (whose current and sense apply). */
    record Row(ConductorState state, boolean closedLoop) {
    }

    private final EditorViewModel vm;
    private final Label placeholder = new Label();
    /** The run's largest values, against which the shown ones are read (rounding noise reads 0). */
    private ResultScales scales = ResultScales.of(List.of());

    ReadoutTable(EditorViewModel vm) {
        super(vm, r -> r.state().id());
        this.vm = vm;
        setId("readouts");
        setPlaceholder(placeholder);
        column("Conductor", "The conductor's id", r -> r.state().id());
        column("Flux linkage\nN·Φ", "Flux through one turn times the turns (loops)",
                r -> loop(r, Quantities.flux(scales.flux(r.state().linkageWb()))));
        column("EMF,\nflux rule", "−dλ/dt, the rate of change of the flux linkage (loops): the check on the"
                + " next column", r -> loop(r, Quantities.voltage(scales.emf(r.state().emfFluxV()))));
        column("EMF, motion +\ninduced field", "∮(v × B − ∂A/∂t)·dl: the EMF of moving through the field"
                + " plus that of the induced electric field (the only EMF of a loop at rest beside an AC"
                + " coil). The EMF reported everywhere, positive along the vertex order",
                r -> Quantities.voltage(scales.emf(r.state().emfMotionalV())));
        column("Methods\nagree", "Whether the two EMF columns agree, with their relative difference; an"
                + " open wire has one method, and where a loop edge crosses a field edge there is no check",
                r -> Labels.agreement(r.state()));
        column("Current", "Current along the vertex order (closed loops)",
                r -> closed(r, Quantities.current(scales.current(r.state().currentA()))));
        column("Polarity /\nsense", "Wires and open loops: which end is +. Closed loops: the current's"
                + " sense on screen", r -> Labels.polarityOrSense(r.state(), r.closedLoop()));
        column("Force\n(x, y)", "Magnetic force on a closed loop, in the plane", r -> closed(r, force(r)));
        SceneResults results = vm.results();
        results.snapshotProperty().addListener((obs, old, snap) -> show());
        vm.dragged().solvedProperty().addListener((obs, old, solved) -> show());
        results.resultProperty().addListener((obs, old, run) -> show());
        vm.document().sceneProperty().addListener((obs, old, scene) -> show());
        show();
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
        Snapshot snap = vm.numbersShown();
        Scene scene = vm.scene();
        boolean filaments = scene.conductors().stream().anyMatch(c -> !(c instanceof Conductor.Sheet));
        placeholder.setText(filaments ? "Solving…" : "No wires or loops: draw a wire or a loop");
        // Plates and channels alone: their own table says everything, this one steps aside.
        boolean sheetsOnly = !filaments && !scene.conductors().isEmpty();
        setVisible(!sheetsOnly);
        setManaged(!sheetsOnly);
        if (snap == null) {
            clearRows();
            return;
        }
        scales = vm.results().scalesNow().including(snap);
        showRows(snap.conductors().stream().map(st -> new Row(st, scene.conductor(st.id())
                .map(c -> c instanceof Conductor.Loop loop && !loop.open()).orElse(false))).toList());
    }
}

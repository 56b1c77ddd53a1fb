package org.kinduct.ui.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javafx.scene.control.Label;
import org.kinduct.render.paint.SheetTexts;
import org.kinduct.report.Labels;
import org.kinduct.scene.Conductor;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.run.ResultScales;
import org.kinduct.ui.edit.EditorViewModel;
import org.kinduct.ui.edit.SceneResults;

/**
 * Plates and channels at the instant shown: drag with its direction, torque, Joule power, Rm with
 * the resistive-limit warning, and per electrode pair its voltage and + electrode (one row per
 * pair; a sheet without pairs has one row). The texts are the exported page's ({@link SheetTexts},
 * words of {@link Labels}); hidden while the scene has no plate or channel.
 */
final class SheetReadoutTable extends WideningTable<SheetReadoutTable.Row> {

    /** A sheet's state, and one of its pairs (empty when it has none). */
    record Row(SheetState state, Optional<SheetState.Pair> pair) {
    }

    private final EditorViewModel vm;
    /** The run's largest values, against which the shown ones are read (rounding noise reads 0). */
    private ResultScales scales = ResultScales.of(List.of());

    SheetReadoutTable(EditorViewModel vm) {
        super(vm, r -> r.state().id());
        this.vm = vm;
        setId("sheet-readouts");
        // Shown only with a plate or channel in the scene, so an empty table means its run is not in yet.
        setPlaceholder(new Label("Solving…"));
        column("Plate /\nchannel", "The plate's or channel's id", r -> r.state().id());
        column("Drag,\nangle", "Force of the field on the eddy currents and its direction from +x (on a moving plate"
                + " the drag; on a channel the force on the liquid)", r -> SheetTexts.drag(r.state(), scales));
        column("Torque", "z torque about the body's pivot", r -> SheetTexts.torque(r.state(), scales));
        column("Joule\npower", "Heat the eddy currents make, d·∫|J|²/σ dA", r -> SheetTexts.joule(r.state(), scales));
        column("Rm", "Magnetic Reynolds number; above " + SheetState.REYNOLDS_WARNING + " a plate is solved with its"
                + " own field where its motion is steady, and elsewhere the neglected own field makes drag and heat"
                + " too large", this::reynolds);
        column("Electrodes", "The pair: voltage = potential of the first − potential of the second",
                r -> r.pair().map(SheetTexts::pair).orElse(Labels.NOT_APPLICABLE));
        column("Voltage", "Voltage of the pair ('*': a moving field patch leaves the potentials without its w·A)",
                r -> r.pair().map(p -> SheetTexts.voltage(r.state(), p, scales)).orElse(Labels.NOT_APPLICABLE));
        column("+ electrode", "The electrode at the higher potential",
                r -> r.pair().map(p -> Labels.positiveElectrode(p.positive())).orElse(Labels.NOT_APPLICABLE));
        column("of B·w·v̄", "A channel pair's share of B·w·v̄, with B at the electrodes' midpoint",
                r -> r.pair().map(SheetTexts::endShorting).orElse(Labels.NOT_APPLICABLE));
        SceneResults results = vm.results();
        results.snapshotProperty().addListener((obs, old, snap) -> show());
        vm.dragged().solvedProperty().addListener((obs, old, solved) -> show());
        results.resultProperty().addListener((obs, old, run) -> show());
        vm.document().sceneProperty().addListener((obs, old, scene) -> show());
        show();
    }

    private String reynolds(Row r) {
        SheetState st = r.state();
        String note = Labels.reynoldsNote(st);
        return SheetTexts.reynolds(st) + (note.isEmpty() ? "" : "  " + note);
    }

    private void show() {
        boolean any = vm.scene().conductors().stream().anyMatch(c -> c instanceof Conductor.Sheet);
        setVisible(any);
        setManaged(any);
        Snapshot snap = vm.numbersShown();
        if (snap == null) {
            clearRows();
            return;
        }
        scales = vm.results().scalesNow().including(snap);
        List<Row> now = new ArrayList<>();
        for (SheetState st : snap.sheets()) {
            if (st.pairs().isEmpty()) {
                now.add(new Row(st, Optional.empty()));
            }
            st.pairs().forEach(p -> now.add(new Row(st, Optional.of(p))));
        }
        showRows(now);
    }
}

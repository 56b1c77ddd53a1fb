package org.kinduct.report;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.circuit.InductanceAtStart;

/**
 * The inductances at the start of a run in one line of words, for the CLI table and the editor
 * (values from {@link InductanceAtStart}; formulas and their sources in
 * {@link org.kinduct.solver.circuit.LoopInductance}). A loop whose wires run too close for the
 * thin-wire formulas is named with the reason instead of a number.
 */
public final class InductanceSummary {

    private InductanceSummary() {
    }

    /** E.g. "Inductance at t0: L pickup 1.20 mH, L trim 45.0 µH; M pickup–trim 3.10 µH"; empty without closed loops. */
    public static String of(InductanceAtStart inductance) {
        if (inductance.self().isEmpty()) {
            return "";
        }
        List<String> self = new ArrayList<>();
        inductance.self().forEach(e -> self.add(words(e)));
        List<String> mutual = new ArrayList<>();
        inductance.mutual().forEach(e -> mutual.add(words(e)));
        return "Inductance at t0: " + String.join(", ", self) + (mutual.isEmpty() ? "" : "; " + String.join(", ", mutual));
    }

    private static String words(InductanceAtStart.Entry e) {
        String label = e.kind() + " " + e.first() + (e.second() == null ? "" : "–" + e.second());
        return e.known() ? label + " " + Units.format(e.henries(), Dimension.INDUCTANCE)
                : label + " not computed (" + e.problem() + ")";
    }
}

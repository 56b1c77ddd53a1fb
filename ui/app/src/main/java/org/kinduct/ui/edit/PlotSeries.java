package org.kinduct.ui.edit;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.function.IntToDoubleFunction;
import java.util.function.ToDoubleFunction;
import org.kinduct.render.paint.SheetTexts;
import org.kinduct.solver.run.ResultScales;
import org.kinduct.solver.run.RunResult;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;

/**
 * The lines of the time plot: a conductor quantity for the selected conductors (all when no
 * conductor is selected, so selecting a magnet leaves the plot as it was), a plate or channel
 * quantity (pair voltages, drag, torque, Joule heat) likewise for the selected plates and channels, or a body quantity for
 * the bodies the selected objects ride (all moving bodies when none is selected). Free bodies are
 * read from the simulated poses, the others from their motion.
 */
public final class PlotSeries {

    /** What the time plot shows. */
    public enum Quantity {
        EMF("EMF", Dimension.VOLTAGE, ConductorState::emfV, null),
        CURRENT("Current", Dimension.CURRENT, ConductorState::currentA, null),
        FLUX("Flux linkage", Dimension.FLUX, ConductorState::linkageWb, null),
        FORCE_X("Force on conductor, x", Dimension.FORCE, c -> c.forceN().x(), null),
        FORCE_Y("Force on conductor, y", Dimension.FORCE, c -> c.forceN().y(), null),
        /** One line per electrode pair of a plate or channel. */
        PAIR_VOLTAGE("Electrode pair voltage", Dimension.VOLTAGE, null, null),
        /** One line per plate or channel: the magnitude of the field's force on its eddy currents. */
        DRAG("Drag on plate or channel", Dimension.FORCE, null, null),
        /** One line per plate or channel: the field's torque on it about its body's pivot, positive counter-clockwise. */
        TORQUE("Torque on plate or channel", Dimension.TORQUE, null, null),
        /** One line per plate or channel: the heat its eddy currents make, d·∫|J|²/σ dA. */
        JOULE_HEAT("Joule heat in plate or channel", Dimension.POWER, null, null),
        POSITION_X("Body position x", Dimension.LENGTH, null, p -> p.pivot().x() + p.offset().x()),
        POSITION_Y("Body position y", Dimension.LENGTH, null, p -> p.pivot().y() + p.offset().y()),
        SPEED("Body speed", Dimension.VELOCITY, null, p -> p.velocity().length());

        private final String label;
        public final Dimension dimension;
        private final ToDoubleFunction<ConductorState> ofConductor;
        private final ToDoubleFunction<Pose> ofBody;

        Quantity(String label, Dimension dimension, ToDoubleFunction<ConductorState> ofConductor,
                 ToDoubleFunction<Pose> ofBody) {
            this.label = label;
            this.dimension = dimension;
            this.ofConductor = ofConductor;
            this.ofBody = ofBody;
        }

        public boolean ofBodies() {
            return ofBody != null;
        }

        public boolean ofSheets() {
            return this == PAIR_VOLTAGE || this == DRAG || this == TORQUE || this == JOULE_HEAT;
        }

        /** The run's largest value of this conductor quantity. */
        double runScale(ResultScales scales) {
            return switch (this) {
                case EMF -> scales.emfV();
                case CURRENT -> scales.currentA();
                case FLUX -> scales.fluxWb();
                case FORCE_X, FORCE_Y, DRAG -> scales.forceN();
                case PAIR_VOLTAGE -> scales.emfV();
                case TORQUE -> scales.torqueNm();
                case JOULE_HEAT -> scales.powerW();
                default -> throw new IllegalStateException(this + " is a body quantity");
            };
        }

        @Override
        public String toString() {
            return label;
        }
    }

    /** One plotted line: whose, and its values at the sample times. */
    public record Line(String id, double[] tS, double[] values) {
    }

    private PlotSeries() {
    }

    /**
     * What to plot for {@code scene} when {@code shown} was chosen: a wire or loop quantity gives
     * way to the pair voltages (the drag when there is no pair) in a scene of plates and channels
     * alone, where it would have no line; anything else stays.
     */
    public static Quantity fitting(Scene scene, Quantity shown) {
        List<Conductor> all = scene.conductors();
        boolean sheetsOnly = !all.isEmpty() && all.stream().allMatch(c -> c instanceof Conductor.Sheet);
        if (!sheetsOnly || shown.ofSheets() || shown.ofBodies()) {
            return shown;
        }
        boolean pairs = all.stream().anyMatch(c -> !((Conductor.Sheet) c).pairs().isEmpty());
        return pairs ? Quantity.PAIR_VOLTAGE : Quantity.DRAG;
    }

    /** The lines of {@code q} over the run's samples; free bodies are read from the samples. */
    public static List<Line> lines(RunResult run, Set<String> selection, Quantity q) {
        List<Line> lines = new ArrayList<>();
        Scene scene = run.scene();
        List<Snapshot> series = run.samples();
        double[] t = series.stream().mapToDouble(Snapshot::tS).toArray();
        if (q.ofSheets()) {
            return sheetLines(run, selection, q, t);
        }
        if (!q.ofBodies()) {
            // Read against the run's largest value of any conductor, so a conductor with no EMF
            // plots flat at zero instead of its rounding noise stretched to full height.
            double reference = q.runScale(run.scales());
            boolean anySelected = selection.stream().anyMatch(id -> scene.conductor(id).isPresent());
            for (ConductorState first : series.get(0).conductors()) {
                if (!anySelected || selection.contains(first.id())) {
                    double[] v = new double[t.length];
                    for (int i = 0; i < t.length; i++) {
                        double raw = series.get(i).conductor(first.id()).map(q.ofConductor::applyAsDouble)
                                .orElse(Double.NaN);
                        v[i] = Units.withoutNoise(raw, reference);
                    }
                    lines.add(new Line(first.id(), t, v));
                }
            }
            return lines;
        }
        for (String bodyId : bodies(scene, selection)) {
            Body body = scene.body(bodyId).orElseThrow();
            double[] v = new double[t.length];
            for (int i = 0; i < t.length; i++) {
                Pose p = series.get(i).freeBodies().get(bodyId);
                v[i] = q.ofBody.applyAsDouble(p != null ? p : body.poseAt(t[i]));
            }
            lines.add(new Line(body.name().isEmpty() ? bodyId : body.name(), t, v));
        }
        return lines;
    }

    /** Lines of plates and channels: the selected ones, or all when none is selected. */
    private static List<Line> sheetLines(RunResult run, Set<String> selection, Quantity q, double[] t) {
        List<Line> lines = new ArrayList<>();
        List<Snapshot> series = run.samples();
        double reference = q.runScale(run.scales());
        boolean anySelected = series.get(0).sheets().stream().anyMatch(st -> selection.contains(st.id()));
        for (SheetState first : series.get(0).sheets()) {
            if (anySelected && !selection.contains(first.id())) {
                continue;
            }
            if (q == Quantity.DRAG) {
                lines.add(line(first.id(), t, reference, i -> sheet(series, i, first).forceN().length()));
            } else if (q == Quantity.TORQUE) {
                lines.add(line(first.id(), t, reference, i -> sheet(series, i, first).torqueNm()));
            } else if (q == Quantity.JOULE_HEAT) {
                lines.add(line(first.id(), t, reference, i -> sheet(series, i, first).joulePowerW()));
            } else {
                for (int p = 0; p < first.pairs().size(); p++) {
                    int pair = p;
                    lines.add(line(first.id() + ": " + SheetTexts.pair(first.pairs().get(p)), t, reference,
                            i -> sheet(series, i, first).pairs().get(pair).voltageV()));
                }
            }
        }
        return lines;
    }

    private static SheetState sheet(List<Snapshot> series, int i, SheetState first) {
        return series.get(i).sheet(first.id()).orElseThrow();
    }

    private static Line line(String name, double[] t, double reference, IntToDoubleFunction valueAt) {
        double[] v = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            v[i] = Units.withoutNoise(valueAt.applyAsDouble(i), reference);
        }
        return new Line(name, t, v);
    }

    private static Set<String> bodies(Scene scene, Set<String> selection) {
        Set<String> ids = new LinkedHashSet<>();
        if (selection.isEmpty()) {
            scene.bodies().stream().map(Body::id).filter(id -> !Body.FIXED.equals(id)).forEach(ids::add);
        } else {
            selection.stream().filter(id -> scene.source(id).isPresent() || scene.conductor(id).isPresent())
                    .map(id -> SceneEdits.bodyOf(scene, id)).filter(id -> !Body.FIXED.equals(id)).forEach(ids::add);
        }
        return ids;
    }
}

package org.kinduct.report;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.circuit.LoopInductance;

/**
 * Self-inductance of every closed loop and mutual inductance of every pair of loops and of every
 * loop with every source coil, with the loops and coils where
 * they are at the start of the scene's time window, in one line of words for the CLI table and the
 * editor (formulas and their sources in {@link LoopInductance}). A loop whose wires run too close for
 * the thin-wire formulas is named with the reason instead of a number.
 */
public final class InductanceSummary {

    private InductanceSummary() {
    }

    /** E.g. "Inductance at t0: L pickup 1.20 mH, L trim 45.0 µH; M pickup–trim 3.10 µH"; empty without closed loops. */
    public static String of(Scene scene) {
        List<Conductor.Loop> loops = new ArrayList<>();
        List<List<Vec2>> at = new ArrayList<>();
        SceneSolver solver = new SceneSolver(scene);
        for (Conductor c : scene.conductors()) {
            if (c instanceof Conductor.Loop loop && !loop.open()) {
                loops.add(loop);
                at.add(solver.placedVertices(loop, scene.time().t0S()));
            }
        }
        if (loops.isEmpty()) {
            return "";
        }
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < loops.size(); i++) {
            Conductor.Loop a = loops.get(i);
            List<Vec2> va = at.get(i);
            parts.add(attempt("L " + a.id(), () -> LoopInductance.self(va, a.wire().diameterM() / 2, a.turns())));
        }
        List<String> mutual = new ArrayList<>();
        for (int i = 0; i < loops.size(); i++) {
            for (int j = i + 1; j < loops.size(); j++) {
                Conductor.Loop a = loops.get(i);
                Conductor.Loop b = loops.get(j);
                List<Vec2> va = at.get(i);
                List<Vec2> vb = at.get(j);
                mutual.add(attempt("M " + a.id() + "–" + b.id(), () -> LoopInductance.mutual(va,
                        a.wire().diameterM() / 2, a.turns(), vb, b.wire().diameterM() / 2, b.turns())));
            }
        }
        for (int i = 0; i < loops.size(); i++) {
            for (Source source : scene.sources()) {
                if (source instanceof Source.SourceCoil coil) {
                    mutual.add(attempt("M " + loops.get(i).id() + "–" + coil.id(),
                            toCoil(loops.get(i), at.get(i), coil, scene.bodiesById().get(coil.body()).poseAt(scene.time().t0S()))));
                }
            }
        }
        return "Inductance at t0: " + String.join(", ", parts) + (mutual.isEmpty() ? "" : "; " + String.join(", ", mutual));
    }

    /** Mutual inductance of a loop with a source coil placed by {@code pose}, per the coil's shape. */
    private static java.util.function.DoubleSupplier toCoil(Conductor.Loop loop, List<Vec2> at, Source.SourceCoil coil,
                                                           Pose pose) {
        if (coil.shape() instanceof Source.CoilShape.Circle circle) {
            return () -> LoopInductance.mutualToCircleCoil(at, loop.turns(), pose.place(circle.center()),
                    circle.radiusM(), coil.planeZM(), coil.turns());
        }
        List<Vec2> outline = ((Source.CoilShape.Polygon) coil.shape()).vertices().stream().map(pose::place).toList();
        return () -> LoopInductance.mutualToPolygonCoil(at, loop.turns(), outline, coil.planeZM(), coil.turns());
    }

    private static String attempt(String label, java.util.function.DoubleSupplier henries) {
        try {
            return label + " " + Units.format(henries.getAsDouble(), Dimension.INDUCTANCE);
        } catch (IllegalArgumentException refused) {
            return label + " not computed (" + refused.getMessage() + ")";
        }
    }
}

package org.kinduct.solver.circuit;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.DoubleSupplier;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Kinematics;
import org.kinduct.solver.LoopResistance;

/**
 * The inductances of a scene's closed loops where they are at the start of a run (bodies on
 * their prescribed motions at t0, free bodies as drawn): every loop's self-inductance, every
 * pair's mutual inductance, and every loop's mutual inductance with every source coil, each a
 * value or the reason it could not be computed ({@link LoopInductance} refuses wires that run
 * closer than their radii); and each loop's time constant L/R. Computed once per run and read by
 * every output, so the table, the editor and the circuit-model choice agree.
 */
public final class InductanceAtStart {

    /** One inductance: henries, or NaN with the reason. */
    public record Entry(String kind, String first, String second, double henries, String problem) {

        /** True when a value was computed. */
        public boolean known() {
            return problem == null;
        }
    }

    private final List<Entry> self = new ArrayList<>();
    private final List<Entry> mutual = new ArrayList<>();
    private final Map<String, Double> timeConstantS = new LinkedHashMap<>();

    private InductanceAtStart() {
    }

    /** The closed loops of {@code scene} placed at {@code t0S}. */
    public static InductanceAtStart of(Scene scene, double t0S) {
        InductanceAtStart out = new InductanceAtStart();
        Kinematics at = Kinematics.prescribed(scene);
        List<Conductor.Loop> loops = new ArrayList<>();
        List<List<Vec2>> placed = new ArrayList<>();
        for (Conductor c : scene.conductors()) {
            if (c instanceof Conductor.Loop loop && !loop.open()) {
                loops.add(loop);
                placed.add(loop.vertices().stream().map(v -> at.poseAt(v.bodyOr(loop.body()), t0S).place(v.at()))
                        .toList());
            }
        }
        for (int i = 0; i < loops.size(); i++) {
            Conductor.Loop a = loops.get(i);
            List<Vec2> va = placed.get(i);
            Entry l = attempt("L", a.id(), null, () -> LoopInductance.self(va, a.wire().diameterM() / 2, a.turns()));
            out.self.add(l);
            out.timeConstantS.put(a.id(), l.henries() / LoopResistance.ohms(a, perimeter(va)));
        }
        for (int i = 0; i < loops.size(); i++) {
            for (int j = i + 1; j < loops.size(); j++) {
                Conductor.Loop a = loops.get(i);
                Conductor.Loop b = loops.get(j);
                List<Vec2> va = placed.get(i);
                List<Vec2> vb = placed.get(j);
                out.mutual.add(attempt("M", a.id(), b.id(), () -> LoopInductance.mutual(va, a.wire().diameterM() / 2,
                        a.turns(), vb, b.wire().diameterM() / 2, b.turns())));
            }
        }
        for (int i = 0; i < loops.size(); i++) {
            for (Source source : scene.sources()) {
                if (source instanceof Source.SourceCoil coil) {
                    out.mutual.add(attempt("M", loops.get(i).id(), coil.id(),
                            toCoil(loops.get(i), placed.get(i), coil, at.poseAt(coil.body(), t0S))));
                }
            }
        }
        return out;
    }

    /** Self-inductance of each closed loop, in scene order. */
    public List<Entry> self() {
        return List.copyOf(self);
    }

    /** Mutual inductances: loop pairs, then loops with source coils. */
    public List<Entry> mutual() {
        return List.copyOf(mutual);
    }

    /** Self-inductance of closed loop {@code id}, henries; NaN when unknown or not a closed loop. */
    public double selfH(String id) {
        return self.stream().filter(e -> e.first().equals(id)).mapToDouble(Entry::henries).findFirst()
                .orElse(Double.NaN);
    }

    /**
     * The largest L/R of the closed loops, seconds (0 without closed loops).
     *
     * @throws IllegalArgumentException naming the loop and the reason when a loop's inductance is unknown
     */
    public double largestTimeConstantS() {
        for (Entry e : self) {
            if (!e.known()) {
                throw new IllegalArgumentException("loop '" + e.first() + "': inductance not computed: " + e.problem());
            }
        }
        return timeConstantS.values().stream().mapToDouble(Double::doubleValue).max().orElse(0);
    }

    /** True when every closed loop's self-inductance is known. */
    public boolean allSelfKnown() {
        return self.stream().allMatch(Entry::known);
    }

    private static double perimeter(List<Vec2> vertices) {
        double sum = 0;
        for (int i = 0; i < vertices.size(); i++) {
            sum += vertices.get((i + 1) % vertices.size()).minus(vertices.get(i)).length();
        }
        return sum;
    }

    /** Mutual inductance of a loop with a source coil placed by {@code pose}, per the coil's shape. */
    private static DoubleSupplier toCoil(Conductor.Loop loop, List<Vec2> at, Source.SourceCoil coil, Pose pose) {
        if (coil.shape() instanceof Source.CoilShape.Circle circle) {
            return () -> LoopInductance.mutualToCircleCoil(at, loop.turns(), pose.place(circle.center()),
                    circle.radiusM(), coil.planeZM(), coil.turns());
        }
        List<Vec2> outline = ((Source.CoilShape.Polygon) coil.shape()).vertices().stream().map(pose::place).toList();
        return () -> LoopInductance.mutualToPolygonCoil(at, loop.turns(), outline, coil.planeZM(), coil.turns());
    }

    private static Entry attempt(String kind, String first, String second, DoubleSupplier henries) {
        try {
            return new Entry(kind, first, second, henries.getAsDouble(), null);
        } catch (IllegalArgumentException refused) {
            return new Entry(kind, first, second, Double.NaN, refused.getMessage());
        }
    }
}

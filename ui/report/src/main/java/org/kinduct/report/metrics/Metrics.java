package org.kinduct.report.metrics;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SortedSet;
import java.util.TreeSet;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.io.Suggestions;

/**
 * Reads metric expressions:
 * <pre>
 *   METRIC := TERM | TERM '/' TERM
 *   TERM   := NAME [':' ID] [' without ' ID {',' ID}]
 * </pre>
 * NAME is a {@link MetricKind#key()}; ID names the conductor or free body it reads (none for
 * {@code audit_residual}); {@code without} reads it from a run of the scene with those sources or
 * conductors left out. Each name and id is checked against the scene, and a wrong one is named
 * with the nearest right ones.
 */
public final class Metrics {

    private Metrics() {
    }

    /**
     * Reads a metric from its command-line spelling.
     *
     * @throws IllegalArgumentException saying what is wrong with {@code text} and what would be right
     */
    public static Metric parse(String text, Scene scene) {
        String[] parts = text.split("/", -1);
        if (parts.length > 2) {
            throw new IllegalArgumentException("metric '" + text + "': one '/' at most (a ratio of two metrics)");
        }
        Metric.Term first = term(parts[0], text, scene);
        return parts.length == 1 ? first : new Metric.Ratio(first, term(parts[1], text, scene));
    }

    private static Metric.Term term(String raw, String whole, Scene scene) {
        String[] split = raw.strip().split("\\s+without\\s+", -1);
        if (split.length > 2) {
            throw new IllegalArgumentException("metric '" + whole + "': 'without' once per metric");
        }
        String[] nameAndTarget = split[0].strip().split(":", -1);
        if (nameAndTarget.length > 2 || nameAndTarget[0].isEmpty()) {
            throw new IllegalArgumentException("metric '" + whole + "': expected NAME or NAME:ID, got '"
                    + split[0].strip() + "'");
        }
        String name = nameAndTarget[0].strip();
        MetricKind kind = MetricKind.byKey(name).orElseThrow(() -> new IllegalArgumentException("metric '" + whole
                + "': unknown metric '" + name + "'" + nearest(name, keys()) + "; metrics: " + String.join(", ", keys())));
        String target = nameAndTarget.length == 2 ? nameAndTarget[1].strip() : null;
        checkTarget(kind, target, whole, scene);
        SortedSet<String> without = new TreeSet<>();
        if (split.length == 2) {
            for (String id : split[1].split(",", -1)) {
                without.add(leftOut(id.strip(), target, whole, scene));
            }
        }
        return new Metric.Term(kind, target, without);
    }

    private static void checkTarget(MetricKind kind, String target, String whole, Scene scene) {
        String at = "metric '" + whole + "': ";
        if (kind.scope() == MetricKind.Scope.SCENE) {
            if (target != null) {
                throw new IllegalArgumentException(at + kind.key() + " is about " + kind.scope().noun() + " and takes no id");
            }
            return;
        }
        if (target == null || target.isEmpty()) {
            throw new IllegalArgumentException(at + kind.key() + " needs the id of " + kind.scope().noun() + ": "
                    + kind.key() + ":ID; here: " + String.join(", ", candidates(kind.scope(), scene)));
        }
        List<String> fitting = candidates(kind.scope(), scene);
        if (!fitting.contains(target)) {
            boolean exists = scene.conductor(target).isPresent() || scene.body(target).isPresent();
            throw new IllegalArgumentException(at + (exists ? "'" + target + "' is not " + kind.scope().noun()
                    : "no " + kind.scope().noun().replaceFirst("^an? ", "") + " '" + target + "'" + nearest(target, fitting))
                    + "; " + kind.key() + " applies to " + (fitting.isEmpty() ? "nothing in this scene"
                    : String.join(", ", fitting)));
        }
    }

    private static String leftOut(String id, String target, String whole, Scene scene) {
        List<String> ids = new ArrayList<>();
        scene.sources().forEach(s -> ids.add(s.id()));
        scene.conductors().forEach(c -> ids.add(c.id()));
        if (!ids.contains(id)) {
            throw new IllegalArgumentException("metric '" + whole + "': nothing to leave out named '" + id + "'"
                    + nearest(id, ids) + "; sources and conductors: " + String.join(", ", ids));
        }
        if (id.equals(target)) {
            throw new IllegalArgumentException("metric '" + whole + "': cannot read '" + id + "' without itself");
        }
        return id;
    }

    /** Ids the scope applies to, in scene order. */
    public static List<String> candidates(MetricKind.Scope scope, Scene scene) {
        List<String> out = new ArrayList<>();
        switch (scope) {
            case FREE_BODY -> scene.bodies().stream().filter(b -> b.motion() instanceof Motion.Free).map(Body::id)
                    .forEach(out::add);
            case CONDUCTOR -> scene.conductors().stream().filter(c -> !(c instanceof Conductor.Sheet))
                    .forEach(c -> out.add(c.id()));
            case SHEET -> scene.conductors().stream().filter(c -> c instanceof Conductor.Sheet).forEach(c -> out.add(c.id()));
            case LOOP -> scene.conductors().stream().filter(c -> c instanceof Conductor.Loop).forEach(c -> out.add(c.id()));
            case CLOSED_LOOP -> scene.conductors().stream().filter(c -> c instanceof Conductor.Loop l && !l.open())
                    .forEach(c -> out.add(c.id()));
            case SCENE -> { }
        }
        return out;
    }

    private static List<String> keys() {
        return Arrays.stream(MetricKind.values()).map(MetricKind::key).toList();
    }

    private static String nearest(String given, List<String> known) {
        List<String> near = Suggestions.nearest(given, known, 3);
        return near.isEmpty() ? "" : " (did you mean " + String.join(", ", near) + "?)";
    }

    /** Sources and conductors of {@code scene} other than those in {@code without}. */
    public static Scene without(Scene scene, SortedSet<String> without) {
        return without.isEmpty() ? scene : scene.without(without);
    }
}

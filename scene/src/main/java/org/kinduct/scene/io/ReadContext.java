package org.kinduct.scene.io;

import com.fasterxml.jackson.core.io.NumberInput;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Supplier;
import org.kinduct.scene.Body;
import org.kinduct.scene.Checks;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;

/**
 * The state of one read: the problems found so far, the ids declared and referenced (checked at
 * the end so each error carries its path), and the conversions from {@link Json} values.
 *
 * <p>Every conversion returns null exactly when it has reported a problem, so a reader that found
 * no new problems may build its record from the values it read.
 */
final class ReadContext {

    /**
     * Largest size of any quantity in SI units (1e12 m, 1e12 T, 1e12 s, ...): far beyond any scene,
     * and small enough that the solver's products of a dozen such numbers stay finite.
     */
    static final double LARGEST_MAGNITUDE = 1e12;

    /** Longest list accepted: a bound on the memory one value may take. */
    static final int MAX_ITEMS = 10_000;

    /** Reads one value at a path; null means a problem was reported. */
    @FunctionalInterface
    interface Conv<T> {
        T read(String path, Json node);
    }

    private record Ref(String id, String path, Json at) {
    }

    private final SceneFolder folder;
    private final List<Problem> problems = new ArrayList<>();
    private final List<Ref> bodyDeclarations = new ArrayList<>();
    private final List<Ref> objectDeclarations = new ArrayList<>();
    private final List<Ref> bodyReferences = new ArrayList<>();
    private final Map<String, UnitTexts.Given> given = new LinkedHashMap<>();

    /** @param folder where the files the scene names are found */
    ReadContext(SceneFolder folder) {
        this.folder = folder;
    }

    SceneFolder folder() {
        return folder;
    }

    List<Problem> problems() {
        return problems;
    }

    /** The quantities read from texts so far, by path. */
    UnitTexts unitTexts() {
        return UnitTexts.of(given);
    }

    int problemCount() {
        return problems.size();
    }

    void problem(String path, Json at, String message) {
        problem(path, at.line(), at.column(), message);
    }

    void problem(String path, int line, int column, String message) {
        problems.add(new Problem(path, line, column, message));
    }

    static String child(String path, String name) {
        return path.isEmpty() ? name : path + "." + name;
    }

    static String item(String path, int index) {
        return path + "[" + index + "]";
    }

    /** The fields of an object, or null after reporting that {@code node} is not one. */
    Fields fields(String path, Json node, String expected) {
        if (node instanceof Json.Obj obj) {
            return new Fields(this, path, obj);
        }
        problem(path, node, "expected " + expected + ", got " + node.describe());
        return null;
    }

    /** {@code make}'s result, or null after reporting its rule violation at {@code path}. */
    <T> T attempt(String path, Json at, Supplier<T> make) {
        try {
            return make.get();
        } catch (IllegalArgumentException e) {
            problem(path, at, e.getMessage());
            return null;
        }
    }

    Conv<Double> quantity(Dimension d) {
        return (path, node) -> {
            Double v = null;
            if (node instanceof Json.Num num) {
                v = finite(path, num);
            } else if (node instanceof Json.Str str) {
                v = attempt(path, node, () -> Units.parse(str.value(), d));
                if (v != null) {
                    given.put(path, new UnitTexts.Given(str.value(), d));
                }
            } else {
                problem(path, node, "expected " + d.noun() + " (a number in " + siWords(d) + " or a text such as '"
                        + d.example() + "'), got " + node.describe());
            }
            if (v != null && Math.abs(v) > LARGEST_MAGNITUDE) {
                problem(path, node, node.describe() + " is out of range: quantities are at most 1e12 in size in SI"
                        + " units (here " + siWords(d) + ")");
                return null;
            }
            return v;
        };
    }

    /** {@code [x, y]}, each coordinate a quantity of {@code d}. */
    Conv<Vec2> point(Dimension d) {
        Conv<Double> coordinate = quantity(d);
        return (path, node) -> {
            if (!(node instanceof Json.Arr arr) || arr.items().size() != 2) {
                problem(path, node, "expected [x, y] in " + siWords(d) + ", got " + node.describe());
                return null;
            }
            Double x = coordinate.read(item(path, 0), arr.items().get(0));
            Double y = coordinate.read(item(path, 1), arr.items().get(1));
            return x == null || y == null ? null : new Vec2(x, y);
        };
    }

    /** A fixed list of quantities of {@code d}, one per name, e.g. {@code [x size, y size, height]}. */
    Conv<double[]> quantities(Dimension d, String... names) {
        Conv<Double> one = quantity(d);
        return (path, node) -> {
            if (!(node instanceof Json.Arr arr) || arr.items().size() != names.length) {
                problem(path, node, "expected [" + String.join(", ", names) + "], each " + d.noun() + " such as '"
                        + d.example() + "', got " + node.describe());
                return null;
            }
            double[] values = new double[names.length];
            boolean ok = true;
            for (int i = 0; i < values.length; i++) {
                Double v = one.read(item(path, i), arr.items().get(i));
                ok &= v != null;
                values[i] = v == null ? Double.NaN : v;
            }
            return ok ? values : null;
        };
    }

    Conv<Integer> wholeNumber() {
        return (path, node) -> {
            if (node instanceof Json.Num num && num.integral()) {
                try {
                    return Integer.parseInt(num.text());
                } catch (NumberFormatException e) {
                    problem(path, node, "whole number " + node.describe() + " is out of range");
                    return null;
                }
            }
            problem(path, node, "expected a whole number, got " + node.describe());
            return null;
        };
    }

    Conv<String> text() {
        return (path, node) -> {
            if (node instanceof Json.Str str) {
                return str.value();
            }
            problem(path, node, "expected a text in double quotes, got " + node.describe());
            return null;
        };
    }

    Conv<Boolean> flag() {
        return (path, node) -> {
            if (node instanceof Json.Bool b) {
                return b.value();
            }
            problem(path, node, "expected true or false, got " + node.describe());
            return null;
        };
    }

    <E> Conv<E> choice(Choices<E> choices) {
        return (path, node) -> {
            String name = text().read(path, node);
            if (name == null) {
                return null;
            }
            E value = choices.value(name).orElse(null);
            if (value == null) {
                problem(path, node, "unknown value " + node.describe() + Suggestions.hint(name, choices.names())
                        + "; use one of " + String.join(", ", choices.names()));
            }
            return value;
        };
    }

    /** A list whose items each convert with {@code each}; null if any item failed. */
    <T> Conv<List<T>> list(Conv<T> each) {
        return (path, node) -> {
            if (!(node instanceof Json.Arr arr)) {
                problem(path, node, "expected a list [ ... ], got " + node.describe());
                return null;
            }
            if (arr.items().size() > MAX_ITEMS) {
                problem(path, node, "too many items: " + arr.items().size() + " (at most " + MAX_ITEMS + ")");
                return null;
            }
            List<T> out = new ArrayList<>();
            boolean ok = true;
            for (int i = 0; i < arr.items().size(); i++) {
                T v = each.read(item(path, i), arr.items().get(i));
                ok &= v != null;
                out.add(v);
            }
            return ok ? out : null;
        };
    }

    /** The id of a new body; the fixed frame is built in and cannot be declared. */
    Conv<String> bodyDeclaration() {
        return (path, node) -> {
            String id = validId(path, node, "Body");
            if (Body.FIXED.equals(id)) {
                problem(path, node, "'" + Body.FIXED + "' is the built-in fixed frame and cannot be declared");
                return null;
            }
            if (id != null) {
                bodyDeclarations.add(new Ref(id, path, node));
            }
            return id;
        };
    }

    /** The id of a source or conductor; the two share one namespace. */
    Conv<String> objectDeclaration(String what) {
        return (path, node) -> {
            String id = validId(path, node, what);
            if (id != null) {
                objectDeclarations.add(new Ref(id, path, node));
            }
            return id;
        };
    }

    /** The id of the body something rides, checked by {@link #checkReferences()}. */
    Conv<String> bodyReference() {
        return (path, node) -> {
            String id = validId(path, node, "Body");
            if (id != null) {
                bodyReferences.add(new Ref(id, path, node));
            }
            return id;
        };
    }

    private String validId(String path, Json node, String what) {
        String id = text().read(path, node);
        return id == null ? null : attempt(path, node, () -> Checks.id(id, what));
    }

    /** Reports ids used twice and references to bodies that do not exist. */
    void checkReferences() {
        Map<String, Ref> declaredBodies = new LinkedHashMap<>();
        reportDuplicates(bodyDeclarations, declaredBodies, "body id");
        reportDuplicates(objectDeclarations, new LinkedHashMap<>(), "id");
        Set<String> bodies = new LinkedHashSet<>();
        bodies.add(Body.FIXED);
        bodies.addAll(declaredBodies.keySet());
        for (Ref r : bodyReferences) {
            if (!bodies.contains(r.id())) {
                problem(r.path(), r.at(), "unknown body '" + r.id() + "'" + Suggestions.hint(r.id(), bodies)
                        + "; the bodies are " + String.join(", ", bodies));
            }
        }
    }

    private void reportDuplicates(List<Ref> declarations, Map<String, Ref> seen, String what) {
        for (Ref r : declarations) {
            Ref first = seen.putIfAbsent(r.id(), r);
            if (first != null) {
                problem(r.path(), r.at(), what + " '" + r.id() + "' is already used at " + first.path()
                        + " (line " + first.at().line() + ")");
            }
        }
    }

    private Double finite(String path, Json.Num num) {
        // Jackson's port of the fast_float algorithm: correctly rounded like Double.parseDouble, and
        // several times faster on the 17-digit numbers files are written with.
        double v = NumberInput.parseDouble(num.text(), true);
        if (!Double.isFinite(v)) {
            problem(path, num, "number " + num.describe() + " is out of range");
            return null;
        }
        return v;
    }

    /** "metres" for lengths (the common case in messages), else the SI symbol. */
    private static String siWords(Dimension d) {
        return d == Dimension.LENGTH ? "metres" : d.siUnit().symbol();
    }
}

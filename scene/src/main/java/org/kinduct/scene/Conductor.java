package org.kinduct.scene;

import java.util.List;

/**
 * A conductor in the drawing plane. Vertices are as drawn (t = 0); each vertex rides the
 * conductor's body unless it names its own (a bar sliding on fixed rails).
 */
public sealed interface Conductor permits Conductor.Wire, Conductor.Loop {

    String id();

    String body();

    List<Vertex> vertices();

    /**
     * Dispatches to the case for this kind. Adding a kind adds a method to {@link Cases}, so every
     * place that handles conductors fails to compile until it handles the new one.
     */
    <R> R match(Cases<R> cases);

    /** One method per kind of conductor. */
    interface Cases<R> {
        R wire(Wire wire);

        R loop(Loop loop);
    }

    /**
     * An open polyline from its first vertex to its last. EMF &gt; 0 means the last end is the
     * positive terminal.
     */
    record Wire(String id, String body, List<Vertex> vertices) implements Conductor {
        public Wire {
            Checks.id(id, "Conductor");
            Checks.id(body, "Body");
            vertices = List.copyOf(Checks.nonNull(vertices, "vertices"));
            if (vertices.size() < 2) {
                throw new IllegalArgumentException("a wire needs at least 2 vertices, got " + vertices.size());
            }
            requireDistinctNeighbours(vertices, false);
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.wire(this);
        }
    }

    /**
     * A closed polygon of {@code turns} turns, counter-clockwise (as drawn) positive. It may cross
     * itself (figure-eight): flux then counts each lobe with its winding number.
     *
     * @param open true when the loop has a gap: EMF appears across the gap, no current flows
     * @param loadOhm resistor in series with the winding, ohms (0 for a shorted loop)
     * @param temperatureC winding temperature for the resistance, °C
     */
    record Loop(String id, String body, List<Vertex> vertices, int turns, WireSpec wire, boolean open,
                double loadOhm, double temperatureC) implements Conductor {
        public Loop {
            Checks.id(id, "Conductor");
            Checks.id(body, "Body");
            vertices = List.copyOf(Checks.nonNull(vertices, "vertices"));
            if (vertices.size() < 3) {
                throw new IllegalArgumentException("a loop needs at least 3 vertices, got " + vertices.size());
            }
            requireDistinctNeighbours(vertices, true);
            if (turns < 1) {
                throw new IllegalArgumentException("turns must be at least 1, got " + turns);
            }
            Checks.nonNull(wire, "wire");
            Checks.nonNegative(loadOhm, "load resistance");
            Checks.finite(temperatureC, "temperature");
            if (temperatureC < -273.15) {
                throw new IllegalArgumentException("temperature must be above absolute zero, got " + temperatureC);
            }
            if (!(wire.material().resistivityAt(temperatureC) > 0)) {
                throw new IllegalArgumentException("temperature " + temperatureC + " °C is below the range of the"
                        + " linear resistivity model of " + wire.material().name().toLowerCase(java.util.Locale.ROOT)
                        + ", whose resistivity reaches zero at " + wire.material().zeroResistivityC() + " °C");
            }
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.loop(this);
        }

        /** A shorted single-turn copper loop at 20 °C. */
        public static Loop simple(String id, String body, List<Vertex> vertices, WireSpec wire) {
            return new Loop(id, body, vertices, 1, wire, false, 0, 20);
        }
    }

    /**
     * Refuses a vertex drawn where the one before it is (and, for a closed path, the last where the
     * first is): the side between them has no length and no direction.
     */
    private static void requireDistinctNeighbours(List<Vertex> vertices, boolean closed) {
        int n = vertices.size();
        for (int i = 0; i < (closed ? n : n - 1); i++) {
            if (vertices.get(i).at().equals(vertices.get((i + 1) % n).at())) {
                throw new IllegalArgumentException("vertex " + (i + 1) % n + " repeats vertex " + i + " at "
                        + vertices.get(i).at().x() + ", " + vertices.get(i).at().y() + " m");
            }
        }
    }

    /** A conductor vertex: drawn position and, optionally, a body other than its conductor's. */
    record Vertex(Vec2 at, String body) {
        public Vertex {
            Checks.nonNull(at, "vertex position");
            if (body != null) {
                Checks.id(body, "Body");
            }
        }

        public static Vertex at(double x, double y) {
            return new Vertex(new Vec2(x, y), null);
        }

        /** The body this vertex rides: its own, or else {@code conductorBody}. */
        public String bodyOr(String conductorBody) {
            return body != null ? body : conductorBody;
        }
    }
}

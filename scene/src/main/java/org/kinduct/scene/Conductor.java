package org.kinduct.scene;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * A conductor in the drawing plane. Vertices are as drawn (t = 0); each vertex rides the
 * conductor's body unless it names its own (a bar sliding on fixed rails). Wires and loops are
 * thin filaments; plates and channels ({@link Sheet}) are extended conductors that carry eddy
 * currents, and their vertices are their outlines.
 */
public sealed interface Conductor permits Conductor.Wire, Conductor.Loop, Conductor.Plate, Conductor.Channel {

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

        R plate(Plate plate);

        R channel(Channel channel);
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

    /**
     * What plates and channels share: a thin conductor of uniform thickness and conductivity whose
     * outline (and holes) ride one body, with electrodes on its edge. Eddy currents are solved on
     * a grid of square cells ({@code cellM}, or chosen from the shape and the field when absent).
     */
    sealed interface Sheet permits Plate, Channel {

        /** An electrode must lie on the edge to within this fraction of the conductor's size. */
        double ON_EDGE = 1e-6;

        /**
         * Vertices closer than this fraction of the conductor's size are refused: the region
         * work counts points within 1e-10 of the size as one.
         */
        double CLOSEST_VERTICES = 1e-9;

        /** Most grid cells a file may ask for with its cell size (about 1450 × 1450; the automatic choice stays far below). */
        int MOST_CELLS = 1 << 21;

        String id();

        /** The body the whole conductor rides. */
        String body();

        /** The outer edge as drawn, metres. */
        List<Vec2> outline();

        /** Insulating holes as drawn, metres; none for a channel. */
        List<List<Vec2>> holes();

        /** Thickness of a plate, depth of a channel's liquid, metres. */
        double thicknessM();

        double sigmaSPerM();

        List<Electrode> electrodes();

        List<ElectrodePair> pairs();

        /** Side of the grid's square cells, metres, when the file sets it. */
        OptionalDouble cellM();
    }

    /**
     * A thin plate of uniform thickness, with optional holes and slots, riding its body rigidly.
     *
     * @param outline simple polygon, at least 3 points, as drawn
     * @param holes simple polygons strictly inside the outline and apart from each other
     * @param thicknessM d
     * @param electrodes points on the outline or a hole's edge whose potentials are reported
     * @param pairs electrode pairs whose voltages are reported
     * @param cellM grid cell size, or empty for the automatic choice
     */
    record Plate(String id, String body, List<Vec2> outline, List<List<Vec2>> holes, double thicknessM,
                 Conductivity conductivity, List<Electrode> electrodes, List<ElectrodePair> pairs,
                 OptionalDouble cellM) implements Conductor, Sheet {
        public Plate {
            Checks.id(id, "Conductor");
            Checks.id(body, "Body");
            outline = Polygons.requireSimple(outline, "plate outline");
            holes = Polygons.requireHoles(outline, holes);
            double gap = CLOSEST_VERTICES * Polygons.extentM(outline);
            Polygons.requireSpaced(outline, gap, "plate outline");
            for (int h = 0; h < holes.size(); h++) {
                Polygons.requireSpaced(holes.get(h), gap, "hole " + h);
            }
            Checks.positive(thicknessM, "thickness");
            Checks.nonNull(conductivity, "conductivity");
            electrodes = List.copyOf(Checks.nonNull(electrodes, "electrodes"));
            pairs = List.copyOf(Checks.nonNull(pairs, "pairs"));
            cellM = checkCell(cellM, outline);
            List<Vec2> shape = outline;
            List<List<Vec2>> cut = holes;
            checkElectrodes(electrodes, pairs, e -> onEdge(shape, cut, e.at()), "the plate's edge (outline or a hole)");
        }

        /** Whether {@code p} lies on the outline or a hole's edge, to within {@link Sheet#ON_EDGE} of the outline's size. */
        public static boolean onEdge(List<Vec2> outline, List<List<Vec2>> holes, Vec2 p) {
            double tolerance = ON_EDGE * Polygons.extentM(outline);
            if (Polygons.nearestEdgePoint(outline, p).minus(p).length() <= tolerance) {
                return true;
            }
            return holes.stream().anyMatch(h -> Polygons.nearestEdgePoint(h, p).minus(p).length() <= tolerance);
        }

        @Override
        public List<Vertex> vertices() {
            return outline.stream().map(p -> new Vertex(p, null)).toList();
        }

        @Override
        public double sigmaSPerM() {
            return conductivity.sigmaSPerM();
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.plate(this);
        }
    }

    /**
     * Conductive liquid flowing in a straight channel with insulating walls: centreline from
     * {@code start} to {@code end} as drawn, the flow along it (relative to the walls, which ride
     * the body) with mean velocity {@code flow} and a {@link Profile} across the width. The
     * channel's ends are cut through a longer flow and conduct no current out of it.
     *
     * @param electrodes points on the two walls
     */
    record Channel(String id, String body, Vec2 start, Vec2 end, double widthM, double depthM, double sigmaSPerM,
                   Profile profile, MeanFlow flow, List<Electrode> electrodes, List<ElectrodePair> pairs,
                   OptionalDouble cellM) implements Conductor, Sheet {
        public Channel {
            Checks.id(id, "Conductor");
            Checks.id(body, "Body");
            Checks.nonNull(start, "start");
            Checks.nonNull(end, "end");
            if (start.equals(end)) {
                throw new IllegalArgumentException("a channel's centreline needs length; start and end are both at "
                        + start);
            }
            Checks.positive(widthM, "width");
            Checks.positive(depthM, "depth");
            double length = end.minus(start).length();
            if (Math.min(length, widthM) < CLOSEST_VERTICES * Math.max(length, widthM)) {
                throw new IllegalArgumentException("a channel " + length + " m long and " + widthM + " m wide is"
                        + " too thin to solve: its length and width must be within a billion times each other");
            }
            Checks.positive(sigmaSPerM, "conductivity");
            Checks.nonNull(profile, "profile");
            Checks.nonNull(flow, "flow");
            electrodes = List.copyOf(Checks.nonNull(electrodes, "electrodes"));
            pairs = List.copyOf(Checks.nonNull(pairs, "pairs"));
            cellM = checkCell(cellM, corners(start, end, widthM));
            Vec2 from = start;
            Vec2 to = end;
            double w = widthM;
            checkElectrodes(electrodes, pairs, e -> onWall(from, to, w, e.at()), "a wall of the channel");
        }

        /**
         * Whether {@code p} lies on a wall of the channel from {@code start} to {@code end}, {@code widthM}
         * wide, to within {@link Sheet#ON_EDGE} of its size.
         */
        public static boolean onWall(Vec2 start, Vec2 end, double widthM, Vec2 p) {
            Vec2 along = end.minus(start);
            double length = along.length();
            Vec2 t = along.times(1 / length);
            double tolerance = ON_EDGE * Math.max(length, widthM);
            Vec2 r = p.minus(start);
            double s = r.dot(t);
            return Math.abs(Math.abs(t.cross(r)) - widthM / 2) <= tolerance && s >= -tolerance
                    && s <= length + tolerance;
        }

        /** Velocity profiles across the width. */
        public enum Profile {
            /** Uniform across the width. */
            PLUG,
            /** Parabolic, plane Poiseuille flow between the walls. */
            LAMINAR,
            /** One-seventh power law from each wall. */
            TURBULENT
        }

        /** The unit vector from start to end. */
        public Vec2 direction() {
            Vec2 along = end.minus(start);
            return along.times(1 / along.length());
        }

        /** The liquid's plan, counter-clockwise from the start's right-hand corner. */
        @Override
        public List<Vec2> outline() {
            return corners(start, end, widthM);
        }

        /** The plan of a channel from {@code start} to {@code end}, counter-clockwise from the start's right-hand corner. */
        private static List<Vec2> corners(Vec2 start, Vec2 end, double widthM) {
            Vec2 along = end.minus(start);
            Vec2 side = along.times(1 / along.length()).perp().times(widthM / 2);
            return List.of(start.minus(side), end.minus(side), end.plus(side), start.plus(side));
        }

        @Override
        public List<List<Vec2>> holes() {
            return List.of();
        }

        @Override
        public double thicknessM() {
            return depthM;
        }

        @Override
        public List<Vertex> vertices() {
            return outline().stream().map(p -> new Vertex(p, null)).toList();
        }

        @Override
        public <R> R match(Cases<R> cases) {
            return cases.channel(this);
        }
    }

    /**
     * A named point on a plate's or channel's edge where its potential is read; it draws no
     * current (an ideal voltmeter's contact).
     */
    record Electrode(String name, Vec2 at) {
        public Electrode {
            Checks.id(name, "Electrode");
            Checks.nonNull(at, "electrode position");
        }
    }

    /**
     * A voltmeter across two electrodes: its voltage is φ({@code plus}) − φ({@code minus}), so a
     * positive voltage makes {@code plus} the + electrode.
     */
    record ElectrodePair(String plus, String minus) {
        public ElectrodePair {
            Checks.id(plus, "Electrode");
            Checks.id(minus, "Electrode");
            if (plus.equals(minus)) {
                throw new IllegalArgumentException("a pair needs two different electrodes, got '" + plus + "' twice");
            }
        }
    }

    /**
     * A cell size the file sets, checked against the conductor's plan ({@code outline}): positive,
     * and giving at most {@link Sheet#MOST_CELLS} cells over the outline's box, so that no file can
     * ask for a grid that does not fit in memory.
     */
    private static OptionalDouble checkCell(OptionalDouble cellM, List<Vec2> outline) {
        Checks.nonNull(cellM, "cell size");
        if (cellM.isPresent()) {
            double h = cellM.getAsDouble();
            Checks.positive(h, "cell size");
            Polygons.Box box = Polygons.box(outline);
            double cells = Math.ceil((box.maxX() - box.minX()) / h) * Math.ceil((box.maxY() - box.minY()) / h);
            if (!(cells <= Sheet.MOST_CELLS)) {
                throw new IllegalArgumentException("a cell of " + h + " m gives about " + String.format(
                        java.util.Locale.ROOT, "%.3g", cells) + " cells over this conductor; at most " + Sheet.MOST_CELLS
                        + " are allowed: choose a cell of at least " + String.format(java.util.Locale.ROOT, "%.3g",
                        Math.sqrt((box.maxX() - box.minX()) * (box.maxY() - box.minY()) / Sheet.MOST_CELLS)) + " m");
            }
        }
        return cellM;
    }

    /** Electrode names are unique, each lies where {@code placed} accepts it ({@code where}), pairs name known electrodes. */
    private static void checkElectrodes(List<Electrode> electrodes, List<ElectrodePair> pairs,
                                        java.util.function.Predicate<Electrode> placed, String where) {
        Set<String> names = new LinkedHashSet<>();
        for (Electrode e : electrodes) {
            Checks.nonNull(e, "electrode");
            if (!names.add(e.name())) {
                throw new IllegalArgumentException("electrode name '" + e.name() + "' is used twice");
            }
            if (!placed.test(e)) {
                throw new IllegalArgumentException("electrode '" + e.name() + "' at (" + e.at().x() + ", " + e.at().y()
                        + ") m is not on " + where);
            }
        }
        for (ElectrodePair p : pairs) {
            Checks.nonNull(p, "pair");
            for (String name : List.of(p.plus(), p.minus())) {
                if (!names.contains(name)) {
                    throw new IllegalArgumentException("pair " + p.plus() + "/" + p.minus() + " names electrode '"
                            + name + "', which does not exist; the electrodes are " + names);
                }
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

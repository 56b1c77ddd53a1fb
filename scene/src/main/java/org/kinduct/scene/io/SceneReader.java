package org.kinduct.scene.io;

import static java.util.Map.entry;
import static org.kinduct.scene.units.Dimension.ACCELERATION;
import static org.kinduct.scene.units.Dimension.ANGLE;
import static org.kinduct.scene.units.Dimension.ANGULAR_SPEED;
import static org.kinduct.scene.units.Dimension.CONDUCTIVITY;
import static org.kinduct.scene.units.Dimension.CURRENT;
import static org.kinduct.scene.units.Dimension.DAMPING;
import static org.kinduct.scene.units.Dimension.FLUX_DENSITY;
import static org.kinduct.scene.units.Dimension.FORCE;
import static org.kinduct.scene.units.Dimension.FREQUENCY;
import static org.kinduct.scene.units.Dimension.INERTIA;
import static org.kinduct.scene.units.Dimension.LENGTH;
import static org.kinduct.scene.units.Dimension.MASS;
import static org.kinduct.scene.units.Dimension.RESISTANCE;
import static org.kinduct.scene.units.Dimension.STIFFNESS;
import static org.kinduct.scene.units.Dimension.TEMPERATURE;
import static org.kinduct.scene.units.Dimension.TIME;
import static org.kinduct.scene.units.Dimension.VELOCITY;

import java.io.IOException;
import java.io.InputStream;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.Function;
import java.util.function.Predicate;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductivity;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.EarthField;
import org.kinduct.scene.MeanFlow;
import org.kinduct.scene.FieldGrid;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireClearance;
import org.kinduct.scene.WireSpec;

/**
 * Binds a {@link Json} tree to the scene records, following docs/scene-format.md. Each method
 * reads every field of its object before deciding whether to build, so one pass reports all
 * problems; values come back null only after a problem was reported.
 */
final class SceneReader {

    /**
     * Most responses a free body may go through in the window: its fastest mechanical rate
     * ({@link Motion.Free#fastestRatePerS}) times t1 − t0. The explicit integrator takes a few
     * steps per response, and a run takes at most ten million steps.
     */
    static final double MAX_RESPONSES = 1e6;

    /** Defaults of optional fields (docs/scene-format.md). */
    static final TimeSpan DEFAULT_TIME = new TimeSpan(0, 1, 0.01);
    static final WireSpec DEFAULT_WIRE = WireSpec.awg(Material.COPPER, 30);
    static final double DEFAULT_TEMPERATURE_C = 20;

    private final ReadContext ctx;

    private final Choices<Function<Fields, Motion>> motions = Choices.of(
            entry("still", f -> f.build(Motion.Still::new)),
            entry("glide", this::glide),
            entry("accelerate", this::accelerate),
            entry("oscillate", this::oscillate),
            entry("spin", this::spin),
            entry("path", this::path),
            entry("free", this::free));

    private final Choices<Function<Fields, Source>> sources = Choices.of(
            entry("field-patch", this::fieldPatch),
            entry("uniform-field", this::uniformField),
            entry("block-magnet", this::blockMagnet),
            entry("cylinder-magnet", this::cylinderMagnet),
            entry("source-coil", this::sourceCoil),
            entry("field-map", this::fieldMap));

    private final Choices<Function<Fields, Conductor>> conductors = Choices.of(
            entry("wire", this::wire),
            entry("loop", this::loop),
            entry("plate", this::plate),
            entry("channel", this::channel));

    private final Choices<Function<Fields, MeanFlow>> flows = Choices.of(
            entry("steady", this::steadyFlow),
            entry("sinusoid", this::sinusoidFlow),
            entry("keys", this::keyedFlow));

    SceneReader(ReadContext ctx) {
        this.ctx = ctx;
    }

    /** The source kinds this reader knows, as the file names them. */
    List<String> sourceKinds() {
        return sources.names();
    }

    /** The scene, or null when problems were reported. */
    Scene scene(Json root) {
        Fields f = ctx.fields("", root, "a scene object { \"format\": \"" + Scene.FORMAT + "\", ... }");
        if (f == null) {
            return null;
        }
        String format = f.req("format", ctx.text());
        if (format != null && !Scene.FORMAT.equals(format)) {
            f.problem("this is not a Kinduct scene: \"format\" is '" + format + "', expected '" + Scene.FORMAT + "'");
        }
        Integer version = f.req("version", ctx.wholeNumber());
        if (version != null && version != Scene.VERSION) {
            f.problem("scene file version " + version + " is not supported; this program reads version "
                    + Scene.VERSION + (version > Scene.VERSION ? " (the file is from a newer program)" : ""));
        }
        if (ctx.problemCount() > 0) {
            return null; // another kind of file: checking the rest would only add noise
        }
        String name = f.opt("name", ctx.text(), "");
        String description = f.opt("description", ctx.text(), "");
        TimeSpan time = f.opt("time", this::time, DEFAULT_TIME);
        Vec2 gravity = f.opt("gravity", ctx.point(ACCELERATION), Vec2.ZERO);
        List<Body> bodyList = f.opt("bodies", ctx.list(this::body), List.of());
        List<Source> sourceList = f.opt("sources", ctx.list(kinded(sources, "a source")), List.of());
        List<Conductor> conductorList = f.opt("conductors", ctx.list(kinded(conductors, "a conductor")), List.of());
        ctx.checkReferences();
        if (time != null && bodyList != null) {
            checkResponses(time, bodyList, f.node("bodies"));
        }
        return f.build(() -> new Scene(name, description, bodyList, sourceList, conductorList, time, gravity));
    }

    /** A free body whose own mechanics respond too fast to integrate over the window is refused at its motion. */
    private void checkResponses(TimeSpan time, List<Body> bodies, Json listed) {
        double window = time.t1S() - time.t0S();
        for (int i = 0; i < bodies.size(); i++) {
            if (bodies.get(i).motion() instanceof Motion.Free free && free.fastestRatePerS() * window > MAX_RESPONSES) {
                Json body = ((Json.Arr) listed).items().get(i);
                ctx.problem(ReadContext.item("bodies", i) + ".motion", body, String.format(java.util.Locale.ROOT,
                        "this free body responds too fast for the time window: damping rate c/m and spring"
                        + " frequency √(k/m) reach %.3g /s, %.3g times over t1 − t0 = %s s (at most %.0e);"
                        + " the integrator would need more steps than a run may take", free.fastestRatePerS(),
                        free.fastestRatePerS() * window, window, MAX_RESPONSES));
            }
        }
    }

    private static List<Vec2> drawn(Conductor c) {
        return c.vertices().stream().map(Conductor.Vertex::at).toList();
    }

    private TimeSpan time(String path, Json node) {
        Fields f = ctx.fields(path, node, "{\"t0\": ..., \"t1\": ..., \"dt\": ...}");
        if (f == null) {
            return null;
        }
        Double t0 = f.opt("t0", ctx.quantity(TIME), DEFAULT_TIME.t0S());
        Double t1 = f.opt("t1", ctx.quantity(TIME), DEFAULT_TIME.t1S());
        Double dt = f.opt("dt", ctx.quantity(TIME), DEFAULT_TIME.dtS());
        return f.build(() -> new TimeSpan(t0, t1, dt));
    }

    private Body body(String path, Json node) {
        Fields f = ctx.fields(path, node, "a body {\"id\": ..., \"motion\": ...}");
        if (f == null) {
            return null;
        }
        String id = f.req("id", ctx.bodyDeclaration());
        String name = f.opt("name", ctx.text(), null);
        Vec2 pivot = f.opt("pivot", ctx.point(LENGTH), Vec2.ZERO);
        Motion motion = f.opt("motion", kinded(motions, "a motion"), new Motion.Still());
        return f.build(() -> new Body(id, name, pivot, motion));
    }

    /** An object whose "kind" picks the reader for its other fields. */
    private <T> ReadContext.Conv<T> kinded(Choices<Function<Fields, T>> kinds, String what) {
        return (path, node) -> {
            Fields f = ctx.fields(path, node, what + " {\"kind\": \"" + kinds.names().get(0) + "\", ...}");
            if (f == null) {
                return null;
            }
            Function<Fields, T> reader = f.req("kind", ctx.choice(kinds));
            // Without a known kind the other fields cannot be checked; the kind's problem says why.
            return reader == null ? null : reader.apply(f);
        };
    }

    // ---- motions ----

    private Motion glide(Fields f) {
        Vec2 velocity = f.req("velocity", ctx.point(VELOCITY));
        return f.build(() -> new Motion.Glide(velocity));
    }

    private Motion accelerate(Fields f) {
        Vec2 v0 = f.opt("initialVelocity", ctx.point(VELOCITY), Vec2.ZERO);
        Vec2 a = f.req("acceleration", ctx.point(ACCELERATION));
        return f.build(() -> new Motion.Accelerate(v0, a));
    }

    private Motion oscillate(Fields f) {
        Double amplitude = f.req("amplitude", ctx.quantity(LENGTH));
        Double frequency = f.req("frequency", ctx.quantity(FREQUENCY));
        Double direction = f.opt("direction", ctx.quantity(ANGLE), 0.0);
        Double phase = f.opt("phase", ctx.quantity(ANGLE), 0.0);
        return f.build(() -> new Motion.Oscillate(amplitude, frequency, direction, phase));
    }

    private Motion spin(Fields f) {
        Double omega = f.req("omega", ctx.quantity(ANGULAR_SPEED));
        Double start = f.opt("startAngle", ctx.quantity(ANGLE), 0.0);
        return f.build(() -> new Motion.Spin(omega, start));
    }

    private Motion path(Fields f) {
        Motion.Path.Blend blend = f.opt("blend", ctx.choice(Vocabulary.BLEND), Motion.Path.Blend.LINEAR);
        List<Motion.Path.Key> keys = f.req("keys", ctx.list(this::key));
        return f.build(() -> new Motion.Path(keys, blend));
    }

    private Motion.Path.Key key(String path, Json node) {
        Fields f = ctx.fields(path, node, "a key {\"t\": ..., \"offset\": [x, y], \"angle\": ...}");
        if (f == null) {
            return null;
        }
        Double t = f.req("t", ctx.quantity(TIME));
        Vec2 offset = f.opt("offset", ctx.point(LENGTH), Vec2.ZERO);
        Double angle = f.opt("angle", ctx.quantity(ANGLE), 0.0);
        return f.build(() -> new Motion.Path.Key(t, offset, angle));
    }

    private Motion free(Fields f) {
        Double mass = f.req("mass", ctx.quantity(MASS));
        Double inertia = f.opt("inertia", ctx.quantity(INERTIA), 0.0);
        Vec2 v0 = f.opt("initialVelocity", ctx.point(VELOCITY), Vec2.ZERO);
        Double omega0 = f.opt("initialOmega", ctx.quantity(ANGULAR_SPEED), 0.0);
        Double damping = f.opt("damping", ctx.quantity(DAMPING), 0.0);
        Vec2 force = f.opt("force", ctx.point(FORCE), Vec2.ZERO);
        Vec2 amplitude = f.opt("forceAmplitude", ctx.point(FORCE), Vec2.ZERO);
        Double frequency = f.opt("forceFrequency", ctx.quantity(FREQUENCY), 0.0);
        List<Motion.Free.Spring> springs = f.opt("springs", ctx.list(this::spring), List.of());
        return f.build(() -> new Motion.Free(mass, inertia, v0, omega0, damping, force, amplitude, frequency, springs));
    }

    private Motion.Free.Spring spring(String path, Json node) {
        Fields f = ctx.fields(path, node, "a spring {\"anchor\": [x, y] or \"body\": id, \"stiffness\": ...}");
        if (f == null) {
            return null;
        }
        if (f.has("anchor") == f.has("body")) {
            f.problem("a spring needs either \"anchor\": [x, y] or \"body\": id (the other body's pivot), not "
                    + (f.has("anchor") ? "both" : "neither"));
        }
        Vec2 anchor = f.opt("anchor", ctx.point(LENGTH), null);
        String other = f.opt("body", ctx.bodyReference(), null);
        Double stiffness = f.req("stiffness", ctx.quantity(STIFFNESS));
        Double rest = f.opt("restLength", ctx.quantity(LENGTH), 0.0);
        return f.build(() -> new Motion.Free.Spring(anchor, other, stiffness, rest));
    }

    // ---- sources ----

    private Source fieldPatch(Fields f) {
        String id = f.req("id", ctx.objectDeclaration("Source"));
        String body = f.opt("body", ctx.bodyReference(), Body.FIXED);
        List<Vec2> outline = f.req("outline", ctx.list(ctx.point(LENGTH)));
        Double bz = f.req("bz", ctx.quantity(FLUX_DENSITY));
        return f.build(() -> new Source.FieldPatch(id, body, outline, bz));
    }

    private Source uniformField(Fields f) {
        String id = f.req("id", ctx.objectDeclaration("Source"));
        boolean value = f.has("bz");
        if (f.has("earth")) {
            if (value) {
                f.problem("a uniform field takes either \"bz\" or \"earth\", not both: with \"earth\" its B_z"
                        + " follows from the geomagnetic elements and the board's orientation");
            }
            EarthField earth = f.req("earth", this::earth);
            return f.build(() -> Source.UniformField.earth(id, earth));
        }
        Double bz = f.req("bz", ctx.quantity(FLUX_DENSITY));
        return f.build(() -> new Source.UniformField(id, bz));
    }

    private EarthField earth(String path, Json node) {
        Fields f = ctx.fields(path, node, "Earth's field {\"intensity\": ..., \"inclination\": ..., \"declination\": ...}");
        if (f == null) {
            return null;
        }
        Double intensity = f.req("intensity", ctx.quantity(FLUX_DENSITY));
        Double inclination = f.req("inclination", ctx.quantity(ANGLE));
        Double declination = f.opt("declination", ctx.quantity(ANGLE), 0.0);
        Double tilt = f.opt("tilt", ctx.quantity(ANGLE), 0.0);
        Double heading = f.opt("heading", ctx.quantity(ANGLE), 0.0);
        EarthField.Face face = f.opt("face", ctx.choice(Vocabulary.FACE), EarthField.Face.UP);
        return f.build(() -> new EarthField(intensity, inclination, declination, tilt, heading, face));
    }

    private Source blockMagnet(Fields f) {
        String id = f.req("id", ctx.objectDeclaration("Source"));
        String body = f.opt("body", ctx.bodyReference(), Body.FIXED);
        Vec2 center = f.req("center", ctx.point(LENGTH));
        double[] size = f.req("size", ctx.quantities(LENGTH, "x size", "y size", "height"));
        Double angle = f.opt("angle", ctx.quantity(ANGLE), 0.0);
        Double standoff = f.req("standoff", ctx.quantity(LENGTH));
        Source.Side side = f.opt("side", ctx.choice(Vocabulary.SIDE), Source.Side.BELOW);
        Double remanence = f.req("remanence", ctx.quantity(FLUX_DENSITY));
        Source.Magnetization north = f.opt("north", ctx.choice(Vocabulary.NORTH), Source.Magnetization.PLUS_Z);
        return f.build(() -> new Source.BlockMagnet(id, body, center, size[0], size[1], size[2], angle, standoff,
                side, remanence, north));
    }

    private Source cylinderMagnet(Fields f) {
        String id = f.req("id", ctx.objectDeclaration("Source"));
        String body = f.opt("body", ctx.bodyReference(), Body.FIXED);
        Vec2 center = f.req("center", ctx.point(LENGTH));
        Double radius = f.req("radius", ctx.quantity(LENGTH));
        Double height = f.req("height", ctx.quantity(LENGTH));
        Double standoff = f.req("standoff", ctx.quantity(LENGTH));
        Source.Side side = f.opt("side", ctx.choice(Vocabulary.SIDE), Source.Side.BELOW);
        Double remanence = f.req("remanence", ctx.quantity(FLUX_DENSITY));
        Source.Magnetization north = f.opt("north", ctx.choice(Vocabulary.NORTH), Source.Magnetization.PLUS_Z);
        return f.build(() -> new Source.CylinderMagnet(id, body, center, radius, height, standoff, side, remanence,
                north));
    }

    private Source sourceCoil(Fields f) {
        String id = f.req("id", ctx.objectDeclaration("Source"));
        String body = f.opt("body", ctx.bodyReference(), Body.FIXED);
        if (f.has("polygon") == f.has("circle")) {
            f.problem("a source coil needs either \"polygon\": [[x, y], ...] or \"circle\": {...}, not "
                    + (f.has("polygon") ? "both" : "neither"));
        }
        Source.CoilShape polygon = f.opt("polygon", this::coilPolygon, null);
        Source.CoilShape circle = f.opt("circle", this::coilCircle, null);
        Integer turns = f.opt("turns", ctx.wholeNumber(), 1);
        Double z = f.req("z", ctx.quantity(LENGTH));
        Source.Drive drive = f.req("current", this::drive);
        return f.build(() -> new Source.SourceCoil(id, body, polygon != null ? polygon : circle, turns, z, drive));
    }

    private Source fieldMap(Fields f) {
        String id = f.req("id", ctx.objectDeclaration("Source"));
        String body = f.opt("body", ctx.bodyReference(), Body.FIXED);
        Located<String> file = f.req("file", located(ctx.text()));
        FieldGrid.Layout layout = f.opt("layout", ctx.choice(Vocabulary.MAP_LAYOUT), FieldGrid.Layout.POINTS);
        boolean matrix = layout == FieldGrid.Layout.MATRIX;
        for (String name : List.of("origin", "spacing", "bzUnit")) {
            if (layout != null && f.has(name) != matrix) {
                f.problem(matrix ? "a matrix field map needs \"origin\", \"spacing\" and \"bzUnit\"; \"" + name
                        + "\" is missing" : "\"" + name + "\" belongs to \"layout\": \"matrix\"; a points file"
                        + " carries its own coordinates and units");
            }
        }
        Vec2 origin = f.opt("origin", ctx.point(LENGTH), null);
        Vec2 spacing = f.opt("spacing", ctx.point(LENGTH), null);
        Double unit = f.opt("bzUnit", ctx.quantity(FLUX_DENSITY), null);
        Vec2 offset = f.opt("offset", ctx.point(LENGTH), Vec2.ZERO);
        Source.FieldMap.Outside outside = f.opt("outside", ctx.choice(Vocabulary.OUTSIDE),
                Source.FieldMap.Outside.ZERO);
        if (file == null || layout == null || (matrix && (origin == null || spacing == null || unit == null))) {
            return f.build(() -> null);
        }
        FieldGrid grid = grid(file, layout, origin, spacing, unit);
        return f.build(() -> new Source.FieldMap(id, body, file.value(), grid, offset, outside));
    }

    /** The samples of a field-map file, or null after reporting at the file name why they cannot be read. */
    private FieldGrid grid(Located<String> file, FieldGrid.Layout layout, Vec2 origin, Vec2 spacing, Double unit) {
        String name = ctx.folder().describe(file.value());
        try (InputStream in = ctx.folder().open(file.value())) {
            return layout == FieldGrid.Layout.MATRIX ? FieldMapCsv.readMatrix(in, name, origin, spacing, unit)
                    : FieldMapCsv.readPoints(in, name);
        } catch (FieldMapFormatException e) {
            ctx.problem(file.path(), file.at(), "field map " + e.getMessage());
        } catch (IOException e) {
            ctx.problem(file.path(), file.at(), "cannot read field map " + name + ": " + e.getMessage());
        }
        return null;
    }

    /** A value with where it was read, for problems found after the read. */
    private record Located<T>(T value, String path, Json at) {
    }

    private static <T> ReadContext.Conv<Located<T>> located(ReadContext.Conv<T> conv) {
        return (path, node) -> {
            T value = conv.read(path, node);
            return value == null ? null : new Located<>(value, path, node);
        };
    }

    private Source.CoilShape coilPolygon(String path, Json node) {
        List<Vec2> vertices = ctx.list(ctx.point(LENGTH)).read(path, node);
        return vertices == null ? null : ctx.attempt(path, node, () -> new Source.CoilShape.Polygon(vertices));
    }

    private Source.CoilShape coilCircle(String path, Json node) {
        Fields f = ctx.fields(path, node, "a circle {\"center\": [x, y], \"radius\": ...}");
        if (f == null) {
            return null;
        }
        Vec2 center = f.req("center", ctx.point(LENGTH));
        Double radius = f.req("radius", ctx.quantity(LENGTH));
        return f.build(() -> new Source.CoilShape.Circle(center, radius));
    }

    private Source.Drive drive(String path, Json node) {
        Fields f = ctx.fields(path, node, "a current {\"dc\": ..., \"amplitude\": ..., \"frequency\": ...}");
        if (f == null) {
            return null;
        }
        Double dc = f.opt("dc", ctx.quantity(CURRENT), 0.0);
        Double amplitude = f.opt("amplitude", ctx.quantity(CURRENT), 0.0);
        Double frequency = f.opt("frequency", ctx.quantity(FREQUENCY), 0.0);
        Double phase = f.opt("phase", ctx.quantity(ANGLE), 0.0);
        return f.build(() -> new Source.Drive(dc, amplitude, frequency, phase));
    }

    // ---- conductors ----

    private Conductor wire(Fields f) {
        String id = f.req("id", ctx.objectDeclaration("Conductor"));
        String body = f.opt("body", ctx.bodyReference(), Body.FIXED);
        List<Conductor.Vertex> vertices = f.req("vertices", ctx.list(this::vertex));
        return f.build(() -> new Conductor.Wire(id, body, vertices));
    }

    private Conductor loop(Fields f) {
        String id = f.req("id", ctx.objectDeclaration("Conductor"));
        String body = f.opt("body", ctx.bodyReference(), Body.FIXED);
        List<Conductor.Vertex> vertices = f.req("vertices", ctx.list(this::vertex));
        Integer turns = f.opt("turns", ctx.wholeNumber(), 1);
        WireSpec wire = f.opt("wire", this::wireSpec, DEFAULT_WIRE);
        Boolean open = f.opt("open", ctx.flag(), false);
        Double load = f.opt("load", ctx.quantity(RESISTANCE), 0.0);
        Double temperature = f.opt("temperature", ctx.quantity(TEMPERATURE), DEFAULT_TEMPERATURE_C);
        return f.build(() -> {
            Conductor.Loop loop = new Conductor.Loop(id, body, vertices, turns, wire, open, load, temperature);
            if (!loop.open()) {
                WireClearance.requireRoom(drawn(loop), loop.wire().diameterM() / 2);
            }
            return loop;
        });
    }

    private Conductor plate(Fields f) {
        String id = f.req("id", ctx.objectDeclaration("Conductor"));
        String body = f.opt("body", ctx.bodyReference(), Body.FIXED);
        List<Vec2> outline = f.req("outline", ctx.list(ctx.point(LENGTH)));
        List<List<Vec2>> holes = f.opt("holes", ctx.list(ctx.list(ctx.point(LENGTH))), List.of());
        Double thickness = f.req("thickness", ctx.quantity(LENGTH));
        if (f.has("material") == f.has("conductivity")) {
            f.problem("a plate needs either \"material\" (copper, aluminium) or \"conductivity\", not "
                    + (f.has("material") ? "both" : "neither"));
        } else if (f.has("conductivity") && f.has("temperature")) {
            f.problem("\"temperature\" sets a named material's conductivity; a given \"conductivity\" is taken as"
                    + " it is");
        }
        Material material = f.opt("material", ctx.choice(Vocabulary.MATERIAL), null);
        Double temperature = f.opt("temperature", ctx.quantity(TEMPERATURE), DEFAULT_TEMPERATURE_C);
        Double sigma = f.opt("conductivity", ctx.quantity(CONDUCTIVITY), null);
        Predicate<Vec2> onEdge = outline == null || holes == null ? p -> true
                : p -> Conductor.Plate.onEdge(outline, holes, p);
        List<Conductor.Electrode> electrodes = f.opt("electrodes", ctx.list(electrode(onEdge,
                "the plate's edge (outline or a hole)")), List.of());
        List<Conductor.ElectrodePair> pairs = f.opt("pairs", ctx.list(pair(electrodes)), List.of());
        OptionalDouble cell = cell(f);
        return f.build(() -> new Conductor.Plate(id, body, outline, holes, thickness,
                material != null ? new Conductivity.OfMaterial(material, temperature) : new Conductivity.Given(sigma),
                electrodes, pairs, cell));
    }

    private Conductor channel(Fields f) {
        String id = f.req("id", ctx.objectDeclaration("Conductor"));
        String body = f.opt("body", ctx.bodyReference(), Body.FIXED);
        Vec2 start = f.req("start", ctx.point(LENGTH));
        Vec2 end = f.req("end", ctx.point(LENGTH));
        Double width = f.req("width", ctx.quantity(LENGTH));
        Double depth = f.req("depth", ctx.quantity(LENGTH));
        Double sigma = f.req("conductivity", ctx.quantity(CONDUCTIVITY));
        Conductor.Channel.Profile profile = f.req("profile", ctx.choice(Vocabulary.PROFILE));
        MeanFlow flow = f.req("flow", kinded(flows, "a flow"));
        Predicate<Vec2> onWall = start == null || end == null || width == null || start.equals(end) || !(width > 0)
                ? p -> true : p -> Conductor.Channel.onWall(start, end, width, p);
        List<Conductor.Electrode> electrodes = f.opt("electrodes", ctx.list(electrode(onWall,
                "a wall of the channel")), List.of());
        List<Conductor.ElectrodePair> pairs = f.opt("pairs", ctx.list(pair(electrodes)), List.of());
        OptionalDouble cell = cell(f);
        return f.build(() -> new Conductor.Channel(id, body, start, end, width, depth, sigma, profile, flow,
                electrodes, pairs, cell));
    }

    /** The optional grid cell size of a plate or channel. */
    private OptionalDouble cell(Fields f) {
        Double cell = f.opt("cell", ctx.quantity(LENGTH), null);
        return cell == null ? OptionalDouble.empty() : OptionalDouble.of(cell);
    }

    /** An electrode, reported where it stands when {@code placed} refuses its position (off the edge). */
    private ReadContext.Conv<Conductor.Electrode> electrode(Predicate<Vec2> placed, String where) {
        return (path, node) -> {
            Fields f = ctx.fields(path, node, "an electrode {\"name\": ..., \"at\": [x, y]}");
            if (f == null) {
                return null;
            }
            String name = f.req("name", ctx.text());
            Vec2 at = f.req("at", ctx.point(LENGTH));
            if (at != null && !placed.test(at)) {
                f.problem("electrode '" + name + "' at (" + at.x() + ", " + at.y() + ") m is not on " + where);
            }
            return f.build(() -> new Conductor.Electrode(name, at));
        };
    }

    /** A pair of the electrodes {@code known} (null when they could not be read). */
    private ReadContext.Conv<Conductor.ElectrodePair> pair(List<Conductor.Electrode> known) {
        ReadContext.Conv<String> electrodeName = (path, node) -> {
            String name = ctx.text().read(path, node);
            if (name != null && known != null && known.stream().noneMatch(e -> e.name().equals(name))) {
                List<String> names = known.stream().map(Conductor.Electrode::name).toList();
                ctx.problem(path, node, "unknown electrode '" + name + "'" + Suggestions.hint(name, names)
                        + (names.isEmpty() ? "; declare it under \"electrodes\"" : "; the electrodes are "
                        + String.join(", ", names)));
                return null;
            }
            return name;
        };
        return (path, node) -> {
            Fields f = ctx.fields(path, node, "a pair {\"plus\": electrode, \"minus\": electrode}");
            if (f == null) {
                return null;
            }
            String plus = f.req("plus", electrodeName);
            String minus = f.req("minus", electrodeName);
            return f.build(() -> new Conductor.ElectrodePair(plus, minus));
        };
    }

    // ---- channel flows ----

    private MeanFlow steadyFlow(Fields f) {
        Double velocity = f.req("velocity", ctx.quantity(VELOCITY));
        return f.build(() -> new MeanFlow.Steady(velocity));
    }

    private MeanFlow sinusoidFlow(Fields f) {
        Double offset = f.opt("offset", ctx.quantity(VELOCITY), 0.0);
        Double amplitude = f.req("amplitude", ctx.quantity(VELOCITY));
        Double frequency = f.req("frequency", ctx.quantity(FREQUENCY));
        Double phase = f.opt("phase", ctx.quantity(ANGLE), 0.0);
        return f.build(() -> new MeanFlow.Sinusoid(offset, amplitude, frequency, phase));
    }

    private MeanFlow keyedFlow(Fields f) {
        List<MeanFlow.Keys.Key> keys = f.req("keys", ctx.list(this::flowKey));
        return f.build(() -> new MeanFlow.Keys(keys));
    }

    private MeanFlow.Keys.Key flowKey(String path, Json node) {
        Fields f = ctx.fields(path, node, "a key {\"t\": ..., \"velocity\": ...}");
        if (f == null) {
            return null;
        }
        Double t = f.req("t", ctx.quantity(TIME));
        Double velocity = f.req("velocity", ctx.quantity(VELOCITY));
        return f.build(() -> new MeanFlow.Keys.Key(t, velocity));
    }

    /** {@code [x, y]} riding the conductor's body, or {@code {"at": [x, y], "body": id}}. */
    private Conductor.Vertex vertex(String path, Json node) {
        if (node instanceof Json.Arr) {
            Vec2 at = ctx.point(LENGTH).read(path, node);
            return at == null ? null : new Conductor.Vertex(at, null);
        }
        Fields f = ctx.fields(path, node, "[x, y] in metres, or {\"at\": [x, y], \"body\": id}");
        if (f == null) {
            return null;
        }
        Vec2 at = f.req("at", ctx.point(LENGTH));
        String body = f.opt("body", ctx.bodyReference(), null);
        return f.build(() -> new Conductor.Vertex(at, body));
    }

    private WireSpec wireSpec(String path, Json node) {
        Fields f = ctx.fields(path, node, "a wire {\"material\": \"copper\", \"awg\": 30}");
        if (f == null) {
            return null;
        }
        if (f.has("awg") == f.has("diameter")) {
            f.problem("a wire needs either \"awg\" or \"diameter\", not " + (f.has("awg") ? "both" : "neither"));
        }
        Material material = f.opt("material", ctx.choice(Vocabulary.MATERIAL),
                DEFAULT_WIRE.material());
        Integer awg = f.opt("awg", ctx.wholeNumber(), null);
        Double diameter = f.opt("diameter", ctx.quantity(LENGTH), null);
        return f.build(() -> awg != null ? WireSpec.awg(material, awg) : WireSpec.of(material, diameter));
    }
}

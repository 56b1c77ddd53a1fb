package org.kinduct.scene.io;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.SplittableRandom;
import org.kinduct.scene.Body;
import org.kinduct.scene.EarthField;
import org.kinduct.scene.Checks;
import org.kinduct.scene.Conductivity;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.FieldGrid;
import org.kinduct.scene.Material;
import org.kinduct.scene.MeanFlow;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;

/** Scenes for the file-format tests: one with every record variant, and random ones from a seed. */
public final class SampleScenes {

    private SampleScenes() {
    }

    /** Every motion, source, coil shape, conductor, vertex form and wire form at least once. */
    /** The text of the sample's field map, a 3 × 3 matrix in millitesla. */
    static final String HEAD_CSV = "0,1,2\n3,4,5\n6,7,8\n";

    /** Where the sample scene's field map is found: {@link #HEAD_CSV} as {@code maps/head.csv}. */
    public static final SceneFolder FOLDER = new SceneFolder() {
        @Override
        public InputStream open(String relative) throws IOException {
            if (!relative.equals("maps/head.csv")) {
                throw new IOException("no file " + relative);
            }
            return new ByteArrayInputStream(HEAD_CSV.getBytes(StandardCharsets.UTF_8));
        }

        @Override
        public String describe(String relative) {
            return relative;
        }
    };

    /** {@link #HEAD_CSV} as the reader makes it: each number times the unit, 1 mT. */
    private static FieldGrid headGrid() {
        double[] samples = new double[9];
        for (int k = 0; k < 9; k++) {
            samples[k] = k * 1e-3;
        }
        return new FieldGrid(FieldGrid.Layout.MATRIX, 3, 3, -1e-3, -1e-3, 1e-3, 1e-3, 1e-3, samples);
    }

    /** {@link #everyVariant()} without its field map: a scene that names no other file. */
    public static Scene withoutFiles() {
        Scene every = everyVariant();
        return new Scene(every.name(), every.description(), every.bodies(),
                every.sources().stream().filter(s -> !(s instanceof Source.FieldMap)).toList(), every.conductors(),
                every.time(), every.gravity());
    }

    public static Scene everyVariant() {
        List<Body> bodies = List.of(
                new Body("carriage", "Carriage", Vec2.ZERO, new Motion.Glide(new Vec2(0.5, 0))),
                new Body("shaker", "shaker", new Vec2(0.01, 0.02), new Motion.Oscillate(2e-3, 50, Math.PI / 2, 0.1)),
                new Body("rotor", "Rotor", new Vec2(-0.03, 0), new Motion.Spin(62.83185307179586, 0.3)),
                new Body("sled", "Sled", Vec2.ZERO, new Motion.Accelerate(new Vec2(0.1, 0), new Vec2(0, -9.81))),
                new Body("arm", "Arm", new Vec2(0.005, 0.005), new Motion.Path(List.of(
                        new Motion.Path.Key(0, Vec2.ZERO, 0),
                        new Motion.Path.Key(0.1, new Vec2(0.01, 0), 0.2),
                        new Motion.Path.Key(0.3, new Vec2(0.01, 0.01), -0.1)), Motion.Path.Blend.SMOOTH)),
                new Body("bar", "Bar", new Vec2(0, 0.01), new Motion.Free(0.02, 1e-6, new Vec2(0.1, 0), 0.5, 0.01,
                        new Vec2(0, -0.196), new Vec2(0.01, 0), 5, List.of(
                                new Motion.Free.Spring(new Vec2(0, 0.05), null, 200, 0),
                                new Motion.Free.Spring(null, "carriage", 50, 0.01)))),
                new Body("idle", "Idle", Vec2.ZERO, new Motion.Still()),
                new Body("walker", "Walker", Vec2.ZERO, new Motion.Path(List.of(
                        new Motion.Path.Key(0, Vec2.ZERO, 0),
                        new Motion.Path.Key(1, new Vec2(0.1, 0), 0)), Motion.Path.Blend.LINEAR)));
        List<Source> sources = List.of(
                new Source.FieldPatch("gap", Body.FIXED, square(0, 0, 0.02), -0.08),
                new Source.UniformField("background", -45e-6),
                Source.UniformField.earth("earth", new EarthField(48e-6, 1.15, 0.035, 0.5, 1.6, EarthField.Face.DOWN)),
                new Source.BlockMagnet("m1", "rotor", new Vec2(0.01, 0), 10e-3, 5e-3, 3e-3, 0.2, 2e-3,
                        Source.Side.ABOVE, 1.2, Source.Magnetization.MINUS_Z),
                new Source.CylinderMagnet("m2", Body.FIXED, new Vec2(-0.02, 0.01), 5e-3, 3e-3, 1e-3,
                        Source.Side.BELOW, 1.3, Source.Magnetization.PLUS_Z),
                new Source.SourceCoil("coil1", "idle", new Source.CoilShape.Polygon(square(0.05, 0, 0.01)), 20, -3e-3,
                        new Source.Drive(0.5, 0.1, 50, 0.3)),
                new Source.SourceCoil("coil2", "shaker", new Source.CoilShape.Circle(new Vec2(0, -0.04), 0.02), 1,
                        4e-3, Source.Drive.dc(1)),
                new Source.FieldMap("scan", "idle", "maps/head.csv", headGrid(), new Vec2(0.002, -0.001),
                        Source.FieldMap.Outside.ERROR));
        List<Conductor> conductors = List.of(
                new Conductor.Wire("probe", Body.FIXED, List.of(Conductor.Vertex.at(0, 0),
                        Conductor.Vertex.at(0.01, 0.001), Conductor.Vertex.at(0.02, -0.003))),
                new Conductor.Loop("pickup", "carriage", List.of(Conductor.Vertex.at(0, 0),
                        new Conductor.Vertex(new Vec2(0.02, 0), "bar"), Conductor.Vertex.at(0.02, 0.01),
                        Conductor.Vertex.at(0, 0.01)), 50, WireSpec.awg(Material.COPPER, 36), false, 100, 25),
                new Conductor.Loop("gap-loop", "walker", List.of(Conductor.Vertex.at(0, 0),
                        new Conductor.Vertex(new Vec2(0.01, 0), "walker"), Conductor.Vertex.at(0, 0.01)), 1,
                        WireSpec.of(Material.ALUMINIUM, 0.2e-3), true, 0, -10),
                new Conductor.Loop("thick", "fixed", List.of(Conductor.Vertex.at(0, 0),
                        Conductor.Vertex.at(0.1, 0), Conductor.Vertex.at(0, 0.1)), 3,
                        WireSpec.awg(Material.COPPER, -3), false, 0.5, 20),
                new Conductor.Plate("brake-disc", "rotor", square(-0.05, -0.02, 0.04),
                        List.of(square(-0.04, -0.01, 0.005), square(-0.025, -0.01, 0.005)), 2e-3,
                        new Conductivity.OfMaterial(Material.ALUMINIUM, 40),
                        List.of(new Conductor.Electrode("rim", new Vec2(-0.05, 0)),
                                new Conductor.Electrode("hole-edge", new Vec2(-0.035, -0.0085))),
                        List.of(new Conductor.ElectrodePair("rim", "hole-edge")), OptionalDouble.of(5e-4)),
                new Conductor.Plate("sample", Body.FIXED, List.of(new Vec2(0.1, 0), new Vec2(0.13, 0.01),
                        new Vec2(0.1, 0.02)), List.of(), 0.3e-3, new Conductivity.Given(1.7e7), List.of(), List.of(),
                        OptionalDouble.empty()),
                new Conductor.Channel("duct", Body.FIXED, new Vec2(-0.1, 0.05), new Vec2(0.1, 0.05), 0.02, 0.015,
                        0.05, Conductor.Channel.Profile.TURBULENT, new MeanFlow.Steady(1.5),
                        List.of(new Conductor.Electrode("upper", new Vec2(-0.05, 0.06)),
                                new Conductor.Electrode("lower", new Vec2(-0.05, 0.04))),
                        List.of(new Conductor.ElectrodePair("upper", "lower")), OptionalDouble.empty()),
                new Conductor.Channel("pulse", "carriage", new Vec2(0, 0.1), new Vec2(0, 0.2), 0.01, 0.01, 3.4e6,
                        Conductor.Channel.Profile.LAMINAR, new MeanFlow.Sinusoid(0.2, 0.1, 1.2, 0.5), List.of(),
                        List.of(), OptionalDouble.of(1e-3)),
                new Conductor.Channel("ramp", Body.FIXED, new Vec2(0.2, 0.1), new Vec2(0.3, 0.1), 0.01, 0.01, 1,
                        Conductor.Channel.Profile.PLUG, new MeanFlow.Keys(List.of(new MeanFlow.Keys.Key(0, 0),
                        new MeanFlow.Keys.Key(0.1, 2), new MeanFlow.Keys.Key(0.3, -0.5))), List.of(), List.of(),
                        OptionalDouble.empty()));
        return new Scene("Every variant", "A scene with \"quotes\", a tab\t, ünïcödé and a\nnew line.",
                bodies, sources, conductors, new TimeSpan(0, 0.5, 1e-3), new Vec2(0, -9.81));
    }

    static List<Vec2> square(double x, double y, double side) {
        return List.of(new Vec2(x, y), new Vec2(x + side, y), new Vec2(x + side, y + side), new Vec2(x, y + side));
    }

    /**
     * A random valid scene within the file format's limits; numbers include awkward doubles to
     * test that writing them is lossless.
     */
    public static Scene random(SplittableRandom r) {
        List<Body> bodies = new ArrayList<>();
        List<String> bodyIds = new ArrayList<>(List.of(Body.FIXED));
        int nBodies = r.nextInt(4);
        for (int i = 0; i < nBodies; i++) {
            String id = "b" + i;
            bodies.add(new Body(id, r.nextBoolean() ? id : "Body " + i, point(r), motion(r, bodyIds)));
            bodyIds.add(id);
        }
        List<Source> sources = new ArrayList<>();
        int nSources = r.nextInt(5);
        for (int i = 0; i < nSources; i++) {
            sources.add(source(r, "s" + i, pick(r, bodyIds)));
        }
        List<Conductor> conductors = new ArrayList<>();
        int nConductors = r.nextInt(4);
        for (int i = 0; i < nConductors; i++) {
            conductors.add(conductor(r, "c" + i, bodyIds));
        }
        double t0 = r.nextDouble() - 0.5;
        return new Scene(r.nextBoolean() ? "" : "scene " + r.nextInt(1000), "", bodies, sources, conductors,
                new TimeSpan(t0, t0 + 0.01 + r.nextDouble(), 1e-3 + 1e-2 * r.nextDouble()),
                r.nextBoolean() ? Vec2.ZERO : point(r));
    }

    private static Motion motion(SplittableRandom r, List<String> earlierBodies) {
        switch (r.nextInt(7)) {
            case 0:
                return new Motion.Still();
            case 1:
                return new Motion.Glide(point(r));
            case 2:
                return new Motion.Accelerate(point(r), point(r));
            case 3:
                return new Motion.Oscillate(any(r), positive(r), any(r), any(r));
            case 4:
                return new Motion.Spin(any(r), any(r));
            case 5: {
                List<Motion.Path.Key> keys = new ArrayList<>();
                double t = r.nextDouble() - 0.5;
                for (int i = 0, n = 2 + r.nextInt(3); i < n; i++) {
                    keys.add(new Motion.Path.Key(t, point(r), any(r)));
                    t += 0.01 + r.nextDouble();
                }
                return new Motion.Path(keys, r.nextBoolean() ? Motion.Path.Blend.LINEAR : Motion.Path.Blend.SMOOTH);
            }
            default: {
                List<Motion.Free.Spring> springs = new ArrayList<>();
                for (int i = 0, n = r.nextInt(3); i < n; i++) {
                    springs.add(r.nextBoolean()
                            ? new Motion.Free.Spring(point(r), null, 1e-6 + 100 * r.nextDouble(), nonNegative(r))
                            : new Motion.Free.Spring(null, pick(r, earlierBodies), 1e-6 + 100 * r.nextDouble(),
                                    nonNegative(r)));
                }
                // Mass, damping and springs within what a window may integrate (at most 1e6 responses).
                double mass = 1e-3 + r.nextDouble();
                return new Motion.Free(mass, r.nextBoolean() ? 0 : mass * (1e-12 + r.nextDouble()), point(r), any(r),
                        r.nextDouble(), point(r), point(r), nonNegative(r), springs);
            }
        }
    }

    private static Source source(SplittableRandom r, String id, String body) {
        Source.Side side = r.nextBoolean() ? Source.Side.BELOW : Source.Side.ABOVE;
        Source.Magnetization north = r.nextBoolean() ? Source.Magnetization.PLUS_Z : Source.Magnetization.MINUS_Z;
        switch (r.nextInt(5)) {
            case 0:
                return new Source.FieldPatch(id, body, convex(r), any(r));
            case 1:
                return r.nextBoolean() ? new Source.UniformField(id, any(r)) : Source.UniformField.earth(id,
                        new EarthField(positive(r), r.nextDouble(-1.5, 1.5), any(r), any(r), any(r),
                                r.nextBoolean() ? EarthField.Face.UP : EarthField.Face.DOWN));
            case 2:
                return new Source.BlockMagnet(id, body, point(r), size(r), size(r), size(r), any(r),
                        nonNegative(r), side, positive(r), north);
            case 3:
                return new Source.CylinderMagnet(id, body, point(r), size(r), size(r), nonNegative(r), side,
                        positive(r), north);
            default: {
                Source.CoilShape shape = r.nextBoolean() ? new Source.CoilShape.Polygon(convex(r))
                        : new Source.CoilShape.Circle(point(r), size(r));
                return new Source.SourceCoil(id, body, shape, 1 + r.nextInt(100), -size(r),
                        new Source.Drive(any(r), any(r), nonNegative(r), any(r)));
            }
        }
    }

    private static Conductor conductor(SplittableRandom r, String id, List<String> bodyIds) {
        String body = pick(r, bodyIds);
        boolean loop = r.nextBoolean();
        // A closed loop's wire must have room along its sides: a convex outline a metre or two across.
        List<Vec2> points = new ArrayList<>(loop ? convex(r, 1 + r.nextDouble()) : List.of());
        for (int i = 0, n = 2 + r.nextInt(4); !loop && i < n; i++) {
            points.add(point(r));
        }
        List<Conductor.Vertex> vertices = points.stream()
                .map(p -> new Conductor.Vertex(p, r.nextInt(4) == 0 ? pick(r, bodyIds) : null)).toList();
        if (!loop) {
            return new Conductor.Wire(id, body, vertices);
        }
        Material material = r.nextBoolean() ? Material.COPPER : Material.ALUMINIUM;
        WireSpec wire = r.nextBoolean() ? WireSpec.awg(material, -3 + r.nextInt(60))
                : WireSpec.of(material, Checks.SMALLEST_SIZE_M + 1e-3 * r.nextDouble());
        return new Conductor.Loop(id, body, vertices, 1 + r.nextInt(1000), wire, r.nextBoolean(), nonNegative(r),
                material.zeroResistivityC() + 0.01 + 480 * r.nextDouble());
    }

    /** A convex polygon (hence simple, with area) of 3 to 8 vertices around a random centre. */
    private static List<Vec2> convex(SplittableRandom r) {
        return convex(r, 1e-3 + r.nextDouble());
    }

    private static List<Vec2> convex(SplittableRandom r, double radius) {
        Vec2 c = new Vec2(r.nextDouble() - 0.5, r.nextDouble() - 0.5);
        int n = 3 + r.nextInt(6);
        List<Vec2> pts = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            pts.add(c.plus(Vec2.polar(radius, 2 * Math.PI * (i + 0.5 * r.nextDouble()) / n)));
        }
        return pts;
    }

    private static String pick(SplittableRandom r, List<String> ids) {
        return ids.get(r.nextInt(ids.size()));
    }

    private static Vec2 point(SplittableRandom r) {
        return new Vec2(any(r), any(r));
    }

    private static double nonNegative(SplittableRandom r) {
        return r.nextInt(5) == 0 ? 0 : positive(r);
    }

    private static double positive(SplittableRandom r) {
        return Math.abs(any(r)) + Double.MIN_NORMAL;
    }

    /** A length that must be positive: at least 1 nm. */
    private static double size(SplittableRandom r) {
        return Checks.SMALLEST_SIZE_M + Math.abs(any(r));
    }

    /** Plain, tiny, large (up to the format's 1e12), negative-zero and classic binary-fraction doubles. */
    private static double any(SplittableRandom r) {
        switch (r.nextInt(8)) {
            case 0:
                return 0.1 + 0.2;
            case 1:
                return -0.0;
            case 2:
                return r.nextDouble() * 1e-300;
            case 3:
                return Double.longBitsToDouble(r.nextLong(Double.doubleToLongBits(1e12))) * (r.nextBoolean() ? 1 : -1);
            default:
                return (r.nextDouble() - 0.5) * Math.pow(10, r.nextInt(-6, 3));
        }
    }
}

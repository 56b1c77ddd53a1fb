package org.kinduct.scene.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.List;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.FieldGrid;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;

/**
 * Writes a scene as JSON with every field explicit and every number in SI as Java's shortest
 * round-trip decimal ({@link Double#toString}), so reading it back gives an equal scene.
 */
final class SceneWriter {

    private static final JsonFactory FACTORY = new JsonFactory();

    private final JsonGenerator g;
    private final Layout layout;

    private SceneWriter(JsonGenerator g, Layout layout) {
        this.g = g;
        this.layout = layout;
    }

    static String write(Scene scene) {
        StringWriter out = new StringWriter();
        Layout layout = new Layout();
        try (JsonGenerator g = FACTORY.createGenerator(out)) {
            g.setPrettyPrinter(layout);
            new SceneWriter(g, layout).scene(scene);
        } catch (IOException | UncheckedIOException e) {
            throw new UncheckedIOException("writing JSON to memory failed",
                    e instanceof UncheckedIOException u ? u.getCause() : (IOException) e);
        }
        return out.append('\n').toString();
    }

    private void scene(Scene s) throws IOException {
        g.writeStartObject();
        g.writeStringField("format", Scene.FORMAT);
        g.writeNumberField("version", Scene.VERSION);
        g.writeStringField("name", s.name());
        g.writeStringField("description", s.description());
        g.writeObjectFieldStart("time");
        g.writeNumberField("t0", s.time().t0S());
        g.writeNumberField("t1", s.time().t1S());
        g.writeNumberField("dt", s.time().dtS());
        g.writeEndObject();
        point("gravity", s.gravity());
        g.writeArrayFieldStart("bodies");
        for (Body b : s.bodies()) {
            if (!Body.FIXED.equals(b.id())) { // the fixed frame is implicit in every scene
                body(b);
            }
        }
        g.writeEndArray();
        g.writeArrayFieldStart("sources");
        for (Source src : s.sources()) {
            source(src);
        }
        g.writeEndArray();
        g.writeArrayFieldStart("conductors");
        for (Conductor c : s.conductors()) {
            conductor(c);
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private void body(Body b) throws IOException {
        g.writeStartObject();
        g.writeStringField("id", b.id());
        g.writeStringField("name", b.name());
        point("pivot", b.pivot());
        g.writeFieldName("motion");
        motion(b.motion());
        g.writeEndObject();
    }

    private void motion(Motion m) throws IOException {
        g.writeStartObject();
        m.match(new Motion.Cases<Void>() {
            @Override
            public Void still(Motion.Still still) {
                return io(() -> kind("still"));
            }

            @Override
            public Void glide(Motion.Glide glide) {
                return io(() -> {
                    kind("glide");
                    point("velocity", glide.velocity());
                });
            }

            @Override
            public Void accelerate(Motion.Accelerate a) {
                return io(() -> {
                    kind("accelerate");
                    point("initialVelocity", a.initialVelocity());
                    point("acceleration", a.acceleration());
                });
            }

            @Override
            public Void oscillate(Motion.Oscillate o) {
                return io(() -> {
                    kind("oscillate");
                    g.writeNumberField("amplitude", o.amplitudeM());
                    g.writeNumberField("frequency", o.frequencyHz());
                    g.writeNumberField("direction", o.directionRad());
                    g.writeNumberField("phase", o.phaseRad());
                });
            }

            @Override
            public Void spin(Motion.Spin spin) {
                return io(() -> {
                    kind("spin");
                    g.writeNumberField("omega", spin.omegaRadPerS());
                    g.writeNumberField("startAngle", spin.startAngleRad());
                });
            }

            @Override
            public Void path(Motion.Path path) {
                return io(() -> {
                    kind("path");
                    g.writeStringField("blend", Vocabulary.BLEND.name(path.blend()));
                    g.writeArrayFieldStart("keys");
                    for (Motion.Path.Key k : path.keys()) {
                        g.writeStartObject();
                        g.writeNumberField("t", k.tS());
                        point("offset", k.offset());
                        g.writeNumberField("angle", k.angleRad());
                        g.writeEndObject();
                    }
                    g.writeEndArray();
                });
            }

            @Override
            public Void free(Motion.Free free) {
                return io(() -> {
                    kind("free");
                    SceneWriter.this.free(free);
                });
            }
        });
        g.writeEndObject();
    }

    private void free(Motion.Free f) throws IOException {
        g.writeNumberField("mass", f.massKg());
        g.writeNumberField("inertia", f.inertiaKgM2());
        point("initialVelocity", f.initialVelocity());
        g.writeNumberField("initialOmega", f.initialOmegaRadPerS());
        g.writeNumberField("damping", f.dampingNsPerM());
        point("force", f.appliedForce());
        point("forceAmplitude", f.appliedAmplitude());
        g.writeNumberField("forceFrequency", f.appliedFrequencyHz());
        g.writeArrayFieldStart("springs");
        for (Motion.Free.Spring s : f.springs()) {
            g.writeStartObject();
            if (s.otherBody() != null) {
                g.writeStringField("body", s.otherBody());
            } else {
                point("anchor", s.anchor());
            }
            g.writeNumberField("stiffness", s.stiffnessNPerM());
            g.writeNumberField("restLength", s.restLengthM());
            g.writeEndObject();
        }
        g.writeEndArray();
    }

    private void source(Source s) throws IOException {
        g.writeStartObject();
        s.match(new Source.Cases<Void>() {
            @Override
            public Void patch(Source.FieldPatch p) {
                return io(() -> {
                    kind("field-patch");
                    idAndBody(p.id(), p.body());
                    points("outline", p.outline());
                    g.writeNumberField("bz", p.bzT());
                });
            }

            @Override
            public Void uniform(Source.UniformField u) {
                return io(() -> {
                    kind("uniform-field");
                    g.writeStringField("id", u.id());
                    g.writeNumberField("bz", u.bzT());
                });
            }

            @Override
            public Void block(Source.BlockMagnet m) {
                return io(() -> {
                    kind("block-magnet");
                    idAndBody(m.id(), m.body());
                    point("center", m.center());
                    g.writeFieldName("size");
                    layout.inlineNext();
                    g.writeArray(new double[] {m.sizeXM(), m.sizeYM(), m.heightM()}, 0, 3);
                    g.writeNumberField("angle", m.angleRad());
                    magnetPlacement(m.standoffM(), m.side(), m.remanenceT(), m.magnetization());
                });
            }

            @Override
            public Void cylinder(Source.CylinderMagnet m) {
                return io(() -> {
                    kind("cylinder-magnet");
                    idAndBody(m.id(), m.body());
                    point("center", m.center());
                    g.writeNumberField("radius", m.radiusM());
                    g.writeNumberField("height", m.heightM());
                    magnetPlacement(m.standoffM(), m.side(), m.remanenceT(), m.magnetization());
                });
            }

            @Override
            public Void coil(Source.SourceCoil c) {
                return io(() -> {
                    kind("source-coil");
                    idAndBody(c.id(), c.body());
                    coilShape(c.shape());
                    g.writeNumberField("turns", c.turns());
                    g.writeNumberField("z", c.planeZM());
                    g.writeObjectFieldStart("current");
                    g.writeNumberField("dc", c.drive().dcA());
                    g.writeNumberField("amplitude", c.drive().amplitudeA());
                    g.writeNumberField("frequency", c.drive().frequencyHz());
                    g.writeNumberField("phase", c.drive().phaseRad());
                    g.writeEndObject();
                });
            }

            @Override
            public Void map(Source.FieldMap m) {
                return io(() -> {
                    kind("field-map");
                    idAndBody(m.id(), m.body());
                    g.writeStringField("file", m.file());
                    FieldGrid grid = m.grid();
                    g.writeStringField("layout", Vocabulary.MAP_LAYOUT.name(grid.layout()));
                    if (grid.layout() == FieldGrid.Layout.MATRIX) {
                        point("origin", new Vec2(grid.x0M(), grid.y0M()));
                        point("spacing", new Vec2(grid.dxM(), grid.dyM()));
                        g.writeNumberField("bzUnit", grid.fileUnitT());
                    }
                    point("offset", m.offsetM());
                    g.writeStringField("outside", Vocabulary.OUTSIDE.name(m.outside()));
                });
            }
        });
        g.writeEndObject();
    }

    private void magnetPlacement(double standoffM, Source.Side side, double remanenceT,
                                 Source.Magnetization north) throws IOException {
        g.writeNumberField("standoff", standoffM);
        g.writeStringField("side", Vocabulary.SIDE.name(side));
        g.writeNumberField("remanence", remanenceT);
        g.writeStringField("north", Vocabulary.NORTH.name(north));
    }

    private void coilShape(Source.CoilShape shape) {
        shape.match(new Source.CoilShape.Cases<Void>() {
            @Override
            public Void polygon(Source.CoilShape.Polygon p) {
                return io(() -> points("polygon", p.vertices()));
            }

            @Override
            public Void circle(Source.CoilShape.Circle c) {
                return io(() -> {
                    g.writeObjectFieldStart("circle");
                    point("center", c.center());
                    g.writeNumberField("radius", c.radiusM());
                    g.writeEndObject();
                });
            }
        });
    }

    private void conductor(Conductor c) throws IOException {
        g.writeStartObject();
        kind(c.match(new Conductor.Cases<>() {
            @Override
            public String wire(Conductor.Wire wire) {
                return "wire";
            }

            @Override
            public String loop(Conductor.Loop loop) {
                return "loop";
            }
        }));
        idAndBody(c.id(), c.body());
        g.writeArrayFieldStart("vertices");
        for (Conductor.Vertex v : c.vertices()) {
            if (v.body() == null) {
                point(v.at());
            } else {
                layout.inlineNext();
                g.writeStartObject();
                point("at", v.at());
                g.writeStringField("body", v.body());
                g.writeEndObject();
            }
        }
        g.writeEndArray();
        c.match(new Conductor.Cases<Void>() {
            @Override
            public Void wire(Conductor.Wire wire) {
                return null;
            }

            @Override
            public Void loop(Conductor.Loop loop) {
                return io(() -> {
                    g.writeNumberField("turns", loop.turns());
                    wireSpec(loop.wire());
                    g.writeBooleanField("open", loop.open());
                    g.writeNumberField("load", loop.loadOhm());
                    g.writeNumberField("temperature", loop.temperatureC());
                });
            }
        });
        g.writeEndObject();
    }

    private void wireSpec(WireSpec w) throws IOException {
        g.writeObjectFieldStart("wire");
        g.writeStringField("material", Vocabulary.MATERIAL.name(w.material()));
        if (w.awg() != null) {
            g.writeNumberField("awg", w.awg());
        } else {
            g.writeNumberField("diameter", w.diameterM());
        }
        g.writeEndObject();
    }

    /** A step of writing; the cases of the sealed families cannot throw checked exceptions. */
    private interface Writing {
        void run() throws IOException;
    }

    /** Runs {@code w}, carrying an {@link IOException} out as unchecked (caught in {@link #write}). */
    private static Void io(Writing w) {
        try {
            w.run();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return null;
    }

    private void kind(String kind) throws IOException {
        g.writeStringField("kind", kind);
    }

    private void idAndBody(String id, String body) throws IOException {
        g.writeStringField("id", id);
        g.writeStringField("body", body);
    }

    private void points(String name, List<Vec2> points) throws IOException {
        g.writeArrayFieldStart(name);
        for (Vec2 p : points) {
            point(p);
        }
        g.writeEndArray();
    }

    private void point(String name, Vec2 p) throws IOException {
        g.writeFieldName(name);
        point(p);
    }

    private void point(Vec2 p) throws IOException {
        layout.inlineNext();
        g.writeStartArray();
        g.writeNumber(p.x());
        g.writeNumber(p.y());
        g.writeEndArray();
    }
}

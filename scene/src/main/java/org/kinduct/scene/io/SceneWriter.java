package org.kinduct.scene.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Optional;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductivity;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.EarthField;
import org.kinduct.scene.MeanFlow;
import org.kinduct.scene.FieldGrid;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;

/**
 * Writes a scene as JSON with every field explicit and every number in SI as Java's shortest
 * round-trip decimal ({@link Double#toString}), so reading it back gives an equal scene; values
 * given in a unit ({@link UnitTexts}) are written in it, exactly. The writer keeps the JSON path
 * of what it writes, as the reader names it, to find each value's text.
 */
final class SceneWriter {

    private static final JsonFactory FACTORY = new JsonFactory();

    private final JsonGenerator g;
    private final Layout layout;
    private final UnitTexts units;
    /** The JSON path of the object or list being written. */
    private String where = "";

    private SceneWriter(JsonGenerator g, Layout layout, UnitTexts units) {
        this.g = g;
        this.layout = layout;
        this.units = units;
    }

    static String write(Scene scene, UnitTexts units) {
        StringWriter out = new StringWriter();
        Layout layout = new Layout();
        try (JsonGenerator g = FACTORY.createGenerator(out)) {
            g.setPrettyPrinter(layout);
            new SceneWriter(g, layout, units).scene(scene);
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
        object("time", () -> {
            number("t0", s.time().t0S());
            number("t1", s.time().t1S());
            number("dt", s.time().dtS());
        });
        point("gravity", s.gravity());
        // The fixed frame is implicit in every scene.
        list("bodies", s.bodies().stream().filter(b -> !Body.FIXED.equals(b.id())).toList(), this::body);
        list("sources", s.sources(), this::source);
        list("conductors", s.conductors(), this::conductor);
        g.writeEndObject();
    }

    private void body(Body b) throws IOException {
        g.writeStartObject();
        g.writeStringField("id", b.id());
        g.writeStringField("name", b.name());
        point("pivot", b.pivot());
        object("motion", () -> motion(b.motion()));
        g.writeEndObject();
    }

    private void motion(Motion m) {
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
                    number("amplitude", o.amplitudeM());
                    number("frequency", o.frequencyHz());
                    number("direction", o.directionRad());
                    number("phase", o.phaseRad());
                });
            }

            @Override
            public Void spin(Motion.Spin spin) {
                return io(() -> {
                    kind("spin");
                    number("omega", spin.omegaRadPerS());
                    number("startAngle", spin.startAngleRad());
                });
            }

            @Override
            public Void path(Motion.Path path) {
                return io(() -> {
                    kind("path");
                    g.writeStringField("blend", Vocabulary.BLEND.name(path.blend()));
                    list("keys", path.keys(), k -> {
                        g.writeStartObject();
                        number("t", k.tS());
                        point("offset", k.offset());
                        number("angle", k.angleRad());
                        g.writeEndObject();
                    });
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
    }

    private void free(Motion.Free f) throws IOException {
        number("mass", f.massKg());
        number("inertia", f.inertiaKgM2());
        point("initialVelocity", f.initialVelocity());
        number("initialOmega", f.initialOmegaRadPerS());
        number("damping", f.dampingNsPerM());
        point("force", f.appliedForce());
        point("forceAmplitude", f.appliedAmplitude());
        number("forceFrequency", f.appliedFrequencyHz());
        list("springs", f.springs(), s -> {
            g.writeStartObject();
            if (s.otherBody() != null) {
                g.writeStringField("body", s.otherBody());
            } else {
                point("anchor", s.anchor());
            }
            number("stiffness", s.stiffnessNPerM());
            number("restLength", s.restLengthM());
            g.writeEndObject();
        });
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
                    number("bz", p.bzT());
                });
            }

            @Override
            public Void uniform(Source.UniformField u) {
                return io(() -> {
                    kind("uniform-field");
                    g.writeStringField("id", u.id());
                    if (u.earth().isPresent()) {
                        EarthField e = u.earth().get();
                        object("earth", () -> {
                            number("intensity", e.intensityT());
                            number("inclination", e.inclinationRad());
                            number("declination", e.declinationRad());
                            number("tilt", e.tiltRad());
                            number("heading", e.headingRad());
                            g.writeStringField("face", Vocabulary.FACE.name(e.face()));
                        });
                    } else {
                        number("bz", u.bzT());
                    }
                });
            }

            @Override
            public Void block(Source.BlockMagnet m) {
                return io(() -> {
                    kind("block-magnet");
                    idAndBody(m.id(), m.body());
                    point("center", m.center());
                    numbers("size", m.sizeXM(), m.sizeYM(), m.heightM());
                    number("angle", m.angleRad());
                    magnetPlacement(m.standoffM(), m.side(), m.remanenceT(), m.magnetization());
                });
            }

            @Override
            public Void cylinder(Source.CylinderMagnet m) {
                return io(() -> {
                    kind("cylinder-magnet");
                    idAndBody(m.id(), m.body());
                    point("center", m.center());
                    number("radius", m.radiusM());
                    number("height", m.heightM());
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
                    number("z", c.planeZM());
                    object("current", () -> {
                        number("dc", c.drive().dcA());
                        number("amplitude", c.drive().amplitudeA());
                        number("frequency", c.drive().frequencyHz());
                        number("phase", c.drive().phaseRad());
                    });
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
                        number("bzUnit", grid.fileUnitT());
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
        number("standoff", standoffM);
        g.writeStringField("side", Vocabulary.SIDE.name(side));
        number("remanence", remanenceT);
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
                return io(() -> object("circle", () -> {
                    point("center", c.center());
                    number("radius", c.radiusM());
                }));
            }
        });
    }

    private void conductor(Conductor c) throws IOException {
        g.writeStartObject();
        c.match(new Conductor.Cases<Void>() {
            @Override
            public Void wire(Conductor.Wire wire) {
                return io(() -> {
                    kind("wire");
                    idAndBody(wire.id(), wire.body());
                    vertices(wire.vertices());
                });
            }

            @Override
            public Void loop(Conductor.Loop loop) {
                return io(() -> {
                    kind("loop");
                    idAndBody(loop.id(), loop.body());
                    vertices(loop.vertices());
                    g.writeNumberField("turns", loop.turns());
                    wireSpec(loop.wire());
                    g.writeBooleanField("open", loop.open());
                    number("load", loop.loadOhm());
                    number("temperature", loop.temperatureC());
                });
            }

            @Override
            public Void plate(Conductor.Plate plate) {
                return io(() -> {
                    kind("plate");
                    idAndBody(plate.id(), plate.body());
                    points("outline", plate.outline());
                    list("holes", plate.holes(), hole -> {
                        String path = where;
                        g.writeStartArray();
                        for (int i = 0; i < hole.size(); i++) {
                            pointItem(ReadContext.item(path, i), hole.get(i));
                        }
                        g.writeEndArray();
                    });
                    number("thickness", plate.thicknessM());
                    conductivity(plate.conductivity());
                    electrodes(plate);
                });
            }

            @Override
            public Void channel(Conductor.Channel channel) {
                return io(() -> {
                    kind("channel");
                    idAndBody(channel.id(), channel.body());
                    point("start", channel.start());
                    point("end", channel.end());
                    number("width", channel.widthM());
                    number("depth", channel.depthM());
                    number("conductivity", channel.sigmaSPerM());
                    g.writeStringField("profile", Vocabulary.PROFILE.name(channel.profile()));
                    object("flow", () -> flow(channel.flow()));
                    electrodes(channel);
                });
            }
        });
        g.writeEndObject();
    }

    private void vertices(List<Conductor.Vertex> vertices) throws IOException {
        list("vertices", vertices, v -> {
            if (v.body() == null) {
                pointItem(where, v.at());
            } else {
                layout.inlineNext();
                g.writeStartObject();
                point("at", v.at());
                g.writeStringField("body", v.body());
                g.writeEndObject();
            }
        });
    }

    private void conductivity(Conductivity c) {
        c.match(new Conductivity.Cases<Void>() {
            @Override
            public Void material(Conductivity.OfMaterial m) {
                return io(() -> {
                    g.writeStringField("material", Vocabulary.MATERIAL.name(m.material()));
                    number("temperature", m.temperatureC());
                });
            }

            @Override
            public Void given(Conductivity.Given given) {
                return io(() -> number("conductivity", given.sigmaSPerM()));
            }
        });
    }

    /** Electrodes, pairs and the cell size of a plate or channel (the cell only when the file sets it). */
    private void electrodes(Conductor.Sheet sheet) throws IOException {
        list("electrodes", sheet.electrodes(), e -> {
            layout.inlineNext();
            g.writeStartObject();
            g.writeStringField("name", e.name());
            point("at", e.at());
            g.writeEndObject();
        });
        list("pairs", sheet.pairs(), p -> {
            layout.inlineNext();
            g.writeStartObject();
            g.writeStringField("plus", p.plus());
            g.writeStringField("minus", p.minus());
            g.writeEndObject();
        });
        if (sheet.cellM().isPresent()) {
            number("cell", sheet.cellM().getAsDouble());
        }
    }

    /** The members of a channel's mean flow. */
    private void flow(MeanFlow flow) {
        flow.match(new MeanFlow.Cases<Void>() {
            @Override
            public Void steady(MeanFlow.Steady steady) {
                return io(() -> {
                    kind("steady");
                    number("velocity", steady.velocityMPerS());
                });
            }

            @Override
            public Void sinusoid(MeanFlow.Sinusoid s) {
                return io(() -> {
                    kind("sinusoid");
                    number("offset", s.offsetMPerS());
                    number("amplitude", s.amplitudeMPerS());
                    number("frequency", s.frequencyHz());
                    number("phase", s.phaseRad());
                });
            }

            @Override
            public Void keys(MeanFlow.Keys keys) {
                return io(() -> {
                    kind("keys");
                    list("keys", keys.keys(), k -> {
                        layout.inlineNext();
                        g.writeStartObject();
                        number("t", k.tS());
                        number("velocity", k.velocityMPerS());
                        g.writeEndObject();
                    });
                });
            }
        });
    }

    private void wireSpec(WireSpec w) throws IOException {
        object("wire", () -> {
            g.writeStringField("material", Vocabulary.MATERIAL.name(w.material()));
            if (w.awg() != null) {
                g.writeNumberField("awg", w.awg());
            } else {
                number("diameter", w.diameterM());
            }
        });
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

    /** Writes the items of a list, each with its path ({@code name[i]}) as where it is. */
    private interface Item<T> {
        void write(T item) throws IOException;
    }

    private <T> void list(String name, List<T> items, Item<T> each) throws IOException {
        String outer = where;
        g.writeArrayFieldStart(name);
        for (int i = 0; i < items.size(); i++) {
            where = ReadContext.item(ReadContext.child(outer, name), i);
            each.write(items.get(i));
        }
        where = outer;
        g.writeEndArray();
    }

    /** An object field {@code name} whose members {@code members} writes. */
    private void object(String name, Writing members) throws IOException {
        String outer = where;
        g.writeObjectFieldStart(name);
        where = ReadContext.child(outer, name);
        members.run();
        where = outer;
        g.writeEndObject();
    }

    private void number(String name, double v) throws IOException {
        g.writeFieldName(name);
        value(ReadContext.child(where, name), v);
    }

    /** A value: the text it was given in while there is one ({@link UnitTexts#textFor}), else its SI number. */
    private void value(String path, double v) throws IOException {
        Optional<String> text = units.textFor(path, v);
        if (text.isPresent()) {
            g.writeString(text.get());
        } else {
            g.writeNumber(v);
        }
    }

    /** A short list of numbers on one line, e.g. a block's {@code [x size, y size, height]}. */
    private void numbers(String name, double... values) throws IOException {
        String path = ReadContext.child(where, name);
        g.writeFieldName(name);
        layout.inlineNext();
        g.writeStartArray();
        for (int i = 0; i < values.length; i++) {
            value(ReadContext.item(path, i), values[i]);
        }
        g.writeEndArray();
    }

    private void points(String name, List<Vec2> points) throws IOException {
        list(name, points, p -> pointItem(where, p));
    }

    private void point(String name, Vec2 p) throws IOException {
        numbers(name, p.x(), p.y());
    }

    /** A point as a list item, at {@code path}. */
    private void pointItem(String path, Vec2 p) throws IOException {
        layout.inlineNext();
        g.writeStartArray();
        value(ReadContext.item(path, 0), p.x());
        value(ReadContext.item(path, 1), p.y());
        g.writeEndArray();
    }
}

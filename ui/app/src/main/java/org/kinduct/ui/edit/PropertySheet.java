package org.kinduct.ui.edit;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;
import java.util.function.UnaryOperator;
import org.kinduct.scene.Conductivity;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.EarthField;
import org.kinduct.scene.FieldGrid;
import org.kinduct.scene.Material;
import org.kinduct.scene.MeanFlow;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;

/**
 * The editable properties of one object (or of the scene when nothing is selected), with
 * unit-aware text: "12 mm" and "0.5 G" are accepted wherever a length or a flux density is.
 * Motion is edited separately by {@link MotionSheet}.
 */
public final class PropertySheet {

    /** Significant digits shown for editing (more than for display, so values survive a round trip). */
    static final int EDIT_DIGITS = 4;
    static final List<String> SIDES = List.of("below the plane", "above the plane");
    static final List<String> NORTH = List.of("north towards +z (⊙)", "north towards −z (⊗)");
    static final List<String> MATERIALS = List.of("copper", "aluminium");
    static final List<String> GAP = List.of("closed", "open (gap)");
    /** In the order of {@link Conductor.Channel.Profile}. */
    static final List<String> PROFILES = List.of("plug (uniform)", "laminar (parabolic)", "turbulent (1/7 power)");

    private PropertySheet() {
    }

    public static List<Property> of(Scene scene, String id) {
        if (id == null) {
            return sceneProperties(scene);
        }
        return scene.source(id).map(PropertySheet::sourceProperties)
                .or(() -> scene.conductor(id).map(PropertySheet::conductorProperties))
                .orElse(List.of());
    }

    static Property quantity(String label, Dimension d, double si, DoubleFunction<UnaryOperator<Scene>> apply) {
        return new Property(label, Units.format(si, d, EDIT_DIGITS), List.of(), text -> apply.apply(Units.parse(text, d)));
    }

    /** One coordinate of {@code point}, metres; rounding noise beside the point's distance from the origin reads 0. */
    static Property coordinate(String label, double valueM, Vec2 point, DoubleFunction<UnaryOperator<Scene>> apply) {
        return quantity(label, Dimension.LENGTH, Units.withoutNoise(valueM, point.length()), apply);
    }

    static Property whole(String label, int value, java.util.function.IntFunction<UnaryOperator<Scene>> apply) {
        return new Property(label, Integer.toString(value), List.of(), text -> {
            try {
                return apply.apply(Integer.parseInt(text.strip()));
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("expected a whole number such as 10, got '" + text.strip() + "'");
            }
        });
    }

    static Property choice(String label, List<String> options, int current,
                           java.util.function.IntFunction<UnaryOperator<Scene>> apply) {
        return new Property(label, options.get(current), options, text -> {
            int i = options.indexOf(text);
            if (i < 0) {
                throw new IllegalArgumentException("choose one of " + options);
            }
            return apply.apply(i);
        });
    }

    private static List<Property> sceneProperties(Scene scene) {
        TimeSpan t = scene.time();
        List<Property> p = new ArrayList<>(List.of(
                new Property("Scene name", scene.name(), List.of(), text -> s -> s.withText(text.strip(), s.description())),
                quantity("Start time", Dimension.TIME, t.t0S(),
                        v -> s -> s.withTime(new TimeSpan(v, s.time().t1S(), s.time().dtS()))),
                quantity("End time", Dimension.TIME, t.t1S(),
                        v -> s -> s.withTime(new TimeSpan(s.time().t0S(), v, s.time().dtS()))),
                quantity("Time step", Dimension.TIME, t.dtS(),
                        v -> s -> s.withTime(new TimeSpan(s.time().t0S(), s.time().t1S(), v))),
                MotionSheet.vector("Gravity on free bodies", Dimension.ACCELERATION,
                        scene.gravity(), g -> s -> s.withGravity(g))));
        // Sources without a place in the plane (uniform fields) have nothing to click on, so they are edited here.
        for (Source src : scene.sources()) {
            if (!Shapes.hasPlace(src)) {
                p.addAll(sourceProperties(src).stream().map(q -> new Property("“" + src.id() + "”: " + q.label(),
                        q.text(), q.options(), q.edit())).toList());
            }
        }
        return p;
    }

    private static UnaryOperator<Scene> replace(Source next) {
        return s -> SceneEdits.replaceSource(s, next);
    }

    private static UnaryOperator<Scene> replace(Conductor next) {
        return s -> SceneEdits.replaceConductor(s, next);
    }

    private static List<Property> sourceProperties(Source src) {
        return src.match(new Source.Cases<>() {
            @Override
            public List<Property> patch(Source.FieldPatch f) {
                return List.of(quantity("B_z inside (+ out of screen)", Dimension.FLUX_DENSITY, f.bzT(),
                        v -> replace(new Source.FieldPatch(f.id(), f.body(), f.outline(), v))));
            }

            @Override
            public List<Property> uniform(Source.UniformField u) {
                return u.earth().map(e -> earthProperties(u.id(), e)).orElseGet(() -> List.of(quantity(
                        "B_z everywhere (+ out of screen)", Dimension.FLUX_DENSITY, u.bzT(),
                        v -> replace(new Source.UniformField(u.id(), v)))));
            }

            @Override
            public List<Property> block(Source.BlockMagnet m) {
                return blockProperties(m);
            }

            @Override
            public List<Property> cylinder(Source.CylinderMagnet m) {
                return cylinderProperties(m);
            }

            @Override
            public List<Property> coil(Source.SourceCoil c) {
                return coilProperties(c);
            }

            @Override
            public List<Property> map(Source.FieldMap m) {
                return mapProperties(m);
            }
        });
    }

    /** The elements are edited; B_z follows from them. */
    private static List<Property> earthProperties(String id, EarthField e) {
        return List.of(
                new Property("B_z (+ out of screen)", Units.format(e.bzT(), Dimension.FLUX_DENSITY), List.of(), text -> {
                    throw new IllegalArgumentException("B_z follows from the Earth's field elements; change them"
                            + " (or Edit ▸ Earth's field…)");
                }),
                quantity("Total intensity F", Dimension.FLUX_DENSITY, e.intensityT(), v -> replace(earth(id,
                        new EarthField(v, e.inclinationRad(), e.declinationRad(), e.tiltRad(), e.headingRad(), e.face())))),
                quantity("Inclination I", Dimension.ANGLE, e.inclinationRad(), v -> replace(earth(id,
                        new EarthField(e.intensityT(), v, e.declinationRad(), e.tiltRad(), e.headingRad(), e.face())))),
                quantity("Declination D", Dimension.ANGLE, e.declinationRad(), v -> replace(earth(id,
                        new EarthField(e.intensityT(), e.inclinationRad(), v, e.tiltRad(), e.headingRad(), e.face())))),
                quantity("Board tilt", Dimension.ANGLE, e.tiltRad(), v -> replace(earth(id,
                        new EarthField(e.intensityT(), e.inclinationRad(), e.declinationRad(), v, e.headingRad(), e.face())))),
                quantity("Heading of +x", Dimension.ANGLE, e.headingRad(), v -> replace(earth(id,
                        new EarthField(e.intensityT(), e.inclinationRad(), e.declinationRad(), e.tiltRad(), v, e.face())))),
                choice("Board face", EarthFieldForm.FACES, e.face().ordinal(), i -> replace(earth(id,
                        new EarthField(e.intensityT(), e.inclinationRad(), e.declinationRad(), e.tiltRad(), e.headingRad(),
                                EarthField.Face.values()[i])))));
    }

    private static Source earth(String id, EarthField e) {
        return Source.UniformField.earth(id, e);
    }

    /** The file and its grid are shown, not edited: a map is changed by loading another file. */
    private static List<Property> mapProperties(Source.FieldMap m) {
        List<String> outside = List.of("zero", "error");
        FieldGrid g = m.grid();
        return List.of(
                new Property("File (beside the scene)", m.file(), List.of(), text -> {
                    throw new IllegalArgumentException("to use another file, add a new field map (Edit ▸ Add field map…)");
                }),
                new Property("Samples", g.nx() + " × " + g.ny() + ", spacing " + Units.format(g.dxM(), Dimension.LENGTH)
                        + " × " + Units.format(g.dyM(), Dimension.LENGTH), List.of(), text -> {
                            throw new IllegalArgumentException("the samples come from the file");
                        }),
                coordinate("Offset x", m.offsetM().x(), m.offsetM(), v -> replace(new Source.FieldMap(m.id(), m.body(),
                        m.file(), g, new Vec2(v, m.offsetM().y()), m.outside()))),
                coordinate("Offset y", m.offsetM().y(), m.offsetM(), v -> replace(new Source.FieldMap(m.id(), m.body(),
                        m.file(), g, new Vec2(m.offsetM().x(), v), m.outside()))),
                choice("Beyond the samples", outside, m.outside().ordinal(), i -> replace(new Source.FieldMap(m.id(),
                        m.body(), m.file(), g, m.offsetM(), Source.FieldMap.Outside.values()[i]))));
    }

    private static List<Property> blockProperties(Source.BlockMagnet m) {
        List<Property> p = new ArrayList<>();
        p.add(coordinate("Centre x", m.center().x(), m.center(), v -> replace(block(m, new Vec2(v, m.center().y()),
                m.sizeXM(), m.sizeYM(), m.heightM(), m.angleRad(), m.standoffM(), m.side(), m.remanenceT(),
                m.magnetization()))));
        p.add(coordinate("Centre y", m.center().y(), m.center(), v -> replace(block(m, new Vec2(m.center().x(), v),
                m.sizeXM(), m.sizeYM(), m.heightM(), m.angleRad(), m.standoffM(), m.side(), m.remanenceT(),
                m.magnetization()))));
        p.add(quantity("Size x", Dimension.LENGTH, m.sizeXM(), v -> replace(block(m, m.center(), v, m.sizeYM(),
                m.heightM(), m.angleRad(), m.standoffM(), m.side(), m.remanenceT(), m.magnetization()))));
        p.add(quantity("Size y", Dimension.LENGTH, m.sizeYM(), v -> replace(block(m, m.center(), m.sizeXM(), v,
                m.heightM(), m.angleRad(), m.standoffM(), m.side(), m.remanenceT(), m.magnetization()))));
        p.add(quantity("Height (z)", Dimension.LENGTH, m.heightM(), v -> replace(block(m, m.center(), m.sizeXM(),
                m.sizeYM(), v, m.angleRad(), m.standoffM(), m.side(), m.remanenceT(), m.magnetization()))));
        p.add(quantity("Angle", Dimension.ANGLE, m.angleRad(), v -> replace(block(m, m.center(), m.sizeXM(),
                m.sizeYM(), m.heightM(), v, m.standoffM(), m.side(), m.remanenceT(), m.magnetization()))));
        p.add(quantity("Gap to the plane", Dimension.LENGTH, m.standoffM(), v -> replace(block(m, m.center(),
                m.sizeXM(), m.sizeYM(), m.heightM(), m.angleRad(), v, m.side(), m.remanenceT(), m.magnetization()))));
        p.add(choice("Side", SIDES, m.side().ordinal(), i -> replace(block(m, m.center(), m.sizeXM(), m.sizeYM(),
                m.heightM(), m.angleRad(), m.standoffM(), Source.Side.values()[i], m.remanenceT(), m.magnetization()))));
        p.add(quantity("Remanence", Dimension.FLUX_DENSITY, m.remanenceT(), v -> replace(block(m, m.center(),
                m.sizeXM(), m.sizeYM(), m.heightM(), m.angleRad(), m.standoffM(), m.side(), v, m.magnetization()))));
        p.add(choice("Poles", NORTH, m.magnetization().ordinal(), i -> replace(block(m, m.center(), m.sizeXM(),
                m.sizeYM(), m.heightM(), m.angleRad(), m.standoffM(), m.side(), m.remanenceT(),
                Source.Magnetization.values()[i]))));
        return p;
    }

    private static Source.BlockMagnet block(Source.BlockMagnet m, Vec2 c, double sx, double sy, double h, double a,
                                            double gap, Source.Side side, double br, Source.Magnetization north) {
        return new Source.BlockMagnet(m.id(), m.body(), c, sx, sy, h, a, gap, side, br, north);
    }

    private static List<Property> cylinderProperties(Source.CylinderMagnet m) {
        List<Property> p = new ArrayList<>();
        p.add(coordinate("Centre x", m.center().x(), m.center(), v -> replace(disc(m, new Vec2(v, m.center().y()),
                m.radiusM(), m.heightM(), m.standoffM(), m.side(), m.remanenceT(), m.magnetization()))));
        p.add(coordinate("Centre y", m.center().y(), m.center(), v -> replace(disc(m, new Vec2(m.center().x(), v),
                m.radiusM(), m.heightM(), m.standoffM(), m.side(), m.remanenceT(), m.magnetization()))));
        p.add(quantity("Radius", Dimension.LENGTH, m.radiusM(), v -> replace(disc(m, m.center(), v, m.heightM(),
                m.standoffM(), m.side(), m.remanenceT(), m.magnetization()))));
        p.add(quantity("Height (z)", Dimension.LENGTH, m.heightM(), v -> replace(disc(m, m.center(), m.radiusM(), v,
                m.standoffM(), m.side(), m.remanenceT(), m.magnetization()))));
        p.add(quantity("Gap to the plane", Dimension.LENGTH, m.standoffM(), v -> replace(disc(m, m.center(),
                m.radiusM(), m.heightM(), v, m.side(), m.remanenceT(), m.magnetization()))));
        p.add(choice("Side", SIDES, m.side().ordinal(), i -> replace(disc(m, m.center(), m.radiusM(), m.heightM(),
                m.standoffM(), Source.Side.values()[i], m.remanenceT(), m.magnetization()))));
        p.add(quantity("Remanence", Dimension.FLUX_DENSITY, m.remanenceT(), v -> replace(disc(m, m.center(),
                m.radiusM(), m.heightM(), m.standoffM(), m.side(), v, m.magnetization()))));
        p.add(choice("Poles", NORTH, m.magnetization().ordinal(), i -> replace(disc(m, m.center(), m.radiusM(),
                m.heightM(), m.standoffM(), m.side(), m.remanenceT(), Source.Magnetization.values()[i]))));
        return p;
    }

    private static Source.CylinderMagnet disc(Source.CylinderMagnet m, Vec2 c, double r, double h, double gap,
                                              Source.Side side, double br, Source.Magnetization north) {
        return new Source.CylinderMagnet(m.id(), m.body(), c, r, h, gap, side, br, north);
    }

    private static List<Property> coilProperties(Source.SourceCoil c) {
        List<Property> p = new ArrayList<>();
        Source.Drive d = c.drive();
        p.add(whole("Turns", c.turns(), n -> replace(new Source.SourceCoil(c.id(), c.body(), c.shape(), n,
                c.planeZM(), d))));
        p.add(quantity("Plane z (− below)", Dimension.LENGTH, c.planeZM(), v -> replace(new Source.SourceCoil(c.id(),
                c.body(), c.shape(), c.turns(), v, d))));
        p.addAll(c.shape().match(new Source.CoilShape.Cases<>() {
            @Override
            public List<Property> polygon(Source.CoilShape.Polygon polygon) {
                // Its vertices are edited on the canvas.
                return List.of();
            }

            @Override
            public List<Property> circle(Source.CoilShape.Circle circle) {
                return List.of(quantity("Radius", Dimension.LENGTH, circle.radiusM(), v -> replace(
                        new Source.SourceCoil(c.id(), c.body(), new Source.CoilShape.Circle(circle.center(), v),
                                c.turns(), c.planeZM(), d))));
            }
        }));
        p.add(quantity("DC current", Dimension.CURRENT, d.dcA(), v -> replace(coil(c, new Source.Drive(v,
                d.amplitudeA(), d.frequencyHz(), d.phaseRad())))));
        p.add(quantity("AC amplitude", Dimension.CURRENT, d.amplitudeA(), v -> replace(coil(c, new Source.Drive(d.dcA(),
                v, d.frequencyHz(), d.phaseRad())))));
        p.add(quantity("AC frequency", Dimension.FREQUENCY, d.frequencyHz(), v -> replace(coil(c,
                new Source.Drive(d.dcA(), d.amplitudeA(), v, d.phaseRad())))));
        p.add(quantity("AC phase", Dimension.ANGLE, d.phaseRad(), v -> replace(coil(c, new Source.Drive(d.dcA(),
                d.amplitudeA(), d.frequencyHz(), v)))));
        return p;
    }

    private static Source.SourceCoil coil(Source.SourceCoil c, Source.Drive drive) {
        return new Source.SourceCoil(c.id(), c.body(), c.shape(), c.turns(), c.planeZM(), drive);
    }

    private static List<Property> conductorProperties(Conductor c) {
        return c.match(new Conductor.Cases<>() {
            @Override
            public List<Property> wire(Conductor.Wire wire) {
                // A wire is its vertices alone, edited on the canvas.
                return List.of();
            }

            @Override
            public List<Property> loop(Conductor.Loop l) {
                return loopProperties(l);
            }

            @Override
            public List<Property> plate(Conductor.Plate plate) {
                return plateProperties(plate);
            }

            @Override
            public List<Property> channel(Conductor.Channel channel) {
                return channelProperties(channel);
            }
        });
    }

    /** Thickness and conductivity; the outline is edited on the canvas, holes and electrodes in the file. */
    private static List<Property> plateProperties(Conductor.Plate c) {
        List<Property> p = new ArrayList<>();
        p.add(quantity("Thickness", Dimension.LENGTH, c.thicknessM(), v -> replace(new Conductor.Plate(c.id(), c.body(),
                c.outline(), c.holes(), v, c.conductivity(), c.electrodes(), c.pairs(), c.cellM()))));
        p.add(quantity("Conductivity", Dimension.CONDUCTIVITY, c.sigmaSPerM(), v -> replace(new Conductor.Plate(c.id(),
                c.body(), c.outline(), c.holes(), c.thicknessM(), new Conductivity.Given(v), c.electrodes(), c.pairs(),
                c.cellM()))));
        return p;
    }

    /** Section, conductivity, velocity profile and, for a steady flow, its mean velocity. */
    private static List<Property> channelProperties(Conductor.Channel c) {
        List<Property> p = new ArrayList<>();
        p.add(quantity("Width", Dimension.LENGTH, c.widthM(), v -> replace(channel(c, c.start(), c.end(), v,
                c.depthM(), c.sigmaSPerM(), c.profile(), c.flow()))));
        p.add(quantity("Depth", Dimension.LENGTH, c.depthM(), v -> replace(channel(c, c.start(), c.end(), c.widthM(),
                v, c.sigmaSPerM(), c.profile(), c.flow()))));
        p.add(quantity("Conductivity", Dimension.CONDUCTIVITY, c.sigmaSPerM(), v -> replace(channel(c, c.start(),
                c.end(), c.widthM(), c.depthM(), v, c.profile(), c.flow()))));
        List<Conductor.Channel.Profile> profiles = List.of(Conductor.Channel.Profile.values());
        p.add(choice("Velocity profile", PROFILES, profiles.indexOf(c.profile()), i -> replace(channel(c, c.start(),
                c.end(), c.widthM(), c.depthM(), c.sigmaSPerM(), profiles.get(i), c.flow()))));
        if (c.flow() instanceof MeanFlow.Steady steady) {
            p.add(quantity("Mean flow velocity", Dimension.VELOCITY, steady.velocityMPerS(), v -> replace(channel(c,
                    c.start(), c.end(), c.widthM(), c.depthM(), c.sigmaSPerM(), c.profile(), new MeanFlow.Steady(v)))));
        }
        return p;
    }

    /**
     * {@code c} with a new centreline, section, conductivity, profile or flow; electrodes keep their
     * place along the centreline (as a fraction of its length) and their wall.
     */
    static Conductor.Channel channel(Conductor.Channel c, Vec2 start, Vec2 end, double widthM, double depthM,
                                     double sigmaSPerM, Conductor.Channel.Profile profile, MeanFlow flow) {
        Vec2 along = c.end().minus(c.start());
        double length = along.length();
        Vec2 t = along.times(1 / length);
        Vec2 newAlong = end.minus(start);
        Vec2 newPerp = newAlong.times(1 / newAlong.length()).perp();
        List<Conductor.Electrode> electrodes = c.electrodes().stream().map(e -> {
            Vec2 r = e.at().minus(c.start());
            double fraction = r.dot(t) / length;
            double side = Math.signum(t.cross(r));
            return new Conductor.Electrode(e.name(), start.plus(newAlong.times(fraction))
                    .plus(newPerp.times(side * widthM / 2)));
        }).toList();
        return new Conductor.Channel(c.id(), c.body(), start, end, widthM, depthM, sigmaSPerM, profile, flow,
                electrodes, c.pairs(), c.cellM());
    }

    private static List<Property> loopProperties(Conductor.Loop l) {
        List<Property> p = new ArrayList<>();
        p.add(whole("Turns", l.turns(), n -> replace(new Conductor.Loop(l.id(), l.body(), l.vertices(), n, l.wire(),
                l.open(), l.loadOhm(), l.temperatureC()))));
        p.add(quantity("Wire diameter", Dimension.LENGTH, l.wire().diameterM(), v -> replace(new Conductor.Loop(l.id(),
                l.body(), l.vertices(), l.turns(), org.kinduct.scene.WireSpec.of(l.wire().material(), v), l.open(),
                l.loadOhm(), l.temperatureC()))));
        p.add(choice("Material", MATERIALS, l.wire().material().ordinal(), i -> replace(new Conductor.Loop(l.id(),
                l.body(), l.vertices(), l.turns(), org.kinduct.scene.WireSpec.of(Material.values()[i],
                l.wire().diameterM()), l.open(), l.loadOhm(), l.temperatureC()))));
        p.add(choice("Circuit", GAP, l.open() ? 1 : 0, i -> replace(new Conductor.Loop(l.id(), l.body(), l.vertices(),
                l.turns(), l.wire(), i == 1, l.loadOhm(), l.temperatureC()))));
        p.add(quantity("Load resistor", Dimension.RESISTANCE, l.loadOhm(), v -> replace(new Conductor.Loop(l.id(),
                l.body(), l.vertices(), l.turns(), l.wire(), l.open(), v, l.temperatureC()))));
        p.add(quantity("Temperature", Dimension.TEMPERATURE, l.temperatureC(), v -> replace(new Conductor.Loop(l.id(),
                l.body(), l.vertices(), l.turns(), l.wire(), l.open(), l.loadOhm(), v))));
        return p;
    }
}

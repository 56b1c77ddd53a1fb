package org.kinduct.scene;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;

/** Constructions on whole scenes. */
public final class Scenes {

    private Scenes() {
    }

    /** {@code scene} with every drawn position moved by {@code by}: the same arrangement elsewhere in the plane. */
    public static Scene movedBy(Scene scene, Vec2 by) {
        return mapPositions(scene, p -> p.plus(by));
    }

    /**
     * Every drawn position of the scene, in no particular order: body pivots, spring anchors, patch
     * and coil outlines, magnet and coil centres, a field map's offset, conductor vertices, a plate's outline (its holes
     * and electrodes lie within), a channel's ends. Directions, offsets and
     * velocities are not positions. (Read where they are, without rebuilding the scene as
     * {@link #mapPositions} does, whose checks cost time on large outlines.)
     */
    public static List<Vec2> positions(Scene scene) {
        List<Vec2> out = new ArrayList<>();
        for (Body b : scene.bodies()) {
            if (!Body.FIXED.equals(b.id())) {
                out.add(b.pivot());
            }
            if (b.motion() instanceof Motion.Free free) {
                free.springs().stream().map(Motion.Free.Spring::anchor).filter(a -> a != null).forEach(out::add);
            }
        }
        for (Source s : scene.sources()) {
            out.addAll(s.match(new Source.Cases<List<Vec2>>() {
                @Override
                public List<Vec2> patch(Source.FieldPatch p) {
                    return p.outline();
                }

                @Override
                public List<Vec2> uniform(Source.UniformField u) {
                    return List.of();
                }

                @Override
                public List<Vec2> block(Source.BlockMagnet m) {
                    return List.of(m.center());
                }

                @Override
                public List<Vec2> cylinder(Source.CylinderMagnet m) {
                    return List.of(m.center());
                }

                /** Where the map's grid origin (0, 0) is drawn: its samples sit at their grid coordinates from there. */
                @Override
                public List<Vec2> map(Source.FieldMap m) {
                    return List.of(m.offsetM());
                }

                @Override
                public List<Vec2> coil(Source.SourceCoil c) {
                    return c.shape().match(new Source.CoilShape.Cases<>() {
                        @Override
                        public List<Vec2> polygon(Source.CoilShape.Polygon p) {
                            return p.vertices();
                        }

                        @Override
                        public List<Vec2> circle(Source.CoilShape.Circle circle) {
                            return List.of(circle.center());
                        }
                    });
                }
            }));
        }
        for (Conductor c : scene.conductors()) {
            out.addAll(c.match(new Conductor.Cases<List<Vec2>>() {
                @Override
                public List<Vec2> wire(Conductor.Wire wire) {
                    return wire.vertices().stream().map(Conductor.Vertex::at).toList();
                }

                @Override
                public List<Vec2> loop(Conductor.Loop loop) {
                    return loop.vertices().stream().map(Conductor.Vertex::at).toList();
                }

                @Override
                public List<Vec2> plate(Conductor.Plate plate) {
                    return plate.outline();
                }

                @Override
                public List<Vec2> channel(Conductor.Channel channel) {
                    return List.of(channel.start(), channel.end());
                }
            }));
        }
        return out;
    }

    /** {@code scene} with {@code f} applied to every drawn position ({@link #positions}). */
    public static Scene mapPositions(Scene scene, UnaryOperator<Vec2> f) {
        List<Body> bodies = new ArrayList<>();
        for (Body b : scene.bodies()) {
            if (!Body.FIXED.equals(b.id())) {
                bodies.add(new Body(b.id(), b.name(), f.apply(b.pivot()), motion(b.motion(), f)));
            }
        }
        List<Source> sources = scene.sources().stream().map(s -> source(s, f)).toList();
        List<Conductor> conductors = scene.conductors().stream().map(c -> mapPositions(c, f)).toList();
        return new Scene(scene.name(), scene.description(), bodies, sources, conductors, scene.time(),
                scene.gravity());
    }

    private static Motion motion(Motion m, UnaryOperator<Vec2> f) {
        if (!(m instanceof Motion.Free free)) {
            return m;
        }
        List<Motion.Free.Spring> springs = free.springs().stream().map(s -> s.anchor() == null ? s
                : new Motion.Free.Spring(f.apply(s.anchor()), null, s.stiffnessNPerM(), s.restLengthM())).toList();
        return new Motion.Free(free.massKg(), free.inertiaKgM2(), free.initialVelocity(), free.initialOmegaRadPerS(),
                free.dampingNsPerM(), free.appliedForce(), free.appliedAmplitude(), free.appliedFrequencyHz(), springs);
    }

    private static Source source(Source s, UnaryOperator<Vec2> f) {
        return s.match(new Source.Cases<>() {
            @Override
            public Source patch(Source.FieldPatch p) {
                return new Source.FieldPatch(p.id(), p.body(), p.outline().stream().map(f).toList(), p.bzT());
            }

            /** The map's samples stay as read; its offset, where the grid's origin is drawn, moves. */
            @Override
            public Source map(Source.FieldMap m) {
                return new Source.FieldMap(m.id(), m.body(), m.file(), m.grid(), f.apply(m.offsetM()), m.outside());
            }

            @Override
            public Source uniform(Source.UniformField u) {
                return u;
            }

            @Override
            public Source block(Source.BlockMagnet m) {
                return new Source.BlockMagnet(m.id(), m.body(), f.apply(m.center()), m.sizeXM(), m.sizeYM(),
                        m.heightM(), m.angleRad(), m.standoffM(), m.side(), m.remanenceT(), m.magnetization());
            }

            @Override
            public Source cylinder(Source.CylinderMagnet m) {
                return new Source.CylinderMagnet(m.id(), m.body(), f.apply(m.center()), m.radiusM(), m.heightM(),
                        m.standoffM(), m.side(), m.remanenceT(), m.magnetization());
            }

            @Override
            public Source coil(Source.SourceCoil c) {
                return new Source.SourceCoil(c.id(), c.body(), mapPositions(c.shape(), f), c.turns(), c.planeZM(),
                        c.drive());
            }
        });
    }

    /** A coil's shape with {@code f} applied to its vertices or centre (a circle keeps its radius). */
    public static Source.CoilShape mapPositions(Source.CoilShape shape, UnaryOperator<Vec2> f) {
        return shape.match(new Source.CoilShape.Cases<>() {
            @Override
            public Source.CoilShape polygon(Source.CoilShape.Polygon p) {
                return new Source.CoilShape.Polygon(p.vertices().stream().map(f).toList());
            }

            @Override
            public Source.CoilShape circle(Source.CoilShape.Circle circle) {
                return new Source.CoilShape.Circle(f.apply(circle.center()), circle.radiusM());
            }
        });
    }

    /** {@code c} with {@code f} applied to every drawn position: vertices, a plate's holes, electrodes. */
    public static Conductor mapPositions(Conductor c, UnaryOperator<Vec2> f) {
        List<Conductor.Vertex> vertices = c.vertices().stream()
                .map(v -> new Conductor.Vertex(f.apply(v.at()), v.body())).toList();
        return c.match(new Conductor.Cases<>() {
            @Override
            public Conductor wire(Conductor.Wire wire) {
                return new Conductor.Wire(wire.id(), wire.body(), vertices);
            }

            @Override
            public Conductor loop(Conductor.Loop l) {
                return new Conductor.Loop(l.id(), l.body(), vertices, l.turns(), l.wire(), l.open(), l.loadOhm(),
                        l.temperatureC());
            }

            @Override
            public Conductor plate(Conductor.Plate p) {
                return new Conductor.Plate(p.id(), p.body(), p.outline().stream().map(f).toList(),
                        p.holes().stream().map(h -> h.stream().map(f).toList()).toList(), p.thicknessM(),
                        p.conductivity(), electrodes(p, f), p.pairs(), p.cellM());
            }

            @Override
            public Conductor channel(Conductor.Channel ch) {
                return new Conductor.Channel(ch.id(), ch.body(), f.apply(ch.start()), f.apply(ch.end()), ch.widthM(),
                        ch.depthM(), ch.sigmaSPerM(), ch.profile(), ch.flow(), electrodes(ch, f), ch.pairs(),
                        ch.cellM());
            }
        });
    }

    private static List<Conductor.Electrode> electrodes(Conductor.Sheet sheet, UnaryOperator<Vec2> f) {
        return sheet.electrodes().stream().map(e -> new Conductor.Electrode(e.name(), f.apply(e.at()))).toList();
    }
}

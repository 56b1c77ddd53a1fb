package org.kinduct.ui.edit;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BiFunction;
import java.util.function.UnaryOperator;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scenes;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/**
 * Copies of sources and conductors with one thing changed: geometry, id, body or vertices. Each
 * handles every kind ({@code Cases}), so a new kind does not compile until it is handled here.
 */
public final class Shapes {

    private Shapes() {
    }

    /** Applies {@code f} to every drawn point; magnets also turn by {@code turnRad}. A uniform field has no points. */
    public static Source map(Source s, UnaryOperator<Vec2> f, double turnRad) {
        return s.match(new Source.Cases<>() {
            @Override
            public Source patch(Source.FieldPatch p) {
                return new Source.FieldPatch(p.id(), p.body(), points(p.outline(), f), p.bzT());
            }

            @Override
            public Source uniform(Source.UniformField u) {
                return u;
            }

            @Override
            public Source block(Source.BlockMagnet m) {
                return new Source.BlockMagnet(m.id(), m.body(), f.apply(m.center()), m.sizeXM(), m.sizeYM(),
                        m.heightM(), m.angleRad() + turnRad, m.standoffM(), m.side(), m.remanenceT(),
                        m.magnetization());
            }

            @Override
            public Source cylinder(Source.CylinderMagnet m) {
                return new Source.CylinderMagnet(m.id(), m.body(), f.apply(m.center()), m.radiusM(), m.heightM(),
                        m.standoffM(), m.side(), m.remanenceT(), m.magnetization());
            }

            @Override
            public Source coil(Source.SourceCoil c) {
                return new Source.SourceCoil(c.id(), c.body(), Scenes.mapPositions(c.shape(), f), c.turns(),
                        c.planeZM(), c.drive());
            }

            /** A map moves with its centre; its samples keep their axes, so it turns only with its body. */
            @Override
            public Source map(Source.FieldMap m) {
                Vec2 center = new Vec2(0.5 * (m.grid().x0M() + m.grid().x1M()), 0.5 * (m.grid().y0M() + m.grid().y1M()))
                        .plus(m.offsetM());
                return new Source.FieldMap(m.id(), m.body(), m.file(), m.grid(),
                        m.offsetM().plus(f.apply(center).minus(center)), m.outside());
            }
        });
    }

    /**
     * Whether the source has a place in the plane (an outline or a centre) that can be picked,
     * framed, moved and copied; a uniform field fills the whole plane instead and is edited with
     * the scene.
     */
    public static boolean hasPlace(Source s) {
        return s.match(new Source.Cases<>() {
            @Override
            public Boolean patch(Source.FieldPatch patch) {
                return true;
            }

            @Override
            public Boolean uniform(Source.UniformField uniform) {
                return false;
            }

            @Override
            public Boolean block(Source.BlockMagnet block) {
                return true;
            }

            @Override
            public Boolean cylinder(Source.CylinderMagnet cylinder) {
                return true;
            }

            @Override
            public Boolean coil(Source.SourceCoil coil) {
                return true;
            }

            @Override
            public Boolean map(Source.FieldMap map) {
                return true;
            }
        });
    }

    public static Conductor map(Conductor c, UnaryOperator<Vec2> f) {
        return mapByBody(c, (body, p) -> f.apply(p));
    }

    /**
     * Applies {@code f(body, point)} to every drawn vertex, told the id of the body that vertex
     * rides; a plate's or channel's every point (holes and electrodes too) rides its body.
     */
    public static Conductor mapByBody(Conductor c, BiFunction<String, Vec2, Vec2> f) {
        if (c instanceof Conductor.Sheet) {
            return Scenes.mapPositions(c, p -> f.apply(c.body(), p));
        }
        List<Conductor.Vertex> vs = new ArrayList<>(c.vertices().size());
        for (Conductor.Vertex v : c.vertices()) {
            vs.add(new Conductor.Vertex(f.apply(v.bodyOr(c.body()), v.at()), v.body()));
        }
        return withVertices(c, vs);
    }

    public static Conductor withVertices(Conductor c, List<Conductor.Vertex> vs) {
        return rebuild(c, c.id(), c.body(), vs);
    }

    public static Conductor withId(Conductor c, String id) {
        return rebuild(c, id, c.body(), c.vertices());
    }

    public static Conductor withBody(Conductor c, String body) {
        return rebuild(c, c.id(), body, c.vertices());
    }

    private static Conductor rebuild(Conductor c, String id, String body, List<Conductor.Vertex> vs) {
        return c.match(new Conductor.Cases<>() {
            @Override
            public Conductor wire(Conductor.Wire wire) {
                return new Conductor.Wire(id, body, vs);
            }

            @Override
            public Conductor loop(Conductor.Loop l) {
                return new Conductor.Loop(id, body, vs, l.turns(), l.wire(), l.open(), l.loadOhm(), l.temperatureC());
            }

            /** The outline's vertices are the plate's; holes and electrodes stay where they are. */
            @Override
            public Conductor plate(Conductor.Plate p) {
                return new Conductor.Plate(id, body, vs.stream().map(Conductor.Vertex::at).toList(), p.holes(),
                        p.thicknessM(), p.conductivity(), p.electrodes(), p.pairs(), p.cellM());
            }

            /**
             * A channel's corners (start's right, end's right, end's left, start's left) set its
             * ends at the middle of each end's corners and its width at their mean spacing.
             */
            @Override
            public Conductor channel(Conductor.Channel ch) {
                Vec2 start = midpoint(vs.get(0).at(), vs.get(3).at());
                Vec2 end = midpoint(vs.get(1).at(), vs.get(2).at());
                double width = 0.5 * (vs.get(3).at().minus(vs.get(0).at()).length()
                        + vs.get(2).at().minus(vs.get(1).at()).length());
                Conductor.Channel renamed = new Conductor.Channel(id, body, ch.start(), ch.end(), ch.widthM(),
                        ch.depthM(), ch.sigmaSPerM(), ch.profile(), ch.flow(), ch.electrodes(), ch.pairs(), ch.cellM());
                return PropertySheet.channel(renamed, start, end, width, ch.depthM(), ch.sigmaSPerM(), ch.profile(),
                        ch.flow());
            }
        });
    }

    private static Vec2 midpoint(Vec2 a, Vec2 b) {
        return a.plus(b).times(0.5);
    }

    public static Source withId(Source s, String id) {
        return rebuild(s, id, s.body());
    }

    public static Source withBody(Source s, String body) {
        return rebuild(s, s.id(), body);
    }

    private static Source rebuild(Source s, String id, String body) {
        return s.match(new Source.Cases<>() {
            @Override
            public Source patch(Source.FieldPatch p) {
                return new Source.FieldPatch(id, body, p.outline(), p.bzT());
            }

            @Override
            public Source uniform(Source.UniformField u) {
                if (!body.equals(u.body())) {
                    throw new IllegalArgumentException("a uniform field belongs to the fixed frame");
                }
                return new Source.UniformField(id, u.bzT(), u.earth());
            }

            @Override
            public Source block(Source.BlockMagnet m) {
                return new Source.BlockMagnet(id, body, m.center(), m.sizeXM(), m.sizeYM(), m.heightM(),
                        m.angleRad(), m.standoffM(), m.side(), m.remanenceT(), m.magnetization());
            }

            @Override
            public Source cylinder(Source.CylinderMagnet m) {
                return new Source.CylinderMagnet(id, body, m.center(), m.radiusM(), m.heightM(), m.standoffM(),
                        m.side(), m.remanenceT(), m.magnetization());
            }

            @Override
            public Source coil(Source.SourceCoil c) {
                return new Source.SourceCoil(id, body, c.shape(), c.turns(), c.planeZM(), c.drive());
            }

            @Override
            public Source map(Source.FieldMap m) {
                return new Source.FieldMap(id, body, m.file(), m.grid(), m.offsetM(), m.outside());
            }
        });
    }

    private static List<Vec2> points(List<Vec2> pts, UnaryOperator<Vec2> f) {
        List<Vec2> out = new ArrayList<>(pts.size());
        for (Vec2 p : pts) {
            out.add(f.apply(p));
        }
        return out;
    }
}

package org.kinduct.ui.edit;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BiFunction;
import java.util.function.UnaryOperator;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/** Copies of sources and conductors with one thing changed: geometry, id, body or vertices. */
public final class Shapes {

    private Shapes() {
    }

    /** Applies {@code f} to every drawn point; magnets also turn by {@code turnRad}. */
    public static Source map(Source s, UnaryOperator<Vec2> f, double turnRad) {
        if (s instanceof Source.FieldPatch p) {
            return new Source.FieldPatch(p.id(), p.body(), points(p.outline(), f), p.bzT());
        }
        if (s instanceof Source.BlockMagnet m) {
            return new Source.BlockMagnet(m.id(), m.body(), f.apply(m.center()), m.sizeXM(), m.sizeYM(),
                    m.heightM(), m.angleRad() + turnRad, m.standoffM(), m.side(), m.remanenceT(), m.magnetization());
        }
        if (s instanceof Source.CylinderMagnet m) {
            return new Source.CylinderMagnet(m.id(), m.body(), f.apply(m.center()), m.radiusM(), m.heightM(),
                    m.standoffM(), m.side(), m.remanenceT(), m.magnetization());
        }
        if (s instanceof Source.SourceCoil c) {
            Source.CoilShape shape = c.shape() instanceof Source.CoilShape.Circle circle
                    ? new Source.CoilShape.Circle(f.apply(circle.center()), circle.radiusM())
                    : new Source.CoilShape.Polygon(points(((Source.CoilShape.Polygon) c.shape()).vertices(), f));
            return new Source.SourceCoil(c.id(), c.body(), shape, c.turns(), c.planeZM(), c.drive());
        }
        return s;
    }

    public static Conductor map(Conductor c, UnaryOperator<Vec2> f) {
        return mapByBody(c, (body, p) -> f.apply(p));
    }

    /** Applies {@code f(body, point)} to every drawn vertex, told the id of the body that vertex rides. */
    public static Conductor mapByBody(Conductor c, BiFunction<String, Vec2, Vec2> f) {
        List<Conductor.Vertex> vs = new ArrayList<>(c.vertices().size());
        for (Conductor.Vertex v : c.vertices()) {
            vs.add(new Conductor.Vertex(f.apply(v.bodyOr(c.body()), v.at()), v.body()));
        }
        return withVertices(c, vs);
    }

    public static Conductor withVertices(Conductor c, List<Conductor.Vertex> vs) {
        if (c instanceof Conductor.Loop l) {
            return new Conductor.Loop(l.id(), l.body(), vs, l.turns(), l.wire(), l.open(), l.loadOhm(),
                    l.temperatureC());
        }
        return new Conductor.Wire(c.id(), c.body(), vs);
    }

    public static Conductor withId(Conductor c, String id) {
        if (c instanceof Conductor.Loop l) {
            return new Conductor.Loop(id, l.body(), l.vertices(), l.turns(), l.wire(), l.open(), l.loadOhm(),
                    l.temperatureC());
        }
        return new Conductor.Wire(id, c.body(), c.vertices());
    }

    public static Conductor withBody(Conductor c, String body) {
        if (c instanceof Conductor.Loop l) {
            return new Conductor.Loop(l.id(), body, l.vertices(), l.turns(), l.wire(), l.open(), l.loadOhm(),
                    l.temperatureC());
        }
        return new Conductor.Wire(c.id(), body, c.vertices());
    }

    public static Source withId(Source s, String id) {
        return rebuild(s, id, s.body());
    }

    public static Source withBody(Source s, String body) {
        return rebuild(s, s.id(), body);
    }

    private static Source rebuild(Source s, String id, String body) {
        if (s instanceof Source.FieldPatch p) {
            return new Source.FieldPatch(id, body, p.outline(), p.bzT());
        }
        if (s instanceof Source.BlockMagnet m) {
            return new Source.BlockMagnet(id, body, m.center(), m.sizeXM(), m.sizeYM(), m.heightM(), m.angleRad(),
                    m.standoffM(), m.side(), m.remanenceT(), m.magnetization());
        }
        if (s instanceof Source.CylinderMagnet m) {
            return new Source.CylinderMagnet(id, body, m.center(), m.radiusM(), m.heightM(), m.standoffM(), m.side(),
                    m.remanenceT(), m.magnetization());
        }
        if (s instanceof Source.SourceCoil c) {
            return new Source.SourceCoil(id, body, c.shape(), c.turns(), c.planeZM(), c.drive());
        }
        Source.UniformField u = (Source.UniformField) s;
        if (!body.equals(u.body())) {
            throw new IllegalArgumentException("a uniform field belongs to the fixed frame");
        }
        return new Source.UniformField(id, u.bzT());
    }

    private static List<Vec2> points(List<Vec2> pts, UnaryOperator<Vec2> f) {
        List<Vec2> out = new ArrayList<>(pts.size());
        for (Vec2 p : pts) {
            out.add(f.apply(p));
        }
        return out;
    }
}

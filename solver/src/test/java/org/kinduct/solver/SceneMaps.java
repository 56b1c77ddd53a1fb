package org.kinduct.solver;

import java.util.List;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;

/**
 * Rigid maps of whole scenes for invariance tests: p → R(θ)·p + d for every drawn point and
 * pivot, v → R(θ)·v for every vector. A body's pose maps the same way, since planar rotations
 * commute: pivot' + R·offset + R(α)·R·(p − pivot) = R·(pivot + offset + R(α)(p − pivot)) + d.
 */
final class SceneMaps {

    private final double angleRad;
    private final Vec2 shift;

    private SceneMaps(double angleRad, Vec2 shift) {
        this.angleRad = angleRad;
        this.shift = shift;
    }

    static Scene moved(Scene scene, double angleRad, Vec2 shift) {
        SceneMaps map = new SceneMaps(angleRad, shift);
        return new Scene(scene.name(), scene.description(),
                scene.bodies().stream().filter(b -> !b.id().equals(Body.FIXED)).map(map::body).toList(),
                scene.sources().stream().map(map::source).toList(),
                scene.conductors().stream().map(map::conductor).toList(), scene.time());
    }

    private Vec2 point(Vec2 p) {
        return p.rotate(angleRad).plus(shift);
    }

    private Vec2 vector(Vec2 v) {
        return v.rotate(angleRad);
    }

    private List<Vec2> points(List<Vec2> ps) {
        return ps.stream().map(this::point).toList();
    }

    private Body body(Body b) {
        return new Body(b.id(), b.name(), point(b.pivot()), motion(b.motion()));
    }

    private Motion motion(Motion m) {
        if (m instanceof Motion.Glide g) {
            return new Motion.Glide(vector(g.velocity()));
        }
        if (m instanceof Motion.Accelerate a) {
            return new Motion.Accelerate(vector(a.initialVelocity()), vector(a.acceleration()));
        }
        if (m instanceof Motion.Oscillate o) {
            return new Motion.Oscillate(o.amplitudeM(), o.frequencyHz(), o.directionRad() + angleRad, o.phaseRad());
        }
        if (m instanceof Motion.Path p) {
            return new Motion.Path(p.keys().stream()
                    .map(k -> new Motion.Path.Key(k.tS(), vector(k.offset()), k.angleRad())).toList(), p.blend());
        }
        if (m instanceof Motion.Spin || m instanceof Motion.Still) {
            return m;
        }
        throw new IllegalArgumentException("no rigid map written for " + m);
    }

    private Source source(Source s) {
        if (s instanceof Source.FieldPatch p) {
            return new Source.FieldPatch(p.id(), p.body(), points(p.outline()), p.bzT());
        }
        if (s instanceof Source.UniformField) {
            return s;
        }
        if (s instanceof Source.BlockMagnet m) {
            return new Source.BlockMagnet(m.id(), m.body(), point(m.center()), m.sizeXM(), m.sizeYM(), m.heightM(),
                    m.angleRad() + angleRad, m.standoffM(), m.side(), m.remanenceT(), m.magnetization());
        }
        if (s instanceof Source.CylinderMagnet c) {
            return new Source.CylinderMagnet(c.id(), c.body(), point(c.center()), c.radiusM(), c.heightM(),
                    c.standoffM(), c.side(), c.remanenceT(), c.magnetization());
        }
        Source.SourceCoil coil = (Source.SourceCoil) s;
        Source.CoilShape shape = coil.shape() instanceof Source.CoilShape.Circle c
                ? new Source.CoilShape.Circle(point(c.center()), c.radiusM())
                : new Source.CoilShape.Polygon(points(((Source.CoilShape.Polygon) coil.shape()).vertices()));
        return new Source.SourceCoil(coil.id(), coil.body(), shape, coil.turns(), coil.planeZM(), coil.drive());
    }

    private Conductor conductor(Conductor c) {
        List<Conductor.Vertex> vertices = c.vertices().stream()
                .map(v -> new Conductor.Vertex(point(v.at()), v.body())).toList();
        if (c instanceof Conductor.Loop l) {
            return new Conductor.Loop(l.id(), l.body(), vertices, l.turns(), l.wire(), l.open(), l.loadOhm(),
                    l.temperatureC());
        }
        return new Conductor.Wire(c.id(), c.body(), vertices);
    }
}

package org.kinduct.ui.edit;

import org.kinduct.render.view.SceneBounds;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.function.UnaryOperator;
import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;

/**
 * The motion editor: the prescribed motion of the body an object rides, and its parameters.
 * Giving motion to an object on the fixed frame puts it on a body of its own, pivoting about its
 * centre; objects sharing a body move together.
 */
public final class MotionSheet {

    /** The motions, in menu order: prescribed ones, then free (moved by forces, simulated). */
    public static final List<String> KINDS = List.of("still", "glide", "accelerate", "oscillate", "spin", "path keys",
            "free (forces)");
    static final List<String> BLENDS = List.of("linear", "smooth");

    private MotionSheet() {
    }

    public static List<Property> of(Scene scene, String objectId) {
        Body body = scene.body(SceneEdits.bodyOf(scene, objectId)).orElseThrow();
        Motion m = body.motion();
        Vec2 pivot = Body.FIXED.equals(body.id())
                ? SceneBounds.ofObjects(scene, Set.of(objectId), 0).center() : body.pivot();
        List<Property> p = new ArrayList<>();
        p.add(new Property("Motion", kindOf(m), KINDS, text -> {
            int i = KINDS.indexOf(text);
            if (i < 0) {
                throw new IllegalArgumentException("choose one of " + KINDS);
            }
            return s -> SceneEdits.setMotion(s, objectId, defaultMotion(i, s), pivot);
        }));
        p.addAll(parameters(m, objectId, pivot));
        if (!Body.FIXED.equals(body.id())) {
            p.add(vector("Pivot", Dimension.LENGTH, body.pivot(), v -> s -> {
                List<Body> bodies = new ArrayList<>(s.bodies());
                bodies.replaceAll(b -> b.id().equals(body.id()) ? new Body(b.id(), b.name(), v, b.motion()) : b);
                return s.withBodies(bodies);
            }));
        }
        return p;
    }

    /** The parameters of motion {@code m} of the body {@code objectId} rides, pivoting about {@code pivot}. */
    private static List<Property> parameters(Motion m, String objectId, Vec2 pivot) {
        return m.match(new Motion.Cases<>() {
            @Override
            public List<Property> still(Motion.Still still) {
                return List.of();
            }

            @Override
            public List<Property> glide(Motion.Glide g) {
                return List.of(vector("Velocity", Dimension.VELOCITY, g.velocity(),
                        v -> set(objectId, new Motion.Glide(v), pivot)));
            }

            @Override
            public List<Property> accelerate(Motion.Accelerate a) {
                return List.of(
                        vector("Initial velocity", Dimension.VELOCITY, a.initialVelocity(),
                                v -> set(objectId, new Motion.Accelerate(v, a.acceleration()), pivot)),
                        vector("Acceleration", Dimension.ACCELERATION, a.acceleration(),
                                v -> set(objectId, new Motion.Accelerate(a.initialVelocity(), v), pivot)));
            }

            @Override
            public List<Property> oscillate(Motion.Oscillate o) {
                return List.of(
                        PropertySheet.quantity("Amplitude", Dimension.LENGTH, o.amplitudeM(), v -> set(objectId,
                                new Motion.Oscillate(v, o.frequencyHz(), o.directionRad(), o.phaseRad()), pivot)),
                        PropertySheet.quantity("Frequency", Dimension.FREQUENCY, o.frequencyHz(), v -> set(objectId,
                                new Motion.Oscillate(o.amplitudeM(), v, o.directionRad(), o.phaseRad()), pivot)),
                        PropertySheet.quantity("Direction", Dimension.ANGLE, o.directionRad(), v -> set(objectId,
                                new Motion.Oscillate(o.amplitudeM(), o.frequencyHz(), v, o.phaseRad()), pivot)),
                        PropertySheet.quantity("Phase", Dimension.ANGLE, o.phaseRad(), v -> set(objectId,
                                new Motion.Oscillate(o.amplitudeM(), o.frequencyHz(), o.directionRad(), v), pivot)));
            }

            @Override
            public List<Property> spin(Motion.Spin sp) {
                return List.of(
                        PropertySheet.quantity("Angular speed (+ anticlockwise)", Dimension.ANGULAR_SPEED,
                                sp.omegaRadPerS(), v -> set(objectId, new Motion.Spin(v, sp.startAngleRad()), pivot)),
                        PropertySheet.quantity("Start angle", Dimension.ANGLE, sp.startAngleRad(),
                                v -> set(objectId, new Motion.Spin(sp.omegaRadPerS(), v), pivot)));
            }

            @Override
            public List<Property> path(Motion.Path path) {
                return List.of(
                        new Property("Keys: t, x, y, angle; …", keysText(path), List.of(),
                                text -> set(objectId, new Motion.Path(parseKeys(text), path.blend()), pivot)),
                        PropertySheet.choice("Between keys", BLENDS, path.blend().ordinal(),
                                i -> set(objectId, new Motion.Path(path.keys(), Motion.Path.Blend.values()[i]),
                                        pivot)));
            }

            @Override
            public List<Property> free(Motion.Free free) {
                return FreeMotionSheet.of(free, f -> set(objectId, f, pivot));
            }
        });
    }

    /** The menu entry of {@code m} in {@link #KINDS}. */
    static String kindOf(Motion m) {
        return KINDS.get(m.match(new Motion.Cases<Integer>() {
            @Override
            public Integer still(Motion.Still still) {
                return 0;
            }

            @Override
            public Integer glide(Motion.Glide glide) {
                return 1;
            }

            @Override
            public Integer accelerate(Motion.Accelerate accelerate) {
                return 2;
            }

            @Override
            public Integer oscillate(Motion.Oscillate oscillate) {
                return 3;
            }

            @Override
            public Integer spin(Motion.Spin spin) {
                return 4;
            }

            @Override
            public Integer path(Motion.Path path) {
                return 5;
            }

            @Override
            public Integer free(Motion.Free free) {
                return 6;
            }
        }));
    }

    /** A starting point for each kind, scaled to the scene's time window. */
    static Motion defaultMotion(int kind, Scene s) {
        double span = s.time().t1S() - s.time().t0S();
        return switch (kind) {
            case 1 -> new Motion.Glide(new Vec2(0.05 / span, 0));
            case 2 -> new Motion.Accelerate(Vec2.ZERO, new Vec2(0.1 / (span * span), 0));
            case 3 -> new Motion.Oscillate(0.01, 1 / span, 0, 0);
            case 4 -> new Motion.Spin(2 * Math.PI / span, 0);
            case 5 -> new Motion.Path(List.of(new Motion.Path.Key(s.time().t0S(), Vec2.ZERO, 0),
                    new Motion.Path.Key(s.time().t1S(), new Vec2(0.05, 0), 0)), Motion.Path.Blend.SMOOTH);
            case 6 -> FreeMotionSheet.initial();
            default -> new Motion.Still();
        };
    }

    private static UnaryOperator<Scene> set(String objectId, Motion m, Vec2 pivot) {
        return s -> SceneEdits.setMotion(s, objectId, m, pivot);
    }

    /**
     * "x, y" with units, for editing; a component that is rounding noise beside the vector's length
     * (a point turned onto an axis) reads 0.
     */
    static String pair(Vec2 v, Dimension d) {
        return Units.format(Units.withoutNoise(v.x(), v.length()), d, PropertySheet.EDIT_DIGITS) + ", "
                + Units.format(Units.withoutNoise(v.y(), v.length()), d, PropertySheet.EDIT_DIGITS);
    }

    /** A vector typed as "x, y", each with its unit. */
    static Property vector(String label, Dimension d, Vec2 v,
                           java.util.function.Function<Vec2, UnaryOperator<Scene>> apply) {
        return new Property(label + " (x, y)", pair(v, d), List.of(), typed -> {
            String[] parts = typed.split(",", -1);
            if (parts.length != 2) {
                throw new IllegalArgumentException("expected two values 'x, y' such as '" + d.example() + ", 0'");
            }
            return apply.apply(new Vec2(Units.parse(parts[0], d), Units.parse(parts[1], d)));
        });
    }

    static String keysText(Motion.Path path) {
        StringBuilder b = new StringBuilder();
        for (Motion.Path.Key k : path.keys()) {
            if (b.length() > 0) {
                b.append("; ");
            }
            b.append(Units.format(k.tS(), Dimension.TIME, PropertySheet.EDIT_DIGITS)).append(", ")
                    .append(Units.format(k.offset().x(), Dimension.LENGTH, PropertySheet.EDIT_DIGITS)).append(", ")
                    .append(Units.format(k.offset().y(), Dimension.LENGTH, PropertySheet.EDIT_DIGITS)).append(", ")
                    .append(Units.format(k.angleRad(), Dimension.ANGLE, PropertySheet.EDIT_DIGITS));
        }
        return b.toString();
    }

    static List<Motion.Path.Key> parseKeys(String text) {
        List<Motion.Path.Key> keys = new ArrayList<>();
        // A closing ';' is forgiven; an empty key between two is an error like any short key.
        String[] entries = text.strip().replaceFirst(";$", "").split(";", -1);
        for (int i = 0; i < entries.length; i++) {
            String[] f = entries[i].split(",", -1);
            if (f.length != 4) {
                throw new IllegalArgumentException("key " + (i + 1) + " needs 't, x, y, angle', got '"
                        + entries[i].strip() + "'");
            }
            keys.add(new Motion.Path.Key(Units.parse(f[0], Dimension.TIME),
                    new Vec2(Units.parse(f[1], Dimension.LENGTH), Units.parse(f[2], Dimension.LENGTH)),
                    Units.parse(f[3], Dimension.ANGLE)));
        }
        return keys;
    }
}

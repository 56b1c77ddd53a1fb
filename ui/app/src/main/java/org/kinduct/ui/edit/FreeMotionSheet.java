package org.kinduct.ui.edit;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BiConsumer;
import java.util.function.Function;
import java.util.function.UnaryOperator;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;

/**
 * The fields of a free body ({@link Motion.Free}) in the motion editor, each with units: mass,
 * inertia, initial velocities, damping, the applied force and its sinusoidal part, and the springs
 * (one line each, cleared to remove; a last empty line adds one). Scene gravity is a scene
 * property ({@link PropertySheet}).
 */
final class FreeMotionSheet {

    /** Mass a body gets when it is made free: a small magnet or coil former. */
    static final double DEFAULT_MASS_KG = 0.02;
    static final String SPRING_FORMAT = "anchor x, y or body id; stiffness; rest length";

    private FreeMotionSheet() {
    }

    static Motion.Free initial() {
        return Motion.Free.ofMass(DEFAULT_MASS_KG);
    }

    /** The properties of {@code f}; {@code set} turns a changed motion into the scene edit. */
    static List<Property> of(Motion.Free f, Function<Motion.Free, UnaryOperator<Scene>> set) {
        List<Property> p = new ArrayList<>();
        p.add(scalar("Mass", Dimension.MASS, f.massKg(), f, (d, v) -> d.mass = v, set));
        p.add(scalar("Moment of inertia (0 locks rotation)", Dimension.INERTIA, f.inertiaKgM2(), f,
                (d, v) -> d.inertia = v, set));
        p.add(MotionSheet.vector("Initial velocity", Dimension.VELOCITY, f.initialVelocity(),
                v -> edited(f, d -> d.velocity = v, set)));
        p.add(scalar("Initial angular speed (+ anticlockwise)", Dimension.ANGULAR_SPEED, f.initialOmegaRadPerS(), f,
                (d, v) -> d.omega = v, set));
        p.add(scalar("Damping", Dimension.DAMPING, f.dampingNsPerM(), f, (d, v) -> d.damping = v, set));
        p.add(MotionSheet.vector("Applied force", Dimension.FORCE, f.appliedForce(),
                v -> edited(f, d -> d.force = v, set)));
        p.add(MotionSheet.vector("Applied force, sinusoidal amplitude", Dimension.FORCE, f.appliedAmplitude(),
                v -> edited(f, d -> d.amplitude = v, set)));
        p.add(scalar("Applied force frequency", Dimension.FREQUENCY, f.appliedFrequencyHz(), f,
                (d, v) -> d.frequency = v, set));
        for (int i = 0; i <= f.springs().size(); i++) {
            int k = i;
            boolean adding = i == f.springs().size();
            String label = adding ? "Add a spring (" + SPRING_FORMAT + ")"
                    : "Spring " + (i + 1) + " (" + SPRING_FORMAT + "; clear to remove)";
            p.add(new Property(label, adding ? "" : springText(f.springs().get(i)), List.of(), text -> edited(f, d -> {
                if (text.isBlank()) {
                    if (!adding) {
                        d.springs.remove(k);
                    }
                } else if (adding) {
                    d.springs.add(parseSpring(text));
                } else {
                    d.springs.set(k, parseSpring(text));
                }
            }, set)));
        }
        return p;
    }

    static String springText(Motion.Free.Spring s) {
        String anchor = s.otherBody() != null ? s.otherBody() : MotionSheet.pair(s.anchor(), Dimension.LENGTH);
        return anchor + "; " + Units.format(s.stiffnessNPerM(), Dimension.STIFFNESS, PropertySheet.EDIT_DIGITS) + "; "
                + Units.format(s.restLengthM(), Dimension.LENGTH, PropertySheet.EDIT_DIGITS);
    }

    /** "x, y; k; L" (fixed anchor) or "body; k; L" (spring to another body's pivot). */
    static Motion.Free.Spring parseSpring(String text) {
        String[] parts = text.split(";", -1);
        if (parts.length != 3) {
            throw new IllegalArgumentException("a spring is '" + SPRING_FORMAT + "', e.g. '0, 50 mm; "
                    + Dimension.STIFFNESS.example() + "; 20 mm', got '" + text.strip() + "'");
        }
        double k = Units.parse(parts[1], Dimension.STIFFNESS);
        double rest = Units.parse(parts[2], Dimension.LENGTH);
        String anchor = parts[0].strip();
        if (anchor.contains(",")) {
            String[] xy = anchor.split(",", -1);
            if (xy.length != 2) {
                throw new IllegalArgumentException("a spring anchor is 'x, y', got '" + anchor + "'");
            }
            return new Motion.Free.Spring(new Vec2(Units.parse(xy[0], Dimension.LENGTH),
                    Units.parse(xy[1], Dimension.LENGTH)), null, k, rest);
        }
        if (anchor.isEmpty()) {
            throw new IllegalArgumentException("a spring needs an anchor point 'x, y' or the id of another body");
        }
        return new Motion.Free.Spring(null, anchor, k, rest);
    }

    private static Property scalar(String label, Dimension d, double si, Motion.Free f,
                                   BiConsumer<Draft, Double> change, Function<Motion.Free, UnaryOperator<Scene>> set) {
        return PropertySheet.quantity(label, d, si, v -> edited(f, draft -> change.accept(draft, v), set));
    }

    private static UnaryOperator<Scene> edited(Motion.Free f, java.util.function.Consumer<Draft> change,
                                               Function<Motion.Free, UnaryOperator<Scene>> set) {
        Draft d = new Draft(f);
        change.accept(d);
        return set.apply(d.build());
    }

    /** A free motion being changed one field at a time; {@link #build} validates it. */
    private static final class Draft {
        double mass;
        double inertia;
        Vec2 velocity;
        double omega;
        double damping;
        Vec2 force;
        Vec2 amplitude;
        double frequency;
        final List<Motion.Free.Spring> springs;

        Draft(Motion.Free f) {
            mass = f.massKg();
            inertia = f.inertiaKgM2();
            velocity = f.initialVelocity();
            omega = f.initialOmegaRadPerS();
            damping = f.dampingNsPerM();
            force = f.appliedForce();
            amplitude = f.appliedAmplitude();
            frequency = f.appliedFrequencyHz();
            springs = new ArrayList<>(f.springs());
        }

        Motion.Free build() {
            return new Motion.Free(mass, inertia, velocity, omega, damping, force, amplitude, frequency, springs);
        }
    }
}

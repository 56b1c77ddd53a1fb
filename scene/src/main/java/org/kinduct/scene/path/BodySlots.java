package org.kinduct.scene.path;

import static org.kinduct.scene.units.Dimension.ACCELERATION;
import static org.kinduct.scene.units.Dimension.ANGLE;
import static org.kinduct.scene.units.Dimension.ANGULAR_SPEED;
import static org.kinduct.scene.units.Dimension.DAMPING;
import static org.kinduct.scene.units.Dimension.FORCE;
import static org.kinduct.scene.units.Dimension.FREQUENCY;
import static org.kinduct.scene.units.Dimension.INERTIA;
import static org.kinduct.scene.units.Dimension.LENGTH;
import static org.kinduct.scene.units.Dimension.MASS;
import static org.kinduct.scene.units.Dimension.STIFFNESS;
import static org.kinduct.scene.units.Dimension.TIME;
import static org.kinduct.scene.units.Dimension.VELOCITY;

import org.kinduct.scene.Body;
import org.kinduct.scene.Motion;

/** The values of a body and of each kind of motion, named as in the scene file. */
final class BodySlots implements Motion.Cases<Slots> {

    static Slots of(Body body) {
        return new Slots().point("pivot", LENGTH, "pivot").nest("motion", "motion", body.motion().match(new BodySlots()));
    }

    @Override
    public Slots still(Motion.Still still) {
        return new Slots();
    }

    @Override
    public Slots glide(Motion.Glide glide) {
        return new Slots().point("velocity", VELOCITY, "velocity");
    }

    @Override
    public Slots accelerate(Motion.Accelerate accelerate) {
        return new Slots().point("initialVelocity", VELOCITY, "initialVelocity")
                .point("acceleration", ACCELERATION, "acceleration");
    }

    @Override
    public Slots oscillate(Motion.Oscillate oscillate) {
        return new Slots().number("amplitude", LENGTH, "amplitudeM").number("frequency", FREQUENCY, "frequencyHz")
                .number("direction", ANGLE, "directionRad").number("phase", ANGLE, "phaseRad");
    }

    @Override
    public Slots spin(Motion.Spin spin) {
        return new Slots().number("omega", ANGULAR_SPEED, "omegaRadPerS").number("startAngle", ANGLE, "startAngleRad");
    }

    @Override
    public Slots path(Motion.Path path) {
        return new Slots().list("keys", "keys", path.keys(), k -> new Slots().number("t", TIME, "tS")
                .point("offset", LENGTH, "offset").number("angle", ANGLE, "angleRad"));
    }

    @Override
    public Slots free(Motion.Free free) {
        return new Slots().number("mass", MASS, "massKg").number("inertia", INERTIA, "inertiaKgM2")
                .point("initialVelocity", VELOCITY, "initialVelocity")
                .number("initialOmega", ANGULAR_SPEED, "initialOmegaRadPerS")
                .number("damping", DAMPING, "dampingNsPerM").point("force", FORCE, "appliedForce")
                .point("forceAmplitude", FORCE, "appliedAmplitude").number("forceFrequency", FREQUENCY, "appliedFrequencyHz")
                .list("springs", "springs", free.springs(), s -> {
                    Slots spring = s.anchor() == null ? new Slots() : new Slots().point("anchor", LENGTH, "anchor");
                    return spring.number("stiffness", STIFFNESS, "stiffnessNPerM").number("restLength", LENGTH, "restLengthM");
                });
    }
}

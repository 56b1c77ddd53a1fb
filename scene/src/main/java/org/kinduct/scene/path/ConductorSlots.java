package org.kinduct.scene.path;

import static org.kinduct.scene.units.Dimension.ANGLE;
import static org.kinduct.scene.units.Dimension.CONDUCTIVITY;
import static org.kinduct.scene.units.Dimension.FREQUENCY;
import static org.kinduct.scene.units.Dimension.LENGTH;
import static org.kinduct.scene.units.Dimension.RESISTANCE;
import static org.kinduct.scene.units.Dimension.TEMPERATURE;
import static org.kinduct.scene.units.Dimension.TIME;
import static org.kinduct.scene.units.Dimension.VELOCITY;

import org.kinduct.scene.Conductivity;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.MeanFlow;
import org.kinduct.scene.WireSpec;

/** The values of each kind of conductor, named as in the scene file. */
final class ConductorSlots implements Conductor.Cases<Slots> {

    static Slots of(Conductor conductor) {
        return conductor.match(new ConductorSlots());
    }

    @Override
    public Slots wire(Conductor.Wire wire) {
        return vertices(wire);
    }

    @Override
    public Slots loop(Conductor.Loop loop) {
        // A new diameter replaces a gauge: the wire is then given by its diameter alone.
        Slots wire = new Slots().custom("diameter", LENGTH, w -> ((WireSpec) w).diameterM(),
                (w, d) -> d == ((WireSpec) w).diameterM() ? w : WireSpec.of(((WireSpec) w).material(), d));
        return vertices(loop).whole("turns", "turns").nest("wire", "wire", wire)
                .number("load", RESISTANCE, "loadOhm").number("temperature", TEMPERATURE, "temperatureC");
    }

    /**
     * A plate's outline, thickness and conductivity (or the temperature of its material). Holes
     * and electrodes are left out: moving one alone would leave it off the edge it must lie on.
     */
    @Override
    public Slots plate(Conductor.Plate plate) {
        Slots conductivity = plate.conductivity().match(new Conductivity.Cases<>() {
            @Override
            public Slots material(Conductivity.OfMaterial m) {
                return new Slots().number("temperature", TEMPERATURE, "temperatureC");
            }

            @Override
            public Slots given(Conductivity.Given given) {
                return new Slots().number("conductivity", CONDUCTIVITY, "sigmaSPerM");
            }
        });
        return new Slots().points("outline", LENGTH, "outline", plate.outline())
                .number("thickness", LENGTH, "thicknessM").nest("", "conductivity", conductivity);
    }

    /** A channel's centreline, section, conductivity and mean flow; its electrodes are left out, as a plate's. */
    @Override
    public Slots channel(Conductor.Channel channel) {
        Slots flow = channel.flow().match(new MeanFlow.Cases<>() {
            @Override
            public Slots steady(MeanFlow.Steady steady) {
                return new Slots().number("velocity", VELOCITY, "velocityMPerS");
            }

            @Override
            public Slots sinusoid(MeanFlow.Sinusoid s) {
                return new Slots().number("offset", VELOCITY, "offsetMPerS").number("amplitude", VELOCITY, "amplitudeMPerS")
                        .number("frequency", FREQUENCY, "frequencyHz").number("phase", ANGLE, "phaseRad");
            }

            @Override
            public Slots keys(MeanFlow.Keys keys) {
                return new Slots().list("keys", "keys", keys.keys(),
                        k -> new Slots().number("t", TIME, "tS").number("velocity", VELOCITY, "velocityMPerS"));
            }
        });
        return new Slots().point("start", LENGTH, "start").point("end", LENGTH, "end").number("width", LENGTH, "widthM")
                .number("depth", LENGTH, "depthM").number("conductivity", CONDUCTIVITY, "sigmaSPerM")
                .nest("flow", "flow", flow);
    }

    private static Slots vertices(Conductor c) {
        return new Slots().list("vertices", "vertices", c.vertices(), v -> new Slots().point("", LENGTH, "at"));
    }
}

package org.kinduct.scene.path;

import static org.kinduct.scene.units.Dimension.LENGTH;
import static org.kinduct.scene.units.Dimension.RESISTANCE;
import static org.kinduct.scene.units.Dimension.TEMPERATURE;

import org.kinduct.scene.Conductor;
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

    private static Slots vertices(Conductor c) {
        return new Slots().list("vertices", "vertices", c.vertices(), v -> new Slots().point("", LENGTH, "at"));
    }
}

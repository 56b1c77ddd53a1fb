package org.kinduct.scene.path;

import static org.kinduct.scene.units.Dimension.ANGLE;
import static org.kinduct.scene.units.Dimension.CURRENT;
import static org.kinduct.scene.units.Dimension.FLUX_DENSITY;
import static org.kinduct.scene.units.Dimension.FREQUENCY;
import static org.kinduct.scene.units.Dimension.LENGTH;

import org.kinduct.scene.Source;

/** The values of each kind of source, named as in the scene file. */
final class SourceSlots implements Source.Cases<Slots> {

    static Slots of(Source source) {
        return source.match(new SourceSlots());
    }

    @Override
    public Slots patch(Source.FieldPatch patch) {
        return new Slots().points("outline", LENGTH, "outline", patch.outline()).number("bz", FLUX_DENSITY, "bzT");
    }

    @Override
    public Slots uniform(Source.UniformField uniform) {
        // With geomagnetic elements B_z is theirs: the elements are the values to vary.
        return uniform.earth().isPresent()
                ? new Slots().present("earth", "earth", new Slots().number("intensity", FLUX_DENSITY, "intensityT")
                        .number("inclination", ANGLE, "inclinationRad").number("declination", ANGLE, "declinationRad")
                        .number("tilt", ANGLE, "tiltRad").number("heading", ANGLE, "headingRad"))
                : new Slots().number("bz", FLUX_DENSITY, "bzT");
    }

    @Override
    public Slots block(Source.BlockMagnet block) {
        return new Slots().point("center", LENGTH, "center")
                .number("size.x", LENGTH, "sizeXM").number("size.y", LENGTH, "sizeYM").number("size.z", LENGTH, "heightM")
                .number("angle", ANGLE, "angleRad").number("standoff", LENGTH, "standoffM")
                .number("remanence", FLUX_DENSITY, "remanenceT");
    }

    @Override
    public Slots cylinder(Source.CylinderMagnet cylinder) {
        return new Slots().point("center", LENGTH, "center").number("radius", LENGTH, "radiusM")
                .number("height", LENGTH, "heightM").number("standoff", LENGTH, "standoffM")
                .number("remanence", FLUX_DENSITY, "remanenceT");
    }

    @Override
    public Slots coil(Source.SourceCoil coil) {
        Slots shape = coil.shape().match(new Source.CoilShape.Cases<>() {
            @Override
            public Slots polygon(Source.CoilShape.Polygon polygon) {
                return new Slots().nest("polygon", "shape",
                        new Slots().points("", LENGTH, "vertices", polygon.vertices()));
            }

            @Override
            public Slots circle(Source.CoilShape.Circle circle) {
                return new Slots().nest("circle", "shape",
                        new Slots().point("center", LENGTH, "center").number("radius", LENGTH, "radiusM"));
            }
        });
        return shape.whole("turns", "turns").number("z", LENGTH, "planeZM")
                .nest("current", "drive", new Slots().number("dc", CURRENT, "dcA")
                        .number("amplitude", CURRENT, "amplitudeA").number("frequency", FREQUENCY, "frequencyHz")
                        .number("phase", ANGLE, "phaseRad"));
    }

    /** Only the shift: the samples and their grid come from the file. */
    @Override
    public Slots map(Source.FieldMap map) {
        return new Slots().point("offset", LENGTH, "offsetM");
    }
}

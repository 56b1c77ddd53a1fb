package org.kinduct.scene.io;

import static java.util.Map.entry;

import org.kinduct.scene.Conductor;
import org.kinduct.scene.EarthField;
import org.kinduct.scene.FieldGrid;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Source;

/** The names the file uses for the model's enumerations, shared by reader and writer. */
final class Vocabulary {

    static final Choices<Source.Side> SIDE = Choices.of(
            entry("below", Source.Side.BELOW), entry("above", Source.Side.ABOVE));

    static final Choices<Source.Magnetization> NORTH = Choices.of(
            entry("+z", Source.Magnetization.PLUS_Z), entry("-z", Source.Magnetization.MINUS_Z));

    static final Choices<Material> MATERIAL = Choices.of(
            entry("copper", Material.COPPER), entry("aluminium", Material.ALUMINIUM));

    static final Choices<Motion.Path.Blend> BLEND = Choices.of(
            entry("linear", Motion.Path.Blend.LINEAR), entry("smooth", Motion.Path.Blend.SMOOTH));

    static final Choices<Conductor.Channel.Profile> PROFILE = Choices.of(
            entry("plug", Conductor.Channel.Profile.PLUG), entry("laminar", Conductor.Channel.Profile.LAMINAR),
            entry("turbulent", Conductor.Channel.Profile.TURBULENT));
    static final Choices<FieldGrid.Layout> MAP_LAYOUT = Choices.of(
            entry("points", FieldGrid.Layout.POINTS), entry("matrix", FieldGrid.Layout.MATRIX));

    static final Choices<Source.FieldMap.Outside> OUTSIDE = Choices.of(
            entry("zero", Source.FieldMap.Outside.ZERO), entry("error", Source.FieldMap.Outside.ERROR));

    static final Choices<EarthField.Face> FACE = Choices.of(
            entry("up", EarthField.Face.UP), entry("down", EarthField.Face.DOWN));

    private Vocabulary() {
    }
}

package org.kinduct.ui.edit;

import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;
import org.kinduct.scene.EarthField;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.units.Dimension;
import org.kinduct.scene.units.Units;

/**
 * What the Earth's-field dialog edits, without JavaFX: the texts of the geomagnetic elements and
 * the board's orientation, their B_z, and the edit that adds the field to a scene or updates the
 * one it came from.
 */
public final class EarthFieldForm {

    /** Where users get the elements, shown in the dialog. */
    public static final String WHERE_TO_GET = "Take F, I and D for your place from your national geomagnetic survey"
            + " or a published geomagnetic reference model's calculator (they drift by a fraction of a percent a year).";
    public static final List<String> FACES = List.of("up", "down");
    /** A mid-latitude field, so the dialog opens on something plausible. */
    private static final EarthField START = new EarthField(48e-6, Units.parse("66 deg", Dimension.ANGLE), 0, 0, 0,
            EarthField.Face.UP);

    /** Labels of the entries, in the order of {@link #texts}. */
    public static final List<String> LABELS = List.of("Total intensity F", "Inclination I (+ below horizontal)",
            "Declination D (east of true north)", "Board tilt from horizontal (lifts its +y edge)",
            "Heading of the board's +x axis from true north");
    private static final List<Dimension> DIMENSIONS = List.of(Dimension.FLUX_DENSITY, Dimension.ANGLE,
            Dimension.ANGLE, Dimension.ANGLE, Dimension.ANGLE);

    private final String id;
    private final boolean update;
    private final List<String> texts;
    private final String face;

    private EarthFieldForm(String id, boolean update, List<String> texts, String face) {
        this.id = id;
        this.update = update;
        this.texts = List.copyOf(texts);
        this.face = face;
    }

    /** The form for {@code scene}: its first Earth's field to update, or a new one to add. */
    public static EarthFieldForm of(Scene scene) {
        Optional<Source.UniformField> existing = scene.sources().stream()
                .filter(s -> s instanceof Source.UniformField u && u.earth().isPresent())
                .map(Source.UniformField.class::cast).findFirst();
        EarthField e = existing.flatMap(Source.UniformField::earth).orElse(START);
        String id = existing.map(Source::id).orElseGet(() -> SceneEdits.uniqueId(scene, "earth"));
        return new EarthFieldForm(id, existing.isPresent(), List.of(
                text(e.intensityT(), Dimension.FLUX_DENSITY, "uT"), text(e.inclinationRad(), Dimension.ANGLE, "deg"),
                text(e.declinationRad(), Dimension.ANGLE, "deg"), text(e.tiltRad(), Dimension.ANGLE, "deg"),
                text(e.headingRad(), Dimension.ANGLE, "deg")),
                FACES.get(e.face().ordinal()));
    }

    /** Exactly the value held where a short decimal in {@code unit} reads back to it, so OK alone changes nothing. */
    private static String text(double si, Dimension d, String unit) {
        return Units.exactly(si, d, unit).orElseGet(() -> Units.format(si, d, PropertySheet.EDIT_DIGITS));
    }

    /** The same form with other texts (in the order of {@link #LABELS}) and face. */
    public EarthFieldForm with(List<String> newTexts, String newFace) {
        return new EarthFieldForm(id, update, newTexts, newFace);
    }

    public List<String> texts() {
        return texts;
    }

    public String face() {
        return face;
    }

    /** True when the form updates a field already in the scene rather than adding one. */
    public boolean updates() {
        return update;
    }

    /** The elements as entered. @throws IllegalArgumentException naming what does not read */
    public EarthField field() {
        double[] si = new double[LABELS.size()];
        for (int i = 0; i < si.length; i++) {
            try {
                si[i] = Units.parse(texts.get(i), DIMENSIONS.get(i));
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException(LABELS.get(i) + ": " + e.getMessage(), e);
            }
        }
        int f = FACES.indexOf(face);
        if (f < 0) {
            throw new IllegalArgumentException("face: choose one of " + FACES);
        }
        return new EarthField(si[0], si[1], si[2], si[3], si[4], EarthField.Face.values()[f]);
    }

    /** True when the entries make a field. */
    public boolean readable() {
        try {
            field();
            return true;
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    /** The live preview: B_z normal to the board, or why the entries do not make a field. */
    public String preview() {
        try {
            EarthField e = field();
            return "B_z normal to the board: " + Units.format(Units.withoutNoise(e.bzT(), e.intensityT()),
                    Dimension.FLUX_DENSITY) + " (+ out of the screen)";
        } catch (IllegalArgumentException e) {
            return e.getMessage();
        }
    }

    /** The edit: adds the field as a uniform source, or replaces the one the form came from. */
    public UnaryOperator<Scene> edit() {
        Source.UniformField next = Source.UniformField.earth(id, field());
        return scene -> update ? SceneEdits.replaceSource(scene, next) : SceneEdits.addSource(scene, next);
    }
}

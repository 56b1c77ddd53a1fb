package org.kinduct.scene.io;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.kinduct.scene.Scene;

/**
 * The scene file format (docs/scene-format.md): JSON with a {@code "format": "kinduct-scene"}
 * marker and an integer {@code "version"}; SI numbers, or unit strings such as "12 mm" on input.
 *
 * <p>{@link #read} checks the whole text and reports every problem it finds, each with its JSON
 * path and line/column; {@link #write} is lossless: {@code read(write(s), ...)} equals {@code s}.
 * {@link #readWithUnits} also keeps the texts values were given in, which
 * {@link #write(SceneWithUnits)} writes back.
 */
public final class SceneJson {

    private SceneJson() {
    }

    /**
     * The scene in {@code text}.
     *
     * @param sourceName what to call the text in messages, usually the file name
     * @throws SceneFormatException for any text that is not a valid scene (syntax errors, wrong
     *         types, missing or unknown fields, unit errors, broken rules, unknown ids), listing
     *         all problems in document order; nothing else is thrown, whatever the text
     */
    public static Scene read(String text, String sourceName) throws SceneFormatException {
        return read(text, sourceName, SceneFolder.NONE);
    }

    /**
     * The scene in {@code text}, whose field maps are found in {@code folder}; a field-map file
     * that cannot be read is a problem at its {@code file} field, naming the file, line and column.
     *
     * @see #read(String, String)
     */
    public static Scene read(String text, String sourceName, SceneFolder folder) throws SceneFormatException {
        return readWithUnits(text, sourceName, folder).scene();
    }

    /** {@link #readWithUnits(String, String, SceneFolder)} of a scene whose field maps, if any, have no folder. */
    public static SceneWithUnits readWithUnits(String text, String sourceName) throws SceneFormatException {
        return readWithUnits(text, sourceName, SceneFolder.NONE);
    }

    /**
     * The scene in {@code text} with the texts its values were given in, as {@link #read} reads it.
     *
     * @throws SceneFormatException as {@link #read} does
     */
    public static SceneWithUnits readWithUnits(String text, String sourceName, SceneFolder folder)
            throws SceneFormatException {
        List<Problem> problems = new ArrayList<>();
        Scene scene = null;
        UnitTexts units = UnitTexts.none();
        if (text == null) {
            problems.add(new Problem("", 1, 1, "no text to read"));
        } else {
            // A byte-order mark is not JSON, but editors add one; it carries no meaning here.
            Json root = JsonTreeReader.parse(text.startsWith("\uFEFF") ? text.substring(1) : text, problems);
            if (root != null) {
                ReadContext ctx = new ReadContext(folder);
                scene = new SceneReader(ctx).scene(root);
                problems.addAll(ctx.problems());
                units = ctx.unitTexts();
            }
        }
        if (scene == null && problems.isEmpty()) {
            problems.add(new Problem("", 1, 1, "internal error: the scene was rejected without a reason"));
        }
        if (scene == null || !problems.isEmpty()) {
            problems.sort(Comparator.comparingInt(Problem::line).thenComparingInt(Problem::column));
            throw new SceneFormatException(sourceName == null ? "<scene>" : sourceName, problems);
        }
        return new SceneWithUnits(scene, units);
    }

    /** {@code scene} as pretty-printed JSON ending in a newline, every field explicit, numbers in SI. */
    public static String write(Scene scene) {
        return SceneWriter.write(scene, UnitTexts.none());
    }

    /**
     * {@code scene} as {@link #write(Scene)} writes it, but each value that was given as a text
     * with a unit is written in that unit: as given while unchanged, else exactly in that unit
     * (see {@link UnitTexts#textFor}). Reads back as {@code scene} exactly.
     */
    public static String write(SceneWithUnits scene) {
        return SceneWriter.write(scene.scene(), scene.units());
    }
}

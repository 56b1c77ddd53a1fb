package org.kinduct.ui.edit;

import java.util.List;
import java.util.function.Function;
import java.util.function.UnaryOperator;
import org.kinduct.scene.Scene;

/**
 * One editable line of the properties panel: its current text and how typed text becomes an
 * edit. {@code edit} throws {@link IllegalArgumentException} with the reason when the text is not
 * acceptable; nothing is clamped.
 *
 * @param options the allowed values for a choice, empty for free text
 */
public record Property(String label, String text, List<String> options, Function<String, UnaryOperator<Scene>> edit) {

    public Property {
        options = List.copyOf(options);
    }

    public boolean isChoice() {
        return !options.isEmpty();
    }

    /**
     * The edit for {@code typed}, checked against {@code scene}: the returned edit applies cleanly.
     *
     * @throws IllegalArgumentException saying why the input or its result is not acceptable
     */
    @SuppressWarnings("ReturnValueIgnored") // applied only to see whether it throws
    public UnaryOperator<Scene> check(Scene scene, String typed) {
        UnaryOperator<Scene> op = edit.apply(typed);
        op.apply(scene);
        return op;
    }
}

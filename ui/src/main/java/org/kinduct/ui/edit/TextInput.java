package org.kinduct.ui.edit;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Lengths typed by the user ("12 mm", "0.3", "1.5cm"); a bare number is metres. */
public final class TextInput {

    private static final Pattern LENGTH = Pattern.compile(
            "\\s*([-+−]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(m|cm|mm|µm|um|km)?\\s*");

    private TextInput() {
    }

    /** Metres, or {@link IllegalArgumentException} saying what was expected. */
    public static double length(String text) {
        Matcher m = LENGTH.matcher(text.toLowerCase(Locale.ROOT));
        if (!m.matches()) {
            throw new IllegalArgumentException("'" + text.strip() + "' is not a length (e.g. 12 mm, 0.3 m)");
        }
        double v = Double.parseDouble(m.group(1).replace('−', '-'));
        String unit = m.group(2) == null ? "m" : m.group(2);
        return v * switch (unit) {
            case "km" -> 1e3;
            case "cm" -> 1e-2;
            case "mm" -> 1e-3;
            case "µm", "um" -> 1e-6;
            default -> 1;
        };
    }
}

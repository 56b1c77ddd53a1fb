package org.kinduct.scene.units;

/** Showing user input inside messages. */
public final class Texts {

    /** Quoted input is cut here, so one bad value cannot flood a message. */
    private static final int QUOTED_CHARACTERS = 40;

    private Texts() {
    }

    /** {@code text} in single quotes, cut to 40 characters, control characters as {@code \}{@code uXXXX}. */
    public static String quote(String text) {
        return "'" + printable(text, QUOTED_CHARACTERS) + "'";
    }

    /** {@code text} cut to {@code maxCharacters} (then "…"), control characters as {@code \}{@code uXXXX}. */
    public static String printable(String text, int maxCharacters) {
        String shown = text.length() > maxCharacters ? text.substring(0, maxCharacters) + "…" : text;
        StringBuilder sb = new StringBuilder();
        shown.codePoints().forEach(c -> {
            if (Character.isISOControl(c)) {
                sb.append(String.format("\\u%04x", c));
            } else {
                sb.appendCodePoint(c);
            }
        });
        return sb.toString();
    }
}

package org.kinduct.ui.edit;

/** The editor's tools: selection, and one drawing tool per kind of source and conductor. */
public enum ToolKind {
    SELECT("Select", Gesture.NONE, "Pick, drag to move; Shift adds to the selection"),
    WIRE("Wire", Gesture.POLYLINE, "Click vertices; Enter or double-click finishes"),
    LOOP("Loop", Gesture.POLYGON, "Click vertices; Enter or double-click closes the loop"),
    RECT_LOOP("Rectangular loop", Gesture.RECTANGLE, "Click two opposite corners"),
    ROUND_LOOP("Round loop", Gesture.CIRCLE, "Click the centre, then a point on the rim"),
    PATCH("Field patch", Gesture.POLYGON, "Click the outline; Enter closes it"),
    RECT_PATCH("Rectangular patch", Gesture.RECTANGLE, "Click two opposite corners"),
    BLOCK_MAGNET("Block magnet", Gesture.RECTANGLE, "Click two opposite corners"),
    DISC_MAGNET("Disc magnet", Gesture.CIRCLE, "Click the centre, then a point on the rim"),
    COIL("Polygon coil", Gesture.POLYGON, "Click the outline; Enter closes it"),
    ROUND_COIL("Round coil", Gesture.CIRCLE, "Click the centre, then a point on the rim");

    /** How a tool is drawn with the mouse. */
    public enum Gesture { NONE, POLYLINE, POLYGON, RECTANGLE, CIRCLE }

    private final String label;
    private final Gesture gesture;
    private final String help;

    ToolKind(String label, Gesture gesture, String help) {
        this.label = label;
        this.gesture = gesture;
        this.help = help;
    }

    public String label() {
        return label;
    }

    public Gesture gesture() {
        return gesture;
    }

    public String help() {
        return help;
    }

    /** Points that finish the gesture by themselves (rectangle, circle), or 0 when the user finishes it. */
    public int fixedPoints() {
        return gesture == Gesture.RECTANGLE || gesture == Gesture.CIRCLE ? 2 : 0;
    }

    /** Fewest points the finished shape needs. */
    public int minPoints() {
        return switch (gesture) {
            case POLYLINE, RECTANGLE, CIRCLE -> 2;
            case POLYGON -> 3;
            case NONE -> 0;
        };
    }
}

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
    ROUND_COIL("Round coil", Gesture.CIRCLE, "Click the centre, then a point on the rim"),
    PLATE("Plate", Gesture.POLYGON, "Click the outline; click the first point or press Enter to close it"),
    HOLE("Hole", Gesture.POLYGON, "Select a plate, then click a hole's outline strictly inside it; Enter closes it"),
    CHANNEL("Channel", Gesture.SEGMENT, "Click the centreline's start, then its end (the flow runs that way)"),
    ELECTRODE("Electrode", Gesture.POINT, "Select a plate or channel, then click near its edge");

    /** How a tool is drawn with the mouse. */
    public enum Gesture { NONE, POINT, SEGMENT, POLYLINE, POLYGON, RECTANGLE, CIRCLE }

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

    /** Points that finish the gesture by themselves (point, segment, rectangle, circle), or 0 when the user finishes it. */
    public int fixedPoints() {
        return switch (gesture) {
            case POINT -> 1;
            case SEGMENT, RECTANGLE, CIRCLE -> 2;
            case POLYLINE, POLYGON, NONE -> 0;
        };
    }

    /** Whether the tool draws on the selected plate or channel rather than adding an object. */
    public boolean onSheet() {
        return this == HOLE || this == ELECTRODE;
    }

    /** Fewest points the finished shape needs. */
    public int minPoints() {
        return switch (gesture) {
            case POINT -> 1;
            case SEGMENT, POLYLINE, RECTANGLE, CIRCLE -> 2;
            case POLYGON -> 3;
            case NONE -> 0;
        };
    }
}

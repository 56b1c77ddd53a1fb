package org.kinduct.render.paint;

/** What the painter draws; each can be switched off on its own. */
public enum Layer {
    HEAT_MAP("Field colours"),
    CONTOURS("Contour lines"),
    SYMBOLS("⊙/⊗ symbols"),
    GRID("Grid"),
    SOURCES("Sources"),
    CONDUCTORS("Conductors"),
    /** Streamlines of the eddy currents in plates and channels (contours of the stream function). */
    EDDY_CURRENTS("Eddy-current streamlines"),
    /** |J| colours over plates and channels; hides the field map under them. */
    CURRENT_DENSITY("Current density |J|"),
    LENZ("Polarity and current arrows"),
    MOTION("Velocity arrows"),
    CALLOUTS("Value labels"),
    LEGEND("Colour legend"),
    SCALE_BAR("Scale bar"),
    /** The time in the map's corner; a page with a title block states it there instead. */
    TIME("Time"),
    /** The 0.5 mT line around magnets (drawn only where a scene has magnets). */
    CAUTION("0.5 mT caution line");

    private final String label;

    Layer(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}

package org.kinduct.ui.app;

/** Texts of the Help menu. */
final class HelpTexts {

    static final String CAUTION = """
            Kinduct computes idealised numbers; it does not make a set-up safe.

            Strong magnets
            • Sintered NdFeB magnets snap together or onto steel with great force: they pinch \
            skin, crush fingers and can shatter into sharp fragments.
            • Steel tools and parts near them become projectiles.
            • Their fields can disturb pacemakers, defibrillators, insulin pumps and other \
            implanted medical devices. Keep such magnets away from people who carry them; the \
            0.5 mT contour is a common caution line (ICNIRP 2009 static-field guidance), and \
            lower levels may apply.

            Induced voltages
            • A fast-moving conductor, many turns or a strong changing field can induce \
            voltages above extra-low-voltage levels (IEC 61140: 50 V AC rms, 120 V ripple-free \
            DC; lower limits apply in wet locations). Treat such circuits as hazardous: insulate, \
            enclose and protect them as the applicable rules require.

            Flow sensing and medical uses
            • Measuring flow in or on the human body, or any medical use, needs the applicable \
            medical-device standards and approvals; results from this program are no substitute.

            Local electrical codes and licensed professional practice take precedence over \
            anything this program shows.""";

    static final String CONVENTIONS = """
            Coordinates: metres; x to the right, y up, z out of the screen.
            B_z > 0 points out of the screen (⊙), B_z < 0 into it (⊗).
            Loops: positive counter-clockwise along the vertex order (right-hand rule, normal +z).
            EMF and current are positive along the vertex order.
            Wires: EMF > 0 means the last vertex is the + end.

            Overlays (Lenz's law): the dark disc with + and the light disc with − mark the \
            polarity at a wire's ends or across an open loop's gap, larger for larger |EMF|. \
            Arrows along a closed loop show the current; thicker means more current. The ⊙ or ⊗ \
            inside a loop is the induced current's own field, which opposes the change of flux.

            The table shows both EMF methods: the flux rule −dλ/dt, and motion plus induced \
            field ∮(v × B − ∂A/∂t)·dl, which is the EMF reported (for a loop at rest beside an AC \
            coil it is all induced field). They must agree for closed loops; a row marked CHECK \
            points at a problem in the model or the numerics.""";

    static final String KEYS = """
            Wheel: zoom at the cursor     Middle-drag or Space+drag: pan     F: zoom to fit
            Drawing: click vertices, Enter or double-click to finish, Esc to cancel; \
            type a length (12 mm) or coordinates (10 mm, -5 mm) and press Enter
            Snapping: to existing vertices, to the grid, and to 15° steps from the last point
            Delete: remove selection     Ctrl+D: duplicate     Ctrl+R / Ctrl+Shift+R: rotate ±15°
            Ctrl+Z / Ctrl+Shift+Z: undo / redo     K: play or pause     , and .: step     Home: reset time
            F12: paint time per frame""";

    private HelpTexts() {
    }
}

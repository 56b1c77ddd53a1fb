package org.kinduct.render.paint;

/** The painter's colours, 0xAARRGGBB, chosen to stay readable over both halves of {@link DivergingScale}. */
final class Palette {

    static final int BACKGROUND = 0xFFFAFAF7;
    static final int GRID_MINOR = 0x1F000000;
    static final int GRID_MAJOR = 0x3D000000;
    static final int AXIS = 0x80000000;
    static final int INK = 0xFF1E1E1E;
    static final int HALO = 0xCCFFFFFF;
    static final int MUTED = 0xFF555555;
    static final int MAGNET_FILL = 0x99D8D8D8;
    static final int MAGNET_EDGE = 0xFF3A3A3A;
    static final int COIL = 0xFF4E4E8A;
    static final int CURRENT = 0xFF4B1D8F;
    static final int SELECTION = 0xFFD6007A;
    static final int PREVIEW = 0xFF006D5B;
    static final int LABEL_BOX = 0xEBFFFFFF;
    /** Behind axis and contour values: readable over the strongest field colours, the grid faintly through. */
    static final int VALUE_BACKING = 0xD9FFFFFF;
    static final int LABEL_EDGE = 0xFF8C8C8C;
    static final int WARNING = 0xFFB00020;

    private Palette() {
    }

    static int withAlpha(int argb, double alpha) {
        return ((int) Math.round(Math.max(0, Math.min(1, alpha)) * 255) << 24) | (argb & 0xFFFFFF);
    }
}

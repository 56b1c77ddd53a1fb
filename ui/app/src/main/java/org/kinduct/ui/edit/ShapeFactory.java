package org.kinduct.ui.edit;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductivity;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.FieldGrid;
import org.kinduct.scene.Material;
import org.kinduct.scene.MeanFlow;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;

/**
 * Builds the new object a drawing tool describes, with editable defaults: copper AWG 24 wire,
 * field patches of 0.1 T out of the screen, NdFeB-like magnets (1.2 T, 10 mm high, 2 mm below
 * the plane), coils of 10 turns at 1 A, 2 mm below the plane.
 */
public final class ShapeFactory {

    public static final WireSpec DEFAULT_WIRE = WireSpec.awg(Material.COPPER, 24);
    public static final double PATCH_BZ_T = 0.1;
    public static final double MAGNET_REMANENCE_T = 1.2;
    public static final double MAGNET_HEIGHT_M = 0.01;
    public static final double MAGNET_STANDOFF_M = 0.002;
    public static final double COIL_PLANE_Z_M = -0.002;
    public static final int COIL_TURNS = 10;
    /**
     * Default background: the Earth's vertical field at northern mid-latitudes, pointing down, so
     * into a screen that looks down on a table: about −45 µT (total 25–65 µT at inclination ≈ 60°,
     * NOAA World Magnetic Model documentation; from memory).
     */
    public static final double BACKGROUND_BZ_T = -45e-6;
    public static final double PLATE_THICKNESS_M = 0.002;
    public static final Conductivity PLATE_CONDUCTIVITY = new Conductivity.OfMaterial(Material.ALUMINIUM, 20);
    public static final double CHANNEL_WIDTH_M = 0.02;
    public static final double CHANNEL_DEPTH_M = 0.01;
    /** Tap water, 500 µS/cm (drinking water lies between about 50 and 1500 µS/cm; common practice). */
    public static final double CHANNEL_SIGMA_S_PER_M = 0.05;
    public static final double CHANNEL_SPEED_M_PER_S = 1;
    private static final int ROUND_LOOP_SEGMENTS = 36;

    private ShapeFactory() {
    }

    /** Adds the object that {@code kind} draws through {@code pts} to {@code scene}. */
    public static Scene add(Scene scene, ToolKind kind, List<Vec2> pts) {
        if (pts.size() < kind.minPoints()) {
            throw new IllegalArgumentException(kind.label() + " needs at least " + kind.minPoints() + " points");
        }
        String id = SceneEdits.uniqueId(scene, baseId(kind));
        return switch (kind) {
            case WIRE -> SceneEdits.addConductor(scene, new Conductor.Wire(id, Body.FIXED, vertices(pts)));
            case LOOP -> SceneEdits.addConductor(scene, loop(id, Polygons.requirePolygon(pts, "loop")));
            case RECT_LOOP -> SceneEdits.addConductor(scene, loop(id, rectangle(pts.get(0), pts.get(1))));
            case ROUND_LOOP -> SceneEdits.addConductor(scene, loop(id, circle(pts.get(0), radius(pts))));
            case PATCH -> SceneEdits.addSource(scene, new Source.FieldPatch(id, Body.FIXED, pts, PATCH_BZ_T));
            case RECT_PATCH -> SceneEdits.addSource(scene,
                    new Source.FieldPatch(id, Body.FIXED, rectangle(pts.get(0), pts.get(1)), PATCH_BZ_T));
            case BLOCK_MAGNET -> SceneEdits.addSource(scene, block(id, pts.get(0), pts.get(1)));
            case DISC_MAGNET -> SceneEdits.addSource(scene, new Source.CylinderMagnet(id, Body.FIXED, pts.get(0),
                    radius(pts), MAGNET_HEIGHT_M, MAGNET_STANDOFF_M, Source.Side.BELOW, MAGNET_REMANENCE_T,
                    Source.Magnetization.PLUS_Z));
            case COIL -> SceneEdits.addSource(scene, coil(id, new Source.CoilShape.Polygon(pts)));
            case ROUND_COIL -> SceneEdits.addSource(scene,
                    coil(id, new Source.CoilShape.Circle(pts.get(0), radius(pts))));
            case PLATE -> SceneEdits.addConductor(scene, new Conductor.Plate(id, Body.FIXED,
                    Polygons.requireSimple(pts, "plate outline"), List.of(), PLATE_THICKNESS_M, PLATE_CONDUCTIVITY,
                    List.of(), List.of(), OptionalDouble.empty()));
            case CHANNEL -> SceneEdits.addConductor(scene, channel(id, pts.get(0), pts.get(1)));
            case HOLE, ELECTRODE -> throw new IllegalArgumentException(kind.label()
                    + " is drawn on the selected plate or channel, not as an object of its own");
            case SELECT -> throw new IllegalArgumentException("the selection tool draws nothing");
        };
    }

    /** Adds a uniform background field (it has no outline to draw); edit its value in the properties. */
    public static Scene addBackground(Scene scene) {
        return SceneEdits.addSource(scene, new Source.UniformField(SceneEdits.uniqueId(scene, "background"),
                BACKGROUND_BZ_T));
    }

    /** Adds the samples read from {@code file} as a field map on the fixed frame, in the file's own coordinates. */
    public static Scene addFieldMap(Scene scene, String file, FieldGrid grid) {
        return SceneEdits.addSource(scene, new Source.FieldMap(SceneEdits.uniqueId(scene, "map"), Body.FIXED, file,
                grid, Vec2.ZERO, Source.FieldMap.Outside.ZERO));
    }

    /** The outline a tool shows while drawing: as clicked, or the rectangle or circle it implies. */
    public static List<Vec2> preview(ToolKind kind, List<Vec2> pts) {
        if (pts.size() == 2 && kind.gesture() == ToolKind.Gesture.RECTANGLE
                && pts.get(0).x() != pts.get(1).x() && pts.get(0).y() != pts.get(1).y()) {
            return rectangle(pts.get(0), pts.get(1));
        }
        if (pts.size() == 2 && kind.gesture() == ToolKind.Gesture.CIRCLE && radius(pts) > 0) {
            return circle(pts.get(0), radius(pts));
        }
        if (pts.size() == 2 && kind == ToolKind.CHANNEL && radius(pts) > 0) {
            return channel("preview", pts.get(0), pts.get(1)).outline();
        }
        return pts;
    }

    static String baseId(ToolKind kind) {
        return switch (kind) {
            case WIRE -> "wire";
            case LOOP, RECT_LOOP, ROUND_LOOP -> "loop";
            case PATCH, RECT_PATCH -> "patch";
            case BLOCK_MAGNET, DISC_MAGNET -> "magnet";
            case COIL, ROUND_COIL -> "coil";
            case PLATE -> "plate";
            case CHANNEL -> "channel";
            case HOLE, ELECTRODE, SELECT -> "object";
        };
    }

    private static Conductor.Loop loop(String id, List<Vec2> pts) {
        return Conductor.Loop.simple(id, Body.FIXED, vertices(pts), DEFAULT_WIRE);
    }

    private static Source.BlockMagnet block(String id, Vec2 a, Vec2 b) {
        double w = Math.abs(b.x() - a.x());
        double h = Math.abs(b.y() - a.y());
        return new Source.BlockMagnet(id, Body.FIXED, a.plus(b).times(0.5), w, h, MAGNET_HEIGHT_M, 0,
                MAGNET_STANDOFF_M, Source.Side.BELOW, MAGNET_REMANENCE_T, Source.Magnetization.PLUS_Z);
    }

    private static Conductor.Channel channel(String id, Vec2 start, Vec2 end) {
        return new Conductor.Channel(id, Body.FIXED, start, end, CHANNEL_WIDTH_M, CHANNEL_DEPTH_M,
                CHANNEL_SIGMA_S_PER_M, Conductor.Channel.Profile.PLUG, new MeanFlow.Steady(CHANNEL_SPEED_M_PER_S),
                List.of(), List.of(), OptionalDouble.empty());
    }

    private static Source.SourceCoil coil(String id, Source.CoilShape shape) {
        return new Source.SourceCoil(id, Body.FIXED, shape, COIL_TURNS, COIL_PLANE_Z_M, Source.Drive.dc(1));
    }

    private static List<Conductor.Vertex> vertices(List<Vec2> pts) {
        List<Conductor.Vertex> vs = new ArrayList<>(pts.size());
        for (Vec2 p : pts) {
            vs.add(new Conductor.Vertex(p, null));
        }
        return vs;
    }

    /** Counter-clockwise rectangle with opposite corners a and b. */
    static List<Vec2> rectangle(Vec2 a, Vec2 b) {
        double x0 = Math.min(a.x(), b.x());
        double x1 = Math.max(a.x(), b.x());
        double y0 = Math.min(a.y(), b.y());
        double y1 = Math.max(a.y(), b.y());
        if (x0 == x1 || y0 == y1) {
            throw new IllegalArgumentException("the two corners must differ in both x and y");
        }
        return List.of(new Vec2(x0, y0), new Vec2(x1, y0), new Vec2(x1, y1), new Vec2(x0, y1));
    }

    /** Counter-clockwise regular polygon approximating a circle. */
    static List<Vec2> circle(Vec2 c, double r) {
        if (!(r > 0)) {
            throw new IllegalArgumentException("radius must be positive, got " + r + " m");
        }
        List<Vec2> pts = new ArrayList<>(ROUND_LOOP_SEGMENTS);
        for (int i = 0; i < ROUND_LOOP_SEGMENTS; i++) {
            pts.add(c.plus(Vec2.polar(r, 2 * Math.PI * i / ROUND_LOOP_SEGMENTS)));
        }
        return pts;
    }

    private static double radius(List<Vec2> pts) {
        return pts.get(1).minus(pts.get(0)).length();
    }
}

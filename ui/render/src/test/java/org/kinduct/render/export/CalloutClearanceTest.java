package org.kinduct.render.export;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Proxy;
import java.time.LocalDate;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Set;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.demo.Demos;
import org.kinduct.render.paint.Surface;
import org.kinduct.render.paint.TextMetrics;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;

/**
 * On every demo's exported page (the default instant, as {@code kinduct export --demo NAME} draws
 * it), no callout box covers a word of the map that is not its own: pole labels, axis values,
 * other callouts, velocity and force labels, the legend; and no pole label covers an axis value.
 */
class CalloutClearanceTest {

    /** The painter's callout edge colour (Palette.LABEL_EDGE). */
    private static final int CALLOUT_EDGE = 0xFF8C8C8C;
    /** Callout lines start 6 units right of the box's left edge (ConductorPainter), the first its conductor's id. */
    private static final double CALLOUT_INDENT = 6;

    static List<String> demos() {
        return Demos.names();
    }

    /** A drawn text or rectangle in page units. */
    private record Rect(String text, double x, double y, double w, double h) {
        boolean intersects(Rect o) {
            return x < o.x + o.w && o.x < x + w && y < o.y + o.h && o.y < y + h;
        }

        boolean contains(Rect o) {
            return o.x >= x && o.y >= y && o.x + o.w <= x + w && o.y + o.h <= y + h;
        }
    }

    @ParameterizedTest
    @MethodSource("demos")
    void noCalloutCoversAnotherWordOfTheMap(String demo) {
        Scene scene = Demos.load(demo);
        SnapshotOptions options = SnapshotOptions.standard(ExportInstant.peak(), 1800, 300, new ViewChoice.Fit(),
                LocalDate.of(2026, 1, 15), "test");
        SnapshotPage page = new Exporter(scene, options).page();
        List<Rect> texts = new ArrayList<>();
        List<Rect> edges = new ArrayList<>();
        page.draw(recorder(page.height(), texts, edges), null);

        double mapBottom = page.mapTop() + page.mapHeight();
        List<Rect> map = texts.stream().filter(t -> t.y() >= page.mapTop() && t.y() + t.h() <= mapBottom).toList();
        Set<String> ids = scene.conductors().stream().map(Conductor::id).collect(Collectors.toSet());
        List<Rect> callouts = edges.stream().filter(e -> map.stream().anyMatch(t -> ids.contains(t.text())
                && Math.abs(t.x() - e.x() - CALLOUT_INDENT) < 1e-9 && e.contains(t))).toList();
        assertTrue(scene.conductors().isEmpty() || !callouts.isEmpty(), demo + ": callouts found");
        for (Rect c : callouts) {
            for (Rect t : map) {
                boolean own = c.contains(t) && Math.abs(t.x() - c.x() - CALLOUT_INDENT) < 1e-9;
                assertFalse(!own && c.intersects(t), demo + ": the callout " + c + " covers " + t);
            }
        }
        // Nor does a magnet's pole label touch an axis value.
        List<Rect> poles = map.stream().filter(t -> POLE.matcher(t.text()).matches()).toList();
        List<Rect> axis = map.stream().filter(t -> AXIS_VALUE.matcher(t.text()).matches()).toList();
        for (Rect p : poles) {
            for (Rect a : axis) {
                assertFalse(p.intersects(a), demo + ": the pole label " + p + " covers the axis value " + a);
            }
        }
    }

    /** A magnet's pole label: its face and its moment's direction (SourcePainter). */
    private static final Pattern POLE = Pattern.compile("[NS]|M [+−]z");
    /** An axis value: a length (Quantities.length). */
    private static final Pattern AXIS_VALUE = Pattern.compile("−?[0-9.]+ (nm|µm|mm|m|km)");

    /**
     * A surface that records each text's box (its advance width by the shipped fonts, its size as
     * height) and each stroked rectangle in the callout edge colour, in page units.
     */
    private static Surface recorder(double height, List<Rect> texts, List<Rect> edges) {
        Deque<double[]> offsets = new ArrayDeque<>();
        double[] at = {0, 0};
        int[] stroke = {0};
        return (Surface) Proxy.newProxyInstance(Surface.class.getClassLoader(), new Class<?>[] {Surface.class},
                (proxy, method, args) -> switch (method.getName()) {
                    case "width" -> SnapshotPage.WIDTH;
                    case "height" -> height;
                    case "save" -> {
                        offsets.push(at.clone());
                        yield null;
                    }
                    case "restore" -> {
                        double[] back = offsets.pop();
                        at[0] = back[0];
                        at[1] = back[1];
                        yield null;
                    }
                    case "translate" -> {
                        at[0] += (double) args[0];
                        at[1] += (double) args[1];
                        yield null;
                    }
                    case "stroke" -> {
                        stroke[0] = (int) args[0];
                        yield null;
                    }
                    case "strokeRect" -> {
                        if (stroke[0] == CALLOUT_EDGE) {
                            edges.add(new Rect("", at[0] + (double) args[0], at[1] + (double) args[1], (double) args[2],
                                    (double) args[3]));
                        }
                        yield null;
                    }
                    case "textWidth" -> TextMetrics.width((String) args[0], (double) args[1], (boolean) args[2]);
                    case "text" -> {
                        String text = (String) args[0];
                        if (!text.isBlank()) {
                            texts.add(textBox(text, at[0] + (double) args[1], at[1] + (double) args[2],
                                    (double) args[3], (boolean) args[4], (Surface.Anchor) args[5]));
                        }
                        yield null;
                    }
                    default -> null;
                });
    }

    /** The box a text takes: its advance width by its size, placed by its anchor. */
    private static Rect textBox(String text, double x, double y, double size, boolean bold, Surface.Anchor anchor) {
        double w = TextMetrics.width(text, size, bold);
        double left = switch (anchor) {
            case LEFT, TOP_LEFT, BOTTOM_LEFT -> x;
            case RIGHT, TOP_RIGHT, BOTTOM_RIGHT -> x - w;
            default -> x - w / 2;
        };
        double top = switch (anchor) {
            case TOP_LEFT, TOP_CENTER, TOP_RIGHT -> y;
            case BOTTOM_LEFT, BOTTOM_CENTER, BOTTOM_RIGHT -> y - size;
            default -> y - size / 2;
        };
        return new Rect(text, left, top, w, size);
    }
}

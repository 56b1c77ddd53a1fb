package org.kinduct.render.paint;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.IntStream;

/**
 * Greedy label placement: each label tries positions on rings around its anchor, nearest first (a
 * callout then anywhere on the surface), and takes the first that overlaps no earlier label,
 * reserved area or reserved line (a conductor) and stays on the surface. When none is free it takes
 * the one covering the least text (labels, the legend, reserved texts), then the least of anything
 * else: a label may hide part of a conductor or a mark, but not words a reader needs. A label is
 * never dropped.
 */
public final class LabelPlacer {

    /** A placed box, screen pixels. */
    public record Box(double x, double y, double w, double h) {
        boolean overlaps(Box o, double pad) {
            return x < o.x + o.w + pad && o.x < x + w + pad && y < o.y + o.h + pad && o.y < y + h + pad;
        }

        double overlapArea(Box o) {
            double ox = Math.min(x + w, o.x + o.w) - Math.max(x, o.x);
            double oy = Math.min(y + h, o.y + o.h) - Math.max(y, o.y);
            return ox > 0 && oy > 0 ? ox * oy : 0;
        }

        /** The point of this box nearest (px, py): where a leader to that point leaves it. */
        public double nearestX(double px) {
            return Math.max(x, Math.min(x + w, px));
        }

        public double nearestY(double py) {
            return Math.max(y, Math.min(y + h, py));
        }

        /** Distance from (px, py) to this box, 0 inside it. */
        public double distanceTo(double px, double py) {
            return Math.hypot(px - nearestX(px), py - nearestY(py));
        }

        public double centerX() {
            return x + w / 2;
        }

        public double centerY() {
            return y + h / 2;
        }
    }

    private static final double PAD = 3;
    private static final double[] RINGS = {16, 36, 62, 96, 140};
    /**
     * The scan over the whole surface for a callout that finds no free spot on the rings: at least
     * 10 px apart, at most 48 × 32 positions (the editor places callouts every frame).
     */
    private static final double SCAN_STEP = 10;
    private static final int SCAN_COLUMNS = 48;
    private static final int SCAN_ROWS = 32;
    /** Most callouts whose every placing order is tried (3! = 6 orders); more are placed in the order given. */
    private static final int ORDERED_UP_TO = 3;
    private static final int DIRECTIONS = 8;

    /** A line labels keep off, screen pixels, as thick as {@code 2 · halfWidth}. */
    private record Line(double x0, double y0, double x1, double y1, double halfWidth) {

        /** Length of this line inside {@code b} widened by the half width and {@code pad}: 0 when clear of it. */
        double lengthIn(Box b, double pad) {
            double grow = halfWidth + pad;
            double minX = b.x() - grow;
            double minY = b.y() - grow;
            double maxX = b.x() + b.w() + grow;
            double maxY = b.y() + b.h() + grow;
            // Liang–Barsky clipping of the segment to the box (common practice in computer graphics).
            double dx = x1 - x0;
            double dy = y1 - y0;
            double[] p = {-dx, dx, -dy, dy};
            double[] q = {x0 - minX, maxX - x0, y0 - minY, maxY - y0};
            double t0 = 0;
            double t1 = 1;
            for (int i = 0; i < 4; i++) {
                if (p[i] == 0) {
                    if (q[i] < 0) {
                        return 0;
                    }
                } else {
                    double t = q[i] / p[i];
                    if (p[i] < 0) {
                        t0 = Math.max(t0, t);
                    } else {
                        t1 = Math.min(t1, t);
                    }
                }
            }
            return t0 <= t1 ? (t1 - t0) * Math.hypot(dx, dy) : 0;
        }
    }

    private final double width;
    private final double height;
    private final List<Box> taken = new ArrayList<>();
    /** The taken boxes that hold words: placed labels and reserved texts. */
    private final List<Box> words = new ArrayList<>();
    /** The labels placed here. */
    private final List<Box> labels = new ArrayList<>();
    private final List<Line> lines = new ArrayList<>();

    public LabelPlacer(double width, double height) {
        this.width = width;
        this.height = height;
    }

    /** A copy holding what this one holds, to try placements on. */
    private LabelPlacer copy() {
        LabelPlacer c = new LabelPlacer(width, height);
        c.taken.addAll(taken);
        c.words.addAll(words);
        c.labels.addAll(labels);
        c.lines.addAll(lines);
        return c;
    }

    /** A callout to place: a {@code w × h} box with a leader to (ax, ay). */
    public record Callout(double ax, double ay, double w, double h) {
    }

    /**
     * Places several callouts ({@link #place}) in the order that keeps their leaders shortest in sum,
     * trying every order of up to three: placed one by one, a first callout may take the only spot
     * near a second's conductor and send that one's box across the picture. Returns their boxes in
     * the order given; ties keep that order.
     */
    public List<Box> placeAll(List<Callout> callouts) {
        List<Integer> best = IntStream.range(0, callouts.size()).boxed().toList();
        if (callouts.size() > 1 && callouts.size() <= ORDERED_UP_TO) {
            double shortest = Double.POSITIVE_INFINITY;
            for (List<Integer> order : orders(best)) {
                LabelPlacer trial = copy();
                double sum = 0;
                for (int k = 0; k < order.size() && sum < shortest; k++) {
                    Callout c = callouts.get(order.get(k));
                    sum += trial.place(c.ax(), c.ay(), c.w(), c.h()).distanceTo(c.ax(), c.ay());
                }
                if (sum < shortest) {
                    shortest = sum;
                    best = order;
                }
            }
        }
        Box[] boxes = new Box[callouts.size()];
        for (int i : best) {
            Callout c = callouts.get(i);
            boxes[i] = place(c.ax(), c.ay(), c.w(), c.h());
        }
        return List.of(boxes);
    }

    /** Every order of {@code items}, the given one first. */
    private static List<List<Integer>> orders(List<Integer> items) {
        if (items.size() <= 1) {
            return List.of(items);
        }
        List<List<Integer>> out = new ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            List<Integer> rest = new ArrayList<>(items);
            Integer first = rest.remove(i);
            for (List<Integer> tail : orders(rest)) {
                List<Integer> order = new ArrayList<>(List.of(first));
                order.addAll(tail);
                out.add(order);
            }
        }
        return out;
    }

    /** Marks a screen area as occupied (a mark or glyph) without placing a label there. */
    public void reserve(Box box) {
        taken.add(box);
    }

    /** Marks a screen area holding words (the legend, an axis value) as occupied: labels cover it last. */
    public void reserveText(Box box) {
        taken.add(box);
        words.add(box);
    }

    /**
     * Keeps labels off the segment from (x0, y0) to (x1, y1), {@code halfWidth} pixels to each side
     * (a conductor as drawn), without taking the boxes around it: a long line leaves room beside it.
     */
    public void reserveLine(double x0, double y0, double x1, double y1, double halfWidth) {
        lines.add(new Line(x0, y0, x1, y1, halfWidth));
    }

    /**
     * Places a {@code w × h} box near (ax, ay), on the side away from it (a callout with a leader), and
     * records it; when the rings hold no free spot, the free spot nearest the anchor anywhere on the
     * surface (a crowded picture may leave only a corner).
     */
    public Box place(double ax, double ay, double w, double h) {
        List<Box> candidates = new ArrayList<>();
        for (double r : RINGS) {
            for (int k = 0; k < DIRECTIONS; k++) {
                double a = -Math.PI / 4 + k * 2 * Math.PI / DIRECTIONS;
                double cx = ax + r * Math.cos(a);
                double cy = ay - r * Math.sin(a);
                // Put the box on the side of the ring facing away from the anchor.
                double x = Math.cos(a) >= -1e-9 ? cx : cx - w;
                double y = Math.abs(Math.sin(a)) < 1e-9 ? cy - h / 2 : (Math.sin(a) > 0 ? cy - h : cy);
                candidates.add(onSurface(x, y, w, h));
            }
        }
        if (candidates.stream().noneMatch(this::isFree)) {
            List<Box> scan = new ArrayList<>();
            double stepX = Math.max(SCAN_STEP, width / SCAN_COLUMNS);
            double stepY = Math.max(SCAN_STEP, height / SCAN_ROWS);
            for (double y = 0; y <= height - h; y += stepY) {
                for (double x = 0; x <= width - w; x += stepX) {
                    scan.add(new Box(x, y, w, h));
                }
            }
            scan.sort(Comparator.comparingDouble(b -> b.distanceTo(ax, ay)));
            candidates.addAll(scan);
        }
        return take(candidates);
    }

    /** Places a {@code w × h} box centred on (ax, ay) if free, else centred as near it as is free, and records it. */
    public Box placeAround(double ax, double ay, double w, double h) {
        List<Box> candidates = new ArrayList<>();
        candidates.add(onSurface(ax - w / 2, ay - h / 2, w, h));
        for (double r : RINGS) {
            for (int k = 0; k < DIRECTIONS; k++) {
                double a = k * 2 * Math.PI / DIRECTIONS;
                candidates.add(onSurface(ax + r * Math.cos(a) - w / 2, ay - r * Math.sin(a) - h / 2, w, h));
            }
        }
        return take(candidates);
    }

    private Box onSurface(double x, double y, double w, double h) {
        return new Box(Math.max(0, Math.min(width - w, x)), Math.max(0, Math.min(height - h, y)), w, h);
    }

    /** The first free candidate, else the one covering the least text, then the least else; recorded as taken. */
    private Box take(List<Box> candidates) {
        Box best = null;
        double bestWords = Double.POSITIVE_INFINITY;
        double bestOverlap = Double.POSITIVE_INFINITY;
        for (Box b : candidates) {
            double overlap = overlap(b);
            if (overlap == 0) {
                best = b;
                break;
            }
            double onWords = covered(words, b);
            if (onWords < bestWords || (onWords == bestWords && overlap < bestOverlap)) {
                bestWords = onWords;
                bestOverlap = overlap;
                best = b;
            }
        }
        taken.add(best);
        words.add(best);
        labels.add(best);
        return best;
    }

    /** Whether a label placed here covers part of {@code b}. */
    public boolean labelOver(Box b) {
        return labels.stream().anyMatch(l -> l.overlaps(b, 0));
    }

    /** Whether a box would be free of every taken box. */
    public boolean isFree(Box b) {
        return overlap(b) == 0;
    }

    private double overlap(Box b) {
        double sum = covered(taken, b);
        for (Line l : lines) {
            double crossed = l.lengthIn(b, PAD);
            if (crossed > 0) {
                sum += crossed * 2 * l.halfWidth() + 1;
            }
        }
        return sum;
    }

    /** How much of {@code boxes} {@code b} covers: area, plus one for each box it comes within the padding of. */
    private static double covered(List<Box> boxes, Box b) {
        double sum = 0;
        for (Box t : boxes) {
            if (t.overlaps(b, PAD)) {
                sum += t.overlapArea(b) + 1;
            }
        }
        return sum;
    }
}

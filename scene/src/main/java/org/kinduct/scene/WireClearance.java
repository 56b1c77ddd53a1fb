package org.kinduct.scene;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.BiPredicate;

/**
 * Whether the round wires along a loop's sides leave room for each other, as the thin-filament
 * model of inductance needs (Grover, <i>Inductance Calculations</i>, 1946; Rosa, Bull. Bur. Stand.
 * 4, 1908): every side at least {@value #MIN_SIDE_RADII} wire radii long (Rosa's straight-wire
 * formula drops terms of order radius/length), neighbouring sides not folding back onto each
 * other, and other sides no closer than the wires' radii together unless they cross steeply
 * (at least asin {@value #MIN_CROSSING_SIN}: a figure-eight, or one wire passing over another,
 * where Neumann's integral stays finite). The file reader refuses such loops with their place in
 * the file; the solver applies the same rule to loops as they move.
 *
 * <p>Side pairs are found by sorting the sides' boxes along x and sweeping (O(n log n) for the
 * outlines loops have), so a loop of 10 000 sides is checked in milliseconds.
 */
public final class WireClearance {

    /** Shortest side accepted, in wire radii. */
    public static final double MIN_SIDE_RADII = 4;
    /** Sides closer than the wire radii are accepted only when they cross at least this steeply. */
    public static final double MIN_CROSSING_SIN = 0.1;

    private WireClearance() {
    }

    /** One side, numbered within its loop, with its box. */
    private record Side(int loop, int index, Vec2 a, Vec2 b) {
        double minX() {
            return Math.min(a.x(), b.x());
        }

        double maxX() {
            return Math.max(a.x(), b.x());
        }

        boolean overlapsInY(Side o, double gap) {
            return Math.min(a.y(), b.y()) - Math.max(o.a.y(), o.b.y()) <= gap
                    && Math.min(o.a.y(), o.b.y()) - Math.max(a.y(), b.y()) <= gap;
        }

        double length() {
            return b.minus(a).length();
        }
    }

    /**
     * Checks one closed loop of round wire of radius {@code wireRadiusM}.
     *
     * @throws IllegalArgumentException naming the sides that break the rule
     */
    public static void requireRoom(List<Vec2> loop, double wireRadiusM) {
        List<Side> sides = sides(0, loop);
        int n = sides.size();
        for (Side s : sides) {
            if (!(s.length() >= MIN_SIDE_RADII * wireRadiusM)) {
                throw new IllegalArgumentException("side " + s.index() + " is " + s.length() + " m long, shorter than "
                        + MIN_SIDE_RADII + " wire radii (" + MIN_SIDE_RADII * wireRadiusM + " m)");
            }
        }
        double clearance = 2 * wireRadiusM;
        for (int i = 0; i < n; i++) {
            Side s = sides.get(i);
            Side next = sides.get((i + 1) % n);
            if (foldedBack(s, next, clearance)) {
                throw tooClose("side " + s.index(), "side " + next.index(), clearance);
            }
        }
        Side[] close = firstNearPair(sides, clearance, (f, g) -> {
            int apart = Math.abs(f.index() - g.index());
            return apart != 1 && apart != n - 1 && tooClose(f, g, clearance);
        });
        if (close != null) {
            throw tooClose("side " + Math.min(close[0].index(), close[1].index()), "side "
                    + Math.max(close[0].index(), close[1].index()), clearance);
        }
    }

    /**
     * Checks two closed loops of round wire against each other.
     *
     * @throws IllegalArgumentException naming the sides that run too close
     */
    public static void requireApart(List<Vec2> first, double firstRadiusM, List<Vec2> second, double secondRadiusM) {
        List<Side> sides = new ArrayList<>(sides(0, first));
        sides.addAll(sides(1, second));
        double clearance = firstRadiusM + secondRadiusM;
        Side[] close = firstNearPair(sides, clearance, (f, g) -> f.loop() != g.loop() && tooClose(f, g, clearance));
        if (close != null) {
            boolean firstIsA = close[0].loop() == 0;
            Side a = firstIsA ? close[0] : close[1];
            Side b = firstIsA ? close[1] : close[0];
            throw tooClose("side " + a.index() + " of the first loop", "side " + b.index() + " of the second loop",
                    clearance);
        }
    }

    private static List<Side> sides(int loop, List<Vec2> vertices) {
        List<Side> out = new ArrayList<>(vertices.size());
        for (int i = 0; i < vertices.size(); i++) {
            out.add(new Side(loop, i, vertices.get(i), vertices.get((i + 1) % vertices.size())));
        }
        return out;
    }

    /**
     * The first pair of sides whose boxes, widened by {@code gap}, overlap and that {@code bad}
     * accepts, or null: a sweep along x over the sides' boxes.
     */
    private static Side[] firstNearPair(List<Side> sides, double gap, BiPredicate<Side, Side> bad) {
        List<Side> byX = new ArrayList<>(sides);
        byX.sort(Comparator.comparingDouble(Side::minX));
        List<Side> open = new ArrayList<>();
        for (Side s : byX) {
            open.removeIf(o -> o.maxX() + gap < s.minX());
            for (Side o : open) {
                if (o.overlapsInY(s, gap) && bad.test(o, s)) {
                    return new Side[] {o, s};
                }
            }
            open.add(s);
        }
        return null;
    }

    /** Non-neighbouring sides closer than the clearance, unless they cross steeply. */
    private static boolean tooClose(Side f, Side g, double clearance) {
        Vec2 u = f.b().minus(f.a());
        Vec2 v = g.b().minus(g.a());
        double sin = Math.abs(u.cross(v)) / (u.length() * v.length());
        return sin < MIN_CROSSING_SIN && distance(f, g) < clearance;
    }

    /** Neighbouring sides: the shorter one's free end lies within the clearance of the other. */
    private static boolean foldedBack(Side f, Side g, double clearance) {
        boolean fShorter = f.length() <= g.length();
        Side shorter = fShorter ? f : g;
        Side longer = fShorter ? g : f;
        return Math.max(toSegment(shorter.a(), longer), toSegment(shorter.b(), longer)) < clearance;
    }

    private static double distance(Side f, Side g) {
        if (Polygons.segmentsCross(f.a(), f.b(), g.a(), g.b())) {
            return 0;
        }
        return Math.min(Math.min(toSegment(f.a(), g), toSegment(f.b(), g)),
                Math.min(toSegment(g.a(), f), toSegment(g.b(), f)));
    }

    private static double toSegment(Vec2 p, Side s) {
        Vec2 d = s.b().minus(s.a());
        double t = Math.max(0, Math.min(1, p.minus(s.a()).dot(d) / d.dot(d)));
        return s.a().plus(d.times(t)).minus(p).length();
    }

    private static IllegalArgumentException tooClose(String first, String second, double clearanceM) {
        return new IllegalArgumentException(first + " and " + second + " run closer than the wire radii allow ("
                + clearanceM + " m); the filament model does not hold there");
    }
}

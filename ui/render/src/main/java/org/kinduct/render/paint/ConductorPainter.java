package org.kinduct.render.paint;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.report.Labels;
import org.kinduct.solver.run.ResultScales;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Circulation;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.Terminal;
import org.kinduct.render.view.ViewTransform;

/**
 * Conductors and what the solver says about them, drawn per Lenz's law: + and − discs at a
 * wire's ends or an open loop's gap (size grows with |EMF|), arrows along closed loops in the
 * current's direction (width grows with |I|), and the induced current's own field (⊙ or ⊗)
 * inside each closed loop.
 */
final class ConductorPainter {

    /** Fraction of the closing edge left open to show an open loop's gap. */
    private static final double GAP_START = 0.38;
    private static final double GAP_END = 0.62;
    private static final double MIN_ARROW_EDGE_PX = 30;
    /** A loop this many pixels across (its smaller side) or more gets full-size current arrows. */
    private static final double FULL_ARROW_LOOP_PX = 160;
    private static final double MIN_ARROW_SCALE = 0.4;
    /** Conductors smaller than this on screen keep labels off themselves. */
    private static final double SMALL_PX = 160;

    private ConductorPainter() {
    }

    static void drawConductors(Surface s, ViewTransform v, Scene scene, Placement placement, EditorMarks marks) {
        for (Conductor c : scene.conductors()) {
            List<Vec2> pts = placement.vertices(c);
            boolean selected = marks.selected().contains(c.id());
            for (int pass = 0; pass < 2; pass++) {
                s.stroke(pass == 0 ? (selected ? Palette.withAlpha(Palette.SELECTION, 0.55) : Palette.HALO)
                        : Palette.INK);
                double width = pass == 0 ? (selected ? 9 : 5.5) : 2.5;
                s.lineWidth(width);
                s.dash();
                outline(s, v, c, pts, placement, width);
            }
            slidingContacts(s, v, c, pts);
            if (selected) {
                for (Vec2 p : pts) {
                    double x = v.screenX(p.x());
                    double y = v.screenY(p.y());
                    s.fill(0xFFFFFFFF);
                    s.fillRect(x - 4, y - 4, 8, 8);
                    s.stroke(Palette.SELECTION);
                    s.lineWidth(1.5);
                    s.strokeRect(x - 4, y - 4, 8, 8);
                }
            }
        }
    }

    /**
     * Where a conductor passes from one body to another (a bar riding fixed rails), a contact mark:
     * the circuit closes through a sliding joint there, and a reader should see it.
     */
    private static void slidingContacts(Surface s, ViewTransform v, Conductor c, List<Vec2> pts) {
        int n = pts.size();
        for (int i = 0; i < n; i++) {
            String here = c.vertices().get(i).bodyOr(c.body());
            boolean closedAround = c instanceof Conductor.Loop || (i > 0 && i < n - 1);
            String before = c.vertices().get((i + n - 1) % n).bodyOr(c.body());
            String after = c.vertices().get((i + 1) % n).bodyOr(c.body());
            if (closedAround && (!here.equals(before) || !here.equals(after))) {
                double x = v.screenX(pts.get(i).x());
                double y = v.screenY(pts.get(i).y());
                s.fill(Palette.INK);
                s.fillOval(x, y, 5.5);
                s.fill(0xFFFFFFFF);
                s.fillOval(x, y, 2.5);
            }
        }
    }

    /**
     * The line a conductor runs along: a wire's polyline, a loop's polygon, an open loop's with its
     * gap, a plate's or channel's edges.
     */
    private static void outline(Surface s, ViewTransform v, Conductor c, List<Vec2> pts, Placement placement,
                                double widthPx) {
        c.match(new Conductor.Cases<Void>() {
            @Override
            public Void wire(Conductor.Wire wire) {
                SourcePainter.polygon(s, v, pts, false);
                s.strokePath();
                return null;
            }

            @Override
            public Void loop(Conductor.Loop loop) {
                SourcePainter.polygon(s, v, pts, !loop.open());
                if (loop.open()) {
                    Vec2 last = pts.get(pts.size() - 1);
                    Vec2 first = pts.get(0);
                    Vec2 g1 = lerp(last, first, GAP_START);
                    Vec2 g2 = lerp(last, first, GAP_END);
                    s.moveTo(v.screenX(last.x()), v.screenY(last.y()));
                    s.lineTo(v.screenX(g1.x()), v.screenY(g1.y()));
                    s.moveTo(v.screenX(g2.x()), v.screenY(g2.y()));
                    s.lineTo(v.screenX(first.x()), v.screenY(first.y()));
                }
                s.strokePath();
                return null;
            }

            @Override
            public Void plate(Conductor.Plate plate) {
                SheetPainter.edges(s, v, plate, placement, widthPx);
                return null;
            }

            @Override
            public Void channel(Conductor.Channel channel) {
                SheetPainter.edges(s, v, channel, placement, widthPx);
                return null;
            }
        });
    }

    static void drawLenz(Surface s, ViewTransform v, Scene scene, Snapshot snap, LabelPlacer placer) {
        double maxEmf = 0;
        double maxI = 0;
        for (ConductorState st : snap.conductors()) {
            maxEmf = Math.max(maxEmf, Math.abs(st.emfV()));
            maxI = Math.max(maxI, Math.abs(st.currentA()));
        }
        for (Conductor c : scene.conductors()) {
            ConductorState st = snap.conductor(c.id()).orElse(null);
            if (st == null) {
                continue;
            }
            List<Vec2> pts = st.vertices();
            if (st.positiveEnd() != Terminal.NONE && maxEmf > 0) {
                double r = 6 + 5 * Math.sqrt(Math.abs(st.emfV()) / maxEmf);
                terminals(s, v, c, pts, st.positiveEnd() == Terminal.LAST, r, placer);
            }
            if (c instanceof Conductor.Loop loop && !loop.open() && st.direction() != Circulation.NONE && maxI > 0) {
                double width = 1.5 + 4.5 * Math.sqrt(Math.abs(st.currentA()) / maxI);
                currentArrows(s, v, pts, st.currentA() > 0, width, arrowScale(v, pts), placer);
                Vec2 c0 = SourcePainter.centroid(pts);
                Glyphs.fieldSymbol(s, v.screenX(c0.x()), v.screenY(c0.y()), 10, st.direction() == Circulation.CCW,
                        Palette.CURRENT);
                placer.reserve(new LabelPlacer.Box(v.screenX(c0.x()) - 12, v.screenY(c0.y()) - 12, 24, 24));
            }
        }
    }

    /** + and − discs: at a wire's two ends, or either side of an open loop's gap. */
    private static void terminals(Surface s, ViewTransform v, Conductor c, List<Vec2> pts, boolean lastPositive,
                                  double r, LabelPlacer placer) {
        Vec2 lastEnd;
        Vec2 firstEnd;
        Vec2 lastDir;
        Vec2 firstDir;
        if (c instanceof Conductor.Loop) {
            Vec2 last = pts.get(pts.size() - 1);
            Vec2 first = pts.get(0);
            lastEnd = lerp(last, first, GAP_START);
            firstEnd = lerp(last, first, GAP_END);
            Vec2 across = first.minus(last);
            Vec2 side = across.perp();
            lastDir = side;
            firstDir = side;
        } else {
            lastEnd = pts.get(pts.size() - 1);
            firstEnd = pts.get(0);
            lastDir = lastEnd.minus(pts.get(pts.size() - 2));
            firstDir = firstEnd.minus(pts.get(1));
        }
        marker(s, v, lastEnd, lastDir, r, lastPositive, placer);
        marker(s, v, firstEnd, firstDir, r, !lastPositive, placer);
    }

    private static void marker(Surface s, ViewTransform v, Vec2 at, Vec2 outward, double r, boolean positive,
                               LabelPlacer placer) {
        double dx = outward.x();
        double dy = -outward.y();
        double len = Math.hypot(dx, dy);
        double off = r + 5;
        double x = v.screenX(at.x()) + (len > 0 ? dx / len * off : 0);
        double y = v.screenY(at.y()) + (len > 0 ? dy / len * off : 0);
        Glyphs.terminal(s, x, y, r, positive);
        placer.reserve(new LabelPlacer.Box(x - r - 1, y - r - 1, 2 * r + 2, 2 * r + 2));
    }

    /**
     * Shrinks the current arrows of a loop that is small on screen, so they do not swamp it: full
     * size from {@value #FULL_ARROW_LOOP_PX} px across (the loop's smaller side), down to
     * {@value #MIN_ARROW_SCALE} of it.
     */
    static double arrowScale(ViewTransform v, List<Vec2> pts) {
        Extent e = Extent.of(pts);
        double acrossPx = Math.min(e.width(), e.height()) * v.pxPerM();
        return Math.max(MIN_ARROW_SCALE, Math.min(1, acrossPx / FULL_ARROW_LOOP_PX));
    }

    /** Arrows along a loop's long edges; each claims its box so no label covers it. */
    private static void currentArrows(Surface s, ViewTransform v, List<Vec2> pts, boolean forward, double width,
                                      double scale, LabelPlacer placer) {
        int n = pts.size();
        s.stroke(Palette.CURRENT);
        s.fill(Palette.CURRENT);
        s.lineWidth(width * scale);
        s.dash();
        for (int i = 0; i < n; i++) {
            Vec2 a = pts.get(forward ? i : (i + 1) % n);
            Vec2 b = pts.get(forward ? (i + 1) % n : i);
            double ax = v.screenX(a.x());
            double ay = v.screenY(a.y());
            double bx = v.screenX(b.x());
            double by = v.screenY(b.y());
            double len = Math.hypot(bx - ax, by - ay);
            if (len < MIN_ARROW_EDGE_PX) {
                continue;
            }
            double dx = (bx - ax) / len;
            double dy = (by - ay) / len;
            double head = (9 + 2 * width) * scale;
            double half = Math.min(len * 0.25, 40);
            double mx = (ax + bx) / 2;
            double my = (ay + by) / 2;
            s.beginPath();
            s.moveTo(mx - dx * half, my - dy * half);
            s.lineTo(mx + dx * (half - head * 0.6), my + dy * (half - head * 0.6));
            s.strokePath();
            Glyphs.arrowHead(s, mx + dx * half, my + dy * half, dx, dy, head);
            double reach = head / 2 + 1;
            double x0 = mx - Math.abs(dx) * half;
            double y0 = my - Math.abs(dy) * half;
            placer.reserve(new LabelPlacer.Box(x0 - reach, y0 - reach, 2 * Math.abs(dx) * half + 2 * reach,
                    2 * Math.abs(dy) * half + 2 * reach));
        }
    }

    /**
     * Places each conductor's callout, in the order that keeps their leaders shortest
     * ({@link LabelPlacer#placeAll}), and adds their drawing to {@code labels}.
     */
    static void placeCallouts(Surface s, ViewTransform v, Scene scene, Placement placement, Snapshot snap,
                              ResultScales scales, LabelPlacer placer, List<Runnable> labels) {
        double lineH = ScenePainter.FONT + 3;
        for (Conductor c : scene.conductors()) {
            reserveIfSmall(v, placement.vertices(c), placer);
        }
        SheetPainter.reserveEddies(v, scene, snap, placement, placer);
        List<String[]> texts = new ArrayList<>();
        List<LabelPlacer.Callout> callouts = new ArrayList<>();
        for (Conductor c : scene.conductors()) {
            String[] lines = calloutLines(c, snap, scales);
            if (lines == null) {
                continue;
            }
            Vec2 anchor = anchor(c, placement.vertices(c));
            double w = 0;
            for (String line : lines) {
                w = Math.max(w, s.textWidth(line, ScenePainter.FONT, false));
            }
            texts.add(lines);
            callouts.add(new LabelPlacer.Callout(v.screenX(anchor.x()), v.screenY(anchor.y()), w + 12,
                    lines.length * lineH + 6));
        }
        List<LabelPlacer.Box> boxes = placer.placeAll(callouts);
        for (int k = 0; k < boxes.size(); k++) {
            LabelPlacer.Box b = boxes.get(k);
            LabelPlacer.Callout c = callouts.get(k);
            String[] lines = texts.get(k);
            labels.add(() -> {
                Glyphs.leader(s, b, c.ax(), c.ay());
                s.fill(Palette.LABEL_BOX);
                s.fillRect(b.x(), b.y(), b.w(), b.h());
                s.stroke(Palette.LABEL_EDGE);
                s.strokeRect(b.x(), b.y(), b.w(), b.h());
                for (int i = 0; i < lines.length; i++) {
                    s.fill(i == 0 ? Palette.INK : Palette.MUTED);
                    s.text(lines[i], b.x() + 6, b.y() + 3 + (i + 0.5) * lineH, ScenePainter.FONT, i == 0,
                            Surface.Anchor.LEFT);
                }
            });
        }
    }

    /** Keeps labels off small conductors (large ones would leave no room, so they stay open). */
    private static void reserveIfSmall(ViewTransform v, List<Vec2> pts, LabelPlacer placer) {
        Extent e = Extent.of(pts);
        double w = e.width() * v.pxPerM();
        double h = e.height() * v.pxPerM();
        if (w < SMALL_PX && h < SMALL_PX) {
            placer.reserve(new LabelPlacer.Box(v.screenX(e.minX()) - 4, v.screenY(e.maxY()) - 4, w + 8, h + 8));
        }
    }

    /**
     * Where a callout's leader points: a wire's middle; the middle of a plate's or channel's top (its
     * callout goes above it, clear of the eddies inside); a loop's upper-right-most vertex.
     */
    private static Vec2 anchor(Conductor c, List<Vec2> pts) {
        if (c instanceof Conductor.Wire) {
            int mid = (pts.size() - 1) / 2;
            return lerp(pts.get(mid), pts.get(mid + 1), 0.5);
        }
        Vec2 best = pts.get(0);
        if (c instanceof Conductor.Sheet) {
            Extent box = Extent.of(pts);
            return new Vec2((box.minX() + box.maxX()) / 2, box.maxY());
        }
        for (Vec2 p : pts) {
            if (p.x() + p.y() > best.x() + best.y()) {
                best = p;
            }
        }
        return best;
    }

    /**
     * The callout's lines: id, EMF and current or flux or polarity of a wire or loop, a plate's or
     * channel's as {@link SheetPainter#calloutLines} has them, noise read as 0 against
     * {@code scales}; null when the snapshot holds no state for the conductor.
     */
    static String[] calloutLines(Conductor c, Snapshot snap, ResultScales scales) {
        return c.match(new Conductor.Cases<>() {
            @Override
            public String[] wire(Conductor.Wire wire) {
                return snap.conductor(c.id()).map(st -> new String[] {c.id(), emf(st, scales),
                    Labels.polarity(st.positiveEnd(), false)}).orElse(null);
            }

            @Override
            public String[] loop(Conductor.Loop loop) {
                return snap.conductor(c.id()).map(st -> loopLines(loop, st, scales)).orElse(null);
            }

            @Override
            public String[] plate(Conductor.Plate plate) {
                return snap.sheet(c.id()).map(st -> SheetPainter.calloutLines(plate, st, scales)).orElse(null);
            }

            @Override
            public String[] channel(Conductor.Channel channel) {
                return snap.sheet(c.id()).map(st -> SheetPainter.calloutLines(channel, st, scales)).orElse(null);
            }
        });
    }

    private static String emf(ConductorState st, ResultScales scales) {
        return "ε " + Quantities.voltage(scales.emf(st.emfV()));
    }

    private static String[] loopLines(Conductor.Loop loop, ConductorState st, ResultScales scales) {
        if (loop.open()) {
            return new String[] {loop.id(), emf(st, scales) + " across gap", "Φ "
                    + Quantities.flux(scales.flux(st.fluxWb())) + (loop.turns() > 1 ? " per turn" : "")};
        }
        String arrow = Labels.senseArrow(st.direction());
        return new String[] {loop.id(), emf(st, scales), "I " + Quantities.current(scales.current(st.currentA()))
                + (arrow.isEmpty() ? "" : " " + arrow)};
    }

    static void drawMarks(Surface s, ViewTransform v, EditorMarks marks) {
        List<Vec2> pts = marks.preview();
        if (!pts.isEmpty()) {
            SourcePainter.polygon(s, v, pts, marks.previewClosed());
            s.stroke(Palette.PREVIEW);
            s.lineWidth(2);
            s.dash(7, 4);
            s.strokePath();
            s.dash();
            s.fill(Palette.PREVIEW);
            for (Vec2 p : pts) {
                s.fillOval(v.screenX(p.x()), v.screenY(p.y()), 3.5);
            }
        }
        if (marks.snap() != null) {
            double x = v.screenX(marks.snap().x());
            double y = v.screenY(marks.snap().y());
            s.stroke(Palette.PREVIEW);
            s.lineWidth(1.5);
            s.strokeOval(x, y, 6);
            s.beginPath();
            s.moveTo(x - 10, y);
            s.lineTo(x + 10, y);
            s.moveTo(x, y - 10);
            s.lineTo(x, y + 10);
            s.strokePath();
            if (!marks.hint().isEmpty()) {
                double w = s.textWidth(marks.hint(), ScenePainter.FONT, false) + 10;
                s.fill(Palette.LABEL_BOX);
                s.fillRect(x + 12, y + 10, w, 18);
                s.fill(Palette.PREVIEW);
                s.text(marks.hint(), x + 17, y + 19, ScenePainter.FONT, false, Surface.Anchor.LEFT);
            }
        }
    }

    private static Vec2 lerp(Vec2 a, Vec2 b, double t) {
        return a.plus(b.minus(a).times(t));
    }
}

package org.kinduct.render.paint;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.render.view.ViewTransform;
import org.kinduct.report.Labels;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.StreamLattice;
import org.kinduct.solver.run.ResultScales;

/**
 * Plates and channels: the conductor (a tinted plate with its holes open, or a liquid between two
 * walls whose ends are cut through a longer flow), its eddy currents ({@link Streamlines},
 * {@link CurrentDensityMap}), and the Lenz reading of its state: the induced current's own field
 * (⊙ or ⊗) at the centre of each eddy, the drag arrow, and the electrodes with their potentials,
 * + and − on each pair's ends.
 */
final class SheetPainter {

    private static final int PLATE_FILL = 0x5CA9B0BA;
    private static final int LIQUID_FILL = 0x8C4FA3E0;
    private static final int DRAG = 0xFFC62828;
    private static final int FLOW = 0xFF1565C0;
    /** An eddy's centre is marked where |ψ| reaches this fraction of the conductor's largest. */
    private static final double EDDY_FRACTION = 0.2;
    /** Radii of an eddy's mark, screen units: the largest, and the smallest kept where eddies crowd. */
    private static final double LARGEST_MARK_PX = 12;
    private static final double SMALLEST_MARK_PX = 6;
    private static final int MOST_EDDIES = 8;
    /** Outside the streamlines' reach: |ψ| below this fraction of the largest. */
    private static final double QUIET_FRACTION = 0.1;
    private static final double DRAG_SHORTEST_PX = 20;
    private static final double DRAG_LONGEST_PX = 40;

    private SheetPainter() {
    }

    /** Tint, |J| colours and streamlines of every plate and channel, as the frame's layers ask. */
    static void drawInterior(Surface s, ViewTransform v, Picture f, Placement placement) {
        Snapshot snap = f.snapshot();
        double top = 0;
        if (snap != null) {
            for (SheetState st : snap.sheets()) {
                top = Math.max(top, st.peakCurrentDensityAPerM2());
            }
        }
        for (Conductor c : f.scene().conductors()) {
            if (!(c instanceof Conductor.Sheet sheet)) {
                continue;
            }
            Pose pose = placement.pose(sheet.body());
            if (f.shows(Layer.CONDUCTORS)) {
                fill(s, v, sheet, pose);
            }
            SheetState st = snap == null ? null : snap.sheet(c.id()).orElse(null);
            if (st == null) {
                continue;
            }
            SheetFrame frame = new SheetFrame(pose, v);
            if (f.shows(Layer.CURRENT_DENSITY)) {
                CurrentDensityMap.draw(s, frame, v.pxPerM(), st.streamFunction(), sheet.outline(), sheet.holes(), top);
            }
            if (f.shows(Layer.EDDY_CURRENTS)) {
                Streamlines.draw(s, frame, st.streamFunction(), sheet.thicknessM());
            }
        }
    }

    /** The largest peak |J| of the snapshot's plates and channels, A/m² (0 without any). */
    static double peakCurrentDensity(Snapshot snap) {
        return snap == null ? 0 : snap.sheets().stream().mapToDouble(SheetState::peakCurrentDensityAPerM2).max()
                .orElse(0);
    }

    private static void fill(Surface s, ViewTransform v, Conductor.Sheet sheet, Pose pose) {
        s.beginPath();
        // Non-zero winding fills the outline and leaves the holes open when they run the other way.
        trace(s, v, pose, sheet.outline(), true);
        for (List<Vec2> hole : sheet.holes()) {
            trace(s, v, pose, hole, false);
        }
        s.fill(sheet instanceof Conductor.Channel ? LIQUID_FILL : PLATE_FILL);
        s.fillPath();
    }

    private static void trace(Surface s, ViewTransform v, Pose pose, List<Vec2> loop, boolean counterClockwise) {
        boolean reverse = (Polygons.signedArea(loop) > 0) != counterClockwise;
        int n = loop.size();
        for (int k = 0; k < n; k++) {
            Vec2 p = pose.place(loop.get(reverse ? n - 1 - k : k));
            if (k == 0) {
                s.moveTo(v.screenX(p.x()), v.screenY(p.y()));
            } else {
                s.lineTo(v.screenX(p.x()), v.screenY(p.y()));
            }
        }
        s.closePath();
    }

    /**
     * The edges, in the current stroke: a plate's outline and holes; a channel's two walls (its
     * ends, cut through a longer flow, dashed and thin).
     */
    static void edges(Surface s, ViewTransform v, Conductor.Sheet sheet, Placement placement, double widthPx) {
        Pose pose = placement.pose(sheet.body());
        List<Vec2> outline = placement.place(sheet.body(), sheet.outline());
        if (sheet instanceof Conductor.Channel) {
            s.beginPath();
            segment(s, v, outline.get(0), outline.get(1));
            segment(s, v, outline.get(2), outline.get(3));
            s.strokePath();
            s.save();
            s.lineWidth(Math.max(1, widthPx / 3));
            s.dash(5, 4);
            s.beginPath();
            segment(s, v, outline.get(1), outline.get(2));
            segment(s, v, outline.get(3), outline.get(0));
            s.strokePath();
            s.restore();
            return;
        }
        s.beginPath();
        trace(s, v, pose, sheet.outline(), true);
        for (List<Vec2> hole : sheet.holes()) {
            trace(s, v, pose, hole, false);
        }
        s.strokePath();
    }

    private static void segment(Surface s, ViewTransform v, Vec2 a, Vec2 b) {
        s.moveTo(v.screenX(a.x()), v.screenY(a.y()));
        s.lineTo(v.screenX(b.x()), v.screenY(b.y()));
    }

    /** The Lenz reading of every plate and channel: eddy centres, drag arrows, electrodes. */
    static void drawLenz(Surface s, ViewTransform v, Picture f, Placement placement, LabelPlacer placer) {
        Snapshot snap = f.snapshot();
        for (Conductor c : f.scene().conductors()) {
            if (!(c instanceof Conductor.Sheet sheet)) {
                continue;
            }
            SheetState st = snap.sheet(c.id()).orElse(null);
            if (st == null) {
                continue;
            }
            SheetFrame frame = new SheetFrame(placement.pose(sheet.body()), v);
            if (sheet instanceof Conductor.Plate) {
                // A channel's force is spread over its liquid as a pressure drop, not a drag on a body.
                drag(s, v, placement.place(sheet.body(), sheet.outline()), st, f.scales(), placer);
            }
            eddyCentres(s, frame, st.streamFunction(), placer);
            electrodes(s, v, st, placer);
        }
    }

    /**
     * Keeps labels off the eddies: the screen box round the lattice nodes of each plate and channel
     * where |ψ| reaches {@value #QUIET_FRACTION} of its largest (the quiet rest of a large plate stays
     * open to callouts).
     */
    static void reserveEddies(ViewTransform v, Scene scene, Snapshot snap, Placement placement, LabelPlacer placer) {
        for (SheetState st : snap.sheets()) {
            Conductor c = scene.conductor(st.id()).orElseThrow();
            SheetFrame frame = new SheetFrame(placement.pose(c.body()), v);
            StreamLattice psi = st.streamFunction();
            double minX = Double.POSITIVE_INFINITY;
            double minY = Double.POSITIVE_INFINITY;
            double maxX = Double.NEGATIVE_INFINITY;
            double maxY = Double.NEGATIVE_INFINITY;
            for (int j = 0; j < psi.ny(); j++) {
                for (int i = 0; i < psi.nx(); i++) {
                    if (psi.largestAPerM() > 0 && Math.abs(psi.psiAPerM(i, j)) >= QUIET_FRACTION * psi.largestAPerM()) {
                        double x = frame.screenX(psi.x0M() + i * psi.stepM(), psi.y0M() + j * psi.stepM());
                        double y = frame.screenY(psi.x0M() + i * psi.stepM(), psi.y0M() + j * psi.stepM());
                        minX = Math.min(minX, x);
                        minY = Math.min(minY, y);
                        maxX = Math.max(maxX, x);
                        maxY = Math.max(maxY, y);
                    }
                }
            }
            if (minX <= maxX) {
                placer.reserve(new LabelPlacer.Box(minX, minY, maxX - minX, maxY - minY));
            }
        }
    }

    /**
     * ⊙ at the centre of each counter-clockwise eddy (a maximum of ψ) and ⊗ at each clockwise one:
     * the induced current's own field there, as inside a loop.
     */
    private static void eddyCentres(Surface s, SheetFrame frame, StreamLattice psi, LabelPlacer placer) {
        List<double[]> found = new ArrayList<>();
        for (int j = 1; j < psi.ny() - 1; j++) {
            for (int i = 1; i < psi.nx() - 1; i++) {
                double value = psi.psiAPerM(i, j);
                if (Math.abs(value) >= EDDY_FRACTION * psi.largestAPerM() && extremum(psi, i, j)) {
                    double qx = psi.x0M() + i * psi.stepM();
                    double qy = psi.y0M() + j * psi.stepM();
                    found.add(new double[] {Math.abs(value), frame.screenX(qx, qy), frame.screenY(qx, qy),
                        Math.signum(value)});
                }
            }
        }
        found.sort((a, b) -> Double.compare(b[0], a[0]));
        List<double[]> drawn = new ArrayList<>();
        for (double[] e : found) {
            if (drawn.size() < MOST_EDDIES
                    && drawn.stream().noneMatch(d -> Math.hypot(d[1] - e[1], d[2] - e[2]) < 2 * SMALLEST_MARK_PX)) {
                drawn.add(e);
            }
        }
        // Marks as large as the nearest two allow, so that close eddies keep theirs.
        double closest = Double.POSITIVE_INFINITY;
        for (int a = 0; a < drawn.size(); a++) {
            for (int b = a + 1; b < drawn.size(); b++) {
                closest = Math.min(closest, Math.hypot(drawn.get(a)[1] - drawn.get(b)[1],
                        drawn.get(a)[2] - drawn.get(b)[2]));
            }
        }
        double r = Math.max(SMALLEST_MARK_PX, Math.min(LARGEST_MARK_PX, 0.45 * closest));
        for (double[] e : drawn) {
            boolean ccw = e[3] > 0;
            s.fill(0xE6FFFFFF);
            s.fillOval(e[1], e[2], r);
            Glyphs.fieldSymbol(s, e[1], e[2], 0.75 * r, ccw, ccw ? Streamlines.CCW : Streamlines.CW);
            placer.reserve(new LabelPlacer.Box(e[1] - r - 1, e[2] - r - 1, 2 * r + 2, 2 * r + 2));
        }
    }

    /** A maximum of ψ &gt; 0 or a minimum of ψ &lt; 0 among its eight neighbours. */
    private static boolean extremum(StreamLattice psi, int i, int j) {
        double sign = Math.signum(psi.psiAPerM(i, j));
        double here = sign * psi.psiAPerM(i, j);
        for (int dj = -1; dj <= 1; dj++) {
            for (int di = -1; di <= 1; di++) {
                if ((di != 0 || dj != 0) && sign * psi.psiAPerM(i + di, j + dj) > here) {
                    return false;
                }
            }
        }
        return true;
    }

    /**
     * The force on the conductor as an arrow pulling at it from outside: along its line of action
     * (the points r with (r − p) × F = τ) where it passes nearest the outline's centroid (the
     * centroid's own line when that misses the outline's box), starting where that line leaves the
     * box in the force's direction, clear of the eddies inside; its length grows with |F| against
     * the run's largest force.
     */
    private static void drag(Surface s, ViewTransform v, List<Vec2> outline, SheetState st, ResultScales scales,
                             LabelPlacer placer) {
        Vec2 force = scales.force(st.forceN());
        double f = force.length();
        if (!(f > 0)) {
            return;
        }
        Vec2 centroid = SourcePainter.centroid(outline);
        double offset = (centroid.minus(st.pivotM()).cross(force) - st.torqueNm()) / f;
        Vec2 at = centroid.plus(force.perp().times(offset / f));
        Extent box = Extent.of(outline);
        if (at.x() < box.minX() || at.x() > box.maxX() || at.y() < box.minY() || at.y() > box.maxY()) {
            at = centroid;
        }
        Vec2 along = force.times(1 / f);
        double exit = Math.min(along.x() > 0 ? (box.maxX() - at.x()) / along.x()
                : along.x() < 0 ? (box.minX() - at.x()) / along.x() : Double.POSITIVE_INFINITY,
                along.y() > 0 ? (box.maxY() - at.y()) / along.y()
                        : along.y() < 0 ? (box.minY() - at.y()) / along.y() : Double.POSITIVE_INFINITY);
        Vec2 edge = at.plus(along.times(exit));
        double length = DRAG_SHORTEST_PX + (DRAG_LONGEST_PX - DRAG_SHORTEST_PX) * Math.sqrt(f / scales.forceN());
        double dx = along.x();
        double dy = -along.y();
        double x = v.screenX(edge.x()) + 6 * dx;
        double y = v.screenY(edge.y()) + 6 * dy;
        for (int pass = 0; pass < 2; pass++) {
            s.stroke(pass == 0 ? Palette.HALO : DRAG);
            s.lineWidth(pass == 0 ? 7 : 3.5);
            s.dash();
            s.beginPath();
            s.moveTo(x, y);
            s.lineTo(x + dx * (length - 8), y + dy * (length - 8));
            s.strokePath();
        }
        s.fill(DRAG);
        Glyphs.arrowHead(s, x + dx * length, y + dy * length, dx, dy, 14);
        placer.reserve(new LabelPlacer.Box(Math.min(x, x + dx * length) - 8, Math.min(y, y + dy * length) - 8,
                Math.abs(dx) * length + 16, Math.abs(dy) * length + 16));
        String text = "F " + Quantities.force(f);
        double w = s.textWidth(text, ScenePainter.LABEL_FONT, true) + 8;
        LabelPlacer.Box label = placer.placeAround(x + dx * length / 2 - dy * 14, y + dy * length / 2 + dx * 14, w,
                ScenePainter.LABEL_FONT + 5);
        s.fill(Palette.LABEL_BOX);
        s.fillRect(label.x(), label.y(), label.w(), label.h());
        s.fill(DRAG);
        s.text(text, label.centerX(), label.centerY(), ScenePainter.LABEL_FONT, true, Surface.Anchor.CENTER);
    }

    /**
     * Each electrode as a small square with its name and potential; each pair with a + disc at its
     * positive electrode and a − disc at the other, set off outside the conductor.
     */
    private static void electrodes(Surface s, ViewTransform v, SheetState st, LabelPlacer placer) {
        double reference = st.electrodes().stream().mapToDouble(e -> Math.abs(e.potentialV())).max().orElse(0);
        for (SheetState.Electrode e : st.electrodes()) {
            double x = v.screenX(e.atM().x());
            double y = v.screenY(e.atM().y());
            s.fill(Palette.INK);
            s.fillRect(x - 4, y - 4, 8, 8);
            s.fill(0xFFFFFFFF);
            s.fillRect(x - 2, y - 2, 4, 4);
            placer.reserve(new LabelPlacer.Box(x - 5, y - 5, 10, 10));
            String text = e.name() + " " + Quantities.voltage(org.kinduct.scene.units.Units.withoutNoise(
                    e.potentialV(), reference));
            double w = s.textWidth(text, ScenePainter.LABEL_FONT, false) + 8;
            LabelPlacer.Box box = placer.place(x, y, w, ScenePainter.LABEL_FONT + 5);
            s.fill(Palette.LABEL_BOX);
            s.fillRect(box.x(), box.y(), box.w(), box.h());
            s.fill(Palette.INK);
            s.text(text, box.centerX(), box.centerY(), ScenePainter.LABEL_FONT, false, Surface.Anchor.CENTER);
        }
        for (SheetState.Pair p : st.pairs()) {
            p.positive().ifPresent(plus -> {
                String minus = plus.equals(p.plus()) ? p.minus() : p.plus();
                terminal(s, v, electrode(st, plus), electrode(st, minus), true, placer);
                terminal(s, v, electrode(st, minus), electrode(st, plus), false, placer);
            });
        }
    }

    private static SheetState.Electrode electrode(SheetState st, String name) {
        return st.electrodes().stream().filter(e -> e.name().equals(name)).findFirst().orElseThrow();
    }

    /** A + or − disc beside electrode {@code at}, on the side away from {@code other}. */
    private static void terminal(Surface s, ViewTransform v, SheetState.Electrode at, SheetState.Electrode other,
                                 boolean positive, LabelPlacer placer) {
        Vec2 away = at.atM().minus(other.atM());
        double dx = away.x();
        double dy = -away.y();
        double length = Math.hypot(dx, dy);
        double r = 8;
        double x = v.screenX(at.atM().x()) + (length > 0 ? dx / length * (r + 8) : 0);
        double y = v.screenY(at.atM().y()) + (length > 0 ? dy / length * (r + 8) : 0);
        Glyphs.terminal(s, x, y, r, positive);
        placer.reserve(new LabelPlacer.Box(x - r - 1, y - r - 1, 2 * r + 2, 2 * r + 2));
    }

    /**
     * A channel's flow: an arrow along its centreline a quarter of its length from the inlet (its
     * middle is where the electrodes and the field usually are), with the mean velocity now.
     */
    static void drawFlow(Surface s, ViewTransform v, Picture f, Placement placement, LabelPlacer placer) {
        for (Conductor c : f.scene().conductors()) {
            if (!(c instanceof Conductor.Channel channel)) {
                continue;
            }
            double mean = channel.flow().velocityAt(f.tS());
            Pose pose = placement.pose(channel.body());
            Vec2 a = pose.place(channel.start());
            Vec2 b = pose.place(channel.end());
            Vec2 mid = a.plus(b.minus(a).times(0.25));
            Vec2 along = b.minus(a).times(Math.signum(mean) / b.minus(a).length());
            double x = v.screenX(mid.x());
            double y = v.screenY(mid.y());
            String text = "v̄ " + Quantities.velocity(Math.abs(mean));
            if (mean != 0) {
                double dx = along.x();
                double dy = -along.y();
                double half = Math.min(45, b.minus(a).length() * v.pxPerM() / 4);
                s.stroke(FLOW);
                s.fill(FLOW);
                s.lineWidth(2.5);
                s.dash();
                s.beginPath();
                s.moveTo(x - dx * half, y - dy * half);
                s.lineTo(x + dx * (half - 8), y + dy * (half - 8));
                s.strokePath();
                Glyphs.arrowHead(s, x + dx * half, y + dy * half, dx, dy, 11);
                placer.reserve(new LabelPlacer.Box(x - Math.abs(dx) * half - 6, y - Math.abs(dy) * half - 6,
                        2 * Math.abs(dx) * half + 12, 2 * Math.abs(dy) * half + 12));
            }
            double w = s.textWidth(text, ScenePainter.LABEL_FONT, false) + 8;
            LabelPlacer.Box box = placer.placeAround(x, y + 16, w, ScenePainter.LABEL_FONT + 5);
            s.fill(Palette.LABEL_BOX);
            s.fillRect(box.x(), box.y(), box.w(), box.h());
            s.fill(FLOW);
            s.text(text, box.centerX(), box.centerY(), ScenePainter.LABEL_FONT, false, Surface.Anchor.CENTER);
        }
    }

    /**
     * A plate's or channel's callout: its id, the force (drag) with its direction, torque and Joule
     * power, each pair's voltage with its + electrode (and for a channel the share of B·w·v̄), the
     * current between neighbouring streamlines, and what Rm means for them where it leaves the
     * resistive limit ({@link Labels#reynoldsNote}).
     */
    static String[] calloutLines(Conductor.Sheet sheet, SheetState st, ResultScales scales) {
        List<String> lines = new ArrayList<>();
        lines.add(sheet.id());
        Vec2 force = scales.force(st.forceN());
        lines.add("F " + Quantities.force(force.length()) + (force.length() > 0 ? " ∠ " + Labels.direction(force) : "")
                + ", τ " + Quantities.torque(scales.torque(st.torqueNm())));
        lines.add("P " + Quantities.power(scales.power(st.joulePowerW())) + " heat");
        for (SheetState.Pair p : st.pairs()) {
            String ratio = Double.isNaN(p.endShortingRatio()) ? ""
                    : String.format(java.util.Locale.ROOT, " (%.1f %% of B·w·v̄)", 100 * p.endShortingRatio());
            lines.add("U " + p.plus() + "−" + p.minus() + " " + Quantities.voltage(scales.emf(p.voltageV())) + ", "
                    + Labels.positiveElectrode(p.positive()) + ratio);
        }
        if (st.streamFunction().largestAPerM() > 0) {
            lines.add("streamlines every " + Quantities.current(
                    Streamlines.currentStepA(st.streamFunction(), sheet.thicknessM())));
        }
        String reynolds = Labels.reynoldsNote(st);
        if (!reynolds.isEmpty()) {
            lines.add(reynolds);
        }
        return lines.toArray(String[]::new);
    }
}

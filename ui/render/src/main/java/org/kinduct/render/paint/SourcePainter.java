package org.kinduct.render.paint;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.render.view.ViewTransform;

/** Outlines of field sources where their bodies have carried them. */
public final class SourcePainter {

    private static final int CIRCLE_SEGMENTS = 72;

    /** Height of a patch's mark: the 7 px symbol above a 14 px value. */
    private static final double PATCH_MARK_H = 34;
    /** Height of a magnet's pole label: the 15 px pole letter above the 11 px magnetization. */
    private static final double POLE_LABEL_H = 30;
    /** A pole label this far from its magnet's centre or farther gets a leader: nearer, it plainly sits on it. */
    private static final double LEADER_MIN_PX = 8;

    private SourcePainter() {
    }

    /**
     * Draws the sources; returns their labels (a patch's ⊙/⊗ and B_z, a magnet's pole, a coil's turns), to be
     * placed once conductors and their arrows have claimed their room, so a conductor crossing a
     * source's centre neither runs through its label nor hides it.
     */
    static List<Runnable> draw(Surface s, ViewTransform v, Scene scene, Placement placement, EditorMarks marks,
                               LabelPlacer placer) {
        List<Runnable> labels = new ArrayList<>();
        for (Source src : scene.sources()) {
            List<Vec2> outline = outline(src, placement);
            if (outline.isEmpty()) {
                continue;
            }
            src.match(new Source.Cases<Void>() {
                @Override
                public Void patch(Source.FieldPatch patch) {
                    polygon(s, v, outline, true);
                    s.fill(Palette.withAlpha(DivergingScale.argbAt(Math.signum(patch.bzT())), 0.25));
                    s.fillPath();
                    s.stroke(Palette.INK);
                    s.lineWidth(1.5);
                    s.dash(6, 4);
                    s.strokePath();
                    s.dash();
                    Vec2 c = centroid(outline);
                    labels.add(() -> patchMark(s, placer, v.screenX(c.x()), v.screenY(c.y()), patch.bzT()));
                    return null;
                }

                @Override
                public Void uniform(Source.UniformField uniform) {
                    return null;
                }

                @Override
                public Void block(Source.BlockMagnet block) {
                    labels.add(magnet(s, v, outline, block.magnetization(), placer));
                    return null;
                }

                @Override
                public Void cylinder(Source.CylinderMagnet cylinder) {
                    labels.add(magnet(s, v, outline, cylinder.magnetization(), placer));
                    return null;
                }

                @Override
                public Void coil(Source.SourceCoil coil) {
                    polygon(s, v, outline, true);
                    s.stroke(Palette.COIL);
                    s.lineWidth(3);
                    s.dash(10, 3, 2, 3);
                    s.strokePath();
                    s.dash();
                    coilArrows(s, v, outline, coil.drive().dcA() + coil.drive().amplitudeA() >= 0);
                    Vec2 c = centroid(outline);
                    labels.add(() -> turnsLabel(s, placer, v.screenX(c.x()), v.screenY(c.y()), coil.turns()));
                    return null;
                }

                /** The sampled rectangle, dashed: the colours inside come from the samples themselves. */
                @Override
                public Void map(Source.FieldMap map) {
                    polygon(s, v, outline, true);
                    s.stroke(Palette.INK);
                    s.lineWidth(1.5);
                    s.dash(2, 3);
                    s.strokePath();
                    s.dash();
                    Vec2 corner = outline.get(3);
                    labels.add(cornerLabel(s, v, placer, corner,
                            map.id() + " · " + map.grid().nx() + " × " + map.grid().ny() + " samples"));
                    return null;
                }
            });
            if (marks.selected().contains(src.id())) {
                polygon(s, v, outline, true);
                s.stroke(Palette.SELECTION);
                s.lineWidth(3);
                s.dash(5, 3);
                s.strokePath();
                s.dash();
            }
        }
        return labels;
    }

    /** Draws a magnet's outline; returns the placing of its pole label. */
    private static Runnable magnet(Surface s, ViewTransform v, List<Vec2> outline, Source.Magnetization north,
                                   LabelPlacer placer) {
        polygon(s, v, outline, true);
        s.fill(Palette.MAGNET_FILL);
        s.fillPath();
        s.stroke(Palette.MAGNET_EDGE);
        s.lineWidth(2);
        s.dash();
        s.strokePath();
        Vec2 c = centroid(outline);
        return () -> poleLabel(s, placer, v.screenX(c.x()), v.screenY(c.y()), north);
    }

    /** A patch's ⊙/⊗ and value in the free box nearest its centre (cx, cy). */
    private static void patchMark(Surface s, LabelPlacer placer, double cx, double cy, double bzT) {
        String text = Quantities.bz(bzT);
        double w = Math.max(s.textWidth(text, 11, false) + 6, 20);
        LabelPlacer.Box b = placer.placeAround(cx, cy, w, PATCH_MARK_H);
        double x = b.centerX();
        Glyphs.fieldSymbol(s, x, b.y() + 8, 7, bzT > 0, Palette.INK);
        s.fill(0xC0FFFFFF);
        s.fillRect(x - w / 2, b.y() + 18, w, 14);
        s.fill(Palette.INK);
        s.text(text, x, b.y() + 25, 11, false, Surface.Anchor.CENTER);
    }

    /** The source's outline in scene metres at this instant (empty for a field without outline). */
    public static List<Vec2> outline(Source src, Placement placement) {
        return src.match(new Source.Cases<>() {
            @Override
            public List<Vec2> patch(Source.FieldPatch p) {
                return placement.place(p.body(), p.outline());
            }

            @Override
            public List<Vec2> uniform(Source.UniformField uniform) {
                return List.of();
            }

            @Override
            public List<Vec2> block(Source.BlockMagnet m) {
                List<Vec2> corners = new ArrayList<>(4);
                double hx = m.sizeXM() / 2;
                double hy = m.sizeYM() / 2;
                for (double[] c : new double[][] {{-hx, -hy}, {hx, -hy}, {hx, hy}, {-hx, hy}}) {
                    corners.add(m.center().plus(new Vec2(c[0], c[1]).rotate(m.angleRad())));
                }
                return placement.place(m.body(), corners);
            }

            @Override
            public List<Vec2> cylinder(Source.CylinderMagnet m) {
                return placement.place(m.body(), circle(m.center(), m.radiusM()));
            }

            @Override
            public List<Vec2> coil(Source.SourceCoil c) {
                List<Vec2> drawn = c.shape().match(new Source.CoilShape.Cases<>() {
                    @Override
                    public List<Vec2> polygon(Source.CoilShape.Polygon polygon) {
                        return polygon.vertices();
                    }

                    @Override
                    public List<Vec2> circle(Source.CoilShape.Circle circle) {
                        return SourcePainter.circle(circle.center(), circle.radiusM());
                    }
                });
                return placement.place(c.body(), drawn);
            }

            @Override
            public List<Vec2> map(Source.FieldMap m) {
                return placement.place(m.body(), mapRectangle(m));
            }
        });
    }

    /** The corners of a map's sampled rectangle as drawn, counter-clockwise from the lower left. */
    public static List<Vec2> mapRectangle(Source.FieldMap m) {
        double x0 = m.grid().x0M() + m.offsetM().x();
        double y0 = m.grid().y0M() + m.offsetM().y();
        double x1 = m.grid().x1M() + m.offsetM().x();
        double y1 = m.grid().y1M() + m.offsetM().y();
        return List.of(new Vec2(x0, y0), new Vec2(x1, y0), new Vec2(x1, y1), new Vec2(x0, y1));
    }

    private static List<Vec2> circle(Vec2 center, double r) {
        List<Vec2> pts = new ArrayList<>(CIRCLE_SEGMENTS);
        for (int i = 0; i < CIRCLE_SEGMENTS; i++) {
            pts.add(center.plus(Vec2.polar(r, 2 * Math.PI * i / CIRCLE_SEGMENTS)));
        }
        return pts;
    }

    static void polygon(Surface s, ViewTransform v, List<Vec2> pts, boolean closed) {
        s.beginPath();
        for (int i = 0; i < pts.size(); i++) {
            double x = v.screenX(pts.get(i).x());
            double y = v.screenY(pts.get(i).y());
            if (i == 0) {
                s.moveTo(x, y);
            } else {
                s.lineTo(x, y);
            }
        }
        if (closed) {
            s.closePath();
        }
    }

    static Vec2 centroid(List<Vec2> pts) {
        double x = 0;
        double y = 0;
        for (Vec2 p : pts) {
            x += p.x();
            y += p.y();
        }
        return new Vec2(x / pts.size(), y / pts.size());
    }

    /**
     * The face the viewer sees (+z side), N for a magnet magnetized towards +z, in the free box
     * nearest its centre (cx, cy): whole on the surface, off conductors; on a light box where it
     * had to leave the centre, with a leader to a dot on the centre where the box has moved away
     * from it, so a label pushed aside by plates or callouts still names its own magnet. A magnet whose
     * centre is out of view gets none.
     */
    private static void poleLabel(Surface s, LabelPlacer placer, double cx, double cy, Source.Magnetization north) {
        if (cx < 0 || cy < 0 || cx > s.width() || cy > s.height()) {
            return;
        }
        boolean plus = north == Source.Magnetization.PLUS_Z;
        String pole = plus ? "N" : "S";
        String moment = plus ? "M +z" : "M −z";
        double w = Math.max(s.textWidth(pole, 15, true), s.textWidth(moment, 11, false)) + 6;
        LabelPlacer.Box b = placer.placeAround(cx, cy, w, POLE_LABEL_H);
        if (Math.abs(b.centerX() - cx) > 0.5 || Math.abs(b.centerY() - cy) > 0.5) {
            if (b.distanceTo(cx, cy) > LEADER_MIN_PX) {
                Glyphs.leader(s, b, cx, cy);
                s.fill(Palette.LABEL_EDGE);
                s.fillOval(cx, cy, 2.5);
            }
            s.fill(0xC0FFFFFF);
            s.fillRect(b.x(), b.y(), b.w(), b.h());
        }
        s.fill(Palette.INK);
        s.text(pole, b.centerX(), b.centerY() - 1, 15, true, Surface.Anchor.BOTTOM_CENTER);
        s.text(moment, b.centerX(), b.centerY() + 1, 11, false, Surface.Anchor.TOP_CENTER);
    }

    /**
     * A coil's turn count in the free box nearest its centre (cx, cy), off the conductors that may
     * cross it; none when the centre is out of view (a floor coil around the whole scene).
     */
    private static void turnsLabel(Surface s, LabelPlacer placer, double cx, double cy, int turns) {
        if (cx < 0 || cy < 0 || cx > s.width() || cy > s.height()) {
            return;
        }
        String text = turns + " turns";
        LabelPlacer.Box b = placer.placeAround(cx, cy, s.textWidth(text, 11, false) + 6, 14);
        s.fill(0xC0FFFFFF);
        s.fillRect(b.x(), b.y(), b.w(), b.h());
        s.fill(Palette.INK);
        s.text(text, b.centerX(), b.centerY(), 11, false, Surface.Anchor.CENTER);
    }

    private static void coilArrows(Surface s, ViewTransform v, List<Vec2> pts, boolean forward) {
        s.fill(Palette.COIL);
        int n = pts.size();
        int every = Math.max(1, n / 4);
        for (int i = 0; i < n; i += every) {
            Vec2 a = pts.get(i);
            Vec2 b = pts.get((i + 1) % n);
            double ax = v.screenX(a.x());
            double ay = v.screenY(a.y());
            double bx = v.screenX(b.x());
            double by = v.screenY(b.y());
            double len = Math.hypot(bx - ax, by - ay);
            if (len < 1e-6) {
                continue;
            }
            double dx = (bx - ax) / len * (forward ? 1 : -1);
            double dy = (by - ay) / len * (forward ? 1 : -1);
            Glyphs.arrowHead(s, (ax + bx) / 2 + dx * 5, (ay + by) / 2 + dy * 5, dx, dy, 10);
        }
    }

    /**
     * A map's name and size just inside its top-left corner, kept whole on the surface when the
     * corner is off it; its place is taken at once, so the labels placed later keep off it.
     */
    private static Runnable cornerLabel(Surface s, ViewTransform v, LabelPlacer placer, Vec2 corner, String text) {
        double w = s.textWidth(text, 11, false) + 6;
        double x = Math.max(2, Math.min(v.screenX(corner.x()) + 2, s.width() - w - 2));
        double y = Math.max(2, Math.min(v.screenY(corner.y()) + 2, s.height() - 16));
        placer.reserveText(new LabelPlacer.Box(x, y, w, 14));
        return () -> {
            s.fill(0xC0FFFFFF);
            s.fillRect(x, y, w, 14);
            s.fill(Palette.INK);
            s.text(text, x + 3, y + 7, 11, false, Surface.Anchor.LEFT);
        };
    }
}

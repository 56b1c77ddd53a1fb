package org.kinduct.ui.edit;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.render.paint.Quantities;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;

/**
 * Edits inside one plate or channel, as pure functions from one scene to the next: a hole cut into
 * a plate, an electrode put on an edge. Points are in the sheet's drawn frame; a refused edit
 * throws {@link IllegalArgumentException} with a message for the status line.
 */
public final class SheetEdits {

    private SheetEdits() {
    }

    /** Cuts the polygon {@code outline} out of plate {@code plateId}; it must lie strictly inside the plate and apart from its holes. */
    public static Scene addHole(Scene scene, String plateId, List<Vec2> outline) {
        Conductor.Plate plate = conductor(scene, plateId).match(new Conductor.Cases<Conductor.Plate>() {
            @Override
            public Conductor.Plate wire(Conductor.Wire wire) {
                throw notAPlate(plateId);
            }

            @Override
            public Conductor.Plate loop(Conductor.Loop loop) {
                throw notAPlate(plateId);
            }

            @Override
            public Conductor.Plate plate(Conductor.Plate p) {
                return p;
            }

            @Override
            public Conductor.Plate channel(Conductor.Channel channel) {
                throw new IllegalArgumentException("a channel has no holes; select a plate");
            }
        });
        List<List<Vec2>> holes = new ArrayList<>(plate.holes());
        holes.add(Polygons.requireSimple(outline, "hole"));
        try {
            Polygons.requireHoles(plate.outline(), holes);
        } catch (IllegalArgumentException e) {
            // The model numbers holes; the user drew one shape and wants to know what is wrong with it.
            throw new IllegalArgumentException("a hole must lie strictly inside plate '" + plateId
                    + "' and apart from its other holes (" + e.getMessage() + ")", e);
        }
        return SceneEdits.replaceConductor(scene, new Conductor.Plate(plate.id(), plate.body(), plate.outline(),
                holes, plate.thicknessM(), plate.conductivity(), plate.electrodes(), plate.pairs(), plate.cellM()));
    }

    /**
     * Puts a new electrode on the edge of plate or channel {@code sheetId} nearest to {@code near}
     * (a plate's outline or a hole's edge; a channel's walls, not its open ends), named e1, e2, …
     * When the sheet then has two electrodes and no pair, the pair (first, second) is added, so a
     * voltage is reported at once.
     *
     * @param reachM how far from the edge {@code near} may be
     */
    public static Scene addElectrode(Scene scene, String sheetId, Vec2 near, double reachM) {
        Conductor c = conductor(scene, sheetId);
        if (!(c instanceof Conductor.Sheet sheet)) {
            throw notASheet(sheetId);
        }
        Vec2 at = nearestEdgePoint(c, near);
        double off = at.minus(near).length();
        if (off > reachM) {
            throw new IllegalArgumentException("click on the edge of '" + sheetId + "' to place an electrode (this"
                    + " point is " + Quantities.length(off) + " from it)");
        }
        List<Conductor.Electrode> electrodes = new ArrayList<>(sheet.electrodes());
        electrodes.add(new Conductor.Electrode(freshName(sheet), at));
        List<Conductor.ElectrodePair> pairs = new ArrayList<>(sheet.pairs());
        if (electrodes.size() == 2 && pairs.isEmpty()) {
            pairs.add(new Conductor.ElectrodePair(electrodes.get(0).name(), electrodes.get(1).name()));
        }
        return SceneEdits.replaceConductor(scene, withElectrodes(c, electrodes, pairs));
    }

    /** The point of the edges an electrode may sit on nearest to {@code p}; wires and loops have none. */
    static Vec2 nearestEdgePoint(Conductor c, Vec2 p) {
        return c.match(new Conductor.Cases<Vec2>() {
            @Override
            public Vec2 wire(Conductor.Wire wire) {
                throw notASheet(c.id());
            }

            @Override
            public Vec2 loop(Conductor.Loop loop) {
                throw notASheet(c.id());
            }

            @Override
            public Vec2 plate(Conductor.Plate plate) {
                Vec2 best = Polygons.nearestEdgePoint(plate.outline(), p);
                for (List<Vec2> hole : plate.holes()) {
                    best = nearer(p, best, Polygons.nearestEdgePoint(hole, p));
                }
                return best;
            }

            /** A wall is a two-point "polygon": its closing edge runs back along it. */
            @Override
            public Vec2 channel(Conductor.Channel channel) {
                List<Vec2> o = channel.outline();
                return nearer(p, Polygons.nearestEdgePoint(List.of(o.get(0), o.get(1)), p),
                        Polygons.nearestEdgePoint(List.of(o.get(2), o.get(3)), p));
            }
        });
    }

    private static Vec2 nearer(Vec2 p, Vec2 a, Vec2 b) {
        return b.minus(p).length() < a.minus(p).length() ? b : a;
    }

    private static String freshName(Conductor.Sheet sheet) {
        for (int i = sheet.electrodes().size() + 1; ; i++) {
            String name = "e" + i;
            if (sheet.electrodes().stream().noneMatch(e -> e.name().equals(name))) {
                return name;
            }
        }
    }

    private static Conductor withElectrodes(Conductor c, List<Conductor.Electrode> electrodes,
                                            List<Conductor.ElectrodePair> pairs) {
        return c.match(new Conductor.Cases<Conductor>() {
            @Override
            public Conductor wire(Conductor.Wire wire) {
                throw notASheet(c.id());
            }

            @Override
            public Conductor loop(Conductor.Loop loop) {
                throw notASheet(c.id());
            }

            @Override
            public Conductor plate(Conductor.Plate p) {
                return new Conductor.Plate(p.id(), p.body(), p.outline(), p.holes(), p.thicknessM(), p.conductivity(),
                        electrodes, pairs, p.cellM());
            }

            @Override
            public Conductor channel(Conductor.Channel ch) {
                return new Conductor.Channel(ch.id(), ch.body(), ch.start(), ch.end(), ch.widthM(), ch.depthM(),
                        ch.sigmaSPerM(), ch.profile(), ch.flow(), electrodes, pairs, ch.cellM());
            }
        });
    }

    private static Conductor conductor(Scene scene, String id) {
        return scene.conductor(id).orElseThrow(() -> new IllegalArgumentException("no conductor with id '" + id + "'"));
    }

    private static IllegalArgumentException notAPlate(String id) {
        return new IllegalArgumentException("'" + id + "' is no plate; select a plate to cut a hole in");
    }

    private static IllegalArgumentException notASheet(String id) {
        return new IllegalArgumentException("'" + id + "' is no plate or channel; electrodes go on their edges");
    }
}

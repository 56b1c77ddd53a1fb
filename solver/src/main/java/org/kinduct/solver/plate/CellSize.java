package org.kinduct.solver.plate;

import java.util.List;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.SourceReach;

/**
 * The automatic cell size of a plate's or channel's grid: fine enough for the shape and the
 * field, coarse enough that an instant stays cheap.
 *
 * <p>Accuracy asks for the smallest of: {@value #CELLS_PER_EXTENT} cells along the outline's
 * larger side; {@value #CELLS_PER_FIELD_LENGTH} per a source's field length (a magnet's smallest
 * side plus its stand-off, a coil's radius or plane distance, as {@link SourceReach} has them; a
 * field patch's width 2A/P, whose area the cells must resolve); {@value #CELLS_PER_WIDTH} across the outline's width 2A/P (a channel's
 * width, a strip's); {@value #CELLS_PER_HOLE_WIDTH} across the narrowest hole's width 2A/P (a
 * slot). Cost caps the cells at {@value #MOST_CELLS}: a solve of that size took 0.2–0.5 s on one
 * core of a 2-core VM (a slotted plate under four magnets, whose drag changed by 0.35 % from 4600
 * to 18 000 cells and by 0.13 % from 18 000 to 73 000). The cells over the outline's bounding box
 * stay within {@link Conductor.Sheet#MOST_CELLS}, the most a file may ask for.
 */
final class CellSize {

    static final int CELLS_PER_EXTENT = 48;
    static final int CELLS_PER_FIELD_LENGTH = 8;
    static final int CELLS_PER_WIDTH = 12;
    static final int CELLS_PER_HOLE_WIDTH = 2;
    static final int MOST_CELLS = 20_000;

    private CellSize() {
    }

    /** The automatic cell size for {@code sheet} under the sources of {@code scene}, metres. */
    static double automatic(Conductor.Sheet sheet, Scene scene) {
        List<Vec2> outline = sheet.outline();
        double h = Polygons.extentM(outline) / CELLS_PER_EXTENT;
        for (Source s : scene.sources()) {
            double length = fieldLengthM(s);
            if (Double.isFinite(length)) {
                h = Math.min(h, length / CELLS_PER_FIELD_LENGTH);
            }
        }
        h = Math.min(h, width(outline) / CELLS_PER_WIDTH);
        double area = Math.abs(Polygons.signedArea(outline));
        for (List<Vec2> hole : sheet.holes()) {
            h = Math.min(h, width(hole) / CELLS_PER_HOLE_WIDTH);
            area -= Math.abs(Polygons.signedArea(hole));
        }
        Polygons.Box box = Polygons.box(outline);
        // A thin shape across a wide box (a sliver) would ask for cells far beyond its area's share.
        double boxCapped = Math.sqrt((box.maxX() - box.minX()) * (box.maxY() - box.minY()) / Conductor.Sheet.MOST_CELLS);
        return Math.max(Math.max(h, Math.sqrt(area / MOST_CELLS)), boxCapped);
    }

    /** The length over which a source's field changes, for resolving eddy currents; infinite for a uniform field. */
    private static double fieldLengthM(Source source) {
        return source.match(new Source.Cases<>() {
            @Override
            public Double patch(Source.FieldPatch patch) {
                return width(patch.outline());
            }

            @Override
            public Double uniform(Source.UniformField uniform) {
                return Double.POSITIVE_INFINITY;
            }

            @Override
            public Double block(Source.BlockMagnet block) {
                return SourceReach.of(block).lengthM();
            }

            @Override
            public Double cylinder(Source.CylinderMagnet cylinder) {
                return SourceReach.of(cylinder).lengthM();
            }

            @Override
            public Double coil(Source.SourceCoil coil) {
                return SourceReach.of(coil).lengthM();
            }

            /** A map holds nothing finer than its spacing: cells as fine as its samples are enough. */
            @Override
            public Double map(Source.FieldMap map) {
                return CELLS_PER_FIELD_LENGTH * SourceReach.of(map).lengthM();
            }
        });
    }

    /** 2A/P: the width of a strip, the radius of a disc. */
    static double width(List<Vec2> loop) {
        double perimeter = 0;
        for (int i = 0; i < loop.size(); i++) {
            perimeter += loop.get((i + 1) % loop.size()).minus(loop.get(i)).length();
        }
        return 2 * Math.abs(Polygons.signedArea(loop)) / perimeter;
    }
}

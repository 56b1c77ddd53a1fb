package org.kinduct.render.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.FieldGrid;
import org.kinduct.scene.Material;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.WireSpec;
import org.kinduct.scene.io.FieldMapCsv;
import org.kinduct.solver.SceneSolver;

/**
 * The field-map loop closed: B_z of a block-magnet scene written as the {@code --field-csv}
 * export writes it, read back as a field map, and a loop gliding over it. Its EMF must match the
 * closed-form magnet's (Engel-Herbert &amp; Hesjedal, J. Appl. Phys. 97, 074504, 2005, as the solver
 * evaluates it) within the interpolation error, with the same sign, and that error must fall as
 * the grid spacing halves at the order of the interpolant: Keys' cubic convolution is accurate to
 * O(h³) (Keys, IEEE Trans. ASSP 29(6), 1981, §IV), and the EMF of a moving loop is the line
 * integral of B_z·(v × dl) along its edges, which inherits that order.
 */
class FieldMapRoundTripTest {

    /** 10 mm × 6 mm × 3 mm NdFeB, 1 mm below the board. */
    private static final Source MAGNET = new Source.BlockMagnet("magnet", Body.FIXED, Vec2.ZERO, 0.010, 0.006,
            0.003, 0, 0.001, Source.Side.BELOW, 1.2, Source.Magnetization.PLUS_Z);
    /** The exported view: it holds the loop's whole path. */
    private static final ViewChoice.Box VIEW = new ViewChoice.Box(-0.016, -0.010, 0.016, 0.010);
    private static final double SPEED = 0.1;

    private static Scene scene(Source source) {
        Body carriage = new Body("carriage", null, Vec2.ZERO, new Motion.Glide(new Vec2(SPEED, 0)));
        // A 4 mm × 4.08 mm pickup starting 8 mm left of the magnet's centre, a little off the x axis. Its
        // edges lie at no special place in the cells: at a cell's middle or edge the h³ term of the
        // interpolation error vanishes, and the error would fall faster than it does in general.
        List<Conductor.Vertex> square = List.of(Conductor.Vertex.at(-0.01013, -0.00137), Conductor.Vertex.at(-0.00613,
                -0.00137), Conductor.Vertex.at(-0.00613, 0.00271), Conductor.Vertex.at(-0.01013, 0.00271));
        Conductor loop = Conductor.Loop.simple("pickup", "carriage", square, WireSpec.awg(Material.COPPER, 30));
        return new Scene("round trip", "", List.of(Body.fixed(), carriage), List.of(source), List.of(loop),
                new TimeSpan(0, 0.1, 0.01), Vec2.ZERO);
    }

    private static Source.FieldMap exported(int columns) throws Exception {
        Scene magnetScene = scene(MAGNET);
        String csv = DataFiles.fieldCsv(new SceneSolver(magnetScene).fieldAt(0), VIEW, columns);
        FieldGrid grid = FieldMapCsv.readPoints(new ByteArrayInputStream(csv.getBytes(StandardCharsets.UTF_8)),
                "export.csv");
        return new Source.FieldMap("scan", Body.FIXED, "export.csv", grid, Vec2.ZERO, Source.FieldMap.Outside.ZERO);
    }

    /** EMF of the pickup at the 13 instants 0.02 s, 0.02437 s, …, 0.07244 s (steps unrelated to the grids), volts. */
    private static double[] emfs(Source source) {
        SceneSolver solver = new SceneSolver(scene(source));
        double[] out = new double[13];
        for (int k = 0; k < out.length; k++) {
            out[k] = solver.at(0.02 + 0.00437 * k).conductors().get(0).emfV();
        }
        return out;
    }

    @Test
    void loopOverExportedMapMatchesTheMagnetAndConvergesAtThirdOrder() throws Exception {
        double[] exact = emfs(MAGNET);
        double peak = 0;
        for (double e : exact) {
            peak = Math.max(peak, Math.abs(e));
        }
        List<Double> rmsErrors = new ArrayList<>();
        for (int columns : new int[] {40, 80, 160}) {
            double[] mapped = emfs(exported(columns));
            double sumSq = 0;
            for (int k = 0; k < exact.length; k++) {
                sumSq += (mapped[k] - exact[k]) * (mapped[k] - exact[k]);
                if (Math.abs(exact[k]) > 0.05 * peak) {
                    assertEquals(Math.signum(exact[k]), Math.signum(mapped[k]), "polarity at instant " + k);
                }
            }
            rmsErrors.add(Math.sqrt(sumSq / exact.length));
        }
        System.out.printf("EMF peak %.4e V; RMS error at h = 0.8, 0.4, 0.2 mm: %.3e, %.3e, %.3e V%n", peak,
                rmsErrors.get(0), rmsErrors.get(1), rmsErrors.get(2));
        double order1 = Math.log(rmsErrors.get(0) / rmsErrors.get(1)) / Math.log(2);
        double order2 = Math.log(rmsErrors.get(1) / rmsErrors.get(2)) / Math.log(2);
        System.out.printf("observed orders %.3f, %.3f%n", order1, order2);
        assertTrue(rmsErrors.get(2) < 1e-3 * peak, "finest map within 0.1 % of the peak EMF: " + rmsErrors.get(2));
        assertEquals(3, order2, 0.4, "order as the spacing halves from 0.4 mm to 0.2 mm");
    }
}

package org.kinduct.solver.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.kinduct.scene.Vec2;

/** The mesh network is the planar dual of the cell-potential network of {@link SheetSolver}. */
class PlateNetworkTest {

    private static final SheetShape HOLED = new SheetShape(SheetShape.regularPolygon(Vec2.ZERO, 0.03, 60),
            List.of(SheetShape.regularPolygon(new Vec2(0.01, 0), 0.006, 5),
                    SheetShape.regularPolygon(new Vec2(-0.01, -0.004), 0.005, 8)));

    @Test
    void theCellPotentialSolveInvertsTheMeshResistances() {
        PlateNetwork network = new PlateNetwork(SheetGrid.withCells(HOLED, 40));
        assertEquals(2, network.holes);
        SplittableRandom random = new SplittableRandom(11);
        double[] r = new double[network.unknowns];
        for (int k = 0; k < r.length; k++) {
            r[k] = random.nextDouble(-1, 1);
        }
        double[] u = new double[network.unknowns];
        network.solveResistive(r, u, 1e-13, 500);
        double[] psi = new double[network.nodeCount];
        network.expand(u, psi);
        double[] back = new double[network.unknowns];
        network.addResistive(psi, 1, back);
        double worst = 0;
        for (int k = 0; k < r.length; k++) {
            worst = Math.max(worst, Math.abs(back[k] - r[k]));
        }
        // Kirchhoff round every mesh, holes included, to the potential solve's tolerance.
        assertEquals(0, worst, 1e-9, "largest mesh-EMF residual");
    }

    @Test
    void meshCurrentsGiveTheResistiveSolversFaceCurrents() {
        SheetGrid grid = SheetGrid.withCells(HOLED, 40);
        SheetConductor copper = SheetConductor.plate(5.8e7, 0.001);
        SheetDrive drive = SheetDrive.rigid(SheetFixtures.dipole(1, 0.004, 0.003, 0.005), new Vec2(1e-3, 2e-3), 0,
                Vec2.ZERO);
        SheetSolution cells = new SheetSolver(SheetSolver.Method.MULTIGRID, 1e-13, 200).solve(grid, copper, drive,
                Vec2.ZERO, List.of());
        PlateSolution meshes = PlateSolver.standard().prepare(grid, copper).steady(drive, Vec2.ZERO,
                EddyModel.SELF_FIELD, null);
        double scale = 0;
        double worst = 0;
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i <= grid.nx(); i++) {
                scale = Math.max(scale, Math.abs(cells.faceCurrentXA(i, j)));
                worst = Math.max(worst, Math.abs(cells.faceCurrentXA(i, j) - meshes.faceCurrentXA(i, j)));
            }
        }
        // At v/w = 8e-5 the own field changes the currents by about that much.
        System.out.printf("resistive face currents from meshes against cells at v/w = %.1e: %.1e relative%n",
                meshes.speedRatio(), worst / scale);
        assertEquals(0, worst, 3 * meshes.speedRatio() * scale);
    }
}

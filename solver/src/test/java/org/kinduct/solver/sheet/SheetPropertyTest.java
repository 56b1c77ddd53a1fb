package org.kinduct.solver.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.DoubleBinaryOperator;
import java.util.function.UnaryOperator;
import java.util.stream.LongStream;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.kinduct.scene.Vec2;

/**
 * Properties every solution has, over random plates with a hole under random small magnets (point
 * dipoles) in random rigid motion: the problem is linear in v × B, so reversing v reverses
 * potentials, currents and drag, and potentials and currents add when fields add (superposition);
 * with no −∂A/∂t the Joule power is the mechanical power taken, −F·V − τ·ω (energy conservation,
 * Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013, §8.1, from memory); nothing
 * depends on where the scene is or which way it faces (Euclidean invariance).
 */
class SheetPropertyTest {

    private static final int CASES = 12;
    private static final int CELLS = 48;
    private static final double SIGMA_S_PER_M = 3.5e7;
    private static final double THICKNESS_M = 0.001;
    private static final double TOLERANCE = 1e-12;
    /** Rounding and residual allowance relative to each quantity's scale; measured ≤ 1e-13. */
    private static final double ROUNDING = 1e-9;

    static Stream<Long> seeds() {
        return LongStream.range(0, CASES).map(k -> 0x5EE7_0000L + 977 * k).boxed();
    }

    /** A random plate, magnets and rigid motion. */
    private record Case(SheetShape shape, DoubleBinaryOperator field, Vec2 velocity, double omega, Vec2 pivot) {

        static Case random(long seed) {
            SplittableRandom r = new SplittableRandom(seed);
            SheetShape shape = SheetFixtures.randomPlateWithHole(r);
            DoubleBinaryOperator field = SheetFixtures.randomMagnets(r);
            return new Case(shape, field, new Vec2(r.nextDouble(-1, 1), r.nextDouble(-1, 1)), r.nextDouble(-20, 20),
                    new Vec2(r.nextDouble(-0.05, 0.05), r.nextDouble(-0.05, 0.05)));
        }

        SheetSolution solve(SheetGrid grid, DoubleBinaryOperator bz, Vec2 v, double w) {
            return new SheetSolver(SheetSolver.Method.MULTIGRID, TOLERANCE, 100).solve(grid,
                    SheetConductor.plate(SIGMA_S_PER_M, THICKNESS_M), SheetDrive.rigid(bz, v, w, pivot), pivot,
                    SheetFixtures.edgeElectrodes(shape));
        }

        SheetSolution solve(SheetGrid grid) {
            return solve(grid, field, velocity, omega);
        }

        /** The same scene with every point mapped by {@code place} and vectors by {@code turn}. */
        Case moved(UnaryOperator<Vec2> place, UnaryOperator<Vec2> turn, UnaryOperator<Vec2> unplace) {
            List<Vec2> outline = shape.outline().stream().map(place).toList();
            List<List<Vec2>> holes = new ArrayList<>();
            for (List<Vec2> hole : shape.holes()) {
                holes.add(hole.stream().map(place).toList());
            }
            DoubleBinaryOperator original = field;
            DoubleBinaryOperator movedField = (x, y) -> {
                Vec2 p = unplace.apply(new Vec2(x, y));
                return original.applyAsDouble(p.x(), p.y());
            };
            return new Case(new SheetShape(outline, holes), movedField, turn.apply(velocity), omega,
                    place.apply(pivot));
        }
    }

    private static double potentialScale(SheetGrid grid, SheetSolution solution) {
        double scale = 0;
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                if (grid.active(i, j)) {
                    scale = Math.max(scale, Math.abs(solution.potentialV(i, j)));
                }
            }
        }
        return scale;
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void reversingTheMotionReversesVoltagesAndDrag(long seed) {
        Case c = Case.random(seed);
        SheetGrid grid = SheetGrid.withCells(c.shape(), CELLS);
        SheetSolution forward = c.solve(grid);
        SheetSolution backward = c.solve(grid, c.field(), c.velocity().times(-1), -c.omega());
        double phi = potentialScale(grid, forward);
        double current = forward.peakCurrentDensityAPerM2();
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                if (grid.active(i, j)) {
                    assertEquals(-forward.potentialV(i, j), backward.potentialV(i, j), ROUNDING * phi,
                            "φ, seed " + seed);
                    assertEquals(-forward.currentDensityXAPerM2(i, j), backward.currentDensityXAPerM2(i, j),
                            ROUNDING * current, "J_x, seed " + seed);
                }
            }
        }
        for (String name : List.of("a", "b")) {
            assertEquals(-forward.electrodePotentialV(name), backward.electrodePotentialV(name), ROUNDING * phi,
                    "electrode " + name + ", seed " + seed);
        }
        double force = forward.forceN().length();
        assertEquals(-forward.forceN().x(), backward.forceN().x(), ROUNDING * force, "drag is odd in v, seed " + seed);
        assertEquals(-forward.forceN().y(), backward.forceN().y(), ROUNDING * force, "drag is odd in v, seed " + seed);
        assertEquals(-forward.torqueNm(), backward.torqueNm(), ROUNDING * Math.abs(forward.torqueNm()),
                "torque, seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void potentialAndCurrentAreLinearInTheField(long seed) {
        Case c = Case.random(seed);
        DoubleBinaryOperator other = SheetFixtures.randomMagnets(new SplittableRandom(seed ^ 0xB0B));
        SheetGrid grid = SheetGrid.withCells(c.shape(), CELLS);
        SheetSolution first = c.solve(grid);
        SheetSolution second = c.solve(grid, other, c.velocity(), c.omega());
        SheetSolution both = c.solve(grid, SheetFixtures.sum(c.field(), other), c.velocity(), c.omega());
        double phi = potentialScale(grid, first) + potentialScale(grid, second);
        double current = first.peakCurrentDensityAPerM2() + second.peakCurrentDensityAPerM2();
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                if (grid.active(i, j)) {
                    assertEquals(first.potentialV(i, j) + second.potentialV(i, j), both.potentialV(i, j),
                            ROUNDING * phi, "φ, seed " + seed);
                    assertEquals(first.currentDensityXAPerM2(i, j) + second.currentDensityXAPerM2(i, j),
                            both.currentDensityXAPerM2(i, j), ROUNDING * current, "J_x, seed " + seed);
                    assertEquals(first.currentDensityYAPerM2(i, j) + second.currentDensityYAPerM2(i, j),
                            both.currentDensityYAPerM2(i, j), ROUNDING * current, "J_y, seed " + seed);
                }
            }
        }
        assertEquals(first.electrodePotentialV("a") + second.electrodePotentialV("a"), both.electrodePotentialV("a"),
                ROUNDING * phi, "electrode, seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void joulePowerIsTheMechanicalPowerTaken(long seed) {
        Case c = Case.random(seed);
        SheetSolution solution = c.solve(SheetGrid.withCells(c.shape(), CELLS));
        double mechanical = -solution.forceN().dot(c.velocity()) - solution.torqueNm() * c.omega();
        System.out.printf("seed %d: Joule %.6e W, −F·V − τω %.6e W, relative difference %.1e%n", seed,
                solution.joulePowerW(), mechanical, (solution.joulePowerW() - mechanical) / solution.joulePowerW());
        assertEquals(solution.joulePowerW(), mechanical, ROUNDING * solution.joulePowerW(), "seed " + seed);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void dragMagnitudeDoesNotDependOnWhereOrWhichWayTheSceneIs(long seed) {
        Case c = Case.random(seed);
        SplittableRandom r = new SplittableRandom(seed ^ 0x70);
        Vec2 shift = new Vec2(r.nextDouble(-0.2, 0.2), r.nextDouble(-0.2, 0.2));
        double drag = c.solve(SheetGrid.withCells(c.shape(), CELLS)).forceN().length();

        // A shift moves the grid with the scene, so only rounding differs.
        Case shifted = c.moved(p -> p.plus(shift), v -> v, p -> p.minus(shift));
        assertEquals(drag, shifted.solve(SheetGrid.withCells(shifted.shape(), CELLS)).forceN().length(),
                ROUNDING * drag, "shifted, seed " + seed);

        // A quarter turn, (x, y) → (−y, x) exactly, maps the grid onto itself.
        Case quarter = c.moved(p -> new Vec2(-p.y(), p.x()), v -> new Vec2(-v.y(), v.x()),
                p -> new Vec2(p.y(), -p.x()));
        assertEquals(drag, quarter.solve(SheetGrid.withCells(quarter.shape(), CELLS)).forceN().length(),
                ROUNDING * drag, "quarter turn, seed " + seed);

        // Any other turn lays the grid differently over the scene: the magnitudes agree to the
        // discretization error, estimated from each orientation's change on halving the cells.
        double angle = r.nextDouble(0.1, 1.4);
        Case turned = c.moved(p -> p.rotate(angle), v -> v.rotate(angle), p -> p.rotate(-angle));
        double fine = c.solve(SheetGrid.withCells(c.shape(), 2 * CELLS)).forceN().length();
        double turnedCoarse = turned.solve(SheetGrid.withCells(turned.shape(), CELLS)).forceN().length();
        double turnedFine = turned.solve(SheetGrid.withCells(turned.shape(), 2 * CELLS)).forceN().length();
        double discretization = Math.abs(drag - fine) + Math.abs(turnedCoarse - turnedFine);
        System.out.printf("seed %d: |F| %.6e N, turned by %.3f rad: difference %.1e on %d cells (estimate %.1e),"
                + " %.1e on %d%n", seed, fine, angle, Math.abs(turnedCoarse - drag), CELLS, discretization,
                Math.abs(turnedFine - fine), 2 * CELLS);
        // Second order: the finer pair should differ by about a quarter of the coarse estimate.
        assertEquals(fine, turnedFine, discretization, "turned by " + angle + " rad, seed " + seed);
        assertTrue(discretization < 0.05 * drag, "the grids resolve the magnets, seed " + seed);
    }
}

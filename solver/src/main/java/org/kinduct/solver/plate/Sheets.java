package org.kinduct.solver.plate;

import java.util.ArrayList;
import java.util.List;
import org.kinduct.scene.Checks;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Kinematics;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.sheet.ChannelFlow;
import org.kinduct.solver.sheet.EddyModel;
import org.kinduct.solver.sheet.Electrode;
import org.kinduct.solver.sheet.Plate;
import org.kinduct.solver.sheet.PlateSolution;
import org.kinduct.solver.sheet.SheetConvergenceException;
import org.kinduct.solver.sheet.SheetGrid;
import org.kinduct.solver.sheet.SheetSolution;
import org.kinduct.solver.sheet.SheetSolver;

/**
 * The plates and channels of one scene, solved at any instant (the package comment states the
 * model). Grids are built once, on first use, and shared by every instant; {@link #at} may be
 * called from several threads at once.
 */
public final class Sheets {

    /** |voltage| at or below this, plus {@value #NOISE_FRACTION} of the conductor's potential span, names no + electrode. */
    static final double NOISE_ABS_V = 1e-12;
    /**
     * Relative part of the polarity threshold: the solve's relative residual (1e-10) leaves errors
     * of about that fraction of the potential span, so a billionth of it is noise.
     */
    static final double NOISE_FRACTION = 1e-9;

    private static final SheetSolver SOLVER = SheetSolver.multigrid();

    private final Scene scene;
    private final List<SheetModel> models;
    /** Whether the scene allows a fast plate its own field ({@link OwnField#allowed}). */
    private final boolean ownFieldAllowed;

    private Sheets(Scene scene, List<SheetModel> models) {
        this.scene = scene;
        this.models = models;
        ownFieldAllowed = OwnField.allowed(scene);
    }

    public static Sheets of(Scene scene) {
        Checks.nonNull(scene, "scene");
        List<SheetModel> models = new ArrayList<>();
        for (Conductor c : scene.conductors()) {
            if (c instanceof Conductor.Sheet sheet) {
                models.add(new SheetModel(sheet, scene));
            }
        }
        return new Sheets(scene, List.copyOf(models));
    }

    /** True when the scene has no plate or channel. */
    public boolean isEmpty() {
        return models.isEmpty();
    }

    /**
     * Every plate and channel at {@code tS}, in scene order, with bodies where {@code kinematics}
     * puts them.
     *
     * @throws IllegalArgumentException when a conductor's grid cannot be built (named in the message)
     */
    public List<SheetState> at(double tS, Kinematics kinematics) {
        if (models.isEmpty()) {
            return List.of();
        }
        PlacedSources sources = PlacedSources.at(scene, kinematics, tS);
        List<SheetState> states = new ArrayList<>(models.size());
        for (SheetModel m : models) {
            states.add(solve(m, sources, kinematics.poseAt(m.sheet().body(), tS), tS, ownFieldAllowed));
        }
        return states;
    }

    /**
     * One plate or channel at one instant: with the plate's own field where {@link OwnField} says
     * so, in the resistive limit otherwise.
     */
    private static SheetState solve(SheetModel m, PlacedSources sources, Pose pose, double tS,
                                    boolean ownFieldAllowed) {
        SheetGrid grid = m.grid();
        ChannelFlow flow = m.flowAt(tS);
        FrameDrive drive = new FrameDrive(sources, pose, flow);
        double reynolds = OwnField.reynolds(m, sources, pose, drive);
        if (OwnField.applies(ownFieldAllowed, m, pose, reynolds)) {
            try {
                return withOwnField(m, drive, pose, reynolds);
            } catch (SheetConvergenceException notConverged) {
                // Kept to the resistive limit at this instant, which every output then flags (Rm > 0.1):
                // a slotted plate far above w, or a shape with cells hanging on nearly closed faces.
            }
        }
        SheetSolution solution = SOLVER.solve(grid, m.material(), drive, pose.pivot(), m.electrodes());
        List<SheetState.Electrode> electrodes = new ArrayList<>();
        for (Electrode e : m.electrodes()) {
            Vec2 at = drive.place(e.pointM().x(), e.pointM().y());
            electrodes.add(new SheetState.Electrode(e.name(), at,
                    solution.electrodePotentialV(e.name()) + sources.gaugeV(at.x(), at.y())));
        }
        double noise = NOISE_ABS_V + NOISE_FRACTION * potentialSpanV(solution);
        List<SheetState.Pair> pairs = new ArrayList<>();
        for (Conductor.ElectrodePair p : m.sheet().pairs()) {
            SheetState.Electrode plus = find(electrodes, p.plus());
            SheetState.Electrode minus = find(electrodes, p.minus());
            double voltage = plus.potentialV() - minus.potentialV();
            double ideal = m.sheet() instanceof Conductor.Channel channel
                    ? idealVoltageV(channel, sources, p, flow.meanSpeedMPerS(), plus.atM(), minus.atM())
                    : Double.NaN;
            pairs.add(new SheetState.Pair(p.plus(), p.minus(), voltage, noise, ideal,
                    ideal != 0 && Double.isFinite(ideal) ? voltage / ideal : Double.NaN));
        }
        return new SheetState(m.sheet().id(), m.kind(), drive.toScene(solution.forceN()), solution.torqueNm(),
                pose.pivot().plus(pose.offset()), reach(m, pose), solution.joulePowerW(),
                solution.peakCurrentDensityAPerM2(), reynolds, EddyModel.RESISTIVE_LIMIT,
                grid.cellM(), flow == null ? Double.NaN : flow.meanSpeedMPerS(), electrodes, pairs,
                sources.inducedKnown(), Lattices.of(grid, solution::streamFunctionAPerM));
    }

    /** The plate's steady state in a still field with its own field ({@link Plate}); no electrodes. */
    private static SheetState withOwnField(SheetModel m, FrameDrive drive, Pose pose, double reynolds) {
        Plate plate = m.takePlate();
        try {
            PlateSolution solution = plate.steady(drive, pose.pivot(), EddyModel.SELF_FIELD, null);
            return new SheetState(m.sheet().id(), m.kind(), drive.toScene(solution.forceN()), solution.torqueNm(),
                    pose.pivot().plus(pose.offset()), reach(m, pose), solution.joulePowerW(),
                    solution.peakCurrentDensityAPerM2(), reynolds, EddyModel.SELF_FIELD, plate.grid().cellM(),
                    Double.NaN, List.of(), List.of(), true, Lattices.of(plate.grid(), solution::streamFunctionAPerM));
        } finally {
            m.giveBack(plate);
        }
    }

    /** The largest distance from the pivot to the outline, metres. */
    private static double reach(SheetModel m, Pose pose) {
        return m.sheet().outline().stream().mapToDouble(p -> p.minus(pose.pivot()).length()).max().orElseThrow();
    }

    /**
     * Shercliff's B·w·v̄ for a pair across the channel, signed as φ(plus) − φ(minus), with B_z at the
     * electrodes' midpoint: with J = 0 the potential rises by B·v̄ per metre across the flow to its
     * right (v × B = v̄·B·(t̂ × ẑ)), so the voltage is B·v̄·(minus − plus)·n̂, n̂ the left normal; NaN
     * for electrodes on one wall.
     */
    private static double idealVoltageV(Conductor.Channel channel, PlacedSources sources, Conductor.ElectrodePair p,
                                        double meanMPerS, Vec2 plusNow, Vec2 minusNow) {
        Vec2 plus = channel.electrodes().stream().filter(e -> e.name().equals(p.plus())).findFirst().orElseThrow().at();
        Vec2 minus = channel.electrodes().stream().filter(e -> e.name().equals(p.minus())).findFirst().orElseThrow()
                .at();
        double across = minus.minus(plus).dot(channel.direction().perp());
        if (Math.abs(across) < channel.widthM() / 2) {
            return Double.NaN;
        }
        Vec2 mid = plusNow.plus(minusNow).times(0.5);
        return sources.bzT(mid.x(), mid.y()) * meanMPerS * Math.signum(across) * channel.widthM();
    }

    private static SheetState.Electrode find(List<SheetState.Electrode> electrodes, String name) {
        return electrodes.stream().filter(e -> e.name().equals(name)).findFirst().orElseThrow();
    }

    /** Largest minus smallest cell potential, volts. */
    private static double potentialSpanV(SheetSolution solution) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        SheetGrid grid = solution.grid();
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                double phi = solution.potentialV(i, j);
                if (!Double.isNaN(phi)) {
                    min = Math.min(min, phi);
                    max = Math.max(max, phi);
                }
            }
        }
        return max - min;
    }
}

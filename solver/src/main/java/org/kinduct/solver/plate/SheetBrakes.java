package org.kinduct.solver.plate;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.function.DoubleConsumer;
import org.kinduct.scene.Body;
import org.kinduct.scene.Checks;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Kinematics;
import org.kinduct.solver.sheet.ChannelFlow;
import org.kinduct.solver.sheet.DriveShare;
import org.kinduct.solver.sheet.SheetSeries;
import org.kinduct.solver.sheet.SheetSolution;
import org.kinduct.solver.sheet.SheetSolver;

/**
 * The plates and channels of a coupled run as loads on its bodies (the package comment states the
 * model): at each evaluation of the run's equations every sheet that can move a free body — it
 * rides one, or some source rides one — is solved where the bodies are, giving its drag, its
 * torque about its body's pivot, its Joule heat, and each moving source body's share of the drag,
 * whose reaction that body takes. A scene whose bodies under sheets and sources all follow
 * prescribed paths has none: its sheets act on nothing the run integrates.
 *
 * <p>Each sheet is solved on the grid its instants use ({@link Sheets}), so the run's samples
 * report the drag that moved the bodies; each solve starts from the last one's potentials
 * ({@link SheetSeries}). Mutable: one per run, used by one thread.
 */
public final class SheetBrakes {

    private static final SheetSolver SOLVER = SheetSolver.multigrid();

    /**
     * One sheet's loads at one instant.
     *
     * @param bodyId the body the sheet rides
     * @param forceN the field's force on its eddy currents (the drag), newtons, scene axes
     * @param torqueNm its z torque about the body's pivot, N·m
     * @param jouleW Joule power d·∫|J|²/σ dA, watts
     * @param pumpW power a channel's pump supplies to keep its flow against the field's force on
     *        the liquid (−Σ F·u over the filaments, u the flow relative to the walls); 0 for a plate
     * @param driveW power the drives of AC source coils put into the currents (their −(di/dt)·A
     *        part of the EMF), watts
     * @param shares each moving source body's share of the force and torque (its sources' field
     *        on these currents); that body takes minus its share (Newton's third law)
     */
    public record Load(String bodyId, Vec2 forceN, double torqueNm, double jouleW, double pumpW, double driveW,
                       List<Share> shares) {

        public Load {
            shares = List.copyOf(shares);
        }
    }

    /**
     * The force (newtons, scene axes) of the sources riding {@code bodyId} on a sheet's currents,
     * and its z torque about the sheet body's pivot, N·m.
     */
    public record Share(String bodyId, Vec2 forceN, double torqueNm) {
    }

    private final Scene scene;
    private final List<SheetModel> models;
    private final List<SheetSeries> series;
    /** Source bodies that move (not still), in scene order. */
    private final List<String> movingSourceBodies;
    /** True when every source rides one body, whose share is then the whole force. */
    private final boolean oneSourceBody;

    private SheetBrakes(Scene scene, List<SheetModel> models) {
        this.scene = scene;
        this.models = models;
        series = new ArrayList<>();
        for (SheetModel m : models) {
            // No electrodes: the run needs no potentials, and the samples solve them anew.
            series.add(SOLVER.series(m.grid(), List.of()));
        }
        Set<String> bodies = new LinkedHashSet<>();
        scene.sources().forEach(s -> bodies.add(s.body()));
        oneSourceBody = bodies.size() == 1;
        movingSourceBodies = bodies.stream()
                .filter(b -> !(scene.body(b).orElseThrow().motion() instanceof Motion.Still)).toList();
    }

    /**
     * The sheets of {@code scene} that can move a free body.
     *
     * @throws IllegalArgumentException when a sheet's grid cannot be built (named in the message)
     */
    public static SheetBrakes of(Scene scene) {
        Checks.nonNull(scene, "scene");
        boolean freeSource = scene.sources().stream().map(Source::body).anyMatch(b -> free(scene, b));
        List<SheetModel> models = new ArrayList<>();
        for (Conductor c : scene.conductors()) {
            if (c instanceof Conductor.Sheet sheet && (freeSource || free(scene, sheet.body()))) {
                models.add(new SheetModel(sheet, scene));
            }
        }
        return new SheetBrakes(scene, List.copyOf(models));
    }

    private static boolean free(Scene scene, String bodyId) {
        return scene.body(bodyId).map(Body::motion).orElseThrow() instanceof Motion.Free;
    }

    /** True when no sheet can move a free body. */
    public boolean isEmpty() {
        return models.isEmpty();
    }

    /**
     * Every such sheet's loads at {@code tS} with the bodies where {@code kinematics} puts them,
     * in scene order; {@code beforeSolve} is called with tS before each solve (a run's stop check).
     */
    public List<Load> at(double tS, Kinematics kinematics, DoubleConsumer beforeSolve) {
        PlacedSources sources = PlacedSources.at(scene, kinematics, tS);
        PlacedSources alternating = sources.alternates() ? sources.alternatingOnly() : null;
        List<Load> loads = new ArrayList<>(models.size());
        for (int k = 0; k < models.size(); k++) {
            beforeSolve.accept(tS);
            SheetModel m = models.get(k);
            Pose pose = kinematics.poseAt(m.sheet().body(), tS);
            ChannelFlow flow = m.flowAt(tS);
            FrameDrive drive = new FrameDrive(sources, pose, flow);
            SheetSolution solution = series.get(k).solve(m.material(), drive, pose.pivot());
            Vec2 force = drive.toScene(solution.forceN());
            List<Share> shares = new ArrayList<>();
            for (String body : movingSourceBodies) {
                if (oneSourceBody) {
                    shares.add(new Share(body, force, solution.torqueNm()));
                } else {
                    DriveShare share = solution.shareOf(new FrameDrive(sources.riding(body), pose, flow));
                    shares.add(new Share(body, drive.toScene(share.forceN()), share.torqueNm()));
                }
            }
            double pump = flow == null ? 0 : solution.shareOf(new FlowDrive(drive, flow)).powerW();
            double ac = alternating == null ? 0
                    : solution.shareOf(new FrameDrive(alternating, pose, flow)).powerW();
            loads.add(new Load(m.sheet().body(), force, solution.torqueNm(), solution.joulePowerW(), pump, ac,
                    shares));
        }
        return loads;
    }
}

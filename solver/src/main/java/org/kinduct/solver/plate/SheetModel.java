package org.kinduct.solver.plate;

import java.util.ArrayList;
import java.util.DoubleSummaryStatistics;
import java.util.List;
import java.util.Queue;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.Semaphore;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Polygons;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.sheet.ChannelFlow;
import org.kinduct.solver.sheet.Electrode;
import org.kinduct.solver.sheet.Plate;
import org.kinduct.solver.sheet.PlateSolver;
import org.kinduct.solver.sheet.SheetConductor;
import org.kinduct.solver.sheet.SheetGrid;
import org.kinduct.solver.sheet.SheetShape;

/**
 * One plate or channel of a scene, ready to solve: its material, its electrodes moved onto the
 * edge they lie on (the file allows a millionth of the conductor's size off it), its cell size and,
 * built on first use and then kept, its grid in the body's drawn frame and, for a plate solved
 * with its own field, prepared solvers (one per thread at a time).
 */
final class SheetModel {

    /** An automatic cell size that splits a narrow neck is halved at most this often. */
    private static final int REFINEMENTS = 3;
    /**
     * A spinning plate's steady state with its own field is solved up to this Rm at the rim
     * (a rim speed of twice the characteristic speed w = 2/(μ0σd)): the solver's preconditioner
     * is that of a translation and converges slowly beyond (see {@link Plate}).
     */
    static final double MOST_SPIN_REYNOLDS = 4;
    /**
     * The own-field solve keeps about 95 vectors of the grid's nodes (flexible GMRES's basis and its
     * preconditioned copies, 81, and the FFT's padded arrays): beyond this many nodes (320², some
     * 80 MB a solver) a plate stays in the resistive limit, with the warning.
     */
    static final int MOST_OWN_FIELD_NODES = 320 * 320;
    /** Outline vertices within this fraction of one distance from the pivot make a plate round about it. */
    private static final double ROUND = 1e-3;
    private static final PlateSolver PLATE_SOLVER = PlateSolver.standard();
    /** Own-field solvers one plate may have at once: two, some 160 MB at the largest grid. */
    static final int MOST_SOLVERS = 2;

    private final Conductor.Sheet sheet;
    /** The motion of the body it rides. */
    private final Motion motion;
    private final SheetState.Kind kind;
    private final SheetConductor material;
    private final List<Electrode> electrodes;
    private final double requestedCellM;
    private final boolean automatic;
    private SheetGrid grid;
    /** Prepared own-field solvers not in use ({@link Plate} is not thread-safe). */
    private final Queue<Plate> plates = new ConcurrentLinkedQueue<>();
    /** At most {@value #MOST_SOLVERS} solvers per plate exist, whatever the cores; more threads wait. */
    private final Semaphore solvers = new Semaphore(MOST_SOLVERS);

    SheetModel(Conductor.Sheet sheet, Scene scene) {
        this.sheet = sheet;
        motion = scene.body(sheet.body()).orElseThrow().motion();
        kind = sheet instanceof Conductor.Channel ? SheetState.Kind.CHANNEL : SheetState.Kind.PLATE;
        material = sheet instanceof Conductor.Channel channel
                ? SheetConductor.liquid(channel.sigmaSPerM(), channel.depthM(), channel.widthM())
                : SheetConductor.plate(sheet.sigmaSPerM(), sheet.thicknessM());
        electrodes = new ArrayList<>();
        for (Conductor.Electrode e : sheet.electrodes()) {
            electrodes.add(new Electrode(e.name(), onEdge(e.at())));
        }
        automatic = sheet.cellM().isEmpty();
        requestedCellM = automatic ? CellSize.automatic(sheet, scene) : sheet.cellM().getAsDouble();
    }

    Conductor.Sheet sheet() {
        return sheet;
    }

    SheetState.Kind kind() {
        return kind;
    }

    SheetConductor material() {
        return material;
    }

    /** The electrodes in the drawn frame, each on the edge. */
    List<Electrode> electrodes() {
        return electrodes;
    }

    /**
     * The grid, built on first use: with the file's cell size, or the automatic one, halved up to
     * {@value #REFINEMENTS} times while its cells split a narrow neck of the shape.
     *
     * @throws IllegalArgumentException naming the conductor, when no grid can be built
     */
    synchronized SheetGrid grid() {
        if (grid == null) {
            SheetShape shape = new SheetShape(sheet.outline(), sheet.holes());
            double h = requestedCellM;
            for (int attempt = 0; grid == null; attempt++) {
                try {
                    grid = SheetGrid.withCellSize(shape, h);
                } catch (IllegalArgumentException e) {
                    if (!automatic || attempt == REFINEMENTS) {
                        throw new IllegalArgumentException(kind.name().toLowerCase(java.util.Locale.ROOT) + " '"
                                + sheet.id() + "': " + e.getMessage(), e);
                    }
                    h /= 2;
                }
            }
        }
        return grid;
    }

    /**
     * Whether this conductor's steady state with its own field is defined and solved for its body
     * at {@code pose} with Rm {@code reynolds}: a plate without electrodes (the own-field model has
     * currents, not potentials) whose body moves steadily, gliding at a constant velocity, or
     * spinning at a constant rate with a rim Rm up to {@value #MOST_SPIN_REYNOLDS} as a round disc
     * without holes about its pivot (then the spin leaves the plate where it was, and the steady
     * state is the same at every angle); and whose grid has at most
     * {@value #MOST_OWN_FIELD_NODES} nodes. An oscillating or accelerating plate has no steady
     * state: its currents lag its changing speed.
     */
    boolean ownFieldApplies(Pose pose, double reynolds) {
        SheetGrid g = grid();
        if (kind != SheetState.Kind.PLATE || !electrodes.isEmpty()
                || (long) (g.nx() + 1) * (g.ny() + 1) > MOST_OWN_FIELD_NODES) {
            return false;
        }
        if (motion instanceof Motion.Glide) {
            return true;
        }
        if (!(motion instanceof Motion.Spin) || reynolds > MOST_SPIN_REYNOLDS || !sheet.holes().isEmpty()) {
            return false;
        }
        DoubleSummaryStatistics radii = sheet.outline().stream()
                .mapToDouble(v -> v.minus(pose.pivot()).length()).summaryStatistics();
        return radii.getMax() - radii.getMin() <= ROUND * radii.getMax();
    }

    /**
     * A prepared own-field solver for this plate, to give back with {@link #giveBack} after use;
     * waits while {@value #MOST_SOLVERS} are in use.
     */
    Plate takePlate() {
        solvers.acquireUninterruptibly();
        try {
            Plate plate = plates.poll();
            return plate != null ? plate : PLATE_SOLVER.prepare(grid(), material);
        } catch (RuntimeException e) {
            solvers.release();
            throw e;
        }
    }

    void giveBack(Plate plate) {
        plates.add(plate);
        solvers.release();
    }

    /** A channel's flow in the drawn frame with mean velocity v̄ at {@code tS}; null for a plate. */
    ChannelFlow flowAt(double tS) {
        if (!(sheet instanceof Conductor.Channel c)) {
            return null;
        }
        ChannelFlow.Profile profile = switch (c.profile()) {
            case PLUG -> ChannelFlow.Profile.PLUG;
            case LAMINAR -> ChannelFlow.Profile.LAMINAR;
            case TURBULENT -> ChannelFlow.Profile.TURBULENT;
        };
        return new ChannelFlow(c.start(), c.end(), c.widthM(), c.flow().velocityAt(tS), profile);
    }

    /** The point of the outline or a hole's edge nearest to {@code p}. */
    private Vec2 onEdge(Vec2 p) {
        Vec2 best = Polygons.nearestEdgePoint(sheet.outline(), p);
        for (List<Vec2> hole : sheet.holes()) {
            Vec2 q = Polygons.nearestEdgePoint(hole, p);
            if (q.minus(p).length() < best.minus(p).length()) {
                best = q;
            }
        }
        return best;
    }
}

package org.kinduct.solver.run;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.stream.IntStream;
import org.hipparchus.exception.MathRuntimeException;
import org.kinduct.scene.Checks;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Scenes;
import org.kinduct.scene.TimeSpan;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.Kinematics;
import org.kinduct.solver.PairMemo;
import org.kinduct.solver.SceneField;
import org.kinduct.solver.SceneSolver;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;
import org.kinduct.solver.circuit.InductanceAtStart;
import org.kinduct.solver.circuit.LoopInductance;
import org.kinduct.solver.dynamics.CoupledRun;
import org.kinduct.solver.dynamics.CoupledSimulation;
import org.kinduct.solver.dynamics.EnergyAudit;
import org.kinduct.solver.dynamics.RunMonitor;
import org.kinduct.solver.dynamics.SimulationCancelledException;
import org.kinduct.solver.field.WorkTally;
import org.kinduct.solver.plate.Sheets;
import org.kinduct.solver.sheet.SheetConvergenceException;

/**
 * The one way Kinduct turns a scene into results, for the editor, the exports and the command
 * line alike: it decides the {@link RunPlan} (quasi-static instants or one coupled run), makes
 * the {@link RunResult} of the requested window, and answers for single instants by the same
 * rule, so that any two outputs of one state agree by construction.
 *
 * <p>A single instant of an INSTANTS plan is solved exactly on its own (the same function each
 * sample of the window comes from); in a COUPLED run an instant's state depends on the run from
 * t0, so it is the run's sample: exactly, when asked for in the request ({@link RunRequest#alsoAt}),
 * else the nearest grid sample.
 *
 * <p>Costly work (the plan needs the loops' inductances; the result needs every sample) is done
 * on first use and kept (the plan apart from the run: asking for it never waits for the run); the
 * methods may block while another thread computes, so an interactive
 * caller calls them from a worker, never from its display thread. A coupled run reports to the
 * run's {@link RunMonitor} and stops when it asks
 * ({@link org.kinduct.solver.dynamics.SimulationCancelledException}; a later call starts it anew).
 * Thread-safe.
 *
 * <p>A scene drawn far from (0, 0) compared with its size is solved about its own centre
 * ({@link LocalOrigin}) and its results are moved back: coordinates like 100 km + 1 cm leave
 * fluxes and EMFs about 1e-10 of their digits instead of 1e-6 (more where differences of
 * coordinates multiply), and the two-method check keeps reporting.
 */
public final class SceneRun {

    /**
     * Field evaluations one quasi-static instant may make ({@link WorkTally}): about half a minute.
     * The costliest instants of the demos and benchmarks make well under 10⁷ (6400 magnet–loop
     * pairs: about 8·10⁶); a plate drawn 100 km across with a magnet touching the plane (found by
     * fuzzing) would have taken hours.
     */
    static final long MAX_INSTANT_EVALUATIONS = 100_000_000L;

    private final Scene scene;
    /** The scene as solved: moved so that {@link #origin} is at (0, 0). */
    private final Scene local;
    private final Vec2 origin;
    private final RunRequest request;
    /** Conductor states of {@link #local}, prescribed motion. */
    private final SceneSolver prescribed;
    /** Fields of the scene where it is drawn, prescribed motion. */
    private final SceneSolver fields;
    /** Prescribed motion of the scene where it is drawn, which plates and channels are solved in. */
    private final Kinematics motions;
    private final Sheets sheets;
    private final RunMonitor monitor;
    private final boolean parallel;
    private InductanceAtStart inductance;
    private RunPlan plan;
    /**
     * Guards {@link #result}, apart from the plan's lock: a caller asking for the plan (to know
     * whether a long run is coming) gets it while another thread is in the middle of the run.
     */
    private final Object resultLock = new Object();
    private RunResult result;

    /** The scene's own window with the circuit model chosen automatically, instants on every core. */
    public SceneRun(Scene scene) {
        this(scene, RunRequest.of(Checks.nonNull(scene, "scene")), RunMonitor.NONE, true);
    }

    /**
     * @param monitor follows a coupled run's progress and may stop it
     * @param parallel whether quasi-static instants are solved on every core (an interactive
     *        caller may keep cores free for its display)
     */
    public SceneRun(Scene scene, RunRequest request, RunMonitor monitor, boolean parallel) {
        this(scene, request, monitor, parallel, PairMemo.NONE);
    }

    /**
     * As {@link #SceneRun(Scene, RunRequest, RunMonitor, boolean)}, sharing rigid pairs' integrals
     * with the runs of other variants of the scene through {@code memo} (the results are the same).
     */
    public SceneRun(Scene scene, RunRequest request, RunMonitor monitor, boolean parallel, PairMemo memo) {
        this.scene = Checks.nonNull(scene, "scene");
        this.request = Checks.nonNull(request, "request");
        this.monitor = Checks.nonNull(monitor, "monitor");
        this.parallel = parallel;
        Vec2 centre = LocalOrigin.of(scene);
        Scene moved = centre.equals(Vec2.ZERO) ? scene : movedOrNull(scene, centre);
        this.origin = moved == null ? Vec2.ZERO : centre;
        this.local = moved == null ? scene : moved;
        this.prescribed = new SceneSolver(local, Kinematics.prescribed(local), memo);
        this.fields = origin.equals(Vec2.ZERO) ? prescribed : new SceneSolver(scene);
        this.motions = Kinematics.prescribed(scene);
        this.sheets = Sheets.of(scene);
    }

    public Scene scene() {
        return scene;
    }

    public RunRequest request() {
        return request;
    }

    /** The loops' inductances at the start of the window. */
    public synchronized InductanceAtStart inductanceAtStart() {
        if (inductance == null) {
            try {
                inductance = InductanceAtStart.of(local, request.window().t0S());
            } catch (IllegalArgumentException refused) {
                throw new RunFailedException(refused.getMessage(), refused);
            }
        }
        return inductance;
    }

    /** How the window is computed; see {@link RunPlan}. */
    public synchronized RunPlan plan() {
        if (plan == null) {
            try {
                plan = RunPlan.choose(scene, request, inductanceAtStart());
            } catch (IllegalArgumentException refused) {
                // A loop whose inductance could not be computed leaves no circuit model to choose.
                throw new RunFailedException(refused.getMessage(), refused);
            }
        }
        return plan;
    }

    /** The whole run, computed on first use. */
    public RunResult result() {
        synchronized (resultLock) {
            if (result == null) {
                RunResult run = plan().coupled() ? coupled() : instants();
                result = run.withAlternatingPickup(AlternatingPickup.of(scene, run.samples(), run.kinematics(),
                        parallel));
            }
            return result;
        }
    }

    /** The run's state at {@code tS}: exact for quasi-static instants, else as the class comment says. */
    public Snapshot instant(double tS) {
        Checks.finite(tS, "time");
        if (!plan().coupled()) {
            return FiniteResults.require(solveInstant(tS, inductanceAtStart()));
        }
        RunResult run = result();
        return request.extraInstantsS().contains(tS) ? run.at(tS) : run.nearest(tS);
    }

    /**
     * A result holding the one instant {@code tS} (as {@code kinduct solve --at} reports it): solved
     * on its own for quasi-static instants, else from a coupled run of the window stretched to
     * reach tS if need be, with tS sampled exactly.
     */
    public RunResult instantResult(double tS) {
        if (!plan().coupled()) {
            return result(List.of(solveInstant(tS, inductanceAtStart())), List.of(), null);
        }
        SceneRun stretched = new SceneRun(scene, request.alsoAt(tS), monitor, parallel);
        Snapshot at = stretched.instant(tS);
        return new RunResult(scene, stretched.plan(), List.of(at), List.of(), null, stretched.inductanceAtStart());
    }

    /** The summed field of all sources at {@code tS}, free bodies placed as the run moves them. */
    public SceneField fieldAt(double tS) {
        return placement().fieldAt(tS);
    }

    /**
     * The summed field of the sources {@code sourceIds} at {@code tS}; needs no run when none of
     * them rides a free body.
     */
    public SceneField fieldOf(double tS, Set<String> sourceIds) {
        boolean free = scene.sources().stream().anyMatch(s -> sourceIds.contains(s.id())
                && scene.body(s.body()).orElseThrow().motion() instanceof Motion.Free);
        return (free ? placement() : fields).fieldOf(tS, sourceIds);
    }

    /** A solver placing free bodies where the run has them (prescribed placement when there are none). */
    private SceneSolver placement() {
        if (scene.bodies().stream().noneMatch(b -> b.motion() instanceof Motion.Free)) {
            return fields;
        }
        return new SceneSolver(scene, result().kinematics());
    }

    private RunResult coupled() {
        TimeSpan w = request.window();
        int steps = w.steps();
        double gridEnd = w.at(steps);
        // The run counts its grid with a fixed slack that rounding can defeat on long windows
        // (dynamics.SampleTimes), dropping the last grid instant; asked for as a further instant
        // it is sampled whichever way the count goes.
        List<Double> extras = new ArrayList<>(request.extraInstantsS());
        extras.add(gridEnd);
        WorkBudget budget = new WorkBudget(monitor, steps + 1 + request.extraInstantsS().size());
        CoupledRun run;
        try {
            run = new CoupledSimulation(CoupledSimulation.DEFAULT_RELATIVE_TOLERANCE, plan().circuit())
                    .simulate(local, w.t0S(), Math.max(w.t1S(), gridEnd), w.dtS(), extras, budget);
        } catch (SimulationCancelledException stopped) {
            if (budget.exceeded()) {
                throw new RunFailedException(budget.reason(w.dtS()), stopped);
            }
            throw stopped;
        } catch (IllegalArgumentException | MathRuntimeException | SheetConvergenceException failed) {
            throw new RunFailedException("the coupled run stopped: " + failed.getMessage(), failed);
        }
        List<Snapshot> samples = new ArrayList<>(run.samples().stream().map(this::drawn).toList());
        List<Snapshot> further = new ArrayList<>(run.extras().stream().map(this::drawn).toList());
        int at = 0;
        while (further.get(at).tS() != gridEnd) {
            at++;
        }
        Snapshot end = further.remove(at);
        if (samples.size() == steps) {
            samples.add(end);
        }
        if (request.extraInstantsS().contains(gridEnd)) {
            further.add(at, end);
        }
        RunResult result = result(samples, further, run.audit());
        if (sheets.isEmpty()) {
            return result;
        }
        // The run's samples carry the free bodies' poses; the plates and channels are solved there
        // on the grids the run's equations used, so they report the drag that moved the bodies.
        Kinematics moved = result.kinematics();
        return new RunResult(scene, plan(), withSheets(result.samples(), moved), withSheets(further, moved),
                run.audit(), inductanceAtStart());
    }

    private List<Snapshot> withSheets(List<Snapshot> states, Kinematics kinematics) {
        return (parallel ? states.parallelStream() : states.stream())
                .map(s -> s.withSheets(sheetsAt(s.tS(), kinematics))).toList();
    }

    private RunResult instants() {
        TimeSpan w = request.window();
        int count = w.steps() + 1;
        // Read once here: the instants may run on other threads, which must not wait for this one's lock.
        InductanceAtStart start = inductanceAtStart();
        InstantProgress progress = new InstantProgress(monitor, count);
        IntStream k = IntStream.range(0, count);
        List<Snapshot> samples = (parallel ? k.parallel() : k).mapToObj(i -> {
            progress.checkCancelled();
            Snapshot s = solveInstant(w.at(i), start);
            progress.done();
            return s;
        }).toList();
        List<Snapshot> extras = request.extraInstantsS().stream().sorted().map(t -> solveInstant(t, start)).toList();
        return result(samples, extras, null);
    }

    private RunResult result(List<Snapshot> samples, List<Snapshot> extras, EnergyAudit audit) {
        samples.forEach(FiniteResults::require);
        extras.forEach(FiniteResults::require);
        return new RunResult(scene, plan(), samples, extras, FiniteResults.require(audit), inductanceAtStart());
    }

    /**
     * One quasi-static instant with each closed loop's self-inductance where it is: a loop whose
     * vertices all ride one body keeps the inductance it has at the start (rigid motion leaves it
     * unchanged); a loop that changes shape (a bar on rails) gets it computed anew.
     */
    private Snapshot solveInstant(double tS, InductanceAtStart start) {
        try {
            return WorkTally.within(MAX_INSTANT_EVALUATIONS, () -> solveInstantUnbounded(tS, start));
        } catch (WorkTally.AllowanceExceededException over) {
            throw new RunFailedException(String.format(Locale.ROOT, "the instant at t = %.6g s would need more than"
                    + " %.1e field evaluations (about half a minute): a plate or loop far larger than the"
                    + " fields it lies in, or a magnet touching the plane under a coarse grid, makes that;"
                    + " draw it smaller or give the plate a cell size", tS, (double) MAX_INSTANT_EVALUATIONS), over);
        }
    }

    private Snapshot solveInstantUnbounded(double tS, InductanceAtStart start) {
        Snapshot s = prescribed.at(tS);
        List<ConductorState> states = new ArrayList<>(s.conductors().size());
        for (ConductorState state : s.conductors()) {
            Conductor conductor = scene.conductor(state.id()).orElseThrow();
            if (conductor instanceof Conductor.Loop loop && !loop.open()) {
                state = state.withInductance(rigid(loop) ? start.selfH(loop.id()) : selfNow(loop, state.vertices()));
            }
            states.add(state);
        }
        // Plates and channels are solved where the scene is drawn, after the move back.
        return drawn(new Snapshot(s.tS(), states, s.freeBodies())).withSheets(sheetsAt(tS, motions));
    }

    /** A state of {@link #local} where the scene is drawn. */
    private Snapshot drawn(Snapshot local) {
        return origin.equals(Vec2.ZERO) ? local : local.movedBy(origin);
    }

    /**
     * {@code scene} moved so that {@code centre} is at (0, 0), or null when the move's rounding
     * leaves a shape its model refuses (a plate's hole that only just fits, say): such a scene is
     * solved where it is drawn.
     */
    private static Scene movedOrNull(Scene scene, Vec2 centre) {
        try {
            return Scenes.movedBy(scene, centre.times(-1));
        } catch (IllegalArgumentException refused) {
            return null;
        }
    }

    /**
     * The plates and channels at {@code tS}; a shape whose grid cannot be built (the region work
     * counts points within a ten-billionth of its size as one, finer than the model's own checks),
     * or whose solve does not converge (a sliver a million times longer than wide, found by
     * fuzzing), stops the run with the reason.
     */
    private List<SheetState> sheetsAt(double tS, Kinematics kinematics) {
        try {
            return sheets.at(tS, kinematics);
        } catch (IllegalArgumentException | SheetConvergenceException refused) {
            throw new RunFailedException("a plate or channel cannot be solved: " + refused.getMessage(), refused);
        }
    }

    private static boolean rigid(Conductor.Loop loop) {
        return loop.vertices().stream().allMatch(v -> v.bodyOr(loop.body()).equals(loop.body()));
    }

    private static double selfNow(Conductor.Loop loop, List<Vec2> vertices) {
        try {
            return LoopInductance.self(vertices, loop.wire().diameterM() / 2, loop.turns());
        } catch (IllegalArgumentException refused) {
            return Double.NaN;
        }
    }
}

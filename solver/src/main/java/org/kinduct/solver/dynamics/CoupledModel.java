package org.kinduct.solver.dynamics;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.CholeskyDecomposition;
import org.kinduct.scene.Body;
import org.kinduct.scene.Conductor;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.EdgeSums;
import org.kinduct.solver.Kinematics;
import org.kinduct.solver.LoopResistance;
import org.kinduct.solver.SourceFields;
import org.kinduct.solver.circuit.LoopInductance;
import org.kinduct.solver.field.PlaneField;

/**
 * The scene resolved to indices, and the coupled equations' right-hand side; the physics is
 * stated in {@link CoupledSimulation}.
 *
 * <p>State layout: per free body (x, y, θ, vx, vy, ω) of its pivot offset and angle; for the
 * {@link CircuitModel#INDUCTIVE} model per closed loop its total linkage less its external
 * linkage at the start, Ψ_k − λ_ext,k(t0) with Ψ_k = Σ_j M_kj I_j + λ_ext,k: a constant shift that
 * keeps the state's rounding at the scale of the loop's own flux L·I, not of a large steady
 * external flux, whose last bits would otherwise drift over many steps and read as a current
 * (measured: 1 µA in a loop gliding inside a uniform 0.5 T region). The
 * {@link CircuitModel#QUASI_STATIC} model has no circuit states. Then the running energy integrals
 * (applied, holding, drive, Joule, damping).
 */
final class CoupledModel {

    static final int BODY_DOFS = 6;
    static final int AUDIT_TERMS = 5;
    static final int APPLIED = 0;
    static final int HOLDING = 1;
    static final int DRIVE = 2;
    static final int JOULE = 3;
    static final int DAMPING = 4;

    /** Finite-difference steps for loop–loop forces: a fraction of the smallest loop size, and radians. */
    private static final double SPACE_STEP_FRACTION = 1e-5;
    private static final double ANGLE_STEP_RAD = 1e-5;

    private final Scene scene;
    private final List<Body> bodies;
    private final Map<String, Integer> bodyIndex = new HashMap<>();
    /** State offset of each body's dofs, −1 for prescribed bodies. */
    private final int[] freeSlot;
    private final List<Source> sources;
    private final int[] sourceBody;
    private final Source.SourceCoil[] unitCoils;
    private final List<Circuit> loops = new ArrayList<>();
    private final double[][] constantM;
    /** Bodies that move on a prescribed path (not free, not still). */
    private final boolean[] drivenPath;
    private final boolean anyVariableM;
    /** True when some source moves or has an AC drive, so a loop held still sees a changing flux. */
    private final boolean sourcesVary;
    private final CircuitModel circuitModel;
    private final double spaceStepM;
    private final double timeStepS;
    private final int loopOffset;
    private final int auditOffset;
    /** Each closed loop's external linkage at the start, webers: the shift of its circuit state. */
    private final double[] startLinkage;

    /** A closed loop with everything the circuit equations need. */
    record Circuit(Conductor.Loop loop, int[] vertexBody, Vec2[] drawn, double wireRadiusM, int rigidBody) {
    }

    /**
     * @param timeStepS time step of the difference quotients of prescribed motion, seconds
     * @param circuitModel INDUCTIVE or QUASI_STATIC ({@link CircuitModel#resolveFor} resolves AUTO)
     */
    CoupledModel(Scene scene, double timeStepS, CircuitModel circuitModel) {
        if (circuitModel == CircuitModel.AUTO) {
            throw new IllegalArgumentException("the coupled model needs a resolved circuit model, not AUTO");
        }
        this.scene = scene;
        this.timeStepS = timeStepS;
        bodies = scene.bodies();
        freeSlot = new int[bodies.size()];
        drivenPath = new boolean[bodies.size()];
        int slot = 0;
        for (int b = 0; b < bodies.size(); b++) {
            bodyIndex.put(bodies.get(b).id(), b);
            Motion motion = bodies.get(b).motion();
            freeSlot[b] = motion instanceof Motion.Free ? slot : -1;
            drivenPath[b] = !(motion instanceof Motion.Free) && !(motion instanceof Motion.Still);
            slot += freeSlot[b] >= 0 ? BODY_DOFS : 0;
        }
        sources = scene.sources();
        sourceBody = new int[sources.size()];
        unitCoils = new Source.SourceCoil[sources.size()];
        boolean varying = false;
        for (int s = 0; s < sources.size(); s++) {
            sourceBody[s] = bodyIndex.get(sources.get(s).body());
            varying |= !(bodies.get(sourceBody[s]).motion() instanceof Motion.Still);
            if (sources.get(s).alternates() && sources.get(s) instanceof Source.SourceCoil coil) {
                unitCoils[s] = new Source.SourceCoil(coil.id(), coil.body(), coil.shape(), coil.turns(),
                        coil.planeZM(), Source.Drive.dc(1));
                varying = true;
            }
        }
        sourcesVary = varying;
        double smallest = Double.POSITIVE_INFINITY;
        for (Conductor c : scene.conductors()) {
            if (c instanceof Conductor.Loop loop && !loop.open()) {
                int n = loop.vertices().size();
                int[] vb = new int[n];
                Vec2[] drawn = new Vec2[n];
                boolean rigid = true;
                for (int i = 0; i < n; i++) {
                    vb[i] = bodyIndex.get(loop.vertices().get(i).bodyOr(loop.body()));
                    drawn[i] = loop.vertices().get(i).at();
                    rigid &= vb[i] == vb[0];
                }
                loops.add(new Circuit(loop, vb, drawn, loop.wire().diameterM() / 2, rigid ? vb[0] : -1));
                smallest = Math.min(smallest, extent(drawn));
            }
        }
        spaceStepM = SPACE_STEP_FRACTION * (smallest < Double.POSITIVE_INFINITY ? smallest : 1);
        int n = loops.size();
        constantM = new double[n][n];
        boolean variable = false;
        Pose[] drawnPoses = new Pose[bodies.size()];
        for (int b = 0; b < drawnPoses.length; b++) {
            drawnPoses[b] = Pose.rest(bodies.get(b).pivot());
        }
        for (int k = 0; k < n; k++) {
            for (int j = k; j < n; j++) {
                boolean fixed = loops.get(k).rigidBody() >= 0 && loops.get(k).rigidBody() == loops.get(j).rigidBody();
                constantM[k][j] = fixed ? entry(k, j, drawnPoses) : Double.NaN;
                constantM[j][k] = constantM[k][j];
                variable |= !fixed;
            }
        }
        anyVariableM = variable;
        this.circuitModel = circuitModel;
        loopOffset = slot;
        auditOffset = slot + (inductive() ? n : 0);
        startLinkage = new double[auditOffset - loopOffset];
    }

    /** The circuit model this run uses (never AUTO). */
    CircuitModel circuitModel() {
        return circuitModel;
    }

    private boolean inductive() {
        return circuitModel == CircuitModel.INDUCTIVE;
    }

    /** Offset of the loops' Ψ states; there are {@code auditOffset() − loopOffset()} of them. */
    int loopOffset() {
        return loopOffset;
    }

    int dimension() {
        return auditOffset + AUDIT_TERMS;
    }

    int auditOffset() {
        return auditOffset;
    }

    List<Circuit> loops() {
        return loops;
    }

    List<Body> bodies() {
        return bodies;
    }

    Scene scene() {
        return scene;
    }

    /** State at t0: free bodies as drawn with their initial velocities, no loop current, nothing spent yet. */
    double[] initialState(double t0S) {
        double[] y = new double[dimension()];
        for (int b = 0; b < bodies.size(); b++) {
            if (freeSlot[b] >= 0) {
                Motion.Free free = (Motion.Free) bodies.get(b).motion();
                y[freeSlot[b] + 3] = free.initialVelocity().x();
                y[freeSlot[b] + 4] = free.initialVelocity().y();
                y[freeSlot[b] + 5] = free.inertiaKgM2() > 0 ? free.initialOmegaRadPerS() : 0;
            }
        }
        Pose[] poses = poses(t0S, y);
        PlaneField[] fields = fields(t0S, poses);
        for (int k = 0; k < startLinkage.length; k++) {
            startLinkage[k] = externalLinkage(k, poses, fields);
        }
        // No current at the start: Ψ_k = λ_ext,k(t0), so the shifted state starts at 0.
        return y;
    }

    /** Size of the loops (the largest extent of a loop as drawn), metres; 1 m without loops. */
    double lengthScaleM() {
        double size = 0;
        for (Circuit c : loops) {
            size = Math.max(size, extent(c.drawn()));
        }
        return size > 0 ? size : 1;
    }

    /** The largest distance between two of the points, metres (positive for a valid loop). */
    private static double extent(Vec2[] points) {
        double size = 0;
        for (Vec2 p : points) {
            for (Vec2 q : points) {
                size = Math.max(size, p.minus(q).length());
            }
        }
        return size;
    }

    /**
     * Body poses near t for state y: prescribed bodies on their paths, free bodies carried along
     * their velocities at t (exact to first order, which is what the quasi-static solver's
     * difference quotients at t need).
     */
    Kinematics kinematicsAround(double tS, double[] y) {
        Pose[] now = poses(tS, y);
        return (bodyId, t) -> {
            Integer b = bodyIndex.get(bodyId);
            if (b == null) {
                throw new IllegalArgumentException("no body '" + bodyId + "'");
            }
            return poseAround(b, now, tS, t);
        };
    }

    /** Body b at time t near tS: on its path if prescribed, carried along its velocity if free. */
    private Pose poseAround(int b, Pose[] now, double tS, double t) {
        if (freeSlot[b] < 0) {
            return bodies.get(b).poseAt(t);
        }
        Pose p = now[b];
        double dt = t - tS;
        return new Pose(p.pivot(), p.offset().plus(p.velocity().times(dt)), p.angleRad() + p.omegaRadPerS() * dt,
                p.velocity(), p.omegaRadPerS());
    }

    /** The sources' fields at t, their bodies carried from their poses at tS ({@link #poseAround}). */
    private PlaneField[] fieldsAround(Pose[] now, double tS, double t) {
        PlaneField[] fields = new PlaneField[sources.size()];
        for (int s = 0; s < fields.length; s++) {
            fields[s] = SourceFields.place(sources.get(s), poseAround(sourceBody[s], now, tS, t), t);
        }
        return fields;
    }

    /** Every body's pose at t for state y. */
    Pose[] poses(double tS, double[] y) {
        Pose[] poses = new Pose[bodies.size()];
        for (int b = 0; b < poses.length; b++) {
            Body body = bodies.get(b);
            int f = freeSlot[b];
            poses[b] = f < 0 ? body.poseAt(tS)
                    : new Pose(body.pivot(), new Vec2(y[f], y[f + 1]), y[f + 2], new Vec2(y[f + 3], y[f + 4]), y[f + 5]);
        }
        return poses;
    }

    PlaneField[] fields(double tS, Pose[] poses) {
        PlaneField[] fields = new PlaneField[sources.size()];
        for (int s = 0; s < fields.length; s++) {
            fields[s] = SourceFields.place(sources.get(s), poses[sourceBody[s]], tS);
        }
        return fields;
    }

    /** The evaluated right-hand side and everything the samples and the audit report. */
    Evaluation evaluate(double tS, double[] y) {
        return new Evaluation(tS, y);
    }

    /** λ_ext,k = N·Σ_s Φ_s, the loop's linkage with the scene's sources, webers. */
    private double externalLinkage(int k, Pose[] poses, PlaneField[] fields) {
        double[][] xy = place(k, poses);
        double flux = 0;
        for (PlaneField field : fields) {
            flux += field.flux(xy[0], xy[1]);
        }
        return loops.get(k).loop().turns() * flux;
    }

    private double[][] place(int k, Pose[] poses) {
        Circuit c = loops.get(k);
        int n = c.drawn().length;
        double[][] xy = new double[2][n];
        for (int i = 0; i < n; i++) {
            Vec2 p = poses[c.vertexBody()[i]].place(c.drawn()[i]);
            xy[0][i] = p.x();
            xy[1][i] = p.y();
        }
        return xy;
    }

    List<Vec2> placedVertices(int k, Pose[] poses) {
        Circuit c = loops.get(k);
        List<Vec2> out = new ArrayList<>(c.drawn().length);
        for (int i = 0; i < c.drawn().length; i++) {
            out.add(poses[c.vertexBody()[i]].place(c.drawn()[i]));
        }
        return out;
    }

    /** True when some vertex of loop k rides a body marked in {@code marked}. */
    private boolean rides(int k, boolean[] marked) {
        for (int body : loops.get(k).vertexBody()) {
            if (marked[body]) {
                return true;
            }
        }
        return false;
    }

    private double entry(int k, int j, Pose[] poses) {
        Circuit a = loops.get(k);
        if (k == j) {
            return LoopInductance.self(placedVertices(k, poses), a.wireRadiusM(), a.loop().turns());
        }
        Circuit b = loops.get(j);
        return LoopInductance.mutual(placedVertices(k, poses), a.wireRadiusM(), a.loop().turns(),
                placedVertices(j, poses), b.wireRadiusM(), b.loop().turns());
    }

    /** The inductance matrix of the closed loops at these poses, henries. */
    double[][] inductance(Pose[] poses) {
        int n = loops.size();
        double[][] m = new double[n][n];
        for (int k = 0; k < n; k++) {
            for (int j = k; j < n; j++) {
                m[k][j] = Double.isNaN(constantM[k][j]) ? entry(k, j, poses) : constantM[k][j];
                m[j][k] = m[k][j];
            }
        }
        return m;
    }

    private static double quadratic(double[][] m, double[] current) {
        double sum = 0;
        for (int k = 0; k < current.length; k++) {
            for (int j = 0; j < current.length; j++) {
                sum += current[k] * m[k][j] * current[j];
            }
        }
        return 0.5 * sum;
    }

    /** One evaluation of the coupled equations at (t, y). */
    final class Evaluation {

        final double tS;
        final Pose[] poses;
        final double[] externalLinkage;
        /** The inductance matrix, henries; null for the quasi-static model, which does not need it. */
        final double[][] inductance;
        final double[] current;
        final double[] resistance;
        /** Magnetic force on each loop from the sources, N (loop–loop forces not included). */
        final Vec2[] loopForce;
        final double[] derivative;
        private final double[] fx;
        private final double[] fy;
        private final double[] torque;

        private Evaluation(double tS, double[] y) {
            this.tS = tS;
            poses = poses(tS, y);
            PlaneField[] fields = fields(tS, poses);
            int n = loops.size();
            externalLinkage = new double[n];
            resistance = new double[n];
            double[][] xs = new double[n][];
            double[][] ys = new double[n][];
            for (int k = 0; k < n; k++) {
                double[][] xy = place(k, poses);
                xs[k] = xy[0];
                ys[k] = xy[1];
                double flux = 0;
                for (PlaneField field : fields) {
                    flux += field.flux(xs[k], ys[k]);
                }
                externalLinkage[k] = loops.get(k).loop().turns() * flux;
                resistance[k] = resistance(loops.get(k).loop(), xs[k], ys[k]);
            }
            int nb = bodies.size();
            fx = new double[nb];
            fy = new double[nb];
            torque = new double[nb];
            EdgeTotals[] perAmpereTurn = new EdgeTotals[n];
            for (int k = 0; k < n; k++) {
                perAmpereTurn[k] = edgeTotals(k, xs[k], ys[k], fields);
            }
            if (inductive()) {
                inductance = inductance(poses);
                current = solve(inductance, y, externalLinkage);
            } else {
                inductance = null;
                current = new double[n];
                for (int k = 0; k < n; k++) {
                    double emf = loops.get(k).loop().turns()
                            * (perAmpereTurn[k].motionalV + transformerEmfPerTurn(xs[k], ys[k]));
                    current[k] = emf / resistance[k];
                }
            }
            loopForce = new Vec2[n];
            for (int k = 0; k < n; k++) {
                loopForce[k] = perAmpereTurn[k].applyTo(loops.get(k).loop().turns() * current[k], fx, fy, torque);
            }
            double looploopHolding = inductive() && anyVariableM && n > 1 ? loopLoopForces() : 0;

            derivative = new double[dimension()];
            double applied = 0;
            double damping = 0;
            Vec2 gravity = scene.gravity();
            for (int b = 0; b < nb; b++) {
                if (freeSlot[b] < 0) {
                    continue;
                }
                Motion.Free free = (Motion.Free) bodies.get(b).motion();
                Vec2 v = poses[b].velocity();
                double w = 2 * Math.PI * free.appliedFrequencyHz();
                Vec2 app = free.appliedForce().plus(free.appliedAmplitude().times(Math.sin(w * tS)));
                applied += app.dot(v);
                damping += free.dampingNsPerM() * v.dot(v);
                fx[b] += app.x() + free.massKg() * gravity.x() - free.dampingNsPerM() * v.x();
                fy[b] += app.y() + free.massKg() * gravity.y() - free.dampingNsPerM() * v.y();
                Vec2 here = poses[b].pivot().plus(poses[b].offset());
                for (Motion.Free.Spring spring : free.springs()) {
                    Vec2 pull = springForce(spring, here);
                    fx[b] += pull.x();
                    fy[b] += pull.y();
                    if (spring.otherBody() != null) {
                        int o = bodyIndex.get(spring.otherBody());
                        fx[o] -= pull.x();
                        fy[o] -= pull.y();
                    }
                }
            }
            double holding = looploopHolding;
            for (int b = 0; b < nb; b++) {
                int f = freeSlot[b];
                if (f < 0) {
                    // The holder supplies what the magnetic and spring forces would take out.
                    holding -= fx[b] * poses[b].velocity().x() + fy[b] * poses[b].velocity().y()
                            + torque[b] * poses[b].omegaRadPerS();
                    continue;
                }
                Motion.Free free = (Motion.Free) bodies.get(b).motion();
                derivative[f] = poses[b].velocity().x();
                derivative[f + 1] = poses[b].velocity().y();
                derivative[f + 2] = poses[b].omegaRadPerS();
                derivative[f + 3] = fx[b] / free.massKg();
                derivative[f + 4] = fy[b] / free.massKg();
                derivative[f + 5] = free.inertiaKgM2() > 0 ? torque[b] / free.inertiaKgM2() : 0;
            }
            double joule = 0;
            for (int k = 0; k < n; k++) {
                if (inductive()) {
                    derivative[loopOffset + k] = -resistance[k] * current[k];
                }
                joule += resistance[k] * current[k] * current[k];
            }
            derivative[auditOffset + APPLIED] = applied;
            derivative[auditOffset + HOLDING] = holding;
            derivative[auditOffset + DRIVE] = drivePower(xs, ys);
            derivative[auditOffset + JOULE] = joule;
            derivative[auditOffset + DAMPING] = damping;
        }

        /** ½·IᵀMI, joules; none in the quasi-static model, whose inductances are taken as zero. */
        double magneticEnergyJ() {
            return inductive() ? quadratic(inductance, current) : 0;
        }

        /**
         * The EMF per turn that changing sources induce in a loop held where it is, −∂Φ/∂t at
         * fixed points (the transformer EMF −∮ ∂A/∂t·dl; Griffiths, <i>Introduction to
         * Electrodynamics</i>, 4th ed., 2013, §7.1.3), by a central difference over the
         * prescribed-motion step; zero when no source moves or alternates.
         */
        private double transformerEmfPerTurn(double[] xs, double[] ys) {
            if (!sourcesVary) {
                return 0;
            }
            double before = 0;
            double after = 0;
            for (PlaneField field : fieldsAround(poses, tS, tS - timeStepS)) {
                before += field.flux(xs, ys);
            }
            for (PlaneField field : fieldsAround(poses, tS, tS + timeStepS)) {
                after += field.flux(xs, ys);
            }
            return -(after - before) / (2 * timeStepS);
        }

        /** Kinetic energy of the free bodies, ½mv² + ½Iω² (pivot at the centre of mass), joules. */
        double kineticEnergyJ() {
            double sum = 0;
            for (int b = 0; b < bodies.size(); b++) {
                if (freeSlot[b] >= 0) {
                    Motion.Free free = (Motion.Free) bodies.get(b).motion();
                    Vec2 v = poses[b].velocity();
                    sum += 0.5 * free.massKg() * v.dot(v) + 0.5 * free.inertiaKgM2() * sq(poses[b].omegaRadPerS());
                }
            }
            return sum;
        }

        /** Spring energy ½k(ℓ − ℓ0)² plus gravitational −m·g·offset of the free bodies, joules. */
        double potentialEnergyJ() {
            double sum = 0;
            for (int b = 0; b < bodies.size(); b++) {
                if (freeSlot[b] >= 0) {
                    Motion.Free free = (Motion.Free) bodies.get(b).motion();
                    Vec2 here = poses[b].pivot().plus(poses[b].offset());
                    sum -= free.massKg() * scene.gravity().dot(poses[b].offset());
                    for (Motion.Free.Spring spring : free.springs()) {
                        double stretch = anchor(spring).minus(here).length() - spring.restLengthM();
                        sum += 0.5 * spring.stiffnessNPerM() * stretch * stretch;
                    }
                }
            }
            return sum;
        }

        private Vec2 anchor(Motion.Free.Spring spring) {
            if (spring.otherBody() == null) {
                return spring.anchor();
            }
            Pose other = poses[bodyIndex.get(spring.otherBody())];
            return other.pivot().plus(other.offset());
        }

        /** Hooke's law along the line from the pivot to the anchor (Hooke 1678; common practice). */
        private Vec2 springForce(Motion.Free.Spring spring, Vec2 here) {
            Vec2 d = anchor(spring).minus(here);
            double length = d.length();
            if (length == 0) {
                return Vec2.ZERO;
            }
            return d.times(spring.stiffnessNPerM() * (length - spring.restLengthM()) / length);
        }

        /**
         * Per ampere-turn: forces and torques on loop k's edges from each source, the torque about
         * the edge body's pivot, with the reaction (−F, and the opposite torque about the source
         * body's pivot) on the source's body; and the motional EMF per turn with every vertex
         * moving with its body ({@link EdgeSums}' per-edge formulas, Griffiths, <i>Introduction to
         * Electrodynamics</i>, 4th ed., 2013, §5.1.3 and §7.1.3). Edges whose ends ride
         * different bodies are sliding contacts: their force is taken up by whatever guides them
         * and applied to neither body.
         */
        private EdgeTotals edgeTotals(int k, double[] xs, double[] ys, PlaneField[] fields) {
            Circuit c = loops.get(k);
            EdgeTotals totals = new EdgeTotals(bodies.size());
            int n = xs.length;
            double[] moments = new double[2];
            for (int e = 0; e < n; e++) {
                int e2 = (e + 1) % n;
                double dx = xs[e2] - xs[e];
                double dy = ys[e2] - ys[e];
                int body = c.vertexBody()[e];
                int body2 = c.vertexBody()[e2];
                boolean contact = body != body2;
                Vec2 p = poses[body].pivot().plus(poses[body].offset());
                Vec2 va = poses[body].velocityAt(new Vec2(xs[e], ys[e]));
                Vec2 vb = poses[body2].velocityAt(new Vec2(xs[e2], ys[e2]));
                for (int s = 0; s < fields.length; s++) {
                    fields[s].bzMoments(xs[e], ys[e], xs[e2], ys[e2], moments);
                    totals.motionalV += EdgeSums.motional(dx, dy, va.x(), va.y(), vb.x(), vb.y(), moments);
                    double fX = EdgeSums.forceXPerAmpere(dy, moments);
                    double fY = EdgeSums.forceYPerAmpere(dx, moments);
                    totals.totalX += fX;
                    totals.totalY += fY;
                    if (contact) {
                        continue;
                    }
                    double t = EdgeSums.torquePerAmpere(xs[e] - p.x(), ys[e] - p.y(), dx, dy, moments);
                    totals.fx[body] += fX;
                    totals.fy[body] += fY;
                    totals.torque[body] += t;
                    int sb = sourceBody[s];
                    Vec2 q = poses[sb].pivot().plus(poses[sb].offset());
                    totals.fx[sb] -= fX;
                    totals.fy[sb] -= fY;
                    totals.torque[sb] -= t + ((p.x() - q.x()) * fY - (p.y() - q.y()) * fX);
                }
            }
            return totals;
        }

        /**
         * Forces between the loop currents, the generalized forces ½·Iᵀ(∂M/∂q)I on free bodies
         * (Jackson, <i>Classical Electrodynamics</i>, 3rd ed., §5.16: force at constant currents
         * is the gradient of the magnetic energy), by central differences of M; returns the power
         * the holders of prescribed bodies put in through these forces, −½·Iᵀ(∂M/∂t)I with free
         * bodies held where they are.
         */
        private double loopLoopForces() {
            for (int b = 0; b < bodies.size(); b++) {
                if (freeSlot[b] < 0) {
                    continue;
                }
                boolean[] only = new boolean[bodies.size()];
                only[b] = true;
                fx[b] += gradient(b, only, spaceStepM, 0, 0);
                fy[b] += gradient(b, only, 0, spaceStepM, 0);
                // A body without inertia does not turn: no torque needed.
                if (((Motion.Free) bodies.get(b).motion()).inertiaKgM2() > 0) {
                    torque[b] += gradient(b, only, 0, 0, ANGLE_STEP_RAD);
                }
            }
            Pose[] later = poses.clone();
            Pose[] earlier = poses.clone();
            for (int b = 0; b < bodies.size(); b++) {
                if (drivenPath[b]) {
                    later[b] = bodies.get(b).poseAt(tS + timeStepS);
                    earlier[b] = bodies.get(b).poseAt(tS - timeStepS);
                }
            }
            return -energyChange(later, earlier, drivenPath) / (2 * timeStepS);
        }

        private double gradient(int body, boolean[] only, double dx, double dy, double dAngle) {
            Pose[] plus = poses.clone();
            Pose[] minus = poses.clone();
            Pose p = poses[body];
            plus[body] = new Pose(p.pivot(), p.offset().plus(new Vec2(dx, dy)), p.angleRad() + dAngle, p.velocity(),
                    p.omegaRadPerS());
            minus[body] = new Pose(p.pivot(), p.offset().minus(new Vec2(dx, dy)), p.angleRad() - dAngle, p.velocity(),
                    p.omegaRadPerS());
            return energyChange(plus, minus, only) / (2 * (dx + dy + dAngle));
        }

        /**
         * ½·Iᵀ[M(a) − M(b)]I at the present currents, computing only the entries of loops that ride
         * a body marked in {@code moved} (the others are the same in both).
         */
        private double energyChange(Pose[] a, Pose[] b, boolean[] moved) {
            double sum = 0;
            for (int k = 0; k < loops.size(); k++) {
                for (int j = k; j < loops.size(); j++) {
                    if (!Double.isNaN(constantM[k][j]) || !(rides(k, moved) || rides(j, moved))) {
                        continue;
                    }
                    double change = (entry(k, j, a) - entry(k, j, b)) * current[k] * current[j];
                    sum += k == j ? 0.5 * change : change;
                }
            }
            return sum;
        }

        /**
         * Power the drives of AC source coils put into the loops, −Σ_k I_k·N_k·Φ_c,k·di_c/dt with
         * Φ_c,k the coil's flux through loop k per ampere of coil current.
         */
        private double drivePower(double[][] xs, double[][] ys) {
            double power = 0;
            for (int s = 0; s < unitCoils.length; s++) {
                if (unitCoils[s] == null) {
                    continue;
                }
                double rate = ((Source.SourceCoil) sources.get(s)).drive().rateAt(tS);
                PlaneField unit = SourceFields.place(unitCoils[s], poses[sourceBody[s]], tS);
                for (int k = 0; k < loops.size(); k++) {
                    power -= current[k] * loops.get(k).loop().turns() * unit.flux(xs[k], ys[k]) * rate;
                }
            }
            return power;
        }
    }

    /**
     * One loop's edge sums per ampere-turn: the motional EMF per turn, the force on the whole
     * loop, and the forces and torques on each body (loop edges and source reactions).
     */
    private static final class EdgeTotals {
        double motionalV;
        double totalX;
        double totalY;
        final double[] fx;
        final double[] fy;
        final double[] torque;

        EdgeTotals(int bodyCount) {
            fx = new double[bodyCount];
            fy = new double[bodyCount];
            torque = new double[bodyCount];
        }

        /** Adds these sums times N·I to the bodies' forces and torques; returns the loop's force, N. */
        Vec2 applyTo(double ampereTurns, double[] bodyFx, double[] bodyFy, double[] bodyTorque) {
            for (int b = 0; b < fx.length; b++) {
                bodyFx[b] += ampereTurns * fx[b];
                bodyFy[b] += ampereTurns * fy[b];
                bodyTorque[b] += ampereTurns * torque[b];
            }
            return new Vec2(ampereTurns * totalX, ampereTurns * totalY);
        }
    }

    /** The loop's series resistance where it is now ({@link LoopResistance}). */
    private static double resistance(Conductor.Loop loop, double[] xs, double[] ys) {
        double perimeter = 0;
        for (int i = 0; i < xs.length; i++) {
            int j = (i + 1) % xs.length;
            perimeter += Math.hypot(xs[j] - xs[i], ys[j] - ys[i]);
        }
        return LoopResistance.ohms(loop, perimeter);
    }

    /**
     * I = M⁻¹(Ψ − λ_ext) = M⁻¹[(Ψ − λ_ext(t0)) − (λ_ext − λ_ext(t0))], the state minus the
     * external linkage's change since the start; M is symmetric positive definite for any
     * physical geometry.
     */
    private double[] solve(double[][] m, double[] y, double[] external) {
        int n = external.length;
        if (n == 0) {
            return new double[0];
        }
        double[] rhs = new double[n];
        for (int k = 0; k < n; k++) {
            rhs[k] = y[loopOffset + k] - (external[k] - startLinkage[k]);
        }
        return new CholeskyDecomposition(new Array2DRowRealMatrix(m, false)).getSolver()
                .solve(new ArrayRealVector(rhs, false)).toArray();
    }

    private static double sq(double v) {
        return v * v;
    }
}

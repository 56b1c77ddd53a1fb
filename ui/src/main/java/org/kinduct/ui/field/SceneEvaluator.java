package org.kinduct.ui.field;

import java.util.List;
import org.kinduct.solver.Snapshot;

/** What the editor asks of the solver for one scene. */
public interface SceneEvaluator {

    /** Solved values of every conductor at {@code tS}. */
    Snapshot at(double tS);

    /** Snapshots at t0, t0 + dt, … up to t1. */
    List<Snapshot> series(double t0S, double t1S, double dtS);

    /** The total B_z in the drawing plane at {@code tS}. */
    BzField fieldAt(double tS);

    /** B_z at a point of the plane, tesla; implementations must allow calls from several threads. */
    @FunctionalInterface
    interface BzField {
        double bz(double x, double y);
    }
}

package org.kinduct.solver.plate;

import java.util.List;
import org.kinduct.scene.Motion;
import org.kinduct.scene.Pose;
import org.kinduct.scene.Scene;
import org.kinduct.scene.Source;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.field.PhysicalConstants;
import org.kinduct.solver.sheet.SheetSolver;

/**
 * When a plate is solved with its own field: Rm above {@link SheetState#REYNOLDS_WARNING}, every
 * body's motion prescribed, a still field (every source on a still body, none alternating), and a
 * steady state the plate's motion defines ({@link SheetModel#ownFieldApplies}). Coupled runs keep
 * the resistive limit: their dynamics brake free bodies with it ({@link SheetBrakes}), and their
 * states must report what moved the bodies. (A quasi-steady own-field brake was tried: a disc
 * spinning down at a rim Rm of 3.6 took five minutes for 20 ms, following the torque's ripple as the
 * grid turned under the magnet, and its audit closed only to the grid's asymmetry under rotation,
 * 1.4e-6.)
 */
final class OwnField {

    private OwnField() {
    }

    /**
     * True when the scene allows a plate's own field: no free body, and a still field (every
     * source rides a still body and none alternates).
     */
    static boolean allowed(Scene scene) {
        return scene.bodies().stream().noneMatch(b -> b.motion() instanceof Motion.Free)
                && scene.sources().stream().noneMatch(Source::alternates) && scene.sources().stream()
                .allMatch(s -> scene.body(s.body()).orElseThrow().motion() instanceof Motion.Still);
    }

    /** Whether sheet {@code m} at {@code pose} with Rm {@code reynolds} is solved with its own field, in a scene that {@link #allowed} it or not. */
    static boolean applies(boolean allowed, SheetModel m, Pose pose, double reynolds) {
        return allowed && reynolds > SheetState.REYNOLDS_WARNING && m.ownFieldApplies(pose, reynolds);
    }

    /**
     * Rm = μ0·σ·L·v with v the fastest speed of the material through the field: its own speed at a
     * conducting cell ({@link SheetSolver#reynolds}), or its speed relative to a moving source (a
     * magnet sweeping over a still plate induces as the plate sweeping under it would).
     */
    static double reynolds(SheetModel m, PlacedSources sources, Pose pose, FrameDrive drive) {
        List<Vec2> outlineNow = m.sheet().outline().stream().map(pose::place).toList();
        return Math.max(SheetSolver.reynolds(m.grid(), m.material(), drive), PhysicalConstants.MU_0
                * m.material().sigmaSPerM() * m.material().reynoldsLengthM()
                * sources.fastestRelativeSpeed(outlineNow, pose));
    }
}

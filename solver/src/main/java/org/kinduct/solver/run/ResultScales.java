package org.kinduct.solver.run;

import java.util.Collection;
import java.util.List;
import org.kinduct.scene.Vec2;
import org.kinduct.scene.units.Units;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Snapshot;

/**
 * The largest magnitude each conductor quantity reaches in a set of results (a run, and the
 * instant shown): the references against which single values are read, so that rounding noise
 * prints as zero ({@link Units#withoutNoise}). A conductor that has no EMF at some instant (a
 * spinning coil at its zero crossing), or none at all, then reads "0" beside the run's largest
 * EMF instead of "5.20e-7 nV"; a small EMF in a run of small EMFs keeps its value. Entries that do
 * not apply (NaN, e.g. the flux of an open wire) are skipped.
 *
 * @param emfV largest |EMF| by either method or |voltage| of an electrode pair, volts
 * @param currentA largest |current|, amperes
 * @param fluxWb largest |flux| or |flux linkage|, webers
 * @param forceN largest force magnitude on a conductor, plate or channel, newtons
 * @param torqueNm largest |torque| on a plate or channel, or |force| times its reach from the pivot if
 *        larger (a torque that cancels to nothing is noise beside what its forces could exert), N·m
 * @param powerW largest Joule power of a plate or channel, watts
 */
public record ResultScales(double emfV, double currentA, double fluxWb, double forceN, double torqueNm,
                           double powerW) {

    public static ResultScales of(Collection<Snapshot> results) {
        double emf = 0;
        double current = 0;
        double flux = 0;
        double force = 0;
        double torque = 0;
        double power = 0;
        for (Snapshot s : results) {
            for (ConductorState c : s.conductors()) {
                emf = larger(larger(larger(emf, c.emfV()), c.emfFluxV()), c.emfMotionalV());
                current = larger(current, c.currentA());
                flux = larger(larger(flux, c.fluxWb()), c.linkageWb());
                force = larger(force, c.forceN().length());
            }
            for (SheetState p : s.sheets()) {
                for (SheetState.Pair pair : p.pairs()) {
                    emf = larger(emf, pair.voltageV());
                }
                force = larger(force, p.forceN().length());
                torque = larger(larger(torque, p.torqueNm()), p.forceN().length() * p.reachM());
                power = larger(power, p.joulePowerW());
            }
        }
        return new ResultScales(emf, current, flux, force, torque, power);
    }

    /** These scales widened to the instant shown (which may lie between a run's samples); this when {@code now} is null. */
    public ResultScales including(Snapshot now) {
        if (now == null) {
            return this;
        }
        ResultScales n = of(List.of(now));
        return new ResultScales(Math.max(emfV, n.emfV), Math.max(currentA, n.currentA), Math.max(fluxWb, n.fluxWb),
                Math.max(forceN, n.forceN), Math.max(torqueNm, n.torqueNm), Math.max(powerW, n.powerW));
    }

    /** An EMF, zero when it is noise beside the largest EMF. */
    public double emf(double v) {
        return Units.withoutNoise(v, emfV);
    }

    public double current(double a) {
        return Units.withoutNoise(a, currentA);
    }

    /** A flux or flux linkage. */
    public double flux(double wb) {
        return Units.withoutNoise(wb, fluxWb);
    }

    /** A torque, zero when it is noise beside the largest torque. */
    public double torque(double nm) {
        return Units.withoutNoise(nm, torqueNm);
    }

    /** A Joule power, zero when it is noise beside the largest. */
    public double power(double w) {
        return Units.withoutNoise(w, powerW);
    }

    public Vec2 force(Vec2 n) {
        return new Vec2(Units.withoutNoise(n.x(), forceN), Units.withoutNoise(n.y(), forceN));
    }

    private static double larger(double soFar, double v) {
        return Double.isNaN(v) ? soFar : Math.max(soFar, Math.abs(v));
    }
}

package org.kinduct.solver.sheet;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.DoubleBinaryOperator;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.field.PhysicalConstants;

/** Fields and shapes the sheet tests share; each formula here is independent of the solver. */
final class SheetFixtures {

    private SheetFixtures() {
    }

    /**
     * B_z in the plane z = 0 of a point dipole of moment m ẑ at height h above (x0, y0):
     * μ0·m·(2h² − ρ²)/(4π·(h² + ρ²)^{5/2}) (the z component of the dipole field
     * μ0/(4π)·(3(m·r̂)r̂ − m)/r³, Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013,
     * ch. 5, from memory), with ρ the distance from (x0, y0).
     */
    static DoubleBinaryOperator dipole(double momentAm2, double x0, double y0, double heightM) {
        return (x, y) -> {
            double rho2 = (x - x0) * (x - x0) + (y - y0) * (y - y0);
            double h2 = heightM * heightM;
            return PhysicalConstants.MU_0_OVER_4PI * momentAm2 * (2 * h2 - rho2) / Math.pow(h2 + rho2, 2.5);
        };
    }

    /** A circular region of uniform B_z (an idealized pole face), zero outside. */
    static DoubleBinaryOperator pole(double bT, double x0, double y0, double radiusM) {
        return (x, y) -> (x - x0) * (x - x0) + (y - y0) * (y - y0) < radiusM * radiusM ? bT : 0;
    }

    static DoubleBinaryOperator sum(DoubleBinaryOperator a, DoubleBinaryOperator b) {
        return (x, y) -> a.applyAsDouble(x, y) + b.applyAsDouble(x, y);
    }

    /** A square of half-side {@code halfM} centred at the origin, turned by {@code angleRad}. */
    static List<Vec2> square(double halfM, double angleRad) {
        List<Vec2> corners = new ArrayList<>();
        for (double[] c : new double[][] {{-1, -1}, {1, -1}, {1, 1}, {-1, 1}}) {
            corners.add(new Vec2(c[0] * halfM, c[1] * halfM).rotate(angleRad));
        }
        return corners;
    }

    /**
     * A random plate about the origin: a star-shaped 12-gon with radii in [30, 50] mm (so simple)
     * and a regular hole of radius 4–8 mm within 12 mm of the centre (so well inside).
     */
    static SheetShape randomPlateWithHole(SplittableRandom r) {
        List<Vec2> outline = new ArrayList<>();
        int n = 12;
        for (int k = 0; k < n; k++) {
            double angle = 2 * Math.PI * (k + r.nextDouble(-0.3, 0.3)) / n;
            outline.add(Vec2.polar(r.nextDouble(0.03, 0.05), angle));
        }
        Vec2 centre = Vec2.polar(r.nextDouble(0, 0.012), r.nextDouble(0, 2 * Math.PI));
        List<Vec2> hole = SheetShape.regularPolygon(centre, r.nextDouble(0.004, 0.008), 5 + r.nextInt(4));
        return new SheetShape(outline, List.of(hole));
    }

    /** One to three dipoles within 40 mm of the origin, 5–20 mm up, moments of either sign. */
    static DoubleBinaryOperator randomMagnets(SplittableRandom r) {
        DoubleBinaryOperator field = (x, y) -> 0;
        int count = 1 + r.nextInt(3);
        for (int k = 0; k < count; k++) {
            double moment = (r.nextBoolean() ? 1 : -1) * r.nextDouble(0.5, 2);
            field = sum(field, dipole(moment, r.nextDouble(-0.04, 0.04), r.nextDouble(-0.04, 0.04),
                    r.nextDouble(0.005, 0.02)));
        }
        return field;
    }

    /** The midpoints of the outline's first two edges, as electrodes "a" and "b". */
    static List<Electrode> edgeElectrodes(SheetShape shape) {
        List<Vec2> o = shape.outline();
        return List.of(new Electrode("a", o.get(0).plus(o.get(1)).times(0.5)),
                new Electrode("b", o.get(5).plus(o.get(6)).times(0.5)));
    }

    /** Least-squares slope of log|e| against log h: the observed order of convergence. */
    static double observedOrder(double[] cellSizes, double[] errors) {
        int n = cellSizes.length;
        double mx = 0;
        double my = 0;
        for (int k = 0; k < n; k++) {
            mx += Math.log(cellSizes[k]) / n;
            my += Math.log(Math.abs(errors[k])) / n;
        }
        double sxy = 0;
        double sxx = 0;
        for (int k = 0; k < n; k++) {
            double dx = Math.log(cellSizes[k]) - mx;
            sxy += dx * (Math.log(Math.abs(errors[k])) - my);
            sxx += dx * dx;
        }
        return sxy / sxx;
    }
}

package org.kinduct.solver.sheet;

/**
 * The conducting material: uniform conductivity and thickness, and the length that sets its
 * magnetic Reynolds number Rm = μ0·σ·L·v (the ratio of the eddy currents' own field to the applied
 * one; Davidson, <i>An Introduction to Magnetohydrodynamics</i>, Cambridge, 2001, §4.1): the
 * thickness for a plate, whose currents flow in a sheet of that thickness (Reitz, J. Appl. Phys.
 * 41, 2067, 1970: drag grows like v until v reaches w = 2/(μ0·σ·d)), and the width for a liquid in
 * a channel. The solver neglects that own field, valid for Rm ≪ 1.
 *
 * @param sigmaSPerM conductivity, S/m
 * @param thicknessM thickness d (depth for a liquid), m
 * @param reynoldsLengthM length L in Rm, m
 */
public record SheetConductor(double sigmaSPerM, double thicknessM, double reynoldsLengthM) {

    public SheetConductor {
        positive("conductivity", sigmaSPerM, "S/m");
        positive("thickness", thicknessM, "m");
        positive("Reynolds length", reynoldsLengthM, "m");
    }

    /** A plate: Rm = μ0·σ·d·v. */
    public static SheetConductor plate(double sigmaSPerM, double thicknessM) {
        return new SheetConductor(sigmaSPerM, thicknessM, thicknessM);
    }

    /** A liquid of the given depth in a channel of the given width: Rm = μ0·σ·w·v. */
    public static SheetConductor liquid(double sigmaSPerM, double depthM, double widthM) {
        return new SheetConductor(sigmaSPerM, depthM, widthM);
    }

    private static void positive(String name, double value, String unit) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be positive and finite, got " + value + " " + unit);
        }
    }
}

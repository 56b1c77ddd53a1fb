package org.kinduct.solver.sheet;

/** Which physics produced a plate's eddy currents; {@link Plate#steady} says which it chose. */
public enum EddyModel {
    /**
     * The currents' own field neglected (magnetic Reynolds number ≪ 1): the cell-potential solve
     * of {@link SheetSolver}.
     */
    RESISTIVE_LIMIT("resistive limit (own field neglected)"),
    /** The plate's own field kept: stream function, FFT field, Faraday's law ({@link Plate}). */
    SELF_FIELD("with the plate's own field");

    private final String label;

    EddyModel(String label) {
        this.label = label;
    }

    /** Words for a person, e.g. "with the plate's own field". */
    public String label() {
        return label;
    }
}

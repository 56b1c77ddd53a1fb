package org.kinduct.report;

import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.solver.Circulation;
import org.kinduct.solver.Terminal;
import org.kinduct.solver.run.RunPlan;

/** The words every output uses for terminals and current sense. */
public final class Labels {

    private Labels() {
    }

    /** {@code first}, {@code last} or {@code none}: which vertex is the + end. */
    public static String terminal(Terminal t) {
        return switch (t) {
            case FIRST -> "first";
            case LAST -> "last";
            case NONE -> "none";
        };
    }

    /** {@code cw}, {@code ccw} or {@code none}, as seen on screen. */
    public static String circulation(Circulation c) {
        return switch (c) {
            case CW -> "cw";
            case CCW -> "ccw";
            case NONE -> "none";
        };
    }

    /** {@code instants} (each solved on its own) or {@code coupled run}. */
    public static String method(RunPlan plan) {
        return switch (plan.method()) {
            case INSTANTS -> "instants";
            case COUPLED -> "coupled run";
        };
    }

    /** {@code inductive} or {@code quasi-static}, as {@code kinduct solve --circuit} spells them. */
    public static String circuitModel(CircuitModel m) {
        return switch (m) {
            case INDUCTIVE -> "inductive";
            case QUASI_STATIC -> "quasi-static";
            case AUTO -> "auto";
        };
    }
}

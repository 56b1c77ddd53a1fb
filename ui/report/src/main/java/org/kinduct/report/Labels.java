package org.kinduct.report;

import java.util.Locale;
import java.util.Optional;
import org.kinduct.scene.Vec2;
import org.kinduct.solver.Circulation;
import org.kinduct.solver.ConductorState;
import org.kinduct.solver.SheetState;
import org.kinduct.solver.Terminal;
import org.kinduct.solver.dynamics.CircuitModel;
import org.kinduct.solver.run.RunPlan;
import org.kinduct.solver.sheet.EddyModel;

/**
 * The words every output uses for results: terminals and polarity, current sense, the agreement
 * of the two EMF methods, circuit models. The one place result wording lives, so the table, the
 * picture, its callouts and the editor say the same thing.
 */
public final class Labels {

    /** Relative disagreement between the two EMF methods above which a result is flagged. */
    public static final double AGREEMENT_FLAG = 1e-6;

    /** A cell whose quantity does not apply to the conductor (a wire's flux, an open circuit's current). */
    public static final String NOT_APPLICABLE = "—";

    /** An open wire's agreement: it has the motional method only, so there is nothing to compare. */
    public static final String ONE_METHOD = "n/a (open wire)";

    /** Said of a plate solved with the field of its own eddy currents (Rm above the resistive limit). */
    public static final String OWN_FIELD = "own field included";

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

    /** Which end is positive, in words: "+ at last end", "+ at first end" or "no EMF"; {@code gap} adds " (gap)". */
    public static String polarity(Terminal t, boolean gap) {
        String across = gap ? " (gap)" : "";
        return switch (t) {
            case LAST -> "+ at last end" + across;
            case FIRST -> "+ at first end" + across;
            case NONE -> "no EMF";
        };
    }

    /** The current's sense on screen in words, with its arrow: "↺ counter-clockwise", "↻ clockwise", "no current". */
    public static String sense(Circulation c) {
        return switch (c) {
            case CCW -> "↺ counter-clockwise";
            case CW -> "↻ clockwise";
            case NONE -> "no current";
        };
    }

    /** The sense's arrow alone, for tight places: "↺", "↻" or "". */
    public static String senseArrow(Circulation c) {
        return switch (c) {
            case CCW -> "↺";
            case CW -> "↻";
            case NONE -> "";
        };
    }

    /**
     * The two EMF methods' agreement at one instant: "yes" (identical), "yes, 3e-09", "CHECK, 2e-04"
     * above {@link #AGREEMENT_FLAG}, or "n/a (edge)" where the flux has a kink (a loop edge on a field edge).
     */
    public static String agreement(double disagreement) {
        if (Double.isNaN(disagreement)) {
            return "n/a (edge)";
        }
        if (disagreement == 0) {
            return "yes";
        }
        return String.format(Locale.ROOT, disagreement <= AGREEMENT_FLAG ? "yes, %.0e" : "CHECK, %.0e", disagreement);
    }

    /**
     * One conductor's agreement at one instant: {@link #agreement(double)} for loops,
     * {@link #ONE_METHOD} for wires, with "v × B only" where a moving idealized field left out the
     * induced part.
     */
    public static String agreement(ConductorState st) {
        if (st.kind() == ConductorState.Kind.WIRE) {
            return st.inducedFieldIncluded() ? ONE_METHOD : "n/a (open wire; v × B only)";
        }
        return agreement(st.disagreement());
    }

    /** What a conductor's sign means at one instant: a closed loop's current sense, else which end is +. */
    public static String polarityOrSense(ConductorState st, boolean closedLoop) {
        return closedLoop ? sense(st.direction()) : polarity(st.positiveEnd(), st.kind() == ConductorState.Kind.LOOP);
    }

    /** {@code cw}, {@code ccw} or {@code none}, as seen on screen. */
    public static String circulation(Circulation c) {
        return switch (c) {
            case CW -> "cw";
            case CCW -> "ccw";
            case NONE -> "none";
        };
    }

    /** {@code plate} or {@code channel}. */
    public static String sheetKind(SheetState.Kind kind) {
        return switch (kind) {
            case PLATE -> "plate";
            case CHANNEL -> "channel";
        };
    }

    /** Which electrode of a pair is positive, in words: "+ at a", or "no voltage" below the reporting threshold. */
    public static String positiveElectrode(Optional<String> positive) {
        return positive.map(name -> "+ at " + name).orElse("no voltage");
    }

    /** The name of a pair's positive electrode for data files, or {@code none}. */
    public static String positiveName(Optional<String> positive) {
        return positive.orElse("none");
    }

    /**
     * What Rm means for a plate's or channel's results: the warning when they neglect an own field
     * that matters, {@link #OWN_FIELD} when they include it, otherwise nothing.
     */
    public static String reynoldsNote(SheetState st) {
        return st.beyondResistiveLimit() ? reynoldsWarning(st.magneticReynolds()) : ownFieldNote(st);
    }

    /**
     * {@link #reynoldsNote} shortened for a narrow column whose warnings are spelled out below it:
     * " !" for the warning, " (own field included)", or nothing.
     */
    public static String reynoldsMark(SheetState st) {
        String own = ownFieldNote(st);
        return st.beyondResistiveLimit() ? " !" : own.isEmpty() ? "" : " (" + own + ")";
    }

    private static String ownFieldNote(SheetState st) {
        return st.model() == EddyModel.SELF_FIELD ? OWN_FIELD : "";
    }

    /** The model of a plate's or channel's state for data files: {@code own-field} or {@code resistive-limit}. */
    public static String eddyModel(SheetState st) {
        return st.model() == EddyModel.SELF_FIELD ? "own-field" : "resistive-limit";
    }

    /** "Rm 0.23 > 0.1: beyond the resistive limit", for a state whose own field is no longer small. */
    public static String reynoldsWarning(double magneticReynolds) {
        return String.format(Locale.ROOT, "Rm %.2g > %.1g: beyond the resistive limit", magneticReynolds,
                SheetState.REYNOLDS_WARNING);
    }

    /** Direction of an in-plane vector as an angle from +x, counter-clockwise, in whole degrees (−179° … 180°). */
    public static String direction(Vec2 v) {
        long deg = Math.round(Math.toDegrees(Math.atan2(v.y(), v.x())));
        long d = deg == -180 ? 180 : deg;
        return (d < 0 ? "−" + -d : Long.toString(d)) + "°";
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

    /**
     * The steady load power and the cycles it is read over: "mean load power 117 µW over the last 9
     * cycles (450–600 ms; still rising 0.3 % a cycle), 94.7 µW over the whole run, build-up included".
     * A change per cycle below 0.1 % is not mentioned: the state is steady to the figures shown.
     */
    public static String steadyLoadPower(String steady, int cycles, String from, String to, double changePerCycle,
                                         String wholeRun) {
        String change = Math.abs(changePerCycle) < 1e-3 ? ""
                : String.format(Locale.ROOT, "; still %s %.1f %% a cycle", changePerCycle > 0 ? "rising" : "falling",
                        100 * Math.abs(changePerCycle));
        return String.format(Locale.ROOT, "mean load power %s over the last %d %s (%s–%s%s), %s over the whole run,"
                + " build-up included", steady, cycles, cycles == 1 ? "cycle" : "cycles", from, to, change, wholeRun);
    }

    /**
     * A self-crossing loop's rejection of the alternating coils' field, and how far its peak EMF stands
     * above what gets through: "50 Hz rejection 49.8 dB: 603 nV at the output against 186 µV from one
     * lobe alone; the peak EMF 83.2 dB above it". A pickup that reads 0 beside the lobe's (rounding
     * only: the lobes cancel exactly) is said so, with the 180 dB that noise limit means.
     */
    public static String alternatingRejection(String frequency, double rejectionDb, String loopPeak, String lobePeak,
                                              boolean cancelled, double peakAboveDb) {
        if (cancelled) {
            return String.format(Locale.ROOT, "%s rejection beyond 180 dB (the lobes cancel it to rounding): 0 V at"
                    + " the output against %s from one lobe alone", frequency, lobePeak);
        }
        return String.format(Locale.ROOT, "%s rejection %.1f dB: %s at the output against %s from one lobe alone;"
                + " the peak EMF %.1f dB above it", frequency, rejectionDb, loopPeak, lobePeak, peakAboveDb);
    }
}

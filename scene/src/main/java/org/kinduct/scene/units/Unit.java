package org.kinduct.scene.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;

/**
 * One unit of a {@link Dimension}: value in SI = value × scale (× π for angle units) + offset.
 *
 * <p>Conversions run in decimal arithmetic with 34 significant digits, so a decimal unit string
 * converts to the double nearest its exact value: "12 mm" gives exactly the double {@code 0.012},
 * "0.5 G" exactly {@code 5e-5}.
 */
public final class Unit {

    /** Enough digits that converting and then rounding to a double rounds only once in practice. */
    static final MathContext EXACT = MathContext.DECIMAL128;

    private static final BigDecimal PI = new BigDecimal("3.14159265358979323846264338327950288419716939937510");

    private final List<String> spellings;
    private final BigDecimal numerator;
    private final BigDecimal denominator;
    private final boolean timesPi;
    private final BigDecimal offset;

    private Unit(List<String> spellings, String numerator, String denominator, boolean timesPi, String offset) {
        this.spellings = List.copyOf(withAsciiMicro(spellings));
        this.numerator = new BigDecimal(numerator);
        this.denominator = new BigDecimal(denominator);
        this.timesPi = timesPi;
        this.offset = new BigDecimal(offset);
    }

    /** A unit of exact decimal scale, e.g. {@code scaled("0.0254", "in")}. */
    static Unit scaled(String scale, String... spellings) {
        return new Unit(List.of(spellings), scale, "1", false, "0");
    }

    /** A unit of exact rational scale numerator/denominator, e.g. km/h = 1000/3600 m/s. */
    static Unit ratio(String numerator, String denominator, String... spellings) {
        return new Unit(List.of(spellings), numerator, denominator, false, "0");
    }

    /** A unit of scale π·numerator/denominator, e.g. the degree = π/180 rad. */
    static Unit piRatio(String numerator, String denominator, String... spellings) {
        return new Unit(List.of(spellings), numerator, denominator, true, "0");
    }

    /** A unit of scale 1 shifted by {@code offset}, e.g. the kelvin read as °C − 273.15. */
    static Unit shifted(String offset, String... spellings) {
        return new Unit(List.of(spellings), "1", "1", false, offset);
    }

    /** Also accept "u" for the micro sign so the unit can be typed on any keyboard. */
    private static List<String> withAsciiMicro(List<String> given) {
        List<String> all = new ArrayList<>(given);
        for (String s : given) {
            if (s.startsWith("µ")) {
                all.add("u" + s.substring(1));
            }
        }
        return all;
    }

    /** The preferred symbol, as written by {@link Units#format}. */
    public String symbol() {
        return spellings.get(0);
    }

    /** Every accepted spelling, the symbol first. */
    public List<String> spellings() {
        return spellings;
    }

    /** {@code value} (finite) in this unit, converted to SI. */
    public double toSi(double value) {
        return toSi(new BigDecimal(finite(value))).doubleValue();
    }

    /** {@code si} (finite) converted to this unit. */
    public double fromSi(double si) {
        return fromSi(new BigDecimal(finite(si))).doubleValue();
    }

    private static double finite(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("only finite values convert between units, got " + v);
        }
        return v;
    }

    BigDecimal toSi(BigDecimal value) {
        BigDecimal si = value.multiply(numerator).divide(denominator, EXACT);
        if (timesPi) {
            si = si.multiply(PI, EXACT);
        }
        return si.add(offset, EXACT);
    }

    BigDecimal fromSi(BigDecimal si) {
        BigDecimal v = si.subtract(offset, EXACT).multiply(denominator).divide(numerator, EXACT);
        return timesPi ? v.divide(PI, EXACT) : v;
    }

    @Override
    public String toString() {
        return symbol();
    }
}

package org.kinduct.scene.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads and writes quantities with units: {@code parse("12 mm", LENGTH)} is 0.012 (SI) and
 * {@code format(0.0125, LENGTH)} is "12.5 mm".
 *
 * <p>Input: a decimal number of at most {@value #MAX_NUMBER_CHARACTERS} characters (optional
 * sign, fraction and exponent; no hex, NaN or infinity), optional spaces, then a unit of the
 * expected {@link Dimension}; a bare number is in the SI unit. The Unicode minus sign, the Greek
 * mu and the ohm sign are read as '-', 'µ' and 'Ω', and the letter 'u' may stand for 'µ'. Unit spellings are case-sensitive ("mm" is not "Mm").
 *
 * <p>Output: {@value #DISPLAY_DIGITS} significant digits (rounded half up), an engineering
 * prefix chosen from {@link Dimension#displayUnits()}, and the Unicode minus sign "−". Every
 * string {@code format} returns for a finite value is accepted by {@code parse}.
 *
 * <p>Rounding noise: a computed value that is zero in exact arithmetic is rarely zero in floating
 * point ("8.45e-13 mm/s" for the sideways speed of a body falling straight down). Whether a tiny
 * value is noise depends on what it was computed from, not on its unit: 1 nV is a real EMF in a
 * weak field and noise beside a 100 kV one. So callers pass the value through
 * {@link #withoutNoise(double, double)} with a reference magnitude before formatting it.
 */
public final class Units {

    /** Significant digits written by {@link #format(double, Dimension)}. */
    public static final int DISPLAY_DIGITS = 3;

    /**
     * Fraction of a reference magnitude below which a value is rounding noise. Each floating-point
     * operation errs by at most u = 2⁻⁵³ ≈ 1.1e-16 relative, and a sum of n terms by at most
     * γₙ₋₁·Σ|xᵢ| with γₙ = n·u/(1 − n·u) (Higham, <i>Accuracy and Stability of Numerical
     * Algorithms</i>, 2nd ed., SIAM 2002, §2.2, Lemma 3.1 and §4.2; from memory). A value worked
     * out through up to some ten million operations from quantities no larger than the reference,
     * and zero in exact arithmetic, therefore stays below this fraction. It is also the relative
     * part of the solver's threshold under which an EMF shows no polarity.
     */
    public static final double NOISE_FRACTION = 1e-9;

    /** A mantissa outside [1e-3, 1e6) in its unit is written in exponent form, "1.23e-5 m". */
    private static final int SMALLEST_PLAIN_EXPONENT = -3;
    private static final int LARGEST_PLAIN_EXPONENT = 5;

    /**
     * Longest number accepted in a text, in characters: far more digits than a double holds (17),
     * and short enough that converting it costs microseconds (exact decimal conversion takes time
     * quadratic in the length: a million digits took 40 s).
     */
    public static final int MAX_NUMBER_CHARACTERS = 100;

    private static final Pattern NUMBER_AND_UNIT =
            Pattern.compile("([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d{1,9})?)\\s*(.*)", Pattern.DOTALL);

    private Units() {
    }

    /**
     * {@code text} as an SI value of dimension {@code d}.
     *
     * @throws IllegalArgumentException naming what was expected and what was given, e.g.
     *         "expected a length such as '12 mm', got '12 mT' (mT is a unit of flux density)"
     */
    public static double parse(String text, Dimension d) {
        if (text == null) {
            throw expected(d, "nothing", "");
        }
        String clean = normalise(text.strip());
        Matcher m = NUMBER_AND_UNIT.matcher(clean);
        if (!m.matches()) {
            throw expected(d, Texts.quote(text), "");
        }
        if (m.group(1).length() > MAX_NUMBER_CHARACTERS) {
            throw new IllegalArgumentException("the number in " + Texts.quote(text) + " has " + m.group(1).length()
                    + " characters; at most " + MAX_NUMBER_CHARACTERS + " are accepted");
        }
        String spelling = m.group(2).strip();
        Unit unit = spelling.isEmpty() ? d.siUnit() : d.unit(spelling).orElseThrow(
                () -> expected(d, Texts.quote(text), unitHint(d, spelling)));
        double si;
        try {
            si = unit.toSi(new BigDecimal(m.group(1))).doubleValue();
        } catch (ArithmeticException e) {
            // Only extreme exponents overflow BigDecimal's scale; the value is far out of range anyway.
            si = Double.POSITIVE_INFINITY;
        }
        if (!Double.isFinite(si)) {
            throw new IllegalArgumentException(Texts.quote(text) + " is out of range for " + d.noun());
        }
        return si;
    }

    /**
     * The unit a quantity text is written in, as spelled there ("mm" for "12 mm", "uT" for
     * "-45 uT"); empty for a bare number or a text that is no quantity.
     */
    public static String unitOf(String text) {
        Matcher m = NUMBER_AND_UNIT.matcher(normalise(text.strip()));
        return m.matches() ? m.group(2).strip() : "";
    }

    /** Longest plain decimal {@link #exactly} writes: 17 digits, a sign, a point and a few zeros. */
    private static final int PLAIN_LIMIT = 24;

    /**
     * {@code si} written in the unit spelled {@code unit} with the fewest digits that
     * {@link #parse} reads back as exactly {@code si} ("12.5 mm"), so a file keeps its units
     * without losing a bit; empty when {@code d} has no such unit or no decimal of at most 17
     * digits reads back exactly (a unit with a factor of π or an offset may not).
     */
    public static Optional<String> exactly(double si, Dimension d, String unit) {
        Optional<Unit> u = d.unit(normalise(unit));
        if (u.isEmpty() || !Double.isFinite(si)) {
            return Optional.empty();
        }
        BigDecimal inUnit = u.get().fromSi(new BigDecimal(si));
        for (int digits = 1; digits <= 17; digits++) {
            BigDecimal rounded = inUnit.round(new MathContext(digits, RoundingMode.HALF_EVEN)).stripTrailingZeros();
            // "50 uT", not "5E+1 uT"; an exponent only where plain digits would run long (1e-300 T).
            String plain = rounded.toPlainString();
            String text = (plain.length() <= PLAIN_LIMIT ? plain : rounded.toString()) + " " + unit;
            if (Double.compare(parse(text, d), si) == 0) { // −0.0 is not 0.0 to a record
                return Optional.of(text);
            }
        }
        return Optional.empty();
    }

    /**
     * {@code si}, or zero when it is rounding noise beside {@code referenceSi}: when
     * |si| &lt; {@value #NOISE_FRACTION}·|referenceSi|. The reference is the size of what the value
     * was computed from or is shown with, in the same unit: the length of the vector whose
     * component it is, the largest EMF of the run it belongs to. The rule holds no fixed amount,
     * so a value is never hidden for being small, only for being small beside its reference.
     * A NaN value stays NaN; a NaN reference hides nothing.
     */
    public static double withoutNoise(double si, double referenceSi) {
        return Math.abs(si) < NOISE_FRACTION * Math.abs(referenceSi) ? 0 : si;
    }

    /** {@code si} with {@value #DISPLAY_DIGITS} significant digits in the best-fitting display unit. */
    public static String format(double si, Dimension d) {
        return format(si, d, DISPLAY_DIGITS);
    }

    /**
     * {@code si} with {@code significantDigits} digits in the largest display unit of {@code d} in
     * which its magnitude is at least 1 (else the smallest): "12.5 mm", "−3.20 mV", "48.0 µT".
     */
    public static String format(double si, Dimension d, int significantDigits) {
        if (significantDigits < 1 || significantDigits > 17) {
            throw new IllegalArgumentException("significant digits must be 1 to 17, got " + significantDigits);
        }
        if (!Double.isFinite(si)) {
            return nonFinite(si, d.siUnit().symbol());
        }
        MathContext digits = new MathContext(significantDigits, RoundingMode.HALF_UP);
        BigDecimal exact = new BigDecimal(si);
        BigDecimal rounded = exact.round(digits);
        List<Unit> ladder = d.displayUnits();
        // Zero reads best in the plain unit ("0.00 m", not "0.00 nm"); tiny values take the smallest.
        Unit chosen = rounded.signum() == 0 && ladder.contains(d.siUnit()) ? d.siUnit() : ladder.get(0);
        for (int i = ladder.size() - 1; i >= 0; i--) {
            if (ladder.get(i).fromSi(rounded).abs().compareTo(BigDecimal.ONE) >= 0) {
                chosen = ladder.get(i);
                break;
            }
        }
        return render(chosen.fromSi(exact).round(digits), significantDigits, chosen.symbol());
    }

    /**
     * {@code si} with {@value #DISPLAY_DIGITS} significant digits in the unit spelled {@code unit}
     * (written as given): {@code format(0.0125, LENGTH, "in")} is "0.492 in".
     *
     * @throws IllegalArgumentException if {@code d} has no such unit
     */
    public static String format(double si, Dimension d, String unit) {
        String spelling = normalise(unit);
        Unit u = d.unit(spelling).orElseThrow(() -> new IllegalArgumentException(
                "unknown unit '" + unit + "' for " + d.noun() + "; use one of " + d.symbols()));
        if (!Double.isFinite(si)) {
            return nonFinite(si, spelling);
        }
        MathContext digits = new MathContext(DISPLAY_DIGITS, RoundingMode.HALF_UP);
        return render(u.fromSi(new BigDecimal(si)).round(digits), DISPLAY_DIGITS, spelling);
    }

    private static String render(BigDecimal v, int significantDigits, String symbol) {
        String number;
        if (v.signum() == 0) {
            number = BigDecimal.ZERO.setScale(significantDigits - 1).toPlainString();
        } else {
            int exponent = v.precision() - v.scale() - 1;
            BigDecimal magnitude = v.abs();
            if (exponent < SMALLEST_PLAIN_EXPONENT || exponent > LARGEST_PLAIN_EXPONENT) {
                number = magnitude.movePointLeft(exponent).setScale(significantDigits - 1, RoundingMode.HALF_UP)
                        .toPlainString() + "e" + exponent;
            } else {
                number = magnitude.setScale(Math.max(0, significantDigits - 1 - exponent), RoundingMode.HALF_UP)
                        .toPlainString();
            }
            number = (v.signum() < 0 ? "−" : "") + number;
        }
        return withUnit(number, symbol);
    }

    private static String nonFinite(double si, String symbol) {
        return withUnit(Double.isNaN(si) ? "NaN" : (si > 0 ? "∞" : "−∞"), symbol);
    }

    /** SI style: a space before the unit, none before the degree sign of a plane angle. */
    private static String withUnit(String number, String symbol) {
        if (symbol.isEmpty() || symbol.equals("°")) {
            return number + symbol;
        }
        return number + " " + symbol;
    }

    private static String normalise(String s) {
        return s.replace('\u2212', '-') // minus sign
                .replace('\u03BC', 'µ') // Greek mu → micro sign
                .replace('\u2126', 'Ω') // ohm sign → Greek capital omega
                .replace('\u22C5', '·') // dot operator → middle dot
                .replace('\u00A0', ' ').replace('\u202F', ' '); // no-break spaces
    }

    private static IllegalArgumentException expected(Dimension d, String got, String hint) {
        return new IllegalArgumentException("expected " + d.noun() + " such as '" + d.example() + "', got "
                + got + hint);
    }

    private static String unitHint(Dimension d, String spelling) {
        List<Dimension> others = Dimension.accepting(spelling);
        if (!others.isEmpty()) {
            return " (" + spelling + " is a unit of " + others.get(0).noun().replaceFirst("^an? ", "") + ")";
        }
        if (d == Dimension.DIMENSIONLESS) {
            return " (a plain number takes no unit)";
        }
        return " (unknown unit '" + spelling + "'; " + d.noun() + " takes " + d.symbols() + ")";
    }
}

package org.kinduct.scene.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kinduct.scene.units.Dimension.ACCELERATION;
import static org.kinduct.scene.units.Dimension.ANGLE;
import static org.kinduct.scene.units.Dimension.ANGULAR_SPEED;
import static org.kinduct.scene.units.Dimension.CONDUCTIVITY;
import static org.kinduct.scene.units.Dimension.CURRENT;
import static org.kinduct.scene.units.Dimension.DAMPING;
import static org.kinduct.scene.units.Dimension.DIMENSIONLESS;
import static org.kinduct.scene.units.Dimension.FLUX_DENSITY;
import static org.kinduct.scene.units.Dimension.INERTIA;
import static org.kinduct.scene.units.Dimension.LENGTH;
import static org.kinduct.scene.units.Dimension.RESISTANCE;
import static org.kinduct.scene.units.Dimension.STIFFNESS;
import static org.kinduct.scene.units.Dimension.TEMPERATURE;
import static org.kinduct.scene.units.Dimension.TIME;
import static org.kinduct.scene.units.Dimension.VELOCITY;
import static org.kinduct.scene.units.Dimension.VOLTAGE;

import java.time.Duration;
import java.util.SplittableRandom;
import java.util.stream.LongStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Conversion factors are checked against their definitions: SI prefixes and the degree, minute and
 * the kelvin–Celsius relation from BIPM, The International System of Units (SI Brochure), 9th ed.
 * 2019, Tables 7 and 8 and §2.3.1; gauss, inch, mil, mile per hour and km/h from NIST Special
 * Publication 811 (2008), Appendix B.8, where they are exact.
 */
class UnitsTest {

    /** A few ulps: the conversions round once from an exact decimal value. */
    private static final double RELATIVE_TOLERANCE = 1e-15;
    /** Half a unit in the third significant digit, the resolution of the default display. */
    private static final double DISPLAY_RELATIVE_RESOLUTION = 5e-3;
    private static final long FIRST_SEED = 7_340_113L;
    private static final int RANDOM_CASES = 200;

    static Stream<Arguments> validInputs() {
        double pi = Math.PI;
        return Stream.of(
                // SI prefixes, SI Brochure Table 7.
                Arguments.of("12 mm", LENGTH, 12e-3),
                Arguments.of("12mm", LENGTH, 12e-3),
                Arguments.of("  12 mm  ", LENGTH, 12e-3),
                Arguments.of(".5 mm", LENGTH, 0.5e-3),
                Arguments.of("+5 mA", CURRENT, 5e-3),
                Arguments.of("1e-3", LENGTH, 1e-3),
                Arguments.of("2.5E2 µm", LENGTH, 250e-6),
                Arguments.of("-45 µT", FLUX_DENSITY, -45e-6),
                Arguments.of("-45 uT", FLUX_DENSITY, -45e-6),
                Arguments.of("\u221245 \u03bcT", FLUX_DENSITY, -45e-6), // Unicode minus and Greek mu
                Arguments.of("1.5 mV", VOLTAGE, 1.5e-3),
                Arguments.of("0.1 kΩ", RESISTANCE, 100),
                Arguments.of("100 ohm", RESISTANCE, 100),
                Arguments.of("100 \u2126", RESISTANCE, 100), // ohm sign
                Arguments.of("200 N/mm", STIFFNESS, 200e3),
                Arguments.of("10 ms", TIME, 10e-3),
                // Gauss: 1 G = 1e-4 T exactly, NIST SP 811 B.8.
                Arguments.of("0.5 G", FLUX_DENSITY, 0.5e-4),
                Arguments.of("10 kG", FLUX_DENSITY, 1.0),
                Arguments.of("500 mG", FLUX_DENSITY, 500e-7),
                // Inch 0.0254 m and mil 0.001 in exactly, NIST SP 811 B.8.
                Arguments.of("1 in", LENGTH, 0.0254),
                Arguments.of("2 mil", LENGTH, 2 * 0.0254e-3),
                // km/h = 1000 m / 3600 s; mph = 0.44704 m/s exactly, NIST SP 811 B.8.
                Arguments.of("3 km/h", VELOCITY, 3 * 1000 / 3600.0),
                Arguments.of("60 mph", VELOCITY, 60 * 0.44704),
                // Degree = π/180 rad and minute = 60 s, SI Brochure Table 8; one revolution is 2π rad.
                Arguments.of("30 deg", ANGLE, pi / 6),
                Arguments.of("30°", ANGLE, pi / 6),
                Arguments.of("250 mrad", ANGLE, 0.25),
                Arguments.of("600 rpm", ANGULAR_SPEED, 600 * 2 * pi / 60),
                // Conductivity: S/cm = 100 S/m (SI prefixes on the metre); 100 % IACS = 58 MS/m
                // (IEC 60028, ρ20 = 1/58 Ω·mm²/m).
                Arguments.of("35 MS/m", CONDUCTIVITY, 35e6),
                Arguments.of("5 mS/cm", CONDUCTIVITY, 0.5),
                Arguments.of("500 µS/cm", CONDUCTIVITY, 0.05),
                Arguments.of("500 uS/cm", CONDUCTIVITY, 0.05),
                Arguments.of("61 % IACS", CONDUCTIVITY, 61 * 0.58e6),
                Arguments.of("100%IACS", CONDUCTIVITY, 58e6),
                Arguments.of("1 rev/s", ANGULAR_SPEED, 2 * pi),
                Arguments.of("90 deg/s", ANGULAR_SPEED, pi / 2),
                Arguments.of("1.5 min", TIME, 90),
                // Celsius temperature t/°C = T/K − 273.15, SI Brochure §2.3.1.
                Arguments.of("20 degC", TEMPERATURE, 20),
                Arguments.of("20 °C", TEMPERATURE, 20),
                Arguments.of("20 C", TEMPERATURE, 20),
                Arguments.of("293.15 K", TEMPERATURE, 20),
                Arguments.of("0 K", TEMPERATURE, -273.15),
                // Compound units: g·cm² = 1e-3 kg × 1e-4 m².
                Arguments.of("2 g·cm²", INERTIA, 2e-7),
                Arguments.of("2 g*cm^2", INERTIA, 2e-7),
                Arguments.of("0.5 N*s/m", DAMPING, 0.5),
                Arguments.of("9.81 m/s^2", ACCELERATION, 9.81),
                Arguments.of("9.81 m/s²", ACCELERATION, 9.81),
                Arguments.of("0.25", DIMENSIONLESS, 0.25));
    }

    @ParameterizedTest(name = "{0} as {1}")
    @MethodSource("validInputs")
    void parsesValueAndUnitToSi(String text, Dimension d, double expectedSi) {
        double si = Units.parse(text, d);

        assertEquals(expectedSi, si, Math.abs(expectedSi) * RELATIVE_TOLERANCE, text);
    }

    @Test
    void decimalUnitStringsGiveTheNearestDouble() {
        // Java decimal literals are the nearest double (JLS 17 §3.10.2), so exact equality holds
        // when the conversion rounds once, as Unit's decimal arithmetic does.
        assertEquals(0.012, Units.parse("12 mm", LENGTH));
        assertEquals(5e-5, Units.parse("0.5 G", FLUX_DENSITY));
        assertEquals(0.0254, Units.parse("1 in", LENGTH));
        assertEquals(1e-4, Units.parse("0.1 mm", LENGTH));
        assertEquals(0.3, Units.parse("300 mm", LENGTH));
    }

    static Stream<Arguments> invalidInputs() {
        return Stream.of(
                Arguments.of("12 mT", LENGTH, "expected a length such as '12 mm', got '12 mT' (mT is a unit of flux density)"),
                Arguments.of("abc", LENGTH, "expected a length such as '12 mm', got 'abc'"),
                Arguments.of("12 qq", LENGTH, "expected a length such as '12 mm', got '12 qq' (unknown unit 'qq'; "
                        + "a length takes m, cm, mm, µm, nm, km, in, mil)"),
                Arguments.of("12 MM", LENGTH, "got '12 MM' (unknown unit 'MM'"),
                Arguments.of("", TIME, "expected a time such as '10 ms', got ''"),
                Arguments.of("NaN", LENGTH, "got 'NaN'"),
                Arguments.of("Infinity m", LENGTH, "got 'Infinity m'"),
                Arguments.of("0x10 mm", LENGTH, "(unknown unit 'x10 mm'"),
                Arguments.of("1,5 mm", LENGTH, "(unknown unit ',5 mm'"),
                Arguments.of("1d", LENGTH, "(unknown unit 'd'"),
                Arguments.of("mm", LENGTH, "got 'mm'"),
                Arguments.of("1e400 m", LENGTH, "'1e400 m' is out of range for a length"),
                Arguments.of("5 mm", DIMENSIONLESS, "expected a plain number such as '0.5', got '5 mm' (mm is a unit of length)"),
                Arguments.of("5 Hz", DIMENSIONLESS, "(Hz is a unit of frequency)"),
                Arguments.of("3 m/s", ANGULAR_SPEED, "expected an angular speed such as '600 rpm', got '3 m/s' (m/s is a unit of velocity)"),
                Arguments.of("2 A\u0000", CURRENT, "got '2 A\\u0000'"));
    }

    @ParameterizedTest(name = "{0} as {1}")
    @MethodSource("invalidInputs")
    void rejectsInputWithMessageSayingWhatWasExpected(String text, Dimension d, String messagePart) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Units.parse(text, d));

        assertTrue(e.getMessage().contains(messagePart), e.getMessage());
    }

    @Test
    void rejectsMissingText() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Units.parse(null, LENGTH));

        assertEquals("expected a length such as '12 mm', got nothing", e.getMessage());
    }

    static Stream<Arguments> formats() {
        return Stream.of(
                Arguments.of(0.0125, LENGTH, "12.5 mm"),
                Arguments.of(-3.2e-3, VOLTAGE, "−3.20 mV"),
                Arguments.of(48e-6, FLUX_DENSITY, "48.0 µT"),
                Arguments.of(0.0, LENGTH, "0.00 m"),
                Arguments.of(-0.0, LENGTH, "0.00 m"),
                Arguments.of(9.9996e-4, LENGTH, "1.00 mm"),
                Arguments.of(999.6, LENGTH, "1.00 km"),
                Arguments.of(1234.5, LENGTH, "1.23 km"),
                Arguments.of(123_456.0, LENGTH, "123 km"),
                Arguments.of(1.2345e6, LENGTH, "1230 km"),
                Arguments.of(1e12, LENGTH, "1.00e9 km"),
                Arguments.of(1e-12, LENGTH, "0.00100 nm"),
                Arguments.of(1e-13, LENGTH, "1.00e-4 nm"),
                Arguments.of(Math.PI / 6, ANGLE, "30.0°"),
                Arguments.of(20.0, TEMPERATURE, "20.0 °C"),
                Arguments.of(-273.15, TEMPERATURE, "−273 °C"),
                Arguments.of(2 * Math.PI * 10, ANGULAR_SPEED, "62.8 rad/s"),
                Arguments.of(0.5, DIMENSIONLESS, "0.500"),
                Arguments.of(100.0, RESISTANCE, "100 Ω"),
                Arguments.of(4700.0, RESISTANCE, "4.70 kΩ"),
                Arguments.of(2e-7, INERTIA, "2.00 g·cm²"),
                Arguments.of(5000.0, STIFFNESS, "5.00 N/mm"),
                Arguments.of(1.31e-9, Dimension.POWER, "1.31 nW"),
                Arguments.of(Double.NaN, LENGTH, "NaN m"),
                Arguments.of(Double.NEGATIVE_INFINITY, VOLTAGE, "−∞ V"));
    }

    @ParameterizedTest(name = "{0} as {1}")
    @MethodSource("formats")
    void formatsWithThreeSignificantDigitsAndEngineeringPrefix(double si, Dimension d, String expected) {
        assertEquals(expected, Units.format(si, d));
    }

    @Test
    void formatsInAChosenUnit() {
        assertEquals("0.492 in", Units.format(0.0125, LENGTH, "in"));
        assertEquals("600 rpm", Units.format(20 * Math.PI, ANGULAR_SPEED, "rpm"));
        assertEquals("10000 G", Units.format(1.0, FLUX_DENSITY, "G"));
        assertEquals("12500 um", Units.format(0.0125, LENGTH, "um"));
    }

    @Test
    void formatsWithMoreDigitsOnRequest() {
        assertEquals("12.500 mm", Units.format(0.0125, LENGTH, 5));
        // 17 significant digits recover any double (IEEE 754-2008 §5.12.2).
        double awkward = -1.2345678901234567e-3;
        assertEquals(awkward, Units.parse(Units.format(awkward, VOLTAGE, 17), VOLTAGE));
    }

    @Test
    void refusesAMillionDigitNumberAtOnce() {
        String huge = "1" + "0".repeat(1_000_000) + " mm";
        // Converting it exactly took 40 s (quadratic in the digits); the length alone decides now.
        IllegalArgumentException e = assertTimeoutPreemptively(Duration.ofSeconds(1),
                () -> assertThrows(IllegalArgumentException.class, () -> Units.parse(huge, LENGTH)));
        assertTrue(e.getMessage().endsWith("has 1000001 characters; at most 100 are accepted"), e.getMessage());
        assertEquals(0.001, Units.parse("1." + "0".repeat(97) + " mm", LENGTH), "100 characters are accepted");
    }

    @Test
    void refusesToFormatInAUnitOfAnotherDimension() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Units.format(1, LENGTH, "mT"));

        assertEquals("unknown unit 'mT' for a length; use one of m, cm, mm, µm, nm, km, in, mil", e.getMessage());
    }

    @ParameterizedTest
    @EnumSource(Dimension.class)
    void everyDisplayUnitIsAcceptedOnInput(Dimension d) {
        for (Unit u : d.displayUnits()) {
            assertEquals(u.toSi(1), Units.parse("1" + (u.symbol().isEmpty() ? "" : " " + u.symbol()), d),
                    RELATIVE_TOLERANCE * Math.abs(u.toSi(1)), d + " " + u);
        }
    }

    static LongStream seeds() {
        return LongStream.range(FIRST_SEED, FIRST_SEED + RANDOM_CASES);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void formattedTextParsesBackWithinTheDisplayedResolution(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        Dimension d = Dimension.values()[r.nextInt(Dimension.values().length)];
        double si = (r.nextBoolean() ? 1 : -1) * Math.pow(10, -12 + 24 * r.nextDouble());

        String shown = Units.format(si, d);
        String exact = Units.format(si, d, 17);

        assertEquals(si, Units.parse(shown, d), Math.abs(si) * DISPLAY_RELATIVE_RESOLUTION,
                "seed " + seed + ": " + si + " shown as " + shown);
        assertEquals(si, Units.parse(exact, d), Math.abs(si) * RELATIVE_TOLERANCE,
                "seed " + seed + ": " + si + " shown as " + exact);
    }
}

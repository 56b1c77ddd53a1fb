package org.kinduct.scene.units;

import static org.kinduct.scene.units.Unit.piRatio;
import static org.kinduct.scene.units.Unit.ratio;
import static org.kinduct.scene.units.Unit.scaled;
import static org.kinduct.scene.units.Unit.shifted;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * The kinds of quantity a scene holds, each with its SI unit (listed first) and the units accepted
 * on input. Temperatures are the exception to SI: the model keeps them in °C.
 *
 * <p>Conversion factors are exact by definition (NIST Special Publication 811, 2008 edition,
 * Appendix B.8; BIPM, The International System of Units, 9th ed., 2019, Table 8):
 * 1 in = 0.0254 m and 1 mil = 0.001 in (international inch, 1959); 1 G = 1e-4 T;
 * 1 km/h = 1000/3600 m/s; 1 mph = 0.44704 m/s (international mile 1609.344 m);
 * 1° = π/180 rad; 1 rpm = 2π/60 rad/s (one revolution is 2π rad); 1 min = 60 s;
 * T/K = t/°C + 273.15. Conductivities: 1 S/cm = 100 S/m, as the water trade writes them in mS/cm and
 * µS/cm; 100 % IACS = 58 MS/m, the International Annealed Copper Standard's conductivity
 * (IEC 60028: ρ20 = 1/58 Ω·mm²/m), so 1 % IACS = 0.58 MS/m exactly.
 */
public enum Dimension {
    LENGTH("a length", "12 mm", "nm µm mm m km",
            scaled("1", "m"), scaled("0.01", "cm"), scaled("0.001", "mm"), scaled("1e-6", "µm"),
            scaled("1e-9", "nm"), scaled("1000", "km"), scaled("0.0254", "in"), scaled("0.0000254", "mil")),
    FLUX_DENSITY("a flux density", "5 mT", "nT µT mT T",
            scaled("1", "T"), scaled("0.001", "mT"), scaled("1e-6", "µT"), scaled("1e-9", "nT"),
            scaled("1e-4", "G"), scaled("1e-7", "mG"), scaled("0.1", "kG")),
    VELOCITY("a velocity", "0.5 m/s", "mm/s m/s",
            scaled("1", "m/s"), scaled("0.01", "cm/s"), scaled("0.001", "mm/s"),
            ratio("1000", "3600", "km/h"), scaled("0.44704", "mph")),
    ACCELERATION("an acceleration", "9.81 m/s^2", "m/s²",
            scaled("1", "m/s²", "m/s^2", "m/s2")),
    TIME("a time", "10 ms", "ns µs ms s",
            scaled("1", "s"), scaled("0.001", "ms"), scaled("1e-6", "µs"), scaled("1e-9", "ns"),
            scaled("60", "min"), scaled("3600", "h")),
    FREQUENCY("a frequency", "50 Hz", "mHz Hz kHz MHz",
            scaled("1", "Hz"), scaled("0.001", "mHz"), scaled("1000", "kHz"), scaled("1e6", "MHz")),
    ANGLE("an angle", "30 deg", "°",
            scaled("1", "rad"), scaled("0.001", "mrad"), piRatio("1", "180", "°", "deg")),
    ANGULAR_SPEED("an angular speed", "600 rpm", "rad/s",
            scaled("1", "rad/s"), piRatio("1", "180", "deg/s", "°/s"), piRatio("2", "60", "rpm", "r/min"),
            piRatio("2", "1", "rev/s", "r/s")),
    CURRENT("a current", "0.5 A", "nA µA mA A kA",
            scaled("1", "A"), scaled("0.001", "mA"), scaled("1e-6", "µA"), scaled("1e-9", "nA"),
            scaled("1000", "kA")),
    RESISTANCE("a resistance", "100 ohm", "mΩ Ω kΩ MΩ",
            scaled("1", "Ω", "ohm", "Ohm"), scaled("0.001", "mΩ", "mohm", "mOhm"),
            scaled("1000", "kΩ", "kohm", "kOhm"), scaled("1e6", "MΩ", "Mohm", "MOhm")),
    MASS("a mass", "20 g", "mg g kg",
            scaled("1", "kg"), scaled("0.001", "g"), scaled("1e-6", "mg")),
    TEMPERATURE("a temperature", "20 degC", "°C",
            scaled("1", "°C", "degC", "C"), shifted("-273.15", "K")),
    FORCE("a force", "1.5 N", "µN mN N kN",
            scaled("1", "N"), scaled("0.001", "mN"), scaled("1e-6", "µN"), scaled("1000", "kN")),
    STIFFNESS("a stiffness", "200 N/m", "N/m N/mm",
            scaled("1", "N/m"), scaled("1000", "N/mm")),
    DAMPING("a damping coefficient", "0.5 N*s/m", "N·s/m",
            scaled("1", "N·s/m", "N*s/m", "Ns/m", "N s/m")),
    INERTIA("a moment of inertia", "2 g*cm^2", "g·cm² kg·m²",
            scaled("1", "kg·m²", "kg*m^2", "kg*m2", "kg·m^2", "kg m^2"),
            scaled("1e-7", "g·cm²", "g*cm^2", "g*cm2", "g·cm^2", "g cm^2")),
    VOLTAGE("a voltage", "1.5 mV", "nV µV mV V kV",
            scaled("1", "V"), scaled("0.001", "mV"), scaled("1e-6", "µV"), scaled("1e-9", "nV"),
            scaled("1000", "kV")),
    FLUX("a magnetic flux", "3 mWb", "nWb µWb mWb Wb",
            scaled("1", "Wb"), scaled("0.001", "mWb"), scaled("1e-6", "µWb"), scaled("1e-9", "nWb")),
    INDUCTANCE("an inductance", "10 mH", "nH µH mH H",
            scaled("1", "H"), scaled("0.001", "mH"), scaled("1e-6", "µH"), scaled("1e-9", "nH")),
    POWER("a power", "2 W", "nW µW mW W kW",
            scaled("1", "W"), scaled("0.001", "mW"), scaled("1e-6", "µW"), scaled("1e-9", "nW"), scaled("1000", "kW")),
    ENERGY("an energy", "5 mJ", "µJ mJ J kJ",
            scaled("1", "J"), scaled("0.001", "mJ"), scaled("1e-6", "µJ"), scaled("1000", "kJ")),
    TORQUE("a torque", "0.2 N*m", "µN·m mN·m N·m",
            scaled("1", "N·m", "N*m", "Nm"), scaled("0.001", "mN·m", "mN*m", "mNm"),
            scaled("1e-6", "µN·m", "µN*m", "µNm")),
    CURRENT_DENSITY("a current density", "5 A/mm^2", "A/m² kA/m² A/mm²",
            scaled("1", "A/m²", "A/m^2", "A/m2"), scaled("1000", "kA/m²", "kA/m^2", "kA/m2"),
            scaled("1e4", "A/cm²", "A/cm^2", "A/cm2"), scaled("1e6", "A/mm²", "A/mm^2", "A/mm2")),
    CONDUCTIVITY("a conductivity", "35 MS/m", "µS/cm mS/cm S/m MS/m",
            scaled("1", "S/m"), scaled("1e6", "MS/m"), scaled("1000", "kS/m"), scaled("0.001", "mS/m"),
            scaled("100", "S/cm"), scaled("0.1", "mS/cm"), scaled("1e-4", "µS/cm"),
            scaled("580000", "% IACS", "%IACS")),
    DIMENSIONLESS("a plain number", "0.5", "",
            scaled("1", ""));

    private final String noun;
    private final String example;
    private final List<Unit> units;
    private final List<Unit> displayUnits;
    private final Map<String, Unit> bySpelling = new LinkedHashMap<>();

    Dimension(String noun, String example, String displayLadder, Unit... units) {
        this.noun = noun;
        this.example = example;
        this.units = List.of(units);
        for (Unit u : units) {
            u.spellings().forEach(s -> bySpelling.put(s, u));
        }
        List<Unit> ladder = new ArrayList<>();
        for (String s : displayLadder.split(" ", -1)) {
            ladder.add(Optional.ofNullable(bySpelling.get(s))
                    .orElseThrow(() -> new IllegalStateException(name() + " cannot display in '" + s + "'")));
        }
        this.displayUnits = List.copyOf(ladder);
    }

    /** The kind of quantity with its article, for messages: "a length". */
    public String noun() {
        return noun;
    }

    /** A typical input, for messages: "12 mm". */
    public String example() {
        return example;
    }

    /** The SI unit (°C for temperatures); a bare number means this unit. */
    public Unit siUnit() {
        return units.get(0);
    }

    /** Every accepted unit, the SI unit first. */
    public List<Unit> units() {
        return units;
    }

    /** The units {@link Units#format(double, Dimension)} chooses from, smallest first. */
    public List<Unit> displayUnits() {
        return displayUnits;
    }

    /** The unit spelled {@code spelling} (exact case: "mm" is not "Mm"), if this dimension accepts it. */
    public Optional<Unit> unit(String spelling) {
        return Optional.ofNullable(bySpelling.get(spelling));
    }

    /** The dimensions that accept {@code spelling}, for "mT is a flux density" hints. */
    static List<Dimension> accepting(String spelling) {
        return Arrays.stream(values()).filter(d -> d.bySpelling.containsKey(spelling)).collect(Collectors.toList());
    }

    /** The unit symbols, for messages: "m, cm, mm, µm, nm, km, in, mil". */
    String symbols() {
        return units.stream().map(Unit::symbol).collect(Collectors.joining(", "));
    }
}

package dev.countercheck.submission;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * The kinds of quantity a submission holds, each with its default unit (the unit of a bare
 * number), the units accepted in text such as {@code "1.1 m"}, and the magnitude no value of its
 * kind exceeds in the review of a foundation: a larger value is a slip (a unit, a decimal point,
 * a key held down), refused rather than reviewed. The limits are generous, at least ten times the
 * largest values of real pile caps and pad footings (common practice):
 * <ul>
 *   <li>length 100 m: caps and footings span metres, a few tens of metres at the very most;
 *   <li>force 10⁶ kN (1000 MN): the heaviest building columns carry some 10⁵ kN;
 *   <li>moment 10⁷ kNm: the largest force at a lever arm of 10 m;
 *   <li>stress 1000 MPa: reinforcing steel yields at 400 to 600 MPa, concrete crushes far lower;
 *   <li>area 10⁷ mm² (10 m²): the steel area of any cross-section of a cap stays far below;
 *   <li>angle 180°;
 *   <li>pressure 100 MPa (10⁵ kPa): ground pressures and soil strengths stay below a few MPa;
 *   <li>unit weight 100 kN/m³: soils and concrete weigh some 15 to 25 kN/m³;
 *   <li>plain number 100: the factors a submission states (β, ratios) lie near 1.
 * </ul>
 * Unit symbols are case-sensitive ({@code MN} is a force, {@code mm} a length).
 */
enum Dimension {
    LENGTH("a length", 1e5, "100 m (100000 mm)", new Unit("mm", 1), new Unit("cm", 10), new Unit("m", 1000)),
    FORCE("a force", 1e6, "1000000 kN (1000 MN)", new Unit("kN", 1), new Unit("N", 1e-3), new Unit("MN", 1e3)),
    MOMENT("a moment", 1e7, "10000000 kNm", new Unit("kNm", 1), new Unit("kN·m", 1), new Unit("MNm", 1e3),
            new Unit("Nmm", 1e-6)),
    STRESS("a stress", 1e3, "1000 MPa", new Unit("MPa", 1), new Unit("N/mm2", 1), new Unit("N/mm²", 1),
            new Unit("kPa", 1e-3), new Unit("GPa", 1e3)),
    AREA("an area", 1e7, "10000000 mm2 (10 m2)", new Unit("mm2", 1), new Unit("mm²", 1), new Unit("cm2", 100),
            new Unit("m2", 1e6)),
    ANGLE("an angle", 180, "180°", new Unit("deg", 1), new Unit("°", 1)),
    /** A ground pressure or a soil strength, kPa (kN/m²). */
    PRESSURE("a pressure", 1e5, "100000 kPa (100 MPa)", new Unit("kPa", 1), new Unit("kN/m2", 1),
            new Unit("kN/m²", 1), new Unit("MPa", 1e3)),
    /** A unit weight, kN/m³. */
    UNIT_WEIGHT("a unit weight", 100, "100 kN/m3", new Unit("kN/m3", 1), new Unit("kN/m³", 1)),
    /** A pure number (β, a ratio): no unit may be written. */
    NUMBER("a plain number", 100, "100", new Unit("-", 1));

    /** A unit symbol and the factor that converts a value in it to the default unit. */
    record Unit(String symbol, double toDefault) {
    }

    private final String noun;
    private final double limit;
    private final String limitText;
    private final List<Unit> units;

    Dimension(String noun, double limit, String limitText, Unit... units) {
        this.noun = noun;
        this.limit = limit;
        this.limitText = limitText;
        this.units = List.of(units);
    }

    /** The largest magnitude a value of this kind may have, in the default unit. */
    double limit() {
        return limit;
    }

    /**
     * The smallest magnitude other than zero a value of this kind may have, in the default unit: a
     * value closer to zero (a pile of 1e-200 mm) is a slip, and as a divisor it would make a
     * formula divide by zero. The bounds lie far below any dimension, load or stress of a
     * foundation (common practice): 0.1 mm, 1 N, 1 Nm, 1 kPa, 0.1 mm², 0.01°, 0.01 kPa, 0.01 kN/m³
     * and 10⁻⁶ for a plain number.
     */
    double least() {
        return switch (this) {
            case LENGTH -> 0.1;
            case FORCE -> 1e-3;
            case MOMENT -> 1e-3;
            case STRESS -> 1e-3;
            case AREA -> 0.1;
            case ANGLE -> 0.01;
            case PRESSURE -> 0.01;
            case UNIT_WEIGHT -> 0.01;
            case NUMBER -> 1e-6;
        };
    }

    /** The limit for a message: "100 m (100000 mm)". */
    String limitText() {
        return limitText;
    }

    /** The units accepted, the default first. */
    List<Unit> units() {
        return units;
    }

    /** "a length", "a force", ... */
    String noun() {
        return noun;
    }

    /** The unit of a bare number, e.g. {@code mm}. */
    String defaultUnit() {
        return units.get(0).symbol();
    }

    /** "mm, cm, m" */
    String unitList() {
        return units.stream().map(Unit::symbol).collect(Collectors.joining(", "));
    }

    Optional<Unit> unit(String symbol) {
        return units.stream().filter(u -> u.symbol().equals(symbol)).findFirst();
    }

    /** The dimension whose units include {@code symbol}, if any (to name the kind of a misplaced unit). */
    static Optional<Dimension> ofUnit(String symbol) {
        return Arrays.stream(values()).filter(d -> d != NUMBER && d.unit(symbol).isPresent()).findFirst();
    }

    /** The dimension of a {@link CheckCatalogue} unit ({@code "kN"}, {@code "mm2"}, {@code "-"}, ...). */
    static Dimension ofCatalogueUnit(String unit) {
        return Arrays.stream(values()).filter(d -> d.defaultUnit().equals(unit)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no dimension has the default unit " + unit));
    }
}

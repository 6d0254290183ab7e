package dev.countercheck.submission;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * The kinds of quantity a submission holds, each with its default unit (the unit of a bare
 * number) and the units accepted in text such as {@code "1.1 m"}. Unit symbols are case-sensitive
 * ({@code MN} is a force, {@code mm} a length).
 */
enum Dimension {
    LENGTH("a length", new Unit("mm", 1), new Unit("cm", 10), new Unit("m", 1000)),
    FORCE("a force", new Unit("kN", 1), new Unit("N", 1e-3), new Unit("MN", 1e3)),
    MOMENT("a moment", new Unit("kNm", 1), new Unit("kN·m", 1), new Unit("MNm", 1e3), new Unit("Nmm", 1e-6)),
    STRESS("a stress", new Unit("MPa", 1), new Unit("N/mm2", 1), new Unit("N/mm²", 1), new Unit("kPa", 1e-3),
            new Unit("GPa", 1e3)),
    AREA("an area", new Unit("mm2", 1), new Unit("mm²", 1), new Unit("cm2", 100), new Unit("m2", 1e6)),
    ANGLE("an angle", new Unit("deg", 1), new Unit("°", 1)),
    /** A pure number (β, a ratio): no unit may be written. */
    NUMBER("a plain number", new Unit("-", 1));

    /** A unit symbol and the factor that converts a value in it to the default unit. */
    record Unit(String symbol, double toDefault) {
    }

    private final String noun;
    private final List<Unit> units;

    Dimension(String noun, Unit... units) {
        this.noun = noun;
        this.units = List.of(units);
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

package dev.countercheck.submission;

import dev.countercheck.input.Problems;
import dev.countercheck.input.InputError;
import dev.countercheck.input.Node.ScalarNode;
import dev.countercheck.input.Node.ScalarNode.Kind;
import dev.countercheck.submission.Values.Bound;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Quantities written with a unit are converted to the default unit of their kind.
 * Source of every factor: the SI prefixes (BIPM, "The International System of Units", 9th edition
 * 2019, Table 7: c = 10⁻², m = 10⁻³, k = 10³, M = 10⁶, G = 10⁹) and 1 Pa = 1 N/m²; each row's
 * arithmetic is the hand calculation in its comment.
 */
class UnitsTest {

    private final Problems problems = new Problems("units.yaml");
    private final Values values = new Values(problems);

    private Optional<Double> read(Kind kind, String text, Dimension dimension) {
        return values.quantity(new ScalarNode(problems.at(1, 1), kind, text), "q", dimension, Bound.ANY);
    }

    @ParameterizedTest(name = "{0} as {1} = {2}")
    @CsvSource(delimiter = '|', value = {
            "1100        | LENGTH | 1100",     // bare number: default unit mm
            "1100 mm     | LENGTH | 1100",
            "110 cm      | LENGTH | 1100",     // 110 × 10 mm
            "1.1 m       | LENGTH | 1100",     // 1.1 × 1000 mm
            "1.1m        | LENGTH | 1100",     // no space needed
            "6800        | FORCE  | 6800",     // default unit kN
            "6800000 N   | FORCE  | 6800",     // 6 800 000 × 10⁻³ kN
            "6.8 MN      | FORCE  | 6800",     // 6.8 × 10³ kN
            "6800 kN     | FORCE  | 6800",
            "120 kNm     | MOMENT | 120",      // default unit kNm
            "120 kN·m    | MOMENT | 120",
            "0.12 MNm    | MOMENT | 120",      // 0.12 × 10³ kNm
            "1.2e8 Nmm   | MOMENT | 120",      // 1.2·10⁸ N·mm = 1.2·10⁸ × 10⁻³ kN × 10⁻³ m = 120 kNm
            "32          | STRESS | 32",       // default unit MPa
            "32 MPa      | STRESS | 32",
            "32 N/mm2    | STRESS | 32",       // 1 N/mm² = 1 N / 10⁻⁶ m² = 10⁶ Pa = 1 MPa
            "32 N/mm²    | STRESS | 32",
            "32000 kPa   | STRESS | 32",       // 32 000 × 10³ Pa = 32 × 10⁶ Pa
            "0.032 GPa   | STRESS | 32",       // 0.032 × 10³ MPa
            "4300        | AREA   | 4300",     // default unit mm2
            "4300 mm2    | AREA   | 4300",
            "4300 mm²    | AREA   | 4300",
            "43 cm2      | AREA   | 4300",     // 1 cm² = (10 mm)² = 100 mm²
            "0.0043 m2   | AREA   | 4300",     // 1 m² = (1000 mm)² = 10⁶ mm²
            "41 deg      | ANGLE  | 41",
            "41°         | ANGLE  | 41",
            "0.21        | NUMBER | 0.21",
            "-750        | LENGTH | -750",     // signs are kept (positions)
            "+2.5e3 mm   | LENGTH | 2500"      // 2.5 × 10³ mm
    })
    void convertsTextWithAUnitToTheDefaultUnit(String text, Dimension dimension, double expected) {
        assertThat(read(Kind.TEXT, text, dimension)).hasValueSatisfying(v -> assertThat(v).isCloseTo(expected, within(1e-9)));
        assertThat(problems.any()).isFalse();
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "1100        | LENGTH | 1100",
            "-3.5        | FORCE  | -3.5",
            "1.5e2       | STRESS | 150"        // 1.5 × 10² MPa
    })
    void aBareNumberIsInTheDefaultUnit(String text, Dimension dimension, double expected) {
        assertThat(read(Kind.NUMBER, text, dimension)).contains(expected);
    }

    @ParameterizedTest(name = "{0} as {1}: {2}")
    @CsvSource(delimiter = '|', value = {
            "3 kN     | LENGTH | '3 kN' is a force, but a length is expected here (mm, cm, m)",
            "1.1 m    | FORCE  | '1.1 m' is a length, but a force is expected here (kN, N, MN)",
            "32 MPa   | AREA   | '32 MPa' is a stress, but an area is expected here (mm2, mm², cm2, m2)",
            "3 ft     | LENGTH | unknown unit 'ft' in '3 ft': a length is expected here (mm, cm, m)",
            "120 kN m | MOMENT | unknown unit 'kN m' in '120 kN m': a moment is expected here (kNm, kN·m, MNm, Nmm)",
            "3 mm     | NUMBER | '3 mm' is a length, but a plain number without a unit is expected here",
            "MM 3     | LENGTH | 'MM 3' is not a length: write a number in mm, or a number and a unit (mm, cm, m)",
            "nan      | LENGTH | 'nan' is not a finite number",
            "1e999 mm | LENGTH | the value is too large to be a finite number"
    })
    void reportsAWrongOrUnknownUnit(String text, Dimension dimension, String message) {
        assertThat(read(Kind.TEXT, text, dimension)).isEmpty();
        assertThat(problems.sorted()).singleElement().extracting(InputError::message).isEqualTo(message);
    }

    /**
     * Each kind's limit of plausibility, on both sides, bare and with a unit. Source of the
     * limits: the table in {@link Dimension}'s Javadoc (common practice, at least ten times the
     * largest values of real caps and footings); the unit arithmetic is in the comments.
     */
    @ParameterizedTest(name = "{0} as {1}: accepted {2}")
    @CsvSource(delimiter = '|', value = {
            "100000      | LENGTH | true",     // 100 m = 100 000 mm, the limit itself
            "-100000     | LENGTH | true",     // a position may be negative; the limit is on the magnitude
            "100000.5    | LENGTH | false",
            "100.1 m     | LENGTH | false",    // 100.1 × 1000 = 100 100 mm
            "50000000    | LENGTH | false",    // a 50 km cap
            "1000000     | FORCE  | true",     // 10⁶ kN
            "1000.1 MN   | FORCE  | false",    // 1000.1 × 10³ = 1 000 100 kN
            "1e9         | FORCE  | false",    // a 10⁹ kN load
            "1e7         | MOMENT | true",
            "-1.1e7      | MOMENT | false",
            "1000        | STRESS | true",
            "1.1 GPa     | STRESS | false",    // 1.1 × 10³ = 1100 MPa
            "1e7         | AREA   | true",
            "10.1 m2     | AREA   | false",    // 10.1 × 10⁶ = 1.01 × 10⁷ mm²
            "180         | ANGLE  | true",
            "181 deg     | ANGLE  | false",
            "100         | NUMBER | true",
            "101         | NUMBER | false"
    })
    void aValueBeyondThePlausibleLimitOfItsKindIsRefused(String text, Dimension dimension, boolean accepted) {
        Kind kind = text.matches("[-+0-9.e]+") ? Kind.NUMBER : Kind.TEXT;

        assertThat(read(kind, text, dimension).isPresent()).isEqualTo(accepted);
        if (!accepted) {
            assertThat(problems.sorted()).singleElement().extracting(InputError::message).asString()
                    .startsWith(text + " is too large for " + dimension.noun())
                    .contains("no value of a foundation review exceeds " + dimension.limitText());
        }
    }

    @Test
    void unitSymbolsAreCaseSensitive() {
        // "mN" is not "MN": a millinewton would be a thousand million times smaller
        assertThat(read(Kind.TEXT, "6.8 mN", Dimension.FORCE)).isEmpty();
        assertThat(problems.sorted()).singleElement().extracting(InputError::message).asString()
                .startsWith("unknown unit 'mN'");
    }

    @ParameterizedTest
    @CsvSource({"kN, FORCE", "kNm, MOMENT", "mm, LENGTH", "mm2, AREA", "MPa, STRESS", "-, NUMBER", "deg, ANGLE"})
    void everyCatalogueUnitHasADimension(String unit, Dimension dimension) {
        assertThat(Dimension.ofCatalogueUnit(unit)).isEqualTo(dimension);
    }

    @Test
    void everyClaimableQuantityHasAUnitTheReaderKnows() {
        PileCapChecks.CATALOGUE.checks().values().forEach(check -> check.quantities().forEach(
                q -> assertThat(Dimension.ofCatalogueUnit(q.unit())).as(check.id() + "." + q.name()).isNotNull()));
    }
}

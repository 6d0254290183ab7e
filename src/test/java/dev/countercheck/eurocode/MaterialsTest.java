package dev.countercheck.eurocode;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/**
 * Material strengths, EN 1992-1-1 3.1.2, 3.1.6, 3.2.7.
 *
 * <p>Convention pinned here: {@link Materials#fctm} returns the unrounded expression of Table 3.1; the table
 * itself prints values rounded to 0.1 MPa, so a table value is matched within 0.05 MPa (half the rounding step).
 */
class MaterialsTest {

    /** Half of the 0.1 MPa step to which Table 3.1 rounds fctm and fctk,0.05 (plus float slack). */
    private static final double TABLE_ROUNDING = 0.05 + 1e-9;

    // Source: EN 1992-1-1:2004 Table 3.1 (fctm and fctk,0.05 rows), as reproduced on buildinghow.com
    // "Concrete and Steel"; the table rounds to 0.1 MPa.
    @ParameterizedTest(name = "C{0}: fctm {1}, fctk,0.05 {2} MPa")
    @CsvSource({
            "20, 2.2, 1.5",
            "25, 2.6, 1.8",
            "30, 2.9, 2.0",
            "35, 3.2, 2.2",
            "40, 3.5, 2.5",
            "45, 3.8, 2.7",
            "50, 4.1, 2.9"
    })
    void tensileStrengthsMatchTable31WithinItsRounding(double fck, double tableFctm, double tableFctk005) {
        Step fctm = Materials.fctm(fck);
        assertThat(fctm.value()).isCloseTo(tableFctm, within(TABLE_ROUNDING));
        assertThat(Materials.fctk005(fctm.value()).value()).isCloseTo(tableFctk005, within(TABLE_ROUNDING));
    }

    // Rows on both sides of the fck = 50 MPa breakpoint between the two Table 3.1 expressions.
    @ParameterizedTest(name = "fck {0}: fctm {1}")
    @CsvSource({
            // Source: hand calculation, 0.30·30^(2/3) = 0.30·9.655 = 2.8965 (unrounded; Table 3.1 prints 2.9)
            "30, 2.8965, 0.30·fck^(2/3)",
            // Source: hand calculation, 0.30·50^(2/3) = 0.30·13.572 = 4.0716 (Table 3.1 prints 4.1)
            "50, 4.0716, 0.30·fck^(2/3)",
            // Source: hand calculation, 2.12·ln(1 + 63/10) = 2.12·1.98787 = 4.2143 (Table 3.1 prints 4.2, from memory)
            "55, 4.2143, 2.12·ln(1 + (fck + 8)/10)",
            // Source: hand calculation, 2.12·ln(1 + 98/10) = 2.12·2.37955 = 5.0446 (Table 3.1 prints 5.0, from memory)
            "90, 5.0446, 2.12·ln(1 + (fck + 8)/10)"
    })
    void fctmUsesTheUnroundedExpressionOnEachSideOfC50(double fck, double expected, String formula) {
        Step step = Materials.fctm(fck);
        assertThat(step.value()).isCloseTo(expected, within(0.0001));
        assertThat(step.formula()).isEqualTo(formula);
        assertThat(step.symbol()).isEqualTo("fctm");
        assertThat(step.unit()).isEqualTo("MPa");
        assertThat(step.clause()).contains("Table 3.1");
    }

    // Source: EN 1992-1-1:2004 Table 3.1, classes C55/67 to C90/105, fctm 4.2, 4.4, 4.6, 4.8, 5.0 MPa
    // (from memory; not in published-values.md), rounded to 0.1 MPa.
    @ParameterizedTest
    @CsvSource({"55, 4.2", "60, 4.4", "70, 4.6", "80, 4.8", "90, 5.0"})
    void highStrengthFctmMatchesTable31WithinItsRounding(double fck, double tableFctm) {
        assertThat(Materials.fctm(fck).value()).isCloseTo(tableFctm, within(TABLE_ROUNDING));
    }

    @ParameterizedTest
    @CsvSource({"11.9", "90.1", "NaN"})
    void fctmRejectsStrengthsOutsideTheClassesOfTheStandard(double fck) {
        assertThatThrownBy(() -> Materials.fctm(fck))
                .isInstanceOf(OutOfRangeException.class)
                .hasMessageContaining("fck")
                .hasMessageContaining("12 ≤ fck ≤ 90")
                .hasMessageContaining("3.1.2(2)P");
    }

    @Test
    void fctmAcceptsTheEndClassesC12AndC90() {
        // Source: hand calculation, 0.30·12^(2/3) = 0.30·5.2415 = 1.5724 (Table 3.1 prints 1.6, from memory)
        assertThat(Materials.fctm(12).value()).isCloseTo(1.5724, within(0.0001));
        assertThat(Materials.fctm(90).value()).isPositive();
    }

    @Test
    void fctk005IsSeventyPercentOfFctm() {
        // Source: EN 1992-1-1:2004 Table 3.1 expression fctk,0.05 = 0.7 fctm (published-values §1);
        // hand calculation 0.7·2.8965 = 2.0276
        Step step = Materials.fctk005(2.8965);
        assertThat(step.value()).isCloseTo(2.0276, within(0.0001));
        assertThat(step.symbol()).isEqualTo("fctk,0.05");
        assertThat(step.substituted()).isEqualTo("0.7·2.897");
    }

    // Source: EN 1992-1-1:2004 3.1.6(1) Exp. (3.15), fcd = αcc·fck/γc (published-values §1 notes); hand calculations.
    @ParameterizedTest(name = "αcc {0}, fck {1}, γc {2}: fcd {3}")
    @CsvSource({
            "1.0, 30, 1.5, 20.0",   // 1.0·30/1.5 = 20.0
            "0.85, 30, 1.5, 17.0",  // 0.85·30/1.5 = 17.0
            "0.85, 25, 1.5, 14.1667" // 0.85·25/1.5 = 14.1667
    })
    void fcdIsAlphaCcTimesFckOverGammaC(double alphaCc, double fck, double gammaC, double expected) {
        Step step = Materials.fcd(alphaCc, fck, gammaC);
        assertThat(step.value()).isCloseTo(expected, within(0.0001));
        assertThat(step.clause()).isEqualTo("EN 1992-1-1 3.1.6(1), Exp. (3.15)");
    }

    @Test
    void fcdRejectsAnAlphaCcOutsideTheRangeOfTheNote() {
        // Source: published-values §1 notes, the Note to 3.1.6(1): αcc lies between 0.8 and 1.0
        assertThatThrownBy(() -> Materials.fcd(0.79, 30, 1.5)).isInstanceOf(OutOfRangeException.class)
                .hasMessageContaining("αcc");
        assertThatThrownBy(() -> Materials.fcd(1.01, 30, 1.5)).isInstanceOf(OutOfRangeException.class);
    }

    @Test
    void fctdForC25WithTheRoundedTableValue() {
        // Source: TCC "How to design concrete structures using Eurocode 2", ch. Detailing, Table 2 basis
        // (from memory, published-values §2.2): fctk,0.05 = 1.8 (Table 3.1, rounded) gives fbd = 2.7 = 2.25·1.2;
        // hand calculation 1.0·1.8/1.5 = 1.2
        Step step = Materials.fctd(1.0, 1.8, 1.5);
        assertThat(step.value()).isCloseTo(1.2, within(1e-9));
        assertThat(step.clause()).isEqualTo("EN 1992-1-1 3.1.6(2), Exp. (3.16)");
    }

    @Test
    void fydForB500WithTheRecommendedGammaS() {
        // Source: TCC "How to design concrete structures using Eurocode 2", ch. Detailing, Table 2 assumption
        // σsd = fyd = 500/1.15 = 435 MPa (from memory, published-values §2.2); hand calculation 434.78
        Step step = Materials.fyd(500, 1.15);
        assertThat(step.value()).isCloseTo(434.78, within(0.005));
        assertThat(step.substituted()).isEqualTo("500/1.15");
    }

    @ParameterizedTest
    @CsvSource({"399", "601"})
    void fydRejectsYieldStrengthsOutsideTheRangeOf322(double fyk) {
        assertThatThrownBy(() -> Materials.fyd(fyk, 1.15)).isInstanceOf(OutOfRangeException.class)
                .hasMessageContaining("3.2.2(3)P");
    }
}

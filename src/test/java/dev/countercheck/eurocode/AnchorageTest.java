package dev.countercheck.eurocode;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Anchorage, EN 1992-1-1 8.4: fbd, lb,rqd and lbd. */
class AnchorageTest {

    /** fyd = 500/1.15, the bar stress the published anchorage tables assume. */
    private static final double FYD = 500 / 1.15;

    // Source: The Concrete Centre, "How to design concrete structures using Eurocode 2", chapter "Detailing",
    // Table 2 assumptions (fbd = 2.7 MPa for C25/30 in good bond; from memory) and its recomputation with
    // EN 1992-1-1:2004 Table 3.1 fctk,0.05 (fctd = αct·fctk,0.05/γc = 1.0·fctk,0.05/1.5), published-values
    // tabulation: C20/25 2.25, C25/30 2.70, C30/37 3.00, C40/50 3.75 MPa; lb,rqd/φ good 48.3, 40.3, 36.2, 29.0,
    // poor 69.0, 57.5, 51.8, 41.4 (to 0.1φ).
    @ParameterizedTest(name = "fctk,0.05 {0} MPa: fbd {1}, lb,rqd {2}φ good, {3}φ poor")
    @CsvSource({
            "1.5, 2.25, 48.3, 69.0",
            "1.8, 2.70, 40.3, 57.5",
            "2.0, 3.00, 36.2, 51.8",
            "2.5, 3.75, 29.0, 41.4"})
    void bondStressAndBasicLengthMatchThePublishedTabulation(double fctk005, double fbd, double goodPerPhi,
                                                            double poorPerPhi) {
        double fctd = fctk005 / 1.5;
        Step good = Anchorage.bondStress(true, 20, fctd);
        Step poor = Anchorage.bondStress(false, 20, fctd);
        assertThat(good.value()).isCloseTo(fbd, within(0.005));
        assertThat(Anchorage.basicLength(20, FYD, good.value()).value() / 20).isCloseTo(goodPerPhi, within(0.05));
        assertThat(Anchorage.basicLength(20, FYD, poor.value()).value() / 20).isCloseTo(poorPerPhi, within(0.05));
    }

    // Source: EN 1992-1-1:2004 8.4.2(2): η2 = (132 − φ)/100 for φ > 32 mm; for φ 40, η2 = 0.92
    // (hand calculation: (132 − 40)/100 = 0.92; fbd = 2.25·1.0·0.92·1.2 = 2.484 MPa).
    @Test
    void largeBarsBondLess() {
        Step fbd = Anchorage.bondStress(true, 40, 1.2);
        assertThat(fbd.value()).isCloseTo(2.484, within(1e-9));
        assertThat(fbd.remark()).hasValueSatisfying(r -> assertThat(r).contains("(132 − φ)/100"));
    }

    // Hand calculation, EN 1992-1-1:2004 8.4.4(1): lb,rqd = 1000 mm, φ 20, α1 = 1, α2·α3·α5 = 0.6 raised to 0.7:
    // lbd = max(0.7·1000; 0.3·1000, 200, 100) = 700 mm in tension.
    @Test
    void theAlphaProductIsFloored() {
        Step lbd = Anchorage.designLength(1, 0.6, 1, 1000, 20, true);
        assertThat(lbd.value()).isCloseTo(700, within(1e-9));
        assertThat(lbd.remark()).hasValueSatisfying(r -> assertThat(r).contains("raised to 0.7"));
    }

    // Hand calculation, EN 1992-1-1:2004 Exp. (8.6)/(8.7): lb,rqd = 200 mm, φ 25, all α = 1:
    // tension lb,min = max(60, 250, 100) = 250 mm; compression lb,min = max(120, 250, 100) = 250 mm;
    // lb,rqd = 1000 mm, φ 12, α1 = 0.7, α2·α3·α5 = 1: 0.7·1000 = 700 in tension, max(700, 600) = 700 in compression;
    // α1 = 0.5: 500 in tension, max(500, 0.6·1000) = 600 in compression.
    @Test
    void theMinimumLengthGovernsShortAnchorages() {
        assertThat(Anchorage.designLength(1, 1, 1, 200, 25, true).value()).isCloseTo(250, within(1e-9));
        assertThat(Anchorage.designLength(1, 1, 1, 200, 25, false).value()).isCloseTo(250, within(1e-9));
        assertThat(Anchorage.designLength(0.7, 1, 1, 1000, 12, true).value()).isCloseTo(700, within(1e-9));
        assertThat(Anchorage.designLength(0.5, 1, 1, 1000, 12, true).value()).isCloseTo(500, within(1e-9));
        assertThat(Anchorage.designLength(0.5, 1, 1, 1000, 12, false).value()).isCloseTo(600, within(1e-9));
    }

    @Test
    void outOfRangeInputIsRefused() {
        assertThatThrownBy(() -> Anchorage.bondStress(true, 0, 1.2)).isInstanceOf(OutOfRangeException.class);
        assertThatThrownBy(() -> Anchorage.basicLength(20, 435, 0)).isInstanceOf(OutOfRangeException.class);
        assertThatThrownBy(() -> Anchorage.designLength(1.2, 1, 1, 500, 20, true))
                .isInstanceOf(OutOfRangeException.class);
    }
}

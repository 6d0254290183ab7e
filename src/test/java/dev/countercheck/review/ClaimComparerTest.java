package dev.countercheck.review;

import dev.countercheck.input.SourceLocation;
import dev.countercheck.submission.CheckCatalogue;
import dev.countercheck.submission.CheckCatalogue.QuantitySpec;
import dev.countercheck.submission.Claim;
import dev.countercheck.submission.PileCapChecks;
import org.junit.jupiter.api.Test;

import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The claim tolerance of pile-cap-method.md, Revision 2 item 13: a claim agrees when
 * |claimed − computed| ≤ max(rel·|computed|, abs), abs by kind of quantity (the floors of the
 * recommended ruleset, common practice: 1 kN, 10 mm², 0.01 for a ratio). Values invented.
 */
class ClaimComparerTest {

    private static final ClaimComparer COMPARER = new ClaimComparer(0.02,
            Map.of("kN", 1.0, "mm2", 10.0, "-", 0.01));
    private static final QuantitySpec VED = CheckCatalogue.demand("ved", "kN");
    private static final QuantitySpec AS_REQ = CheckCatalogue.demand("as_required", "mm2");

    private static Claim claim(String quantity, double value) {
        return new Claim("shear-x", quantity, value, new SourceLocation("t.yaml", 1, 1));
    }

    @Test
    void aSmallForceIsJudgedByTheFloorNotByAShareOfAlmostNothing() {
        // computed 20 kN: 2 % is 0.4 kN, the floor 1 kN governs; 19.1 kN is 0.9 kN off: agrees
        assertThat(COMPARER.compare(claim("ved", 19.1), 20, VED).verdict()).isEqualTo(ClaimVerdict.AGREES);
        // 18.9 kN is 1.1 kN off, beyond max(0.4, 1) = 1 kN: unconservative (a demand claimed low)
        assertThat(COMPARER.compare(claim("ved", 18.9), 20, VED).verdict())
                .isEqualTo(ClaimVerdict.DIFFERS_UNCONSERVATIVE);
    }

    @Test
    void aLargeValueKeepsTheRelativeTolerance() {
        // computed 4302 mm2: 2 % is 86.04 mm2 > 10 mm2; 4390 is 88 off (beyond), 4380 is 78 off (within)
        assertThat(COMPARER.compare(claim("as_required", 4380), 4302, AS_REQ).verdict()).isEqualTo(ClaimVerdict.AGREES);
        assertThat(COMPARER.compare(claim("as_required", 4390), 4302, AS_REQ).verdict())
                .isEqualTo(ClaimVerdict.DIFFERS_CONSERVATIVE);
        assertThat(COMPARER.allowance(4302, "mm2")).isEqualTo(86.04, org.assertj.core.api.Assertions.within(1e-9));
    }

    @Test
    void aClaimOfZeroAgreesWithAComputedValueWithinTheFloor() {
        // computed 0.6 kN, claimed 0: 0.6 ≤ 1 kN
        assertThat(COMPARER.compare(claim("ved", 0), 0.6, VED).verdict()).isEqualTo(ClaimVerdict.AGREES);
    }

    @Test
    void theFindingStatesTheToleranceApplied() {
        var spec = PileCapChecks.CATALOGUE.check("shear-x");
        ClaimComparison c = COMPARER.compare(claim("ved", 15), 20, VED);
        DraftFinding f = COMPARER.findingFor(c, spec, VED).orElseThrow();
        assertThat(f.message()).contains("beyond the tolerance of ±1")
                .contains("the larger of 2 % of the recomputed value and 1");
    }

    @Test
    void aUnitWithoutAFloorHasTheRelativeToleranceOnly() {
        assertThat(COMPARER.allowance(20, "kNm")).isEqualTo(0.4, org.assertj.core.api.Assertions.within(1e-12));
    }

    /**
     * The share a finding states is written as String.format's "%.1f" writes it, to the character: random values of
     * every size, and the values on a tie of the first decimal (k·0.05, as computed and as parsed).
     */
    @Test
    void theShareIsWrittenAsTheFormatterWritesIt() {
        java.util.Random random = new java.util.Random(2012);
        java.util.List<String> mismatches = new java.util.ArrayList<>();
        java.util.List<Double> values = new java.util.ArrayList<>(java.util.List.of(0.0, 0.05, 0.15, 0.25, 0.35, 0.45,
                1.05, 2.675, 99.95, 999.95, 1e-7, 1e7, 123456789.25, Double.MIN_VALUE, 1e300));
        for (int k = 0; k < 40_000; k++) {
            values.add(k * 0.05);
            values.add(Double.parseDouble(k / 20 + "." + (k % 20 < 2 ? "0" : "") + (k % 20) * 5));
            values.add(random.nextDouble() * Math.pow(10, random.nextInt(12) - 4));
            values.add(Math.abs(random.nextDouble() - random.nextDouble()) * 100);
        }
        for (double v : values) {
            String expected = String.format(java.util.Locale.ROOT, "%.1f", v);
            if (!ClaimComparer.oneDecimal(v).equals(expected)) {
                mismatches.add(v + ": " + ClaimComparer.oneDecimal(v) + " vs " + expected);
            }
        }
        assertThat(mismatches).isEmpty();
    }
}

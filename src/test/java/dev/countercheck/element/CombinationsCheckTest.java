package dev.countercheck.element;

import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.DraftFinding;
import dev.countercheck.review.FindingKind;
import dev.countercheck.submission.PileCapChecks;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import static org.assertj.core.api.Assertions.assertThat;

/** The comparison of the designer's cases with the generated ones (invented utilisations, tolerance 2 %). */
class CombinationsCheckTest {

    private static CheckResult result(String id, CheckStatus status, double u, String governing) {
        return new CheckResult(id, id, "", status, status == CheckStatus.NOT_APPLICABLE ? OptionalDouble.empty()
                : OptionalDouble.of(u), Optional.empty(), Map.of(), List.of(), List.of(), Optional.ofNullable(governing));
    }

    @Test
    void aGeneratedCaseBeyondTheToleranceIsNamedAndIsCriticalWhereACheckThenFails() {
        Map<String, CheckResult> given = Map.of(
                "tie-x", result("tie-x", CheckStatus.PASS, 0.90, "ULS-1"),
                "shear-x", result("shear-x", CheckStatus.PASS, 0.60, "ULS-1"),
                "hogging-x", result("hogging-x", CheckStatus.NOT_APPLICABLE, 0, null),
                "node-pile", result("node-pile", CheckStatus.PASS, 0.50, "ULS-1"));
        Map<String, CheckResult> generated = Map.of(
                "tie-x", result("tie-x", CheckStatus.FAIL, 1.08, "6.10 G sup + W− lead"),
                "shear-x", result("shear-x", CheckStatus.PASS, 0.61, "6.10 G sup + W− lead"),
                "hogging-x", result("hogging-x", CheckStatus.PASS, 0.30, "6.10 G inf + W+ lead"),
                "node-pile", result("node-pile", CheckStatus.PASS, 0.45, "6.10 G sup"));
        CheckOutcome o = CombinationsCheck.compare(PileCapChecks.CATALOGUE, given, generated, 2, 40, 0.02);
        assertThat(o.result().status()).isEqualTo(CheckStatus.FAIL);
        // tie-x rises 0.18 (fails: critical); shear-x 0.60 → 0.61 is within 2 %; hogging-x had nothing to carry
        assertThat(o.result().values().get("worst_increase").value()).isCloseTo(0.30, org.assertj.core.api.Assertions.within(1e-9));
        assertThat(o.findings()).extracting(DraftFinding::slug, DraftFinding::kind).containsExactlyInAnyOrder(
                org.assertj.core.groups.Tuple.tuple("missed-6-10-g-sup-w-minus-lead", FindingKind.CAPACITY),
                org.assertj.core.groups.Tuple.tuple("missed-6-10-g-inf-w-plus-lead", FindingKind.COMBINATION_MISSED));
        assertThat(o.findings().get(0).message()).contains("tie-x").doesNotContain("shear-x");
        assertThat(o.result().values().get("cases_generated").value()).isEqualTo(40);
        assertThat(o.result().values().get("cases_given").value()).isEqualTo(2);
    }

    @Test
    void noFindingWhenTheDesignersCasesGovern() {
        Map<String, CheckResult> given = Map.of("tie-x", result("tie-x", CheckStatus.PASS, 0.90, "ULS-1"));
        Map<String, CheckResult> generated = Map.of("tie-x", result("tie-x", CheckStatus.PASS, 0.91, "6.10 G sup"));
        CheckOutcome o = CombinationsCheck.compare(PileCapChecks.CATALOGUE, given, generated, 1, 12, 0.02);
        assertThat(o.result().status()).isEqualTo(CheckStatus.PASS);
        assertThat(o.findings()).isEmpty();
    }
}

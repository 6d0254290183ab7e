package dev.countercheck.element.pilecap;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Review;
import dev.countercheck.ruleset.RulesetException;
import dev.countercheck.ruleset.RulesetLoader;
import dev.countercheck.submission.SubmissionReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * The ruleset option {@code node_column_basis: partially-loaded-area} (EN 1992-1-1 6.7(2)) on the four-pile
 * hand-calculation cap (hand-calcs/four-pile.yaml, invented). Hand calculation: column 600 × 550 at the
 * centre of a 2950 × 2800 plan, h = 1050. Ac1 similar and concentric: in plan λ ≤ 2·1475/600 = 4.917 and
 * 2·1400/550 = 5.091; by the depth rule of Figure 6.29 λ ≤ 1 + 1050/600 = 2.75 and 1 + 1050/550 = 2.909;
 * λ = 2.75 = √(Ac1/Ac0) ≤ 3. fcd = 1.0·30/1.5 = 20 MPa; FRdu/Ac0 = 20·2.75 = 55 MPa (Exp. (6.63)). The
 * stress is the default basis's, 11.885 MPa (FourPileCapHandCalculationTest).
 */
class PartiallyLoadedNodeTest {

    private static RulesetLoader loader(Path dir) {
        return new RulesetLoader(dir, ProjectReviewer.RULE_VOCABULARY);
    }

    @Test
    void theColumnNodeBearsAsAPartiallyLoadedArea(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("bearing.yaml"), """
                ruleset: 1
                id: bearing
                extends: en1992-recommended
                title: The column node as a partially loaded area
                options:
                  node_column_basis: {value: partially-loaded-area, clause: EN 1992-1-1 6.7(2)}
                """);
        var rules = loader(dir).load("bearing");
        var s = new SubmissionReader(ElementKinds.binders()).read(Path.of("src/test/resources/hand-calcs/four-pile.yaml"));
        ElementReview cap = new ProjectReviewer(new Review.ToolInfo("countercheck", "test"))
                .review(s, rules, "2026-01-01").elements().get(0);

        assertThat(CapReviews.value(cap, "node-column", "limit")).isCloseTo(55.0, withinPercentage(0.01));
        assertThat(CapReviews.value(cap, "node-column", "stress")).isCloseTo(11.885, withinPercentage(0.1));
        var limit = limitStep(cap);
        assertThat(limit.clause()).contains("6.7(2)");
        assertThat(limit.remark()).hasValueSatisfying(r -> assertThat(r).contains("partially-loaded-area"));
    }

    @Test
    void theDefaultIsTheEffectiveArea() {
        var cap = CapReviews.element("/hand-calcs/four-pile.yaml");
        assertThat(limitStep(cap).remark())
                .hasValueSatisfying(r -> assertThat(r).contains("node_column_basis: effective-area"));
    }

    private static dev.countercheck.eurocode.Step limitStep(ElementReview cap) {
        var check = CapReviews.check(cap, "node-column");
        return check.trace().get(check.values().get("limit").step().getAsInt());
    }

    @Test
    void aChoiceTheEngineDoesNotOfferIsLocated(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("bad.yaml"), """
                ruleset: 1
                id: bad
                extends: en1992-recommended
                title: Bad
                options:
                  node_column_basis: {value: partialy-loaded-area, clause: EN 1992-1-1 6.7(2)}
                """);
        var errors = catchThrowableOfType(RulesetException.class, () -> loader(dir).load("bad")).errors();
        assertThat(errors).singleElement().satisfies(e -> {
            assertThat(e.location().line()).isEqualTo(6);
            assertThat(e.message()).contains("not a choice of node_column_basis").contains("partially-loaded-area");
        });
    }
}

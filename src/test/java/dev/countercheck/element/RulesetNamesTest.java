package dev.countercheck.element;

import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetLoader;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A scope variable is described in its own kind's words (a pad's bt is the footing's width, a cap's the cap's), a
 * ruleset's parameter or derived quantity under its name alone.
 */
class RulesetNamesTest {

    @Test
    void aScopeVariableIsDescribedByItsOwnKindOnly() throws Exception {
        Ruleset rules = new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY).load("en1992-recommended");
        Map<String, String> names = RulesetNames.of(rules);
        assertThat(names).containsEntry("pad-footing/b_t", "footing width across these bars")
                .containsEntry("pile-cap/b_t", "cap width across these bars")
                .containsEntry("pile-cap/embedment", "pile head cast into the cap")
                .doesNotContainKeys("b_t", "pad-footing/embedment");
        assertThat(names.get("pad-footing/phi")).isEqualTo("bar diameter / starter bar diameter");
        assertThat(names.get("phi_min")).contains("ruleset parameter");
        assertThat(names.get("c_nom")).isEqualTo("the rule's name for cnom");
    }
}

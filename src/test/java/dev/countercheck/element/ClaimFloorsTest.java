package dev.countercheck.element;

import dev.countercheck.ruleset.RulesetLoader;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.nio.file.Path;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The absolute claim tolerance by unit (docs/results.md, "Claim verdicts"): every unit a check catalogue of any
 * kind uses has a floor in each bundled ruleset, so that no claim near zero is judged by a share of almost
 * nothing; ground pressures (kPa) 1 kPa (pad-footing method, Revision 2 item 8; common practice).
 */
class ClaimFloorsTest {

    @ParameterizedTest
    @ValueSource(strings = {"en1992-recommended", "en1992-uk-na"})
    void everyCatalogueUnitHasAFloor(String id) throws Exception {
        var rules = new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY).load(id);
        Map<String, Double> floors = ProjectReviewer.claimFloors(rules);
        ElementKinds.ALL.forEach(kind -> kind.checks().checks().values().forEach(check -> check.quantities()
                .forEach(q -> assertThat(floors).as(kind.type() + " " + check.id() + "." + q.name())
                        .containsKey(q.unit()))));
        assertThat(floors.get("kPa")).isEqualTo(1.0); // common practice, pad-footing method Revision 2 item 8
        assertThat(floors.get("kN")).isEqualTo(1.0); // common practice (pile-cap method, Revision 2 item 13)
    }
}

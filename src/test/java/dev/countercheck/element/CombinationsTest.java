package dev.countercheck.element;

import dev.countercheck.actions.Factors;
import dev.countercheck.actions.Psi;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetLoader;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** The factors the bundled rulesets hand the combination generator. */
class CombinationsTest {

    static Ruleset ruleset(String id) {
        try {
            return new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY).load(id);
        } catch (dev.countercheck.ruleset.RulesetException e) {
            throw new IllegalStateException(e);
        }
    }

    /**
     * EN 1990:2002 Table A1.1, recommended ψ0, ψ1, ψ2 for buildings (from memory; the project's reference
     * notes record the same values as recalled, not yet checked against a printed copy): A and B 0.7/0.5/0.3,
     * C and D 0.7/0.7/0.6, E 1.0/0.9/0.8, F 0.7/0.7/0.6, G 0.7/0.5/0.3, H 0/0/0, snow at H ≤ 1000 m 0.5/0.2/0,
     * wind 0.6/0.2/0, temperature 0.6/0.5/0. Table A1.2: γG,sup 1.35, γG,inf 1.0, γQ 1.5, ξ 0.85;
     * (C) 1.0/1.3; (A) 1.10/0.90/1.5 (from memory).
     */
    @Test
    void recommendedValuesAreThoseOfTablesA11AndA12() {
        Factors f = Combinations.factors(ruleset("en1992-recommended"));
        assertThat(f.psi()).containsEntry("A", new Psi(0.7, 0.5, 0.3)).containsEntry("B", new Psi(0.7, 0.5, 0.3))
                .containsEntry("C", new Psi(0.7, 0.7, 0.6)).containsEntry("D", new Psi(0.7, 0.7, 0.6))
                .containsEntry("E", new Psi(1.0, 0.9, 0.8)).containsEntry("F", new Psi(0.7, 0.7, 0.6))
                .containsEntry("G", new Psi(0.7, 0.5, 0.3)).containsEntry("H", new Psi(0, 0, 0))
                .containsEntry("S", new Psi(0.5, 0.2, 0)).containsEntry("W", new Psi(0.6, 0.2, 0))
                .containsEntry("T", new Psi(0.6, 0.5, 0));
        assertThat(f.split()).isFalse();
        assertThat(f.xi()).isEqualTo(0.85);
        assertThat(f.str()).extracting(Factors.Partial::gammaGSup, Factors.Partial::gammaGInf, Factors.Partial::gammaQ)
                .containsExactly(1.35, 1.0, 1.5);
        assertThat(f.geo()).extracting(Factors.Partial::gammaGSup, Factors.Partial::gammaQ).containsExactly(1.0, 1.3);
        assertThat(f.equ()).extracting(Factors.Partial::gammaGSup, Factors.Partial::gammaGInf, Factors.Partial::gammaQ)
                .containsExactly(1.10, 0.90, 1.5);
    }

    /**
     * The UK annex to BS EN 1990 (from memory): Exp. (6.10a)/(6.10b) with ξ = 0.925, roofs ψ0 = 0.7, wind
     * ψ0 = 0.5; the published column and wall examples of The Concrete Centre's "Worked Examples to Eurocode 2:
     * Volume 1" use the same (ξ·γG = 1.25, roof 0.7, wind 0.5; see CombinationGeneratorTest).
     */
    @Test
    void theUkAnnexSplitsExpression610AndChangesRoofAndWind() {
        Factors f = Combinations.factors(ruleset("en1992-uk-na"));
        assertThat(f.split()).isTrue();
        assertThat(f.xi()).isEqualTo(0.925);
        assertThat(f.psi().get("H").psi0()).isEqualTo(0.7);
        assertThat(f.psi().get("W").psi0()).isEqualTo(0.5);
        assertThat(f.psi().get("B")).isEqualTo(new Psi(0.7, 0.5, 0.3));
    }
}

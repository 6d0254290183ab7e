package dev.countercheck.element.pilecap;

import dev.countercheck.element.SampleScopes;
import dev.countercheck.ruleset.EvaluatorAgreement;
import dev.countercheck.submission.PileCap;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every rule expression of every bundled ruleset, on the detailing scopes of every pile cap of the samples and
 * rule fixtures, gives the same with the compiled doubles as with EvalEx's decimals (numbers to 1e-12 relative,
 * booleans equal). No comparison may sit within 1e-12 of its tie without being on it: there the last digit of
 * either arithmetic could decide, and the agreement of the booleans would be luck (exact ties, such as equal
 * covers, are computed exactly by both).
 */
class RuleEvaluatorsOnSampleCapsTest {

    @Test
    void compiledAndDecimalEvaluationAgreeOnTheSampleCaps() throws Exception {
        EvaluatorAgreement agreement = SampleScopes.agreement(PileCap.class, "pile-cap", DetailingScopes.SCOPES, "tie",
                (cap, rules, scope, subject, asRequired) -> DetailingScopes.forRun(new PileCapContext(cap, rules),
                        asRequired).apply(scope, subject));
        System.out.println("pile caps: " + agreement.counts());
        assertThat(agreement.compared()).isGreaterThan(1000);
        assertThat(agreement.disagreements()).isEmpty();
        assertThat(agreement.nearTies()).isEmpty();
    }
}

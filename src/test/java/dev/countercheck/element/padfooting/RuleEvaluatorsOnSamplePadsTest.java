package dev.countercheck.element.padfooting;

import dev.countercheck.element.SampleScopes;
import dev.countercheck.ruleset.EvaluatorAgreement;
import dev.countercheck.submission.PadFooting;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every rule expression of every bundled ruleset, on the detailing scopes of every pad footing of the samples and
 * rule fixtures, gives the same with the compiled doubles as with EvalEx's decimals (numbers to 1e-12 relative,
 * booleans equal). No comparison may sit within 1e-12 of its tie without being on it: there the last digit of
 * either arithmetic could decide, and the agreement of the booleans would be luck (exact ties, such as equal
 * covers, are computed exactly by both).
 */
class RuleEvaluatorsOnSamplePadsTest {

    @Test
    void compiledAndDecimalEvaluationAgreeOnTheSamplePads() throws Exception {
        EvaluatorAgreement agreement = SampleScopes.agreement(PadFooting.class, "pad-footing", PadScopes.SCOPES,
                "bending", (pad, rules, scope, subject, asRequired) -> PadScopes.forRun(new PadContext(pad, rules),
                        asRequired).apply(scope, subject));
        System.out.println("pad footings: " + agreement.counts());
        assertThat(agreement.compared()).isGreaterThan(500);
        assertThat(agreement.disagreements()).isEmpty();
        assertThat(agreement.nearTies()).isEmpty();
    }
}

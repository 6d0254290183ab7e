package dev.countercheck.element;

import dev.countercheck.eurocode.Bending;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.OutOfRangeException;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.FindingKind;
import dev.countercheck.ruleset.Ruleset;

import java.util.Optional;

/**
 * The rectangular stress block of a section in bending (EN 1992-1-1 3.1.7(3)): K, K' and the lever
 * arm, shared by every check that sizes steel for a moment (ties by the bending method, hogging, pad bending).
 */
public final class StressBlock {

    private StressBlock() {
    }

    /**
     * The lever arm z of a section b × d under M, with K and K' in the check's trace; empty when z cannot
     * be found (the check then fails, saying why). K > K' fails the check too (compression steel or more
     * depth needed), but z is still returned so that As,req can be shown.
     *
     * @param about words naming the moment in the K' message ("" or " for the hogging moment")
     */
    public static Optional<Step> leverArm(Ruleset rules, double fckMpa, CheckBuilder b, double momentKnm, double widthMm, double dMm,
                                   String about) {
        Step k = b.trace(Bending.kFactor(momentKnm, widthMm, dMm, fckMpa));
        Step kPrime = b.trace(Bending.kPrime(rules.number("alpha_cc"), rules.number("gamma_c"),
                b.trace(rules.parameter("stress_block_lambda").asStep()).value(),
                b.trace(rules.parameter("xi_limit").asStep()).value()));
        if (k.value() > kPrime.value()) {
            b.fail(FindingKind.CAPACITY, "k-limit", "K = " + Num.f(k.value()) + " exceeds K' = " + Num.f(kPrime.value())
                    + about + ": the section needs compression steel or more depth.");
        }
        try {
            return Optional.of(Bending.leverArm(k.value(), dMm, rules.number("alpha_cc"),
                    rules.number("gamma_c")));
        } catch (OutOfRangeException e) {
            b.fail(FindingKind.CAPACITY, "lever-arm", e.getMessage());
            return Optional.empty();
        }
    }
}

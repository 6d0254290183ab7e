package dev.countercheck.actions;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;

import java.util.List;
import java.util.stream.Collectors;

/**
 * One generated combination.
 *
 * @param name             how it was made, e.g. {@code 6.10b G sup + Q(B) lead + W+ ψ0}
 * @param kind             which verification it serves
 * @param effects          the combined action effects at the top of the element
 * @param selfWeightFactor the factor this combination puts on the permanent actions, which the element's
 *                         own weight (never among the loads) takes too
 * @param terms            each action in the combination with its factor
 * @param clause           the expression and tables the factors come from
 */
public record Combination(String name, Kind kind, Effects effects, double selfWeightFactor, List<Term> terms,
                          String clause) {

    /** The verifications a combination is generated for. */
    public enum Kind {
        ULS("uls"), ULS_GEO("uls-geo"), EQU("equ"), ACCIDENTAL("accidental"),
        SLS_CHARACTERISTIC("sls-characteristic"), SLS_QUASI_PERMANENT("sls-quasi-permanent");

        private final String label;

        Kind(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /** The combination as a trace entry: its factors, the resulting N and the clauses. */
    public Step trace() {
        String sum = terms.stream().map(t -> Num.f(t.factor()) + "·" + t.action() + " (" + t.how() + ")")
                .collect(Collectors.joining(" + "));
        return Step.of("N (" + name + ")", "Σ γ·ψ·F_k", sum, effects.n(), "kN", clause);
    }
}

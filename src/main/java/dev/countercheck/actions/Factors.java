package dev.countercheck.actions;

import java.util.Map;
import java.util.Optional;

/**
 * The partial factors and ψ factors of the combinations, as the ruleset states them (EN 1990 Annex A1
 * recommended values, or a National Annex).
 *
 * @param str          STR set B (Table A1.2(B)): γG,sup, γG,inf, γQ
 * @param split        true for Exp. (6.10a) and (6.10b), false for Exp. (6.10)
 * @param xi           ξ, the reduction of γG,sup in Exp. (6.10b)
 * @param geo          set C for DA1-2 (Table A1.2(C)): γG (sup and inf alike), γQ
 * @param equ          EQU set A (Table A1.2(A)): γG,sup, γG,inf, γQ
 * @param gammaGA      γGA on the permanent actions in the accidental combination (Table A1.3)
 * @param accidentalPsi1 true when the leading variable action of Exp. (6.11b) takes ψ1, false for ψ2
 * @param psi          ψ factors by imposed-load category (A to H) and by source (S, W, T)
 * @param psiClause    where the ψ factors come from, for the trace
 */
public record Factors(Partial str, boolean split, double xi, Partial geo, Partial equ, double gammaGA, boolean accidentalPsi1,
                      Map<String, Psi> psi, String psiClause) {

    /** One set of partial factors on actions, with the clause that gives it. */
    public record Partial(double gammaGSup, double gammaGInf, double gammaQ, String clause) {
    }

    /** The ψ factors of {@code action}; empty when the ruleset gives none for its kind. */
    public Optional<Psi> psiOf(CharacteristicAction action) {
        return Optional.ofNullable(psi.get(action.psiKey()));
    }
}

package dev.countercheck.element;

import dev.countercheck.actions.CharacteristicAction;
import dev.countercheck.actions.Combination;
import dev.countercheck.actions.CombinationGenerator;
import dev.countercheck.actions.Effects;
import dev.countercheck.actions.Factors;
import dev.countercheck.actions.Psi;
import dev.countercheck.actions.Source;
import dev.countercheck.input.SourceLocation;
import dev.countercheck.review.GeneratedCase;
import dev.countercheck.ruleset.Parameter;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.TableDef;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.CharacteristicLoad;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * The EN 1990 combinations of an element's characteristic loads, with the factors of the ruleset: the
 * generated combinations, and the same as action cases the element's checks take. Shared by every
 * element type.
 */
public final class Combinations {

    /** The ruleset parameters the combinations read (with the table {@value #PSI_TABLE}). */
    public static final Set<String> PARAMETERS = Set.of("gamma_g", "gamma_g_inf", "gamma_q", "combination_610ab",
            "xi_g", "gamma_g_geo", "gamma_q_geo", "gamma_g_equ", "equ_g_inf_factor", "gamma_q_equ", "gamma_ga",
            "accidental_leading_psi");
    /** The ruleset table of ψ0, ψ1, ψ2 by imposed-load category and by source. */
    public static final String PSI_TABLE = "psi_factors";

    /** What the review assumes when it combines characteristic loads, for the report. */
    public static final String ASSUMPTION = "Where characteristic loads are given, the review generates the"
            + " combinations of EN 1990 itself (factors and ψ from the ruleset) and adds each element's own weight"
            + " with the factor of each combination on the permanent actions. The strength"
            + " checks use the STR and accidental combinations and the serviceability checks the SLS ones; the"
            + " accidental combinations are checked with the material factors of persistent situations (conservative).";

    private static final List<String> PSI_ROWS = List.of("A", "B", "C", "D", "E", "F", "G", "H", "S", "W", "T");

    private final List<Combination> combinations;

    private Combinations(List<Combination> combinations) {
        this.combinations = combinations;
    }

    /**
     * The combinations of {@code loads} under {@code rules}.
     *
     * @throws IllegalArgumentException when the ruleset lacks the ψ factors (the message says which)
     */
    public static Combinations of(List<CharacteristicLoad> loads, Ruleset rules) {
        List<CharacteristicAction> actions = loads.stream().map(Combinations::action).toList();
        return new Combinations(CombinationGenerator.generate(actions, factors(rules)));
    }

    public List<Combination> all() {
        return combinations;
    }

    /**
     * The combinations as action cases for the checks: ULS (STR, and the accidental combination), GEO,
     * EQU and the two SLS kinds; each carries its factor on the element's own weight.
     *
     * @param element where the element is in the submission (the cases have no line of their own)
     */
    public List<ActionCase> cases(SourceLocation element) {
        return combinations.stream().map(c -> new ActionCase(c.name(), kind(c.kind()), c.effects().n(),
                c.effects().mx(), c.effects().my(), c.effects().hx(), c.effects().hy(), element,
                OptionalDouble.of(c.selfWeightFactor()))).toList();
    }

    /** The combinations for the report, each with the checks it governs. */
    public List<GeneratedCase> forReport(Map<String, List<String>> governs) {
        return combinations.stream().map(c -> new GeneratedCase(c.name(), c.kind().label(), c.effects().n(),
                c.effects().mx(), c.effects().my(), c.effects().hx(), c.effects().hy(), c.selfWeightFactor(),
                c.trace(), governs.getOrDefault(c.name(), List.of()))).toList();
    }

    private static ActionCase.Kind kind(Combination.Kind k) {
        return switch (k) {
            case ULS, ACCIDENTAL -> ActionCase.Kind.ULS;
            case ULS_GEO -> ActionCase.Kind.ULS_GEO;
            case EQU -> ActionCase.Kind.EQU;
            case SLS_CHARACTERISTIC -> ActionCase.Kind.SLS_CHARACTERISTIC;
            case SLS_QUASI_PERMANENT -> ActionCase.Kind.SLS_QUASI_PERMANENT;
        };
    }

    private static CharacteristicAction action(CharacteristicLoad l) {
        return new CharacteristicAction(Source.valueOf(l.source().name()), l.category(),
                new Effects(l.nKn(), l.mxKnm(), l.myKnm(), l.hxKn(), l.hyKn()), l.reversible());
    }

    /** The factors of the ruleset: Table A1.2 sets, ξ, the choice of expression and the ψ table. */
    static Factors factors(Ruleset rules) {
        TableDef table = Optional.ofNullable(rules.tables().get(PSI_TABLE)).orElseThrow(() ->
                new IllegalArgumentException("ruleset " + rules.id() + " has no table " + PSI_TABLE
                        + ": the combinations cannot be formed"));
        Map<String, Psi> psi = new LinkedHashMap<>();
        for (String row : PSI_ROWS) {
            List<Optional<Double>> v = table.rows().get(row);
            if (v == null || v.size() != 3 || v.stream().anyMatch(Optional::isEmpty)) {
                throw new IllegalArgumentException("table " + PSI_TABLE + " of ruleset " + rules.id()
                        + " gives no ψ0, ψ1, ψ2 for " + row);
            }
            psi.put(row, new Psi(v.get(0).get(), v.get(1).get(), v.get(2).get()));
        }
        return new Factors(
                new Factors.Partial(rules.number("gamma_g"), rules.number("gamma_g_inf"), rules.number("gamma_q"),
                        clause(rules, "gamma_q")),
                rules.number("combination_610ab") == 1, rules.number("xi_g"),
                new Factors.Partial(rules.number("gamma_g_geo"), rules.number("gamma_g_geo"),
                        rules.number("gamma_q_geo"), clause(rules, "gamma_q_geo")),
                new Factors.Partial(rules.number("gamma_g_equ"), rules.number("equ_g_inf_factor"),
                        rules.number("gamma_q_equ"), clause(rules, "gamma_q_equ")),
                rules.number("gamma_ga"), rules.number("accidental_leading_psi") != 2, psi, table.clause());
    }

    private static String clause(Ruleset rules, String parameter) {
        Parameter p = rules.parameter(parameter);
        return p.clause() + " (" + p.origin() + ")";
    }
}

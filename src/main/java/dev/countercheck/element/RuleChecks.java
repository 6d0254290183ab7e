package dev.countercheck.element;

import com.ezylang.evalex.BaseException;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.Severity;
import dev.countercheck.review.Value;
import dev.countercheck.ruleset.CheckDef;
import dev.countercheck.ruleset.CheckDef.DerivedDef;
import dev.countercheck.ruleset.CheckDef.RequirementDef;
import dev.countercheck.ruleset.Rule;
import dev.countercheck.ruleset.RuleLayout;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.Variable;
import dev.countercheck.submission.CheckCatalogue;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.BiFunction;

/**
 * Runs a ruleset's check on one subject: the derived quantities in order (each a trace step with
 * the values substituted), the reported quantities, the requirements and the cautions. The result is
 * an ordinary check outcome, with the same statuses, findings and trace as the Java checks.
 */
public final class RuleChecks {

    private RuleChecks() {
    }

    /**
     * The outcome of every check of a type's catalogue but {@code combinations}, in catalogue order: the
     * type's own outcome where it computed one, else the ruleset's rule for the check, each scope's
     * variables formed once per subject.
     *
     * @param computed the outcomes the type's reviewer computed, by check id
     * @param scopes   the variables of each scope of the type, with units and descriptions
     * @param form     forms the variables of a scope for a subject
     */
    public static List<CheckOutcome> inCatalogueOrder(CheckCatalogue catalogue, Map<String, CheckOutcome> computed,
                                                      Ruleset rules, Map<String, Map<String, Variable>> scopes,
                                                      BiFunction<String, String, DetailingVariables.Values> form) {
        Map<String, DetailingVariables.Values> formed = new HashMap<>();
        List<CheckOutcome> outcomes = new ArrayList<>();
        for (String id : catalogue.checks().keySet()) {
            if (!id.equals(CombinationsCheck.ID)) {
                outcomes.add(computed.containsKey(id) ? computed.get(id)
                        : byRule(catalogue, id, rules, scopes, form, formed));
            }
        }
        return outcomes;
    }

    /** As,req of each direction as check {@code prefix}-x or -y computed it; 0 where it did not. */
    public static Map<Axis, Double> asRequired(Map<String, CheckOutcome> computed, String prefix) {
        Map<Axis, Double> asRequired = new EnumMap<>(Axis.class);
        for (Axis axis : Axis.values()) {
            Value v = computed.get(prefix + "-" + axis.label()).result().values().get("as_required");
            asRequired.put(axis, v == null ? 0.0 : v.value());
        }
        return asRequired;
    }

    /**
     * The ruleset's rule for check {@code id} of an element, run on the subject the id names; not-checked
     * when the ruleset has no rule for it or the scope's variables cannot be formed.
     *
     * @param scopes    the variables of each scope of the type, with units and descriptions
     * @param form      forms the variables of a scope for a subject
     * @param formed    the variables formed so far for this element, by scope and subject (formed once each)
     */
    private static CheckOutcome byRule(CheckCatalogue catalogue, String id, Ruleset rules,
                                      Map<String, Map<String, Variable>> scopes,
                                      BiFunction<String, String, DetailingVariables.Values> form,
                                      Map<String, DetailingVariables.Values> formed) {
        Optional<Rule> rule = rules.rule(catalogue.elementType(), id);
        if (rule.isEmpty()) {
            return new CheckBuilder(catalogue.check(id))
                    .notChecked("ruleset " + rules.id() + " has no rule for this check").build();
        }
        String scope = rule.get().def().scope();
        String subject = rule.get().subject();
        DetailingVariables.Values v = formed.computeIfAbsent(scope + "/" + subject, k -> form.apply(scope, subject));
        if (v.missing().isPresent()) {
            return new CheckBuilder(catalogue.check(id)).notChecked(v.missing().get()).build();
        }
        return run(catalogue, rule.get(), rules, scopes.get(scope), v.values());
    }

    /**
     * @param catalogue the checks of the element's type
     * @param rule      the ruleset's rule for the check, with the subject it runs on
     * @param scope     the variables of the rule's scope, with units and descriptions
     * @param variables the scope's variables for this subject
     */
    private static CheckOutcome run(CheckCatalogue catalogue, Rule rule, Ruleset rules,
                                    Map<String, Variable> scope, Map<String, Object> variables) {
        CheckDef def = rule.def();
        String subject = rule.subject();
        CheckBuilder b = new CheckBuilder(catalogue.check(def.idFor(subject)));
        RuleLayout layout = rules.expressions().layout(def, scope);
        RuleLayout.Frame values = layout.frame(variables, subject);
        try {
            if (def.appliesWhen().isPresent() && !values.bool(def.appliesWhen().get())) {
                return b.notApplicable(fill(layout, def.notApplicable(), values)).build();
            }
            Map<String, Step> steps = new HashMap<>();
            List<DerivedDef> derived = def.derived();
            for (int i = 0; i < derived.size(); i++) {
                DerivedDef d = derived.get(i);
                double v = values.number(d.formula());
                values.put(d.name(), v);
                Step step = Step.ofRule(d.symbol(), d.formula(), layout.formula(i).fill(values, RuleChecks::inFormula),
                        v, d.unit(), d.clause() + " (" + def.origin() + ")");
                steps.put(d.name(), b.trace(layout.recalled(i).map(step::remarked).orElse(step)));
            }
            for (String name : def.values()) {
                Step step = steps.get(name);
                if (step == null) {
                    double v = ((Number) values.get(name)).doubleValue();
                    step = Step.of(name, scope.get(name).description(), Num.f(v), v, scope.get(name).unit(),
                            "computed by countercheck");
                }
                b.value(name, step);
            }
            for (RequirementDef r : def.requirements()) {
                if (r.utilisation().isPresent()) {
                    b.utilisation(values.number(r.utilisation().get()));
                }
                if (values.bool(r.that())) {
                    b.pass();
                } else {
                    b.failRequirement(Severity.fromLabel(r.severity()), r.finding(),
                            fill(layout, r.message(), values) + " (" + r.clause() + ")");
                }
            }
            for (CheckDef.CautionDef c : def.cautions()) {
                if (values.bool(c.when())) {
                    b.caution(fill(layout, c.text(), values));
                }
            }
        } catch (BaseException | RuntimeException e) {
            return b.notChecked("the rule " + def.id() + " of " + def.origin() + " could not be evaluated: "
                    + e.getMessage()).build();
        }
        return b.build();
    }

    /** A message of the check with each {name} replaced by its value. */
    private static String fill(RuleLayout layout, String message, RuleLayout.Frame values) {
        return layout.message(message).fill(values, RuleChecks::inMessage);
    }

    /** A name's value as a formula in the trace shows it; a name of no value as written. */
    private static String inFormula(Object value, String name) {
        return value == null ? name : show(value, true);
    }

    /** A name's value as a message shows it; a name of no value as its placeholder. */
    private static String inMessage(Object value, String name) {
        return value == null ? "{" + name + "}" : show(value, false);
    }

    /** A value as a trace or a message shows it: numbers to four figures, text quoted in formulas. */
    private static String show(Object value, boolean quoteText) {
        if (value instanceof Number n) {
            return Num.f(n.doubleValue());
        }
        return value instanceof String text && quoteText ? "\"" + text + "\"" : String.valueOf(value);
    }
}

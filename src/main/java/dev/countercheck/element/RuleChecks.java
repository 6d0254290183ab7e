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
import dev.countercheck.ruleset.ValueSource;
import dev.countercheck.ruleset.Variable;
import dev.countercheck.submission.CheckCatalogue;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.BiFunction;
import java.util.function.Function;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Runs a ruleset's check on one subject: the derived quantities in order (each a trace step with
 * the values substituted), the reported quantities, the requirements and the cautions. The result is
 * an ordinary check outcome, with the same statuses, findings and trace as the Java checks.
 */
public final class RuleChecks {

    private static final Pattern NAME = Pattern.compile("(?<![\\w.\"])([A-Za-z_][A-Za-z0-9_]*)(?![\\w\"(])");
    private static final Pattern PLACEHOLDER = Pattern.compile("\\{([A-Za-z_][A-Za-z0-9_]*)}");
    /** Formulas and messages split once at their names: the rulesets' texts are few, the elements many. */
    private static final Map<String, String[]> FORMULAS = new ConcurrentHashMap<>();
    private static final Map<String, String[]> MESSAGES = new ConcurrentHashMap<>();
    private static final Pattern IDENTIFIER = Pattern.compile("[A-Za-z_][A-Za-z0-9_]*");
    private static final Map<String, List<String>> IDENTIFIERS = new ConcurrentHashMap<>();

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
        RuleLayout.Frame values = rules.expressions().layout(def, scope).frame(variables, subject);
        try {
            if (def.appliesWhen().isPresent() && !values.bool(def.appliesWhen().get())) {
                return b.notApplicable(fill(def.notApplicable(), values::get)).build();
            }
            Map<String, Step> steps = new HashMap<>();
            for (DerivedDef d : def.derived()) {
                double v = values.number(d.formula());
                values.put(d.name(), v);
                steps.put(d.name(), b.trace(marked(Step.ofRule(d.symbol(), d.formula(), substitute(d.formula(), values::get),
                        v, d.unit(), d.clause() + " (" + def.origin() + ")"), d.formula(), rules)));
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
                            fill(r.message(), values::get) + " (" + r.clause() + ")");
                }
            }
            for (CheckDef.CautionDef c : def.cautions()) {
                if (values.bool(c.when())) {
                    b.caution(fill(c.text(), values::get));
                }
            }
        } catch (BaseException | RuntimeException e) {
            return b.notChecked("the rule " + def.id() + " of " + def.origin() + " could not be evaluated: "
                    + e.getMessage()).build();
        }
        return b.build();
    }

    /** The step, remarked when its formula uses a parameter or table the ruleset marks as recalled from memory. */
    private static Step marked(Step step, String formula, Ruleset rules) {
        String recalled = null;
        for (String name : IDENTIFIERS.computeIfAbsent(formula, RuleChecks::identifiers)) {
            if (rules.isRecalled(name)) {
                recalled = recalled == null ? name : recalled + ", " + name;
            }
        }
        return recalled == null ? step : step.remarked(recalled + " " + ValueSource.MARK);
    }

    /** Every name a formula writes (variables, parameters, tables), once each, in order. */
    private static List<String> identifiers(String formula) {
        List<String> names = new ArrayList<>();
        Matcher m = IDENTIFIER.matcher(formula);
        while (m.find()) {
            if (!names.contains(m.group()) && (m.start() == 0 || formula.charAt(m.start() - 1) != '"')) {
                names.add(m.group());
            }
        }
        return List.copyOf(names);
    }

    /** The formula with each known value put in for its name (names of no value stay as written). */
    static String substitute(String formula, Function<String, Object> values) {
        String[] parts = FORMULAS.computeIfAbsent(formula, f -> split(f, NAME));
        StringBuilder out = new StringBuilder(formula.length() + 16);
        for (int i = 0; i < parts.length; i++) {
            out.append(i % 2 == 0 ? parts[i] : show(values.apply(parts[i]), parts[i], true));
        }
        return out.toString();
    }

    /** A message with each {name} replaced by its value. */
    static String fill(String template, Function<String, Object> values) {
        String[] parts = MESSAGES.computeIfAbsent(template, t -> split(t, PLACEHOLDER));
        StringBuilder out = new StringBuilder(template.length() + 16);
        for (int i = 0; i < parts.length; i++) {
            out.append(i % 2 == 0 ? parts[i] : show(values.apply(parts[i]), "{" + parts[i] + "}", false));
        }
        return out.toString();
    }

    /** The text around each match of {@code pattern} (even places) and the names it matched (odd places). */
    private static String[] split(String text, Pattern pattern) {
        List<String> parts = new ArrayList<>();
        Matcher m = pattern.matcher(text);
        int last = 0;
        while (m.find()) {
            parts.add(text.substring(last, m.start()));
            parts.add(m.group(1));
            last = m.end();
        }
        parts.add(text.substring(last));
        return parts.toArray(new String[0]);
    }

    /** A value as a trace or a message shows it: numbers to four figures, text quoted in formulas. */
    private static String show(Object value, String absent, boolean quoteText) {
        if (value == null) {
            return absent;
        }
        if (value instanceof Number n) {
            return Num.f(n.doubleValue());
        }
        return value instanceof String text && quoteText ? "\"" + text + "\"" : String.valueOf(value);
    }
}

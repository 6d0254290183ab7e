package dev.countercheck.ruleset;

import com.ezylang.evalex.BaseException;
import dev.countercheck.input.InputError;
import dev.countercheck.input.SourceLocation;
import dev.countercheck.ruleset.CheckDef.DerivedDef;
import dev.countercheck.ruleset.CheckDef.RequirementDef;
import dev.countercheck.ruleset.CheckDef.Variant;
import dev.countercheck.ruleset.RuleVocabulary.ElementRules;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Validates the checks of an effective ruleset against what the engine offers: known scope, check
 * ids and quantities of the catalogue with their units, every name an expression uses, no cycle
 * among derived quantities, and the type of every expression (found by evaluating it once with the
 * scope's example values). Returns the checks with their derived quantities in evaluation order.
 */
final class RuleValidator {

    private static final Pattern PLACEHOLDER = Pattern.compile("\\{([A-Za-z_][A-Za-z0-9_]*)}");
    private static final Set<String> SEVERITIES = Set.of("critical", "major", "minor", "note");
    /** A finding name ends a finding id: lower-case letters and digits joined by single hyphens. */
    private static final Pattern FINDING = Pattern.compile("[a-z0-9]+(-[a-z0-9]+)*");

    private final RuleVocabulary vocabulary;
    private final Map<String, Parameter> parameters;
    private final RuleExpressions expressions;
    private final List<InputError> errors = new ArrayList<>();
    private final Map<String, Map<String, Rule>> rules = new LinkedHashMap<>();

    RuleValidator(RuleVocabulary vocabulary, Map<String, Parameter> parameters, RuleExpressions expressions) {
        this.vocabulary = vocabulary;
        this.parameters = parameters;
        this.expressions = expressions;
    }

    List<InputError> errors() {
        return errors;
    }

    Map<String, CheckDef> validate(Map<String, CheckDef> checks) {
        // each check on its own, two or more at once (a ruleset's dozens of checks are a good part of the time a
        // short run takes to start); their errors in the order of the checks, as one after the other gives them
        List<Checked> each = checks.values().parallelStream()
                .map(check -> new RuleValidator(vocabulary, parameters, expressions).checked(check)).toList();
        Map<String, CheckDef> out = new LinkedHashMap<>();
        Map<String, Map<String, CheckDef>> byType = new LinkedHashMap<>();
        for (Checked checked : each) {
            errors.addAll(checked.errors());
            checked.check().ifPresent(c -> out.put(c.id(), c));
            checked.check().ifPresent(c -> byType.put(c.id(), checked.byType()));
        }
        for (CheckDef check : out.values()) {
            for (String type : check.elementTypes()) {
                CheckDef own = byType.get(check.id()).get(type);
                for (String subject : vocabulary.elementTypes().get(type).subjectsOf(check.scope())) {
                    Rule before = rules.computeIfAbsent(type, t -> new LinkedHashMap<>())
                            .putIfAbsent(check.idFor(subject), new Rule(own, subject));
                    if (before != null) {
                        error(check.location(), check.id(), "'" + check.idFor(subject) + "' of " + type
                                + " is already defined by the check " + before.def().id());
                    }
                }
            }
        }
        return out;
    }

    /** The rule of each check, by element type and check id, once {@link #validate(Map)} has run. */
    Map<String, Map<String, Rule>> rules() {
        return Collections.unmodifiableMap(rules);
    }

    /**
     * A check validated: with its derived quantities in evaluation order, or empty; the check as each of its types
     * runs it ({@link CheckDef#forType}, also in evaluation order; the check itself for a type without a variant);
     * and its errors.
     */
    private record Checked(Optional<CheckDef> check, Map<String, CheckDef> byType, List<InputError> errors) {
    }

    /** {@code check} validated by this validator, which has seen no other. */
    private Checked checked(CheckDef check) {
        Map<String, CheckDef> byType = new LinkedHashMap<>();
        Optional<CheckDef> validated = validate(check, byType);
        return new Checked(validated, byType, errors);
    }

    private Optional<CheckDef> validate(CheckDef check, Map<String, CheckDef> byType) {
        int before = errors.size();
        if (check.elementTypes().isEmpty()) {
            error(check.location(), check.id() + ".applies_to", "the check applies to no element type; the types are "
                    + String.join(", ", new TreeSet<>(vocabulary.elementTypes().keySet())));
        }
        Map<String, List<DerivedDef>> ordered = new LinkedHashMap<>();
        for (String type : check.elementTypes()) {
            Optional<ElementRules> rulesOfType = vocabulary.of(type);
            if (rulesOfType.isEmpty()) {
                error(check.location(), check.id() + ".applies_to", "unknown element type '" + type
                        + "'; the element types are " + String.join(", ", new TreeSet<>(vocabulary.elementTypes().keySet())));
            } else {
                ordered.put(type, validate(check.forType(type), type, rulesOfType.get(),
                        Optional.ofNullable(check.variants().get(type))));
            }
        }
        if (errors.size() > before) {
            return Optional.empty();
        }
        // the check as the rules listing shows it: in the order of evaluation of its last type, each quantity as
        // the check states it (a variant restates formulas, never which quantities there are)
        List<String> order = ordered.isEmpty() ? List.of()
                : ordered.get(check.elementTypes().get(check.elementTypes().size() - 1)).stream().map(DerivedDef::name)
                .toList();
        CheckDef validated = check.withDerived(check.derived().stream()
                .sorted(Comparator.comparingInt(d -> order.indexOf(d.name()))).toList());
        ordered.forEach((type, derived) -> {
            // a type without a variant whose evaluation order is the listing's runs the listed check itself
            boolean asListed = !check.variants().containsKey(type)
                    && derived.stream().map(DerivedDef::name).toList().equals(order);
            byType.put(type, asListed ? validated : check.forType(type).withDerived(derived));
        });
        return Optional.of(validated);
    }

    /**
     * Validates the check as a rule of {@code type} ({@code variant}: what the check states otherwise for it, whose
     * messages' errors are placed where they are written); returns its derived quantities in evaluation order.
     */
    private List<DerivedDef> validate(CheckDef check, String type, ElementRules vocabulary, Optional<Variant> variant) {
        Optional<Map<String, Variable>> scope = vocabulary.scope(check.scope());
        if (scope.isEmpty()) {
            error(check.location(), check.id(), "unknown scope '" + check.scope() + "' for " + type + "; the scopes are "
                    + String.join(", ", new TreeSet<>(vocabulary.scopes().keySet())));
            return List.of();
        }
        List<String> subjects = vocabulary.subjectsOf(check.scope());
        for (String subject : subjects) {
            if (!vocabulary.checkUnits().containsKey(check.idFor(subject))) {
                error(check.location(), check.id(), "'" + check.idFor(subject) + "' is not a check a ruleset can define"
                        + " for " + type + "; they are " + String.join(", ", new TreeSet<>(vocabulary.checkUnits().keySet())));
                return List.of();
            }
        }
        Map<String, Object> values = new HashMap<>();
        scope.get().forEach((name, v) -> values.put(name, v.example()));
        values.put("dir", subjects.get(0));
        parameters.forEach((name, p) -> values.put(name, p.value()));
        Map<String, DerivedDef> byName = new LinkedHashMap<>();
        check.derived().forEach(d -> byName.put(d.name(), d));
        Set<String> known = new TreeSet<>(values.keySet());
        known.addAll(byName.keySet());
        Map<String, Set<String>> uses = new HashMap<>();
        for (DerivedDef d : check.derived()) {
            uses.put(d.name(), namesIn(d.formula(), d.location(), check.id() + ".derived." + d.name(), known));
        }
        List<DerivedDef> ordered = order(check, byName, uses);
        for (DerivedDef d : ordered) {
            typeOf(d.formula(), values, d.location(), check.id() + ".derived." + d.name(), true)
                    .ifPresent(v -> values.put(d.name(), v));
        }
        check.appliesWhen().ifPresent(w -> {
            namesIn(w, check.location(), check.id() + ".applies_when", known);
            typeOf(w, values, check.location(), check.id() + ".applies_when", false);
        });
        for (String subject : subjects) {
            Map<String, String> units = vocabulary.checkUnits().get(check.idFor(subject));
            for (String value : check.values()) {
                Optional<String> unit = byName.containsKey(value) ? Optional.of(byName.get(value).unit())
                        : Optional.ofNullable(scope.get().get(value)).map(Variable::unit);
                if (!units.containsKey(value)) {
                    error(check.location(), check.id() + ".values", "'" + value + "' is not a quantity of "
                            + check.idFor(subject) + "; its quantities are " + String.join(", ", units.keySet()));
                } else if (unit.isEmpty()) {
                    error(check.location(), check.id() + ".values", "'" + value + "' is neither a derived quantity"
                            + " of this check nor a variable of scope " + check.scope());
                } else if (!unit.get().equals(units.get(value))) {
                    error(check.location(), check.id() + ".values", "'" + value + "' is in " + unit.get() + " but "
                            + check.idFor(subject) + "." + value + " is reported in " + units.get(value));
                }
            }
        }
        Set<String> findings = new HashSet<>();
        for (RequirementDef r : check.requirements()) {
            String path = check.id() + ".requirements";
            if (!FINDING.matcher(r.finding()).matches() || r.finding().startsWith("claim-")) {
                error(r.location(), path + ".finding", "finding '" + r.finding() + "' is not a finding name (lower-case"
                        + " letters and digits joined by hyphens, not starting with claim-, which names claims)");
            } else if (!findings.add(r.finding())) {
                error(r.location(), path + ".finding", "two requirements of " + check.id() + " raise finding '"
                        + r.finding() + "'; give each its own 'finding' name");
            }
            namesIn(r.that(), r.location(), path, known);
            typeOf(r.that(), values, r.location(), path + ".that", false);
            r.utilisation().ifPresent(u -> {
                namesIn(u, r.location(), path, known);
                typeOf(u, values, r.location(), path + ".utilisation", true);
            });
            if (!SEVERITIES.contains(r.severity())) {
                error(r.location(), path + ".severity", "severity '" + r.severity()
                        + "' is not one of critical, major, minor, note");
            }
            SourceLocation messageAt = variant.map(v -> v.requirements().get(r.finding()))
                    .filter(w -> w.message().isPresent()).map(CheckDef.Words::location).orElse(r.location());
            Matcher m = PLACEHOLDER.matcher(r.message());
            while (m.find()) {
                if (!known.contains(m.group(1))) {
                    error(messageAt, path + ".message", "the message names {" + m.group(1) + "}, which is not known"
                            + " here");
                }
            }
        }
        for (CheckDef.CautionDef c : check.cautions()) {
            namesIn(c.when(), c.location(), check.id() + ".cautions", known);
            typeOf(c.when(), values, c.location(), check.id() + ".cautions.when", false);
        }
        return ordered;
    }

    private Set<String> namesIn(String expression, SourceLocation at, String path, Set<String> known) {
        try {
            Set<String> used = expressions.variablesOf(expression);
            for (String name : used) {
                if (known.stream().noneMatch(k -> k.equalsIgnoreCase(name))) {
                    error(at, path, "'" + name + "' in '" + expression + "' is not a variable, parameter, table or"
                            + " derived quantity known here");
                }
            }
            return used;
        } catch (BaseException e) {
            error(at, path, "cannot read '" + expression + "': " + e.getMessage());
            return Set.of();
        }
    }

    /** Derived quantities ordered so that each comes after those it uses; a cycle is an error. */
    private List<DerivedDef> order(CheckDef check, Map<String, DerivedDef> byName, Map<String, Set<String>> uses) {
        List<DerivedDef> ordered = new ArrayList<>();
        Set<String> done = new TreeSet<>(String.CASE_INSENSITIVE_ORDER);
        Set<String> visiting = new TreeSet<>(String.CASE_INSENSITIVE_ORDER);
        for (String name : byName.keySet()) {
            visit(name, byName, uses, done, visiting, ordered, new ArrayList<>(), check);
        }
        return ordered;
    }

    private void visit(String name, Map<String, DerivedDef> byName, Map<String, Set<String>> uses, Set<String> done,
                       Set<String> visiting, List<DerivedDef> ordered, List<String> path, CheckDef check) {
        if (done.contains(name)) {
            return;
        }
        path.add(name);
        if (!visiting.add(name)) {
            DerivedDef d = byName.get(name);
            error(d.location(), check.id() + ".derived." + name, "derived quantities form a cycle: "
                    + String.join(" → ", path));
            done.add(name);
            return;
        }
        for (String used : uses.getOrDefault(name, Set.of())) {
            byName.keySet().stream().filter(k -> k.equalsIgnoreCase(used)).findFirst()
                    .ifPresent(k -> visit(k, byName, uses, done, visiting, ordered, new ArrayList<>(path), check));
        }
        visiting.remove(name);
        if (done.add(name)) {
            ordered.add(byName.get(name));
        }
    }

    private Optional<Object> typeOf(String expression, Map<String, Object> values, SourceLocation at, String path,
                                    boolean wantNumber) {
        try {
            var v = expressions.evaluate(expression, values);
            if (wantNumber && !v.isNumberValue()) {
                error(at, path, "'" + expression + "' must give a number");
            } else if (!wantNumber && !v.isBooleanValue()) {
                error(at, path, "'" + expression + "' must be a condition (true or false)");
            } else {
                return Optional.of(wantNumber ? (Object) v.getNumberValue().doubleValue() : v.getBooleanValue());
            }
        } catch (BaseException | RuntimeException e) {
            error(at, path, "'" + expression + "' cannot be evaluated with the example values of its scope: "
                    + e.getMessage());
        }
        return Optional.empty();
    }

    private void error(SourceLocation at, String path, String message) {
        errors.add(new InputError(at, path, message));
    }
}

package dev.countercheck.element;

import dev.countercheck.ruleset.CheckDef;
import dev.countercheck.ruleset.Parameter;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.TableDef;
import dev.countercheck.ruleset.Variable;

import java.util.Map;
import java.util.TreeMap;

/**
 * What each name a rule's formula may write means, taken from where the name is declared: a parameter's or a
 * table's note, a scope variable's description (every kind's scopes), a derived quantity's symbol. The report
 * defines the names of a rule-derived step with it; built once per review.
 */
final class RulesetNames {

    private RulesetNames() {
    }

    static Map<String, String> of(Ruleset rules) {
        Map<String, String> names = new TreeMap<>();
        for (ElementKind<?> kind : ElementKinds.ALL) {
            for (Map<String, Variable> scope : kind.ruleVocabulary().scopes().values()) {
                scope.forEach((name, v) -> names.putIfAbsent(name, v.description()));
            }
        }
        for (Parameter p : rules.parameters().values()) {
            names.put(p.name(), p.note() + " (" + p.symbol() + ", ruleset parameter)");
        }
        for (TableDef t : rules.tables().values()) {
            names.put(t.name(), t.note() + " (table of the ruleset)");
        }
        for (CheckDef c : rules.checks().values()) {
            c.derived().forEach(d -> names.putIfAbsent(d.name(), "the rule's name for " + d.symbol()));
        }
        return Map.copyOf(names);
    }
}

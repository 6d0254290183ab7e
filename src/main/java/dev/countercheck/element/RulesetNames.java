package dev.countercheck.element;

import dev.countercheck.ruleset.CheckDef;
import dev.countercheck.ruleset.Parameter;
import dev.countercheck.ruleset.RuleExpressions;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.TableDef;
import dev.countercheck.ruleset.Variable;

import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.WeakHashMap;

/**
 * What each name a rule's formula may write means, taken from where the name is declared: a parameter's or a
 * table's note, a scope variable's description, a derived quantity's symbol. A scope variable is described as its
 * kind's scopes describe it, under {@code <element type>/<name>} (a name that two scopes of the kind describe
 * differently, such as {@code phi}, has both, in the order of the scopes' names), so that a pad's report never
 * reads a cap's words nor a cap's a pad's; the others under the name alone. The report defines the names of a
 * rule-derived step with it; built once per ruleset loaded (the scopes' part once).
 */
final class RulesetNames {

    /** What the names mean and their symbols, for each ruleset loaded (keyed by its evaluator, one per ruleset). */
    private static final Map<RuleExpressions, Map<String, String>> NAMES = Collections.synchronizedMap(new WeakHashMap<>());
    private static final Map<RuleExpressions, Map<String, String>> SYMBOLS = Collections.synchronizedMap(new WeakHashMap<>());

    private RulesetNames() {
    }

    static Map<String, String> of(Ruleset rules) {
        return NAMES.computeIfAbsent(rules.expressions(), k -> described(rules));
    }

    private static Map<String, String> described(Ruleset rules) {
        Map<String, String> names = new TreeMap<>(ScopeNames.DESCRIBED);
        for (Parameter p : rules.parameters().values()) {
            names.put(p.name(), p.note() + " (" + p.symbol() + ", ruleset parameter)");
        }
        for (TableDef t : rules.tables().values()) {
            names.put(t.name(), t.note() + " (table of the ruleset)");
        }
        for (CheckDef c : new TreeMap<>(rules.checks()).values()) {
            c.derived().forEach(d -> names.putIfAbsent(d.name(), "the rule's name for " + d.symbol()));
        }
        return Map.copyOf(names);
    }

    /**
     * The standard's symbol of each name that declares one: a scope variable's, a parameter's, a table's, a
     * derived quantity's (the first rule to derive a name gives its symbol). A symbol with a space in it is a
     * phrase, not a symbol ({@code vmin coefficient}): the name is written as it is.
     */
    static Map<String, String> symbols(Ruleset rules) {
        return SYMBOLS.computeIfAbsent(rules.expressions(), k -> declaredSymbols(rules));
    }

    private static Map<String, String> declaredSymbols(Ruleset rules) {
        Map<String, String> symbols = new TreeMap<>();
        for (ElementKind<?> kind : ElementKinds.ALL) {
            for (Map<String, Variable> scope : new TreeMap<>(kind.ruleVocabulary().scopes()).values()) {
                new TreeMap<>(scope).forEach((name, v) -> {
                    if (!v.symbol().isEmpty()) {
                        symbols.putIfAbsent(name, v.symbol());
                    }
                });
            }
        }
        rules.parameters().values().forEach(p -> symbols.put(p.name(), p.symbol()));
        rules.tables().values().forEach(t -> symbols.put(t.name(), t.symbol()));
        for (CheckDef c : new TreeMap<>(rules.checks()).values()) {
            c.derived().forEach(d -> symbols.putIfAbsent(d.name(), d.symbol()));
        }
        symbols.values().removeIf(symbol -> symbol.contains(" "));
        return Map.copyOf(symbols);
    }

    /** The scope variables' descriptions of every kind: they are the program's, formed once when first needed. */
    private static final class ScopeNames {

        static final Map<String, String> DESCRIBED = described();

        private static Map<String, String> described() {
            Map<String, Set<String>> described = new TreeMap<>();
            for (ElementKind<?> kind : ElementKinds.ALL) {
                for (Map<String, Variable> scope : new TreeMap<>(kind.ruleVocabulary().scopes()).values()) {
                    new TreeMap<>(scope).forEach((name, v) -> described.computeIfAbsent(kind.type() + "/" + name,
                            k -> new LinkedHashSet<>()).add(v.description()));
                }
            }
            Map<String, String> names = new TreeMap<>();
            described.forEach((name, descriptions) -> names.put(name, String.join(" / ", descriptions)));
            return Map.copyOf(names);
        }
    }
}

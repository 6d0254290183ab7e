package dev.countercheck.ruleset;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * What the review engine offers the rules and expects of them, so that a ruleset can be validated
 * completely at load: the variables of each scope, the subjects a scope expands over ({@code {dir}}
 * in a check id), the checks the rules may define with their quantities' units, and the parameters
 * the engine itself reads.
 *
 * @param scopes             variables by scope name
 * @param subjects           for each scope, the values of {@code {dir}} ({@code [""]} for a scope with one subject)
 * @param checkUnits         check id → quantity → unit, for the checks a ruleset may define
 * @param requiredParameters parameters the engine reads in Java
 * @param findingKinds       the kinds of finding the engine raises, each of which the ruleset gives a severity
 */
public record RuleVocabulary(Map<String, Map<String, Variable>> scopes, Map<String, List<String>> subjects,
                             Map<String, Map<String, String>> checkUnits, Set<String> requiredParameters, Set<String> findingKinds) {

    Optional<Map<String, Variable>> scope(String name) {
        return Optional.ofNullable(scopes.get(name));
    }
}

package dev.countercheck.ruleset;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * What the review engine offers the rules and expects of them, so that a ruleset can be validated
 * completely at load: for each element type, the variables of each scope, the subjects a scope
 * expands over ({@code {dir}} in a check id) and the checks the rules may define; and the
 * parameters the engine itself reads.
 *
 * @param elementTypes       what the rules of each element type may use and define, by type ({@code pile-cap})
 * @param requiredParameters parameters the engine reads in Java
 * @param findingKinds       the kinds of finding the engine raises, each of which the ruleset gives a severity
 * @param options            the methods the engine lets a ruleset choose, by name, with the choices (each
 *                           option the chain must set, e.g. {@code node_column_basis})
 */
public record RuleVocabulary(Map<String, ElementRules> elementTypes, Set<String> requiredParameters,
                             Set<String> findingKinds, Map<String, List<String>> options) {

    /** A vocabulary with no options to choose. */
    public RuleVocabulary(Map<String, ElementRules> elementTypes, Set<String> requiredParameters,
                          Set<String> findingKinds) {
        this(elementTypes, requiredParameters, findingKinds, Map.of());
    }

    /**
     * What the rules of one element type may use and define.
     *
     * @param scopes     variables by scope name ({@code section}, {@code bottom-bars}, {@code starters})
     * @param subjects   for each scope, the values of {@code {dir}} ({@code [""]} for a scope with one subject)
     * @param checkUnits check id → quantity → unit, for the checks a ruleset may define for this type
     */
    public record ElementRules(Map<String, Map<String, Variable>> scopes, Map<String, List<String>> subjects,
                               Map<String, Map<String, String>> checkUnits) {

        Optional<Map<String, Variable>> scope(String name) {
            return Optional.ofNullable(scopes.get(name));
        }

        /** The subjects of a scope; one unnamed subject when the scope has no directions. */
        public List<String> subjectsOf(String scope) {
            return subjects.getOrDefault(scope, List.of(""));
        }
    }

    Optional<ElementRules> of(String elementType) {
        return Optional.ofNullable(elementTypes.get(elementType));
    }
}

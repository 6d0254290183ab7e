package dev.countercheck.element;

import dev.countercheck.element.padfooting.PadFootingKind;
import dev.countercheck.element.pilecap.PileCapKind;
import dev.countercheck.ruleset.RuleVocabulary;
import dev.countercheck.ruleset.RuleVocabulary.ElementRules;
import dev.countercheck.submission.ElementBinder;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/** The element kinds the checker reviews: the one list that names them. */
public final class ElementKinds {

    /** Every kind, in the order their types are listed to the user. */
    public static final List<ElementKind<?>> ALL = List.of(new PileCapKind(), new PadFootingKind());

    private ElementKinds() {
    }

    /** The binder of every kind, for the submission reader. */
    public static List<ElementBinder> binders() {
        return ALL.stream().<ElementBinder>map(ElementKind::binder).toList();
    }

    /** The kind of {@code type}, when there is one. */
    static Optional<ElementKind<?>> of(String type) {
        return ALL.stream().filter(k -> k.type().equals(type)).findFirst();
    }

    /** What the rules of every kind may use and define, {@code requiredParameters} and the {@code findingKinds}. */
    static RuleVocabulary vocabulary(Set<String> requiredParameters, Set<String> findingKinds) {
        Map<String, ElementRules> types = new LinkedHashMap<>();
        ALL.forEach(k -> types.put(k.type(), k.ruleVocabulary()));
        Map<String, List<String>> options = new LinkedHashMap<>();
        ALL.forEach(k -> options.putAll(k.options()));
        return new RuleVocabulary(Collections.unmodifiableMap(types), requiredParameters, findingKinds,
                Collections.unmodifiableMap(options));
    }
}

package dev.countercheck.element;

import dev.countercheck.review.ElementAssembler;
import dev.countercheck.review.ElementReview;
import dev.countercheck.ruleset.RuleVocabulary.ElementRules;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.submission.CheckCatalogue;
import dev.countercheck.submission.ElementBinder;
import dev.countercheck.submission.ElementInput;

import java.util.List;
import java.util.Set;

/**
 * One type of element the checker reviews, with everything the shared code needs of it: the binder
 * that reads it (with its type name and check catalogue), the variables its ruleset rules see, the
 * parameters and assumptions of its review, and the reviewer. The reviewer's result carries the
 * type's own drawing (a member of the sealed {@link dev.countercheck.review.Drawing} family).
 * {@link ElementKinds#ALL} lists every kind; nothing else names one.
 *
 * @param <E> the element record the binder produces
 */
public interface ElementKind<E extends ElementInput> {

    /** Reads elements of this type: type name, accepted keys and the check catalogue. */
    ElementBinder binder();

    /** The record of a reviewable element of this type. */
    Class<E> elementClass();

    /** The scopes, subjects and rule-defined checks the ruleset's rules of this type may use. */
    ElementRules ruleVocabulary();

    /** The ruleset parameters the reviewer reads in Java (a ruleset lacking one is refused at load). */
    Set<String> parameters();

    /** The methods a ruleset chooses for this kind (option name → the choices), e.g. the column node's basis. */
    default java.util.Map<String, List<String>> options() {
        return java.util.Map.of();
    }

    /** The assumptions every review of this type makes, for the report. */
    List<String> assumptions();

    /**
     * What the review of this type assumes of the combinations the review generates, added to {@link
     * Combinations#ASSUMPTION} when an element of this type has generated ones (a sentence or more).
     */
    String combinationsAssumption();

    /** Reviews one element: every check of the catalogue, in catalogue order. */
    ElementReview review(E element, Ruleset rules, ElementAssembler assembler);

    /** The {@code type} value of this kind, e.g. {@code pile-cap}. */
    default String type() {
        return binder().type();
    }

    /** The checks of this kind, in report order. */
    default CheckCatalogue checks() {
        return binder().checks();
    }
}

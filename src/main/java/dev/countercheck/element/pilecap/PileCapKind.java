package dev.countercheck.element.pilecap;

import dev.countercheck.element.ElementKind;
import dev.countercheck.review.ElementAssembler;
import dev.countercheck.review.ElementReview;
import dev.countercheck.ruleset.RuleVocabulary.ElementRules;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.submission.ElementBinder;
import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.PileCapBinder;

import java.util.List;
import java.util.Set;

/** Pile caps as an element kind: {@code type: pile-cap}, reviewed by {@link PileCapReviewer}. */
public final class PileCapKind implements ElementKind<PileCap> {

    @Override
    public ElementBinder binder() {
        return PileCapBinder.BINDER;
    }

    @Override
    public Class<PileCap> elementClass() {
        return PileCap.class;
    }

    @Override
    public ElementRules ruleVocabulary() {
        return PileCapReviewer.RULE_VOCABULARY;
    }

    @Override
    public Set<String> parameters() {
        return PileCapReviewer.PARAMETERS;
    }

    @Override
    public java.util.Map<String, List<String>> options() {
        return PileCapReviewer.OPTIONS;
    }

    @Override
    public List<String> assumptions() {
        return PileCapReviewer.ASSUMPTIONS;
    }

    @Override
    public String combinationsAssumption() {
        return PileCapReviewer.COMBINATIONS_ASSUMPTION;
    }

    @Override
    public ElementReview review(PileCap cap, Ruleset rules, ElementAssembler assembler) {
        return new PileCapReviewer(assembler).review(cap, rules);
    }
}

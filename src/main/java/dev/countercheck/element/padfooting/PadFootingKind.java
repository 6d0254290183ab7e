package dev.countercheck.element.padfooting;

import dev.countercheck.element.ElementKind;
import dev.countercheck.review.ElementAssembler;
import dev.countercheck.review.ElementReview;
import dev.countercheck.ruleset.RuleVocabulary.ElementRules;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.submission.ElementBinder;
import dev.countercheck.submission.PadFooting;
import dev.countercheck.submission.PadFootingBinder;

import java.util.List;
import java.util.Set;

/** Pad footings as an element kind: {@code type: pad-footing}, reviewed by {@link PadFootingReviewer}. */
public final class PadFootingKind implements ElementKind<PadFooting> {

    @Override
    public ElementBinder binder() {
        return PadFootingBinder.BINDER;
    }

    @Override
    public Class<PadFooting> elementClass() {
        return PadFooting.class;
    }

    @Override
    public ElementRules ruleVocabulary() {
        return PadFootingReviewer.RULE_VOCABULARY;
    }

    @Override
    public Set<String> parameters() {
        return PadFootingReviewer.PARAMETERS;
    }

    @Override
    public List<String> assumptions() {
        return PadFootingReviewer.ASSUMPTIONS;
    }

    @Override
    public String combinationsAssumption() {
        return PadFootingReviewer.COMBINATIONS_ASSUMPTION;
    }

    @Override
    public ElementReview review(PadFooting pad, Ruleset rules, ElementAssembler assembler) {
        return new PadFootingReviewer(assembler).review(pad, rules);
    }
}

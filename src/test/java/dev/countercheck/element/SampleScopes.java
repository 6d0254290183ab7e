package dev.countercheck.element;

import dev.countercheck.review.CheckResult;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Review;
import dev.countercheck.review.Value;
import dev.countercheck.ruleset.EvaluatorAgreement;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetLoader;
import dev.countercheck.ruleset.Variable;
import dev.countercheck.submission.ElementInput;
import dev.countercheck.submission.Submission;
import dev.countercheck.submission.SubmissionReader;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

/**
 * The detailing scopes of every element of one kind in the bundled samples and rule fixtures, under every bundled
 * ruleset, handed to {@link EvaluatorAgreement}: As,req of each direction as the element's review computed it.
 */
public final class SampleScopes {

    /** Forms a scope's variables for one subject of an element, as the kind's reviewer does. */
    public interface Former<E> {
        DetailingVariables.Values values(E element, Ruleset rules, String scope, String subject,
                                         Map<Axis, Double> asRequired);
    }

    private SampleScopes() {
    }

    /**
     * @param asRequiredCheck the check whose {@code -x} and {@code -y} results give As,req ({@code tie}, {@code bending})
     */
    public static <E extends ElementInput> EvaluatorAgreement agreement(Class<E> kind, String elementType,
                                                                        Map<String, Map<String, Variable>> scopes,
                                                                        String asRequiredCheck, Former<E> former)
            throws Exception {
        EvaluatorAgreement agreement = new EvaluatorAgreement();
        List<Path> files;
        try (Stream<Path> samples = Files.list(Path.of("sample-submissions"));
             Stream<Path> fixtures = Files.list(Path.of("src/test/resources/rule-fixtures"))) {
            files = Stream.concat(samples, fixtures).filter(p -> p.toString().endsWith(".yaml")).sorted().toList();
        }
        RulesetLoader loader = new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY);
        for (String id : List.of("en1992-recommended", "en1992-uk-na", "house-example")) {
            Ruleset rules = loader.load(id);
            for (Path file : files) {
                Submission submission = new SubmissionReader(ElementKinds.binders()).read(file);
                Review review = new ProjectReviewer(new Review.ToolInfo("countercheck", "test"))
                        .review(submission, rules, "2026-01-01");
                for (ElementInput e : submission.elements()) {
                    if (!kind.isInstance(e)) {
                        continue;
                    }
                    Map<Axis, Double> asRequired = asRequired(review, e.id(), asRequiredCheck);
                    new TreeMap<>(scopes).forEach((scope, declared) -> {
                        for (String subject : DetailingVariables.subjects().get(scope)) {
                            DetailingVariables.Values v;
                            try {
                                v = former.values(kind.cast(e), rules, scope, subject, asRequired);
                            } catch (RuntimeException unreviewable) {
                                continue; // an element whose context cannot be formed runs no rule
                            }
                            if (v.missing().isEmpty()) {
                                agreement.compare(rules, elementType, scope, declared, subject, v.values());
                            }
                        }
                    });
                }
            }
        }
        return agreement;
    }

    private static Map<Axis, Double> asRequired(Review review, String elementId, String check) {
        ElementReview element = review.elements().stream().filter(e -> e.id().equals(elementId)).findFirst()
                .orElseThrow();
        Map<Axis, Double> asRequired = new EnumMap<>(Axis.class);
        for (Axis axis : Axis.values()) {
            Value v = element.checks().stream().filter(c -> c.id().equals(check + "-" + axis.label())).findFirst()
                    .map(CheckResult::values).map(values -> values.get("as_required")).orElse(null);
            asRequired.put(axis, v == null ? 0.0 : v.value());
        }
        return asRequired;
    }
}

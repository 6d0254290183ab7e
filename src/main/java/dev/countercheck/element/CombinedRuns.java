package dev.countercheck.element;

import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.GeneratedCase;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.CheckCatalogue;
import dev.countercheck.submission.ElementInput;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;

/**
 * How any element type is reviewed under its designer's cases and the combinations generated from its
 * characteristic loads: the checks run under the designer's cases alone when there are no loads; with loads, under
 * the generated cases and the designer's together (the report), and, when the designer gave ULS cases, under each
 * set alone for the {@code combinations} check.
 *
 * @param <R> what one run of the element's checks gives (its outcomes, and what the report draws from)
 */
public final class CombinedRuns<R> {

    /**
     * The run the report shows, the {@code combinations} check and the generated cases for the report.
     *
     * @param shown    the run under every case; empty when the combinations could not be formed and the designer gave
     *                 no ULS case, so that no check could be done ({@link #unformed} then gives the outcomes)
     * @param unformed every check but {@code combinations} not-checked with the reason, when {@code shown} is empty
     */
    public record Result<R>(Optional<R> shown, CheckOutcome combinations, List<GeneratedCase> generated,
                            List<CheckOutcome> unformed) {
    }

    private final CheckCatalogue catalogue;
    private final Function<List<ActionCase>, R> run;
    private final Function<R, List<CheckOutcome>> outcomes;

    /**
     * @param run      runs every check but {@code combinations} under the given action cases
     * @param outcomes the outcomes of a run
     */
    public CombinedRuns(CheckCatalogue catalogue, Function<List<ActionCase>, R> run,
                        Function<R, List<CheckOutcome>> outcomes) {
        this.catalogue = catalogue;
        this.run = run;
        this.outcomes = outcomes;
    }

    /** Reviews {@code element}, whose designer's cases are {@code actions}, under {@code rules}. */
    public Result<R> review(ElementInput element, List<ActionCase> actions, Ruleset rules) {
        if (element.loads().isEmpty()) {
            return new Result<>(Optional.of(run.apply(actions)), CombinationsCheck.notAsked(catalogue), List.of(),
                    List.of());
        }
        Combinations generated;
        try {
            generated = Combinations.of(element.loads(), rules);
        } catch (IllegalArgumentException e) {
            CheckOutcome why = CombinationsCheck.notFormed(catalogue, e.getMessage());
            if (!hasUls(actions)) {
                return new Result<>(Optional.empty(), why, List.of(), notChecked("the combinations of the loads could"
                        + " not be formed: " + e.getMessage()));
            }
            return new Result<>(Optional.of(run.apply(actions)), why, List.of(), List.of());
        }
        List<ActionCase> cases = generated.cases(element.location());
        List<ActionCase> both = new ArrayList<>(actions);
        both.addAll(cases);
        R union = run.apply(both);
        CheckOutcome comparison = hasUls(actions)
                ? CombinationsCheck.compare(catalogue, results(run.apply(actions)), results(run.apply(cases)),
                        actions.size(), cases.size(), rules.number("claim_tolerance"))
                : CombinationsCheck.generatedOnly(catalogue, cases.size(), actions.size());
        Set<String> names = cases.stream().map(ActionCase::name).collect(Collectors.toSet());
        return new Result<>(Optional.of(union), comparison, generated.forReport(CombinationsCheck.governed(
                outcomes.apply(union).stream().map(CheckOutcome::result).toList(), names)), List.of());
    }

    /** The outcomes of {@code result} in catalogue order, {@code combinations} in its place. */
    public List<CheckOutcome> inOrder(Result<R> result) {
        List<CheckOutcome> done = result.shown().map(outcomes).orElse(result.unformed());
        List<CheckOutcome> ordered = new ArrayList<>();
        for (String id : catalogue.checks().keySet()) {
            ordered.add(id.equals(CombinationsCheck.ID) ? result.combinations()
                    : done.stream().filter(o -> o.result().id().equals(id)).findFirst().orElseThrow());
        }
        return ordered;
    }

    private List<CheckOutcome> notChecked(String reason) {
        return catalogue.checks().keySet().stream().filter(id -> !id.equals(CombinationsCheck.ID))
                .map(id -> new CheckBuilder(catalogue.check(id)).notChecked(reason).build()).toList();
    }

    private Map<String, CheckResult> results(R r) {
        Map<String, CheckResult> map = new LinkedHashMap<>();
        outcomes.apply(r).forEach(o -> map.put(o.result().id(), o.result()));
        return map;
    }

    private static boolean hasUls(List<ActionCase> actions) {
        return actions.stream().anyMatch(a -> a.kind() == ActionCase.Kind.ULS);
    }
}

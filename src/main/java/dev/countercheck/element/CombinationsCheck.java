package dev.countercheck.element;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.FindingKind;
import dev.countercheck.review.Slugs;
import dev.countercheck.submission.CheckCatalogue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * The {@code combinations} check of any element type: the utilisation of every other check under the
 * designer's action cases and under the combinations generated from the characteristic loads. A
 * generated case that raises a utilisation beyond the claim tolerance is one the designer missed.
 */
public final class CombinationsCheck {

    /** The check's id in every catalogue that has it. */
    public static final String ID = "combinations";

    private static final String BASIS = "EN 1990 6.4.3, 6.5.3";

    private CombinationsCheck() {
    }

    /**
     * Only the designer's cases were given: there is nothing to compare them with (the check, defined as that
     * comparison, does not apply), and a note says that the combinations were taken as given and not checked.
     */
    public static CheckOutcome notAsked(CheckCatalogue catalogue) {
        return builder(catalogue).notApplicable("no characteristic loads (loads) were given: the designer's"
                + " combinations of actions were taken as given and not checked")
                .finding(FindingKind.REMARK, "not-checked", "The combinations of actions were not checked: the"
                        + " submission gives the designer's combined cases only. Give the characteristic loads by"
                        + " source (loads) for the review to generate the EN 1990 combinations and compare.")
                .build();
    }

    /** The combinations could not be formed (the ruleset lacks a factor): the reason says why. */
    public static CheckOutcome notFormed(CheckCatalogue catalogue, String reason) {
        return builder(catalogue).notChecked(reason).build();
    }

    /** Only characteristic loads were given: the checks used the generated combinations. */
    public static CheckOutcome generatedOnly(CheckCatalogue catalogue, int generated, int given) {
        CheckBuilder b = builder(catalogue);
        counts(b, generated, given);
        return b.notApplicable("no designer's ULS cases to compare: the checks used the " + generated
                + " combinations generated from the characteristic loads").build();
    }

    /**
     * Compares each check under the designer's cases ({@code given}) with the same check under the
     * generated ones ({@code generated}); {@code tolerance} is the claim tolerance (relative).
     */
    public static CheckOutcome compare(CheckCatalogue catalogue, Map<String, CheckResult> given,
                                       Map<String, CheckResult> generated, int casesGiven, int casesGenerated,
                                       double tolerance) {
        CheckBuilder b = builder(catalogue);
        counts(b, casesGenerated, casesGiven);
        double worst = 0;
        Map<String, List<String>> raisedBy = new LinkedHashMap<>();
        Map<String, List<String>> failsUnder = new LinkedHashMap<>();
        for (String id : catalogue.checks().keySet()) {
            CheckResult g = given.get(id);
            CheckResult r = generated.get(id);
            Optional<Double> before = utilisation(g);
            Optional<Double> after = utilisation(r);
            if (before.isEmpty() || after.isEmpty() || r.governingCase().isEmpty()) {
                continue;
            }
            double rise = after.get() - before.get();
            worst = Math.max(worst, rise);
            String caseName = r.governingCase().get();
            b.trace(Step.of("η (" + id + ")", "utilisation: designer's cases → generated cases",
                    Num.f(before.get()) + " → " + Num.f(after.get()) + " (" + caseName + ")", after.get(), "-", BASIS));
            if (after.get() > before.get() * (1 + tolerance) + 1e-9) {
                raisedBy.computeIfAbsent(caseName, k -> new ArrayList<>()).add(id + " (" + Num.f(before.get())
                        + " → " + Num.f(after.get()) + ")");
                if (r.status() == CheckStatus.FAIL && g.status() != CheckStatus.FAIL) {
                    failsUnder.computeIfAbsent(caseName, k -> new ArrayList<>()).add(id);
                }
            }
        }
        b.value("worst_increase", Step.of("Δη,max", "max over checks of (η generated − η designer)", Num.f(worst),
                worst, "-", BASIS));
        raisedBy.forEach((caseName, checks) -> {
            List<String> fails = failsUnder.getOrDefault(caseName, List.of());
            String message = "The designer's cases miss the combination " + caseName + ", which governs "
                    + String.join(", ", checks) + " (utilisation under the designer's cases → under the generated"
                    + " ones)" + (fails.isEmpty() ? "." : "; under it " + String.join(", ", fails) + " fail"
                    + (fails.size() == 1 ? "s" : "") + ".");
            b.fail(fails.isEmpty() ? FindingKind.COMBINATION_MISSED : FindingKind.CAPACITY, "missed-" + slug(caseName),
                    message);
        });
        return b.pass().build();
    }

    /** The slug of a generated case's name, with the signs of reversible actions spelled out. */
    static String slug(String caseName) {
        return Slugs.of(caseName.replace(" + ", " ").replace("+", " plus ").replace("−", " minus ")
                .replace("ψ", " psi"));
    }

    /** The utilisation of a check that was done; 0 for one that did not apply (nothing to carry). */
    private static Optional<Double> utilisation(CheckResult r) {
        if (r == null) {
            return Optional.empty();
        }
        if (r.status() == CheckStatus.NOT_APPLICABLE) {
            return Optional.of(0.0);
        }
        if (r.status() == CheckStatus.NOT_CHECKED || r.utilisation().isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(r.utilisation().getAsDouble());
    }

    private static void counts(CheckBuilder b, int generated, int given) {
        b.value("cases_generated", Step.of("n,gen", "combinations generated (identical ones once)",
                String.valueOf(generated), generated, "-", BASIS));
        b.value("cases_given", Step.of("n,given", "action cases the designer gave", String.valueOf(given), given,
                "-", "submission"));
    }

    private static CheckBuilder builder(CheckCatalogue catalogue) {
        return new CheckBuilder(catalogue.check(ID));
    }

    /** The ids of the checks each generated case governs, from the results of a review. */
    public static Map<String, List<String>> governed(List<CheckResult> results, Set<String> generatedNames) {
        Map<String, List<String>> governs = new LinkedHashMap<>();
        for (CheckResult r : results) {
            r.governingCase().filter(generatedNames::contains)
                    .ifPresent(c -> governs.computeIfAbsent(c, k -> new ArrayList<>()).add(r.id()));
        }
        return governs;
    }
}

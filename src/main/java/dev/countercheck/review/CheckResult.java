package dev.countercheck.review;

import dev.countercheck.eurocode.Step;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The recomputation of one check on one element.
 *
 * @param utilisation demand / capacity of the governing comparison, when the check has one
 * @param reason      why the check is not-applicable or not-checked, or why it failed
 * @param values      every quantity computed, by name, in catalogue order
 * @param claims      every claimed quantity of this check compared with the computed one
 * @param trace       the calculation, in the order it was done
 * @param governingCase the name of the action case that governs the check, when the check depends on the cases
 */
public record CheckResult(String id, String title, String basis, CheckStatus status, OptionalDouble utilisation,
                          Optional<String> reason, Map<String, Value> values, List<ClaimComparison> claims,
                          List<Step> trace, Optional<String> governingCase) {

    /** A result that names no governing case. */
    public CheckResult(String id, String title, String basis, CheckStatus status, OptionalDouble utilisation,
                       Optional<String> reason, Map<String, Value> values, List<ClaimComparison> claims,
                       List<Step> trace) {
        this(id, title, basis, status, utilisation, reason, values, claims, trace, Optional.empty());
    }

    /** The same result with the claims compared. */
    public CheckResult withClaims(List<ClaimComparison> compared) {
        return new CheckResult(id, title, basis, status, utilisation, reason, values, List.copyOf(compared), trace,
                governingCase);
    }
}

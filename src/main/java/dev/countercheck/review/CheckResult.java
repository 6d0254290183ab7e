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
 */
public record CheckResult(String id, String title, String basis, CheckStatus status, OptionalDouble utilisation,
                          Optional<String> reason, Map<String, Value> values, List<ClaimComparison> claims,
                          List<Step> trace) {
}

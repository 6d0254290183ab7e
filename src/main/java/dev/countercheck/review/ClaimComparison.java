package dev.countercheck.review;

/**
 * A claimed value set against the recomputed one.
 *
 * @param difference (claimed − computed) / computed
 */
public record ClaimComparison(String quantity, double claimed, double computed, double difference,
                              ClaimVerdict verdict) {
}

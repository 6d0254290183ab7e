package dev.countercheck.review;

import java.util.List;

/** What a check produced: its result, the findings it raised and the cautions it wants shown. */
public record CheckOutcome(CheckResult result, List<DraftFinding> findings, List<String> cautions) {
}

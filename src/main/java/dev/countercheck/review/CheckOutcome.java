package dev.countercheck.review;

import java.util.List;

/**
 * What a check produced: its result, the findings it raised, the cautions it wants shown and the
 * critical sections it placed (for the drawing, which draws them where the check put them).
 */
public record CheckOutcome(CheckResult result, List<DraftFinding> findings, List<String> cautions,
                           List<Drawing.SectionLine> sections) {
}

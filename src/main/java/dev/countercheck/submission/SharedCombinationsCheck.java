package dev.countercheck.submission;

import dev.countercheck.submission.CheckCatalogue.CheckSpec;
import dev.countercheck.submission.CheckCatalogue.Kind;

import java.util.List;

import static dev.countercheck.submission.CheckCatalogue.capacity;
import static dev.countercheck.submission.CheckCatalogue.demand;

/**
 * The {@code combinations} check that every element type taking characteristic {@code loads} lists first in its
 * catalogue: declared once here.
 */
final class SharedCombinationsCheck {

    static final CheckSpec COMBINATIONS = new CheckSpec("combinations",
            "Combinations of actions from the characteristic loads", "EN 1990 6.4.3, 6.5.3, Annex A1", Kind.STRENGTH,
            List.of(demand("cases_generated", "-"), capacity("cases_given", "-"), demand("worst_increase", "-")));

    private SharedCombinationsCheck() {
    }
}

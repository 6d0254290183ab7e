package dev.countercheck.element.pilecap;

import dev.countercheck.review.CheckBuilder;
import dev.countercheck.submission.PileCapChecks;

/** Shared starting point of the pile-cap checks. */
final class Checks {

    private Checks() {
    }

    static CheckBuilder builder(String checkId) {
        return new CheckBuilder(PileCapChecks.CATALOGUE.check(checkId));
    }
}

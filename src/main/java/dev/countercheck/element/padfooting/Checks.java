package dev.countercheck.element.padfooting;

import dev.countercheck.review.CheckBuilder;
import dev.countercheck.submission.PadFootingChecks;

/** Shared starting point of the pad-footing checks. */
final class Checks {

    private Checks() {
    }

    static CheckBuilder builder(String checkId) {
        return new CheckBuilder(PadFootingChecks.CATALOGUE.check(checkId));
    }
}

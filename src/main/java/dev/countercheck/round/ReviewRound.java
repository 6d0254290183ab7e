package dev.countercheck.round;

import dev.countercheck.responses.Responses;
import dev.countercheck.revision.RevisionComparison;

import java.util.Optional;

/**
 * What a review round adds to a review for its report: who signs it, the designer's responses to the
 * findings, and the comparison with the previous revision.
 *
 * @param outOfScope what the tool does not review at all (element types, the piles' own resistance), in words
 */
public record ReviewRound(SignOff signOff, Responses responses, Optional<RevisionComparison> revision,
                          String outOfScope) {

    public static ReviewRound none(String outOfScope) {
        return new ReviewRound(SignOff.none(), Responses.none(), Optional.empty(), outOfScope);
    }
}

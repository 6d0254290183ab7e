package dev.countercheck.round;

import java.util.Optional;

/**
 * Who checked the submission and under which reference, for the report's sign-off page.
 *
 * @param checker   the checking engineer's name
 * @param reviewRef the checker's own reference for this review
 */
public record SignOff(Optional<String> checker, Optional<String> reviewRef) {

    public static SignOff none() {
        return new SignOff(Optional.empty(), Optional.empty());
    }

    /** This sign-off with each value {@code other} states taking the place of this one's. */
    public SignOff overriddenBy(SignOff other) {
        return new SignOff(other.checker.or(() -> checker), other.reviewRef.or(() -> reviewRef));
    }
}

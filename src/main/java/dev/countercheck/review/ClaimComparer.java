package dev.countercheck.review;

import dev.countercheck.submission.CheckCatalogue.CheckSpec;
import dev.countercheck.submission.CheckCatalogue.QuantitySpec;
import dev.countercheck.submission.CheckCatalogue.SafeSide;
import dev.countercheck.submission.Claim;

/**
 * Compares one claimed value with the recomputed one (docs/results.md, docs/pile-cap.md).
 * The tolerance is inclusive: |claimed − computed| ≤ tolerance·|computed| agrees.
 */
public final class ClaimComparer {

    private final double tolerance;

    /** @param tolerance relative tolerance, e.g. 0.02 for ±2 %, from the ruleset */
    public ClaimComparer(double tolerance) {
        this.tolerance = tolerance;
    }

    /**
     * The comparison of {@code claim} with {@code computed}. When the computed value is zero the
     * relative difference is undefined: it is reported as 0 when the claim is also zero and as ±1
     * (±100 %) otherwise.
     */
    public ClaimComparison compare(Claim claim, double computed, SafeSide side) {
        double diff = computed == 0.0
                ? Math.signum(claim.value())
                : (claim.value() - computed) / Math.abs(computed);
        ClaimVerdict verdict;
        if (Math.abs(claim.value() - computed) <= tolerance * Math.abs(computed) + 1e-9) {
            verdict = ClaimVerdict.AGREES;
        } else {
            boolean claimedLarger = claim.value() > computed;
            boolean unsafe = side == SafeSide.CAPACITY ? claimedLarger : !claimedLarger;
            verdict = unsafe ? ClaimVerdict.DIFFERS_UNCONSERVATIVE : ClaimVerdict.DIFFERS_CONSERVATIVE;
        }
        return new ClaimComparison(claim.quantity(), claim.value(), computed, diff, verdict);
    }

    /** The slug of every finding about a claim of {@code quantity}: {@code claim-} and the quantity's name. */
    public static String slug(String quantity) {
        return "claim-" + Slugs.of(quantity);
    }

    /**
     * The finding a disagreeing claim raises, or none when it agrees: unconservative or conservative, each
     * with the severity the ruleset gives that kind (whether the check itself passes does not matter: a
     * failing check raises its own finding).
     */
    public java.util.Optional<DraftFinding> findingFor(ClaimComparison c, CheckSpec check, QuantitySpec q) {
        if (c.verdict() == ClaimVerdict.AGREES) {
            return java.util.Optional.empty();
        }
        boolean unsafe = c.verdict() == ClaimVerdict.DIFFERS_UNCONSERVATIVE;
        String percent = String.format(java.util.Locale.ROOT, "%.1f %%", Math.abs(c.difference()) * 100);
        String direction = c.claimed() > c.computed() ? "above" : "below";
        String message = "Claimed " + check.id() + "." + q.name() + " = " + CheckBuilder.show(c.claimed(), q.unit())
                + " is " + percent + " " + direction + " the recomputed " + CheckBuilder.show(c.computed(), q.unit())
                + (unsafe ? " (unconservative)." : " (conservative).");
        return java.util.Optional.of(new DraftFinding(slug(q.name()),
                unsafe ? FindingKind.CLAIM_UNCONSERVATIVE : FindingKind.CLAIM_CONSERVATIVE,
                java.util.Optional.empty(), check.id(), message, check.basis()));
    }
}

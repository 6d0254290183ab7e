package dev.countercheck.review;

import dev.countercheck.submission.CheckCatalogue.CheckSpec;
import dev.countercheck.submission.CheckCatalogue.QuantitySpec;
import dev.countercheck.submission.CheckCatalogue.SafeSide;
import dev.countercheck.submission.Claim;

import java.util.Map;

/**
 * Compares one claimed value with the recomputed one (docs/results.md, docs/pile-cap.md).
 * The tolerance is inclusive: |claimed − computed| ≤ max(rel·|computed|, abs) agrees, abs the floor
 * of the quantity's unit (1 kN, 1 kNm, 1 mm, ...: pile-cap-method.md, Revision 2 item 13), so that a
 * claim of a value near zero is not judged by a share of almost nothing.
 */
public final class ClaimComparer {

    private final double tolerance;
    private final Map<String, Double> floors;

    /**
     * @param tolerance relative tolerance, e.g. 0.02 for ±2 %, from the ruleset
     * @param floors    the absolute tolerance by catalogue unit ({@code kN} → 1), from the ruleset; a unit
     *                  without one has the relative tolerance only
     */
    public ClaimComparer(double tolerance, Map<String, Double> floors) {
        this.tolerance = tolerance;
        this.floors = Map.copyOf(floors);
    }

    /** The tolerance a claim of {@code computed} in {@code unit} has: max(rel·|computed|, abs). */
    public double allowance(double computed, String unit) {
        return Math.max(tolerance * Math.abs(computed), floors.getOrDefault(unit, 0.0));
    }

    /**
     * The comparison of {@code claim} with {@code computed}. When the computed value is zero the
     * relative difference is undefined: it is reported as 0 when the claim is also zero and as ±1
     * (±100 %) otherwise.
     */
    public ClaimComparison compare(Claim claim, double computed, QuantitySpec q) {
        double diff = computed == 0.0
                ? Math.signum(claim.value())
                : (claim.value() - computed) / Math.abs(computed);
        SafeSide side = q.safeSide();
        ClaimVerdict verdict;
        if (Math.abs(claim.value() - computed) <= allowance(computed, q.unit()) + 1e-9) {
            verdict = ClaimVerdict.AGREES;
        } else {
            boolean claimedLarger = claim.value() > computed;
            boolean unsafe = side == SafeSide.CAPACITY ? claimedLarger : !claimedLarger;
            verdict = unsafe ? ClaimVerdict.DIFFERS_UNCONSERVATIVE : ClaimVerdict.DIFFERS_CONSERVATIVE;
        }
        return new ClaimComparison(claim.quantity(), claim.value(), computed, diff, verdict);
    }

    /** How the tolerance of a claim in {@code unit} is formed, for the finding: "the larger of 2 % and 10 mm2". */
    private String toleranceRule(String unit) {
        String relative = dev.countercheck.eurocode.Num.f(tolerance * 100) + " %";
        Double floor = floors.get(unit);
        return floor == null || floor <= 0 ? relative + " of the recomputed value"
                : "the larger of " + relative + " of the recomputed value and " + CheckBuilder.show(floor, unit);
    }

    /**
     * v ≥ 0 to one decimal as {@code String.format(Locale.ROOT, "%.1f", v)} writes it (half up on the digits of
     * {@code Double.toString}), without a Formatter per finding.
     */
    static String oneDecimal(double v) {
        if (!Double.isFinite(v)) {
            return String.format(java.util.Locale.ROOT, "%.1f", v);
        }
        return new java.math.BigDecimal(Double.toString(v)).setScale(1, java.math.RoundingMode.HALF_UP).toPlainString();
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
        String percent = oneDecimal(Math.abs(c.difference()) * 100) + " %";
        String direction = c.claimed() > c.computed() ? "above" : "below";
        String message = "Claimed " + check.id() + "." + q.name() + " = " + CheckBuilder.show(c.claimed(), q.unit())
                + " is " + percent + " " + direction + " the recomputed " + CheckBuilder.show(c.computed(), q.unit())
                + ", beyond the tolerance of ±" + CheckBuilder.show(allowance(c.computed(), q.unit()), q.unit())
                + " (" + toleranceRule(q.unit()) + ")" + (unsafe ? " (unconservative)." : " (conservative).");
        return java.util.Optional.of(new DraftFinding(slug(q.name()),
                unsafe ? FindingKind.CLAIM_UNCONSERVATIVE : FindingKind.CLAIM_CONSERVATIVE,
                java.util.Optional.empty(), check.id(), message, check.basis()));
    }
}

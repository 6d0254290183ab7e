package dev.countercheck.element.pilecap;

import dev.countercheck.eurocode.Num;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.PileCap;

import java.util.List;

/**
 * Axial forces too small to be meant in kN: a number such as {@code N: 10.4} on a cap whose piles
 * resist 1500 kN each was most likely written in MN without its unit. The review cannot know, so
 * it says so as a note and reviews the number as written (kN).
 */
final class ForcePlausibility {

    /**
     * Read as MN, the force would lie within this multiple of the pile group's compression
     * resistance; read as kN, it is then at most this multiple/1000 of it (common practice for a
     * units slip: a factor of 1000 between the two readings).
     */
    private static final double PLAUSIBLE_GROUP_MULTIPLE = 2.0;

    private ForcePlausibility() {
    }

    /** An action case whose N looks like MN, and what to tell the designer about it. */
    record Slip(String caseName, String message) {
    }

    /** One slip per action case whose N looks like MN; empty when every N is plausible in kN. */
    static List<Slip> meganewtonSlips(PileCap cap) {
        double group = cap.piles().positions().size() * cap.piles().compressionKn();
        return cap.actions().stream()
                .filter(a -> a.nKn() > 0 && a.nKn() * 1000 <= PLAUSIBLE_GROUP_MULTIPLE * group)
                .map(a -> new Slip(a.name(), message(a, group))).toList();
    }

    private static String message(ActionCase a, double group) {
        return "N = " + Num.f(a.nKn()) + " kN in " + a.name() + " is implausibly small for piles that resist "
                + Num.f(group) + " kN together; if it was meant in MN, write the unit (\"" + Num.f(a.nKn())
                + " MN\"). It was reviewed as " + Num.f(a.nKn()) + " kN.";
    }
}

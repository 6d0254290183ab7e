package dev.countercheck.revision;

import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;

import java.util.ArrayList;
import java.util.List;

/** A finding as one revision's review states it: what a later revision is compared with, by id. */
public record FindingSnapshot(String id, String element, String severity, String message) {

    /** Every finding of {@code review}, in its order. */
    public static List<FindingSnapshot> of(Review review) {
        List<FindingSnapshot> out = new ArrayList<>();
        for (ElementReview e : review.elements()) {
            for (Finding f : e.findings()) {
                out.add(new FindingSnapshot(f.id(), e.id(), f.severity().label(), f.message()));
            }
        }
        return out;
    }
}

package dev.countercheck.responses;

import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * The designer's responses matched to this review's findings by id.
 *
 * @param byFinding the response to each finding that has one
 * @param orphans   responses whose finding id this review no longer raises (closed or renamed), in sheet order
 */
public record Responses(Map<String, Response> byFinding, List<Response> orphans) {

    public static Responses none() {
        return new Responses(Map.of(), List.of());
    }

    public static Responses match(Review review, List<Response> responses) {
        Set<String> ids = review.elements().stream().flatMap(e -> e.findings().stream()).map(Finding::id)
                .collect(Collectors.toSet());
        Map<String, Response> byFinding = new LinkedHashMap<>();
        List<Response> orphans = new ArrayList<>();
        for (Response r : responses) {
            if (ids.contains(r.findingId())) {
                byFinding.put(r.findingId(), r);
            } else {
                orphans.add(r);
            }
        }
        return new Responses(Map.copyOf(byFinding), List.copyOf(orphans));
    }

    public Optional<Response> to(String findingId) {
        return Optional.ofNullable(byFinding.get(findingId));
    }
}

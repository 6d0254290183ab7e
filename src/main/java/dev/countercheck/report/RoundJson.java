package dev.countercheck.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.countercheck.responses.Response;
import dev.countercheck.responses.Responses;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import dev.countercheck.revision.FindingChange;
import dev.countercheck.revision.FindingSnapshot;
import dev.countercheck.revision.RevisionComparison;
import dev.countercheck.round.ReviewRound;

/**
 * What a review round adds to the JSON result ({@code docs/results.md}, "The round"): the designer's
 * responses (with {@code --responses}) and the comparison with the previous revision (with
 * {@code --previous}). Each key is written only when its part of the round was given, so a result
 * without a round is unchanged.
 */
final class RoundJson {

    private RoundJson() {
    }

    static void add(ObjectNode root, Review review, ReviewRound round) {
        Responses responses = round.responses();
        if (!responses.byFinding().isEmpty() || !responses.orphans().isEmpty()) {
            ObjectNode node = root.putObject("responses");
            ArrayNode answered = node.putArray("answered");
            for (ElementReview e : review.elements()) {
                for (Finding f : e.findings()) {
                    responses.to(f.id()).ifPresent(r -> answered.add(response(answered.objectNode(), r)));
                }
            }
            ArrayNode orphans = node.putArray("unmatched");
            responses.orphans().forEach(r -> orphans.add(response(orphans.objectNode(), r).put("where", r.where())));
        }
        round.revision().ifPresent(revision -> root.set("revision", revision(root.objectNode(), revision)));
    }

    private static ObjectNode response(ObjectNode node, Response response) {
        node.put("finding", response.findingId());
        response.status().ifPresent(s -> node.put("status", s.label()));
        node.put("response", response.text());
        return node;
    }

    private static ObjectNode revision(ObjectNode node, RevisionComparison revision) {
        node.put("previous", revision.previous());
        ObjectNode counts = node.putObject("counts");
        revision.counts().forEach((change, n) -> counts.put(change.label(), n));
        ArrayNode findings = node.putArray("findings");
        for (RevisionComparison.Entry entry : revision.entries()) {
            ObjectNode f = findings.addObject();
            f.put("id", entry.id());
            f.put("element", entry.latest().element());
            f.put("change", entry.change().label());
            if (entry.change() == FindingChange.CHANGED || entry.change() == FindingChange.CLOSED) {
                snapshot(f.putObject("before"), entry.before().orElseThrow());
            }
            entry.after().ifPresent(now -> snapshot(f.putObject("now"), now));
        }
        return node;
    }

    private static void snapshot(ObjectNode node, FindingSnapshot finding) {
        node.put("severity", finding.severity());
        node.put("message", finding.message());
    }
}

package dev.countercheck.export;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;
import dev.countercheck.review.Verdict;
import dev.countercheck.revision.RevisionComparison;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * The console summary of one reviewed submission as one line of JSON (for {@code --format json}): the
 * verdict, the counts, the comparison with the previous revision and the files written. One line per
 * submission, so that a batch reads as JSON Lines.
 */
public final class ConsoleJson {

    private static final ObjectMapper JSON = new ObjectMapper();

    private ConsoleJson() {
    }

    public static String line(Path file, Review review, Optional<RevisionComparison> revision, List<Path> written) {
        ObjectNode root = JSON.createObjectNode();
        root.put("file", file.toString());
        root.put("verdict", review.verdict().label());
        root.put("elements", review.summary().elements());
        ObjectNode verdicts = root.putObject("element_verdicts");
        for (Verdict v : Verdict.values()) {
            verdicts.put(v.label(), review.summary().verdicts().getOrDefault(v, 0));
        }
        ObjectNode findings = root.putObject("findings");
        for (Severity s : Severity.values()) {
            findings.put(s.label(), review.summary().findings().getOrDefault(s, 0));
        }
        revision.ifPresent(r -> {
            ObjectNode node = root.putObject("revision");
            node.put("previous", r.previous());
            r.counts().forEach((c, n) -> node.put(c.label(), n));
        });
        ArrayNode files = root.putArray("files");
        written.forEach(p -> files.add(p.toString()));
        try {
            return JSON.writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("the summary could not be written", e);
        }
    }
}

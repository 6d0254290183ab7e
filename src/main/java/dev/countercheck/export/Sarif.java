package dev.countercheck.export;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;

import java.util.Map;
import java.util.TreeMap;

/**
 * The findings as SARIF 2.1.0, the static-analysis result format that code-review and QA tools read:
 * one rule per check, one result per finding with its stable id as fingerprint, the submission file as
 * its location and the element as its logical location. critical and major are errors, minor warnings,
 * notes notes.
 */
public final class Sarif {

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private Sarif() {
    }

    public static String write(Review review) {
        ObjectNode root = JSON.createObjectNode();
        root.put("$schema", "https://json.schemastore.org/sarif-2.1.0.json");
        root.put("version", "2.1.0");
        ObjectNode run = root.putArray("runs").addObject();
        ObjectNode driver = run.putObject("tool").putObject("driver");
        driver.put("name", review.tool().name());
        driver.put("version", review.tool().version());
        Map<String, String> rules = new TreeMap<>();
        for (ElementReview e : review.elements()) {
            e.checks().forEach(c -> rules.putIfAbsent(c.id(), c.title() + " (" + c.basis() + ")"));
            e.findings().forEach(f -> rules.putIfAbsent(f.check(), f.check() + " (" + f.basis() + ")"));
        }
        ArrayNode ruleNodes = driver.putArray("rules");
        rules.forEach((id, text) -> {
            ObjectNode r = ruleNodes.addObject();
            r.put("id", id);
            r.putObject("shortDescription").put("text", text);
        });
        ArrayNode results = run.putArray("results");
        for (ElementReview e : review.elements()) {
            for (Finding f : e.findings()) {
                ObjectNode r = results.addObject();
                r.put("ruleId", f.check());
                r.put("level", level(f.severity()));
                r.putObject("message").put("text", f.withBasis());
                ObjectNode location = r.putArray("locations").addObject();
                location.putObject("physicalLocation").putObject("artifactLocation")
                        .put("uri", review.submission().file().replace('\\', '/'));
                location.putArray("logicalLocations").addObject().put("name", e.id()).put("kind", "object");
                r.putObject("partialFingerprints").put("findingId", f.id());
                ObjectNode properties = r.putObject("properties");
                properties.put("findingId", f.id());
                properties.put("severity", f.severity().label());
                properties.put("element", e.id());
                e.checks().stream().filter(c -> c.id().equals(f.check())).findFirst()
                        .ifPresent(c -> properties.put("checkStatus", c.status().label()));
            }
        }
        try {
            return JSON.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("the SARIF tree could not be written", e);
        }
    }

    private static String level(Severity s) {
        return switch (s) {
            case CRITICAL, MAJOR -> "error";
            case MINOR -> "warning";
            case NOTE -> "note";
        };
    }
}

package dev.countercheck.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import java.util.TreeSet;

import static dev.countercheck.cli.SampleSubmissionsTest.run;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * Overriding one parameter in a house ruleset changes exactly the checks that use it: two reviews
 * of the same sample, one with the recommended values and one with k2 of 8.2(2) raised, differ only
 * in the bar-spacing checks.
 */
class ParameterOverrideTest {

    @Test
    void raisingTheClearSpacingAllowanceChangesOnlyTheSpacingChecks(@TempDir Path dir) throws IOException {
        Path house = dir.resolve("wider-gaps.yaml");
        Files.writeString(house, """
                ruleset: 1
                id: wider-gaps
                extends: en1992-recommended
                title: Test house rules with a larger clear-spacing allowance
                parameters:
                  spacing_k2: {value: 30, clause: "test house rule"}
                """);
        Path base = dir.resolve("base");
        Path changed = dir.resolve("changed");
        String sample = "sample-submissions/harbour-lane.yaml";
        run("review", sample, "--out", base.toString(), "--date", "2026-12-01", "--ruleset", "en1992-recommended");
        run("review", sample, "--out", changed.toString(), "--date", "2026-12-01", "--ruleset", house.toString());
        ObjectMapper json = new ObjectMapper();
        JsonNode a = json.readTree(base.resolve("harbour-lane.json").toFile());
        JsonNode b = json.readTree(changed.resolve("harbour-lane.json").toFile());
        Set<String> differing = new TreeSet<>();
        for (int e = 0; e < a.get("elements").size(); e++) {
            JsonNode checksA = a.get("elements").get(e).get("checks");
            JsonNode checksB = b.get("elements").get(e).get("checks");
            for (int c = 0; c < checksA.size(); c++) {
                JsonNode x = checksA.get(c);
                JsonNode y = checksB.get(c);
                if (!x.get("values").equals(y.get("values")) || !x.get("status").equals(y.get("status"))) {
                    differing.add(x.get("id").asText());
                }
            }
        }
        assertThat(differing).containsExactly("bar-spacing-x", "bar-spacing-y");
    }
}

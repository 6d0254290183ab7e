package dev.countercheck.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import org.dhatim.fastexcel.Workbook;
import org.dhatim.fastexcel.Worksheet;
import org.dhatim.fastexcel.reader.ReadableWorkbook;
import org.dhatim.fastexcel.reader.Row;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.NodeList;

import javax.xml.parsers.DocumentBuilderFactory;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static dev.countercheck.cli.SampleSubmissionsTest.run;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * One review round end to end: issue P01, take the designer's filled-in sheet, review P02 against P01,
 * compare the two results, and the files a pipeline reads.
 */
class ReviewRoundCliTest {

    private static final ObjectMapper YAML = new ObjectMapper(new YAMLFactory());
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Path SAMPLE = Path.of("sample-submissions/harbour-lane.yaml");

    /** A claim of the P01 result: where it is and what it says. */
    record ClaimAt(String element, String check, String quantity, double claimed, double computed, String verdict) {
        String findingId() {
            return element + "/" + check + "/claim-" + quantity.replace('_', '-');
        }
    }

    @Test
    void aSecondRevisionClosesKeepsChangesAndRaisesFindingsCountedByStableId(@TempDir Path dir) throws IOException {
        ObjectNode p01 = (ObjectNode) YAML.readTree(SAMPLE.toFile());
        ((ObjectNode) p01.get("project")).put("revision", "P01");
        Path p01File = write(dir.resolve("p01.json"), p01);
        assertThat(run("review", p01File.toString(), "--out", dir.resolve("r1").toString(), "--date", "2026-12-01")
                .err()).doesNotContain("internal error");
        JsonNode result = JSON.readTree(dir.resolve("r1/p01.json").toFile());
        List<ClaimAt> claims = claims(result);
        List<ClaimAt> disagreeing = claims.stream().filter(c -> !c.verdict().equals("agrees") && c.claimed() != 0)
                .toList();
        ClaimAt agreeing = claims.stream().filter(c -> c.verdict().equals("agrees") && c.computed() != 0)
                .findFirst().orElseThrow();
        assertThat(disagreeing).as("the sample has two claims to work on").hasSizeGreaterThanOrEqualTo(2);
        int before = result.path("elements").findValues("findings").stream().mapToInt(JsonNode::size).sum();

        ObjectNode p02 = p01.deepCopy();
        ((ObjectNode) p02.get("project")).put("revision", "P02");
        setClaim(p02, disagreeing.get(0), disagreeing.get(0).computed());        // fixed: closed
        setClaim(p02, disagreeing.get(1), disagreeing.get(1).claimed() * 0.5);   // other value: changed
        setClaim(p02, agreeing, agreeing.computed() * 0.5);                      // now wrong: new
        Path p02File = write(dir.resolve("p02.json"), p02);
        SampleSubmissionsTest.Run second = run("review", p02File.toString(), "--out", dir.resolve("r2").toString(),
                "--date", "2026-12-08", "--previous", dir.resolve("r1/p01.json").toString());

        String counts = "closed 1, still-open " + (before - 2) + ", changed 1, new 1";
        assertThat(second.out()).contains("against P01: " + counts);
        Document html = Jsoup.parse(dir.resolve("r2/p02.html").toFile(), "UTF-8");
        Element revision = html.selectFirst("header.cover #revision");
        assertThat(revision).as("the revision section is on page one").isNotNull();
        assertThat(revision.select("tr").eachText()).containsExactly("closed 1", "still-open " + (before - 2),
                "changed 1", "new 1");
        assertThat(html.select("#closed + table td:first-child").eachText())
                .containsExactly(disagreeing.get(0).findingId().replace("\u200b", ""));
        assertThat(changeOf(html, disagreeing.get(1).findingId())).isEqualTo("changed");
        assertThat(changeOf(html, agreeing.findingId())).isEqualTo("new");

        JsonNode revised = JSON.readTree(dir.resolve("r2/p02.json").toFile()).path("revision");
        assertThat(revised.path("previous").asText()).isEqualTo("P01");
        assertThat(revised.path("counts").toString()).isEqualTo("{\"closed\":1,\"still-open\":" + (before - 2)
                + ",\"changed\":1,\"new\":1}");
        Map<String, JsonNode> byId = new HashMap<>();
        revised.path("findings").forEach(f -> byId.put(f.path("id").asText(), f));
        JsonNode closed = byId.get(disagreeing.get(0).findingId().replace("\u200b", ""));
        assertThat(closed.path("change").asText()).isEqualTo("closed");
        assertThat(closed.has("before")).isTrue();
        assertThat(closed.has("now")).as("a closed finding no longer stands").isFalse();
        JsonNode changed = byId.get(disagreeing.get(1).findingId().replace("\u200b", ""));
        assertThat(changed.path("change").asText()).isEqualTo("changed");
        assertThat(changed.path("before").path("message").asText())
                .isNotEqualTo(changed.path("now").path("message").asText());
        assertThat(byId.get(agreeing.findingId().replace("\u200b", "")).path("change").asText()).isEqualTo("new");
        assertThat(JSON.readTree(dir.resolve("r1/p01.json").toFile()).has("revision"))
                .as("a review without --previous has no revision part").isFalse();

        SampleSubmissionsTest.Run compare = run("compare", dir.resolve("r1/p01.json").toString(),
                dir.resolve("r2/p02.json").toString());
        assertThat(compare.exit()).isEqualTo(ExitCodes.OK);
        assertThat(compare.out()).contains("P01 -> P02: " + counts)
                .containsPattern("closed +" + disagreeing.get(0).findingId().replace("+", "\\+"));
    }

    @Test
    void theDesignersResponsesStandBesideTheirFindingsAndOrphansAreWarnedAbout(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("r1");
        run("review", SAMPLE.toString(), "--out", out.toString(), "--date", "2026-12-01");
        List<List<String>> rows = new ArrayList<>();
        try (ReadableWorkbook wb = new ReadableWorkbook(out.resolve("harbour-lane.responses.xlsx").toFile())) {
            for (Row row : wb.getFirstSheet().read()) {
                List<String> cells = new ArrayList<>();
                for (int c = 0; c < 7; c++) {
                    cells.add(row.getCellAsString(c).orElse(""));
                }
                rows.add(cells);
            }
        }
        String answer = "Agreed, the \"av\" floor was missed;\nrevised in P02 — Überarbeitet ✓";
        rows.get(1).set(5, answer);
        rows.get(1).set(6, "agreed");
        rows.add(List.of("PC-Z9/tie-x/capacity", "", "", "", "", "an answer to nothing", "disputed"));
        Path sheet = dir.resolve("filled.xlsx");
        try (OutputStream os = Files.newOutputStream(sheet)) {
            Workbook wb = new Workbook(os, "a designer's spreadsheet", "1.0");
            Worksheet ws = wb.newWorksheet("Sheet1");
            for (int r = 0; r < rows.size(); r++) {
                for (int c = 0; c < rows.get(r).size(); c++) {
                    ws.value(r, c, rows.get(r).get(c));
                }
            }
            wb.finish();
        }
        SampleSubmissionsTest.Run second = run("review", SAMPLE.toString(), "--out", dir.resolve("r2").toString(),
                "--date", "2026-12-01", "--responses", sheet.toString());
        assertThat(second.err()).contains(sheet + " Sheet1!A" + rows.size() + ": warning: a response to"
                + " PC-Z9/tie-x/capacity");
        Document html = Jsoup.parse(dir.resolve("r2/harbour-lane.html").toFile(), "UTF-8");
        Element row = html.select("table.register-table tbody tr").stream()
                .filter(tr -> tr.child(0).text().replace("\u200b", "").equals(rows.get(1).get(0))).findFirst()
                .orElseThrow();
        assertThat(row.selectFirst("td.response").wholeText()).contains("agreed").contains(answer);
        assertThat(html.select("table.orphan-table td").eachText()).anyMatch(t -> t.contains("an answer to nothing"));

        JsonNode responses = JSON.readTree(dir.resolve("r2/harbour-lane.json").toFile()).path("responses");
        assertThat(responses.path("answered")).hasSize(1);
        JsonNode answered = responses.path("answered").get(0);
        assertThat(answered.path("finding").asText()).isEqualTo(rows.get(1).get(0));
        assertThat(answered.path("status").asText()).isEqualTo("agreed");
        assertThat(answered.path("response").asText()).as("kept whole: quotes, line break, non-ASCII").isEqualTo(answer);
        JsonNode unmatched = responses.path("unmatched").get(0);
        assertThat(unmatched.path("finding").asText()).isEqualTo("PC-Z9/tie-x/capacity");
        assertThat(unmatched.path("where").asText()).endsWith("Sheet1!A" + rows.size());
        assertThat(JSON.readTree(out.resolve("harbour-lane.json").toFile()).has("responses"))
                .as("a review without --responses has no responses part").isFalse();
    }

    @Test
    void anUnusableSheetStopsTheReviewBeforeAnyFileIsWritten(@TempDir Path dir) throws IOException {
        Path sheet = dir.resolve("filled.csv");
        Files.writeString(sheet, "id,response,status\nPC-A1/tie-x/capacity,ok,agred\n", StandardCharsets.UTF_8);
        Path out = dir.resolve("out");
        SampleSubmissionsTest.Run r = run("review", SAMPLE.toString(), "--out", out.toString(), "--responses",
                sheet.toString());
        assertThat(r.exit()).isEqualTo(ExitCodes.UNUSABLE);
        // "PC-A1/tie-x/capacity,ok," is 24 characters: the status starts in column 25.
        assertThat(r.err()).contains(sheet + ":2:25 (C2): status 'agred' is not one of agreed, disputed, will-revise");
        assertThat(out).doesNotExist();
    }

    @Test
    void theSignOffComesFromTheProjectFolderAndTheCommandLineWins(@TempDir Path dir) throws IOException {
        Path project = Files.createDirectories(dir.resolve("project"));
        Files.copy(SAMPLE, project.resolve("harbour-lane.yaml"));
        Files.writeString(project.resolve("countercheck-review.yaml"), "checker: Ines Varga\nreview_ref: CR-0412\n");
        run("review", project.resolve("harbour-lane.yaml").toString(), "--out", dir.resolve("a").toString());
        run("review", project.resolve("harbour-lane.yaml").toString(), "--out", dir.resolve("b").toString(),
                "--checker", "Tomas Lind");
        Document a = Jsoup.parse(dir.resolve("a/harbour-lane.html").toFile(), "UTF-8");
        Document b = Jsoup.parse(dir.resolve("b/harbour-lane.html").toFile(), "UTF-8");
        assertThat(checkedBy(a)).isEqualTo("Ines Varga");
        assertThat(checkedBy(b)).isEqualTo("Tomas Lind");
        assertThat(b.select("table.facts tr").eachText()).contains("Review reference CR-0412");
        Files.writeString(project.resolve("countercheck-review.yaml"), "checkr: Ines Varga\n");
        SampleSubmissionsTest.Run bad = run("review", project.resolve("harbour-lane.yaml").toString(), "--out",
                dir.resolve("c").toString());
        assertThat(bad.exit()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(bad.err()).contains("countercheck-review.yaml:1:1").contains("did you mean 'checker'");
    }

    @Test
    void pipelinesGetJunitSarifAndAJsonSummary(@TempDir Path dir) throws Exception {
        SampleSubmissionsTest.Run r = run("review", SAMPLE.toString(), "--out", dir.toString(), "--date",
                "2026-12-01", "--junit", "--sarif", "--format", "json");
        JsonNode summary = JSON.readTree(r.out().strip());
        JsonNode result = JSON.readTree(dir.resolve("harbour-lane.json").toFile());
        List<JsonNode> findings = result.path("elements").findValues("findings").stream()
                .flatMap(f -> iterable(f).stream()).toList();
        assertThat(summary.path("verdict").asText()).isEqualTo(result.path("verdict").asText());
        assertThat(summary.path("files")).hasSize(6);

        JsonNode sarif = JSON.readTree(dir.resolve("harbour-lane.sarif").toFile());
        assertThat(sarif.path("version").asText()).isEqualTo("2.1.0");
        assertThat(sarif.path("runs").get(0).path("results").findValuesAsText("findingId"))
                .containsAll(findings.stream().map(f -> f.path("id").asText()).toList());

        var xml = DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(dir.resolve("harbour-lane.junit.xml").toFile());
        NodeList failures = xml.getElementsByTagName("failure");
        long failingChecks = result.path("elements").findValues("checks").stream()
                .flatMap(c -> iterable(c).stream())
                .filter(c -> c.path("status").asText().equals("fail")).count();
        // Every failing check raised a critical finding in this sample, and only those gate at --fail-on critical.
        assertThat(failures.getLength()).isEqualTo((int) failingChecks);
        assertThat(xml.getDocumentElement().getAttribute("failures")).isEqualTo(String.valueOf(failingChecks));
    }

    private static List<JsonNode> iterable(JsonNode array) {
        List<JsonNode> out = new ArrayList<>();
        array.forEach(out::add);
        return out;
    }

    private static String checkedBy(Document html) {
        return html.select("table.signoff tr").stream().filter(tr -> tr.text().startsWith("Checked by"))
                .findFirst().orElseThrow().child(1).text();
    }

    private static String changeOf(Document html, String findingId) {
        Element row = html.select("table.register-table tbody tr").stream()
                .filter(tr -> tr.child(0).text().replace("\u200b", "").equals(findingId)).findFirst()
                .orElseThrow(() -> new AssertionError("no register row " + findingId));
        return row.child(5).text();
    }

    private static List<ClaimAt> claims(JsonNode result) {
        List<ClaimAt> out = new ArrayList<>();
        for (JsonNode e : result.path("elements")) {
            for (JsonNode c : e.path("checks")) {
                for (JsonNode claim : c.path("claims")) {
                    out.add(new ClaimAt(e.path("id").asText(), c.path("id").asText(), claim.path("quantity").asText(),
                            claim.path("claimed").asDouble(), claim.path("computed").asDouble(),
                            claim.path("verdict").asText()));
                }
            }
        }
        return out;
    }

    private static void setClaim(ObjectNode submission, ClaimAt claim, double value) {
        for (JsonNode e : submission.get("elements")) {
            if (e.get("id").asText().equals(claim.element())) {
                ((ObjectNode) e.get("claims").get(claim.check())).put(claim.quantity(), value);
            }
        }
    }

    private static Path write(Path file, JsonNode tree) throws IOException {
        Files.writeString(file, JSON.writeValueAsString(tree), StandardCharsets.UTF_8);
        return file;
    }
}

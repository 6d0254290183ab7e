package dev.countercheck.responses;

import dev.countercheck.input.UnusableInputException;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;
import dev.countercheck.review.Verdict;
import org.dhatim.fastexcel.Workbook;
import org.dhatim.fastexcel.Worksheet;
import org.dhatim.fastexcel.reader.ReadableWorkbook;
import org.dhatim.fastexcel.reader.Row;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

/**
 * The response sheet's round trip: written from a review, filled in as a designer would, read back with every
 * id and text as written, including commas, quotes, line breaks and non-ASCII text.
 */
class ResponseSheetRoundTripTest {

    /** Texts a designer might write; invented for the test. */
    private static final List<String> ANSWERS = List.of(
            "Agreed, bars increased to \"H25 @ 150\", see drawing S-101 rev B.",
            "Disputed:\nthe pile is raked 1:10,\r\nso the lever arm differs.",
            "Über die Bewehrung: ρ = 0,5 % — 配筋を確認します ✓");
    private static final List<String> STATUSES = List.of("agreed", "disputed", "will-revise");

    @Test
    void aCsvSheetKeepsEveryIdAndTextThroughWriteFillAndRead(@TempDir Path dir) throws Exception {
        Review review = review();
        String written = new String(ResponseSheet.csv(review), StandardCharsets.UTF_8);
        List<List<SheetCell>> rows = Csv.parse("written.csv", written);
        assertThat(rows.get(0)).extracting(SheetCell::text).containsExactlyElementsOf(ResponseSheet.COLUMNS);
        assertThat(rows.subList(1, rows.size())).extracting(r -> r.get(3).text())
                .containsExactlyElementsOf(messages(review));
        StringBuilder filled = new StringBuilder(Csv.line(ResponseSheet.COLUMNS));
        for (int i = 1; i < rows.size(); i++) {
            List<String> cells = new ArrayList<>(rows.get(i).stream().map(SheetCell::text).toList());
            cells.set(5, ANSWERS.get(i - 1));
            cells.set(6, STATUSES.get(i - 1));
            filled.append(Csv.line(cells));
        }
        Path sheet = dir.resolve("answers.csv");
        Files.writeString(sheet, filled, StandardCharsets.UTF_8);
        assertAnswered(ResponseSheetReader.read(sheet), review);
    }

    @Test
    void anXlsxSheetKeepsEveryIdAndTextThroughWriteFillAndRead(@TempDir Path dir) throws Exception {
        Review review = review();
        List<List<String>> rows = new ArrayList<>();
        try (ReadableWorkbook wb = new ReadableWorkbook(new ByteArrayInputStream(ResponseSheet.xlsx(review)))) {
            for (Row row : wb.findSheet(ResponseSheet.SHEET).orElseThrow().read()) {
                List<String> cells = new ArrayList<>();
                for (int c = 0; c < ResponseSheet.COLUMNS.size(); c++) {
                    cells.add(row.getCellAsString(c).orElse(""));
                }
                rows.add(cells);
            }
        }
        assertThat(rows.get(0)).containsExactlyElementsOf(ResponseSheet.COLUMNS);
        assertThat(rows.subList(1, rows.size())).extracting(r -> r.get(3)).containsExactlyElementsOf(messages(review));
        Path sheet = dir.resolve("answers.xlsx");
        try (OutputStream out = Files.newOutputStream(sheet)) {
            Workbook wb = new Workbook(out, "a designer's spreadsheet", "1.0");
            Worksheet ws = wb.newWorksheet("Sheet1");
            for (int r = 0; r < rows.size(); r++) {
                for (int c = 0; c < rows.get(r).size(); c++) {
                    String value = r > 0 && c == 5 ? ANSWERS.get(r - 1) : r > 0 && c == 6 ? STATUSES.get(r - 1)
                            : rows.get(r).get(c);
                    ws.value(r, c, value);
                }
            }
            wb.finish();
        }
        assertAnswered(ResponseSheetReader.read(sheet), review);
    }

    /**
     * The unanswered sheet of the largest project a submission may hold (20,000 elements, about five
     * findings each) is read back: a review recognises it as its own before replacing it. It was once
     * refused for its size, and a second review of such a project into the same folder stopped.
     */
    @Test
    void theSheetOfTheLargestProjectIsReadBack(@TempDir Path dir) throws Exception {
        StringBuilder sheet = new StringBuilder(Csv.line(ResponseSheet.COLUMNS));
        for (int i = 0; i < 100_000; i++) {
            sheet.append(Csv.line(List.of("E-" + i + "/tie-x/capacity", "E-" + i, "critical",
                    "Bottom x-bars give 1885 mm2, less than the 2224 mm2 the tie needs, with a message of a usual length.",
                    "EN 1992-1-1 6.5, 9.8.1(2), (3)", "", "")));
        }
        Path file = Files.writeString(dir.resolve("large.responses.csv"), sheet);
        assertThat(Files.size(file)).isGreaterThan(16L * 1024 * 1024).isLessThan(ResponseSheetReader.MAX_BYTES);

        assertThat(ResponseSheetReader.read(file)).isEmpty();
    }

    @Test
    void theWorkbookDoesNotDependOnTheClock() throws Exception {
        byte[] first = ResponseSheet.xlsx(review());
        Thread.sleep(2100); // zip entry times have a two-second resolution
        assertThat(ResponseSheet.xlsx(review())).isEqualTo(first);
    }

    @Test
    void anUnknownStatusIsLocatedAtItsCell(@TempDir Path dir) throws IOException {
        Path sheet = dir.resolve("answers.xlsx");
        try (OutputStream out = Files.newOutputStream(sheet)) {
            Workbook wb = new Workbook(out, "a designer's spreadsheet", "1.0");
            Worksheet ws = wb.newWorksheet("Sheet1");
            List<String> header = ResponseSheet.COLUMNS;
            for (int c = 0; c < header.size(); c++) {
                ws.value(0, c, header.get(c));
            }
            ws.value(6, 0, "PC-1/tie-x/capacity");
            ws.value(6, 5, "We agree.");
            ws.value(6, 6, "agred");
            wb.finish();
        }
        UnusableInputException e = catchThrowableOfType(UnusableInputException.class,
                () -> ResponseSheetReader.read(sheet));
        assertThat(e.problems()).singleElement().asString()
                .startsWith(sheet + " Sheet1!G7: status 'agred' is not one of agreed, disputed, will-revise")
                .contains("agreed");
    }

    @Test
    void anUnclosedQuoteInACsvSheetIsLocatedByLineAndColumn(@TempDir Path dir) throws IOException {
        Path sheet = dir.resolve("answers.csv");
        Files.writeString(sheet, "id,response,status\r\nPC-1/tie-x/capacity,\"We agree,agreed\r\n");
        UnusableInputException e = catchThrowableOfType(UnusableInputException.class,
                () -> ResponseSheetReader.read(sheet));
        assertThat(e.problems()).singleElement().asString().startsWith(sheet + ":2:21 (B2): the quoted field");
    }

    @Test
    void responsesWhoseFindingIsGoneAreSetApart() {
        Review review = review();
        Response kept = new Response("PC-9/tie-x/capacity", "ok", Optional.empty(), "a");
        Response gone = new Response("PC-9/tie-x/claim-force", "ok", Optional.empty(), "b");
        Responses matched = Responses.match(review, List.of(kept, gone));
        assertThat(matched.byFinding()).containsOnlyKeys("PC-9/tie-x/capacity");
        assertThat(matched.orphans()).containsExactly(gone);
    }

    private static void assertAnswered(List<Response> read, Review review) {
        assertThat(read).extracting(Response::findingId).containsExactlyElementsOf(ids(review));
        assertThat(read).extracting(Response::text).containsExactlyElementsOf(ANSWERS);
        assertThat(read).extracting(r -> r.status().orElseThrow().label()).containsExactlyElementsOf(STATUSES);
    }

    private static List<String> ids(Review review) {
        return review.elements().get(0).findings().stream().map(Finding::id).toList();
    }

    private static List<String> messages(Review review) {
        return review.elements().get(0).findings().stream().map(Finding::message).toList();
    }

    /** An invented review with three findings whose messages hold commas, quotes, a line break and non-ASCII. */
    static Review review() {
        List<Finding> findings = List.of(
                new Finding("PC-9/tie-x/capacity", Severity.CRITICAL, "tie-x",
                        "Bottom x-bars give 2,413 mm2, less than the \"required\" 2 600 mm2.", "EN 1992-1-1 6.5"),
                new Finding("PC-9/shear-y/claim-ved", Severity.MAJOR, "shear-y",
                        "Claimed VEd = 410 kN\nis 12 % below the recomputed 466 kN.", "EN 1992-1-1 6.2.2"),
                new Finding("PC-9/cover/cover-bottom", Severity.MAJOR, "cover",
                        "Cover 40 mm < cnom = 75 mm (Δcdev, φ ≥ 25 mm; 表 4.4N).", "EN 1992-1-1 4.4.1"));
        ElementReview e = new ElementReview("PC-9", "pile-cap", "invented", Verdict.DOES_NOT_CONFORM, List.of(),
                findings, List.of(), Optional.empty());
        return new Review(new Review.ToolInfo("countercheck", "test"),
                new Review.SubmissionInfo("invented.yaml", "0".repeat(64), Optional.empty(), Optional.empty(),
                        Optional.of("P01"), Optional.empty(), Optional.empty()),
                new Review.RulesetInfo("en1992-recommended", "EN 1992-1-1 recommended values", "0".repeat(64),
                        List.of()),
                "2026-12-01", Verdict.DOES_NOT_CONFORM, List.of(e),
                new Review.Summary(1, Map.of(), Map.of()), List.of());
    }
}

package dev.countercheck.revision;

import dev.countercheck.input.UnusableInputException;
import dev.countercheck.report.JsonResultWriter;
import dev.countercheck.report.ReviewFixture;
import dev.countercheck.review.Review;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** An earlier review's result, read as a stream for its findings, whatever its size. */
class ResultFileTest {

    @TempDir
    Path dir;

    @Test
    void theFindingsOfAWrittenResultAreReadInTheirOrder() throws Exception {
        Review review = ReviewFixture.review();
        Path file = Files.writeString(dir.resolve("r.json"), new JsonResultWriter().write(review));

        ResultFile result = ResultFile.read(file);

        assertThat(result.findings()).isEqualTo(FindingSnapshot.of(review));
        assertThat(result.label()).as("the fixture's submission has no revision").isEqualTo("r.json");
    }

    @Test
    void aResultLargerThanAnyOneReadCanHoldIsCompared() throws Exception {
        // Each element carries 2,000 filler checks, as a large project's checks and traces would; the file
        // passes the 64 MB that the whole-file reader refused (a 2,000-element project's result is 160 MB).
        Path file = dir.resolve("large.json");
        String filler = "{\"id\":\"x\",\"findings\":[{\"id\":\"not-an-element-finding\"}],\"trace\":\""
                + "t".repeat(400) + "\"}";
        int elements = 75;
        try (BufferedWriter w = Files.newBufferedWriter(file)) {
            w.write("{\"format\":\"" + ResultFile.FORMAT + "\",\"submission\":{\"revision\":\"P07\"},\"elements\":[");
            for (int e = 0; e < elements; e++) {
                w.write((e == 0 ? "" : ",") + "{\"checks\":[");
                for (int c = 0; c < 2_000; c++) {
                    w.write((c == 0 ? "" : ",") + filler);
                }
                w.write("],\"findings\":[{\"id\":\"F" + e + "\",\"severity\":\"major\",\"message\":\"m\"}],\"id\":\"E"
                        + e + "\"}");
            }
            w.write("]}");
        }
        assertThat(Files.size(file)).isGreaterThan(64L * 1024 * 1024);

        ResultFile result = ResultFile.read(file);

        assertThat(result.label()).isEqualTo("P07");
        assertThat(result.findings()).hasSize(elements)
                .as("the element's id is taken though it follows its findings; the checks' findings are not taken")
                .last().isEqualTo(new FindingSnapshot("F74", "E74", "major", "m"));
    }

    @Test
    void brokenJsonIsRefusedWithItsLineAndColumn() throws IOException {
        Path file = Files.writeString(dir.resolve("b.json"), "{\"format\": \"" + ResultFile.FORMAT + "\",\n \"elements\": [}");

        assertThatThrownBy(() -> ResultFile.read(file)).isInstanceOf(UnusableInputException.class)
                .hasMessageStartingWith(file + ":2:").hasMessageContaining("not JSON");
    }

    @Test
    void jsonThatIsNotAResultIsRefused() throws IOException {
        Path array = Files.writeString(dir.resolve("a.json"), "[1, 2]");
        Path other = Files.writeString(dir.resolve("o.json"), "{\"elements\": [], \"format\": \"other/1\"}");

        assertThatThrownBy(() -> ResultFile.read(array)).hasMessage(array + ": not a review result (its \"format\" is not "
                + ResultFile.FORMAT + ")");
        assertThatThrownBy(() -> ResultFile.read(other)).hasMessageContaining("not a review result");
        assertThatThrownBy(() -> ResultFile.read(dir.resolve("none.json"))).hasMessageEndingWith(": no such file");
    }
}

package dev.countercheck.cli;

import dev.countercheck.report.ReviewFixture;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The console line of a review names the part pages of a large report by their number, not one by one. */
class SummaryLineTest {

    private static final Path OUT = Path.of("out");

    @Test
    void aOnePageReportListsEveryFile() {
        String line = SummaryLine.of(Path.of("p.yaml"), ReviewFixture.review(),
                List.of(OUT.resolve("p.json"), OUT.resolve("p.html"), OUT.resolve("p.pdf")));

        assertThat(line).endsWith(" -> " + OUT.resolve("p.json") + ", " + OUT.resolve("p.html") + ", "
                + OUT.resolve("p.pdf"));
    }

    @Test
    void thePartPagesAreToldAsOneEntryAfterTheirProjectPage() {
        // 668 part pages: what the review of a 20,000-element project wrote (30 elements a part, measured with
        // the project benchmark); the line must not name them one by one.
        List<Path> written = new ArrayList<>(List.of(OUT.resolve("p.json"), OUT.resolve("p.html")));
        for (int k = 1; k <= 668; k++) {
            written.add(OUT.resolve("p.part-" + k + ".html"));
        }
        written.add(OUT.resolve("p.responses.csv"));

        String line = SummaryLine.of(Path.of("p.yaml"), ReviewFixture.review(), written);

        assertThat(line).endsWith(" -> " + OUT.resolve("p.json") + ", " + OUT.resolve("p.html")
                + " (and its 668 part pages " + OUT.resolve("p.part-1.html") + " to " + OUT.resolve("p.part-668.html")
                + "), " + OUT.resolve("p.responses.csv"));
    }

    @Test
    void oneOtherReportsPartPageIsNotTakenForOneOfThisReportsParts() {
        String line = SummaryLine.of(Path.of("p.yaml"), ReviewFixture.review(),
                List.of(OUT.resolve("p.html"), OUT.resolve("p.part-1.html"), OUT.resolve("q.part-1.html")));

        assertThat(line).endsWith(" -> " + OUT.resolve("p.html") + " (and its part page "
                + OUT.resolve("p.part-1.html") + "), " + OUT.resolve("q.part-1.html"));
    }
}

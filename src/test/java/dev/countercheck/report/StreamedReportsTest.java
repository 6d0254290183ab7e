package dev.countercheck.report;

import dev.countercheck.review.Review;
import dev.countercheck.round.ReviewRound;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The reports written straight into their files through the output set (JSON element by element,
 * HTML as the template runs, the PDF from the same HTML text) hold the very bytes the writers give
 * in memory, for every sample.
 */
class StreamedReportsTest {

    @TempDir
    Path dir;

    static List<Path> samples() {
        return SampleReviews.samples();
    }

    @ParameterizedTest
    @MethodSource("samples")
    void streamedReportsEqualTheReportsBuiltInMemory(Path sample) throws IOException {
        Review review = SampleReviews.review(sample);
        try (OutputSet set = OutputSet.in(dir)) {
            ReviewReports.addTo(set, review, ReviewRound.none(""), "r.json", "r.html", Optional.empty());
            set.commit();
        }

        assertThat(Files.readString(dir.resolve("r.json"), StandardCharsets.UTF_8))
                .isEqualTo(new JsonResultWriter().write(review));
        assertThat(Files.readString(dir.resolve("r.html"), StandardCharsets.UTF_8))
                .isEqualTo(new HtmlReportWriter().write(review));
    }

    /** One small review: laying out a PDF takes seconds, and the samples' PDFs are compared elsewhere. */
    @Test
    void withAPdfTheHtmlAndThePdfAreTheReportsBuiltInMemory() throws IOException {
        Review review = ReviewFixture.review("x");
        try (OutputSet set = OutputSet.in(dir)) {
            ReviewReports.addTo(set, review, ReviewRound.none(""), "r.json", "r.html", Optional.of("r.pdf"));
            set.commit();
        }

        assertThat(Files.readString(dir.resolve("r.html"), StandardCharsets.UTF_8))
                .isEqualTo(new HtmlReportWriter().write(review));
        assertThat(Files.readString(dir.resolve("r.json"), StandardCharsets.UTF_8))
                .isEqualTo(new JsonResultWriter().write(review));
        assertThat(Files.readAllBytes(dir.resolve("r.pdf"))).isEqualTo(new PdfReportWriter()
                .write(review, ReviewRound.none(""), "r.json", new JsonResultWriter().write(review)));
    }
}

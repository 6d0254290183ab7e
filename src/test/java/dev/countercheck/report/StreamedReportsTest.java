package dev.countercheck.report;

import dev.countercheck.review.Review;
import dev.countercheck.round.ReviewRound;
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
        Path streamed = dir.resolve("streamed");
        Path withPdf = dir.resolve("with-pdf");
        try (OutputSet set = OutputSet.in(streamed)) {
            ReviewReports.addTo(set, review, ReviewRound.none(""), "r.json", "r.html", Optional.empty());
            set.commit();
        }
        try (OutputSet set = OutputSet.in(withPdf)) {
            ReviewReports.addTo(set, review, ReviewRound.none(""), "r.json", "r.html", Optional.of("r.pdf"));
            set.commit();
        }

        String json = new JsonResultWriter().write(review);
        String html = new HtmlReportWriter().write(review);
        assertThat(Files.readString(streamed.resolve("r.json"), StandardCharsets.UTF_8)).isEqualTo(json);
        assertThat(Files.readString(streamed.resolve("r.html"), StandardCharsets.UTF_8)).isEqualTo(html);
        assertThat(Files.readString(withPdf.resolve("r.html"), StandardCharsets.UTF_8)).isEqualTo(html);
        assertThat(Files.readAllBytes(withPdf.resolve("r.pdf"))).isEqualTo(new PdfReportWriter().write(review));
    }
}

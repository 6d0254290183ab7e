package dev.countercheck.report;

import dev.countercheck.review.CheckResult;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The report puts problems first: page one lists every critical and major finding before any element
 * section, then every element with its governing utilisation as a bar; each element lists its checks
 * by utilisation, largest first, with the same bars.
 */
class ProblemsFirstTest {

    static List<Path> samples() {
        return SampleReviews.samples();
    }

    @ParameterizedTest
    @MethodSource("samples")
    void pageOneListsEveryCriticalAndMajorFindingBeforeAnyElement(Path sample) {
        Review review = SampleReviews.review(sample);
        Document html = Jsoup.parse(new HtmlReportWriter().write(review));
        Element problems = html.selectFirst("header.cover #problems");
        assertThat(problems).as("the problems are on page one").isNotNull();
        List<String> expected = review.elements().stream().flatMap(e -> e.findings().stream())
                .filter(f -> f.severity().atLeast(Severity.MAJOR)).map(Finding::id).toList();
        assertThat(problems.select("tbody tr td:first-child").eachText())
                .containsExactlyInAnyOrderElementsOf(expected);
        Element firstElement = html.selectFirst("section.element");
        assertThat(firstElement).isNotNull();
        assertThat(isBefore(html, problems, firstElement)).as("page one comes before the first element").isTrue();
    }

    @ParameterizedTest
    @MethodSource("samples")
    void barsAreAsLongAsTheUtilisationsTheyShow(Path sample) {
        Review review = SampleReviews.review(sample);
        Document html = Jsoup.parse(new HtmlReportWriter().write(review));
        List<Element> rows = html.select("#project tbody tr");
        assertThat(rows).hasSize(review.elements().size());
        for (int i = 0; i < rows.size(); i++) {
            ElementReview e = review.elements().get(i);
            OptionalDouble governing = e.checks().stream().map(CheckResult::utilisation)
                    .filter(OptionalDouble::isPresent).mapToDouble(OptionalDouble::getAsDouble).max();
            Element bar = rows.get(i).selectFirst(".ubar");
            if (governing.isEmpty()) {
                assertThat(bar).isNull();
                continue;
            }
            assertThat(bar.attr("data-utilisation")).isEqualTo(printed(governing.getAsDouble()));
            assertThat(width(bar)).isCloseTo(expectedWidth(governing.getAsDouble()), within(1e-9));
        }
        for (Element checklist : html.select("table.checklist")) {
            List<Double> shown = checklist.select(".ubar").stream()
                    .map(b -> Double.parseDouble(b.attr("data-utilisation"))).toList();
            assertThat(shown).as("checks by utilisation, largest first").isSortedAccordingTo((a, b) -> Double.compare(b, a));
            checklist.select(".ubar").forEach(b -> assertThat(width(b))
                    .isCloseTo(expectedWidth(Double.parseDouble(b.attr("data-utilisation"))), within(1e-9)));
        }
    }

    private static boolean isBefore(Document html, Element a, Element b) {
        List<Element> all = html.getAllElements();
        return all.indexOf(a) < all.indexOf(b);
    }

    /** Two decimals rounded up, as the report prints a utilisation. */
    private static String printed(double u) {
        return BigDecimal.valueOf(u).setScale(2, RoundingMode.CEILING).toPlainString();
    }

    /** The printed utilisation as a share of the track (0 to 1), the track full past 1. */
    private static double expectedWidth(double u) {
        return Math.min(Double.parseDouble(printed(u)), 1.0) * 100;
    }

    private static double width(Element bar) {
        String style = bar.selectFirst(".ubar-fill").attr("style");
        return Double.parseDouble(style.replaceAll(".*width: *([0-9.]+)%.*", "$1"));
    }
}

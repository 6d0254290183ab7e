package dev.countercheck.report;

import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Review;
import dev.countercheck.round.ReviewRound;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.IntStream;

import static org.assertj.core.api.Assertions.assertThat;

/** A large project's HTML report: a project page and parts of elements, linked both ways, each the tool's own file. */
class HtmlPagesTest {

    @TempDir
    Path dir;

    /** The fixture's two elements repeated until the review holds {@code count}. */
    private static Review reviewOf(int count) {
        Review small = ReviewFixture.review();
        List<ElementReview> elements = IntStream.range(0, count).mapToObj(i -> small.elements().get(i % 2)).toList();
        return new Review(small.tool(), small.submission(), small.ruleset(), small.reviewDate(), small.verdict(),
                elements, small.summary(), small.assumptions());
    }

    private Map<String, Document> write(Review review) throws IOException {
        List<String> parts;
        try (OutputSet set = OutputSet.in(dir)) {
            parts = ReviewReports.addTo(set, review, ReviewRound.none(""), "r.json", "r.html", Optional.empty());
            set.commit();
        }
        Map<String, Document> pages = new HashMap<>();
        for (String name : concat("r.html", parts)) {
            pages.put(name, Jsoup.parse(dir.resolve(name).toFile()));
        }
        return pages;
    }

    @Test
    void aProjectOfUpToOnePartIsOnePage() throws IOException {
        Review review = reviewOf(Paging.PER_PART);

        Map<String, Document> pages = write(review);

        assertThat(pages).containsOnlyKeys("r.html");
        assertThat(Files.readString(dir.resolve("r.html"))).isEqualTo(new HtmlReportWriter().write(review));
    }

    @Test
    void aLargerProjectHasAProjectPageAndPartsOfElementsWhoseLinksAllResolve() throws IOException {
        Review review = reviewOf(2 * Paging.PER_PART + 1);

        Map<String, Document> pages = write(review);

        assertThat(pages).containsOnlyKeys("r.html", "r.part-1.html", "r.part-2.html", "r.part-3.html");
        Document project = pages.get("r.html");
        assertThat(project.select("section.element")).isEmpty();
        assertThat(project.select("#register, #assumptions, #cover")).hasSize(3);
        assertThat(project.select("nav.contents a[href^=r.part-]")).hasSizeGreaterThan(2 * Paging.PER_PART);
        assertThat(sections(pages.get("r.part-1.html"))).hasSize(Paging.PER_PART).first().isEqualTo("e1");
        assertThat(sections(pages.get("r.part-2.html"))).hasSize(Paging.PER_PART).first()
                .isEqualTo("e" + (Paging.PER_PART + 1));
        assertThat(sections(pages.get("r.part-3.html"))).containsExactly("e" + (2 * Paging.PER_PART + 1));
        assertThat(pages.get("r.part-2.html").selectFirst("section.element .secno").text())
                .isEqualTo("2." + (Paging.PER_PART + 1));
        assertThat(pages.get("r.part-3.html").select("#cover, #register")).isEmpty();
        for (Map.Entry<String, Document> page : pages.entrySet()) {
            for (Element link : page.getValue().select("a[href]")) {
                String href = link.attr("href");
                String file = href.startsWith("#") ? page.getKey() : href.substring(0, (href + "#").indexOf('#'));
                String anchor = href.contains("#") ? href.substring(href.indexOf('#') + 1) : "";
                assertThat(pages).as("the page of %s on %s", href, page.getKey()).containsKey(file);
                if (!anchor.isEmpty()) {
                    assertThat(pages.get(file).getElementById(anchor)).as("%s on %s", href, page.getKey()).isNotNull();
                }
            }
            assertThat(ReportMarkers.replaceable(dir.resolve(page.getKey()))).as(page.getKey()).isTrue();
        }
    }

    private static List<String> sections(Document page) {
        return page.select("section.element").stream().map(Element::id).toList();
    }

    private static List<String> concat(String first, List<String> rest) {
        List<String> all = new ArrayList<>(List.of(first));
        all.addAll(rest);
        return all;
    }
}

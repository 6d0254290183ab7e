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

    /** A report that shrinks leaves no part page of the larger one behind, and never touches a file the tool did not write. */
    @Test
    void aSmallerReportRemovesThePartsOfTheLargerOneItReplaces() throws IOException {
        write(reviewOf(2 * Paging.PER_PART + 1));
        Files.writeString(dir.resolve("r.part-9.html"), "<p>someone's own page</p>\n");
        Files.writeString(dir.resolve("other.part-1.html"), Files.readString(dir.resolve("r.part-1.html")));

        write(reviewOf(Paging.PER_PART + 1));
        assertThat(dir.resolve("r.part-3.html")).doesNotExist();
        assertThat(dir.resolve("r.part-2.html")).exists();

        write(reviewOf(2));
        assertThat(dir.resolve("r.part-1.html")).doesNotExist();
        assertThat(dir.resolve("r.part-2.html")).doesNotExist();
        assertThat(dir.resolve("r.part-9.html")).hasContent("<p>someone's own page</p>");
        assertThat(dir.resolve("other.part-1.html")).exists();
        assertThat(dir.resolve("r.html")).exists();
    }

    @Test
    void aLargerProjectHasAProjectPageAndPartsOfElementsWhoseLinksAllResolve() throws IOException {
        Review review = reviewOf(2 * Paging.PER_PART + 1);

        Map<String, Document> pages = write(review);

        assertThat(pages).containsOnlyKeys("r.html", "r.part-1.html", "r.part-2.html", "r.part-3.html");
        Document project = pages.get("r.html");
        assertThat(project.select("section.element")).isEmpty();
        assertThat(project.select("#register, #assumptions, #cover")).hasSize(3);
        assertThat(project.select("nav.contents p a[href^=r.part-]")).hasSize(3);
        assertThat(project.select("table.parts-table tbody tr")).hasSize(3);
        assertThat(project.select("table.register-table, table.project-table:not(.parts-table)")).isEmpty();
        assertThat(sections(pages.get("r.part-1.html"))).hasSize(Paging.PER_PART).first().isEqualTo("e1");
        assertThat(sections(pages.get("r.part-2.html"))).hasSize(Paging.PER_PART).first()
                .isEqualTo("e" + (Paging.PER_PART + 1));
        assertThat(sections(pages.get("r.part-3.html"))).containsExactly("e" + (2 * Paging.PER_PART + 1));
        assertThat(pages.get("r.part-2.html").selectFirst("section.element .secno").text())
                .isEqualTo("2." + (Paging.PER_PART + 1));
        assertThat(pages.get("r.part-3.html").select("#cover")).isEmpty();
        List<String> registerRows = new ArrayList<>();
        for (int k = 1; k <= 3; k++) {
            Document part = pages.get("r.part-" + k + ".html");
            List<String> ids = sections(part);
            for (Element row : part.select("table.register-table tbody tr")) {
                assertThat(ids).as("the element of a register row of part %d", k)
                        .contains(row.select("td").get(1).selectFirst("a").attr("href").substring(1));
                registerRows.add(row.selectFirst("td").text());
            }
            assertThat(part.select("div.cautions")).allSatisfy(c -> assertThat(ids).contains(c.id().substring(9)));
        }
        assertThat(registerRows).hasSize(review.elements().stream().mapToInt(e -> e.findings().size()).sum());
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

    /** The project page lists the first critical and major findings and one row per part, whatever the project's size. */
    @Test
    void theProjectPageHoldsNoRowPerElement() throws IOException {
        int problemsPerPair = (int) ReviewFixture.review().elements().stream().flatMap(e -> e.findings().stream())
                .filter(f -> f.severity().label().equals("critical") || f.severity().label().equals("major")).count();
        int elements = 2 * (Paging.PROBLEMS_SHOWN / problemsPerPair + 1);
        Review review = reviewOf(elements);

        Document project = write(review).get("r.html");

        int parts = (elements + Paging.PER_PART - 1) / Paging.PER_PART;
        assertThat(project.select("table.problems-table tbody tr")).hasSize(Paging.PROBLEMS_SHOWN);
        assertThat(project.select("section.problems p.small").text()).contains("The first " + Paging.PROBLEMS_SHOWN
                + " of " + (elements / 2 * problemsPerPair) + " critical and major findings");
        assertThat(project.select("tr")).hasSizeLessThan(Paging.PROBLEMS_SHOWN + parts + 40);
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

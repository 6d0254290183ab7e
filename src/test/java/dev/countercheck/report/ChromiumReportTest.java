package dev.countercheck.report;

import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Review;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The report of every sample, and the index of all of them, opened in real headless Chromium
 * (Debian's {@code chromium}, which {@code .ci/run} installs): the page logs nothing to the console,
 * the browser's own DOM holds every element and every drawing, and a screenshot of the top of each
 * page is left under {@code target/screenshots/} for people to look at, and so are page one of a
 * sample's report, one of its elements on its own and one check's derivation opened
 * ({@code <sample>-page-one.png}, {@code <sample>-element-<id>.png}, {@code <sample>-derivation.png}).
 *
 * <p>Skipped, with the reason, where {@code /usr/bin/chromium} is absent. Tagged {@code browser}: not part of
 * {@code mvn verify} (ten browser starts, a sixth of the suite's time); {@code .ci/run} runs it after the suite
 * with {@code mvn -B test -Pbrowser}.
 */
@Tag("browser")
class ChromiumReportTest {

    private static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    private static final Path PAGES = Path.of("target", "chromium");
    private static final Path SCREENSHOTS = Path.of("target", "screenshots");
    /** How Chromium's log writes a message of the page's console, e.g. {@code INFO:CONSOLE:1] "…"}. */
    private static final Pattern CONSOLE = Pattern.compile("CONSOLE[:(]");

    /** What one Chromium run left: the DOM after loading, the console lines, the screenshot. */
    private record Opened(Document dom, List<String> console, Path screenshot) {
    }

    private static final String ABSENT = "Chromium is not installed at " + CHROMIUM
            + ": the browser checks of the report are skipped (.ci/run installs Debian's chromium package).";

    @BeforeAll
    static void prepareFolders() throws IOException {
        if (!Files.isExecutable(CHROMIUM)) {
            System.err.println("WARNING: " + ABSENT);
        }
        Files.createDirectories(PAGES);
        Files.createDirectories(SCREENSHOTS);
    }

    @BeforeEach
    void needsChromium() {
        Assumptions.assumeTrue(Files.isExecutable(CHROMIUM), ABSENT);
    }

    @Test
    void everySampleReportOpensCleanlyWithEveryElementAndDrawing() throws Exception {
        for (Path sample : SampleReviews.samples()) {
            Review review = SampleReviews.review(sample);
            String name = SampleReviews.name(sample);
            Path page = PAGES.resolve(name + ".html");
            Files.writeString(page, new HtmlReportWriter().write(review), StandardCharsets.UTF_8);

            Opened opened = open(page, name);

            assertThat(opened.console()).as(sample + ": console messages").isEmpty();
            for (ElementReview e : review.elements()) {
                Element section = opened.dom().selectFirst("section.element[aria-label=" + e.id() + "]");
                assertThat(section).as(e.id()).isNotNull();
                assertThat(section.select("svg.drawing")).as(e.id() + " plan and section")
                        .hasSize(e.drawing().isPresent() ? 2 : 0);
            }
            assertThat(opened.dom().select("#register tbody tr")).hasSize(
                    review.elements().stream().mapToInt(e -> e.findings().size()).sum());
            assertScreenshot(opened.screenshot());
        }
    }

    @Test
    void indexOfTheSamplesOpensCleanlyAndLinksToReportsThatExist() throws Exception {
        ReportIndex index = new ReportIndex(new Review.ToolInfo("countercheck", "test"), SampleReviews.DATE);
        for (Path sample : SampleReviews.samples()) {
            Review review = SampleReviews.review(sample);
            String name = SampleReviews.name(sample);
            Path html = PAGES.resolve(name + ".html");
            Path json = PAGES.resolve(name + ".json");
            Files.writeString(html, new HtmlReportWriter().write(review), StandardCharsets.UTF_8);
            Files.writeString(json, new JsonResultWriter().write(review), StandardCharsets.UTF_8);
            index.reviewed(review, json, html, Optional.empty());
        }
        index.notReviewed("sample-submissions/unreadable.yaml", "input errors");
        Path page = PAGES.resolve("index.html");
        Files.writeString(page, index.html(), StandardCharsets.UTF_8);

        Opened opened = open(page, "index");

        assertThat(opened.console()).as("index: console messages").isEmpty();
        assertThat(opened.dom().select("table.index-table tbody tr")).hasSize(SampleReviews.samples().size() + 1);
        for (Element link : opened.dom().select("table.index-table a[href]")) {
            assertThat(PAGES.resolve(link.attr("href"))).as(link.attr("href")).exists();
        }
        assertScreenshot(opened.screenshot());
    }

    @Test
    void pageOneAndOneElementAreKeptAsScreenshots() throws Exception {
        Path sample = SampleReviews.samples().get(0);
        Review review = SampleReviews.review(sample);
        String name = SampleReviews.name(sample);
        String html = new HtmlReportWriter().write(review);

        // Page one: the top of the report in a window of about one printed page.
        Path whole = PAGES.resolve(name + "-page-one.html");
        Files.writeString(whole, html, StandardCharsets.UTF_8);
        Opened pageOne = open(whole, name + "-page-one", "1280,1500");
        assertThat(pageOne.console()).isEmpty();
        assertScreenshot(pageOne.screenshot());

        // One element: the page with only that element's section, as the report draws it.
        ElementReview shown = review.elements().stream().filter(e -> e.drawing().isPresent()).findFirst()
                .orElseThrow();
        Document alone = Jsoup.parse(html);
        Element section = alone.selectFirst("section.element[aria-label=" + shown.id() + "]");
        alone.body().children().remove();
        alone.body().appendChild(section);
        Path element = PAGES.resolve(name + "-element.html");
        Files.writeString(element, alone.outerHtml(), StandardCharsets.UTF_8);
        Opened one = open(element, name + "-element-" + shown.id(), "1280,2400");
        assertThat(one.console()).isEmpty();
        assertThat(one.dom().select("section.element svg.drawing")).as("plan and section").hasSize(2);
        assertScreenshot(one.screenshot());
        assertThat(Files.readAllBytes(one.screenshot())).as("two different pictures")
                .isNotEqualTo(Files.readAllBytes(pageOne.screenshot()));

        // One check's derivation, opened: the first check of that element that names its governing case.
        Document calc = Jsoup.parse(html);
        Element check = calc.select("#calculations .check").stream()
                .filter(c -> c.selectFirst(".case-actions") != null).findFirst().orElseThrow();
        check.select("details.trace").attr("open", "");
        calc.body().children().remove();
        calc.body().appendChild(check);
        Path derivation = PAGES.resolve(name + "-derivation.html");
        Files.writeString(derivation, calc.outerHtml(), StandardCharsets.UTF_8);
        Opened steps = open(derivation, name + "-derivation", "1280,1600");
        assertThat(steps.console()).isEmpty();
        assertThat(steps.dom().select("ol.derivation > li")).as("numbered steps").isNotEmpty();
        assertThat(steps.dom().select("ol.derivation dfn")).as("symbols defined").isNotEmpty();
        assertScreenshot(steps.screenshot());
    }

    @Test
    void consoleMessagesWouldBeCaught() throws Exception {
        // The control for the tests above: a page that does log must be seen to log.
        Path page = PAGES.resolve("console-control.html");
        Files.writeString(page, "<!DOCTYPE html><html><body><p>control</p>"
                + "<script>console.error('control message 42')</script></body></html>", StandardCharsets.UTF_8);

        Opened opened = open(page, "console-control");

        assertThat(opened.console()).anyMatch(line -> line.contains("control message 42"));
    }

    /** Opens {@code page} once: the DOM as Chromium built it, its console lines, and a 1280 px wide screenshot. */
    private static Opened open(Path page, String name) throws IOException, InterruptedException {
        return open(page, name, "1280,5200");
    }

    /** As {@link #open(Path, String)}, in a window of {@code size} ("width,height" in px). */
    private static Opened open(Path page, String name, String size) throws IOException, InterruptedException {
        Path profile = Files.createTempDirectory("countercheck-chromium-");
        Path screenshot = SCREENSHOTS.resolve(name + ".png").toAbsolutePath();
        Path dom = PAGES.resolve(name + ".dom.html");
        Path log = PAGES.resolve(name + ".log");
        Files.deleteIfExists(screenshot);
        try {
            Process chromium = new ProcessBuilder(CHROMIUM.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                    "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                    "--disable-sync", "--hide-scrollbars", "--user-data-dir=" + profile, "--enable-logging=stderr",
                    "--v=0", "--window-size=" + size, "--screenshot=" + screenshot, "--dump-dom",
                    page.toAbsolutePath().toUri().toString())
                    .redirectOutput(dom.toFile())
                    .redirectError(log.toFile())
                    .start();
            if (!chromium.waitFor(120, TimeUnit.SECONDS)) {
                chromium.destroyForcibly();
                throw new AssertionError("Chromium did not finish with " + page + " within 120 s; see " + log);
            }
            assertThat(chromium.exitValue()).as("Chromium's exit status; its log is " + log).isZero();
        } finally {
            deleteTree(profile);
        }
        List<String> console = new ArrayList<>();
        for (String line : Files.readAllLines(log, StandardCharsets.UTF_8)) {
            if (CONSOLE.matcher(line).find()) {
                console.add(line);
            }
        }
        return new Opened(Jsoup.parse(Files.readString(dom, StandardCharsets.UTF_8)), console, screenshot);
    }

    /** A PNG (by its signature) of the 1280 px wide window, and not a blank one. */
    private static void assertScreenshot(Path png) throws IOException {
        assertThat(png).exists();
        byte[] bytes = Files.readAllBytes(png);
        assertThat(bytes).startsWith((byte) 0x89, (byte) 'P', (byte) 'N', (byte) 'G');
        int width = ((bytes[16] & 0xff) << 24) | ((bytes[17] & 0xff) << 16) | ((bytes[18] & 0xff) << 8)
                | (bytes[19] & 0xff);
        assertThat(width).as("image width from the PNG header").isEqualTo(1280);
        assertThat(bytes.length).as("a page with text and drawings compresses far less than a blank one")
                .isGreaterThan(50_000);
    }

    private static void deleteTree(Path root) throws IOException {
        try (Stream<Path> paths = Files.walk(root)) {
            for (Path p : paths.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }
}

package dev.countercheck.report;

import dev.countercheck.review.CheckResult;
import dev.countercheck.review.ClaimComparison;
import dev.countercheck.review.ClaimVerdict;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.select.Elements;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;

/** The HTML report of the invented {@link ReviewFixture}, read back with jsoup. */
class HtmlReportWriterTest {

    private static final String CAUTION = "This review assists a competent engineer and does not replace one. "
            + "Local codes, the applicable National Annex and licensed engineering practice govern.";

    private final Review review = ReviewFixture.review();
    private final String html = new HtmlReportWriter().write(review);
    private final Document page = Jsoup.parse(html);

    @Test
    void sectionsComeInTheOrderASignedReviewNeeds() {
        // Cover (with the problems), findings register, elements, assumptions and cautions, calculations.
        List<String> ids = page.select("body > header, body > section").eachAttr("id");
        assertThat(ids).containsExactly("cover", "register", "elements", "assumptions", "calculations");
        assertThat(page.select("#elements > section.element").eachAttr("aria-label")).containsExactly("PC-D1", "PF-A2");
    }

    @Test
    void everyIdOnThePageIsUnique() {
        List<String> ids = page.select("[id]").eachAttr("id");
        assertThat(ids).doesNotHaveDuplicates();
        assertThat(page.select("[href^=#]").eachAttr("href")).as("every link inside the page has its target")
                .allMatch(href -> ids.contains(href.substring(1)));
    }

    @Test
    void coverNamesProjectSubmissionHashesToolDateVerdictAndCounts() {
        Element cover = page.getElementById("cover");
        Map<String, String> facts = new java.util.LinkedHashMap<>();
        cover.select("table.facts tr").forEach(tr -> facts.put(tr.selectFirst("th").text(), tr.selectFirst("td").text()));
        assertThat(facts).containsEntry("Project", ReviewFixture.TITLE)
                .containsEntry("Submission reference", "HL-STR-014")
                .containsEntry("Revision", "not stated")
                .containsEntry("Submission file", review.submission().file())
                .containsEntry("SHA-256 of the submission", review.submission().sha256())
                .containsEntry("SHA-256 of the ruleset", review.ruleset().sha256())
                .containsEntry("Reviewed with", "countercheck " + review.tool().version())
                .containsEntry("Review date", review.reviewDate());
        assertThat(facts.get("Ruleset")).startsWith(review.ruleset().id() + ": " + review.ruleset().title());
        assertThat(cover.select(".verdict-big").text()).isEqualTo("DOES NOT CONFORM");
        // The fixture's summary: critical 1, major 1, minor 2, note 1.
        assertThat(cover.select("table.tally[aria-label=Findings by severity] tr").eachText())
                .containsExactly("CRITICAL 1", "MAJOR 1", "MINOR 2", "NOTE 1");
        assertThat(cover.select("table.signoff tbody th").eachText()).containsExactly("Checked by", "Approved by");
        assertThat(cover.select("table.signoff tbody td")).allMatch(td -> td.text().isEmpty());
        assertThat(cover.select(".caution").text()).startsWith(CAUTION);
    }

    @Test
    void registerHasOneRowPerFindingWithABlankResponse() {
        Elements rows = page.select("#register tbody tr");
        List<Finding> findings = review.elements().stream().flatMap(e -> e.findings().stream()).toList();
        assertThat(rows).hasSize(findings.size());
        for (int i = 0; i < findings.size(); i++) {
            Finding f = findings.get(i);
            Elements cells = rows.get(i).select("td");
            assertThat(cells.stream().map(Element::text).toList()).as(f.id())
                    .containsExactly(f.id(), elementOf(f), f.severity().label().toUpperCase(Locale.ROOT), f.basis(),
                            f.message(), "");
        }
        assertThat(page.select("#register thead th").last().text()).isEqualTo("Designer's response");
    }

    @Test
    void everyElementHasItsChecksFindingsAndDrawingsWhenItHasADrawing() {
        Element pileCap = page.selectFirst("section.element[aria-label=PC-D1]");
        assertThat(pileCap.select("figure.drawing-figure svg.drawing")).as("plan and section").hasSize(2);
        assertThat(pileCap.select("figure.plan svg title").text()).isEqualTo("Plan of pile cap PC-D1");
        assertThat(pileCap.select("table.legend tr")).isNotEmpty();
        assertThat(pileCap.select("table.marks tbody tr").eachText())
                .as("shear-x fails in the fixture: its sections carry tag F1")
                .containsExactly("F1 shear-x One-way shear, sections parallel to y shear sections across x PC-D1/shear-x/capacity");
        Element footing = page.selectFirst("section.element[aria-label=PF-A2]");
        assertThat(footing.select("svg.drawing")).as("the pad footing of the fixture has no drawing").isEmpty();
        for (ElementReview e : review.elements()) {
            Element section = page.selectFirst("section.element[aria-label=" + e.id() + "]");
            assertThat(section.select("table.checklist code").eachText()).as("the element lists its checks")
                    .containsAll(e.checks().stream().map(CheckResult::id).toList());
            Element appendix = page.getElementById("calc-" + section.id());
            assertThat(appendix.select("div.check .check-title code").eachText()).as("their values in the appendix")
                    .containsExactlyElementsOf(e.checks().stream().map(CheckResult::id).toList());
            assertThat(section.select("h4 + table.grid tbody tr td:first-child").eachText())
                    .containsExactlyElementsOf(e.findings().stream().map(Finding::id).toList());
        }
    }

    @Test
    void assumptionsAndCautionsCloseTheReport() {
        Element closing = page.getElementById("assumptions");
        assertThat(closing.select("ol.plain li").eachText()).containsExactlyElementsOf(review.assumptions());
        assertThat(closing.select("#cautions-e1 li").eachText())
                .containsExactly("Pile spacing exceeds three diameters: concentrate tie bars over the piles.");
        assertThat(closing.select("[id^=cautions-e2]")).as("PF-A2 has no caution").isEmpty();
    }

    @Test
    void escapesTheProjectTitleEverywhere() {
        String hostile = "<script>alert(1)</script>\"; } .cover { display: none } </style>";
        String text = new HtmlReportWriter().write(ReviewFixture.review(hostile));
        Document doc = Jsoup.parse(text);
        assertThat(doc.select("script")).isEmpty();
        assertThat(doc.selectFirst("h1").text()).isEqualTo(hostile);
        assertThat(doc.title()).isEqualTo("Design review: " + hostile);
        assertThat(doc.select("style")).hasSize(1);
        assertThat(doc.selectFirst("style").data()).as("the running head quotes the title as CSS escapes")
                .doesNotContain("<script", "alert(1)", ".cover { display: none", "</style");
    }

    @Test
    void loadsNothingFromTheNetwork() {
        assertThat(page.select("script, link, iframe, object, embed, img, [src], [srcset]")).isEmpty();
        assertThat(html).doesNotContain("@import");
        Matcher urls = Pattern.compile("url\\((.)").matcher(html);
        while (urls.find()) {
            assertThat(urls.group(1)).as("only references to patterns on the same page").isEqualTo("#");
        }
        Matcher http = Pattern.compile("https?://[^\"\\s<]*").matcher(html);
        while (http.find()) {
            assertThat(http.group()).as("only the SVG namespace name, which is never fetched")
                    .isEqualTo("http://www.w3.org/2000/svg");
        }
        assertThat(page.select("a[href]").eachAttr("href")).allMatch(href -> href.startsWith("#"));
        assertThat(page.select("meta[http-equiv=Content-Security-Policy]").attr("content"))
                .as("and the browser is told to refuse any load, should one slip in")
                .startsWith("default-src 'none';");
    }

    @Test
    void everyCheckHasAnOpenableCalculationWithNumberedSteps() {
        List<CheckResult> checks = review.elements().stream().flatMap(e -> e.checks().stream()).toList();
        Elements traces = page.select("details.trace");
        assertThat(traces).hasSize(checks.size());
        for (int i = 0; i < checks.size(); i++) {
            CheckResult check = checks.get(i);
            Elements steps = traces.get(i).select("ol.derivation > li");
            assertThat(steps).as(check.id()).hasSize(check.trace().size());
            for (int s = 0; s < steps.size(); s++) {
                var step = check.trace().get(s);
                Element line = steps.get(s).selectFirst(".step-line");
                assertThat(line.selectFirst(".step-n").text()).isEqualTo((s + 1) + ".");
                assertThat((line.selectFirst(".sym").text() + " " + line.select(".qualifier").text()).trim())
                        .isEqualTo(step.symbol());
                assertThat(line.select(".expr").eachText()).as(check.id() + " step " + (s + 1))
                        .containsExactlyElementsOf(step.substituted().equals(step.formula())
                                ? List.of(step.formula()) : List.of(step.formula(), step.substituted()));
                assertThat(line.selectFirst("cite.clause-ref").text()).isEqualTo(step.clause());
            }
        }
        assertThat(page.select("ol.derivation .remark").eachText()).as("a remark of the fixture's trace")
                .anyMatch(t -> t.endsWith("k capped at 2.0"));
        assertThat(html).contains("No calculation was recorded for this check.");
    }

    @Test
    void eachComputedValueLinksToTheStepThatGaveIt() {
        Elements links = page.select("table.quantities a[href]");
        assertThat(links).isNotEmpty();
        for (Element link : links) {
            Element target = page.getElementById(link.attr("href").substring(1));
            assertThat(target).as(link.attr("href")).isNotNull();
            String computed = link.closest("tr").select("td").get(1).text();
            assertThat(target.selectFirst("strong.result").text()).as("the step shows the same number")
                    .isEqualTo(computed);
        }
        // Fixture: tie-x records T (step 1, 812.3456 kN) and As,req (step 2, 1867.459 mm2).
        Element tie = page.getElementById("e1-c1");
        assertThat(tie.select("table.quantities tr:has(code:containsOwn(force)) a").attr("href")).isEqualTo("#e1-c1-s1");
        assertThat(tie.select("table.quantities tr:has(code:containsOwn(as_required)) a").attr("href"))
                .isEqualTo("#e1-c1-s2");
    }

    @Test
    void numbersCarryTheirUnitsAndSuitablePrecision() {
        Element tie = page.getElementById("e1-c1");
        // Source: hand calculation of the display rules (fixture values are invented demo data):
        // 812.3456 kN → 4 significant figures 812.3; 1867.459 mm2 → whole mm² 1867; utilisation 0.8123456
        // rounded up to two decimals → 0.82.
        assertThat(tie.select("table.quantities tr:has(code:containsOwn(force)) td").eachText().subList(0, 3))
                .containsExactly("force", "812.3", "kN");
        assertThat(tie.select("table.quantities tr:has(code:containsOwn(as_required)) td").eachText().subList(0, 5))
                .containsExactly("as_required", "1867", "mm²", "2000", "+7.1 %");
        assertThat(tie.select(".util").text()).isEqualTo("utilisation 0.82");
        assertThat(page.select("ol.derivation .step-line")).as("every step shows its result")
                .allMatch(line -> !line.select("strong.result").text().isBlank());
        assertThat(page.select("ol.derivation .unit").eachText()).as("a quantity with a unit shows it")
                .isNotEmpty().allMatch(unit -> !unit.isBlank() && !unit.equals("–"));
    }

    @Test
    void statusesSeveritiesAndVerdictsAreWordsNotColoursOnly() {
        assertThat(page.select(".badge.status-fail").eachText()).contains("FAIL");
        assertThat(page.select(".badge.status-not-applicable").eachText()).contains("NOT APPLICABLE");
        assertThat(page.select(".badge.sev-critical").eachText()).contains("CRITICAL");
        assertThat(html).contains("differs, UNCONSERVATIVE");
    }

    @Test
    void showsAClaimEvenWhenItsQuantityIsMissingFromTheValues() {
        // results.md says values carry every computed quantity; should a reviewer break that, the claim
        // must still reach the reader rather than vanish. Invented demo numbers.
        ElementReview first = review.elements().get(0);
        CheckResult tie = first.checks().get(0);
        CheckResult stray = new CheckResult(tie.id(), tie.title(), tie.basis(), tie.status(), tie.utilisation(),
                tie.reason(), Map.of(), List.of(new ClaimComparison("lever_arm", 640.0, 655.5, -0.023646,
                ClaimVerdict.DIFFERS_CONSERVATIVE)), tie.trace());
        ElementReview changed = new ElementReview(first.id(), first.type(), first.description(), first.verdict(),
                List.of(stray), first.findings(), first.cautions(), first.drawing());
        Review variant = new Review(review.tool(), review.submission(), review.ruleset(), review.reviewDate(),
                review.verdict(), List.of(changed), review.summary(), review.assumptions());

        Document doc = Jsoup.parse(new HtmlReportWriter().write(variant));

        // Source: hand calculation of the display rounding: 655.5 has 4 significant figures already;
        // -0.023646 → -0.0236 (4 decimals) → -2.36 %.
        assertThat(doc.select("table.quantities tbody td").eachText())
                .containsSequence("lever_arm", "655.5", "not known", "640", "-2.36 %");
    }

    @Test
    void outputDoesNotDependOnTheDefaultLocale() {
        Locale saved = Locale.getDefault();
        try {
            Locale.setDefault(Locale.forLanguageTag("de-DE"));
            String german = new HtmlReportWriter().write(review);
            Locale.setDefault(Locale.forLanguageTag("ar-EG"));
            String arabic = new HtmlReportWriter().write(review);
            assertThat(german).isEqualTo(html);
            assertThat(arabic).isEqualTo(html);
        } finally {
            Locale.setDefault(saved);
        }
    }

    private String elementOf(Finding finding) {
        return review.elements().stream().filter(e -> e.findings().contains(finding)).findFirst().orElseThrow().id();
    }
}

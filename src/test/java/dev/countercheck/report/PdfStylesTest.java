package dev.countercheck.report;

import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/** The PDF's stylesheets cut to what can apply to the page, and the spans that only group text. */
class PdfStylesTest {

    private static final String PAGE = """
            <html><head><style>x</style></head><body>
            <table class="grid"><tr><td class="num">1</td><td>2</td></tr></table>
            <p class="step-line"><span class="step-n">1.</span> <span class="quantity">Own weight</span> = <strong>3</strong> <span class="unit">kN</span></p>
            <h2 class="elements-heading">2</h2><span class="after">x</span><section class="element"></section>
            </body></html>""";

    private static Document page() {
        return Jsoup.parse(PAGE);
    }

    @Test
    void dropsTheSelectorsThatCanMatchNothingAndKeepsTheRestInOrder() {
        PdfStyles styles = PdfStyles.of(page());
        String css = """
                /* screen */
                input[type=checkbox], td.num { color: red }
                table.grid td:first-child, nav.contents li { margin: 0 }
                .missing::before { content: "{" }
                @page { size: A4; @top-right { content: "Page " counter(page); } }
                @media print { ol ol { margin: 0 } p.step-line .step-n::before { content: "[" } }
                """;
        assertThat(styles.cut(css)).isEqualTo("""
                td.num { color: red }
                table.grid td:first-child { margin: 0 }
                @page { size: A4; @top-right { content: "Page " counter(page); } }
                @media print {
                p.step-line .step-n::before { content: "[" }
                }
                """);
    }

    @Test
    void keepsWhatItCannotRead() {
        PdfStyles styles = PdfStyles.of(page());
        assertThat(styles.mayMatch("a\\:b")).isTrue();
        assertThat(styles.mayMatch("svg|rect")).isTrue();
        assertThat(styles.mayMatch(":root")).isTrue();
        assertThat(styles.mayMatch("td[data-x]")).isFalse();
        assertThat(styles.mayMatch("p.grid")).as("a class on another tag").isFalse();
    }

    @Test
    void unwrapsOnlyTheSpansNoRuleStylesAndNoSiblingOrderRuleSees() {
        Document page = page();
        PdfStyles styles = PdfStyles.of(page);
        styles.cut(".step-n { width: 2rem } .elements-heading + .element { margin: 0 } td:first-child { color: red }");
        styles.unwrapPlainSpans(page);
        assertThat(page.select("span").eachAttr("class")).containsExactly("step-n", "after");
        assertThat(page.selectFirst("p.step-line").text()).isEqualTo("1. Own weight = 3 kN");
    }
}

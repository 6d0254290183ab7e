package dev.countercheck.report;

import dev.countercheck.eurocode.Step;
import dev.countercheck.report.HtmlModel.StepView;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The appendix's derivations (issue 12 item 2): numbered steps, every symbol a check's derivation writes defined
 * at or before its first use, the governing case written out as numbers. Over every sample and every rule
 * fixture, so that a step added anywhere with a symbol the glossary lacks fails here.
 */
class DerivationTest {

    private static final Map<Path, Document> PAGES = new LinkedHashMap<>();

    @BeforeAll
    static void renderEverySampleAndFixture() {
        List<Path> inputs = new ArrayList<>(SampleReviews.samples());
        try (Stream<Path> fixtures = Files.list(Path.of("src/test/resources/rule-fixtures"))) {
            fixtures.filter(p -> p.toString().endsWith(".yaml")).sorted().forEach(inputs::add);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        for (Path input : inputs) {
            PAGES.put(input, Jsoup.parse(new HtmlReportWriter().write(SampleReviews.review(input))));
        }
    }

    @Test
    void everyCheckWithATraceHasItsStepsNumberedFromOneInOrder() {
        int derivations = 0;
        for (var page : PAGES.entrySet()) {
            for (Element list : page.getValue().select("ol.derivation")) {
                List<String> numbers = list.select("> li .step-n").eachText();
                List<String> expected = new ArrayList<>();
                for (int i = 1; i <= list.select("> li").size(); i++) {
                    expected.add(i + ".");
                }
                assertThat(numbers).as(page.getKey() + " " + list.parent().id()).isEqualTo(expected);
                derivations++;
            }
        }
        assertThat(derivations).as("derivations rendered").isGreaterThan(100);
    }

    @Test
    void everySymbolADerivationWritesIsDefinedAtOrBeforeItsFirstUse() {
        List<String> undefined = new ArrayList<>();
        int symbols = 0;
        for (var page : PAGES.entrySet()) {
            for (Element list : page.getValue().select("ol.derivation")) {
                Set<String> defined = new HashSet<>();
                for (Element step : list.select("> li")) {
                    defined.addAll(step.select("dfn").eachText());
                    for (String symbol : step.attr("data-uses").split("\\|")) {
                        symbols++;
                        if (!defined.contains(symbol)) {
                            undefined.add(page.getKey().getFileName() + " " + list.parent().id() + " step "
                                    + step.selectFirst(".step-n").text() + ": " + symbol + " in "
                                    + step.selectFirst(".step-line").text());
                        }
                    }
                }
            }
        }
        assertThat(undefined).as("symbols used before any definition (add them to " + Glossary.RESOURCE + ")")
                .isEmpty();
        assertThat(symbols).isGreaterThan(1000);
    }

    @Test
    void eachStepReadsQuantityExpressionResultUnitAndClause() {
        Element step = PAGES.get(Path.of("sample-submissions/harbour-lane.yaml"))
                .select("ol.derivation > li").stream()
                .filter(li -> li.selectFirst(".sym").text().equals("VRd,c")).findFirst().orElseThrow();
        String line = step.selectFirst(".step-line").text();
        // quantity in words, the symbol, its formula, the values put in, the result with its unit, the clause
        assertThat(step.selectFirst(".quantity").text()).isEqualTo("Design shear resistance without shear reinforcement");
        assertThat(step.select(".expr")).hasSize(2);
        assertThat(line).matches(".*VRd,c = max\\(vRd,c; vmin\\)·bw·d = .+ = [0-9.]+ kN .*6\\.2\\.2.*");
        assertThat(step.selectFirst("cite.clause-ref").text()).contains("EN 1992-1-1");
    }

    @Test
    void thePileReactionPlaneDefinesItsAAndBWhereTheyFirstAppear() {
        Element list = PAGES.get(Path.of("sample-submissions/harbour-lane.yaml")).select("ol.derivation").stream()
                .filter(l -> !l.select("li[data-uses^=P#], li .sym").eachText().isEmpty()
                        && l.select("li").stream().anyMatch(li -> li.selectFirst(".sym").text().equals("a")))
                .findFirst().orElseThrow();
        Element a = list.select("> li").stream().filter(li -> li.selectFirst(".sym").text().equals("a"))
                .findFirst().orElseThrow();
        assertThat(a.selectFirst("dfn.sym").text()).isEqualTo("a");
        assertThat(a.selectFirst(".quantity").text()).startsWith("Slope of the reaction plane along x");
        assertThat(a.selectFirst(".qualifier").text()).startsWith("(");
    }

    @Test
    void theGoverningCaseIsWrittenOutAsNumbers() {
        int cases = 0;
        for (var page : PAGES.entrySet()) {
            for (Element governs : page.getValue().select(".governs")) {
                assertThat(governs.select(".case-actions").text()).as(page.getKey() + ": " + governs.text())
                        .matches("\\(N = -?[0-9.]+ kN, Mx = -?[0-9.]+ kNm, My = -?[0-9.]+ kNm, Hx = -?[0-9.]+ kN,"
                                + " Hy = -?[0-9.]+ kN\\)");
                cases++;
            }
        }
        assertThat(cases).as("checks naming a governing case").isGreaterThan(20);
    }

    @Test
    void aSymbolTheGlossaryLacksIsLeftUndefinedSoTheStructureTestFails() {
        List<StepView> steps = new Derivation(Glossary.bundled(), Map.of(), Map.of()).of("pile-cap", "shear-x",
                List.of(
                Step.of("VRd,c", "max(vRd,c; vmin)·bw·d", "…", 250, "kN", "EN 1992-1-1 6.2.2(1)"),
                Step.of("Qzz", "VRd,c·ωq", "…", 1, "-", "invented")), "e1-c1");
        assertThat(steps.get(0).definesSymbol()).isTrue();
        assertThat(steps.get(0).where()).extracting(HtmlModel.Definition::symbol)
                .containsExactly("vRd,c", "vmin", "bw", "d");
        assertThat(steps.get(1).definesSymbol()).as("Qzz is in no glossary").isFalse();
        assertThat(steps.get(1).uses()).isEqualTo("Qzz|VRd,c|ωq");
        assertThat(steps.get(1).where()).as("VRd,c was defined by step 1; ωq is in no glossary").isEmpty();
    }

    @Test
    void aSymbolMeansWhatItsCheckSaysAndARulesetNameWhatTheRulesetDeclares() {
        Glossary g = Glossary.bundled();
        assertThat(g.meaning("a", "pile-cap", "pile-reactions")).get().asString().contains("reaction plane");
        assertThat(g.meaning("a", "pile-cap", "punching-perimeter")).get().asString().contains("control perimeter");
        assertThat(g.meaning("P7", "pile-cap", "pile-reactions")).get().asString().contains("reaction of that pile");
        assertThat(g.meaning("φ", "pile-cap", "node-pile")).get().asString().contains("pile");
        assertThat(g.meaning("φ", "pad-footing", "bending-x")).as("a pad has no piles").hasValue("diameter of a bar");
        assertThat(g.meaning("D", "pad-footing", "bearing-resistance")).get().asString().contains("below the ground");
        List<StepView> steps = new Derivation(g, Map.of("cover_side", "nominal cover at the sides"), Map.of())
                .of("pile-cap", "cover", List.of(Step.ofRule("cnom,prov,side", "cover_side", "40", 40, "mm",
                        "EN 1992-1-1 4.4.1 (r.yaml)")), "e1-c1");
        assertThat(steps.get(0).where()).containsExactly(
                new HtmlModel.Definition("cover_side", "nominal cover at the sides"));
    }

    @Test
    void aRuleNameIsDefinedInTheWordsOfTheElementsOwnKind() {
        Derivation derivation = new Derivation(Glossary.bundled(), Map.of("pad-footing/b_t", "footing width",
                "pile-cap/b_t", "cap width", "spacing_k2", "k2 of 8.2(2)"), Map.of("b_t", "bt"));
        List<Step> trace = List.of(Step.ofRule("s", "b_t - spacing_k2", "2200 - 5", 2195, "mm", "invented (r.yaml)"));
        assertThat(derivation.of("pad-footing", "bar-spacing-x", trace, "e1-c1").get(0).where()).containsExactly(
                new HtmlModel.Definition("bt", "footing width"), new HtmlModel.Definition("spacing_k2", "k2 of 8.2(2)"));
        assertThat(derivation.of("pile-cap", "bar-spacing-x", trace, "e1-c1").get(0).where()).containsExactly(
                new HtmlModel.Definition("bt", "cap width"), new HtmlModel.Definition("spacing_k2", "k2 of 8.2(2)"));
    }

    @Test
    void aRuleStepIsWrittenInSymbolsAndDefinesEachNameByItsSymbolOnce() {
        Map<String, String> meanings = Map.of("phi", "bar diameter", "eta2", "the rule's name for η2");
        Map<String, String> symbols = Map.of("phi", "φ", "eta2", "η2");
        List<StepView> steps = new Derivation(Glossary.bundled(), meanings, symbols).of(
                "pile-cap", "anchorage-x", List.of(
                        Step.ofRule("η2", "IF(phi <= 32, 1, (132 - phi) / 100)", "IF(12 <= 32, 1, (132 - 12) / 100)", 1,
                                "-", "EN 1992-1-1 8.4.2(2) (rulesets/r.yaml)"),
                        Step.ofRule("fbd", "2.25 * eta2 * phi", "2.25 * 1 * 12", 27, "MPa",
                                "invented (rulesets/r.yaml)")), "e1-c1");
        assertThat(steps.get(0).formula()).isEqualTo("1 if φ ≤ 32, else (132 − φ)/100");
        assertThat(steps.get(0).substituted()).isEqualTo("1 if 12 ≤ 32, else (132 − 12)/100");
        assertThat(steps.get(0).where()).containsExactly(new HtmlModel.Definition("φ", "bar diameter"));
        assertThat(steps.get(1).formula()).isEqualTo("2.25·η2·φ");
        assertThat(steps.get(1).where()).as("η2 and φ were defined by step 1").isEmpty();
        assertThat(steps.get(1).uses()).isEqualTo("fbd|η2|φ");
    }

    @Test
    void aStepTheCodeBuiltKeepsItsOwnNotationEvenWhereItReadsAsARuleExpression() {
        List<StepView> steps = new Derivation(Glossary.bundled(), Map.of(), Map.of("fck", "FCK")).of("pile-cap",
                "shear-x", List.of(
                Step.of("V", "N + Wf + Ws (characteristic)", "1 + 2 + 3", 6, "kN", "EN 1990 6.5.3")), "e1-c1");
        assertThat(steps.get(0).formula()).isEqualTo("N + Wf + Ws (characteristic)");
        assertThat(steps.get(0).substituted()).isEqualTo("1 + 2 + 3");
    }

    @Test
    void aStepIsARuleStepByItsMarkNotByItsClauseText() {
        Derivation derivation = new Derivation(Glossary.bundled(), Map.of("phi", "bar diameter"), Map.of("phi", "φ"));
        String formula = "MAX(phi, 2 * phi)";
        String clauseOfARule = "EN 1992-1-1 8.2(2) (rulesets/r.yaml)";
        List<StepView> steps = derivation.of("pile-cap", "spacing-x", List.of(
                Step.of("s", formula, "MAX(12, 2 * 12)", 24, "mm", clauseOfARule),
                Step.ofRule("s", formula, "MAX(12, 2 * 12)", 24, "mm", "EN 1992-1-1 8.2(2)")), "e1-c1");
        assertThat(steps.get(0).formula()).as("the code's step whose clause reads like a rule's keeps its text")
                .isEqualTo(formula);
        assertThat(steps.get(0).substituted()).isEqualTo("MAX(12, 2 * 12)");
        assertThat(steps.get(1).formula()).as("the rule's step whose clause names no file is rewritten")
                .isEqualTo("max(φ; 2·φ)");
        assertThat(steps.get(1).substituted()).isEqualTo("max(12; 2·12)");
    }

    @Test
    void theRuleMarkTravelsWithARemark() {
        Step rule = Step.ofRule("s", "2 * phi", "2 * 12", 24, "mm", "EN 1992-1-1 8.2(2)").remarked("recalled");
        assertThat(rule.fromRule()).isTrue();
        assertThat(Step.of("s", "2·φ", "2·12", 24, "mm", "EN 1992-1-1 8.2(2)").remarked("x").fromRule()).isFalse();
        Step code = new Step("s", "2 * phi", "2 * 12", 24, "mm", "EN 1992-1-1 8.2(2)", rule.remark());
        assertThat(code.fromRule()).isFalse();
    }

    @Test
    void aValueStatedOnceIsNotRepeatedAndARulesetParameterNamesItsFileBeforeTheValue() {
        List<StepView> steps = new Derivation(Glossary.bundled(), Map.of(), Map.of()).of("pad-footing", "x", List.of(
                Step.of("b", "footing width across the section", "2200", 2200, "mm", "EN 1992-1-1 6.2.2(1)"),
                Step.of("γG", "ruleset parameter gamma_g", "1.35 (rulesets/r.yaml)", 1.35, "-", "EN 1990")), "e1-c1");
        assertThat(steps.get(0).substituted()).isEmpty();
        assertThat(steps.get(1).formula()).isEqualTo("ruleset parameter gamma_g (rulesets/r.yaml)");
        assertThat(steps.get(1).substituted()).isEmpty();
    }
}

package dev.countercheck.report;

import dev.countercheck.review.PadFootingDrawing;
import dev.countercheck.review.PileCapDrawing;
import dev.countercheck.review.ElementReview;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;

import javax.xml.parsers.DocumentBuilderFactory;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The plan and section of the invented four-pile cap of {@link DrawingFixture}. The SVG is read
 * back as XML, so each test also proves that the drawing is well-formed.
 */
class DrawingsTest {

    /** The fast rounding of coordinates writes what the decimal rounding writes, ties and near-ties included. */
    @Test
    void coordinatesAreWrittenAsTheDecimalRoundingWritesThem() {
        java.util.Random random = new java.util.Random(14);
        List<Double> values = new ArrayList<>(List.of(0.0, -0.0, 0.05, -0.05, 0.25, 1.05, 2.45, -2.45, 12.345, 0.04,
                -0.04, -0.06, 99.95, 1e9, -1e9, 123456789.25, 1.0 / 3));
        for (int i = 0; i < 200_000; i++) {
            double v = (random.nextDouble() - 0.5) * Math.pow(10, random.nextInt(9));
            values.add(v);
            values.add(Math.round(v * 100) / 100.0);
            values.add(Math.round(v * 20) / 20.0);
        }
        List<String> differing = new ArrayList<>();
        for (double v : values) {
            String fast = Svg.num(v);
            String exact = Svg.exactNum(v);
            if (!fast.equals(exact)) {
                differing.add(v + " written " + fast + ", decimal rounding " + exact);
            }
        }
        assertThat(differing).as("values written unlike the decimal rounding, of %d", values.size()).isEmpty();
    }

    private final ElementReview element = DrawingFixture.element("PC-T1");
    private final PileCapDrawing drawing = (PileCapDrawing) element.drawing().orElseThrow();
    private final DrawingMarks marks = DrawingMarks.of(element, drawing);
    private final Document plan = xml(PlanDrawing.svg("e1", drawing, marks));
    private final Document section = xml(SectionDrawing.svg("e1", drawing, marks));

    @Test
    void planIsToScale() {
        Element outline = capOutline(plan);
        double capWidth = number(outline, "width");
        List<Element> piles = pileCircles();
        assertThat(piles).hasSize(4);
        double scale = capWidth / DrawingFixture.PLAN_MM;
        // Source: hand calculation from the fixture: piles 1 and 2 at x = -750 and +750 mm lie 1500 mm apart,
        // the pile radius is 450/2 = 225 mm; the drawing is to scale when both keep that ratio to the 2400 mm cap.
        assertThat(number(piles.get(1), "cx") - number(piles.get(0), "cx")).isCloseTo(1500 * scale, within(0.2));
        assertThat(number(piles.get(0), "r")).isCloseTo(225 * scale, within(0.1));
        assertThat(number(outline, "height")).as("a square cap stays square").isCloseTo(capWidth, within(0.1));
    }

    @Test
    void pilesAreNumberedWithTheirLargestReactions() {
        List<String> texts = texts(plan);
        assertThat(texts).contains("1", "2", "3", "4", "1500 kN", "1620 kN", "1380 kN", "1450 kN");
    }

    @Test
    void onlyTheOverloadedPileIsMarkedAsFailing() {
        List<Element> piles = pileCircles();
        // Pile 2 carries 1620 kN > 1550 kN, the others less (fixture values).
        for (int i = 0; i < piles.size(); i++) {
            assertThat(failing(piles.get(i))).as("pile " + (i + 1)).isEqualTo(i == 1);
        }
        assertThat(DrawingLegend.marks(marks)).filteredOn(m -> m.checkId().equals("pile-reactions"))
                .singleElement().satisfies(m -> {
                    assertThat(m.where()).isEqualTo("pile 2");
                    assertThat(m.findingIds()).containsExactly("PC-T1/pile-reactions/compression");
                });
    }

    @Test
    void failingShearSectionsAreMarkedAndPassingOnesAreNot() {
        double scale = number(capOutline(plan), "width") / DrawingFixture.PLAN_MM;
        double centre = number(capOutline(plan), "x") + number(capOutline(plan), "width") / 2;
        List<Element> heavy = elements(plan, "line").stream().filter(l -> failing(l)
                && l.getAttribute("stroke-width").equals("3.2")).toList();
        assertThat(heavy).as("the two shear-x sections, drawn heavy as failing").hasSize(2)
                .allMatch(l -> l.getAttribute("x1").equals(l.getAttribute("x2")));
        // Fixture: the shear-x sections lie at x = +600 and -600 mm.
        assertThat(heavy).extracting(l -> number(l, "x1") - centre)
                .allSatisfy(offset -> assertThat(Math.abs(offset)).isCloseTo(600 * scale, within(0.2)));
        List<Element> passing = elements(plan, "line").stream()
                .filter(l -> l.getAttribute("stroke-dasharray").equals("12 3 2 3")).toList();
        assertThat(passing).as("the two shear-y sections pass: drawn in the normal style, across y").hasSize(2)
                .allMatch(l -> l.getAttribute("y1").equals(l.getAttribute("y2")));
    }

    @Test
    void everyFailingCheckHasATagAndTheOnesWithNoPlaceSayNotDrawn() {
        assertThat(marks.all()).extracting(DrawingMarks.Mark::tag).containsExactly("F1", "F2", "F3", "F4", "F5");
        assertThat(DrawingLegend.marks(marks)).filteredOn(m -> m.checkId().equals("max-steel")).singleElement()
                .satisfies(m -> assertThat(m.where()).isEqualTo("not drawn"));
        List<String> texts = new ArrayList<>(texts(plan));
        texts.addAll(texts(section));
        assertThat(texts).as("tags of pile-reactions, shear-x, tie-y and cover appear on a drawing")
                .contains("F1", "F2", "F3", "F4").doesNotContain("F5");
    }

    @Test
    void sectionShowsDepthCoversEmbedmentAndEveryLayer() {
        List<String> texts = texts(section);
        // Fixture: h = 1000, covers 75 bottom / 50 top / 75 side, embedment 75 (all mm).
        assertThat(texts).contains("1000", "75", "50", "10 φ20 B1 (x)", "10 φ20 B2 (y)",
                "4 φ12 T1 (x)", "pile 1, 4", "pile 2, 3");
        List<Element> dots = elements(section, "circle").stream()
                .filter(c -> c.getAttribute("fill").equals(Styles.FAIL_COLOUR)).toList();
        assertThat(dots).as("the 10 y-bars, cut by the section, drawn as failing (tie-y fails)").hasSize(10);
        assertThat(elements(section, "line")).as("the cover dimensions are marked (cover fails)")
                .anyMatch(l -> l.getAttribute("stroke").equals(Styles.FAIL_COLOUR));
    }

    @Test
    void spreadRingLiesOnTheLowestBarsAt45Degrees() {
        // Source: hand calculation: lowest bars (B1, φ20) at 75 + 20/2 = 85 mm above the soffit, pile head at the
        // 75 mm embedment, so the 45° spread widens by 85 - 75 = 10 mm: ring radius 225 + 10 = 235 mm.
        assertThat(BarLayout.spreadMm(drawing.cap())).hasValue(10.0);
        double scale = number(capOutline(plan), "width") / DrawingFixture.PLAN_MM;
        assertThat(elements(plan, "circle")).anyMatch(c -> c.getAttribute("stroke-dasharray").equals("1.5 2")
                && Math.abs(number(c, "r") - 235 * scale) < 0.1);
        assertThat(DrawingLegend.rows("e1", drawing, true)).anyMatch(r -> r.text().contains("a ring 10 mm outside"));
    }

    @Test
    void controlPerimeterHasRoundedCornersOfRadiusA() {
        double scale = number(capOutline(plan), "width") / DrawingFixture.PLAN_MM;
        Element perimeter = elements(plan, "path").stream()
                .filter(p -> p.getAttribute("stroke-dasharray").equals("6 3")).findFirst().orElseThrow();
        // a = 1700 mm in the fixture: each corner is an arc of that radius, to scale.
        String radius = Svg.num(1700 * scale);
        assertThat(perimeter.getAttribute("d")).contains("A" + radius + " " + radius);
        assertThat(DrawingLegend.rows("e1", drawing, true)).anyMatch(r -> r.text().contains("a = 1700 mm"));
    }

    @Test
    void submittedTextIsEscapedInTheDrawings() {
        String hostile = "<script>alert(1)</script>";
        ElementReview bad = DrawingFixture.element(hostile);
        DrawingMarks badMarks = DrawingMarks.of(bad, (PileCapDrawing) bad.drawing().orElseThrow());
        Document badPlan = xml(PlanDrawing.svg("e1", (PileCapDrawing) bad.drawing().orElseThrow(), badMarks));
        assertThat(badPlan.getElementsByTagName("script").getLength()).isZero();
        assertThat(badPlan.getElementsByTagName("title").item(0).getTextContent())
                .isEqualTo("Plan of pile cap " + hostile);
    }

    @Test
    void everyLabelAndTagOfTheSampleDrawingsStaysOnItsCanvasAndPrints() {
        for (var sample : SampleReviews.samples()) {
            for (ElementReview e : SampleReviews.review(sample).elements()) {
                if (e.drawing().isEmpty()) {
                    continue;
                }
                List<String> svgs;
                if (e.drawing().get() instanceof PileCapDrawing cap) {
                    DrawingMarks m = DrawingMarks.of(e, cap);
                    svgs = List.of(PlanDrawing.svg("e", cap, m), SectionDrawing.svg("e", cap, m));
                } else {
                    HtmlModel.DrawingView pad = PadDrawing.view("e", (PadFootingDrawing) e.drawing().get());
                    svgs = List.of(pad.plan(), pad.section());
                }
                for (String svg : svgs) {
                    assertInsideCanvas(e.id(), xml(svg));
                }
            }
        }
    }

    /**
     * Boxes (tags, label backgrounds, the cap) and texts lie within the view box. Text width is
     * estimated at 5.5 units a character, about the mean advance of an 11-unit sans-serif font.
     */
    private static void assertInsideCanvas(String element, Document svg) {
        String[] box = svg.getDocumentElement().getAttribute("viewBox").split(" ");
        double width = Double.parseDouble(box[2]);
        double height = Double.parseDouble(box[3]);
        for (Element rect : elements(svg, "rect")) {
            if (rect.getParentNode().getNodeName().equals("clipPath")) {
                continue;
            }
            assertThat(number(rect, "x")).as(element + " rect x").isBetween(0.0, width);
            assertThat(number(rect, "x") + number(rect, "width")).as(element + " rect right").isLessThanOrEqualTo(width);
            assertThat(number(rect, "y")).as(element + " rect y").isBetween(0.0, height);
            assertThat(number(rect, "y") + number(rect, "height")).as(element + " rect bottom")
                    .isLessThanOrEqualTo(height);
        }
        for (Element text : elements(svg, "text")) {
            double length = text.getTextContent().length() * 5.5;
            double x = number(text, "x");
            double left = switch (text.getAttribute("text-anchor")) {
                case "middle" -> x - length / 2;
                case "end" -> x - length;
                default -> x;
            };
            assertThat(text.getAttribute("font-size")).as("size 12 prints as a dot in the PDF (see Styles)")
                    .isNotEqualTo("12");
            if (text.hasAttribute("transform")) {
                continue;
            }
            assertThat(left).as(element + " text " + text.getTextContent()).isGreaterThanOrEqualTo(0);
            assertThat(left + length).as(element + " text " + text.getTextContent()).isLessThanOrEqualTo(width);
            assertThat(number(text, "y")).as(element + " text " + text.getTextContent()).isBetween(8.0, height);
        }
    }

    private List<Element> pileCircles() {
        return elements(plan, "circle").stream().filter(c -> c.getAttribute("stroke-width").equals("1.3")
                || (failing(c) && c.getAttribute("fill").equals("#fbfaf6"))).toList();
    }

    private static Element capOutline(Document svg) {
        return elements(svg, "rect").stream().filter(r -> r.getAttribute("fill").equals("#efece4")).findFirst()
                .orElseThrow();
    }

    private static boolean failing(Element e) {
        return e.getAttribute("stroke").equals(Styles.FAIL_COLOUR);
    }

    static Document xml(String svg) {
        try {
            DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
            factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
            return factory.newDocumentBuilder().parse(new InputSource(new StringReader(svg)));
        } catch (Exception e) {
            throw new AssertionError("the drawing is not well-formed XML: " + e.getMessage(), e);
        }
    }

    static List<Element> elements(Document document, String tag) {
        NodeList nodes = document.getElementsByTagName(tag);
        List<Element> list = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            list.add((Element) nodes.item(i));
        }
        return list;
    }

    static List<String> texts(Document document) {
        return elements(document, "text").stream().map(Element::getTextContent).toList();
    }

    private static double number(Element e, String attribute) {
        return Double.parseDouble(e.getAttribute(attribute));
    }
}

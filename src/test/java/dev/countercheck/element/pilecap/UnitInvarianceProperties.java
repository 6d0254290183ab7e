package dev.countercheck.element.pilecap;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Review;
import dev.countercheck.submission.SubmissionReader;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Writing a submission's quantities in other units (m or cm for lengths, MN or N for forces,
 * MNm for moments) changes nothing in the review: every computed value stays the same.
 */
class UnitInvarianceProperties {

    private static final String TEMPLATE = """
            countercheck: 1
            basis: {ruleset: en1992-recommended}
            materials: {concrete: C30/37, fyk: 500, aggregate: 20, exposure: [XC2]}
            elements:
              - id: U
                type: pile-cap
                plan: {x: L2600, y: L2200}
                depth: L1050
                piles:
                  diameter: L450
                  positions: [[L-900, L-650], [L900, L-650], [L900, L650], [L-900, L650]]
                  capacity: {compression: F2400, tension: F300}
                  embedment: L75
                column: {shape: rectangular, size: [L500, L450], position: [L100, L-50], starter_bars: {count: 8, diameter: L20}}
                actions:
                  - {name: ULS-1, kind: uls, N: F5200, Mx: M140, My: M-90, Hx: F40}
                reinforcement:
                  cover: {bottom: L75, top: L50, side: L75}
                  bottom:
                    - {direction: x, count: 13, diameter: L25, layer: 1, ends: bent}
                    - {direction: y, count: 15, diameter: L25, layer: 2, ends: bent}
            """;
    private static final Pattern QUANTITY = Pattern.compile("([LFM])(-?\\d+)");
    private static final ElementReview BASELINE = review(0);

    /** The template with its quantities written in units set {@code choice} (0: the default units). */
    static String written(int choice) {
        Matcher m = QUANTITY.matcher(TEMPLATE);
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            double v = Double.parseDouble(m.group(2));
            String text = switch (m.group(1) + choice) {
                case "L1" -> "\"" + fmt(v / 1000) + " m\"";
                case "L2" -> "\"" + fmt(v / 10) + " cm\"";
                case "F1" -> "\"" + fmt(v / 1000) + " MN\"";
                case "F2" -> "\"" + fmt(v * 1000) + " N\"";
                case "M1", "M2" -> "\"" + fmt(v / 1000) + " MNm\"";
                default -> fmt(v);
            };
            m.appendReplacement(out, Matcher.quoteReplacement(text));
        }
        m.appendTail(out);
        return out.toString();
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%s", v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v));
    }

    static ElementReview review(int choice) {
        try {
            Path file = Files.createTempFile("units", ".yaml");
            Files.writeString(file, written(choice));
            try {
                Review r = new ProjectReviewer(new Review.ToolInfo("countercheck", "test"))
                        .review(new SubmissionReader(ElementKinds.binders()).read(file), CapReviews.ruleset("en1992-recommended"), "2026-01-01");
                return r.elements().get(0);
            } finally {
                Files.deleteIfExists(file);
            }
        } catch (Exception e) {
            throw new AssertionError("units set " + choice + " does not review: " + e, e);
        }
    }

    @Property(tries = 6)
    void writingQuantitiesInOtherUnitsChangesNoComputedValue(@ForAll @IntRange(min = 1, max = 2) int choice) {
        ElementReview other = review(choice);
        for (CheckResult c : BASELINE.checks()) {
            CheckResult o = CapReviews.check(other, c.id());
            assertThat(o.status()).as(c.id()).isEqualTo(c.status());
            c.values().forEach((name, v) -> assertThat(o.values().get(name).value()).as(c.id() + "." + name)
                    .isCloseTo(v.value(), within(1e-9 * Math.max(1, Math.abs(v.value())))));
        }
    }
}

package dev.countercheck.export;

import dev.countercheck.review.CheckResult;
import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The review as JUnit XML, the test-report format that build servers show without a plug-in: one test
 * suite per element, one test case per check. A check with a finding at or above the gate's severity
 * fails; a check not performed or not applicable is skipped with its reason; findings below the gate are
 * written to the case's output. An element that could not be reviewed fails whatever the gate.
 */
public final class JunitXml {

    private JunitXml() {
    }

    public static String write(Review review, Severity failOn) {
        StringBuilder x = new StringBuilder("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        List<String> suites = new ArrayList<>();
        int tests = 0;
        int failures = 0;
        int skipped = 0;
        for (ElementReview e : review.elements()) {
            Map<String, List<Finding>> byCheck = new LinkedHashMap<>();
            e.checks().forEach(c -> byCheck.put(c.id(), new ArrayList<>()));
            e.findings().forEach(f -> byCheck.computeIfAbsent(f.check(), k -> new ArrayList<>()).add(f));
            StringBuilder cases = new StringBuilder();
            int eFailures = 0;
            int eSkipped = 0;
            for (Map.Entry<String, List<Finding>> c : byCheck.entrySet()) {
                CheckResult check = e.checks().stream().filter(r -> r.id().equals(c.getKey())).findFirst().orElse(null);
                List<Finding> gating = c.getValue().stream().filter(f -> f.severity().atLeast(failOn)
                        || check == null).toList();
                cases.append("    <testcase classname=\"").append(Xml.attr(e.id())).append("\" name=\"")
                        .append(Xml.attr(c.getKey())).append("\">\n");
                if (!gating.isEmpty()) {
                    eFailures++;
                    cases.append("      <failure type=\"").append(gating.get(0).severity().label())
                            .append("\" message=\"").append(Xml.attr(gating.get(0).message())).append("\">")
                            .append(Xml.text(lines(gating))).append("</failure>\n");
                } else if (check != null && (check.status() == CheckStatus.NOT_CHECKED
                        || check.status() == CheckStatus.NOT_APPLICABLE)) {
                    eSkipped++;
                    cases.append("      <skipped message=\"").append(Xml.attr(check.status().label() + ": "
                            + check.reason().orElse(""))).append("\"/>\n");
                }
                if (!c.getValue().isEmpty() && gating.size() < c.getValue().size()) {
                    cases.append("      <system-out>").append(Xml.text(lines(c.getValue().stream()
                            .filter(f -> !gating.contains(f)).toList()))).append("</system-out>\n");
                }
                cases.append("    </testcase>\n");
            }
            tests += byCheck.size();
            failures += eFailures;
            skipped += eSkipped;
            suites.add("  <testsuite name=\"" + Xml.attr(e.id()) + "\" tests=\"" + byCheck.size() + "\" failures=\""
                    + eFailures + "\" errors=\"0\" skipped=\"" + eSkipped + "\">\n" + cases + "  </testsuite>\n");
        }
        x.append("<testsuites name=\"").append(Xml.attr("countercheck " + review.submission().file()))
                .append("\" tests=\"").append(tests).append("\" failures=\"").append(failures)
                .append("\" errors=\"0\" skipped=\"").append(skipped).append("\">\n");
        suites.forEach(x::append);
        return x.append("</testsuites>\n").toString();
    }

    private static String lines(List<Finding> findings) {
        StringBuilder s = new StringBuilder();
        findings.forEach(f -> s.append(f.id()).append(" [").append(f.severity().label()).append("] ")
                .append(f.withBasis()).append("\n"));
        return s.toString();
    }
}

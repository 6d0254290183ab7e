package dev.countercheck.review;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.submission.CheckCatalogue.CheckSpec;
import dev.countercheck.submission.CheckCatalogue.QuantitySpec;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.OptionalDouble;

/**
 * Collects one check's values, trace, status, findings and cautions while a reviewer computes it.
 * Every value goes in under a quantity name of the check's catalogue entry, so the unit that the
 * result carries is the catalogue's.
 */
public final class CheckBuilder {

    private final CheckSpec spec;
    private final Map<String, Value> values = new LinkedHashMap<>();
    private final List<Step> trace = new ArrayList<>();
    private final List<DraftFinding> findings = new ArrayList<>();
    private final List<String> cautions = new ArrayList<>();
    private final List<Drawing.SectionLine> sections = new ArrayList<>();
    private CheckStatus status = CheckStatus.NOT_CHECKED;
    private OptionalDouble utilisation = OptionalDouble.empty();
    private Optional<String> reason = Optional.of("not computed");
    private final List<String> failures = new ArrayList<>();
    private Optional<String> governingCase = Optional.empty();

    public CheckBuilder(CheckSpec spec) {
        this.spec = spec;
    }

    public String id() {
        return spec.id();
    }

    /** Adds a step to the trace and returns it, so that a computation reads as a sequence. */
    public Step trace(Step step) {
        trace.add(step);
        return step;
    }

    /** Records {@code step} as the check's quantity {@code name} (and in the trace). */
    public Step value(String name, Step step) {
        QuantitySpec q = spec.quantity(name)
                .orElseThrow(() -> new IllegalArgumentException(spec.id() + " has no quantity " + name));
        if (!q.unit().equals(step.unit())) {
            throw new IllegalArgumentException(spec.id() + "." + name + " is in " + q.unit() + ", step "
                    + step.symbol() + " is in " + step.unit());
        }
        values.put(name, new Value(step.value(), q.unit(), OptionalInt.of(indexInTrace(step))));
        return step;
    }

    /** Where this very step stands in the trace (an equal step elsewhere is another); added at the end if absent. */
    private int indexInTrace(Step step) {
        for (int i = 0; i < trace.size(); i++) {
            if (trace.get(i) == step) {
                return i;
            }
        }
        trace(step);
        return trace.size() - 1;
    }

    /**
     * Sets pass or fail from {@code demand ≤ capacity} (equality passes), with the utilisation
     * demand/capacity. A failure raises a finding of {@code kind} named {@code slug} with {@code failMessage}.
     */
    public CheckBuilder require(double demand, double capacity, FindingKind kind, String slug, String failMessage) {
        utilisation(capacity > 0 ? demand / capacity : (demand > 0 ? Double.POSITIVE_INFINITY : 0));
        if (demand > capacity) {
            fail(kind, slug, failMessage);
        } else if (status != CheckStatus.FAIL) {
            status = CheckStatus.PASS;
            reason = Optional.empty();
        }
        return this;
    }

    /** Records a utilisation computed elsewhere (a rule's own demand/capacity); the largest one stands. */
    public CheckBuilder utilisation(double value) {
        if (Double.isFinite(value)) {
            utilisation = OptionalDouble.of(Math.max(value, utilisation.orElse(0)));
        }
        return this;
    }

    /** Marks the check failed with a finding; a later {@link #require} cannot turn it back to pass. */
    public CheckBuilder fail(FindingKind kind, String slug, String message) {
        return failWith(new DraftFinding(slug, kind, Optional.empty(), spec.id(), message, spec.basis()));
    }

    /** Marks the check failed by a ruleset requirement, with the severity the requirement declares. */
    public CheckBuilder failRequirement(Severity declared, String slug, String message) {
        return failWith(new DraftFinding(slug, FindingKind.RULE, Optional.of(declared), spec.id(), message,
                spec.basis()));
    }

    private CheckBuilder failWith(DraftFinding finding) {
        status = CheckStatus.FAIL;
        failures.add(finding.message());
        findings.add(finding);
        return this;
    }

    /** The check passes (for checks with no demand/capacity comparison, e.g. geometry notes). */
    public CheckBuilder pass() {
        if (status != CheckStatus.FAIL) {
            status = CheckStatus.PASS;
            reason = Optional.empty();
        }
        return this;
    }

    public CheckBuilder notApplicable(String why) {
        status = CheckStatus.NOT_APPLICABLE;
        reason = Optional.of(why);
        return this;
    }

    public CheckBuilder notChecked(String why) {
        status = CheckStatus.NOT_CHECKED;
        reason = Optional.of(why);
        return this;
    }

    /**
     * A finding beside the comparison: a remark leaves the status as it is; a rule not met or a
     * capacity exceeded fails a check that would otherwise pass (a check never reads pass while it
     * raises a serious finding about its own subject).
     */
    public CheckBuilder finding(FindingKind kind, String slug, String message) {
        findings.add(new DraftFinding(slug, kind, Optional.empty(), spec.id(), message, spec.basis()));
        return this;
    }

    /** Names the action case that governs this check (the one its demand comes from). */
    public CheckBuilder governing(String caseName) {
        governingCase = Optional.of(caseName);
        return this;
    }

    /** Records where a critical section of this check lies, for the drawing. */
    public CheckBuilder section(Drawing.SectionLine line) {
        sections.add(line);
        return this;
    }

    public CheckBuilder caution(String text) {
        cautions.add(text);
        return this;
    }

    /** "1870 kN" for messages. */
    public static String show(double value, String unit) {
        return Num.f(value) + ("-".equals(unit) ? "" : " " + unit);
    }

    private static boolean failsItsCheck(DraftFinding f) {
        return f.kind() == FindingKind.CAPACITY || f.kind() == FindingKind.RULE;
    }

    public CheckOutcome build() {
        if (status == CheckStatus.PASS) {
            findings.stream().filter(CheckBuilder::failsItsCheck).forEach(f -> {
                status = CheckStatus.FAIL;
                failures.add(f.message());
            });
        }
        Map<String, Value> ordered = new LinkedHashMap<>();
        spec.quantities().stream().filter(q -> values.containsKey(q.name()))
                .forEach(q -> ordered.put(q.name(), values.get(q.name())));
        Optional<String> why = status == CheckStatus.FAIL ? Optional.of(String.join("; ", failures)) : reason;
        CheckResult result = new CheckResult(spec.id(), spec.title(), spec.basis(), status, utilisation, why,
                Collections.unmodifiableMap(ordered), List.of(), List.copyOf(trace), governingCase);
        return new CheckOutcome(result, List.copyOf(findings), List.copyOf(cautions), List.copyOf(sections));
    }
}

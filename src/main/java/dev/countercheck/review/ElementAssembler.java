package dev.countercheck.review;

import dev.countercheck.submission.CheckCatalogue;
import dev.countercheck.submission.CheckCatalogue.CheckSpec;
import dev.countercheck.submission.CheckCatalogue.QuantitySpec;
import dev.countercheck.submission.Claim;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;


/**
 * Turns the outcomes of an element's checks and the designer's claims into the element's review:
 * claims compared, findings given stable ids and their severities, verdict decided. Shared by every element type.
 */
public final class ElementAssembler {

    private final ClaimComparer comparer;
    private final SeverityPolicy severities;

    public ElementAssembler(ClaimComparer comparer, SeverityPolicy severities) {
        this.comparer = comparer;
        this.severities = severities;
    }

    /** @param catalogue the checks of the element's type, which its claims name */
    public ElementReview assemble(String id, CheckCatalogue catalogue, String description, List<CheckOutcome> outcomes,
                                  List<Claim> claims, List<String> elementCautions, Optional<Drawing> drawing) {
        Map<String, CheckResult> results = new LinkedHashMap<>();
        Map<String, List<DraftFinding>> drafts = new LinkedHashMap<>();
        List<String> cautions = new ArrayList<>();
        elementCautions.stream().filter(c -> !cautions.contains(c)).forEach(cautions::add);
        for (CheckOutcome o : outcomes) {
            results.put(o.result().id(), o.result());
            drafts.computeIfAbsent(o.result().id(), k -> new ArrayList<>()).addAll(o.findings());
            o.cautions().stream().filter(c -> !cautions.contains(c)).forEach(cautions::add);
        }
        Map<String, List<ClaimComparison>> compared = new HashMap<>();
        for (Claim claim : claims) {
            CheckSpec spec = catalogue.check(claim.checkId());
            QuantitySpec q = spec.quantity(claim.quantity()).orElseThrow();
            CheckResult r = results.get(claim.checkId());
            Value computed = r == null ? null : r.values().get(claim.quantity());
            List<DraftFinding> list = drafts.computeIfAbsent(claim.checkId(), k -> new ArrayList<>());
            if (computed == null) {
                list.add(new DraftFinding(ClaimComparer.slug(claim.quantity()), FindingKind.CLAIM_NOT_COMPARED,
                        Optional.empty(), claim.checkId(), "Claimed " + claim.checkId() + "."
                        + claim.quantity() + " = " + CheckBuilder.show(claim.value(), q.unit())
                        + " was not compared: " + notComparedReason(r), spec.basis()));
                continue;
            }
            ClaimComparison c = comparer.compare(claim, computed.value(), q);
            compared.computeIfAbsent(claim.checkId(), k -> new ArrayList<>()).add(c);
            comparer.findingFor(c, spec, q).ifPresent(list::add);
        }
        List<CheckResult> checks = results.values().stream()
                .map(r -> withClaims(r, compared.getOrDefault(r.id(), List.of()))).toList();
        List<Finding> findings = identify(id, drafts);
        return new ElementReview(id, catalogue.elementType(), description, verdict(checks, findings), checks, findings,
                List.copyOf(cautions), drawing);
    }

    private static String notComparedReason(CheckResult r) {
        if (r == null) {
            return "this check is not part of the review.";
        }
        return r.reason().map(why -> "the check is " + r.status().label() + " (" + why + ").")
                .orElse("the check does not compute this quantity for the method used.");
    }

    private static CheckResult withClaims(CheckResult r, List<ClaimComparison> claims) {
        return r.withClaims(claims);
    }

    /**
     * Ids {@code <element>/<check>/<slug>}: the slug names what is wrong, so that fixing one finding never
     * renames another. Two findings with one id are a fault of the reviewer, never of the input.
     */
    private List<Finding> identify(String elementId, Map<String, List<DraftFinding>> drafts) {
        List<Finding> out = new ArrayList<>();
        Set<String> ids = new HashSet<>();
        drafts.forEach((check, list) -> {
            for (DraftFinding d : list) {
                String findingId = elementId + "/" + check + "/" + d.slug();
                if (!ids.add(findingId)) {
                    throw new IllegalStateException("two findings of " + elementId + " are both " + findingId);
                }
                out.add(new Finding(findingId, d.declared().orElseGet(() -> severities.of(d.kind())), check,
                        d.message(), d.basis()));
            }
        });
        out.sort(Comparator.comparing(Finding::severity));
        return List.copyOf(out);
    }

    /**
     * does-not-conform when a critical or major finding stands; else incomplete when a check could
     * not be done; else conforms-with-remarks when a minor finding or a note stands; else conforms.
     */
    public static Verdict verdict(List<CheckResult> checks, List<Finding> findings) {
        if (findings.stream().anyMatch(f -> f.severity().atLeast(Severity.MAJOR))) {
            return Verdict.DOES_NOT_CONFORM;
        }
        if (checks.stream().anyMatch(c -> c.status() == CheckStatus.NOT_CHECKED)) {
            return Verdict.INCOMPLETE;
        }
        return findings.isEmpty() ? Verdict.CONFORMS : Verdict.CONFORMS_WITH_REMARKS;
    }

    /** The worst of the elements' verdicts: does-not-conform, incomplete, with remarks, conforms. */
    public static Verdict overall(List<ElementReview> elements) {
        List<Verdict> order = List.of(Verdict.DOES_NOT_CONFORM, Verdict.INCOMPLETE, Verdict.CONFORMS_WITH_REMARKS);
        return order.stream().filter(v -> elements.stream().anyMatch(e -> e.verdict() == v)).findFirst()
                .orElse(Verdict.CONFORMS);
    }

}

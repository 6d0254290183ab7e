package dev.countercheck.review;

import java.util.EnumMap;
import java.util.Map;
import java.util.function.Function;

/** The severity of each kind of finding, as the ruleset declares it. */
public final class SeverityPolicy {

    private final Map<FindingKind, Severity> severities = new EnumMap<>(FindingKind.class);

    /** @param labelOf the severity label the ruleset gives a kind's key */
    public SeverityPolicy(Function<String, String> labelOf) {
        for (FindingKind k : FindingKind.values()) {
            severities.put(k, Severity.fromLabel(labelOf.apply(k.key())));
        }
    }

    public Severity of(FindingKind kind) {
        return severities.get(kind);
    }
}

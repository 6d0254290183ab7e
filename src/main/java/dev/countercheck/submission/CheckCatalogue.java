package dev.countercheck.submission;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Predicate;

/**
 * The checks of one element type: ids and quantity names, with the unit of each quantity and
 * the side on which a claim is unconservative. Each element type declares its catalogue once
 * (e.g. {@link PileCapChecks}); the reader, the reviewers, the rulesets and the report all read it. This is the vocabulary of
 * {@code claims.<check-id>.<quantity>} in a submission and of {@code checks[].values} in a result.
 */
public final class CheckCatalogue {

    /** Which way a claimed value errs when it is unconservative. */
    public enum SafeSide {
        /** An action or a requirement: a claim smaller than the computed value is unconservative. */
        DEMAND,
        /** A resistance, a provision or a length available: a larger claim is unconservative. */
        CAPACITY
    }

    /** One quantity of a check: its name, unit and safe side. */
    public record QuantitySpec(String name, String unit, SafeSide safeSide) {
    }

    /**
     * What a check protects: a strength check compares a demand with a recomputed capacity; a
     * detailing check applies a rule of the code or of practice (severities: docs/results.md).
     */
    public enum Kind { STRENGTH, DETAILING }

    /** One check: id, title, clause, kind, and its quantities in report order. */
    public record CheckSpec(String id, String title, String basis, Kind kind, List<QuantitySpec> quantities) {

        public Optional<QuantitySpec> quantity(String name) {
            for (QuantitySpec q : quantities) {
                if (q.name().equals(name)) {
                    return Optional.of(q);
                }
            }
            return Optional.empty();
        }
    }

    /** A quantity whose claim is unconservative when smaller than the computed value. */
    public static QuantitySpec demand(String name, String unit) {
        return new QuantitySpec(name, unit, SafeSide.DEMAND);
    }

    /** A quantity whose claim is unconservative when larger than the computed value. */
    public static QuantitySpec capacity(String name, String unit) {
        return new QuantitySpec(name, unit, SafeSide.CAPACITY);
    }

    private final String elementType;
    private final Map<String, CheckSpec> checks;

    private CheckCatalogue(String elementType, Map<String, CheckSpec> checks) {
        this.elementType = elementType;
        this.checks = checks;
    }

    /** The catalogue of {@code elementType}: its checks in report order. */
    public static CheckCatalogue of(String elementType, List<CheckSpec> specs) {
        Map<String, CheckSpec> map = new LinkedHashMap<>();
        specs.forEach(s -> map.put(s.id(), s));
        return new CheckCatalogue(elementType, Collections.unmodifiableMap(map));
    }

    /** The element type these checks belong to, e.g. {@code pile-cap}. */
    public String elementType() {
        return elementType;
    }

    /** The checks by id, in report order. */
    public Map<String, CheckSpec> checks() {
        return checks;
    }

    /** Check id → quantity → unit, in report order, for the checks whose id {@code which} accepts. */
    public Map<String, Map<String, String>> quantityUnits(Predicate<String> which) {
        Map<String, Map<String, String>> units = new LinkedHashMap<>();
        checks.values().stream().filter(c -> which.test(c.id())).forEach(c -> {
            Map<String, String> q = new LinkedHashMap<>();
            c.quantities().forEach(x -> q.put(x.name(), x.unit()));
            units.put(c.id(), Collections.unmodifiableMap(q));
        });
        return Collections.unmodifiableMap(units);
    }

    /** The check {@code id}; throws when there is none (a programming error). */
    public CheckSpec check(String id) {
        CheckSpec spec = checks.get(id);
        if (spec == null) {
            throw new IllegalArgumentException("no check '" + id + "' for " + elementType);
        }
        return spec;
    }
}

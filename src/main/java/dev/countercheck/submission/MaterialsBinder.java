package dev.countercheck.submission;

import dev.countercheck.input.Node;
import dev.countercheck.input.Shown;
import dev.countercheck.input.Suggestions;
import dev.countercheck.submission.Values.Bound;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * Reads {@code materials:} blocks (the file's defaults and an element's overrides) and merges them
 * into an element's {@link Materials}.
 *
 * <p>Concrete is given by class ({@code concrete: C32/40}) or by {@code fck}, or both when they
 * agree. Accepted classes are those of EN 1992-1-1:2004 Table 3.1, C12/15 to C90/105, and the two
 * BS 8500 classes C28/35 and C32/40 that UK practice specifies (they are not in Table 3.1 but lie
 * within its range, so its expressions apply). A bare {@code fck} must lie within Table 3.1's range,
 * 12 to 90 MPa. {@code fyk} must lie within 400 to 600 MPa, the range EN 1992-1-1 Annex C
 * (Table C.1) covers. The strength is one item when merging: an element that states {@code concrete}
 * or {@code fck} replaces both of the file's.
 */
final class MaterialsBinder {

    static final List<String> KEYS = List.of("concrete", "fck", "fyk", "aggregate", "exposure",
            "structural_class", "cover_deviation");

    /** Concrete classes and their fck, MPa. Source: EN 1992-1-1:2004 Table 3.1; BS 8500-1 for C28/35, C32/40. */
    private static final Map<String, Integer> CLASSES = classes(
            "C12/15", "C16/20", "C20/25", "C25/30", "C28/35", "C30/37", "C32/40", "C35/45", "C40/50", "C45/55",
            "C50/60", "C55/67", "C60/75", "C70/85", "C80/95", "C90/105");

    /** Exposure classes of EN 1992-1-1:2004 Table 4.1. */
    private static final Map<String, String> EXPOSURE = identity(List.of("X0", "XC1", "XC2", "XC3", "XC4",
            "XD1", "XD2", "XD3", "XS1", "XS2", "XS3", "XF1", "XF2", "XF3", "XF4", "XA1", "XA2", "XA3"));

    /** Structural classes of EN 1992-1-1:2004 Table 4.3N. */
    private static final Map<String, String> STRUCTURAL = identity(List.of("S1", "S2", "S3", "S4", "S5", "S6"));

    private static final String DEFAULT_STRUCTURAL_CLASS = "S4";

    private static final double FCK_MIN_MPA = 12;
    private static final double FCK_MAX_MPA = 90;
    private static final double FYK_MIN_MPA = 400;
    private static final double FYK_MAX_MPA = 600;

    /** One materials block as written; {@code written} names the keys it states, even with a bad value. */
    record Draft(Optional<String> concreteClass, Optional<Double> fckMpa, Optional<Double> fykMpa,
                 Optional<Double> aggregateMm, Optional<List<String>> exposure, Optional<String> structuralClass,
                 Optional<Double> coverDeviationMm, Set<String> written) {

        static final Draft NONE = new Draft(Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(),
                Optional.empty(), Optional.empty(), Optional.empty(), Set.of());

        /** This block over {@code base}: each key this block states replaces the base's; strength as one item. */
        Draft over(Draft base) {
            boolean strength = states("concrete") || states("fck");
            Set<String> keys = new HashSet<>(written);
            base.written.stream().filter(k -> !(strength && (k.equals("concrete") || k.equals("fck"))))
                    .forEach(keys::add);
            return new Draft(strength ? concreteClass : base.concreteClass, strength ? fckMpa : base.fckMpa,
                    pick("fyk", fykMpa, base.fykMpa), pick("aggregate", aggregateMm, base.aggregateMm),
                    pick("exposure", exposure, base.exposure),
                    pick("structural_class", structuralClass, base.structuralClass),
                    pick("cover_deviation", coverDeviationMm, base.coverDeviationMm), Set.copyOf(keys));
        }

        private boolean states(String key) {
            return written.contains(key);
        }

        private <T> Optional<T> pick(String key, Optional<T> mine, Optional<T> base) {
            return states(key) ? mine : base;
        }
    }

    private final Values values;

    MaterialsBinder(Values values) {
        this.values = values;
    }

    /** Reads one {@code materials:} block. */
    Draft read(Fields f) {
        Optional<String> concreteClass = f.text("concrete").flatMap(c -> concreteClass(f, c));
        Optional<Double> classFck = concreteClass.map(c -> (double) CLASSES.get(c));
        Optional<Double> fck = f.quantity("fck", Dimension.STRESS, Bound.POSITIVE)
                .filter(v -> inRange(f, "fck", v, FCK_MIN_MPA, FCK_MAX_MPA, "EN 1992-1-1 Table 3.1"));
        if (fck.isPresent() && classFck.isPresent() && !fck.get().equals(classFck.get())) {
            values.problems().add(f.get("fck").orElseThrow().location(), f.path("fck"), "fck " + Values.source(
                    f.get("fck").orElseThrow()) + " does not match concrete class " + concreteClass.get()
                    + " (fck " + classFck.get().intValue() + " MPa)");
        }
        Optional<Double> fyk = f.quantity("fyk", Dimension.STRESS, Bound.POSITIVE)
                .filter(v -> inRange(f, "fyk", v, FYK_MIN_MPA, FYK_MAX_MPA, "EN 1992-1-1 Annex C"));
        Set<String> written = new HashSet<>();
        KEYS.stream().filter(f::has).forEach(written::add);
        return new Draft(concreteClass, classFck.isPresent() ? classFck : fck, fyk,
                f.quantity("aggregate", Dimension.LENGTH, Bound.POSITIVE), f.get("exposure").flatMap(
                        n -> exposure(n, f.path("exposure"))),
                f.get("structural_class").flatMap(n -> values.choice(n, f.path("structural_class"),
                        "structural class", STRUCTURAL)),
                f.quantity("cover_deviation", Dimension.LENGTH, Bound.NON_NEGATIVE), Set.copyOf(written));
    }

    /**
     * The materials of an element; each required item not stated anywhere is reported at the
     * element (items stated with a bad value were reported where they stand).
     */
    Optional<Materials> complete(Draft draft, Fields element) {
        List<String> missing = new ArrayList<>();
        if (!draft.written().contains("concrete") && !draft.written().contains("fck")) {
            missing.add("concrete");
        }
        List.of("fyk", "aggregate", "exposure").stream().filter(k -> !draft.written().contains(k))
                .forEach(missing::add);
        for (String key : missing) {
            values.problems().add(element.location(), Values.join(element.path("materials"), key),
                    "no " + (key.equals("concrete") ? "concrete strength ('concrete: C32/40' or 'fck')" : "'" + key + "'")
                            + " given for this element: state it under the file's or the element's 'materials'");
        }
        if (!missing.isEmpty() || draft.fckMpa().isEmpty() || draft.fykMpa().isEmpty()
                || draft.aggregateMm().isEmpty() || draft.exposure().isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Materials(draft.concreteClass(), draft.fckMpa().get(), draft.fykMpa().get(),
                draft.aggregateMm().get(), draft.exposure().get(),
                draft.structuralClass().orElse(DEFAULT_STRUCTURAL_CLASS), draft.coverDeviationMm()));
    }

    private Optional<String> concreteClass(Fields f, String written) {
        if (CLASSES.containsKey(written)) {
            return Optional.of(written);
        }
        String hint = Suggestions.nearest(written, CLASSES.keySet())
                .filter(c -> c.equalsIgnoreCase(written)).map(c -> "; did you mean '" + c + "'?").orElse("");
        values.problems().add(f.get("concrete").orElseThrow().location(), f.path("concrete"),
                "concrete class '" + Shown.text(written) + "' is not in EN 1992-1-1 Table 3.1 (C12/15 to C90/105)"
                        + " nor one of the BS 8500 classes C28/35, C32/40" + hint);
        return Optional.empty();
    }

    private boolean inRange(Fields f, String key, double value, double min, double max, String basis) {
        if (value >= min && value <= max) {
            return true;
        }
        values.problems().add(f.get(key).orElseThrow().location(), f.path(key), key + " " + Values.format(value)
                + " MPa is outside " + Values.format(min) + " to " + Values.format(max) + " MPa, the range of " + basis);
        return false;
    }

    /** Exposure classes: a list, or one class written alone ({@code exposure: XC2}). */
    private Optional<List<String>> exposure(Node node, String path) {
        if (node instanceof Node.ScalarNode scalar && scalar.kind() == Node.ScalarNode.Kind.TEXT) {
            return values.choice(node, path, "exposure class", EXPOSURE).map(List::of);
        }
        return values.nonEmptyList(node, path, EXPOSURE.size(), "exposure classes",
                "exposure class (e.g. XC2)").flatMap(items -> values.each(items, path,
                (item, itemPath) -> values.choice(item, itemPath, "exposure class", EXPOSURE)));
    }

    private static Map<String, Integer> classes(String... names) {
        Map<String, Integer> map = new LinkedHashMap<>();
        for (String name : names) {
            map.put(name, Integer.parseInt(name.substring(1, name.indexOf('/'))));
        }
        return map;
    }

    private static Map<String, String> identity(List<String> words) {
        Map<String, String> map = new LinkedHashMap<>();
        words.forEach(w -> map.put(w, w));
        return map;
    }
}

package dev.countercheck.submission;

import dev.countercheck.input.Node;
import dev.countercheck.input.Node.Entry;
import dev.countercheck.input.Shown;
import dev.countercheck.input.Suggestions;
import dev.countercheck.submission.CheckCatalogue.CheckSpec;
import dev.countercheck.submission.CheckCatalogue.QuantitySpec;
import dev.countercheck.submission.PileCap.TieMethod;
import dev.countercheck.submission.Values.Bound;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Reads {@code claims:}: the tie {@code method}, then {@code <check-id>: {<quantity>: value}} with
 * check ids and quantities of {@link CheckCatalogue} and values in the quantity's unit (or text with
 * a unit of the same kind).
 */
final class ClaimsBinder {

    /** The designer's tie method and claimed values. */
    record Claims(TieMethod method, List<Claim> claims) {
        static final Claims NONE = new Claims(TieMethod.TRUSS, List.of());
    }

    private static final String METHOD = "method";

    private final Values values;

    ClaimsBinder(Values values) {
        this.values = values;
    }

    Optional<Claims> read(Node node, String path, CheckCatalogue catalogue) {
        return read(node, path, catalogue, true);
    }

    /** @param takesMethod whether {@code method} (how the ties were designed) is a claim of this element type */
    Optional<Claims> read(Node node, String path, CheckCatalogue catalogue, boolean takesMethod) {
        Map<String, CheckSpec> checks = catalogue.checks();
        return values.map(node, path).flatMap(map -> {
            Optional<TieMethod> method = Optional.of(TieMethod.TRUSS);
            List<Claim> claims = new ArrayList<>();
            boolean ok = true;
            for (Entry entry : map.entries()) {
                String entryPath = Values.join(path, entry.key());
                if (takesMethod && entry.key().equals(METHOD)) {
                    method = values.choice(entry.value(), entryPath, "method", Values.options(TieMethod.values()));
                } else if (checks.containsKey(entry.key())) {
                    ok &= check(entry, entryPath, checks.get(entry.key()), claims);
                } else {
                    List<String> known = new ArrayList<>(takesMethod ? List.of(METHOD) : List.of());
                    known.addAll(checks.keySet());
                    values.problems().add(entry.keyLocation(), entryPath, "unknown check '" + Shown.text(entry.key()) + "'"
                            + Suggestions.hint(entry.key(), known));
                    ok = false;
                }
            }
            return ok ? method.map(m -> new Claims(m, List.copyOf(claims))) : Optional.empty();
        });
    }

    private boolean check(Entry entry, String path, CheckSpec spec, List<Claim> claims) {
        Optional<Node.MapNode> map = values.map(entry.value(), path);
        boolean ok = map.isPresent();
        for (Entry quantity : map.map(Node.MapNode::entries).orElse(List.of())) {
            String quantityPath = Values.join(path, quantity.key());
            Optional<QuantitySpec> q = spec.quantity(quantity.key());
            if (q.isEmpty()) {
                values.problems().add(quantity.keyLocation(), quantityPath, "unknown quantity '" + Shown.text(quantity.key())
                        + "' of check '" + spec.id() + "'" + Suggestions.hint(quantity.key(),
                        spec.quantities().stream().map(QuantitySpec::name).toList()));
                ok = false;
                continue;
            }
            Optional<Double> value = values.quantity(quantity.value(), quantityPath,
                    Dimension.ofCatalogueUnit(q.get().unit()), Bound.ANY);
            value.ifPresent(v -> claims.add(new Claim(spec.id(), quantity.key(), v, quantity.value().location())));
            ok &= value.isPresent();
        }
        return ok;
    }
}

package dev.countercheck.submission;

import dev.countercheck.input.Node;
import dev.countercheck.submission.PileCap.CastAgainst;
import dev.countercheck.submission.PileCap.SelfWeight;
import dev.countercheck.submission.Values.Bound;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Reads one {@code type: pile-cap} element. An element that lacks an item every check needs (its
 * plan, depth, piles, column, and actions with a ULS case or else characteristic loads) but is otherwise
 * readable becomes an {@link IncompleteElement} naming what is missing; whatever it does give is still
 * validated.
 */
public final class PileCapBinder {

    private static final List<String> KEYS = List.of("id", "type", "description", "materials", "plan", "depth",
            "cast_against", "self_weight", "piles", "column", "actions", "loads", "reinforcement", "claims",
            "punching_beta");
    private static final List<String> CASTING_KEYS = List.of("bottom", "sides");

    /** Reads pile caps for the reader. */
    public static final ElementBinder BINDER = new ElementBinder(KEYS, PileCapChecks.CATALOGUE) {
        @Override
        Optional<ElementInput> read(Values values, MaterialsBinder materialsBinder, Fields f, String id,
                                    String description, MaterialsBinder.Draft fileMaterials) {
            return new PileCapBinder(values, materialsBinder).read(f, id, description, fileMaterials);
        }
    };

    private final Values values;
    private final MaterialsBinder materialsBinder;

    PileCapBinder(Values values, MaterialsBinder materialsBinder) {
        this.values = values;
        this.materialsBinder = materialsBinder;
    }

    /** The element, or empty when it has errors (they are in the problems). */
    Optional<ElementInput> read(Fields f, String id, String description, MaterialsBinder.Draft fileMaterials) {
        Optional<Materials> materials = materialsBinder.complete(f.fields("materials", MaterialsBinder.KEYS)
                .map(materialsBinder::read).orElse(MaterialsBinder.Draft.NONE).over(fileMaterials), f);
        Optional<Plan> plan = f.fields("plan", Plan.KEYS).flatMap(Plan::read);
        Optional<Double> depth = f.quantity("depth", Dimension.LENGTH, Bound.POSITIVE);
        Optional<PileCap.Casting> castAgainst = casting(f);
        Optional<SelfWeight> selfWeight = f.choice("self_weight", Values.options(SelfWeight.values()), SelfWeight.ADD);
        Optional<PileGroup> piles = f.fields("piles", PileGroupBinder.KEYS)
                .flatMap(p -> new PileGroupBinder(values).read(p, plan, depth));
        Optional<Column> column = f.fields("column", ColumnBinder.KEYS)
                .flatMap(c -> new ColumnBinder(values).read(c, plan));
        Optional<List<ActionCase>> actions = f.get("actions")
                .flatMap(n -> new ActionsBinder(values).read(n, f.path("actions")));
        Optional<List<CharacteristicLoad>> loads = f.has("loads")
                ? f.get("loads").flatMap(n -> new LoadsBinder(values).read(n, f.path("loads")))
                : Optional.of(List.of());
        Optional<Double> punchingBeta = f.quantity("punching_beta", Dimension.NUMBER, Bound.POSITIVE)
                .filter(beta -> atLeastOne(f, beta));
        Optional<Reinforcement> reinforcement = f.fields("reinforcement", ReinforcementBinder.KEYS)
                .flatMap(r -> new ReinforcementBinder(values).read(r, plan, depth));
        Optional<ClaimsBinder.Claims> claims = f.has("claims")
                ? f.get("claims").flatMap(n -> new ClaimsBinder(values).read(n, f.path("claims"), PileCapChecks.CATALOGUE))
                : Optional.of(ClaimsBinder.Claims.NONE);

        List<String> missing = ActionsBinder.missing(f, List.of("plan", "depth", "piles", "column"), actions, loads);
        if (values.problems().any()) {
            return Optional.empty();
        }
        if (!missing.isEmpty()) {
            return Optional.of(new IncompleteElement(id, PileCap.TYPE, description, f.location(), List.copyOf(missing)));
        }
        return Optional.of(new PileCap(id, description, f.location(), materials.orElseThrow(),
                plan.orElseThrow().xMm(), plan.orElseThrow().yMm(), depth.orElseThrow(), castAgainst.orElseThrow(),
                selfWeight.orElseThrow(), piles.orElseThrow(), column.orElseThrow(), actions.orElse(List.of()),
                reinforcement, claims.orElseThrow().method(), withBeta(claims.orElseThrow().claims(), punchingBeta, f),
                loads.orElseThrow()));
    }

    /**
     * {@code cast_against}: a plain value is the bottom face (the sides are then taken as formed), a
     * mapping {@code {bottom, sides}} names each; absent, the bottom is on blinding.
     */
    private Optional<PileCap.Casting> casting(Fields f) {
        Map<String, CastAgainst> all = Values.options(CastAgainst.values());
        if (!f.has("cast_against")) {
            return Optional.of(PileCap.Casting.bottomOnly(CastAgainst.BLINDING));
        }
        Optional<Node> node = f.get("cast_against");
        if (node.isPresent() && !(node.get() instanceof Node.MapNode)) {
            return values.choice(node.get(), f.path("cast_against"), "cast_against", all)
                    .map(PileCap.Casting::bottomOnly);
        }
        return node.flatMap(n -> Fields.of(n, f.path("cast_against"), values, CASTING_KEYS)).flatMap(c -> {
            Map<String, CastAgainst> sides = new LinkedHashMap<>(all);
            sides.remove("blinding");
            Optional<CastAgainst> bottom = c.choice("bottom", all, CastAgainst.BLINDING);
            Optional<CastAgainst> side = c.has("sides")
                    ? c.get("sides").flatMap(n -> values.choice(n, c.path("sides"), "cast_against.sides", sides))
                    : Optional.of(CastAgainst.FORMWORK);
            return bottom.flatMap(b -> side.map(sd -> new PileCap.Casting(b, sd, c.has("sides"))));
        });
    }

    /** A stated {@code punching_beta} is the claim {@code punching-face.beta} (unless claimed there too). */
    private static List<Claim> withBeta(List<Claim> claims, Optional<Double> beta, Fields f) {
        if (beta.isEmpty() || claims.stream().anyMatch(c -> c.checkId().equals("punching-face")
                && c.quantity().equals("beta"))) {
            return claims;
        }
        List<Claim> all = new ArrayList<>(claims);
        all.add(new Claim("punching-face", "beta", beta.get(), f.get("punching_beta").orElseThrow().location()));
        return List.copyOf(all);
    }

    private boolean atLeastOne(Fields f, double beta) {
        if (beta < 1) {
            values.error(f.get("punching_beta").orElseThrow(), f.path("punching_beta"),
                    "β must be at least 1 (EN 1992-1-1 6.4.3(3)), found " + Values.format(beta));
        }
        return beta >= 1;
    }
}

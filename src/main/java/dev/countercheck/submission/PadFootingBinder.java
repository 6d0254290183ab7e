package dev.countercheck.submission;

import dev.countercheck.submission.PadFooting.Soil;
import dev.countercheck.submission.PileCap.CastAgainst;
import dev.countercheck.submission.Values.Bound;

import java.util.List;
import java.util.Optional;

/**
 * Reads one {@code type: pad-footing} element. An element that lacks an item every check needs (its
 * plan, depth, column, and actions with a ULS case or else characteristic loads) but is otherwise readable becomes an
 * {@link IncompleteElement} naming what is missing; whatever it does give is still validated.
 */
public final class PadFootingBinder {

    private static final List<String> KEYS = List.of("id", "type", "description", "materials", "plan", "depth",
            "cast_against", "soil", "column", "actions", "loads", "reinforcement", "claims");
    private static final List<String> SOIL_KEYS = List.of("allowable_bearing", "overburden", "unit_weight", "phi_k",
            "c_k", "cu_k", "gamma_k", "phi_cv_k", "groundwater_depth");
    /** Annex D's factors grow without bound as φ' nears 90°; no real soil reaches this angle. */
    private static final double PHI_LIMIT_DEG = 50;
    private static final double DEFAULT_UNIT_WEIGHT = 18;

    /** Reads pad footings for the reader. */
    public static final ElementBinder BINDER = new ElementBinder(KEYS, PadFootingChecks.CATALOGUE) {
        @Override
        Optional<ElementInput> read(Values values, MaterialsBinder materialsBinder, Fields f, String id,
                                    String description, MaterialsBinder.Draft fileMaterials) {
            return new PadFootingBinder(values, materialsBinder).read(f, id, description, fileMaterials);
        }
    };

    private final Values values;
    private final MaterialsBinder materialsBinder;

    PadFootingBinder(Values values, MaterialsBinder materialsBinder) {
        this.values = values;
        this.materialsBinder = materialsBinder;
    }

    /** The element, or empty when it has errors (they are in the problems). */
    Optional<ElementInput> read(Fields f, String id, String description, MaterialsBinder.Draft fileMaterials) {
        Optional<Materials> materials = materialsBinder.complete(f.fields("materials", MaterialsBinder.KEYS)
                .map(materialsBinder::read).orElse(MaterialsBinder.Draft.NONE).over(fileMaterials), f);
        Optional<Plan> plan = f.fields("plan", Plan.KEYS).flatMap(Plan::read);
        Optional<Double> depth = f.quantity("depth", Dimension.LENGTH, Bound.POSITIVE);
        Optional<CastAgainst> castAgainst = f.choice("cast_against", Values.options(CastAgainst.values()),
                CastAgainst.BLINDING);
        Optional<Optional<Soil>> soil = f.has("soil")
                ? f.fields("soil", SOIL_KEYS).flatMap(this::soil).map(Optional::of)
                : Optional.of(Optional.empty());
        Optional<Column> column = f.fields("column", ColumnBinder.KEYS)
                .flatMap(c -> new ColumnBinder(values).read(c, plan));
        Optional<List<ActionCase>> actions = f.get("actions")
                .flatMap(n -> new ActionsBinder(values).read(n, f.path("actions")));
        Optional<List<CharacteristicLoad>> loads = f.has("loads")
                ? f.get("loads").flatMap(n -> new LoadsBinder(values).read(n, f.path("loads")))
                : Optional.of(List.of());
        Optional<Reinforcement> reinforcement = f.fields("reinforcement", ReinforcementBinder.KEYS)
                .flatMap(r -> new ReinforcementBinder(values).read(r, plan, depth));
        Optional<ClaimsBinder.Claims> claims = f.has("claims")
                ? f.get("claims").flatMap(n -> new ClaimsBinder(values).read(n, f.path("claims"),
                PadFootingChecks.CATALOGUE, false))
                : Optional.of(ClaimsBinder.Claims.NONE);

        List<String> missing = ActionsBinder.missing(f, List.of("plan", "depth", "column"), actions, loads);
        if (values.problems().any() || soil.isEmpty()) {
            return Optional.empty();
        }
        if (!missing.isEmpty()) {
            return Optional.of(new IncompleteElement(id, PadFooting.TYPE, description, f.location(),
                    List.copyOf(missing)));
        }
        return Optional.of(new PadFooting(id, description, f.location(), materials.orElseThrow(),
                plan.orElseThrow().xMm(), plan.orElseThrow().yMm(), depth.orElseThrow(), castAgainst.orElseThrow(),
                soil.get(), column.orElseThrow(), actions.orElse(List.of()), reinforcement, claims.orElseThrow().claims(),
                loads.orElseThrow()));
    }

    private Optional<Soil> soil(Fields f) {
        Optional<Optional<Double>> allowable = optional(f, "allowable_bearing", Dimension.PRESSURE, Bound.POSITIVE);
        Optional<Double> overburden = f.quantity("overburden", Dimension.LENGTH, Bound.NON_NEGATIVE, 0);
        Optional<Double> unitWeight = f.quantity("unit_weight", Dimension.UNIT_WEIGHT, Bound.POSITIVE,
                DEFAULT_UNIT_WEIGHT);
        Optional<Optional<Double>> phi = angle(f, "phi_k");
        Optional<Optional<Double>> c = optional(f, "c_k", Dimension.PRESSURE, Bound.NON_NEGATIVE);
        Optional<Optional<Double>> cu = optional(f, "cu_k", Dimension.PRESSURE, Bound.POSITIVE);
        Optional<Optional<Double>> gamma = optional(f, "gamma_k", Dimension.UNIT_WEIGHT, Bound.POSITIVE);
        Optional<Optional<Double>> phiCv = angle(f, "phi_cv_k");
        Optional<Optional<Double>> water = optional(f, "groundwater_depth", Dimension.LENGTH, Bound.NON_NEGATIVE);
        if (allowable.isEmpty() || overburden.isEmpty() || unitWeight.isEmpty() || phi.isEmpty() || c.isEmpty()
                || cu.isEmpty() || gamma.isEmpty() || phiCv.isEmpty() || water.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Soil(allowable.get(), overburden.get(), unitWeight.get(), phi.get(), c.get(), cu.get(),
                gamma.get(), phiCv.get(), water.get()));
    }

    /** An optional quantity: empty inside when absent, empty outside when written wrongly (reported). */
    private static Optional<Optional<Double>> optional(Fields f, String key, Dimension dimension, Bound bound) {
        return f.has(key) ? f.quantity(key, dimension, bound).map(Optional::of) : Optional.of(Optional.empty());
    }

    /** An optional angle of shearing resistance, above 0° and below {@value #PHI_LIMIT_DEG}°. */
    private Optional<Optional<Double>> angle(Fields f, String key) {
        Optional<Optional<Double>> angle = optional(f, key, Dimension.ANGLE, Bound.POSITIVE);
        if (angle.isPresent() && angle.get().isPresent() && angle.get().get() >= PHI_LIMIT_DEG) {
            values.error(f.get(key).orElseThrow(), f.path(key), "an angle of shearing resistance of "
                    + Values.format(angle.get().get()) + "° is not a soil's: give one below "
                    + Values.format(PHI_LIMIT_DEG) + "°");
            return Optional.empty();
        }
        return angle;
    }
}

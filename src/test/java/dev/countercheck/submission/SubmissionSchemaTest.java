package dev.countercheck.submission;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.countercheck.cli.CountercheckCommand;
import dev.countercheck.submission.ActionCase.Kind;
import dev.countercheck.element.ElementKinds;
import dev.countercheck.submission.CheckCatalogue.CheckSpec;
import dev.countercheck.submission.CheckCatalogue.QuantitySpec;
import dev.countercheck.submission.Column.ColumnShape;
import dev.countercheck.submission.PileCap.CastAgainst;
import dev.countercheck.submission.PileCap.SelfWeight;
import dev.countercheck.submission.PileCap.TieMethod;
import dev.countercheck.submission.Reinforcement.BarEnds;
import dev.countercheck.submission.Reinforcement.Direction;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The published schema, {@code schema/submission.schema.json}, is written by hand (so that its
 * descriptions help the engineer in the editor) and kept in step with the reader by this test:
 * the keys of every mapping are the keys its binder accepts, the choices are the reader's, the
 * claims are the check catalogue's, the quantities carry the reader's units and limits, and the
 * list and count limits are the reader's. A key, choice, check or limit added on one side only
 * fails here.
 */
@SuppressWarnings("unchecked")
class SubmissionSchemaTest {

    static final Path SCHEMA = Path.of("schema/submission.schema.json");
    private static final ObjectMapper JSON = new ObjectMapper();

    private final JsonNode schema = read();

    /** Each mapping of the schema (a JSON pointer) and the binder list of the keys it may hold. */
    private static final Map<String, KeyList> MAPPINGS = mappings();

    /** A binder's list of keys: class and field name, read by reflection so that the reader stays as it is. */
    record KeyList(Class<?> owner, String field) {
        List<String> keys() {
            return (List<String>) SubmissionSchemaTest.staticField(owner, field);
        }
    }

    private static Map<String, KeyList> mappings() {
        Map<String, KeyList> m = new LinkedHashMap<>();
        m.put("", new KeyList(SubmissionBinder.class, "KEYS"));
        m.put("/properties/project", new KeyList(SubmissionBinder.class, "PROJECT_KEYS"));
        m.put("/properties/basis", new KeyList(SubmissionBinder.class, "BASIS_KEYS"));
        m.put("/$defs/materials", new KeyList(MaterialsBinder.class, "KEYS"));
        m.put("/$defs/pile-cap", new KeyList(PileCapBinder.class, "KEYS"));
        m.put("/$defs/pile-cap/properties/plan", new KeyList(Plan.class, "KEYS"));
        m.put("/$defs/pad-footing", new KeyList(PadFootingBinder.class, "KEYS"));
        m.put("/$defs/pad-footing/properties/plan", new KeyList(Plan.class, "KEYS"));
        m.put("/$defs/pad-footing/properties/soil", new KeyList(PadFootingBinder.class, "SOIL_KEYS"));
        m.put("/$defs/casting", new KeyList(PileCapBinder.class, "CASTING_KEYS"));
        m.put("/$defs/piles", new KeyList(PileGroupBinder.class, "KEYS"));
        m.put("/$defs/piles/properties/capacity", new KeyList(PileGroupBinder.class, "CAPACITY_KEYS"));
        m.put("/$defs/column", new KeyList(ColumnBinder.class, "KEYS"));
        m.put("/$defs/column/properties/starter_bars", new KeyList(ColumnBinder.class, "STARTER_KEYS"));
        m.put("/$defs/action", new KeyList(ActionsBinder.class, "KEYS"));
        m.put("/$defs/load", new KeyList(LoadsBinder.class, "KEYS"));
        m.put("/$defs/reinforcement", new KeyList(ReinforcementBinder.class, "KEYS"));
        m.put("/$defs/reinforcement/properties/cover", new KeyList(ReinforcementBinder.class, "COVER_KEYS"));
        m.put("/$defs/reinforcement/properties/sides", new KeyList(ReinforcementBinder.class, "SIDE_KEYS"));
        m.put("/$defs/bar-set", new KeyList(ReinforcementBinder.class, "BAR_KEYS"));
        m.put("/$defs/bar-set/properties/lap", new KeyList(ReinforcementBinder.class, "LAP_KEYS"));
        return m;
    }

    private static final List<Class<?>> BINDERS = List.of(SubmissionBinder.class, MaterialsBinder.class,
            PileCapBinder.class, PadFootingBinder.class, Plan.class, PileGroupBinder.class, ColumnBinder.class, ActionsBinder.class, LoadsBinder.class,
            ReinforcementBinder.class, ClaimsBinder.class);

    @Test
    void everyMappingHoldsExactlyTheKeysItsBinderAccepts() {
        MAPPINGS.forEach((pointer, keys) -> {
            JsonNode mapping = schema.at(pointer);
            assertThat(names(mapping.get("properties"))).as("keys of %s", pointer.isEmpty() ? "the file" : pointer)
                    .containsExactlyInAnyOrderElementsOf(keys.keys());
            assertThat(mapping.get("additionalProperties").asBoolean(true))
                    .as("%s refuses unknown keys, as the reader does", pointer).isFalse();
        });
    }

    @Test
    void everyKeyListOfTheReaderHasItsMappingInTheSchemaAndNoOtherMappingExists() {
        Set<KeyList> declared = new HashSet<>();
        for (Class<?> binder : BINDERS) {
            for (Field f : binder.getDeclaredFields()) {
                if (Modifier.isStatic(f.getModifiers()) && f.getName().endsWith("KEYS")) {
                    declared.add(new KeyList(binder, f.getName()));
                }
            }
        }
        // A shared key list (a plan) may stand at several places in the schema.
        assertThat(Set.copyOf(MAPPINGS.values())).as("every key list of a binder is mapped to the schema")
                .containsExactlyInAnyOrderElementsOf(declared);

        List<String> schemaMappings = new ArrayList<>();
        collectMappings(schema, "", schemaMappings);
        schemaMappings.removeIf(p -> p.startsWith("/$defs/claims"));
        assertThat(schemaMappings).as("every mapping of the schema corresponds to a key list of the reader")
                .containsExactlyInAnyOrderElementsOf(MAPPINGS.keySet());
    }

    @Test
    void choicesAreTheReaders() {
        Map<String, Collection<?>> choices = new LinkedHashMap<>();
        choices.put("/$defs/materials/properties/concrete", ((Map<?, ?>) staticField(MaterialsBinder.class, "CLASSES")).keySet());
        choices.put("/$defs/materials/properties/exposure/items", ((Map<?, ?>) staticField(MaterialsBinder.class, "EXPOSURE")).keySet());
        choices.put("/$defs/materials/properties/structural_class", ((Map<?, ?>) staticField(MaterialsBinder.class, "STRUCTURAL")).keySet());
        choices.put("/$defs/pile-cap/properties/cast_against/anyOf/0", Values.options(CastAgainst.values()).keySet());
        choices.put("/$defs/casting/properties/bottom", Values.options(CastAgainst.values()).keySet());
        choices.put("/$defs/casting/properties/sides", List.of("soil", "formwork"));
        choices.put("/$defs/pad-footing/properties/cast_against", Values.options(CastAgainst.values()).keySet());
        choices.put("/$defs/pile-cap/properties/self_weight", Values.options(SelfWeight.values()).keySet());
        choices.put("/$defs/column/properties/shape", Values.options(ColumnShape.values()).keySet());
        choices.put("/$defs/action/properties/kind", Values.options(Kind.values()).keySet());
        choices.put("/$defs/load/properties/source", ((Map<?, ?>) staticField(LoadsBinder.class, "SOURCES")).keySet());
        choices.put("/$defs/load/properties/category", ((Map<?, ?>) staticField(LoadsBinder.class, "CATEGORIES")).keySet());
        choices.put("/$defs/bar-set/properties/direction", Values.options(Direction.values()).keySet());
        choices.put("/$defs/bar-set/properties/ends", Values.options(BarEnds.values()).keySet());
        choices.put("/$defs/claims/properties/method", Values.options(TieMethod.values()).keySet());
        choices.forEach((pointer, expected) -> assertThat(texts(schema.at(pointer).get("enum"))).as(pointer)
                .containsExactlyElementsOf(expected.stream().map(String::valueOf).toList()));

        List<String> kinds = new ArrayList<>();
        schema.at("/properties/elements/items/oneOf").forEach(ref -> kinds.add(schema.at(ref.get("$ref").asText()
                .substring(1) + "/properties/type/const").asText()));
        assertThat(kinds).as("the element types the reader supports, one definition each")
                .containsExactlyElementsOf(ElementKinds.binders().stream().map(ElementBinder::type).toList());
        assertThat(schema.at("/properties/countercheck/const").asInt()).isEqualTo(SubmissionBinder.FORMAT_VERSION);
        for (String kind : kinds) {
            assertThat(schema.at("/$defs/" + kind + "/properties/id/pattern").asText())
                    .isEqualTo("^" + staticField(SubmissionBinder.class, "ID") + "$");
        }
    }

    @Test
    void claimsAreTheCataloguesChecksAndQuantitiesInTheirUnits() {
        assertClaims("/$defs/claims/properties", PileCapChecks.CATALOGUE, Set.of("method"));
        assertClaims("/$defs/claims-pad-footing/properties", PadFootingChecks.CATALOGUE, Set.of());
    }

    private void assertClaims(String pointer, CheckCatalogue catalogue, Set<String> others) {
        JsonNode claims = schema.at(pointer);
        Map<String, CheckSpec> checks = catalogue.checks();
        Set<String> expected = new TreeSet<>(checks.keySet());
        expected.addAll(others);
        assertThat(new TreeSet<>(names(claims))).as(pointer).isEqualTo(expected);
        checks.values().forEach(check -> {
            JsonNode quantities = claims.get(check.id()).get("properties");
            assertThat(names(quantities)).as(check.id())
                    .containsExactlyElementsOf(check.quantities().stream().map(QuantitySpec::name).toList());
            for (QuantitySpec q : check.quantities()) {
                assertThat(quantities.get(q.name()).get("$ref").asText()).as(check.id() + "." + q.name())
                        .isEqualTo(definitionOf(Dimension.ofCatalogueUnit(q.unit())));
            }
            assertThat(claims.get(check.id()).get("additionalProperties").asBoolean(true)).isFalse();
        });
    }

    @Test
    void quantitiesTakeTheReadersUnitsWithinItsLimits() {
        for (Dimension d : Dimension.values()) {
            JsonNode forms = schema.at(definitionOf(d).substring(1) + "/anyOf");
            assertThat(forms.get(0).get("maximum").asDouble()).as(d + " limit").isEqualTo(d.limit());
            assertThat(forms.get(0).get("minimum").asDouble()).as(d + " limit").isEqualTo(-d.limit());
            String units = d.units().stream().map(Dimension.Unit::symbol).collect(Collectors.joining("|"));
            assertThat(forms.get(1).get("pattern").asText()).as(d + " units")
                    .isEqualTo("^\\s*[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?\\s*(" + units + ")?\\s*$");
        }
    }

    @Test
    void listAndCountLimitsAreTheReaders() {
        Map<String, Integer> limits = new LinkedHashMap<>();
        limits.put("/properties/elements/maxItems", Limits.ELEMENTS);
        limits.put("/$defs/piles/properties/positions/maxItems", Limits.PILES);
        limits.put("/$defs/pile-cap/properties/actions/maxItems", Limits.ACTION_CASES);
        limits.put("/$defs/pad-footing/properties/actions/maxItems", Limits.ACTION_CASES);
        limits.put("/$defs/reinforcement/properties/bottom/maxItems", Limits.BAR_SETS);
        limits.put("/$defs/reinforcement/properties/top/maxItems", Limits.BAR_SETS);
        limits.put("/$defs/bar-set/properties/count/maximum", Limits.BARS_IN_A_SET);
        limits.put("/$defs/column/properties/starter_bars/properties/count/maximum", Limits.STARTER_BARS);
        limits.put("/$defs/materials/properties/exposure/maxItems",
                ((Map<?, ?>) staticField(MaterialsBinder.class, "EXPOSURE")).size());
        limits.put("/$defs/text/maxLength", dev.countercheck.input.TreeParser.MAX_TEXT_CHARS);
        limits.forEach((pointer, limit) -> assertThat(schema.at(pointer).asInt()).as(pointer).isEqualTo(limit));
    }

    @Test
    void theSchemaCommandPrintsThePublishedFile() throws IOException {
        StringWriter out = new StringWriter();
        int code = CountercheckCommand.commandLine().setOut(new PrintWriter(out)).execute("schema");

        assertThat(code).isZero();
        assertThat(out.toString()).isEqualTo(Files.readString(SCHEMA, StandardCharsets.UTF_8));
    }

    static String definitionOf(Dimension d) {
        return "#/$defs/" + d.name().toLowerCase(java.util.Locale.ROOT);
    }

    /** The JSON pointers of every object schema with {@code properties}, outside the quantity definitions. */
    private static void collectMappings(JsonNode node, String pointer, List<String> found) {
        if (!node.isObject()) {
            if (node.isArray()) {
                for (int i = 0; i < node.size(); i++) {
                    collectMappings(node.get(i), pointer + "/" + i, found);
                }
            }
            return;
        }
        if (node.has("properties") && node.path("type").asText().equals("object")) {
            found.add(pointer);
        }
        for (Map.Entry<String, JsonNode> e : node.properties()) {
            boolean inProperties = pointer.endsWith("/properties");
            if (!inProperties && (e.getKey().equals("if") || e.getKey().equals("then")
                    || e.getKey().equals("dependentSchemas"))) {
                continue; // conditions refine a mapping's keys; they declare none of their own
            }
            collectMappings(e.getValue(), pointer + "/" + e.getKey().replace("~", "~0").replace("/", "~1"), found);
        }
    }

    private static List<String> names(JsonNode object) {
        List<String> names = new ArrayList<>();
        object.fieldNames().forEachRemaining(names::add);
        return names;
    }

    private static List<String> texts(JsonNode array) {
        List<String> texts = new ArrayList<>();
        array.forEach(n -> texts.add(n.asText()));
        return texts;
    }

    static Object staticField(Class<?> owner, String name) {
        try {
            Field f = owner.getDeclaredField(name);
            f.setAccessible(true);
            return f.get(null);
        } catch (ReflectiveOperationException e) {
            throw new AssertionError(owner.getSimpleName() + "." + name + " is what this test compares the schema with", e);
        }
    }

    private static JsonNode read() {
        try {
            return JSON.readTree(Files.readString(SCHEMA, StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }
}

package dev.countercheck.ruleset;

import dev.countercheck.input.SourceLocation;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A check defined by a ruleset: derived quantities, the quantities it reports and its requirements,
 * evaluated once per subject of its scope.
 *
 * @param id            the check id, with {@code {dir}} standing for the subject (e.g. {@code min-steel-{dir}})
 * @param elementTypes  the element types it applies to ({@code applies_to}, e.g. {@code [pile-cap]})
 * @param scope         which variables it sees and which subjects it runs over
 * @param appliesWhen   a boolean expression; when false the check is not-applicable with {@code notApplicable}
 * @param derived       derived quantities in evaluation order (the loader sorts them by dependency)
 * @param values        the check's reported quantities, each a variable or derived name
 * @param requirements  what must hold
 * @param cautions      cautions to show when their condition holds
 * @param variants      what the check says otherwise for some of its element types ({@code for:}), by type
 * @param origin        the ruleset file that defined the check
 */
public record CheckDef(String id, List<String> elementTypes, String scope, Optional<String> appliesWhen, String notApplicable,
                       List<DerivedDef> derived, List<String> values, List<RequirementDef> requirements,
                       List<CautionDef> cautions, Map<String, Variant> variants, String origin,
                       SourceLocation location) {

    /**
     * What a check shared by several element types says otherwise for one of them ({@code for: <type>:}): the
     * formula or clause of some derived quantities (symbol and unit stay the check's) and the message or clause
     * of some requirements. Everything else is the check's own.
     *
     * @param derived      the derived quantities it restates, by name
     * @param requirements the requirements' words it restates, by finding name
     */
    public record Variant(Map<String, DerivedDef> derived, Map<String, Words> requirements) {
    }

    /**
     * A requirement's message and clause as a variant restates them (each empty when the variant keeps the
     * requirement's own), with where the variant writes the message (else the restated requirement).
     */
    public record Words(Optional<String> message, Optional<String> clause, SourceLocation location) {
    }

    /** A caution shown with the check when {@code when} is true. */
    public record CautionDef(String when, String text, SourceLocation location) {
    }

    /** A named formula over variables, parameters, tables and other derived quantities. */
    public record DerivedDef(String name, String symbol, String formula, String unit, String clause,
                             SourceLocation location) {
    }

    /**
     * A requirement: {@code that} must be true. When it is not, the check fails with a finding of
     * {@code severity} and {@code message}, in which {@code {name}} is replaced by the value of name.
     *
     * @param finding     what is wrong when it fails, the last part of the finding's id ({@code cover-bottom}):
     *                    the requirement's {@code finding}, else the first name in {@code that}, hyphenated
     * @param utilisation a number expression (demand/capacity) to report, when given
     */
    public record RequirementDef(String that, String finding, String severity, Optional<String> utilisation,
                                 String message, String clause, SourceLocation location) {
    }

    /**
     * The check as it runs for {@code elementType}: its variant's derived quantities and requirements' words in
     * place of its own (in the same order), or the check itself when the type has no variant.
     */
    public CheckDef forType(String elementType) {
        Variant v = variants.get(elementType);
        if (v == null) {
            return this;
        }
        List<DerivedDef> d = derived.stream().map(x -> v.derived().getOrDefault(x.name(), x)).toList();
        List<RequirementDef> r = requirements.stream().map(x -> Optional.ofNullable(v.requirements().get(x.finding()))
                .map(w -> new RequirementDef(x.that(), x.finding(), x.severity(), x.utilisation(),
                        w.message().orElse(x.message()), w.clause().orElse(x.clause()), x.location()))
                .orElse(x)).toList();
        return new CheckDef(id, elementTypes, scope, appliesWhen, notApplicable, d, values, r, cautions, Map.of(),
                origin, location);
    }

    /** The check with its derived quantities in {@code ordered} (the same quantities, in evaluation order). */
    CheckDef withDerived(List<DerivedDef> ordered) {
        return new CheckDef(id, elementTypes, scope, appliesWhen, notApplicable, ordered, values, requirements, cautions,
                variants, origin, location);
    }

    /** The id for one subject: {@code {dir}} replaced. */
    public String idFor(String subject) {
        return id.replace("{dir}", subject);
    }
}

package dev.countercheck.ruleset;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * The effective ruleset: a ruleset file with everything it {@code extends} resolved.
 *
 * @param id          the id of the most specific file
 * @param title       its title
 * @param standard    the standard and annex it represents
 * @param version     its own version
 * @param digest      the hash over the contents of every file of the chain, most general first, in hex ({@link
 *                    #sha256()}), worked out when first asked for (a validation never asks)
 * @param files       the files of the chain, most general first
 * @param parameters  every parameter by name, with the file that set its value
 * @param tables      every table by name, with the file that set it
 * @param checks      the checks the ruleset defines, by id template, in file order
 * @param rules       the rule of each check a ruleset defines, by element type and check id
 * @param severities  the severity of each kind of finding the engine raises, by kind
 * @param expressions the evaluator for the rules' expressions, with the tables as functions
 * @param options     the methods the ruleset chooses, by name
 */
public record Ruleset(String id, String title, String standard, String version, Supplier<String> digest, List<String> files,
                      Map<String, Parameter> parameters, Map<String, TableDef> tables, Map<String, CheckDef> checks,
                      Map<String, Map<String, Rule>> rules, Map<String, SeverityDef> severities,
                      RuleExpressions expressions, Map<String, RuleOption> options) {

    /** The SHA-256 hash over the contents of every file of the chain, most general first, in hex. */
    public String sha256() {
        return digest.get();
    }

    /** The choice of option {@code name}; every option the engine offers is validated at load. */
    public RuleOption option(String name) {
        RuleOption o = options.get(name);
        if (o == null) {
            throw new IllegalStateException("ruleset " + id + " sets no option '" + name
                    + "' (the loader should have refused it)");
        }
        return o;
    }

    /** The rule for check {@code checkId} of {@code elementType}, when the ruleset defines one. */
    public Optional<Rule> rule(String elementType, String checkId) {
        return Optional.ofNullable(rules.getOrDefault(elementType, Map.of()).get(checkId));
    }

    /** The parameter {@code name}; every name the engine asks for is validated at load. */
    public Parameter parameter(String name) {
        Parameter p = parameters.get(name);
        if (p == null) {
            throw new IllegalStateException("ruleset " + id + " has no parameter '" + name
                    + "' (the loader should have refused it)");
        }
        return p;
    }

    /** The severity label of findings of {@code kind}; every kind the engine raises is validated at load. */
    public String severity(String kind) {
        SeverityDef s = severities.get(kind);
        if (s == null) {
            throw new IllegalStateException("ruleset " + id + " gives no severity to '" + kind
                    + "' (the loader should have refused it)");
        }
        return s.severity();
    }

    public double number(String name) {
        return parameter(name).value();
    }

    /**
     * The parameters and tables the chain marks {@code source: from-memory}, each as
     * "name = value unit (clause; file)" or "table name (clause; file)", for the review's assumptions.
     */
    public List<String> recalled() {
        List<String> out = new java.util.ArrayList<>();
        parameters.values().stream().filter(p -> p.source().recalled()).forEach(p -> out.add(p.name() + " = "
                + dev.countercheck.eurocode.Num.f(p.value()) + ("-".equals(p.unit()) ? "" : " " + p.unit()) + " ("
                + p.clause() + "; " + p.origin() + ")"));
        tables.values().stream().filter(t -> t.source().recalled()).forEach(t -> out.add("table " + t.name() + " ("
                + t.clause() + "; " + t.origin() + ")"));
        return List.copyOf(out);
    }
}

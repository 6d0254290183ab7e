package dev.countercheck.cli;

import dev.countercheck.eurocode.Num;
import dev.countercheck.ruleset.CheckDef;
import dev.countercheck.ruleset.Parameter;
import dev.countercheck.ruleset.RuleOption;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.SeverityDef;
import dev.countercheck.ruleset.RulesetException;
import dev.countercheck.ruleset.TableDef;
import dev.countercheck.ruleset.ValueSource;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;

/**
 * {@code rules}: every parameter, table and check of the effective ruleset with its clause and the
 * file that set it. {@code --format markdown} writes the rule reference the docs include.
 */
@Command(name = RulesCommand.NAME, mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "List every parameter, table and rule of the effective ruleset, with its clause and origin.")
public final class RulesCommand implements Callable<Integer> {

    /** The sub-command's name on the command line. */
    static final String NAME = "rules";

    /** Output formats of the listing. */
    enum Format { text, markdown }

    @Option(names = "--ruleset", paramLabel = "ID|PATH", defaultValue = Rulesets.DEFAULT,
            description = "Ruleset id or path (default: ${DEFAULT-VALUE}).")
    String ruleset;

    @Option(names = "--rulesets-dir", paramLabel = "DIR",
            description = "The checker's rulesets folder: ids are looked up here before the bundled rulesets.")
    java.util.Optional<java.nio.file.Path> rulesetsDir;

    @Option(names = "--format", defaultValue = "text", description = "text or markdown (default: ${DEFAULT-VALUE}).")
    Format format;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        Ruleset r;
        try {
            r = new Rulesets(rulesetsDir, spec.commandLine().getErr()).load(ruleset);
        } catch (RulesetException e) {
            e.errors().forEach(spec.commandLine().getErr()::println);
            return ExitCodes.UNUSABLE;
        }
        if (format == Format.markdown) {
            markdown(r, out);
        } else {
            text(r, out);
        }
        out.flush();
        return ExitCodes.OK;
    }

    private static void text(Ruleset r, PrintWriter out) {
        out.println(r.id() + ": " + r.title() + " (" + r.standard() + ", version " + r.version() + ")");
        out.println("files: " + String.join(" <- ", r.files()));
        out.println();
        out.println("PARAMETERS");
        for (Parameter p : r.parameters().values()) {
            out.printf("%-34s %-18s %10s %-6s %s  [%s]%s%n", p.name(), p.symbol(), Num.f(p.value()), p.unit(),
                    p.clause(), p.origin(), mark(p.source()));
        }
        out.println();
        out.println("OPTIONS");
        for (RuleOption o : r.options().values()) {
            out.printf("%-34s %-24s %s  [%s]%n", o.name(), o.value(), o.clause(), o.origin());
        }
        out.println();
        out.println("SEVERITIES");
        for (SeverityDef v : r.severities().values()) {
            out.printf("%-22s %-9s %s  [%s]%n", v.kind(), v.severity(), v.meaning(), v.origin());
        }
        out.println();
        out.println("TABLES");
        for (TableDef t : r.tables().values()) {
            out.printf("%-26s %-10s %-4s %s  [%s]%s%n", t.name(), t.symbol(), t.unit(), t.clause(), t.origin(),
                    mark(t.source()));
        }
        for (CheckDef c : r.checks().values()) {
            out.println();
            out.println("CHECK " + c.id() + " (" + String.join(", ", c.elementTypes()) + "; scope " + c.scope() + ")  ["
                    + c.origin() + "]");
            c.appliesWhen().ifPresent(w -> out.println("  applies when " + w));
            for (CheckDef.DerivedDef d : c.derived()) {
                out.printf("  %-14s = %s  [%s] %s%n", d.symbol(), d.formula(), d.unit(), d.clause());
                restated(c, d).forEach((type, own) -> out.printf("    for %s: %s  %s%n", type, own.formula(),
                        own.clause()));
            }
            for (CheckDef.RequirementDef q : c.requirements()) {
                out.printf("  requires %s  (%s %s, %s%s)%n", q.that(), q.finding(), q.severity(), q.clause(),
                        ownMessages(c, q));
            }
        }
    }

    /** The element types that restate derived quantity {@code d} of check {@code c} ({@code for:}), with their own. */
    private static Map<String, CheckDef.DerivedDef> restated(CheckDef c, CheckDef.DerivedDef d) {
        Map<String, CheckDef.DerivedDef> out = new LinkedHashMap<>();
        c.variants().forEach((type, v) -> Optional.ofNullable(v.derived().get(d.name()))
                .ifPresent(r -> out.put(type, r)));
        return out;
    }

    /** "; its own message (clause) for TYPE" for each element type that restates the requirement, else nothing. */
    private static String ownMessages(CheckDef c, CheckDef.RequirementDef q) {
        StringBuilder out = new StringBuilder();
        c.variants().forEach((type, v) -> Optional.ofNullable(v.requirements().get(q.finding())).ifPresent(w -> {
            out.append("; for ").append(type).append(w.message().isPresent() ? " its own message" : "");
            w.clause().ifPresent(clause -> out.append(w.message().isPresent() ? " and " : " ").append(clause));
        }));
        return out.toString();
    }

    /** The mark of a value recalled from memory, as the listing shows it after the value's line. */
    private static String mark(ValueSource source) {
        return source.recalled() ? " (" + ValueSource.MARK + ")" : "";
    }

    private static void markdown(Ruleset r, PrintWriter out) {
        out.println("# Ruleset " + r.id());
        out.println();
        out.println(r.title() + ". " + r.standard() + ", version " + r.version() + ".");
        out.println("Files, most general first: " + String.join(", ", r.files()) + ".");
        out.println();
        out.println("## Parameters");
        out.println();
        out.println("| parameter | symbol | value | unit | clause | note | set in |");
        out.println("|---|---|---|---|---|---|---|");
        for (Parameter p : r.parameters().values()) {
            out.println("| `" + p.name() + "` | " + p.symbol() + " | " + Num.f(p.value()) + " | " + p.unit() + " | "
                    + p.clause() + " | " + p.note() + mark(p.source()) + " | " + p.origin() + " |");
        }
        out.println();
        out.println("## Options");
        out.println();
        out.println("The methods the ruleset chooses among those the review offers.");
        out.println();
        out.println("| option | choice | clause | note | set in |");
        out.println("|---|---|---|---|---|");
        for (RuleOption o : r.options().values()) {
            out.println("| `" + o.name() + "` | `" + o.value() + "` | " + o.clause() + " | " + o.note() + " | "
                    + o.origin() + " |");
        }
        out.println();
        out.println("## Severities");
        out.println();
        out.println("The severity of each kind of finding the review raises (a requirement below states its own).");
        out.println();
        out.println("| kind | severity | meaning | set in |");
        out.println("|---|---|---|---|");
        for (SeverityDef v : r.severities().values()) {
            out.println("| `" + v.kind() + "` | " + v.severity() + " | " + v.meaning() + " | " + v.origin() + " |");
        }
        out.println();
        out.println("## Tables");
        out.println();
        for (TableDef t : r.tables().values()) {
            out.println("### `" + t.name() + "` (" + t.symbol() + ", " + t.unit() + ")");
            out.println();
            out.println(t.clause() + ". " + t.note() + (t.interpolate() ? " Rows interpolated linearly." : "")
                    + t.beyond().map(v -> " A blank cell or a row beyond the last reads " + Num.f(v) + ".").orElse("")
                    + " Set in " + t.origin() + "." + mark(t.source()));
            out.println();
            out.println("| row | " + String.join(" | ", t.columns()) + " |");
            out.println("|---" + "|---".repeat(t.columns().size()) + "|");
            t.rows().forEach((row, cells) -> out.println("| " + row + " | " + String.join(" | ", cells.stream()
                    .map(c -> c.map(Num::f).orElse("–")).toList()) + " |"));
            out.println();
        }
        out.println("## Checks");
        for (CheckDef c : r.checks().values()) {
            out.println();
            out.println("### `" + c.id() + "`");
            out.println();
            out.println("For " + String.join(", ", c.elementTypes()) + "; scope `" + c.scope() + "`; defined in "
                    + c.origin() + "."
                    + c.appliesWhen().map(w -> " Applies when `" + w + "`, else not applicable: " + c.notApplicable()
                    + ".").orElse(""));
            out.println();
            out.println("| quantity | formula | unit | clause |");
            out.println("|---|---|---|---|");
            for (CheckDef.DerivedDef d : c.derived()) {
                out.println("| " + d.symbol() + " (`" + d.name() + "`) | `" + d.formula().replace("|", "\\|") + "` | "
                        + d.unit() + " | " + d.clause() + " |");
                restated(c, d).forEach((type, own) -> out.println("| " + d.symbol() + " (`" + d.name() + "`), for "
                        + type + " | `" + own.formula().replace("|", "\\|") + "` | " + d.unit() + " | " + own.clause()
                        + " |"));
            }
            out.println();
            for (CheckDef.RequirementDef q : c.requirements()) {
                out.println("- requires `" + q.that().replace("|", "\\|") + "` (finding `" + q.finding() + "`, "
                        + q.severity() + ", " + q.clause() + ownMessages(c, q) + ")");
            }
        }
    }
}

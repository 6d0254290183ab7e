package dev.countercheck.cli;

import dev.countercheck.eurocode.Num;
import dev.countercheck.ruleset.Parameter;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.io.PrintWriter;
import java.util.concurrent.Callable;

/** {@code rules}: lists every parameter of the effective ruleset with its clause and the file that set it. */
@Command(name = "rules", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "List every parameter of the effective ruleset, with its clause and origin.")
public final class RulesCommand implements Callable<Integer> {

    /** Output formats of the listing. */
    enum Format { text, markdown }

    @Option(names = "--ruleset", paramLabel = "ID|PATH", defaultValue = Rulesets.DEFAULT,
            description = "Ruleset id or path (default: ${DEFAULT-VALUE}).")
    String ruleset;

    @Option(names = "--format", defaultValue = "text", description = "text or markdown (default: ${DEFAULT-VALUE}).")
    Format format;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        Ruleset r;
        try {
            r = new Rulesets().load(ruleset);
        } catch (RulesetException e) {
            e.errors().forEach(spec.commandLine().getErr()::println);
            return ExitCodes.UNUSABLE;
        }
        if (format == Format.markdown) {
            out.println("# Ruleset " + r.id());
            out.println();
            out.println(r.title() + ". " + r.standard() + ", version " + r.version() + ".");
            out.println("Files, most general first: " + String.join(", ", r.files()) + ".");
            out.println();
            out.println("| parameter | symbol | value | unit | clause | note | set in |");
            out.println("|---|---|---|---|---|---|---|");
            for (Parameter p : r.parameters().values()) {
                out.println("| `" + p.name() + "` | " + p.symbol() + " | " + Num.f(p.value()) + " | " + p.unit() + " | "
                        + p.clause() + " | " + p.note() + " | " + p.origin() + " |");
            }
        } else {
            out.println(r.id() + ": " + r.title() + " (" + r.standard() + ", version " + r.version() + ")");
            out.println("files: " + String.join(" <- ", r.files()));
            for (Parameter p : r.parameters().values()) {
                out.printf("%-34s %-18s %10s %-6s %s  [%s]%n", p.name(), p.symbol(), Num.f(p.value()), p.unit(),
                        p.clause(), p.origin());
            }
        }
        out.flush();
        return ExitCodes.OK;
    }
}

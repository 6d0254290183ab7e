package dev.countercheck.cli;

import dev.countercheck.actions.Combination;
import dev.countercheck.element.Combinations;
import dev.countercheck.element.ElementKinds;
import dev.countercheck.eurocode.Num;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetException;
import dev.countercheck.submission.ElementInput;
import dev.countercheck.submission.Submission;
import dev.countercheck.submission.SubmissionException;
import dev.countercheck.submission.SubmissionReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

/** {@code combine FILE}: prints the combinations generated from each element's characteristic loads. */
@Command(name = CombineCommand.NAME, mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Print the EN 1990 combinations generated from the characteristic loads (loads:) of each"
                + " element: as text, or as YAML to paste under the element's actions. Exit 0, 2 for unusable"
                + " input, 3 on an internal error.")
public final class CombineCommand implements Callable<Integer> {

    /** The sub-command's name on the command line. */
    static final String NAME = "combine";

    /** How the combinations are printed. */
    enum Format { TEXT, YAML }

    @Parameters(arity = "1", paramLabel = "FILE", description = "A submission file (YAML or JSON).")
    Path file;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "text (default) or yaml (ready to paste as actions).",
            converter = FormatConverter.class)
    Format format;

    @picocli.CommandLine.Mixin
    RulesetOptions rulesetOptions;

    @picocli.CommandLine.Mixin
    Console console;

    @Override
    public Integer call() {
        PrintWriter out = console.out();
        PrintWriter err = console.err();
        try {
            Submission s = new SubmissionReader(ElementKinds.binders()).read(file);
            Ruleset rules = rulesetOptions.rulesets(err).of(s, rulesetOptions.ruleset);
            for (ElementInput e : s.elements()) {
                if (e.loads().isEmpty()) {
                    out.println("# " + e.id() + ": no characteristic loads");
                    continue;
                }
                List<Combination> all = Combinations.of(e.loads(), rules).all();
                out.println("# " + e.id() + ": " + all.size() + " combinations (ruleset " + rules.id() + ")"
                        + (format == Format.YAML ? "; as actions they take γG,sup and γG,inf on the own weight as"
                        + " every designer's case does" : ""));
                all.forEach(c -> out.println(format == Format.YAML ? yaml(c) : text(c)));
            }
            return ExitCodes.OK;
        } catch (SubmissionException e) {
            e.errors().forEach(err::println);
            return ExitCodes.UNUSABLE;
        } catch (RulesetException e) {
            e.errors().forEach(err::println);
            return ExitCodes.UNUSABLE;
        } catch (IllegalArgumentException e) {
            err.println("countercheck combine: " + e.getMessage());
            return ExitCodes.UNUSABLE;
        }
    }

    private static String text(Combination c) {
        return String.format(Locale.ROOT, "%-20s %-48s N %s  Mx %s  My %s  Hx %s  Hy %s  own weight × %s%n    %s",
                c.kind().label(), c.name(), Num.f(c.effects().n()), Num.f(c.effects().mx()), Num.f(c.effects().my()),
                Num.f(c.effects().hx()), Num.f(c.effects().hy()), Num.f(c.selfWeightFactor()), c.trace().substituted());
    }

    /** One item of an {@code actions:} list; accidental combinations are ULS cases. */
    private static String yaml(Combination c) {
        String kind = c.kind() == Combination.Kind.ACCIDENTAL ? "uls" : c.kind().label();
        return "  - {name: \"" + c.name() + "\", kind: " + kind + ", N: " + exact(c.effects().n()) + ", Mx: "
                + exact(c.effects().mx()) + ", My: " + exact(c.effects().my()) + ", Hx: " + exact(c.effects().hx())
                + ", Hy: " + exact(c.effects().hy()) + "}";
    }

    /** A value to 0.01 (kN, kNm), so that pasted cases review as generated. */
    private static String exact(double v) {
        return java.math.BigDecimal.valueOf(v).setScale(2, java.math.RoundingMode.HALF_UP).stripTrailingZeros()
                .toPlainString();
    }

    /** {@code text} or {@code yaml}, in any case. */
    static final class FormatConverter implements picocli.CommandLine.ITypeConverter<Format> {
        @Override
        public Format convert(String value) {
            return Format.valueOf(value.toUpperCase(Locale.ROOT));
        }
    }
}

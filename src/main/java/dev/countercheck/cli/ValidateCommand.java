package dev.countercheck.cli;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.ruleset.RulesetException;
import dev.countercheck.submission.ElementInput;
import dev.countercheck.submission.IncompleteElement;
import dev.countercheck.submission.Submission;
import dev.countercheck.submission.SubmissionException;
import dev.countercheck.submission.SubmissionReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

/** {@code validate FILE...}: reads and validates submissions, writes nothing. */
@Command(name = ValidateCommand.NAME, mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Read and validate submissions, and the ruleset each would be reviewed with, without reviewing them."
                + " Exit 0 when all are usable, 2 otherwise, 3 on an internal error.")
public final class ValidateCommand implements Callable<Integer> {

    /** The sub-command's name on the command line. */
    static final String NAME = "validate";

    @Parameters(arity = "1..*", paramLabel = "FILE", description = "Submission files (YAML or JSON) or folders of them.")
    List<Path> files;

    @Mixin
    RulesetOptions rulesetOptions;

    @Mixin
    Console console;

    @Override
    public Integer call() {
        PrintWriter out = console.out();
        PrintWriter err = console.err();
        int status = ExitCodes.OK;
        List<Path> inputs;
        try {
            inputs = SubmissionFiles.expand(files);
        } catch (UsageException e) {
            err.println("countercheck validate: " + e.getMessage());
            return ExitCodes.UNUSABLE;
        }
        Rulesets rulesets = rulesetOptions.rulesets(err);
        for (Path file : inputs) {
            try {
                Submission s = new SubmissionReader(ElementKinds.binders()).read(file);
                rulesets.of(s, rulesetOptions.ruleset);
                long incomplete = s.elements().stream().filter(e -> e instanceof IncompleteElement).count();
                out.println(file + ": valid, " + s.elements().size() + " element" + (s.elements().size() == 1 ? "" : "s")
                        + (incomplete > 0 ? " (" + incomplete + " incomplete)" : ""));
                for (ElementInput e : s.elements()) {
                    if (e instanceof IncompleteElement inc) {
                        out.println("  " + inc.location() + ": " + inc.id() + " is incomplete; missing: "
                                + String.join(", ", inc.missing()));
                    }
                }
            } catch (SubmissionException e) {
                e.errors().forEach(err::println);
                err.println(file + ": invalid (" + e.errors().size() + " error" + (e.errors().size() == 1 ? "" : "s")
                        + ")");
                status = ExitCodes.UNUSABLE;
            } catch (RulesetException e) {
                e.errors().forEach(err::println);
                err.println(file + ": the ruleset cannot be used");
                status = ExitCodes.UNUSABLE;
            }
        }
        return status;
    }
}

package dev.countercheck.cli;

import picocli.CommandLine.Option;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Optional;

/**
 * The options of the commands that apply a ruleset to a submission ({@code review}, {@code validate},
 * {@code combine}): the ruleset named on the command line, and the checker's rulesets folder.
 */
final class RulesetOptions {

    @Option(names = "--ruleset", paramLabel = "ID|PATH",
            description = "Ruleset to apply (an id or a file) in place of the one the submission names in"
                    + " basis.ruleset (" + Rulesets.DEFAULT + " when it names none).")
    Optional<String> ruleset;

    @Option(names = "--rulesets-dir", paramLabel = "DIR",
            description = "The checker's rulesets folder: ids are looked up here before the bundled rulesets.")
    Optional<Path> rulesetsDir;

    /** The rulesets of this run; a local ruleset that replaces a bundled one is announced on {@code console}. */
    Rulesets rulesets(PrintWriter console) {
        return new Rulesets(rulesetsDir, console);
    }
}

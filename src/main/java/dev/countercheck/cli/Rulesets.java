package dev.countercheck.cli;

import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetException;
import dev.countercheck.ruleset.RulesetLoader;
import dev.countercheck.submission.Submission;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * Loads rulesets for the commands, once each per run. A submission names a ruleset by id only; the
 * command line may name an id or a file. Ids are looked up in the checker's {@code --rulesets-dir}
 * (when given), then among the rulesets bundled with the tool, never in the working folder; a
 * local file that replaces a bundled ruleset is announced on the console (and named in the report).
 */
final class Rulesets {

    static final String DEFAULT = "en1992-recommended";

    private final RulesetLoader loader;
    private final PrintWriter console;
    private final Map<String, Ruleset> loaded = new HashMap<>();

    /**
     * @param folder  the checker's rulesets folder, if any
     * @param console where a local ruleset that replaces a bundled one is announced
     */
    Rulesets(Optional<Path> folder, PrintWriter console) {
        this.loader = new RulesetLoader(folder, ProjectReviewer.RULE_VOCABULARY);
        this.console = console;
    }

    /** A ruleset named on the command line: an id or a path. */
    Ruleset load(String reference) throws RulesetException {
        Ruleset r = loaded.get(reference);
        return r != null ? r : announced(reference, loader.load(reference));
    }

    /**
     * The ruleset of a review: the one named on the command line when there is one, else the one
     * the submission names (an id only), else the default.
     */
    Ruleset of(Submission submission, Optional<String> commandLine) throws RulesetException {
        if (commandLine.isPresent()) {
            return load(commandLine.get());
        }
        if (submission.ruleset().isEmpty() || submission.rulesetAt().isEmpty()) {
            return load(DEFAULT);
        }
        String id = submission.ruleset().get();
        Ruleset r = loaded.get(id);
        return r != null ? r : announced(id, loader.loadId(id, submission.rulesetAt().get()));
    }

    private Ruleset announced(String reference, Ruleset r) {
        loaded.put(reference, r);
        r.files().stream().filter(f -> f.contains(RulesetLoader.SHADOWS)).forEach(f -> console.println(
                "ruleset " + reference + ": using " + f));
        return r;
    }
}

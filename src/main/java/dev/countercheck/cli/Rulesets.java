package dev.countercheck.cli;

import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetException;
import dev.countercheck.ruleset.RulesetLoader;

import dev.countercheck.input.SourceLocation;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/** Loads rulesets for the commands, once each per run: ./rulesets first, then those bundled with the tool. */
final class Rulesets {

    static final String DEFAULT = "en1992-recommended";

    private final RulesetLoader loader = new RulesetLoader(Path.of("rulesets"),
            ProjectReviewer.RULE_VOCABULARY);
    private final Map<String, Ruleset> loaded = new HashMap<>();

    Ruleset load(String reference) throws RulesetException {
        return load(reference, Optional.empty());
    }

    /** @param at where the reference was written, when it came from a submission */
    Ruleset load(String reference, Optional<SourceLocation> at) throws RulesetException {
        Ruleset r = loaded.get(reference);
        if (r == null) {
            r = loader.load(reference, at);
            loaded.put(reference, r);
        }
        return r;
    }
}

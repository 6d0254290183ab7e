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
import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;

/**
 * Loads rulesets for the commands, once each per run. A submission names a ruleset by id only; the
 * command line may name an id or a file. Ids are looked up in the checker's {@code --rulesets-dir}
 * (when given), then among the rulesets bundled with the tool, never in the working folder; a
 * local file that replaces a bundled ruleset is announced on the console (and named in the report).
 */
final class Rulesets {

    static final String DEFAULT = "en1992-recommended";

    /** The bundled default ruleset, when {@link #loadAhead()} started loading it. */
    private static volatile Optional<FutureTask<Ruleset>> ahead = Optional.empty();

    private final Optional<Path> folder;
    private final RulesetLoader loader;
    private final PrintWriter console;
    private final Map<String, Ruleset> loaded = new HashMap<>();

    /**
     * @param folder  the checker's rulesets folder, if any
     * @param console where a local ruleset that replaces a bundled one is announced
     */
    Rulesets(Optional<Path> folder, PrintWriter console) {
        this.folder = folder;
        this.loader = new RulesetLoader(folder, ProjectReviewer.RULE_VOCABULARY);
        this.console = console;
    }

    /**
     * Starts loading the bundled default ruleset on a background thread, so that reading and validating
     * it (a good part of a short run's start-up) overlaps the reading of the command line and the
     * submission on a second core. A command without a rulesets folder takes it when it asks for that
     * ruleset; when the load failed, or another ruleset is asked for, it is not used (the command loads
     * what it needs itself, with its own errors), and the work done ahead has only warmed the loader up.
     * The thread then runs {@code then}, more work the command will need (a review's report template),
     * whose failure is left for the command to meet where it does that work itself.
     */
    static void loadAhead(Runnable then) {
        FutureTask<Ruleset> task = new FutureTask<>(() ->
                new RulesetLoader(Optional.empty(), ProjectReviewer.RULE_VOCABULARY).load(DEFAULT));
        Thread thread = new Thread(() -> {
            task.run();
            try {
                then.run();
            } catch (RuntimeException | Error e) {
                // only a head start: the command does this work again where it needs it, and reports its failure
            }
        }, "countercheck-ruleset-ahead");
        thread.setDaemon(true);
        thread.start();
        ahead = Optional.of(task);
    }

    /** A ruleset named on the command line: an id or a path. */
    Ruleset load(String reference) throws RulesetException {
        return once(reference, () -> loader.load(reference));
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
        return once(id, () -> loader.loadId(id, submission.rulesetAt().get()));
    }

    /** How a ruleset is loaded when it is neither loaded already nor loaded ahead. */
    @FunctionalInterface
    private interface Load {
        Ruleset load() throws RulesetException;
    }

    /** The ruleset {@code reference}: as loaded before in this run, else as loaded ahead, else by {@code load}. */
    private Ruleset once(String reference, Load load) throws RulesetException {
        Ruleset r = loaded.get(reference);
        if (r != null) {
            return r;
        }
        Optional<Ruleset> early = loadedAhead(reference);
        return announced(reference, early.isPresent() ? early.get() : load.load());
    }

    /** The default ruleset loaded ahead, when it is {@code id}'s, this command has no rulesets folder and it loaded. */
    private Optional<Ruleset> loadedAhead(String id) {
        if (!id.equals(DEFAULT) || folder.isPresent() || ahead.isEmpty()) {
            return Optional.empty();
        }
        try {
            return Optional.of(ahead.get().get());
        } catch (ExecutionException e) {
            return Optional.empty();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return Optional.empty();
        }
    }

    private Ruleset announced(String reference, Ruleset r) {
        loaded.put(reference, r);
        r.files().stream().filter(f -> f.contains(RulesetLoader.SHADOWS)).forEach(f -> console.println(
                "ruleset " + reference + ": using " + f));
        return r;
    }
}

package dev.countercheck.round;

import dev.countercheck.input.UnusableInputException;
import dev.countercheck.input.InputError;
import dev.countercheck.input.Node;
import dev.countercheck.input.Node.Entry;
import dev.countercheck.input.Node.MapNode;
import dev.countercheck.input.Node.ScalarNode;
import dev.countercheck.input.Problems;
import dev.countercheck.input.Suggestions;
import dev.countercheck.input.TreeParser;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * The project folder's review settings, {@value #NAME}: {@code checker} and {@code review_ref} for the
 * sign-off page, so that a checker need not type them on every run. Options on the command line win.
 */
public final class SignOffFile {

    public static final String NAME = "countercheck-review.yaml";
    private static final List<String> KEYS = List.of("checker", "review_ref");
    private static final long MAX_BYTES = 64 * 1024;

    private SignOffFile() {
    }

    /** The sign-off the folder's file states, or none when there is no file. */
    public static SignOff read(Path folder) throws UnusableInputException {
        Path file = folder.resolve(NAME);
        if (!Files.isRegularFile(file)) {
            return SignOff.none();
        }
        byte[] bytes = UnusableInputException.readBounded(file, MAX_BYTES, "a review settings file");
        Problems problems = new Problems(file.toString());
        Optional<Node> root = new TreeParser(problems).parse(bytes, file.toString());
        Optional<String> checker = Optional.empty();
        Optional<String> ref = Optional.empty();
        if (root.isPresent() && root.get() instanceof MapNode map) {
            for (Entry e : map.entries()) {
                if (!KEYS.contains(e.key())) {
                    problems.add(e.keyLocation(), e.key(), "unknown key '" + e.key() + "'"
                            + Suggestions.hint(e.key(), KEYS));
                } else if (!(e.value() instanceof ScalarNode s) || s.text().isBlank()) {
                    problems.add(e.value().location(), e.key(), "expected a name or reference as text");
                } else if (e.key().equals("checker")) {
                    checker = Optional.of(s.text().strip());
                } else {
                    ref = Optional.of(s.text().strip());
                }
            }
        } else if (root.isPresent()) {
            problems.add(root.get().location(), "", "expected checker: and review_ref: keys");
        }
        if (problems.any()) {
            throw new UnusableInputException(problems.sorted().stream().map(InputError::toString).toList());
        }
        return new SignOff(checker, ref);
    }
}

package dev.countercheck.submission;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.input.InputError;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

/**
 * Every file in {@code src/test/resources/submissions/bad/} must be rejected with the errors it
 * announces. A YAML file announces them in its first lines, one {@code # expect: <line>:<column>
 * <part of the message>} comment each; a file that cannot hold a comment (JSON, an empty file) has
 * the same lines in a sidecar {@code <name>.expect}. Adding a case is adding a file.
 */
class BadSubmissionsTest {

    private static final Path BAD = Path.of("src/test/resources/submissions/bad");
    private static final Pattern EXPECT = Pattern.compile("# expect: (\\d+):(\\d+) (.+)");
    /** A Java class name in a message (a leaked exception), e.g. {@code java.io.EOFException}. */
    private static final Pattern CLASS_NAME = Pattern.compile("\\b[a-z]+\\.[a-z]+\\.[A-Za-z.]*[A-Z]\\w*");

    record Expected(int line, int column, String message) {
    }

    static Stream<Path> badFiles() throws IOException {
        try (Stream<Path> files = Files.list(BAD)) {
            List<Path> list = files.filter(f -> !f.toString().endsWith(".expect")).sorted().toList();
            assertThat(list).as("bad-input fixtures").hasSizeGreaterThanOrEqualTo(25);
            return list.stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badFiles")
    void isRejectedWithTheAnnouncedErrors(Path file) throws IOException {
        List<Expected> expected = expectations(file);
        assertThat(expected).as("the file announces at least one error").isNotEmpty();

        SubmissionException e = catchThrowableOfType(SubmissionException.class,
                () -> new SubmissionReader(ElementKinds.binders()).read(file));

        assertThat(e).as("a SubmissionException").isNotNull();
        for (Expected x : expected) {
            assertThat(e.errors()).as("errors of %s", file.getFileName()).anySatisfy(error -> {
                assertThat(error.location().file()).isEqualTo(file.toString());
                assertThat(error.location().line()).isEqualTo(x.line());
                assertThat(error.location().column()).isEqualTo(x.column());
                assertThat(error.toString()).contains(x.message());
            });
        }
        for (InputError error : e.errors()) {
            assertThat(error.message()).as("no Java internals in %s", error)
                    .doesNotContain("Exception")
                    .doesNotContainPattern(CLASS_NAME);
            assertThat(error.toString()).startsWith(file + ":" + error.location().line() + ":"
                    + error.location().column() + ": ");
        }
    }

    private static List<Expected> expectations(Path file) throws IOException {
        String name = file.getFileName().toString();
        Path sidecar = file.resolveSibling(name.substring(0, name.lastIndexOf('.')) + ".expect");
        List<String> lines = Files.exists(sidecar) ? Files.readAllLines(sidecar, StandardCharsets.UTF_8)
                : headerLines(file);
        List<Expected> expected = new ArrayList<>();
        for (String line : lines) {
            Matcher m = EXPECT.matcher(line);
            if (!m.matches()) {
                break;
            }
            expected.add(new Expected(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)), m.group(3)));
        }
        return expected;
    }

    /** The lines of a file; bytes that are not UTF-8 (a case further down) do not stop the header being read. */
    private static List<String> headerLines(Path file) throws IOException {
        return new String(Files.readAllBytes(file), StandardCharsets.UTF_8).lines().toList();
    }
}

package dev.countercheck.submission;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.input.InputError;
import dev.countercheck.input.Shown;
import dev.countercheck.input.TreeParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

/**
 * Input that no fixture file can hold: files beyond the reading limits, devices, folders, and
 * the byte-order marks that make a file valid. The corpus in {@code submissions/bad/} holds the rest.
 */
class HostileSubmissionsTest {

    private static final Path GOOD = Path.of("src/test/resources/submissions/good");

    @TempDir
    Path folder;

    private final SubmissionReader reader = new SubmissionReader(ElementKinds.binders());

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"harbour-lane-utf8-bom.yaml", "harbour-lane-utf16le-bom.yaml", "harbour-lane-utf16be-bom.yaml"})
    void aFileWithAByteOrderMarkReadsAsTheSameFileWithout(String name) throws SubmissionException {
        Submission plain = reader.read(GOOD.resolve("harbour-lane.yaml"));
        Submission marked = reader.read(GOOD.resolve(name));

        // Every value and every location (line and column) is the same; only the file and its bytes differ.
        assertThat(marked.toString().replace(marked.file(), "FILE").replace(marked.sha256(), "SHA"))
                .isEqualTo(plain.toString().replace(plain.file(), "FILE").replace(plain.sha256(), "SHA"));
    }

    @Test
    void aYamlDocumentBeyondTheSizeLimitIsRefusedAtItsPlace() throws IOException {
        Path file = folder.resolve("huge.yaml");
        Files.writeString(file, "countercheck: 1\nproject:\n  title: " + "x".repeat(100) + "\n"
                + ("# " + "padding ".repeat(12) + "\n").repeat(TreeParser.MAX_DOCUMENT_CHARS / 99 + 1000));

        InputError error = onlyError(file);

        assertThat(error.message()).startsWith("reading limit exceeded").contains(String.valueOf(TreeParser.MAX_DOCUMENT_CHARS));
        assertThat(error.location().line()).isPositive();
    }

    @Test
    void aJsonDocumentBeyondTheSizeLimitIsRefusedAtItsPlace() throws IOException {
        Path file = folder.resolve("huge.json");
        String text = "\"" + "x".repeat(TreeParser.MAX_TEXT_CHARS - 10) + "\", ";
        Files.writeString(file, "{\"countercheck\": 1, \"elements\": ["
                + text.repeat(TreeParser.MAX_DOCUMENT_CHARS / text.length() + 10) + "0]}");

        InputError error = onlyError(file);

        assertThat(error.message()).startsWith("reading limit exceeded: Document length")
                .contains(String.valueOf(TreeParser.MAX_DOCUMENT_CHARS));
        assertThat(error.location().line()).isEqualTo(1);
    }

    @Test
    void aDocumentOfTooManyTokensIsRefusedWhereTheLimitIsReached() throws IOException {
        Path file = folder.resolve("many.json");
        Files.writeString(file, "{\"countercheck\": 1, \"elements\": [" + "0,".repeat(TreeParser.MAX_TOKENS) + "0]}");

        InputError error = onlyError(file);

        assertThat(error.message()).startsWith("reading limit exceeded: Token count")
                .contains(String.valueOf(TreeParser.MAX_TOKENS));
        assertThat(error.path()).as("the list being read").isEqualTo("elements");
    }

    @Test
    void aFileBeyondTheByteLimitIsNotReadAtAll() throws IOException {
        Path file = folder.resolve("enormous.yaml");
        Files.write(file, new byte[SubmissionReader.MAX_BYTES + 1]);

        InputError error = onlyError(file);

        assertThat(error.message()).contains("larger than 64 MB");
        assertThat(error.location().line()).isEqualTo(1);
    }

    @Test
    void aDeviceIsNotReadAsASubmission() {
        Path device = Path.of("/dev/zero");
        assumeTrue(Files.exists(device), "a system with /dev/zero, which never ends");

        assertThat(onlyError(device).message()).contains("not a regular file");
    }

    @Test
    void aFolderIsNotASubmission() {
        assertThat(onlyError(folder).message()).isEqualTo("this is a folder, not a submission file");
    }

    @Test
    void aMissingFileIsNamed() {
        assertThat(onlyError(folder.resolve("absent.yaml")).message()).isEqualTo("no such file");
    }

    @Test
    void anAliasBombIsRefusedAtTheFirstAliasWithoutExpandingIt() throws IOException {
        // 30 levels of nine aliases each would expand to 9^30 items.
        StringBuilder bomb = new StringBuilder("countercheck: 1\nl0: &l0 [lol, lol, lol, lol, lol, lol, lol, lol, lol]\n");
        for (int level = 1; level <= 30; level++) {
            String previous = "*l" + (level - 1);
            bomb.append("l").append(level).append(": &l").append(level).append(" [")
                    .append(String.join(", ", java.util.Collections.nCopies(9, previous))).append("]\n");
        }
        Path file = folder.resolve("bomb.yaml");
        Files.writeString(file, bomb.toString(), StandardCharsets.UTF_8);

        InputError error = onlyError(file);

        assertThat(error.toString()).endsWith(":3:10: l1[0]: YAML aliases ('*l0') are not supported: write the value out");
    }

    @Test
    void aMessageShowsInputTextWithControlCharactersWrittenOutAndLongTextCut() {
        assertThat(Shown.text("red\u001B[31m\u202Eevil")).isEqualTo("red\\u001B[31m\\u202Eevil");
        assertThat(Shown.text("x".repeat(Shown.MAX_CODE_POINTS))).isEqualTo("x".repeat(Shown.MAX_CODE_POINTS));
        assertThat(Shown.text("x".repeat(Shown.MAX_CODE_POINTS + 1)))
                .isEqualTo("x".repeat(Shown.MAX_CODE_POINTS) + "… (61 characters)");
    }

    private InputError onlyError(Path file) {
        SubmissionException e = catchThrowableOfType(SubmissionException.class, () -> reader.read(file));
        assertThat(e).as("refused").isNotNull();
        assertThat(e.errors()).hasSize(1);
        return e.errors().get(0);
    }
}

package dev.countercheck.report;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class ReportFilesTest {

    @TempDir
    Path folder;

    @Test
    void writesUtf8AndLeavesNoTemporaryFile() throws IOException {
        Path target = folder.resolve("review.html");

        ReportFiles.writeAtomically(target, "Σ P_i·x_i ≤ VRd,c\n");

        assertThat(Files.readString(target, StandardCharsets.UTF_8)).isEqualTo("Σ P_i·x_i ≤ VRd,c\n");
        assertThat(names(folder)).containsExactly("review.html");
    }

    @Test
    void writesBytesAsGiven() throws IOException {
        Path target = folder.resolve("review.pdf");
        byte[] bytes = {'%', 'P', 'D', 'F', 0, (byte) 0xff, '\n'};

        ReportFiles.writeAtomically(target, bytes);

        assertThat(Files.readAllBytes(target)).isEqualTo(bytes);
        assertThat(names(folder)).containsExactly("review.pdf");
    }

    @Test
    void replacesAnExistingFile() throws IOException {
        Path target = folder.resolve("review.json");
        Files.writeString(target, "an older and longer result that must disappear entirely");

        ReportFiles.writeAtomically(target, "{}\n");

        assertThat(Files.readString(target)).isEqualTo("{}\n");
        assertThat(names(folder)).containsExactly("review.json");
    }

    @Test
    void createsAMissingFolder() throws IOException {
        Path target = folder.resolve("reports").resolve("review.html");

        ReportFiles.writeAtomically(target, "x");

        assertThat(Files.readString(target)).isEqualTo("x");
    }

    @Test
    void removesTheTemporaryFileWhenTheMoveFails() throws IOException {
        // A non-empty folder cannot be replaced by a file, so the final move fails.
        Path target = folder.resolve("occupied");
        Files.createDirectories(target);
        Files.writeString(target.resolve("keep.txt"), "keep");

        assertThatThrownBy(() -> ReportFiles.writeAtomically(target, "x")).isInstanceOf(IOException.class);

        assertThat(names(folder)).containsExactly("occupied");
        assertThat(Files.readString(target.resolve("keep.txt"))).isEqualTo("keep");
    }

    private static List<String> names(Path folder) throws IOException {
        try (Stream<Path> files = Files.list(folder)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}

package dev.countercheck.report;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * The reports of one submission are replaced together or not at all, only over files the tool
 * wrote, and whatever a failed or killed run leaves is cleaned up.
 */
class OutputSetTest {

    private static final String OLD_JSON = "{\n  \"format\": \"countercheck-result/1\",\n  \"revision\": \"C02\"\n}\n";
    private static final String NEW_JSON = "{\n  \"format\": \"countercheck-result/1\",\n  \"revision\": \"C03\"\n}\n";
    private static final String OLD_HTML = "<!DOCTYPE html>\n<head>\n<meta name=\"generator\" content=\"countercheck 0.1.0\"/>"
            + "\n</head><p>C02</p>\n";
    private static final String NEW_HTML = OLD_HTML.replace("C02", "C03");
    /** A pid no process has: above the largest pid Linux hands out (2^22). */
    private static final long DEAD = 99_999_999L;

    @TempDir
    Path dir;

    private void previous() throws IOException {
        try (OutputSet set = OutputSet.in(dir)) {
            set.add("a.json", OLD_JSON).add("a.html", OLD_HTML).commit();
        }
    }

    @Test
    void aCommittedSetReplacesEveryReportAndLeavesNoOtherFile() throws IOException {
        previous();
        try (OutputSet set = OutputSet.in(dir)) {
            set.add("a.json", NEW_JSON).add("a.html", NEW_HTML).commit();
        }
        assertThat(names()).containsExactly("a.html", "a.json");
        assertThat(Files.readString(dir.resolve("a.json"))).isEqualTo(NEW_JSON);
        assertThat(Files.readString(dir.resolve("a.html"))).isEqualTo(NEW_HTML);
    }

    /** The disk fills while the second report is written: nothing is replaced, nothing is left behind. */
    @Test
    void aWriteThatFailsPartWayReplacesNothingAndRemovesItsTemporaryFiles() throws IOException {
        previous();
        List<Path> attempted = new ArrayList<>();
        OutputSet.Sink fullAfterOne = (file, content) -> {
            attempted.add(file);
            if (attempted.size() == 2) {
                Files.write(file, new byte[] {'{'}); // a part of the file reached the disk
                throw new FileSystemException(file.toString(), null, "No space left on device");
            }
            OutputSet.DISK.write(file, content);
        };

        assertThatThrownBy(() -> {
            try (OutputSet set = OutputSet.in(dir, fullAfterOne)) {
                set.add("a.json", NEW_JSON).add("a.html", NEW_HTML).commit();
            }
        }).isInstanceOf(FileSystemException.class).hasMessageContaining("No space left on device");

        assertThat(attempted).hasSize(2);
        assertThat(names()).as("the previous reports only").containsExactly("a.html", "a.json");
        assertThat(Files.readString(dir.resolve("a.json"))).isEqualTo(OLD_JSON);
        assertThat(Files.readString(dir.resolve("a.html"))).isEqualTo(OLD_HTML);
    }

    @Test
    void writesTextAsUtf8AndBytesAsGivenIntoAFolderItCreates() throws IOException {
        Path folder = dir.resolve("new/reports");
        byte[] bytes = {0, 1, 2, (byte) 0xFF};
        try (OutputSet set = OutputSet.in(folder)) {
            set.add("a.html", "Σ P_i·x_i ≤ VRd,c\n").add("a.pdf", bytes).commit();
        }
        assertThat(Files.readString(folder.resolve("a.html"))).isEqualTo("Σ P_i·x_i ≤ VRd,c\n");
        assertThat(Files.readAllBytes(folder.resolve("a.pdf"))).isEqualTo(bytes);
        try (Stream<Path> files = Files.list(folder)) {
            assertThat(files.map(f -> f.getFileName().toString()).sorted()).containsExactly("a.html", "a.pdf");
        }
    }

    @Test
    void aFolderInThePlaceOfAReportIsRefusedAndNothingIsLeft() throws IOException {
        Files.createDirectories(dir.resolve("a.json"));
        Files.writeString(dir.resolve("a.json/keep.txt"), "keep");

        assertThatThrownBy(() -> {
            try (OutputSet set = OutputSet.in(dir)) {
                set.add("a.html", NEW_HTML).add("a.json", NEW_JSON).commit();
            }
        }).isInstanceOf(IOException.class);

        assertThat(names()).containsExactly("a.json");
        assertThat(Files.readString(dir.resolve("a.json/keep.txt"))).isEqualTo("keep");
    }

    @Test
    void aFileTheToolDidNotWriteIsNeverReplaced() throws IOException {
        Files.writeString(dir.resolve("a.json"), "{\"submission\": \"another firm's data\"}\n");

        assertThatThrownBy(() -> {
            try (OutputSet set = OutputSet.in(dir)) {
                set.add("a.json", NEW_JSON).add("a.html", NEW_HTML).commit();
            }
        }).isInstanceOf(IOException.class).hasMessageContaining("was not written by countercheck");

        assertThat(names()).containsExactly("a.json");
        assertThat(Files.readString(dir.resolve("a.json"))).contains("another firm's data");
    }

    @Test
    void theMarkOfEachKindOfReportIsRecognised() throws IOException {
        Path json = Files.writeString(dir.resolve("r.json"), new JsonResultWriter().write(ReviewFixture.review("x")));
        Path html = Files.writeString(dir.resolve("r.html"), new HtmlReportWriter().write(ReviewFixture.review("x")));
        Path pdf = Files.write(dir.resolve("r.pdf"), new PdfReportWriter().write(ReviewFixture.review("x")));
        Path index = Files.writeString(dir.resolve("index.html"),
                new ReportIndex(ReviewFixture.review("x").tool(), "2026-01-01").html());
        Path foreignPdf = dir.resolve("f.pdf");
        try (PDDocument document = new PDDocument()) {
            document.addPage(new PDPage());
            document.getDocumentInformation().setCreator("a word processor");
            document.save(foreignPdf.toFile());
        }
        Path foreignHtml = Files.writeString(dir.resolve("f.html"), "<html><p>countercheck 0.1.0</p></html>");
        Path foreignJson = Files.writeString(dir.resolve("f.json"), "{\"format\": \"other/1\"}");
        Path other = Files.writeString(dir.resolve("f.csv"), "a,b\n");
        Path link = Files.createSymbolicLink(dir.resolve("l.json"), json);

        assertThat(List.of(json, html, pdf, index, dir.resolve("absent.json"))).allMatch(ReportMarkers::replaceable);
        assertThat(List.of(foreignPdf, foreignHtml, foreignJson, other, link)).noneMatch(ReportMarkers::replaceable);
    }

    @Test
    void theNextRunCompletesASetCommittedByARunThatWasKilled() throws IOException {
        previous();
        String set = DEAD + ".00000000000000aa";
        Files.writeString(dir.resolve(".a.json." + set + ".tmp"), NEW_JSON);
        Files.writeString(dir.resolve(".a.html." + set + ".tmp"), NEW_HTML);
        Files.createFile(dir.resolve(".countercheck." + set + ".set"));

        OutputSet.recover(dir);

        assertThat(names()).containsExactly("a.html", "a.json");
        assertThat(Files.readString(dir.resolve("a.json"))).isEqualTo(NEW_JSON);
        assertThat(Files.readString(dir.resolve("a.html"))).isEqualTo(NEW_HTML);
    }

    @Test
    void theNextRunRemovesTheTemporaryFilesOfAKilledRunButNotThoseOfARunningOne() throws IOException {
        previous();
        Files.writeString(dir.resolve(".a.json." + DEAD + ".00000000000000bb.tmp"), NEW_JSON);
        Files.writeString(dir.resolve(".countercheck-set." + DEAD + ".00000000000000bb.tmp"), "");
        String running = ".a.json." + ProcessHandle.current().pid() + ".00000000000000cc.tmp";
        Files.writeString(dir.resolve(running), NEW_JSON);

        OutputSet.recover(dir);

        assertThat(names()).containsExactly(running, "a.html", "a.json");
        assertThat(Files.readString(dir.resolve("a.json"))).isEqualTo(OLD_JSON);
    }

    private List<String> names() throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(f -> f.getFileName().toString()).sorted().toList();
        }
    }
}

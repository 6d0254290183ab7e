package dev.countercheck.report;

import dev.countercheck.input.UnusableInputException;
import dev.countercheck.responses.ResponseSheetReader;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.function.Predicate;

/**
 * How the tool recognises a file it wrote, so that it replaces its own reports and never a file of
 * someone else's that happens to bear a report's name. Each kind of report carries a mark near its
 * start: the JSON result its {@code "format": "countercheck-result/…"}, an HTML page its {@code
 * <meta name="generator" content="countercheck …">}, a PDF its document information's creator
 * {@code countercheck …}; a response sheet (CSV or workbook) has no mark and is replaced only while no
 * response or status has been written in it; JUnit XML and SARIF name the tool. A new kind of output joins with one entry in {@link #BY_EXTENSION}; a
 * file of a kind not listed is never replaced.
 */
public final class ReportMarkers {

    /** The name every mark starts with. */
    public static final String TOOL = "countercheck";
    /** How much of the start of a text report is read to find its mark. */
    private static final int HEAD_BYTES = 4096;
    /** A PDF larger than this is not opened to look for its mark (the reports are far smaller). */
    private static final long MAX_PDF_BYTES = 200L * 1024 * 1024;

    private static final Map<String, Predicate<Path>> BY_EXTENSION = Map.of(
            ".json", f -> head(f).contains("\"format\": \"" + TOOL + "-result/"),
            ".html", f -> head(f).contains("<meta name=\"generator\" content=\"" + TOOL + " "),
            ".pdf", ReportMarkers::pdfByUs,
            ".csv", ReportMarkers::unansweredResponseSheet,
            ".xlsx", ReportMarkers::unansweredResponseSheet,
            ".xml", f -> head(f).contains("<testsuites name=\"" + TOOL + " "),
            ".sarif", f -> head(f).contains("\"name\" : \"" + TOOL + "\""));

    private ReportMarkers() {
    }

    /** Whether {@code file} may be replaced: it does not exist, or it is a regular file that bears the tool's mark. */
    public static boolean replaceable(Path file) {
        if (!Files.exists(file, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
            return true;
        }
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        int dot = name.lastIndexOf('.');
        Predicate<Path> mark = dot < 0 ? null : BY_EXTENSION.get(name.substring(dot));
        return mark != null && Files.isRegularFile(file, java.nio.file.LinkOption.NOFOLLOW_LINKS) && mark.test(file);
    }

    /**
     * A response sheet is replaced only while nobody has answered in it: a sheet the designer filled in
     * and saved over the blank one in the reports folder is never overwritten by the next review.
     */
    private static boolean unansweredResponseSheet(Path file) {
        try {
            return ResponseSheetReader.read(file).isEmpty();
        } catch (UnusableInputException | RuntimeException e) {
            return false;
        }
    }

    private static String head(Path file) {
        try (InputStream in = Files.newInputStream(file)) {
            return new String(in.readNBytes(HEAD_BYTES), StandardCharsets.UTF_8);
        } catch (IOException e) {
            return "";
        }
    }

    private static boolean pdfByUs(Path file) {
        try {
            if (Files.size(file) > MAX_PDF_BYTES || !head(file).startsWith("%PDF-")) {
                return false;
            }
            try (PDDocument pdf = Loader.loadPDF(file.toFile())) {
                String creator = pdf.getDocumentInformation().getCreator();
                return creator != null && creator.startsWith(TOOL + " ");
            }
        } catch (IOException | RuntimeException e) {
            return false;
        }
    }
}

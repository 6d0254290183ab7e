package dev.countercheck.responses;

import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import org.apache.commons.compress.archivers.zip.ZipArchiveEntry;
import org.apache.commons.compress.archivers.zip.ZipFile;
import org.apache.commons.compress.utils.SeekableInMemoryByteChannel;
import org.dhatim.fastexcel.Workbook;
import org.dhatim.fastexcel.Worksheet;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.regex.Pattern;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;

/**
 * The sheet the designer fills in: one row per finding with its id, element, severity, message and
 * clause, and empty {@code response} and {@code status} columns, as CSV (UTF-8) or as a workbook.
 * Both are byte-identical for the same review.
 */
public final class ResponseSheet {

    /** The columns, in order; the reader finds them by these names in the first row. */
    public static final List<String> COLUMNS = List.of("id", "element", "severity", "message", "clause", "response",
            "status");
    /** The worksheet's name in the workbook. */
    public static final String SHEET = "Responses";
    /** Every entry of the workbook carries this time (the zip format's first), never the clock's. */
    private static final LocalDateTime ENTRY_TIME = LocalDateTime.of(1980, 1, 1, 0, 0);
    private static final Pattern CREATED = Pattern.compile("(<dcterms:created[^>]*>)[^<]*(</dcterms:created>)");

    private ResponseSheet() {
    }

    /** One row per finding, in the review's order. */
    static List<List<String>> rows(Review review) {
        List<List<String>> rows = new ArrayList<>();
        for (ElementReview e : review.elements()) {
            for (Finding f : e.findings()) {
                rows.add(List.of(f.id(), e.id(), f.severity().label(), f.message(), f.basis(), "", ""));
            }
        }
        return rows;
    }

    /** The sheet as CSV: a byte-order mark (so that spreadsheet programs read it as UTF-8), then CRLF records. */
    public static byte[] csv(Review review) {
        StringBuilder s = new StringBuilder("\uFEFF").append(Csv.line(COLUMNS));
        rows(review).forEach(r -> s.append(Csv.line(r)));
        return s.toString().getBytes(StandardCharsets.UTF_8);
    }

    /** The sheet as an .xlsx workbook. */
    public static byte[] xlsx(Review review) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            Workbook wb = new Workbook(out, review.tool().name(), "1.0");
            Worksheet ws = wb.newWorksheet(SHEET);
            for (int c = 0; c < COLUMNS.size(); c++) {
                ws.value(0, c, COLUMNS.get(c));
            }
            ws.range(0, 0, 0, COLUMNS.size() - 1).style().bold().set();
            List<List<String>> rows = rows(review);
            for (int r = 0; r < rows.size(); r++) {
                for (int c = 0; c < COLUMNS.size(); c++) {
                    ws.value(r + 1, c, rows.get(r).get(c));
                }
            }
            int[] widths = {30, 10, 9, 70, 24, 50, 12};
            for (int c = 0; c < widths.length; c++) {
                ws.width(c, widths[c]);
            }
            ws.range(0, 0, Math.max(rows.size(), 1), COLUMNS.size() - 1).style().wrapText(true).set();
            ws.freezePane(0, 1);
            wb.finish();
        } catch (IOException e) {
            throw new UncheckedIOException("writing a workbook in memory failed", e);
        }
        return dated(out.toByteArray(), review.reviewDate());
    }

    /**
     * The same workbook with its creation time stated as the review date (the library writes the clock's time)
     * and every zip entry's time fixed, so that the file is the same for the same review.
     */
    private static byte[] dated(byte[] zip, String reviewDate) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (ZipFile in = ZipFile.builder().setSeekableByteChannel(new SeekableInMemoryByteChannel(zip)).get();
             ZipOutputStream z = new ZipOutputStream(out)) {
            for (ZipArchiveEntry e : Collections.list(in.getEntriesInPhysicalOrder())) {
                byte[] content = in.getInputStream(e).readAllBytes();
                if (e.getName().equals("docProps/core.xml")) {
                    content = CREATED.matcher(new String(content, StandardCharsets.UTF_8))
                            .replaceAll("$1" + reviewDate + "T00:00:00Z$2").getBytes(StandardCharsets.UTF_8);
                }
                ZipEntry copy = new ZipEntry(e.getName());
                copy.setTimeLocal(ENTRY_TIME);
                z.putNextEntry(copy);
                z.write(content);
                z.closeEntry();
            }
        } catch (IOException e) {
            throw new UncheckedIOException("rewriting a workbook in memory failed", e);
        }
        return out.toByteArray();
    }
}

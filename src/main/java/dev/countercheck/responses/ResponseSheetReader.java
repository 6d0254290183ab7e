package dev.countercheck.responses;

import dev.countercheck.input.UnusableInputException;
import dev.countercheck.input.Suggestions;
import org.dhatim.fastexcel.reader.Cell;
import org.dhatim.fastexcel.reader.ReadableWorkbook;
import org.dhatim.fastexcel.reader.Row;
import org.dhatim.fastexcel.reader.Sheet;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.ByteBuffer;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * Reads a filled-in response sheet, CSV or .xlsx by its extension. Columns are found by their names in
 * the first row ({@code id}, {@code response}, {@code status}; the others are ignored), so a designer may
 * reorder or add columns. Every problem names its cell; nothing is half-read.
 */
public final class ResponseSheetReader {

    /**
     * The largest sheet read; anything larger is refused unread. The sheet the tool writes for a project of
     * 20,000 elements (the most a submission may hold) with every check failing holds about 100,000 findings,
     * some 20 MB of CSV, and must still be read back (a review recognises its own unanswered sheet before
     * replacing it); the same bound as a review result's.
     */
    static final long MAX_BYTES = 64L * 1024 * 1024;

    private ResponseSheetReader() {
    }

    /** The responses the sheet gives, rows without a response or status left out. */
    public static List<Response> read(Path file) throws UnusableInputException {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        byte[] bytes = UnusableInputException.readBounded(file, MAX_BYTES, "a response sheet");
        if (name.endsWith(".csv")) {
            return responses(Csv.parse(file.toString(), utf8(file, bytes)), file.toString());
        }
        if (name.endsWith(".xlsx")) {
            return responses(workbook(file, bytes), file.toString());
        }
        throw new UnusableInputException(file + ": a response sheet is a .csv or an .xlsx file");
    }

    private static String utf8(Path file, byte[] bytes) throws UnusableInputException {
        try {
            return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw new UnusableInputException(file + ": not UTF-8 text; save the sheet as CSV UTF-8");
        }
    }

    /** The first worksheet's rows, each cell located as {@code file Sheet!E7}. */
    private static List<List<SheetCell>> workbook(Path file, byte[] bytes) throws UnusableInputException {
        try (ReadableWorkbook wb = new ReadableWorkbook(new ByteArrayInputStream(bytes))) {
            Sheet sheet = wb.findSheet(ResponseSheet.SHEET).orElse(wb.getFirstSheet());
            List<List<SheetCell>> rows = new ArrayList<>();
            for (Row row : sheet.read()) {
                List<SheetCell> cells = new ArrayList<>();
                for (int c = 0; c < row.getCellCount(); c++) {
                    Cell cell = row.getCell(c);
                    String text = cell == null || cell.getText() == null ? "" : cell.getText();
                    cells.add(new SheetCell(text, file + " " + sheet.getName() + "!"
                            + SheetCell.address(c, row.getRowNum())));
                }
                rows.add(cells);
            }
            return rows;
        } catch (IOException | RuntimeException e) {
            throw new UnusableInputException(file + ": not a workbook that can be read ("
                    + e.getClass().getSimpleName() + ")");
        }
    }

    private static List<Response> responses(List<List<SheetCell>> rows, String file) throws UnusableInputException {
        if (rows.isEmpty()) {
            throw new UnusableInputException(file + ": the sheet is empty; its first row names the columns "
                    + String.join(", ", ResponseSheet.COLUMNS));
        }
        Map<String, Integer> columns = new HashMap<>();
        List<SheetCell> header = rows.get(0);
        for (int c = 0; c < header.size(); c++) {
            columns.putIfAbsent(header.get(c).text().trim().toLowerCase(Locale.ROOT), c);
        }
        List<String> problems = new ArrayList<>();
        for (String needed : List.of("id", "response", "status")) {
            if (!columns.containsKey(needed)) {
                problems.add(header.get(0).where() + ": the first row has no '" + needed + "' column");
            }
        }
        if (!problems.isEmpty()) {
            throw new UnusableInputException(problems);
        }
        List<Response> out = new ArrayList<>();
        Map<String, String> seen = new HashMap<>();
        for (List<SheetCell> row : rows.subList(1, rows.size())) {
            Optional<SheetCell> id = cell(row, columns.get("id"));
            Optional<SheetCell> text = cell(row, columns.get("response"));
            Optional<SheetCell> status = cell(row, columns.get("status"));
            String response = text.map(SheetCell::text).orElse("");
            String statusText = status.map(s -> s.text().trim().toLowerCase(Locale.ROOT)).orElse("");
            String findingId = id.map(s -> s.text().trim()).orElse("");
            if (response.isBlank() && statusText.isEmpty()) {
                continue;
            }
            String where = id.or(() -> text).or(() -> status).map(SheetCell::where).orElse(file);
            if (findingId.isEmpty()) {
                problems.add(where + ": a response with no finding id");
                continue;
            }
            Optional<ResponseStatus> parsed = ResponseStatus.fromLabel(statusText);
            if (!statusText.isEmpty() && parsed.isEmpty()) {
                problems.add(status.get().where() + ": status '" + status.get().text().trim() + "' is not one of "
                        + String.join(", ", ResponseStatus.labels()) + Suggestions.hint(statusText, ResponseStatus.labels()));
                continue;
            }
            String earlier = seen.putIfAbsent(findingId, where);
            if (earlier != null) {
                problems.add(where + ": a second response to " + findingId + " (the first is at " + earlier + ")");
                continue;
            }
            out.add(new Response(findingId, response, parsed, where));
        }
        if (!problems.isEmpty()) {
            throw new UnusableInputException(problems);
        }
        return List.copyOf(out);
    }

    private static Optional<SheetCell> cell(List<SheetCell> row, int column) {
        return column < row.size() ? Optional.of(row.get(column)) : Optional.empty();
    }
}

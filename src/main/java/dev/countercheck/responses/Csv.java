package dev.countercheck.responses;

import dev.countercheck.input.UnusableInputException;
import java.util.ArrayList;
import java.util.List;

/**
 * Comma-separated values as RFC 4180 has them: fields holding a comma, a quote or a line break are
 * quoted, quotes doubled; records end in CRLF. The reader accepts CRLF or LF and keeps every
 * character of a quoted field, line breaks included, and says where each field starts.
 */
final class Csv {

    private Csv() {
    }

    static String line(List<String> fields) {
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                s.append(',');
            }
            String f = fields.get(i);
            boolean quote = f.indexOf(',') >= 0 || f.indexOf('"') >= 0 || f.indexOf('\n') >= 0
                    || f.indexOf('\r') >= 0;
            s.append(quote ? '"' + f.replace("\"", "\"\"") + '"' : f);
        }
        return s.append("\r\n").toString();
    }

    /**
     * The records of {@code text}, each field located as {@code file:line:column (E7)}.
     *
     * @throws UnusableInputException on a quote that is never closed or text after a closing quote
     */
    static List<List<SheetCell>> parse(String file, String text) throws UnusableInputException {
        List<List<SheetCell>> rows = new ArrayList<>();
        List<SheetCell> row = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        int i = text.startsWith("\uFEFF") ? 1 : 0;
        int line = 1;
        int column = 1;
        int record = 1;
        while (i <= text.length()) {
            String where = file + ":" + line + ":" + column + " (" + SheetCell.address(row.size(), record) + ")";
            field.setLength(0);
            if (i < text.length() && text.charAt(i) == '"') {
                i++;
                column++;
                while (true) {
                    if (i >= text.length()) {
                        throw new UnusableInputException(where + ": the quoted field is never closed");
                    }
                    char c = text.charAt(i++);
                    column++;
                    if (c == '"' && i < text.length() && text.charAt(i) == '"') {
                        field.append('"');
                        i++;
                        column++;
                    } else if (c == '"') {
                        break;
                    } else {
                        field.append(c);
                        if (c == '\n') {
                            line++;
                            column = 1;
                        }
                    }
                }
                if (i < text.length() && ",\r\n".indexOf(text.charAt(i)) < 0) {
                    throw new UnusableInputException(file + ":" + line + ":" + column
                            + ": text after the closing quote of a field (a quote inside a field is written twice)");
                }
            } else {
                while (i < text.length() && ",\r\n".indexOf(text.charAt(i)) < 0) {
                    field.append(text.charAt(i++));
                    column++;
                }
            }
            row.add(new SheetCell(field.toString(), where));
            if (i < text.length() && text.charAt(i) == ',') {
                i++;
                column++;
                continue;
            }
            if (i < text.length() && text.charAt(i) == '\r') {
                i++;
            }
            if (i < text.length() && text.charAt(i) == '\n') {
                i++;
            }
            if (!(row.size() == 1 && row.get(0).text().isEmpty())) {
                rows.add(row);
            }
            row = new ArrayList<>();
            record++;
            line++;
            column = 1;
            if (i >= text.length()) {
                break;
            }
        }
        return rows;
    }
}

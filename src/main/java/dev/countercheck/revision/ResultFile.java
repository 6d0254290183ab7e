package dev.countercheck.revision;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import dev.countercheck.input.UnusableInputException;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * An earlier review's JSON result, read for its findings. Only what a comparison needs is read: the
 * format, the revision label and each element's findings (id, severity, message).
 *
 * <p>The file is read as a stream and everything else in it is skipped unread, so that the result of
 * a project of any size can be compared (the JSON of a 20,000-element project is about 1.6 GB). What
 * is kept is bounded instead: the text of the findings may come to at most {@value #MAX_KEPT_CHARS}
 * characters, far beyond what a review writes, so that a hostile file cannot exhaust the memory.
 *
 * @param label what the review is called in a comparison: its submission's revision, else the file
 */
public record ResultFile(String label, List<FindingSnapshot> findings) {

    /** The result format this reader understands (the JSON writer's). */
    public static final String FORMAT = "countercheck-result/1";
    /** The most characters of finding text kept: 20,000 elements' findings take about 20 million. */
    static final long MAX_KEPT_CHARS = 256L * 1024 * 1024;
    private static final JsonFactory JSON = new JsonFactory();

    /** @throws UnusableInputException when the file is missing, not JSON or not a review result, with where */
    public static ResultFile read(Path file) throws UnusableInputException {
        if (!Files.isRegularFile(file)) {
            throw new UnusableInputException(file + ": no such file");
        }
        try (JsonParser p = JSON.createParser(file.toFile())) {
            return new Reading(file, p).result();
        } catch (JsonProcessingException e) {
            JsonLocation at = e.getLocation();
            throw new UnusableInputException(file + (at == null ? "" : ":" + at.getLineNr() + ":" + at.getColumnNr())
                    + ": not JSON (" + e.getOriginalMessage() + ")");
        } catch (IOException e) {
            throw new UnusableInputException(file + ": cannot be read (" + e.getMessage() + ")");
        }
    }

    /** One pass over the tokens of a result, keeping the format, the revision and the elements' findings. */
    private static final class Reading {

        private final Path file;
        private final JsonParser p;
        private final List<FindingSnapshot> findings = new ArrayList<>();
        private long keptChars;
        private String format = "";
        private String revision = "";

        Reading(Path file, JsonParser p) {
            this.file = file;
            this.p = p;
        }

        ResultFile result() throws IOException, UnusableInputException {
            if (p.nextToken() == JsonToken.START_OBJECT) {
                while (p.nextToken() == JsonToken.FIELD_NAME) {
                    String name = p.currentName();
                    JsonToken value = p.nextToken();
                    switch (name) {
                        case "format" -> format = value == JsonToken.VALUE_STRING ? p.getText() : "";
                        case "submission" -> submission(value);
                        case "elements" -> elements(value);
                        default -> p.skipChildren();
                    }
                }
            }
            if (!FORMAT.equals(format)) {
                throw new UnusableInputException(file + ": not a review result (its \"format\" is not " + FORMAT + ")");
            }
            return new ResultFile(revision.isEmpty() ? file.getFileName().toString() : revision, List.copyOf(findings));
        }

        private void submission(JsonToken value) throws IOException {
            if (value != JsonToken.START_OBJECT) {
                p.skipChildren();
                return;
            }
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String name = p.currentName();
                JsonToken field = p.nextToken();
                if (name.equals("revision") && field == JsonToken.VALUE_STRING) {
                    revision = p.getText();
                } else {
                    p.skipChildren();
                }
            }
        }

        private void elements(JsonToken value) throws IOException, UnusableInputException {
            if (value != JsonToken.START_ARRAY) {
                p.skipChildren();
                return;
            }
            while (p.nextToken() != JsonToken.END_ARRAY) {
                if (p.currentToken() == JsonToken.START_OBJECT) {
                    element();
                } else {
                    p.skipChildren();
                }
            }
        }

        /** One element: its id and findings, in whichever order the two fields come. */
        private void element() throws IOException, UnusableInputException {
            String id = "";
            List<String[]> found = new ArrayList<>();
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String name = p.currentName();
                JsonToken value = p.nextToken();
                if (name.equals("id") && value.isScalarValue()) {
                    id = p.getText();
                } else if (name.equals("findings") && value == JsonToken.START_ARRAY) {
                    while (p.nextToken() != JsonToken.END_ARRAY) {
                        found.add(finding());
                    }
                } else {
                    p.skipChildren();
                }
            }
            for (String[] f : found) {
                findings.add(new FindingSnapshot(f[0], id, f[1], f[2]));
            }
        }

        /** A finding's id, severity and message (empty when absent), the rest skipped. */
        private String[] finding() throws IOException, UnusableInputException {
            String[] f = {"", "", ""};
            if (p.currentToken() != JsonToken.START_OBJECT) {
                p.skipChildren();
                return f;
            }
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String name = p.currentName();
                JsonToken value = p.nextToken();
                int slot = switch (name) {
                    case "id" -> 0;
                    case "severity" -> 1;
                    case "message" -> 2;
                    default -> -1;
                };
                if (slot >= 0 && value.isScalarValue()) {
                    f[slot] = keep(p.getText());
                } else {
                    p.skipChildren();
                }
            }
            return f;
        }

        private String keep(String text) throws UnusableInputException {
            keptChars += text.length();
            if (keptChars > MAX_KEPT_CHARS) {
                JsonLocation at = p.currentLocation();
                throw new UnusableInputException(file + ":" + at.getLineNr() + ":" + at.getColumnNr()
                        + ": holds more finding text than any review result (over " + MAX_KEPT_CHARS
                        + " characters); refused");
            }
            return text;
        }
    }
}

package dev.countercheck.revision;

import dev.countercheck.input.UnusableInputException;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * An earlier review's JSON result, read for its findings. Only what a comparison needs is read: the
 * format, the revision label and each element's findings (id, severity, message).
 *
 * @param label what the review is called in a comparison: its submission's revision, else the file
 */
public record ResultFile(String label, List<FindingSnapshot> findings) {

    /** The result format this reader understands (the JSON writer's). */
    public static final String FORMAT = "countercheck-result/1";
    private static final long MAX_BYTES = 64L * 1024 * 1024;
    private static final ObjectMapper JSON = new ObjectMapper();

    /** @throws UnusableInputException when the file is missing, not JSON or not a review result, with where */
    public static ResultFile read(Path file) throws UnusableInputException {
        byte[] bytes = UnusableInputException.readBounded(file, MAX_BYTES, "a review result");
        JsonNode root;
        try {
            root = JSON.readTree(bytes);
        } catch (JsonProcessingException e) {
            JsonLocation at = e.getLocation();
            throw new UnusableInputException(file + (at == null ? "" : ":" + at.getLineNr() + ":" + at.getColumnNr())
                    + ": not JSON (" + e.getOriginalMessage() + ")");
        } catch (IOException e) {
            throw new UnusableInputException(file + ": cannot be read (" + e.getMessage() + ")");
        }
        if (root == null || !FORMAT.equals(root.path("format").asText())) {
            throw new UnusableInputException(file + ": not a review result (its \"format\" is not " + FORMAT + ")");
        }
        List<FindingSnapshot> findings = new ArrayList<>();
        for (JsonNode e : root.path("elements")) {
            for (JsonNode f : e.path("findings")) {
                findings.add(new FindingSnapshot(f.path("id").asText(), e.path("id").asText(),
                        f.path("severity").asText(), f.path("message").asText()));
            }
        }
        String revision = root.path("submission").path("revision").asText("");
        return new ResultFile(revision.isEmpty() ? file.getFileName().toString() : revision, List.copyOf(findings));
    }
}

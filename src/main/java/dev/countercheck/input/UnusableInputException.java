package dev.countercheck.input;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** A file the run needs that cannot be used (a response sheet, an earlier result, review settings): each problem says where. */
public final class UnusableInputException extends Exception {

    private final List<String> problems;

    public UnusableInputException(List<String> problems) {
        super(String.join("; ", problems));
        this.problems = List.copyOf(problems);
    }

    public UnusableInputException(String problem) {
        this(List.of(problem));
    }

    /** Each problem as {@code <where>: <what>}. */
    public List<String> problems() {
        return problems;
    }

    /**
     * The bytes of {@code file}, refused unread when it is not a regular file or is larger than {@code maxBytes}.
     *
     * @param what what the file is meant to be, for the message ("a response sheet")
     */
    public static byte[] readBounded(Path file, long maxBytes, String what) throws UnusableInputException {
        try {
            if (!Files.isRegularFile(file)) {
                throw new UnusableInputException(file + ": no such file");
            }
            if (Files.size(file) > maxBytes) {
                throw new UnusableInputException(file + ": larger than " + maxBytes / 1024 + " KiB; " + what
                        + " is refused unread");
            }
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new UnusableInputException(file + ": cannot be read (" + e.getMessage() + ")");
        }
    }
}

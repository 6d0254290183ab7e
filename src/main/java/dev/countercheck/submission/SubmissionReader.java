package dev.countercheck.submission;

import dev.countercheck.input.Problems;
import dev.countercheck.input.Shown;
import dev.countercheck.input.TreeParser;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;

/**
 * Reads a submission file (YAML or JSON, see {@code docs/submission.md}) into a validated
 * {@link Submission}.
 *
 * <p>The file is only read. It is parsed with Jackson's streaming parser into a tree that knows
 * the line and column of every key and value, and the tree is bound by hand, so that every
 * problem of the file is reported (not only the first) with its place. Quantities are numbers in
 * the default unit (mm, kN, kNm, MPa, mm2) or text with a unit ({@code "1.1 m"}), converted.
 * Elements that are readable but lack an item every check needs become {@link IncompleteElement};
 * all other problems reject the file.
 */
public final class SubmissionReader {

    /**
     * The most bytes read: the largest document parsed ({@link TreeParser#MAX_DOCUMENT_CHARS}) with room
     * for text of more than one byte per character; the bytes and the text are held while the file is parsed.
     */
    static final int MAX_BYTES = 64_000_000;

    private final List<ElementBinder> binders;

    /** @param binders the binder of each element type the reader accepts */
    public SubmissionReader(List<ElementBinder> binders) {
        this.binders = List.copyOf(binders);
    }

    /**
     * Reads and validates {@code file}.
     *
     * @throws SubmissionException listing every problem found, each with file, line and column; no
     *                             other exception leaves this method for any content of the file
     */
    public Submission read(Path file) throws SubmissionException {
        String name = file.toString();
        Problems problems = new Problems(name);
        byte[] bytes;
        try {
            bytes = readBounded(file);
        } catch (IOException e) {
            problems.add(problems.at(1, 1), "", cannotRead(file, e));
            throw new SubmissionException(problems.sorted());
        }
        if (bytes.length > MAX_BYTES) {
            problems.add(problems.at(1, 1), "", "the file is larger than " + MAX_BYTES / 1_000_000
                    + " MB, far more than any submission: it is not read");
            throw new SubmissionException(problems.sorted());
        }
        Optional<Submission> submission = new TreeParser(problems).parse(bytes, name)
                .flatMap(root -> new SubmissionBinder(new Values(problems), binders).bind(root, sha256(bytes)));
        if (problems.any()) {
            throw new SubmissionException(problems.sorted());
        }
        return submission.orElseThrow();
    }

    /**
     * At most {@link #MAX_BYTES} + 1 bytes of a regular file. The parsers' own limits (see
     * {@link TreeParser}) refuse a document of more than {@link TreeParser#MAX_DOCUMENT_CHARS}
     * characters; this bound only keeps a huge file, or a device that never ends, out of memory.
     */
    private static byte[] readBounded(Path file) throws IOException {
        if (Files.exists(file) && !Files.isRegularFile(file) && !Files.isDirectory(file)) {
            throw new IOException("not a regular file");
        }
        try (InputStream in = Files.newInputStream(file)) {
            return in.readNBytes(MAX_BYTES + 1);
        }
    }

    private static String cannotRead(Path file, IOException e) {
        if (e instanceof NoSuchFileException) {
            return "no such file";
        }
        if (e instanceof AccessDeniedException) {
            return "the file cannot be read: permission denied";
        }
        if (Files.isDirectory(file)) {
            return "this is a folder, not a submission file";
        }
        return Files.isRegularFile(file) ? "the file cannot be read (" + Shown.text(String.valueOf(e.getMessage())) + ")"
                : "this is not a regular file (a device, a pipe or a socket): a submission is a file";
    }

    /** Lower-case hex SHA-256 of {@code bytes}. */
    static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform provides SHA-256", e);
        }
    }
}

package dev.countercheck.report;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.UUID;

/** Writes report files so that a reader never sees a half-written one. */
public final class ReportFiles {

    private ReportFiles() {
    }

    /**
     * Writes {@code content} as UTF-8 to {@code target}, replacing it if it exists. The text goes
     * first to a hidden temporary file in the same folder, is forced to disk, and is then renamed
     * onto the target in one atomic step; where the file system cannot rename atomically, it is
     * moved with replace. The folder is created when missing. On failure the temporary file is
     * removed and the target is left as it was.
     *
     * <p>The temporary file is created like any new file (permissions from the umask), not with
     * the owner-only permissions of {@link Files#createTempFile}, so the report stays readable
     * by whoever could read the folder's other files.
     *
     * @throws IOException when the folder cannot be written or the move fails
     */
    public static void writeAtomically(Path target, String content) throws IOException {
        writeAtomically(target, content.getBytes(StandardCharsets.UTF_8));
    }

    /** As {@link #writeAtomically(Path, String)}, for bytes (a PDF). */
    public static void writeAtomically(Path target, byte[] content) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        Files.createDirectories(folder);
        Path temporary = folder.resolve("." + absolute.getFileName() + "." + UUID.randomUUID() + ".tmp");
        try {
            write(temporary, content);
            move(temporary, absolute);
        } finally {
            Files.deleteIfExists(temporary);
        }
    }

    static void write(Path file, byte[] content) throws IOException {
        try (FileChannel channel = FileChannel.open(file, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)) {
            ByteBuffer bytes = ByteBuffer.wrap(content);
            while (bytes.hasRemaining()) {
                channel.write(bytes);
            }
            channel.force(true);
        }
    }

    static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}

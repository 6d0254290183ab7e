package dev.countercheck.report;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/** The two file operations of an {@link OutputSet}: write a new file to disk, rename it into place. */
final class ReportFiles {

    private ReportFiles() {
    }

    /**
     * Writes a new file (it must not exist) and forces it to disk. The file is created like any
     * new file (permissions from the umask), not with the owner-only permissions of {@link
     * Files#createTempFile}, so that a report stays readable by whoever could read the folder's
     * other files.
     */
    static void write(Path file, byte[] content) throws IOException {
        try (FileChannel channel = FileChannel.open(file, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)) {
            ByteBuffer bytes = ByteBuffer.wrap(content);
            while (bytes.hasRemaining()) {
                channel.write(bytes);
            }
            channel.force(true);
        }
    }

    /** Renames {@code from} onto {@code to} in one atomic step, or with replace where the file system cannot. */
    static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}

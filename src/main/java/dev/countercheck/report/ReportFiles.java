package dev.countercheck.report;

import java.io.BufferedOutputStream;
import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
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
    static void write(Path file, OutputSet.Content content) throws IOException {
        try (FileChannel channel = FileChannel.open(file, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)) {
            OutputStream out = new BufferedOutputStream(Channels.newOutputStream(channel), OutputSet.BUFFER);
            content.writeTo(new Unclosed(out));
            out.flush();
            channel.force(true);
        }
    }

    /** A stream whose {@code close} only flushes: a writer that closes what it is given leaves the file to be forced here. */
    private static final class Unclosed extends FilterOutputStream {
        Unclosed(OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void close() throws IOException {
            flush();
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

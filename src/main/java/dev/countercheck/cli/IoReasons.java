package dev.countercheck.cli;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;

/**
 * Why a file operation failed, in words: Java names only the file for some failures (an {@link
 * AccessDeniedException}'s message is the bare path), which does not tell the user what to do.
 */
final class IoReasons {

    private IoReasons() {
    }

    static String of(IOException e) {
        String reason;
        if (e instanceof AccessDeniedException) {
            reason = "permission denied (the folder or file is read-only for this user)";
        } else if (e instanceof NoSuchFileException) {
            reason = "no such file or folder";
        } else if (e instanceof NotDirectoryException) {
            reason = "not a folder";
        } else if (e instanceof FileSystemException fs && fs.getReason() != null) {
            reason = fs.getReason();
        } else {
            return String.valueOf(e.getMessage());
        }
        FileSystemException fs = (FileSystemException) e;
        return reason + (fs.getFile() == null ? "" : " (" + fs.getFile() + ")");
    }
}

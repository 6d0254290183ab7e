package dev.countercheck.report;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ThreadLocalRandom;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The files of one submission's review (JSON result, HTML report, PDF, and whatever joins them
 * with one more {@link #add}), replaced together or not at all. Each file is first written to a
 * hidden temporary name in the target folder and forced to disk; then an empty journal file is
 * moved into place, which commits the set; then each temporary file is renamed onto its report and
 * the journal removed. A run that stops before the journal leaves the previous reports; one killed
 * after it is completed by the next run in the folder ({@link #recover}), which also removes the
 * temporary files of runs that died. A file that is not the tool's own report (see {@link
 * ReportMarkers}) is never replaced.
 *
 * <p>Names carry the writing process's id and a set id: {@code .<report>.<pid>.<set>.tmp} and
 * {@code .countercheck.<pid>.<set>.set}; a process still running keeps its files.
 */
public final class OutputSet implements AutoCloseable {

    /** Writes the bytes of a new file and forces them to disk; replaceable in tests (a full disk). */
    @FunctionalInterface
    public interface Sink {
        void write(Path file, Content content) throws IOException;
    }

    /**
     * What a file of the set holds, written when the set is committed straight into the file's
     * (buffered) stream, so that a large report is never held whole in memory.
     */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    /** A text file's content, written as UTF-8 into a buffered writer when the set is committed. */
    @FunctionalInterface
    public interface Text {
        void writeTo(Writer out) throws IOException;
    }

    /** The disk as it is. */
    public static final Sink DISK = ReportFiles::write;

    private static final Pattern TEMPORARY = Pattern.compile("\\.(.+)\\.(\\d+)\\.([0-9a-f]{16})\\.tmp");
    private static final Pattern JOURNAL = Pattern.compile("\\.countercheck\\.(\\d+)\\.([0-9a-f]{16})\\.set");

    /** The size of the buffer between a report's writer and its file. */
    static final int BUFFER = 1 << 16;
    /** The characters of a text encoded at once by {@link #add(String, String)}. */
    private static final int SLICE = 1 << 16;

    /** The journal of a set while it is written; its move to {@code .countercheck.<pid>.<set>.set} commits the set. */
    private static final String PENDING = "countercheck-set";

    private final Path folder;
    private final Sink sink;
    private final String id = ProcessHandle.current().pid() + "." + HexFormat.of().toHexDigits(
            ThreadLocalRandom.current().nextLong());
    private final Map<Path, Content> files = new LinkedHashMap<>();
    private final List<Path> written = new ArrayList<>();
    private final List<Pattern> retired = new ArrayList<>();
    private boolean committed;

    private OutputSet(Path folder, Sink sink) {
        this.folder = folder;
        this.sink = sink;
    }

    /** A set of files to write into {@code folder}, on disk. */
    public static OutputSet in(Path folder) {
        return in(folder, DISK);
    }

    public static OutputSet in(Path folder, Sink sink) {
        return new OutputSet(folder.toAbsolutePath().normalize(), sink);
    }

    /** Adds a file of the set, by its name in the folder; {@code content} writes it when the set is committed. */
    public OutputSet add(String name, Content content) {
        if (name.contains("/") || name.contains("\\") || name.startsWith(".")) {
            throw new IllegalArgumentException("a report's name is a plain file name: " + name);
        }
        files.put(folder.resolve(name), content);
        return this;
    }

    /** Adds a text file, written as UTF-8 by {@code text} when the set is committed. */
    public OutputSet addText(String name, Text text) {
        return add(name, out -> {
            Writer writer = new BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8), BUFFER);
            text.writeTo(writer);
            writer.flush();
        });
    }

    public OutputSet add(String name, byte[] content) {
        return add(name, out -> out.write(content));
    }

    /**
     * Adds a text file whose whole text is at hand, written as UTF-8 by the string's own encoder in
     * slices (a writer's encoder takes its slow path at the first character beyond ASCII).
     */
    public OutputSet add(String name, String content) {
        return add(name, out -> {
            int start = 0;
            while (start < content.length()) {
                int end = Math.min(content.length(), start + SLICE);
                if (end < content.length() && Character.isHighSurrogate(content.charAt(end - 1))) {
                    end--; // a surrogate pair stays in one slice
                }
                out.write(content.substring(start, end).getBytes(StandardCharsets.UTF_8));
                start = end;
            }
        });
    }

    /**
     * Names the files of an earlier run that this set no longer writes (the part pages of a report that
     * has since shrunk): once the set is in place, each file of the folder whose whole name matches
     * {@code names}, that is not one of the set's files and that bears the tool's mark, is removed.
     */
    public OutputSet retire(Pattern names) {
        retired.add(names);
        return this;
    }

    /**
     * Writes every file of the set and replaces the reports together.
     *
     * @throws IOException when a file cannot be written (nothing is replaced then), or a report
     *                     exists that the tool did not write
     */
    public void commit() throws IOException {
        for (Path target : files.keySet()) {
            if (!ReportMarkers.replaceable(target)) {
                throw new IOException(target + " exists and was not written by " + ReportMarkers.TOOL
                        + ": it is left as it is");
            }
        }
        Files.createDirectories(folder);
        for (Map.Entry<Path, Content> file : files.entrySet()) {
            Path temporary = temporary(file.getKey());
            written.add(temporary);
            sink.write(temporary, file.getValue());
        }
        Path pending = folder.resolve("." + PENDING + "." + id + ".tmp");
        written.add(pending);
        sink.write(pending, out -> { });
        Path journal = folder.resolve(".countercheck." + id + ".set");
        ReportFiles.move(pending, journal);
        committed = true;
        complete(folder, id);
        removeRetired();
    }

    private void removeRetired() throws IOException {
        if (retired.isEmpty()) {
            return;
        }
        List<Path> stale = new ArrayList<>();
        try (DirectoryStream<Path> listing = Files.newDirectoryStream(folder)) {
            for (Path file : listing) {
                String name = file.getFileName().toString();
                if (!files.containsKey(file) && retired.stream().anyMatch(p -> p.matcher(name).matches())
                        && ReportMarkers.replaceable(file)) {
                    stale.add(file);
                }
            }
        }
        for (Path file : stale) {
            Files.deleteIfExists(file);
        }
    }

    /** Removes the temporary files of a set that was not committed. */
    @Override
    public void close() throws IOException {
        if (!committed) {
            for (Path file : written) {
                Files.deleteIfExists(file);
            }
        }
    }

    private Path temporary(Path target) {
        return folder.resolve("." + target.getFileName() + "." + id + ".tmp");
    }

    /**
     * Finishes what runs that died in {@code folder} left: a committed set is completed (its
     * reports replaced), and temporary files of sets that were not committed are removed. Files
     * of a process still running are left alone. Does nothing when the folder does not exist.
     */
    public static void recover(Path folder) throws IOException {
        if (!Files.isDirectory(folder)) {
            return;
        }
        List<String> names = new ArrayList<>();
        try (DirectoryStream<Path> listing = Files.newDirectoryStream(folder, ".*")) {
            listing.forEach(p -> names.add(p.getFileName().toString()));
        }
        for (String name : names) {
            Matcher journal = JOURNAL.matcher(name);
            if (journal.matches() && !alive(journal.group(1))) {
                complete(folder, journal.group(1) + "." + journal.group(2));
            }
        }
        for (String name : names) {
            Matcher temporary = TEMPORARY.matcher(name);
            if (temporary.matches() && !alive(temporary.group(2))) {
                Files.deleteIfExists(folder.resolve(name));
            }
        }
    }

    /** Renames every temporary file of committed set {@code id} onto its report, then removes the journal. */
    private static void complete(Path folder, String id) throws IOException {
        String suffix = "." + id + ".tmp";
        List<Path> temporaries = new ArrayList<>();
        try (DirectoryStream<Path> listing = Files.newDirectoryStream(folder, ".*" + suffix)) {
            listing.forEach(temporaries::add);
        }
        temporaries.sort(null);
        for (Path temporary : temporaries) {
            String name = temporary.getFileName().toString();
            String report = name.substring(1, name.length() - suffix.length());
            if (!report.equals(PENDING)) {
                ReportFiles.move(temporary, folder.resolve(report));
            } else {
                Files.deleteIfExists(temporary);
            }
        }
        Files.deleteIfExists(folder.resolve(".countercheck." + id + ".set"));
    }

    private static boolean alive(String pid) {
        try {
            return ProcessHandle.of(Long.parseLong(pid)).map(ProcessHandle::isAlive).orElse(false);
        } catch (NumberFormatException e) {
            return false;
        }
    }
}

package dev.countercheck.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

/** The submission files named on the command line: files as given, folders expanded to their submissions. */
final class SubmissionFiles {

    private SubmissionFiles() {
    }

    static List<Path> expand(List<Path> given) {
        List<Path> files = new ArrayList<>();
        for (Path p : given) {
            if (Files.isDirectory(p)) {
                try (Stream<Path> children = Files.list(p)) {
                    List<Path> found = children.filter(Files::isRegularFile).filter(SubmissionFiles::looksLikeSubmission)
                            .sorted().toList();
                    if (found.isEmpty()) {
                        throw new UsageException("the folder " + p + " holds no submission (no .yaml, .yml or .json"
                                + " file)");
                    }
                    files.addAll(found);
                } catch (IOException e) {
                    throw new UsageException("cannot list folder " + p + ": " + IoReasons.of(e));
                }
            } else {
                files.add(p);
            }
        }
        return files;
    }

    static boolean looksLikeSubmission(Path p) {
        String name = p.getFileName().toString().toLowerCase(Locale.ROOT);
        return name.endsWith(".yaml") || name.endsWith(".yml") || name.endsWith(".json");
    }

    /** The file name without its extension: the basename of the reports. */
    static String basename(Path p) {
        String name = p.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }
}

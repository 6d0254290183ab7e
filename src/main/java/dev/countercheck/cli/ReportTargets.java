package dev.countercheck.cli;

import dev.countercheck.report.ReportIndex;
import dev.countercheck.report.ReportMarkers;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * Where a run writes its reports, checked before anything is written: the reports go into the
 * {@code --out} folder and nowhere else, and never onto a submission. Refused: an {@code --out}
 * that is a file, or that is or lies inside a submission's own file name ({@code --out
 * plan.yaml/reports}); a basename that would lead out of the folder ({@code ..}) or hold a
 * separator or a control character; a report that would replace a submission (reviewing
 * {@code reports/a.json} into {@code reports} would write {@code reports/a.json}), also through
 * a link; a file of that name that the tool did not write (another submission's {@code .json});
 * a folder the user cannot write.
 */
final class ReportTargets {

    /** The folder as given, to name the reports as the user would. */
    private final Path outDir;
    private final Path folder;
    private final List<Path> submissions;

    private ReportTargets(Path outDir, Path folder, List<Path> submissions) {
        this.outDir = outDir;
        this.folder = folder;
        this.submissions = submissions;
    }

    /**
     * The targets of a run; every report of every submission, one per extension, is checked.
     *
     * @throws UsageException naming the first problem found
     */
    static ReportTargets of(Path outDir, List<Path> submissions, List<String> extensions, boolean withIndex) {
        Path folder = outDir.toAbsolutePath().normalize();
        if (Files.exists(folder) && !Files.isDirectory(folder)) {
            throw new UsageException("--out " + outDir + " is a file, not a folder");
        }
        Path existing = folder;
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        if (existing != null && !Files.isWritable(existing)) {
            throw new UsageException("--out " + outDir + " cannot be written: " + (existing.equals(folder)
                    ? "the folder is read-only for this user" : "the folder " + existing + ", where it would be"
                    + " created, is read-only for this user"));
        }
        List<Path> absolute = submissions.stream().map(p -> p.toAbsolutePath().normalize()).toList();
        for (Path submission : absolute) {
            if (folder.startsWith(submission)) {
                throw new UsageException("--out " + outDir + " lies inside the name of the submission " + submission
                        + ": choose a folder of its own");
            }
        }
        ReportTargets targets = new ReportTargets(outDir, folder, absolute);
        for (Path submission : submissions) {
            for (String extension : extensions) {
                targets.owned(targets.report(submission, extension));
            }
        }
        if (withIndex) {
            targets.owned(outDir.resolve(ReportIndex.NAME + ".html"));
        }
        return targets;
    }

    /**
     * The report of {@code submission} with {@code extension} (".json"): the folder's child named
     * after the submission's basename, as a path from the folder as given.
     *
     * @throws UsageException when that file would lie outside the folder or is a submission
     */
    Path report(Path submission, String extension) {
        String basename = SubmissionFiles.basename(submission);
        if (basename.isEmpty() || basename.equals(".") || basename.equals("..") || basename.contains("/")
                || basename.contains("\\") || basename.chars().anyMatch(Character::isISOControl)) {
            throw new UsageException("the submission name " + submission.getFileName()
                    + " cannot name a report file: rename it (letters, digits, '.', '-', '_')");
        }
        Path target = folder.resolve(basename + extension).normalize();
        if (!folder.equals(target.getParent())) {
            throw new UsageException("the report of " + submission + " would be written outside " + folder);
        }
        for (Path input : submissions) {
            if (input.equals(target) || sameFile(input, target)) {
                throw new UsageException("the report " + target + " would replace the submission " + input
                        + ": the submission is only ever read; choose another --out folder");
            }
        }
        return outDir.resolve(basename + extension);
    }

    /** Refuses a report name held by a file the tool did not write. */
    private void owned(Path report) {
        if (!ReportMarkers.replaceable(report)) {
            throw new UsageException(report + " exists and was not written by countercheck (it bears no report"
                    + " mark): it is left as it is; choose another --out folder or move the file");
        }
    }

    private static boolean sameFile(Path a, Path b) {
        try {
            return Files.exists(a) && Files.exists(b) && Files.isSameFile(a, b);
        } catch (IOException e) {
            return false;
        }
    }
}

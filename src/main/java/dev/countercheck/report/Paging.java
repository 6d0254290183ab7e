package dev.countercheck.report;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Which pages a report is written on, and which of them is being written. A project of up to
 * {@link #PER_PART} elements is one page. A larger one is a project page ({@code <name>.html}:
 * cover with the first {@link #PROBLEMS_SHOWN} critical and major findings and a table of the parts,
 * contents, assumptions) and parts of {@link #PER_PART} elements ({@code <name>.part-<k>.html}:
 * the findings register, sections, cautions, checks not performed and calculations of those
 * elements), so that no file grows with the project (a part stays within a few megabytes, the
 * project page within about one) and the project page opens at once. Links between the pages are
 * made here ({@link #href}).
 *
 * <p>Public only because the template reads it.
 *
 * @param projectFile the project page's file name
 * @param parts       the number of part pages, 0 for a report of one page
 * @param part        the part being written, from 1; 0 for the project page (or the one page)
 */
public record Paging(String projectFile, int parts, int part) {

    /**
     * The most elements on one part page. An element's section and calculations take 100 to 250 kB
     * of HTML, so that a part stays under about 10 MB.
     */
    static final int PER_PART = 30;

    /** The most critical and major findings listed on the project page of a report on several pages. */
    static final int PROBLEMS_SHOWN = 100;

    /**
     * An anchor on an element's part page: the element, its checks and steps, their traces and
     * calculations, its cautions.
     */
    private static final Pattern ELEMENT_ANCHOR = Pattern.compile("(?:trace-|calc-|cautions-)?e(\\d+)(?:-.*)?");

    /** A report on one page, whatever its size (the page the PDF is laid out from). */
    static final Paging ONE_PAGE = new Paging("", 0, 0);

    /** The paging of a report of {@code elements} elements whose project page is {@code projectFile}. */
    static Paging of(String projectFile, int elements) {
        return new Paging(projectFile, elements <= PER_PART ? 0 : (elements + PER_PART - 1) / PER_PART, 0);
    }

    /** The same report, writing part {@code k} (from 1). */
    Paging atPart(int k) {
        return new Paging(projectFile, parts, k);
    }

    public int perPart() {
        return PER_PART;
    }

    /** Whether the report is one page. */
    public boolean onePage() {
        return parts == 0;
    }

    /** Whether the page shows the cover, contents and assumptions. */
    public boolean projectPage() {
        return part == 0;
    }

    /** Whether the page shows elements: their findings, sections, cautions, checks not performed and calculations. */
    public boolean elementPage() {
        return parts == 0 || part > 0;
    }

    /** The index (from 0) of the first element of part {@code k} (from 1). */
    static int firstOf(int k) {
        return (k - 1) * PER_PART;
    }

    /** The file name of part {@code k} (from 1). */
    public String partFile(int k) {
        return base(projectFile) + ".part-" + k + ".html";
    }

    /** The names of every part page {@link #partFile} can give for the report {@code projectFile}, whatever the number of parts. */
    public static Pattern partFiles(String projectFile) {
        return Pattern.compile(Pattern.quote(base(projectFile)) + "\\.part-[1-9][0-9]*\\.html");
    }

    private static String base(String projectFile) {
        return projectFile.endsWith(".html") ? projectFile.substring(0, projectFile.length() - 5) : projectFile;
    }

    /** The link to {@code anchor} from the page being written: within the page, or to the page that holds it. */
    public String href(String anchor) {
        if (parts == 0) {
            return "#" + anchor;
        }
        int target = pageOf(anchor);
        if (target == part) {
            return "#" + anchor;
        }
        return (target == 0 ? projectFile : partFile(target)) + "#" + anchor;
    }

    /** The page that holds {@code anchor}: 0 for the project page, else its part. */
    private static int pageOf(String anchor) {
        if (anchor.equals("elements") || anchor.equals("calculations")) {
            return 1;
        }
        Matcher element = ELEMENT_ANCHOR.matcher(anchor);
        return element.matches() ? (Integer.parseInt(element.group(1)) - 1) / PER_PART + 1 : 0;
    }
}

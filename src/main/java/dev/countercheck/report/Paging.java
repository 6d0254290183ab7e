package dev.countercheck.report;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Which pages a report is written on, and which of them is being written. A project of up to
 * {@link #PER_PART} elements is one page. A larger one is a project page ({@code <name>.html}:
 * cover, verdict, contents, findings register, assumptions and cautions) and parts of
 * {@link #PER_PART} elements ({@code <name>.part-<k>.html}: the elements' sections and their
 * calculations), so that no file grows with the project beyond a few megabytes per part and the
 * project page opens at once. Links between the pages are made here ({@link #href}).
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

    /** An anchor on an element's part page: the element, its checks and steps, their traces and calculations. */
    private static final Pattern ELEMENT_ANCHOR = Pattern.compile("(?:trace-|calc-)?e(\\d+)(?:-.*)?");

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

    /** Whether the page shows the cover, contents, register, assumptions and cautions. */
    public boolean projectPage() {
        return part == 0;
    }

    /** Whether the page shows elements and their calculations. */
    public boolean elementPage() {
        return parts == 0 || part > 0;
    }

    /** The file name of part {@code k} (from 1). */
    public String partFile(int k) {
        String base = projectFile.endsWith(".html") ? projectFile.substring(0, projectFile.length() - 5) : projectFile;
        return base + ".part-" + k + ".html";
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

package dev.countercheck.report;

import dev.countercheck.review.Review;
import dev.countercheck.round.ReviewRound;
import freemarker.core.HTMLOutputFormat;
import freemarker.core.TemplateClassResolver;
import freemarker.template.Configuration;
import freemarker.template.Template;
import freemarker.template.TemplateException;
import freemarker.template.TemplateExceptionHandler;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TimeZone;

/**
 * Renders a finished {@link Review} as one self-contained HTML page: inline CSS, inline SVG
 * drawings, no scripts, no external resources, a print stylesheet for A4. Every value is HTML-escaped by the template's
 * output format. Numbers are formatted in Java ({@link ReportNumbers}), so the output does not
 * depend on the machine's locale or time zone.
 */
public final class HtmlReportWriter {

    static final String TEMPLATE = "review.ftlh";
    static final String INDEX_TEMPLATE = "index.ftlh";

    /** Configured once; it keeps each template compiled after its first use (safe to share between threads). */
    private static final Configuration FREEMARKER = configuration();

    /**
     * The report's template, compiled on first use. A holder, so that a thread that asks for it while another
     * compiles it ({@link #prepare()} on a second core) waits for that one instead of compiling it again.
     */
    private static final class Report {
        static final Template TEMPLATE = load(HtmlReportWriter.TEMPLATE);
    }

    private static Configuration configuration() {
        Configuration freemarker = new Configuration(Configuration.VERSION_2_3_34);
        freemarker.setClassForTemplateLoading(HtmlReportWriter.class, "/templates");
        freemarker.setTemplateUpdateDelayMilliseconds(Long.MAX_VALUE);
        freemarker.setDefaultEncoding("UTF-8");
        freemarker.setOutputFormat(HTMLOutputFormat.INSTANCE);
        freemarker.setLocale(Locale.ROOT);
        freemarker.setTimeZone(TimeZone.getTimeZone("UTC"));
        freemarker.setNumberFormat("computer");
        freemarker.setTemplateExceptionHandler(TemplateExceptionHandler.RETHROW_HANDLER);
        freemarker.setLogTemplateExceptions(false);
        freemarker.setWrapUncheckedExceptions(true);
        freemarker.setFallbackOnNullLoopVariable(false);
        freemarker.setNewBuiltinClassResolver(TemplateClassResolver.ALLOWS_NOTHING_RESOLVER);
        freemarker.setObjectWrapper(new ReportObjectWrapper(Configuration.VERSION_2_3_34));
        return freemarker;
    }

    /** Compiles the report's template now (a part of a short review's time), if no thread has yet. */
    static void prepare() {
        template(TEMPLATE);
    }

    /** The HTML page for {@code review} on its own: no sign-off names, responses or previous revision. */
    public String write(Review review) {
        return write(review, ReviewRound.none(""));
    }

    /**
     * The report of {@code review} in its round as one HTML page, however many elements it has:
     * sign-off, responses, comparison with the previous revision.
     */
    public String write(Review review, ReviewRound round) {
        return render(TEMPLATE, HtmlModel.of(review, round, Paging.ONE_PAGE));
    }

    /**
     * The HTML files of the report of {@code review} in its round, whose first page is {@code fileName}:
     * that page alone for a project of up to {@link Paging#PER_PART} elements, else the project page and
     * its parts (see {@link Paging}). Each file is written into its writer as the template runs.
     */
    public List<Page> pages(Review review, ReviewRound round, String fileName) {
        HtmlModel model = HtmlModel.of(review, round, Paging.of(fileName, review.elements().size()));
        List<Page> pages = new ArrayList<>();
        pages.add(new Page(fileName, out -> render(TEMPLATE, model, out)));
        for (HtmlModel part : model.parts(review)) {
            pages.add(new Page(model.paging().partFile(part.paging().part()), out -> render(TEMPLATE, part, out)));
        }
        return pages;
    }

    /** One HTML file of a report: its name and what writes it. */
    public record Page(String fileName, OutputSet.Text content) {
    }

    /** The page of template {@code name} for {@code model}. */
    String render(String name, Object model) {
        TextWriter out = new TextWriter();
        try {
            render(name, model, out);
        } catch (IOException e) {
            throw new IllegalStateException("text in memory does not fail", e);
        }
        return out.toString();
    }

    /**
     * Writes the page of template {@code name} for {@code model} into {@code out}; an {@link IOException}
     * is the writer's own (a full disk), any other failure a bug in this package.
     */
    void render(String name, Object model, Writer out) throws IOException {
        Template template = template(name);
        try {
            template.process(model, out);
        } catch (TemplateException e) {
            // The templates ship inside the jar and their models are built here: failing is a bug in this package.
            throw new IllegalStateException("could not render templates/" + name + ": " + e.getMessage(), e);
        }
        out.flush();
    }

    /** The compiled template {@code name}. */
    private static Template template(String name) {
        return name.equals(TEMPLATE) ? Report.TEMPLATE : load(name);
    }

    /** Template {@code name} from Freemarker's cache, compiled the first time; one missing from the jar is a bug here. */
    private static Template load(String name) {
        try {
            return FREEMARKER.getTemplate(name);
        } catch (IOException e) {
            throw new IllegalStateException("could not read templates/" + name + " from the jar: " + e.getMessage(), e);
        }
    }
}

package dev.countercheck.report;

import com.openhtmltopdf.css.extend.StylesheetFactory;
import com.openhtmltopdf.css.sheet.StylesheetInfo;
import com.openhtmltopdf.simple.extend.XhtmlCssOnlyNamespaceHandler;
import com.openhtmltopdf.simple.extend.XhtmlNamespaceHandler;
import org.jsoup.nodes.Attribute;
import org.jsoup.nodes.DataNode;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;

import java.io.IOException;
import java.io.InputStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.function.BiPredicate;
import java.util.function.Predicate;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The stylesheets of the PDF's copy of the page, cut to the rules that can apply to it. The renderer
 * tries every selector of its stylesheets on every element, without an index: each selector that can
 * match nothing in the page only costs time. Before the copy is laid out, a selector is dropped when
 * one of its compound parts names a tag, id, class, tag with class or attribute that no element of the
 * copy has (pseudo-classes and pseudo-elements left aside, so that the test only ever keeps too
 * much); a rule left without selectors is dropped. What remains is in its order, so that every element
 * is styled as by the full sheets: the same cascade, fewer tries. Cut are the page's own {@code <style>}
 * (the HTML file keeps it whole) and the renderer's default (user-agent) stylesheet, most of which styles
 * form controls and tags the report never writes.
 */
final class PdfStyles {

    /** A pseudo-class or pseudo-element, with its argument: {@code :first-child}, {@code ::before}, {@code :not(.x)}. */
    private static final Pattern PSEUDO = Pattern.compile("::?[A-Za-z-]+(\\([^()]*\\))?");
    /** An attribute selector, its name captured: {@code [type=checkbox]}. */
    private static final Pattern ATTRIBUTE = Pattern.compile("\\[\\s*([A-Za-z_-][\\w-]*)[^\\]\"']*(\"[^\"]*\"|'[^']*')?\\s*]");
    /** The combinators between compound selectors. */
    private static final Pattern COMBINATOR = Pattern.compile("\\s*[>+~]\\s*|\\s+");
    /** A compound selector as this class reads it: tag or {@code *}, then ids, classes and attributes. */
    private static final Pattern COMPOUND = Pattern.compile("([A-Za-z][\\w-]*|\\*)?((?:[#.][A-Za-z_-][\\w-]*|\\[[A-Za-z_-][\\w-]*])*)");
    private static final Pattern PART = Pattern.compile("([#.\\[])([A-Za-z_-][\\w-]*)");
    /** The root element, in an HTML page always {@code html}. */
    private static final Pattern ROOT = Pattern.compile("(?<![\\w-]):root\\b");
    /** What makes a selector depend on the order of siblings: a sibling combinator or a structural pseudo-class. */
    private static final Pattern SIBLING_SENSITIVE = Pattern.compile("[+~]|:(first|last|nth|only)-|:empty");

    private final Set<String> tags = new HashSet<>();
    private final Set<String> ids = new HashSet<>();
    private final Set<String> classes = new HashSet<>();
    private final Set<String> tagClasses = new HashSet<>();
    private final Set<String> attributes = new HashSet<>();
    /** Every selector kept by {@link #cut}, in the order cut. */
    private final List<String> kept = new ArrayList<>();

    private PdfStyles(Document page) {
        for (Element element : page.getAllElements()) {
            String tag = element.normalName().toLowerCase(Locale.ROOT);
            tags.add(tag);
            if (!element.id().isEmpty()) {
                ids.add(element.id());
            }
            for (String name : element.classNames()) {
                classes.add(name);
                tagClasses.add(tag + "." + name);
            }
            for (Attribute attribute : element.attributes()) {
                attributes.add(attribute.getKey().toLowerCase(Locale.ROOT));
            }
        }
    }

    /** The tags, ids, classes and attributes of {@code page}, read once. */
    static PdfStyles of(Document page) {
        return new PdfStyles(page);
    }

    /** Replaces the text of every {@code <style>} of {@code page} (the PDF's copy) by its rules that can apply. */
    void cutPageStyles(Document page) {
        for (Element style : page.getElementsByTag("style")) {
            String css = style.data();
            style.empty().appendChild(new DataNode(cut(css)));
        }
    }

    /** The renderer's handling of XHTML with its default stylesheet cut to the rules that can apply to the page. */
    XhtmlNamespaceHandler namespaceHandler() {
        return new CutDefaults(this);
    }

    /** {@code css} without the rules and selectors that can match no element of the page; at-rules other than {@code @media} kept whole. */
    String cut(String css) {
        StringBuilder out = new StringBuilder(css.length());
        int at = 0;
        while (true) {
            at = skipBlank(css, at);
            if (at >= css.length()) {
                return out.toString();
            }
            int open = next(css, at, "{;");
            if (open < 0) {
                out.append(css, at, css.length());
                return out.toString();
            }
            if (css.charAt(open) == ';') {
                out.append(css, at, open + 1).append('\n');
                at = open + 1;
                continue;
            }
            int close = closing(css, open);
            String prelude = css.substring(at, open).trim();
            String body = css.substring(open + 1, close);
            if (prelude.startsWith("@media")) {
                String inner = cut(body);
                if (!inner.isBlank()) {
                    out.append(prelude).append(" {\n").append(inner).append("}\n");
                }
            } else if (prelude.startsWith("@")) {
                out.append(css, at, close + 1).append('\n');
            } else {
                List<String> selectors = new ArrayList<>();
                for (String selector : split(prelude)) {
                    if (mayMatch(selector)) {
                        selectors.add(selector);
                    }
                }
                if (!selectors.isEmpty()) {
                    out.append(String.join(", ", selectors)).append(" {").append(body).append("}\n");
                    kept.addAll(selectors);
                }
            }
            at = close + 1;
        }
    }

    /**
     * False only when a compound part of {@code selector} asks for something no element of the page has;
     * a selector this reading does not follow (escapes, attribute values it cannot place) is kept.
     */
    boolean mayMatch(String selector) {
        for (Compound compound : Compound.of(selector)) {
            if (!compound.mayMatch(tags::contains, ids::contains, classes::contains,
                    (tag, name) -> tagClasses.contains(tag + "." + name), attributes::contains)) {
                return false;
            }
        }
        return true;
    }

    /**
     * Unwraps, in the PDF's copy of the page, each {@code span} that only groups text for the screen: it
     * holds text alone and has no attribute but its classes, no selector kept by {@link #cut} may match
     * it, and no selector that depends on the order of siblings ({@code +}, {@code ~}, {@code :first-child}
     * and the like) may match it or one of its sibling elements. Its text then takes the very style it
     * inherited, in one box less. Call after cutting every stylesheet.
     */
    void unwrapPlainSpans(Document page) {
        List<Compound> subjects = new ArrayList<>();
        List<Compound> bySiblings = new ArrayList<>();
        for (String selector : kept) {
            List<Compound> parts = Compound.of(selector);
            subjects.add(parts.isEmpty() ? Compound.ANY : parts.get(parts.size() - 1));
            if (SIBLING_SENSITIVE.matcher(selector).find()) {
                bySiblings.addAll(parts.isEmpty() ? List.of(Compound.ANY) : parts);
            }
        }
        subjects.removeIf(compound -> compound.tag() != null && !compound.tag().equals("span"));
        // a span with its classes alone: whether a subject may match it depends on its class attribute only
        Map<String, Boolean> styledByClasses = new HashMap<>();
        // the span and its sibling elements are its parent's children: unwrapping one that no such rule sees changes no answer
        Map<Element, Boolean> orderSensitive = new IdentityHashMap<>();
        for (Element span : page.getElementsByTag("span")) {
            if (span.attributes().size() == 1 && span.hasAttr("class") && span.childrenSize() == 0 && span.hasText()
                    && span.parent() != null
                    && !styledByClasses.computeIfAbsent(span.className(), c -> mayMatchAny(span, subjects))
                    && !orderSensitive.computeIfAbsent(span.parent(),
                            parent -> parent.children().stream().anyMatch(child -> mayMatchAny(child, bySiblings)))) {
                span.unwrap();
            }
        }
    }

    private static boolean mayMatchAny(Element element, List<Compound> compounds) {
        String tag = element.normalName().toLowerCase(Locale.ROOT);
        String id = element.id();
        Set<String> names = element.classNames();
        for (Compound compound : compounds) {
            if (compound.mayMatch(tag::equals, id::equals, names::contains, (t, name) -> names.contains(name),
                    element::hasAttr)) {
                return true;
            }
        }
        return false;
    }

    /**
     * One compound part of a selector as this class reads it, pseudo-classes and pseudo-elements left
     * aside: the tag ({@code null} for any), ids, classes and attribute names it asks for.
     */
    private record Compound(String tag, List<String> ids, List<String> classes, List<String> attributes) {

        /** A part anything may match: what this reading does not follow. */
        static final Compound ANY = new Compound(null, List.of(), List.of(), List.of());

        /** The compound parts of {@code selector}; one {@link #ANY} for a selector this reading does not follow. */
        static List<Compound> of(String selector) {
            String plain = PSEUDO.matcher(ROOT.matcher(selector).replaceAll("html")).replaceAll("");
            plain = ATTRIBUTE.matcher(plain).replaceAll("[$1]");
            if (plain.indexOf('\\') >= 0 || plain.indexOf('"') >= 0 || plain.indexOf('\'') >= 0 || plain.indexOf(':') >= 0
                    || plain.indexOf('(') >= 0 || plain.indexOf('|') >= 0) {
                return List.of(ANY);
            }
            List<Compound> compounds = new ArrayList<>();
            for (String text : COMBINATOR.split(plain.trim())) {
                if (!text.isEmpty()) {
                    compounds.add(parse(text));
                }
            }
            return compounds;
        }

        private static Compound parse(String text) {
            Matcher m = COMPOUND.matcher(text);
            if (!m.matches()) {
                return ANY;
            }
            String tag = m.group(1) == null || m.group(1).equals("*") ? null : m.group(1).toLowerCase(Locale.ROOT);
            List<String> ids = new ArrayList<>();
            List<String> classes = new ArrayList<>();
            List<String> attributes = new ArrayList<>();
            Matcher part = PART.matcher(m.group(2));
            while (part.find()) {
                switch (part.group(1)) {
                    case "#" -> ids.add(part.group(2));
                    case "." -> classes.add(part.group(2));
                    default -> attributes.add(part.group(2).toLowerCase(Locale.ROOT));
                }
            }
            return new Compound(tag, ids, classes, attributes);
        }

        /** False only when this part asks for a tag, id, class (with its tag) or attribute that the tests say is absent. */
        boolean mayMatch(Predicate<String> tagPresent, Predicate<String> idPresent, Predicate<String> classPresent,
                         BiPredicate<String, String> tagClassPresent, Predicate<String> attributePresent) {
            if (tag != null && !tagPresent.test(tag)) {
                return false;
            }
            for (String id : ids) {
                if (!idPresent.test(id)) {
                    return false;
                }
            }
            for (String name : classes) {
                if (!classPresent.test(name) || tag != null && !tagClassPresent.test(tag, name)) {
                    return false;
                }
            }
            for (String attribute : attributes) {
                if (!attributePresent.test(attribute)) {
                    return false;
                }
            }
            return true;
        }
    }

    /** The selectors of a rule's prelude, split at the commas outside brackets, parentheses and strings. */
    private static List<String> split(String prelude) {
        List<String> selectors = new ArrayList<>();
        int depth = 0;
        int start = 0;
        char quote = 0;
        for (int i = 0; i < prelude.length(); i++) {
            char c = prelude.charAt(i);
            if (quote != 0) {
                if (c == '\\') {
                    i++;
                } else if (c == quote) {
                    quote = 0;
                }
            } else if (c == '"' || c == '\'') {
                quote = c;
            } else if (c == '(' || c == '[') {
                depth++;
            } else if (c == ')' || c == ']') {
                depth--;
            } else if (c == ',' && depth == 0) {
                selectors.add(prelude.substring(start, i).trim());
                start = i + 1;
            }
        }
        selectors.add(prelude.substring(start).trim());
        selectors.removeIf(String::isEmpty);
        return selectors;
    }

    /** The index after white space and comments from {@code at}. */
    private static int skipBlank(String css, int at) {
        while (at < css.length()) {
            if (Character.isWhitespace(css.charAt(at))) {
                at++;
            } else if (css.startsWith("/*", at)) {
                int end = css.indexOf("*/", at + 2);
                at = end < 0 ? css.length() : end + 2;
            } else {
                return at;
            }
        }
        return at;
    }

    /** The index of the first of {@code stops} from {@code at} outside strings and comments, or -1. */
    private static int next(String css, int at, String stops) {
        for (int i = at; i < css.length(); i++) {
            char c = css.charAt(i);
            if (stops.indexOf(c) >= 0) {
                return i;
            }
            i = skipQuoted(css, i);
        }
        return -1;
    }

    /** The index of the brace that closes the one at {@code open} (the end of the text when none does). */
    private static int closing(String css, int open) {
        int depth = 0;
        for (int i = open; i < css.length(); i++) {
            char c = css.charAt(i);
            if (c == '{') {
                depth++;
            } else if (c == '}' && --depth == 0) {
                return i;
            } else {
                i = skipQuoted(css, i);
            }
        }
        return css.length() - 1;
    }

    /** At a string or comment that starts at {@code i}, the index of its last character; else {@code i}. */
    private static int skipQuoted(String css, int i) {
        char c = css.charAt(i);
        if (c == '"' || c == '\'') {
            for (int j = i + 1; j < css.length(); j++) {
                char d = css.charAt(j);
                if (d == '\\') {
                    j++;
                } else if (d == c) {
                    return j;
                }
            }
            return css.length() - 1;
        }
        if (css.startsWith("/*", i)) {
            int end = css.indexOf("*/", i + 2);
            return end < 0 ? css.length() - 1 : end + 1;
        }
        return i;
    }

    /** The stylesheet {@code resource} of the renderer's jar. */
    private static String rendererSheet(String resource) {
        try (InputStream in = XhtmlCssOnlyNamespaceHandler.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("the PDF renderer's default stylesheet " + resource + " is missing");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new IllegalStateException("the PDF renderer's default stylesheet cannot be read", e);
        }
    }

    /** The renderer's XHTML handling, its default stylesheet cut for this page (parsed once per document). */
    private static final class CutDefaults extends XhtmlNamespaceHandler {

        private final String css;
        private StylesheetInfo defaults;

        CutDefaults(PdfStyles styles) {
            this.css = styles.cut(rendererSheet(getPathToDefaultStylesheet()));
        }

        @Override
        public StylesheetInfo getDefaultStylesheet(StylesheetFactory factory) {
            if (defaults == null) {
                StylesheetInfo info = new StylesheetInfo();
                info.setUri("classpath:" + getPathToDefaultStylesheet());
                info.setOrigin(StylesheetInfo.USER_AGENT);
                info.setMedia("all");
                info.setType("text/css");
                info.setStylesheet(factory.parse(new StringReader(css), info));
                defaults = info;
            }
            return defaults;
        }
    }
}

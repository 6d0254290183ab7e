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
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
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

    private final Set<String> tags = new HashSet<>();
    private final Set<String> ids = new HashSet<>();
    private final Set<String> classes = new HashSet<>();
    private final Set<String> tagClasses = new HashSet<>();
    private final Set<String> attributes = new HashSet<>();

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
        return new CutDefaults();
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
                List<String> kept = new ArrayList<>();
                for (String selector : split(prelude)) {
                    if (mayMatch(selector)) {
                        kept.add(selector);
                    }
                }
                if (!kept.isEmpty()) {
                    out.append(String.join(", ", kept)).append(" {").append(body).append("}\n");
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
        String plain = PSEUDO.matcher(selector).replaceAll("");
        plain = ATTRIBUTE.matcher(plain).replaceAll("[$1]");
        if (plain.indexOf('\\') >= 0 || plain.indexOf('"') >= 0 || plain.indexOf('\'') >= 0 || plain.indexOf(':') >= 0
                || plain.indexOf('(') >= 0 || plain.indexOf('|') >= 0) {
            return true;
        }
        for (String compound : COMBINATOR.split(plain.trim())) {
            if (compound.isEmpty()) {
                continue;
            }
            Matcher m = COMPOUND.matcher(compound);
            if (!m.matches()) {
                return true;
            }
            String tag = m.group(1) == null || m.group(1).equals("*") ? null : m.group(1).toLowerCase(Locale.ROOT);
            if (tag != null && !tags.contains(tag)) {
                return false;
            }
            Matcher part = PART.matcher(m.group(2));
            while (part.find()) {
                String name = part.group(2);
                boolean present = switch (part.group(1)) {
                    case "#" -> ids.contains(name);
                    case "." -> classes.contains(name) && (tag == null || tagClasses.contains(tag + "." + name));
                    default -> attributes.contains(name.toLowerCase(Locale.ROOT));
                };
                if (!present) {
                    return false;
                }
            }
        }
        return true;
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

    /** The renderer's XHTML handling, its default stylesheet cut for this page (parsed once per document). */
    private final class CutDefaults extends XhtmlNamespaceHandler {

        private StylesheetInfo defaults;

        @Override
        public StylesheetInfo getDefaultStylesheet(StylesheetFactory factory) {
            if (defaults == null) {
                StylesheetInfo info = new StylesheetInfo();
                info.setUri("classpath:" + getPathToDefaultStylesheet());
                info.setOrigin(StylesheetInfo.USER_AGENT);
                info.setMedia("all");
                info.setType("text/css");
                info.setStylesheet(factory.parse(new StringReader(cut(defaultSheet())), info));
                defaults = info;
            }
            return defaults;
        }

        private String defaultSheet() {
            String resource = getPathToDefaultStylesheet();
            try (InputStream in = XhtmlCssOnlyNamespaceHandler.class.getResourceAsStream(resource)) {
                if (in == null) {
                    throw new IllegalStateException("the PDF renderer's default stylesheet " + resource + " is missing");
                }
                return new String(in.readAllBytes(), StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new IllegalStateException("the PDF renderer's default stylesheet cannot be read", e);
            }
        }
    }
}

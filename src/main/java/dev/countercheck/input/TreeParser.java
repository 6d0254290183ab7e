package dev.countercheck.input;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import dev.countercheck.input.Node.Entry;
import dev.countercheck.input.Node.ListNode;
import dev.countercheck.input.Node.MapNode;
import dev.countercheck.input.Node.ScalarNode;
import dev.countercheck.input.Node.ScalarNode.Kind;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.error.YAMLException;
import org.yaml.snakeyaml.reader.ReaderException;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.Charset;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * Turns the bytes of a YAML or JSON file into a located {@link Node} tree with Jackson's streaming
 * parser. Syntax errors, duplicate keys, YAML aliases, bytes that are not text and files beyond
 * the reading limits become input errors at their place in the file, with the path of keys that
 * leads there; nothing is thrown.
 *
 * <p>Text is UTF-8, with or without a byte-order mark, or UTF-16 with one. The limits are the
 * parsers' own settings where they have one: Jackson's {@link StreamReadConstraints} for document
 * size, token count, nesting depth, number length and, in JSON, text and key length; SnakeYAML's code-point
 * limit for the size of a YAML document. SnakeYAML's limits on nesting and on alias expansion act
 * only when it builds objects itself, which Jackson's streaming parser does not: nesting is
 * bounded by Jackson's setting, and aliases are never expanded (the first one is refused, so an
 * alias bomb costs nothing). The length of YAML text and keys, which no parser setting bounds,
 * is checked here against the same limits as JSON's. Duplicate keys are found here rather than by
 * the parsers' own switches, which stop at the first one without saying where the key was first
 * given: this way every duplicate is reported, with both places.
 */
public final class TreeParser {

    /**
     * The largest document read, in characters. A submission of a hundred elements is about 150 000,
     * so that the most elements a submission may hold (20 000) fit at 2 400 characters each.
     */
    public static final int MAX_DOCUMENT_CHARS = 48_000_000;
    /** The deepest nesting of mappings and lists; a submission needs 6 ({@code elements[0].piles.positions[0]}). */
    public static final int MAX_NESTING_DEPTH = 32;
    /** The longest text value, in characters. */
    public static final int MAX_TEXT_CHARS = 10_000;
    /** The longest key, in characters. */
    public static final int MAX_KEY_CHARS = 1_000;
    /** The longest number, in characters. */
    public static final int MAX_NUMBER_CHARS = 100;
    /**
     * The most tokens (keys, values, starts and ends of mappings and lists) in a document. An
     * element takes 150 to 250, so a file of the most elements a submission may hold (20 000) fits.
     */
    public static final int MAX_TOKENS = 6_000_000;

    private static final StreamReadConstraints LIMITS = StreamReadConstraints.builder()
            .maxDocumentLength(MAX_DOCUMENT_CHARS)
            .maxNestingDepth(MAX_NESTING_DEPTH)
            .maxStringLength(MAX_TEXT_CHARS)
            .maxNameLength(MAX_KEY_CHARS)
            .maxNumberLength(MAX_NUMBER_CHARS)
            .maxTokenCount(MAX_TOKENS)
            .build();
    private static final JsonFactory JSON = JsonFactory.builder().streamReadConstraints(LIMITS).build();
    /** As {@code new YAMLFactory()}: {@code key:} without a value is null (the builder leaves that off). */
    private static final YAMLFactory YAML = YAMLFactory.builder()
            .loaderOptions(yamlOptions())
            .streamReadConstraints(LIMITS)
            .enable(YAMLParser.Feature.EMPTY_STRING_AS_NULL).build();

    private static final byte[] UTF8_BOM = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};
    private static final byte[] UTF16BE_BOM = {(byte) 0xFE, (byte) 0xFF};
    private static final byte[] UTF16LE_BOM = {(byte) 0xFF, (byte) 0xFE};
    private static final byte[] UTF32BE_BOM = {0, 0, (byte) 0xFE, (byte) 0xFF};
    private static final byte[] UTF32LE_BOM = {(byte) 0xFF, (byte) 0xFE, 0, 0};

    /** A reference to one of the parser's settings, in backticks: {@code ", from `StreamReadConstraints...`"}. */
    private static final Pattern SETTING = Pattern.compile(",?\\s*(?:from\\s+)?`[^`]*`");
    /** A YAML event as the parser prints it: {@code <org.yaml.snakeyaml.events.SequenceStartEvent(...)>}. */
    private static final Pattern EVENT = Pattern.compile("<[\\w.]*\\.(\\w+?)Event\\(.*?\\)>");

    private final Problems problems;
    private String text = "";
    /** Where the last token started: the place to report a failure the parser does not locate. */
    private SourceLocation lastToken;
    /**
     * Where reading stands, as a path of keys: the key whose value is being read, or the mapping
     * or list whose next item is; the path of a failure the parser reports.
     */
    private String lastPath = "";

    public TreeParser(Problems problems) {
        this.problems = problems;
        this.lastToken = problems.at(1, 1);
    }

    /**
     * The tree of the file's single document, or empty when the file could not be parsed (the
     * reasons are in {@code problems}).
     *
     * @param fileName used to choose the syntax: {@code .json} is JSON; {@code .yaml} and
     *                 {@code .yml} are YAML; any other name is JSON when the content starts with
     *                 '{' or '[', else YAML
     */
    public Optional<Node> parse(byte[] bytes, String fileName) {
        Optional<String> decoded = decode(bytes).filter(this::holdsNoNul);
        if (decoded.isEmpty()) {
            return Optional.empty();
        }
        text = decoded.get();
        boolean json = isJson(fileName, text);
        try (JsonParser parser = json ? JSON.createParser(text) : YAML.createParser(text)) {
            JsonToken first = parser.nextToken();
            if (first == null) {
                problems.add(problems.at(1, 1), "", "the file is empty: a submission starts with 'countercheck: 1'");
                return Optional.empty();
            }
            Optional<Node> root = read(parser, first, "");
            if (root.isPresent() && parser.nextToken() != null) {
                problems.add(location(parser), "", "more content follows the end of the submission:"
                        + " a file holds one document only");
            }
            return root;
        } catch (IOException | RuntimeException e) {
            syntaxError(e, json);
            return Optional.empty();
        }
    }

    private static LoaderOptions yamlOptions() {
        LoaderOptions options = new LoaderOptions();
        options.setCodePointLimit(MAX_DOCUMENT_CHARS);
        return options;
    }

    private static boolean isJson(String fileName, String text) {
        String name = fileName.toLowerCase(Locale.ROOT);
        if (name.endsWith(".json")) {
            return true;
        }
        if (name.endsWith(".yaml") || name.endsWith(".yml")) {
            return false;
        }
        String start = text.stripLeading();
        return start.startsWith("{") || start.startsWith("[");
    }

    /** The text of the file: UTF-8 (a byte-order mark is skipped), or UTF-16 after its byte-order mark. */
    private Optional<String> decode(byte[] bytes) {
        if (startsWith(bytes, UTF32BE_BOM) || startsWith(bytes, UTF32LE_BOM)) {
            problems.add(problems.at(1, 1), "", "the file is UTF-32 text, which is not read: save it as UTF-8");
            return Optional.empty();
        }
        if (startsWith(bytes, UTF16BE_BOM)) {
            return decode(bytes, 2, StandardCharsets.UTF_16BE, "UTF-16");
        }
        if (startsWith(bytes, UTF16LE_BOM)) {
            return decode(bytes, 2, StandardCharsets.UTF_16LE, "UTF-16");
        }
        return decode(bytes, startsWith(bytes, UTF8_BOM) ? UTF8_BOM.length : 0, StandardCharsets.UTF_8, "UTF-8");
    }

    private Optional<String> decode(byte[] bytes, int skip, Charset charset, String name) {
        CharsetDecoder decoder = charset.newDecoder();
        CharBuffer out = CharBuffer.allocate(bytes.length);
        CoderResult result = decoder.decode(ByteBuffer.wrap(bytes, skip, bytes.length - skip), out, true);
        if (!result.isError()) {
            result = decoder.flush(out);
        }
        out.flip();
        if (result.isError()) {
            problems.add(problems.at(out.toString(), out.length()), "", "the file is not " + name
                    + " text (a byte sequence here is not valid " + name + "): save it as UTF-8");
            return Optional.empty();
        }
        return Optional.of(out.toString());
    }

    private static boolean startsWith(byte[] bytes, byte[] prefix) {
        return bytes.length >= prefix.length && Arrays.equals(bytes, 0, prefix.length, prefix, 0, prefix.length);
    }

    /** Text files hold no NUL character; binary data and UTF-16 without a byte-order mark do. */
    private boolean holdsNoNul(String decoded) {
        int nul = decoded.indexOf('\0');
        if (nul >= 0) {
            problems.add(problems.at(decoded, nul), "", "the file holds a NUL character (byte 0): it is binary data"
                    + " or UTF-16 text without a byte-order mark, not a YAML or JSON text; save it as UTF-8");
        }
        return nul < 0;
    }

    /** Reads the value at {@code path} that starts at {@code token}; empty after a problem that stops reading. */
    private Optional<Node> read(JsonParser parser, JsonToken token, String path) throws IOException {
        SourceLocation at = location(parser);
        lastToken = at;
        lastPath = path;
        if (parser instanceof YAMLParser yaml && yaml.isCurrentAlias()) {
            problems.add(at, path, "YAML aliases ('*" + Shown.text(parser.getText())
                    + "') are not supported: write the value out");
            return Optional.empty();
        }
        return switch (token) {
            case START_OBJECT -> readMap(parser, at, path);
            case START_ARRAY -> readList(parser, at, path);
            case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> number(parser, at);
            case VALUE_TRUE, VALUE_FALSE -> scalar(at, Kind.BOOLEAN, parser);
            case VALUE_NULL -> scalar(at, Kind.NULL, parser);
            default -> text(parser, at, path);
        };
    }

    private static Optional<Node> scalar(SourceLocation at, Kind kind, JsonParser parser) throws IOException {
        return Optional.of(new ScalarNode(at, kind, parser.getText()));
    }

    /**
     * A number as written. Jackson checks the length of a YAML number only when it converts it, so
     * it converts it here; a number it cannot convert ({@code .nan}) is left for the binder to name.
     */
    private static Optional<Node> number(JsonParser parser, SourceLocation at) throws IOException {
        if (parser instanceof YAMLParser) {
            try {
                parser.getNumberValue();
            } catch (StreamConstraintsException e) {
                throw e;
            } catch (JsonProcessingException e) {
                // not a finite decimal number: the binder says so where a number is expected
            }
        }
        return scalar(at, Kind.NUMBER, parser);
    }

    /** Text; in YAML checked against the limit Jackson applies to JSON text. */
    private Optional<Node> text(JsonParser parser, SourceLocation at, String path) throws IOException {
        String value = parser.getText();
        if (value.length() > MAX_TEXT_CHARS) {
            problems.add(at, path, tooLong("text", value.length(), MAX_TEXT_CHARS));
            return Optional.empty();
        }
        int hidden = hiddenCharacter(value);
        if (hidden >= 0) {
            problems.add(at, path, String.format("the text holds the character U+%04X, a control or"
                    + " direction-changing character, which a submission does not accept (it could hide or reorder"
                    + " what a report shows): remove it", value.codePointAt(hidden)));
        }
        return Optional.of(new ScalarNode(at, Kind.TEXT, value));
    }

    /**
     * Where {@code text} holds a character that no text of a submission needs and that could hide
     * or reorder what a report or terminal shows: a control character other than tab, line feed and
     * carriage return (written as an escape in JSON, {@code \\u001b}, or in double-quoted YAML,
     * {@code \e}), or a bidirectional control; -1 when it holds none.
     */
    static int hiddenCharacter(String text) {
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            boolean control = Character.isISOControl(c) && c != '\t' && c != '\n' && c != '\r';
            boolean bidi = c == '\u061C' || c == '\u200E' || c == '\u200F' || (c >= '\u202A' && c <= '\u202E')
                    || (c >= '\u2066' && c <= '\u2069');
            if (control || bidi) {
                return i;
            }
        }
        return -1;
    }

    private static String tooLong(String what, int length, int limit) {
        return "reading limit exceeded: " + what + " of " + length + " characters, longer than the " + limit
                + " allowed";
    }

    private Optional<Node> readMap(JsonParser parser, SourceLocation at, String path) throws IOException {
        List<Entry> entries = new ArrayList<>();
        Map<String, SourceLocation> seen = new HashMap<>();
        while (parser.nextToken() == JsonToken.FIELD_NAME) {
            String key = parser.currentName();
            SourceLocation keyAt = location(parser);
            String keyPath = KeyPath.join(path, key);
            lastToken = keyAt;
            lastPath = keyPath;
            if (key.length() > MAX_KEY_CHARS) {
                problems.add(keyAt, path, tooLong("a key", key.length(), MAX_KEY_CHARS));
                return Optional.empty();
            }
            Optional<Node> value = read(parser, parser.nextToken(), keyPath);
            if (value.isEmpty()) {
                return Optional.empty();
            }
            lastPath = path;
            SourceLocation first = seen.putIfAbsent(key, keyAt);
            if (first != null) {
                problems.add(keyAt, keyPath, "duplicate key '" + Shown.text(key) + "': it was already given at line "
                        + first.line() + ", column " + first.column());
            } else {
                entries.add(new Entry(key, keyAt, value.get()));
            }
        }
        return Optional.of(new MapNode(at, List.copyOf(entries)));
    }

    private Optional<Node> readList(JsonParser parser, SourceLocation at, String path) throws IOException {
        List<Node> items = new ArrayList<>();
        for (JsonToken token = parser.nextToken(); token != JsonToken.END_ARRAY; token = parser.nextToken()) {
            Optional<Node> item = read(parser, token, KeyPath.item(path, items.size()));
            if (item.isEmpty()) {
                return Optional.empty();
            }
            items.add(item.get());
            lastPath = path;
        }
        return Optional.of(new ListNode(at, List.copyOf(items)));
    }

    private SourceLocation location(JsonParser parser) {
        JsonLocation at = parser.currentTokenLocation();
        return problems.at(Math.max(1, at.getLineNr()), Math.max(1, at.getColumnNr()));
    }

    /** Reports a parser failure at the place the parser names, in words without the parser's internals. */
    private void syntaxError(Exception e, boolean json) {
        for (Throwable cause = e; cause != null; cause = cause.getCause()) {
            if (cause instanceof MarkedYAMLException marked && marked.getProblemMark() != null) {
                yamlError(marked);
                return;
            }
            if (cause instanceof ReaderException reader) {
                problems.add(problems.at(text, reader.getPosition()), lastPath, "the character U+"
                        + String.format("%04X", reader.getCodePoint()) + " is not allowed in a YAML file");
                return;
            }
            if (cause instanceof YAMLException yaml && String.valueOf(yaml.getMessage()).contains("exceeds the limit")) {
                // SnakeYAML's own limit on the size of a document, in code points
                problems.add(lastToken, lastPath, "reading limit exceeded: " + plain(yaml.getMessage()));
                return;
            }
        }
        SourceLocation at = lastToken;
        String message = e.getMessage();
        if (e instanceof JsonProcessingException processing) {
            message = processing.getOriginalMessage();
            JsonLocation location = processing.getLocation();
            if (location != null && location.getLineNr() > 0) {
                at = problems.at(location.getLineNr(), Math.max(1, location.getColumnNr()));
            }
        }
        String kind = e instanceof StreamConstraintsException ? "reading limit exceeded"
                : (json ? "JSON" : "YAML") + " syntax";
        problems.add(at, lastPath, kind + ": " + plain(message));
    }

    private void yamlError(MarkedYAMLException marked) {
        Mark mark = marked.getProblemMark();
        SourceLocation at = problems.at(mark.getLine() + 1, mark.getColumn() + 1);
        String problem = String.valueOf(marked.getProblem());
        if (problem.contains("\\t(TAB)") || problem.contains("\t")) {
            problems.add(at, lastPath, "a tab character cannot indent YAML: indent with spaces");
            return;
        }
        String context = "";
        if (marked.getContext() != null && marked.getContextMark() != null) {
            Mark start = marked.getContextMark();
            context = " (" + marked.getContext() + " that starts at line " + (start.getLine() + 1)
                    + ", column " + (start.getColumn() + 1) + ")";
        }
        problems.add(at, lastPath, "YAML syntax: " + plain(problem) + context);
    }

    /**
     * The first line of a parser message, without the parser's internals: references to its
     * settings (", from `StreamReadConstraints...`") and its event class names, which become words.
     */
    private static String plain(String message) {
        String text = message == null ? "the file cannot be parsed" : message.lines().findFirst().orElse("");
        for (String tail : List.of(" (start marker at", ": enable `", "; enable `")) {
            int cut = text.indexOf(tail);
            if (cut >= 0) {
                text = text.substring(0, cut);
            }
        }
        text = SETTING.matcher(text).replaceAll("");
        text = EVENT.matcher(text).replaceAll(m -> "a " + m.group(1).replaceAll("([a-z])([A-Z])", "$1 $2")
                .toLowerCase(Locale.ROOT));
        return text.replace("'<stream end>'", "the end of the file").replace("<stream end>", "the end of the file").strip();
    }
}

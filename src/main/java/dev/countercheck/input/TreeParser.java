package dev.countercheck.input;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import dev.countercheck.input.Node.Entry;
import dev.countercheck.input.Node.ListNode;
import dev.countercheck.input.Node.MapNode;
import dev.countercheck.input.Node.ScalarNode;
import dev.countercheck.input.Node.ScalarNode.Kind;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.reader.ReaderException;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * Turns the bytes of a YAML or JSON file into a located {@link Node} tree with Jackson's streaming
 * parser. Syntax errors, duplicate keys, YAML aliases and bytes that are not UTF-8 become input
 * errors at their place in the file; nothing is thrown.
 */
public final class TreeParser {

    private static final JsonFactory JSON = JsonFactory.builder().build();
    /** As {@code new YAMLFactory()}: {@code key:} without a value is null (the builder leaves that off). */
    private static final YAMLFactory YAML = YAMLFactory.builder()
            .enable(YAMLParser.Feature.EMPTY_STRING_AS_NULL).build();

    /** A reference to one of the parser's settings, in backticks: {@code ", from `StreamReadConstraints...`"}. */
    private static final Pattern SETTING = Pattern.compile(",?\\s*(?:from\\s+)?`[^`]*`");
    /** A YAML event as the parser prints it: {@code <org.yaml.snakeyaml.events.SequenceStartEvent(...)>}. */
    private static final Pattern EVENT = Pattern.compile("<[\\w.]*\\.(\\w+?)Event\\(.*?\\)>");

    private final Problems problems;
    private String text = "";
    /** Where the last token started: the place to report a failure the parser does not locate. */
    private SourceLocation lastToken;

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
        Optional<String> decoded = decodeUtf8(bytes);
        if (decoded.isEmpty()) {
            return Optional.empty();
        }
        text = decoded.get().startsWith("\uFEFF") ? decoded.get().substring(1) : decoded.get();
        boolean json = isJson(fileName, text);
        try (JsonParser parser = json ? JSON.createParser(text) : YAML.createParser(text)) {
            JsonToken first = parser.nextToken();
            if (first == null) {
                problems.add(problems.at(1, 1), "", "the file is empty: a submission starts with 'countercheck: 1'");
                return Optional.empty();
            }
            Optional<Node> root = read(parser, first);
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

    private Optional<String> decodeUtf8(byte[] bytes) {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder();
        CharBuffer out = CharBuffer.allocate(bytes.length);
        CoderResult result = decoder.decode(ByteBuffer.wrap(bytes), out, true);
        out.flip();
        if (result.isError()) {
            problems.add(problems.at(out.toString(), out.length()), "",
                    "the file is not UTF-8 text (a byte sequence here is not valid UTF-8): save it as UTF-8");
            return Optional.empty();
        }
        return Optional.of(out.toString());
    }

    /** Reads the value that starts at {@code token}; empty after a reported problem that stops reading. */
    private Optional<Node> read(JsonParser parser, JsonToken token) throws IOException {
        SourceLocation at = location(parser);
        lastToken = at;
        if (parser instanceof YAMLParser yaml && yaml.isCurrentAlias()) {
            problems.add(at, "", "YAML aliases ('*" + parser.getText() + "') are not supported: write the value out");
            return Optional.empty();
        }
        return switch (token) {
            case START_OBJECT -> readMap(parser, at);
            case START_ARRAY -> readList(parser, at);
            case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> scalar(at, Kind.NUMBER, parser);
            case VALUE_TRUE, VALUE_FALSE -> scalar(at, Kind.BOOLEAN, parser);
            case VALUE_NULL -> scalar(at, Kind.NULL, parser);
            default -> scalar(at, Kind.TEXT, parser);
        };
    }

    private static Optional<Node> scalar(SourceLocation at, Kind kind, JsonParser parser) throws IOException {
        return Optional.of(new ScalarNode(at, kind, parser.getText()));
    }

    private Optional<Node> readMap(JsonParser parser, SourceLocation at) throws IOException {
        List<Entry> entries = new ArrayList<>();
        Map<String, SourceLocation> seen = new HashMap<>();
        while (parser.nextToken() == JsonToken.FIELD_NAME) {
            String key = parser.currentName();
            SourceLocation keyAt = location(parser);
            lastToken = keyAt;
            Optional<Node> value = read(parser, parser.nextToken());
            if (value.isEmpty()) {
                return Optional.empty();
            }
            SourceLocation first = seen.putIfAbsent(key, keyAt);
            if (first != null) {
                problems.add(keyAt, "", "duplicate key '" + key + "': it was already given at line "
                        + first.line() + ", column " + first.column());
            } else {
                entries.add(new Entry(key, keyAt, value.get()));
            }
        }
        return Optional.of(new MapNode(at, List.copyOf(entries)));
    }

    private Optional<Node> readList(JsonParser parser, SourceLocation at) throws IOException {
        List<Node> items = new ArrayList<>();
        for (JsonToken token = parser.nextToken(); token != JsonToken.END_ARRAY; token = parser.nextToken()) {
            Optional<Node> item = read(parser, token);
            if (item.isEmpty()) {
                return Optional.empty();
            }
            items.add(item.get());
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
                problems.add(problems.at(text, reader.getPosition()), "", "the character U+"
                        + String.format("%04X", reader.getCodePoint()) + " is not allowed in a YAML file");
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
        problems.add(at, "", (json ? "JSON" : "YAML") + " syntax: " + plain(message));
    }

    private void yamlError(MarkedYAMLException marked) {
        Mark mark = marked.getProblemMark();
        SourceLocation at = problems.at(mark.getLine() + 1, mark.getColumn() + 1);
        String problem = String.valueOf(marked.getProblem());
        if (problem.contains("\\t(TAB)") || problem.contains("\t")) {
            problems.add(at, "", "a tab character cannot indent YAML: indent with spaces");
            return;
        }
        String context = "";
        if (marked.getContext() != null && marked.getContextMark() != null) {
            Mark start = marked.getContextMark();
            context = " (" + marked.getContext() + " that starts at line " + (start.getLine() + 1)
                    + ", column " + (start.getColumn() + 1) + ")";
        }
        problems.add(at, "", "YAML syntax: " + plain(problem) + context);
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

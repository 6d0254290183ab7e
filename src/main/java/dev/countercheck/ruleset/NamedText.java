package dev.countercheck.ruleset;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.BiFunction;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A text of a check split once at the names it writes, each name with its slot in the check's {@link RuleLayout}:
 * a derived quantity's formula, whose trace step shows it with the values put in, or a message with {@code {name}}
 * placeholders. A run fills it from its {@link RuleLayout.Frame}.
 */
public final class NamedText {

    /** A name in a formula: not in a text literal, not a function called. */
    static final Pattern FORMULA_NAME = Pattern.compile("(?<![\\w.\"])([A-Za-z_][A-Za-z0-9_]*)(?![\\w\"(])");
    static final Pattern PLACEHOLDER = Pattern.compile("\\{([A-Za-z_][A-Za-z0-9_]*)}");

    /** The text before each name, and after the last one. */
    private final String[] texts;
    private final String[] names;
    /** Each name's slot as spelled; -1 when the layout has none. */
    private final int[] slots;
    private final int length;

    NamedText(String text, Pattern name, Map<String, Integer> slotByName) {
        List<String> around = new ArrayList<>();
        List<String> found = new ArrayList<>();
        Matcher m = name.matcher(text);
        int last = 0;
        while (m.find()) {
            around.add(text.substring(last, m.start()));
            found.add(m.group(1));
            last = m.end();
        }
        around.add(text.substring(last));
        this.texts = around.toArray(new String[0]);
        this.names = found.toArray(new String[0]);
        this.slots = found.stream().mapToInt(n -> slotByName.getOrDefault(n, -1)).toArray();
        this.length = text.length();
    }

    /**
     * The text with each name replaced by {@code show} of its value in {@code frame} (null when it has none) and
     * the name.
     */
    public String fill(RuleLayout.Frame frame, BiFunction<Object, String, String> show) {
        StringBuilder out = new StringBuilder(length + 16);
        for (int i = 0; i < names.length; i++) {
            out.append(texts[i]).append(show.apply(frame.get(slots[i], names[i]), names[i]));
        }
        return out.append(texts[names.length]).toString();
    }
}

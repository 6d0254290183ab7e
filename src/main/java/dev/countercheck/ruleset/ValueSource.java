package dev.countercheck.ruleset;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * How sure a ruleset is of a parameter's or a table's value, as its {@code source} key says. A value
 * recalled from memory and not yet verified against the printed standard or annex is marked so, and
 * the mark travels with the value: the {@code rules} listing, the trace steps that use it, and the
 * review's assumptions (JSON and report).
 */
public enum ValueSource {
    /** Nothing said: the value is as the file states it. */
    STATED("stated"),
    /** Checked against the printed text. */
    PUBLISHED("published"),
    /** Recalled from memory, not yet verified against the printed text. */
    FROM_MEMORY("from-memory");

    /** How a recalled value is marked wherever it is shown. */
    public static final String MARK = "from memory: recalled, not verified against the printed text";

    private final String key;

    ValueSource(String key) {
        this.key = key;
    }

    /** The spelling in a ruleset file. */
    public String key() {
        return key;
    }

    public boolean recalled() {
        return this == FROM_MEMORY;
    }

    /** The spellings a ruleset may write (STATED is what an absent key means). */
    static List<String> written() {
        return Arrays.stream(values()).filter(v -> v != STATED).map(ValueSource::key).toList();
    }

    static Optional<ValueSource> of(String written) {
        return Arrays.stream(values()).filter(v -> v != STATED && v.key.equals(written)).findFirst();
    }
}

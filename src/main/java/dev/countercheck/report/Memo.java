package dev.countercheck.report;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

/**
 * A pure function of a text, its results kept for the texts it was asked about: the reports ask the same
 * questions of every element (the meaning of a symbol, the symbols of a formula, the tree of a rule's
 * expression), whose texts come from the code and the ruleset. Keeps at most {@code limit} results, so that
 * texts written per element (values, names) cannot make it grow without end; past that it computes. Safe to
 * share between threads.
 */
final class Memo<V> {

    private final Function<String, V> function;
    private final int limit;
    private final Map<String, V> results = new ConcurrentHashMap<>();

    /** @param function never returns null */
    Memo(Function<String, V> function, int limit) {
        this.function = function;
        this.limit = limit;
    }

    V get(String text) {
        V result = results.get(text);
        if (result == null) {
            result = function.apply(text);
            if (results.size() < limit) {
                results.putIfAbsent(text, result);
            }
        }
        return result;
    }
}

package dev.countercheck.revision;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Every finding of two revisions, classified by its stable id: closed, still open, changed or new.
 * An entry is found by its id at once (a report looks up each of a large project's 100,000 findings).
 */
public final class RevisionComparison {

    private final String previous;
    private final List<Entry> entries;
    private final Map<String, Entry> byId = new HashMap<>();

    /**
     * @param previous what the earlier revision is called (its revision label, else its file)
     * @param entries  the later revision's findings in its order, then the closed ones in the earlier order
     */
    private RevisionComparison(String previous, List<Entry> entries) {
        this.previous = previous;
        this.entries = List.copyOf(entries);
        this.entries.forEach(e -> byId.putIfAbsent(e.id(), e));
    }

    /** What the earlier revision is called (its revision label, else its file). */
    public String previous() {
        return previous;
    }

    /** The later revision's findings in its order, then the closed ones in the earlier order. */
    public List<Entry> entries() {
        return entries;
    }

    /**
     * One finding across the two revisions.
     *
     * @param before the finding in the earlier revision, empty for a new one
     * @param after  the finding in the later revision, empty for a closed one
     */
    public record Entry(String id, FindingChange change, Optional<FindingSnapshot> before,
                        Optional<FindingSnapshot> after) {

        /** The finding as it stands now, or as it last stood when closed. */
        public FindingSnapshot latest() {
            return after.or(() -> before).orElseThrow();
        }
    }

    public static RevisionComparison compare(String previous, List<FindingSnapshot> before,
                                             List<FindingSnapshot> after) {
        Map<String, FindingSnapshot> earlier = new LinkedHashMap<>();
        before.forEach(f -> earlier.put(f.id(), f));
        List<Entry> entries = new ArrayList<>();
        for (FindingSnapshot now : after) {
            FindingSnapshot then = earlier.remove(now.id());
            FindingChange change = then == null ? FindingChange.NEW
                    : then.severity().equals(now.severity()) && then.message().equals(now.message())
                    ? FindingChange.STILL_OPEN : FindingChange.CHANGED;
            entries.add(new Entry(now.id(), change, Optional.ofNullable(then), Optional.of(now)));
        }
        earlier.values().forEach(then -> entries.add(new Entry(then.id(), FindingChange.CLOSED, Optional.of(then),
                Optional.empty())));
        return new RevisionComparison(previous, entries);
    }

    /** How many findings of each kind of change, every kind present. */
    public Map<FindingChange, Integer> counts() {
        Map<FindingChange, Integer> counts = new EnumMap<>(FindingChange.class);
        for (FindingChange c : FindingChange.values()) {
            counts.put(c, 0);
        }
        entries.forEach(e -> counts.merge(e.change(), 1, Integer::sum));
        return counts;
    }

    /** "closed 1, still-open 1, changed 1, new 1". */
    public String countsLine() {
        StringBuilder s = new StringBuilder();
        counts().forEach((c, n) -> s.append(s.isEmpty() ? "" : ", ").append(c.label()).append(' ').append(n));
        return s.toString();
    }

    /** The first entry of this id. */
    public Optional<Entry> entry(String id) {
        return Optional.ofNullable(byId.get(id));
    }
}

package dev.countercheck.ruleset;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A table of the standard or an annex, called from expressions as {@code name(row, column)} (or
 * {@code name(row)} when it has one column). Rows are keyed by text (exact match) or, for an
 * interpolated table, by number with linear interpolation between rows; a row key below the first
 * row takes the first row (the table's least severe entry, as the standard's tables start at
 * their lowest tabulated value), above the last row there is no value. Columns match exactly. When
 * a key is a list (several exposure classes) the value is the largest or the least over its items,
 * as {@code several} says; items the table does not list (XF and XA in Table 4.4N) are passed over,
 * and the lookup fails only when none is listed. A cell with no value ({@code null}, "–" in the
 * standard) is an error when looked up, unless the table says what such a gap means: {@code beyond}
 * is the value taken for a blank cell and above the last row of an interpolated table (0 in
 * Tables 7.2N and 7.3N: no bar size or spacing meets that stress).
 *
 * @param columns column keys in order: text, or numbers as written
 * @param rows    row key (as written) → one value per column, empty where the standard has none
 * @param beyond  the value of a blank cell and above the last row, when the table gives one
 * @param source  how sure the file is of the values ({@code source: from-memory}: recalled, not verified)
 */
public record TableDef(String name, String symbol, String unit, String clause, String note, String origin,
                       boolean interpolate, Several several, List<String> columns,
                       Map<String, List<Optional<Double>>> rows, Optional<Double> beyond, ValueSource source) {

    /** How a list-valued key combines. */
    public enum Several { LARGEST, LEAST }

    /** True when a row or column key as written is a number ("0.3", "160"). */
    static boolean isNumber(String key) {
        try {
            Double.parseDouble(key);
            return true;
        } catch (NumberFormatException e) {
            return false;
        }
    }
}

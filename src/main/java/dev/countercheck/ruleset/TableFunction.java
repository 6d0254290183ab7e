package dev.countercheck.ruleset;

import com.ezylang.evalex.EvaluationException;
import com.ezylang.evalex.Expression;
import com.ezylang.evalex.data.EvaluationValue;
import com.ezylang.evalex.functions.AbstractFunction;
import com.ezylang.evalex.functions.FunctionParameter;
import com.ezylang.evalex.parser.Token;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.ToDoubleFunction;

/** A ruleset table as an expression function: {@code name(row, column)}, or {@code name(row)}. */
@FunctionParameter(name = "keys", isVarArg = true)
final class TableFunction extends AbstractFunction {

    private final TableDef table;

    TableFunction(TableDef table) {
        this.table = table;
    }

    @Override
    public EvaluationValue evaluate(Expression expression, Token token, EvaluationValue... keys)
            throws EvaluationException {
        try {
            return EvaluationValue.numberValue(BigDecimal.valueOf(value(List.of(keys), v -> items(v),
                    TableFunction::text, v -> v.getNumberValue().doubleValue())));
        } catch (Miss miss) {
            throw new EvaluationException(token, miss.getMessage());
        }
    }

    /** Why a lookup gives no value; the evaluator reports it at the call. */
    static final class Miss extends Exception {
        Miss(String message) {
            super(message, null, false, false);
        }
    }

    /**
     * The table's value for {@code keys} (row, and column when the table has several), each key a value of type
     * {@code K} that {@code items} splits into the items of a list (a plain key is one item), {@code text} writes as
     * a row or column key and {@code number} reads as the row of an interpolated table.
     */
    <K> double value(List<K> keys, Function<K, List<K>> items, Function<K, String> text, ToDoubleFunction<K> number)
            throws Miss {
        int expected = table.columns().size() == 1 ? 1 : 2;
        if (keys.size() != expected) {
            throw new Miss("table " + table.name() + " takes " + expected + " key"
                    + (expected == 1 ? "" : "s") + " (row" + (expected == 1 ? "" : ", column") + "), not "
                    + keys.size());
        }
        List<K> rows = items.apply(keys.get(0));
        List<String> columns = expected == 1 ? List.of(table.columns().get(0))
                : items.apply(keys.get(1)).stream().map(text).toList();
        boolean several = rows.size() > 1 || columns.size() > 1;
        Double best = null;
        Miss firstMiss = null;
        for (K row : rows) {
            for (String column : columns) {
                if (several && !lists(text, row, column)) {
                    // a class the table does not list (XF, XA in Table 4.4N) adds nothing; a blank cell of a
                    // listed class is no value at all, never passed over
                    firstMiss = firstMiss == null ? new Miss("table " + table.name() + " ("
                            + table.clause() + ") lists none of the classes given") : firstMiss;
                    continue;
                }
                double v = lookup(text, number, row, column);
                if (best == null || (table.several() == TableDef.Several.LARGEST ? v > best : v < best)) {
                    best = v;
                }
            }
        }
        if (best == null) {
            throw firstMiss != null ? firstMiss : new Miss("table " + table.name() + " was given an empty list");
        }
        return best;
    }

    /** Whether the row key is a number, interpolated between the rows. */
    boolean interpolates() {
        return table.interpolate();
    }

    /** A list key stands for each of its items; items the table does not list are passed over. */
    private static List<EvaluationValue> items(EvaluationValue key) {
        return key.isArrayValue() ? key.getArrayValue() : List.of(key);
    }

    private <K> double lookup(Function<K, String> text, ToDoubleFunction<K> number, K row, String column)
            throws Miss {
        int col = columnIndex(column);
        if (col < 0) {
            throw new Miss("table " + table.name() + " (" + table.clause() + ") has no column '"
                    + column + "'; its columns are " + String.join(", ", table.columns()));
        }
        if (!table.interpolate()) {
            String key = text.apply(row);
            List<Optional<Double>> cells = table.rows().get(key);
            if (cells == null) {
                throw new Miss("table " + table.name() + " (" + table.clause() + ") has no row '" + key + "'");
            }
            return cell(cells.get(col), key, column);
        }
        double key = number.applyAsDouble(row);
        List<Map.Entry<Double, List<Optional<Double>>>> sorted = new ArrayList<>();
        table.rows().forEach((k, v) -> sorted.add(Map.entry(Double.parseDouble(k), v)));
        sorted.sort(Map.Entry.comparingByKey());
        if (key <= sorted.get(0).getKey()) {
            return cell(sorted.get(0).getValue().get(col), sorted.get(0).getKey().toString(), column);
        }
        for (int i = 1; i < sorted.size(); i++) {
            double k0 = sorted.get(i - 1).getKey();
            double k1 = sorted.get(i).getKey();
            if (key <= k1) {
                double v0 = cell(sorted.get(i - 1).getValue().get(col), Double.toString(k0), column);
                double v1 = cell(sorted.get(i).getValue().get(col), Double.toString(k1), column);
                return v0 + (v1 - v0) * (key - k0) / (k1 - k0);
            }
        }
        if (table.beyond().isPresent()) {
            return table.beyond().get();
        }
        throw new Miss("table " + table.name() + " (" + table.clause() + ") ends at "
                + sorted.get(sorted.size() - 1).getKey() + "; " + key + " is beyond it");
    }

    /** Whether the table has the row (an interpolated table has every row) and the column. */
    private <K> boolean lists(Function<K, String> text, K row, String column) {
        return columnIndex(column) >= 0 && (table.interpolate() || table.rows().containsKey(text.apply(row)));
    }

    private int columnIndex(String column) {
        for (int i = 0; i < table.columns().size(); i++) {
            String c = table.columns().get(i);
            if (c.equals(column) || (TableDef.isNumber(c) && TableDef.isNumber(column)
                    && Double.parseDouble(c) == Double.parseDouble(column))) {
                return i;
            }
        }
        return -1;
    }

    private double cell(Optional<Double> cell, String row, String column) throws Miss {
        return cell.or(table::beyond).orElseThrow(() -> new Miss("table " + table.name() + " (" + table.clause()
                + ") gives no value for " + row + ", " + column));
    }


    private static String text(EvaluationValue v) {
        return v.isNumberValue() ? v.getNumberValue().stripTrailingZeros().toPlainString() : v.getStringValue();
    }
}

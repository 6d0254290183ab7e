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
        int expected = table.columns().size() == 1 ? 1 : 2;
        if (keys.length != expected) {
            throw new EvaluationException(token, "table " + table.name() + " takes " + expected + " key"
                    + (expected == 1 ? "" : "s") + " (row" + (expected == 1 ? "" : ", column") + "), not "
                    + keys.length);
        }
        List<EvaluationValue> rows = items(keys[0]);
        List<String> columns = expected == 1 ? List.of(table.columns().get(0))
                : items(keys[1]).stream().map(TableFunction::text).toList();
        boolean several = rows.size() > 1 || columns.size() > 1;
        Double best = null;
        EvaluationException firstMiss = null;
        for (EvaluationValue row : rows) {
            for (String column : columns) {
                if (several && !lists(row, column)) {
                    // a class the table does not list (XF, XA in Table 4.4N) adds nothing; a blank cell of a
                    // listed class is no value at all, never passed over
                    firstMiss = firstMiss == null ? new EvaluationException(token, "table " + table.name() + " ("
                            + table.clause() + ") lists none of the classes given") : firstMiss;
                    continue;
                }
                double v = lookup(token, row, column);
                if (best == null || (table.several() == TableDef.Several.LARGEST ? v > best : v < best)) {
                    best = v;
                }
            }
        }
        if (best == null) {
            throw firstMiss != null ? firstMiss
                    : new EvaluationException(token, "table " + table.name() + " was given an empty list");
        }
        return EvaluationValue.numberValue(BigDecimal.valueOf(best));
    }

    /** A list key stands for each of its items; items the table does not list are passed over. */
    private static List<EvaluationValue> items(EvaluationValue key) {
        return key.isArrayValue() ? key.getArrayValue() : List.of(key);
    }

    private double lookup(Token token, EvaluationValue row, String column) throws EvaluationException {
        int col = columnIndex(column);
        if (col < 0) {
            throw new EvaluationException(token, "table " + table.name() + " (" + table.clause() + ") has no column '"
                    + column + "'; its columns are " + String.join(", ", table.columns()));
        }
        if (!table.interpolate()) {
            List<Optional<Double>> cells = table.rows().get(text(row));
            if (cells == null) {
                throw new EvaluationException(token, "table " + table.name() + " (" + table.clause() + ") has no row '"
                        + text(row) + "'");
            }
            return cell(token, cells.get(col), text(row), column);
        }
        double key = row.getNumberValue().doubleValue();
        List<Map.Entry<Double, List<Optional<Double>>>> sorted = new ArrayList<>();
        table.rows().forEach((k, v) -> sorted.add(Map.entry(Double.parseDouble(k), v)));
        sorted.sort(Map.Entry.comparingByKey());
        if (key <= sorted.get(0).getKey()) {
            return cell(token, sorted.get(0).getValue().get(col), sorted.get(0).getKey().toString(), column);
        }
        for (int i = 1; i < sorted.size(); i++) {
            double k0 = sorted.get(i - 1).getKey();
            double k1 = sorted.get(i).getKey();
            if (key <= k1) {
                double v0 = cell(token, sorted.get(i - 1).getValue().get(col), Double.toString(k0), column);
                double v1 = cell(token, sorted.get(i).getValue().get(col), Double.toString(k1), column);
                return v0 + (v1 - v0) * (key - k0) / (k1 - k0);
            }
        }
        if (table.beyond().isPresent()) {
            return table.beyond().get();
        }
        throw new EvaluationException(token, "table " + table.name() + " (" + table.clause() + ") ends at "
                + sorted.get(sorted.size() - 1).getKey() + "; " + key + " is beyond it");
    }

    /** Whether the table has the row (an interpolated table has every row) and the column. */
    private boolean lists(EvaluationValue row, String column) {
        return columnIndex(column) >= 0 && (table.interpolate() || table.rows().containsKey(text(row)));
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

    private double cell(Token token, Optional<Double> cell, String row, String column) throws EvaluationException {
        return cell.or(table::beyond).orElseThrow(() -> new EvaluationException(token, "table " + table.name() + " (" + table.clause()
                + ") gives no value for " + row + ", " + column));
    }


    private static String text(EvaluationValue v) {
        return v.isNumberValue() ? v.getNumberValue().stripTrailingZeros().toPlainString() : v.getStringValue();
    }
}

package dev.countercheck.ruleset;

import com.ezylang.evalex.Expression;
import com.ezylang.evalex.data.EvaluationValue;
import com.ezylang.evalex.operators.booleans.InfixEqualsOperator;
import com.ezylang.evalex.operators.booleans.InfixGreaterEqualsOperator;
import com.ezylang.evalex.operators.booleans.InfixGreaterOperator;
import com.ezylang.evalex.operators.booleans.InfixLessEqualsOperator;
import com.ezylang.evalex.operators.booleans.InfixLessOperator;
import com.ezylang.evalex.operators.booleans.InfixNotEqualsOperator;
import com.ezylang.evalex.parser.ASTNode;

import java.math.BigDecimal;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Runs every expression of a ruleset's checks on one scope's values with both evaluators, EvalEx's decimals
 * (DECIMAL64) and the compiled doubles ({@link CompiledExpression}), and collects where they disagree: numbers
 * further apart than 1e-12 relative, booleans unequal, an expression not compiled, or a compiled result where
 * EvalEx gives an error. Each derived quantity takes EvalEx's value, so that every expression sees the same
 * inputs in both. A compiled evaluation that hands over to EvalEx (NaN, null) is counted, not a disagreement:
 * EvalEx then answers.
 */
public final class EvaluatorAgreement {

    static final double TOLERANCE = 1e-12;

    private final List<String> disagreements = new ArrayList<>();
    private int numbers;
    private int booleans;
    private int handedOver;
    private int errors;
    private int exactTies;
    private final List<String> nearTies = new ArrayList<>();

    /** Every check of {@code rules} for {@code elementType} whose scope is {@code scope}, on one subject's values. */
    public void compare(Ruleset rules, String elementType, String scope, Map<String, Variable> declared,
                        String subject, Map<String, Object> variables) {
        for (Rule rule : rules.rules().getOrDefault(elementType, Map.of()).values()) {
            if (rule.def().scope().equals(scope) && rule.subject().equals(subject)) {
                compare(rules.expressions(), rule.def(), declared, subject, variables);
            }
        }
    }

    private void compare(RuleExpressions ex, CheckDef def, Map<String, Variable> declared, String subject,
                         Map<String, Object> variables) {
        RuleLayout layout = ex.layout(def, declared);
        RuleLayout.Frame frame = layout.frame(variables, subject);
        def.appliesWhen().ifPresent(w -> compare(ex, layout, frame, def, w, false));
        for (CheckDef.DerivedDef d : def.derived()) {
            Double v = compare(ex, layout, frame, def, d.formula(), true);
            if (v == null) {
                return;
            }
            frame.put(d.name(), v);
        }
        for (CheckDef.RequirementDef r : def.requirements()) {
            compare(ex, layout, frame, def, r.that(), false);
            r.utilisation().ifPresent(u -> compare(ex, layout, frame, def, u, true));
        }
        def.cautions().forEach(c -> compare(ex, layout, frame, def, c.when(), false));
    }

    /** EvalEx's number (when {@code number}), else null. */
    private Double compare(RuleExpressions ex, RuleLayout layout, RuleLayout.Frame frame, CheckDef def,
                           String expression, boolean number) {
        CompiledExpression c = layout.compiled(expression);
        String where = def.id() + ": " + expression + " with " + frame.asMap();
        if (c == null) {
            disagreements.add("not compiled: " + where);
            return null;
        }
        EvaluationValue decimal;
        Object compiled = number ? (Object) c.number(frame.slots()) : c.bool(frame.slots());
        boolean answered = compiled != null && !(compiled instanceof Double d && d.isNaN());
        if (!answered) {
            handedOver++;
        }
        try {
            decimal = ex.evaluate(expression, frame.asMap());
        } catch (Exception e) {
            errors++;
            if (answered) {
                disagreements.add("EvalEx fails (" + e.getMessage() + ") but compiled gives " + compiled + ": " + where);
            }
            return null;
        }
        if (number) {
            numbers++;
            double exact = decimal.getNumberValue().doubleValue();
            if (answered && Math.abs((Double) compiled - exact) > TOLERANCE * Math.max(Math.abs(exact), Double.MIN_NORMAL)) {
                disagreements.add("number " + compiled + " against EvalEx " + exact + ": " + where);
            }
            return exact;
        }
        booleans++;
        countTies(ex, expression, frame.asMap());
        if (answered && !compiled.equals(decimal.getBooleanValue())) {
            disagreements.add("boolean " + compiled + " against EvalEx " + decimal.getBooleanValue() + ": " + where);
        }
        return null;
    }

    /**
     * Counts the comparisons of {@code expression} whose two sides are equal in EvalEx's decimals (an exact tie,
     * which a double meets as well where both sides are exact) or within 1e-12 relative without being equal (a
     * near tie, where the last digit of either arithmetic could decide).
     */
    private void countTies(RuleExpressions ex, String text, Map<String, Object> values) {
        try {
            Expression e = new Expression(text, ex.configuration());
            for (String name : e.getUsedVariables()) {
                values.keySet().stream().filter(k -> k.equalsIgnoreCase(name)).findFirst().ifPresent(k -> e.with(name,
                        values.get(k) instanceof Double d ? BigDecimal.valueOf(d) : values.get(k)));
            }
            for (ASTNode node : e.getAllASTNodes()) {
                Object op = node.getToken().getOperatorDefinition();
                if (op instanceof InfixGreaterOperator || op instanceof InfixGreaterEqualsOperator
                        || op instanceof InfixLessOperator || op instanceof InfixLessEqualsOperator
                        || op instanceof InfixEqualsOperator || op instanceof InfixNotEqualsOperator) {
                    EvaluationValue a = e.evaluateSubtree(node.getParameters().get(0));
                    EvaluationValue b = e.evaluateSubtree(node.getParameters().get(1));
                    if (a.isNumberValue() && b.isNumberValue()) {
                        BigDecimal x = a.getNumberValue();
                        BigDecimal y = b.getNumberValue();
                        if (x.compareTo(y) == 0) {
                            exactTies++;
                        } else if (x.subtract(y).abs().doubleValue() <= TOLERANCE * x.abs().max(y.abs()).doubleValue()) {
                            nearTies.add(text + " with " + x + " and " + y);
                        }
                    }
                }
            }
        } catch (Exception e) {
            // a side that EvalEx cannot evaluate alone (a branch IF would not take) has no tie to count
        }
    }

    /** The comparisons whose sides differed by no more than 1e-12 relative without being equal. */
    public List<String> nearTies() {
        return nearTies;
    }

    public List<String> disagreements() {
        return disagreements;
    }

    /** How many numbers and booleans were compared, handed over to EvalEx, and failed in EvalEx. */
    public String counts() {
        return numbers + " numbers, " + booleans + " booleans compared; " + handedOver + " handed over to EvalEx; "
                + errors + " EvalEx errors; comparisons on a tie: " + exactTies + " exact, " + nearTies.size() + " near";
    }

    public int compared() {
        return numbers + booleans;
    }
}

package dev.countercheck.ruleset;

import com.ezylang.evalex.config.ExpressionConfiguration;
import com.ezylang.evalex.functions.FunctionIfc;
import com.ezylang.evalex.functions.basic.AbsFunction;
import com.ezylang.evalex.functions.basic.IfFunction;
import com.ezylang.evalex.functions.basic.MaxFunction;
import com.ezylang.evalex.functions.basic.MinFunction;
import com.ezylang.evalex.functions.basic.SqrtFunction;
import com.ezylang.evalex.operators.OperatorIfc;
import com.ezylang.evalex.operators.arithmetic.InfixDivisionOperator;
import com.ezylang.evalex.operators.arithmetic.InfixMinusOperator;
import com.ezylang.evalex.operators.arithmetic.InfixMultiplicationOperator;
import com.ezylang.evalex.operators.arithmetic.InfixPlusOperator;
import com.ezylang.evalex.operators.arithmetic.InfixPowerOfOperator;
import com.ezylang.evalex.operators.arithmetic.PrefixMinusOperator;
import com.ezylang.evalex.operators.arithmetic.PrefixPlusOperator;
import com.ezylang.evalex.operators.booleans.InfixAndOperator;
import com.ezylang.evalex.operators.booleans.InfixEqualsOperator;
import com.ezylang.evalex.operators.booleans.InfixGreaterEqualsOperator;
import com.ezylang.evalex.operators.booleans.InfixGreaterOperator;
import com.ezylang.evalex.operators.booleans.InfixLessEqualsOperator;
import com.ezylang.evalex.operators.booleans.InfixLessOperator;
import com.ezylang.evalex.operators.booleans.InfixNotEqualsOperator;
import com.ezylang.evalex.operators.booleans.InfixOrOperator;
import com.ezylang.evalex.operators.booleans.PrefixNotOperator;
import com.ezylang.evalex.parser.ASTNode;
import com.ezylang.evalex.parser.Token;

import java.math.BigDecimal;
import java.util.List;
import java.util.function.ToIntFunction;

/**
 * A rule expression compiled from EvalEx's syntax tree into double and boolean operations, names read from
 * slots resolved once: the arithmetic operators, comparisons, {@code &&}, {@code ||}, {@code !}, IF, MAX, MIN,
 * ABS, SQRT, the ruleset's tables and text equality. Whatever it does not cover is not compiled, and whatever
 * it cannot give as the decimal evaluator would (division by zero, a root of a negative number, a value of
 * another type than the operation takes, a table that has no value, a result that is not finite) it does not
 * answer (NaN, null): the caller then evaluates with EvalEx, which gives its result or its error as before.
 * Numbers agree with EvalEx's decimal arithmetic (DECIMAL64) to about 1e-15 relative ({@code
 * RuleExpressionsAgreementTest}).
 */
final class CompiledExpression {

    /** The compiled form cannot answer this evaluation: EvalEx must. */
    private static final class Unsupported extends RuntimeException {
        static final Unsupported INSTANCE = new Unsupported();

        private Unsupported() {
            super(null, null, false, false);
        }
    }

    /** A node of the compiled tree over the values of the slots; each answers only for its own type. */
    private interface Node {
        default double num(Object[] slots) {
            throw Unsupported.INSTANCE;
        }

        default boolean bool(Object[] slots) {
            throw Unsupported.INSTANCE;
        }

        /** The value as it is (number, text, boolean or list of text), for table keys and equality. */
        default Object any(Object[] slots) {
            return num(slots);
        }

        /** Whether the value is bound or written as it is (a table key of it is written as EvalEx writes it). */
        default boolean asBound() {
            return false;
        }
    }

    private final Node root;

    private CompiledExpression(Node root) {
        this.root = root;
    }

    /**
     * The expression's tree compiled, names read from the slot {@code slotOf} gives (negative when a name has
     * none; the configuration's constants are left to EvalEx); null when the tree uses anything not covered.
     */
    static CompiledExpression of(ASTNode tree, ToIntFunction<String> slotOf, ExpressionConfiguration configuration) {
        Node root = compile(tree, slotOf, configuration);
        return root == null ? null : new CompiledExpression(root);
    }

    /** The number the expression gives (never -0: decimals have no signed zero); NaN when EvalEx must answer. */
    double number(Object[] slots) {
        try {
            double v = root.num(slots);
            return Double.isFinite(v) ? v + 0.0 : Double.NaN;
        } catch (Unsupported e) {
            return Double.NaN;
        }
    }

    /** The condition's value; null when EvalEx must answer. */
    Boolean bool(Object[] slots) {
        try {
            return root.bool(slots);
        } catch (Unsupported e) {
            return null;
        }
    }

    private static Node compile(ASTNode node, ToIntFunction<String> slotOf, ExpressionConfiguration configuration) {
        Token token = node.getToken();
        List<ASTNode> args = node.getParameters();
        Node[] c = new Node[args.size()];
        for (int i = 0; i < c.length; i++) {
            c[i] = compile(args.get(i), slotOf, configuration);
            if (c[i] == null) {
                return null;
            }
        }
        return switch (token.getType()) {
            case NUMBER_LITERAL -> number(token.getValue());
            case STRING_LITERAL -> text(token.getValue());
            case VARIABLE_OR_CONSTANT -> configuration.getDefaultConstants().containsKey(token.getValue()) ? null
                    : slot(slotOf.applyAsInt(token.getValue()));
            case PREFIX_OPERATOR -> prefix(token.getOperatorDefinition(), c[0]);
            case INFIX_OPERATOR -> infix(token.getOperatorDefinition(), c[0], c[1]);
            case FUNCTION -> function(token.getFunctionDefinition(), c);
            default -> null;
        };
    }

    private static Node number(String literal) {
        try {
            double v = new BigDecimal(literal).doubleValue();
            return new Node() {
                @Override
                public double num(Object[] slots) {
                    return v;
                }
            };
        } catch (NumberFormatException e) {
            return null;
        }
    }

    private static Node text(String literal) {
        return new Node() {
            @Override
            public Object any(Object[] slots) {
                return literal;
            }

            @Override
            public boolean asBound() {
                return true;
            }
        };
    }

    private static Node slot(int slot) {
        if (slot < 0) {
            return null;
        }
        return new Node() {
            @Override
            public double num(Object[] slots) {
                if (slots[slot] instanceof Number n) {
                    return n.doubleValue();
                }
                throw Unsupported.INSTANCE;
            }

            @Override
            public boolean bool(Object[] slots) {
                if (slots[slot] instanceof Boolean b) {
                    return b;
                }
                throw Unsupported.INSTANCE;
            }

            @Override
            public Object any(Object[] slots) {
                Object v = slots[slot];
                if (v == null) {
                    throw Unsupported.INSTANCE;
                }
                return v;
            }

            @Override
            public boolean asBound() {
                return true;
            }
        };
    }

    private static Node prefix(OperatorIfc op, Node a) {
        if (op instanceof PrefixMinusOperator) {
            return numeric(s -> -a.num(s));
        }
        if (op instanceof PrefixPlusOperator) {
            return numeric(a::num);
        }
        if (op instanceof PrefixNotOperator) {
            return logical(s -> !a.bool(s));
        }
        return null;
    }

    private static Node infix(OperatorIfc op, Node a, Node b) {
        if (op instanceof InfixPlusOperator) {
            return numeric(s -> a.num(s) + b.num(s));
        }
        if (op instanceof InfixMinusOperator) {
            return numeric(s -> a.num(s) - b.num(s));
        }
        if (op instanceof InfixMultiplicationOperator) {
            return numeric(s -> a.num(s) * b.num(s));
        }
        if (op instanceof InfixDivisionOperator) {
            return numeric(s -> {
                double divisor = b.num(s);
                if (divisor == 0) {
                    throw Unsupported.INSTANCE;
                }
                return a.num(s) / divisor;
            });
        }
        if (op instanceof InfixPowerOfOperator) {
            return numeric(s -> Math.pow(a.num(s), b.num(s)));
        }
        if (op instanceof InfixEqualsOperator) {
            return logical(s -> same(a.any(s), b.any(s)));
        }
        if (op instanceof InfixNotEqualsOperator) {
            return logical(s -> !same(a.any(s), b.any(s)));
        }
        if (op instanceof InfixGreaterOperator) {
            return logical(s -> a.num(s) > b.num(s));
        }
        if (op instanceof InfixGreaterEqualsOperator) {
            return logical(s -> a.num(s) >= b.num(s));
        }
        if (op instanceof InfixLessOperator) {
            return logical(s -> a.num(s) < b.num(s));
        }
        if (op instanceof InfixLessEqualsOperator) {
            return logical(s -> a.num(s) <= b.num(s));
        }
        if (op instanceof InfixAndOperator) {
            return logical(s -> a.bool(s) && b.bool(s));
        }
        if (op instanceof InfixOrOperator) {
            return logical(s -> a.bool(s) || b.bool(s));
        }
        return null;
    }

    /** Equality of two numbers, two texts or two booleans; anything else is left to EvalEx. */
    private static boolean same(Object a, Object b) {
        if (a instanceof Number x && b instanceof Number y) {
            return x.doubleValue() == y.doubleValue();
        }
        if ((a instanceof String && b instanceof String) || (a instanceof Boolean && b instanceof Boolean)) {
            return a.equals(b);
        }
        throw Unsupported.INSTANCE;
    }

    private static Node function(FunctionIfc f, Node[] c) {
        if (f instanceof IfFunction && c.length == 3) {
            return new Node() {
                @Override
                public double num(Object[] s) {
                    return c[0].bool(s) ? c[1].num(s) : c[2].num(s);
                }

                @Override
                public boolean bool(Object[] s) {
                    return c[0].bool(s) ? c[1].bool(s) : c[2].bool(s);
                }

                @Override
                public Object any(Object[] s) {
                    return c[0].bool(s) ? c[1].any(s) : c[2].any(s);
                }
            };
        }
        if ((f instanceof MaxFunction || f instanceof MinFunction) && c.length > 0) {
            boolean max = f instanceof MaxFunction;
            return numeric(s -> {
                double best = c[0].num(s);
                for (int i = 1; i < c.length; i++) {
                    double v = c[i].num(s);
                    best = max ? Math.max(best, v) : Math.min(best, v);
                }
                return best;
            });
        }
        if (f instanceof AbsFunction && c.length == 1) {
            return numeric(s -> Math.abs(c[0].num(s)));
        }
        if (f instanceof SqrtFunction && c.length == 1) {
            return numeric(s -> {
                double v = c[0].num(s);
                if (v < 0) {
                    throw Unsupported.INSTANCE;
                }
                return Math.sqrt(v);
            });
        }
        if (f instanceof TableFunction table) {
            // a computed key is written as EvalEx writes its decimal, which a double need not match (1/3·3): only
            // the row of an interpolated table, read as a number, may be computed
            for (int i = 0; i < c.length; i++) {
                if (!c[i].asBound() && !(i == 0 && table.interpolates())) {
                    return null;
                }
            }
            return numeric(s -> {
                Object[] keys = new Object[c.length];
                for (int i = 0; i < keys.length; i++) {
                    keys[i] = c[i].any(s);
                }
                try {
                    return table.value(List.of(keys), CompiledExpression::items, CompiledExpression::key,
                            CompiledExpression::rowNumber);
                } catch (TableFunction.Miss miss) {
                    throw Unsupported.INSTANCE;
                }
            });
        }
        return null;
    }

    private static List<Object> items(Object key) {
        if (key instanceof List<?> list) {
            return List.copyOf(list);
        }
        return List.of(key);
    }

    /** A bound table key as EvalEx writes it: text as it is, a number as the decimal it was bound as. */
    private static String key(Object key) {
        if (key instanceof String text) {
            return text;
        }
        if (key instanceof Double d) {
            return BigDecimal.valueOf(d).stripTrailingZeros().toPlainString();
        }
        throw Unsupported.INSTANCE;
    }

    private static double rowNumber(Object key) {
        if (key instanceof Number n) {
            return n.doubleValue();
        }
        throw Unsupported.INSTANCE;
    }

    /** A node that gives a number. */
    private interface Numeric extends Node {
        @Override
        double num(Object[] slots);
    }

    /** A node that gives a boolean. */
    private interface Logical extends Node {
        @Override
        boolean bool(Object[] slots);

        @Override
        default Object any(Object[] slots) {
            return bool(slots);
        }
    }

    private static Node numeric(Numeric n) {
        return n;
    }

    private static Node logical(Logical n) {
        return n;
    }
}

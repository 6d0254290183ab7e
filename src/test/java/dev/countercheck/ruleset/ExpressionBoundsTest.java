package dev.countercheck.ruleset;

import com.ezylang.evalex.config.ExpressionConfiguration;
import com.ezylang.evalex.config.FunctionDictionaryIfc;
import org.junit.jupiter.api.Test;

import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The names of EvalEx's library that {@link ExpressionBounds} lists, and the functions the rules' evaluator holds,
 * are EvalEx's own: the list is EvalEx's dictionary of standard functions, and each function a rule may call is
 * the object EvalEx's dictionary has for that name (so that a rule evaluates as it would with EvalEx's whole library).
 */
class ExpressionBoundsTest {

    private static final FunctionDictionaryIfc EVALEX = ExpressionConfiguration.defaultConfiguration()
            .getFunctionDictionary();

    private static Set<String> upper(Set<String> names) {
        return names.stream().map(n -> n.toUpperCase(Locale.ROOT)).collect(Collectors.toCollection(TreeSet::new));
    }

    @Test
    void theLibraryListedIsEvalExsDictionaryOfStandardFunctions() {
        assertThat(upper(ExpressionBounds.LIBRARY)).isEqualTo(upper(EVALEX.getAvailableFunctionNames()));
        assertThat(java.util.List.of("round", "Fact", "str_upper")).as("in any case").allMatch(ExpressionBounds.LIBRARY::contains);
        assertThat(ExpressionBounds.LIBRARY).containsAll(ExpressionBounds.FUNCTIONS);
    }

    @Test
    void theRulesEvaluatorHoldsTheOfferedFunctionsAsEvalExHasThem() {
        FunctionDictionaryIfc offered = RuleExpressions.offeredFunctions();
        assertThat(upper(offered.getAvailableFunctionNames())).isEqualTo(upper(ExpressionBounds.FUNCTIONS));
        for (String name : ExpressionBounds.FUNCTIONS) {
            assertThat(offered.getFunction(name.toLowerCase(Locale.ROOT))).as(name)
                    .hasSameClassAs(EVALEX.getFunction(name));
        }
    }

    @Test
    void aRulesetsEvaluatorHoldsTheOfferedFunctionsAndItsTables() {
        RuleExpressions expressions = new RuleExpressions(Map.of(), Map.of());
        assertThat(upper(expressions.configuration().getFunctionDictionary().getAvailableFunctionNames()))
                .isEqualTo(upper(ExpressionBounds.FUNCTIONS));
    }
}

package dev.countercheck.report;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The report's scanner of rule expressions ({@link RuleNotation#tokens}, written by hand because it runs on every
 * rule step of every element) against the rules' token grammar written as one regular expression, the scanner it
 * replaced: the same tokens, or the same refusal, on any text of the characters the grammar gives meaning to.
 */
class RuleNotationTokensProperties {

    private static final Pattern GRAMMAR = Pattern.compile(
            "\\s*(?:(?<number>\\d+(?:\\.\\d+)?(?:[eE][+-]?\\d+)?)|(?<name>[A-Za-z_][A-Za-z0-9_]*)"
                    + "|(?<text>\"[^\"]*\")|(?<list>\\[[^\\[\\]\"]*])|(?<op>\\|\\||&&|<=|>=|==|!=|[-+*/^<>(),!]))");

    @Property(tries = 400)
    void theScannerFindsTheGrammarsTokens(@ForAll("expressions") String expression) {
        assertThat(RuleNotation.tokens(expression)).isEqualTo(byGrammar(expression));
    }

    @Example
    void aRuleExpressionAndItsValuesAreScanned() {
        assertThat(RuleNotation.tokens("IF(phi <= 32, 1.5e-3, -x_2) && c == \"soil\" || e != [XC2, XD1]  "))
                .containsExactly("IF", "(", "phi", "<=", "32", ",", "1.5e-3", ",", "-", "x_2", ")", "&&", "c", "==",
                        "\"soil\"", "||", "e", "!=", "[XC2, XD1]");
        assertThat(RuleNotation.tokens("2 # 3")).isNull();
    }

    @Provide
    Arbitrary<String> expressions() {
        return Arbitraries.strings().withChars("09aZ_ \t\n\u000B\u2003.eE+-*/^<>=!|&(),\"[]#xφ").ofMaxLength(24);
    }

    private static List<String> byGrammar(String expression) {
        List<String> tokens = new ArrayList<>();
        Matcher m = GRAMMAR.matcher(expression);
        int at = 0;
        while (at < expression.length()) {
            if (!m.find(at) || m.start() != at) {
                return expression.substring(at).isBlank() ? tokens : null;
            }
            tokens.add(m.group().strip());
            at = m.end();
        }
        return tokens;
    }
}

package dev.countercheck.element;

import dev.countercheck.ruleset.EvaluatorAgreement;
import dev.countercheck.ruleset.RuleVocabulary.ElementRules;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetLoader;
import dev.countercheck.ruleset.Variable;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every rule expression of every bundled ruleset, on invented scopes of every element type (each number its
 * example scaled by a random factor, half of them rounded to whole numbers so that comparisons meet ties; random
 * texts, booleans and exposure classes; fixed seed), gives the same with the compiled doubles as with EvalEx's
 * decimals (numbers to 1e-12 relative, booleans equal). No comparison may sit within 1e-12 of its tie without being
 * on it: there the last digit of either arithmetic could decide, and the agreement of the booleans would be luck.
 */
class RuleEvaluatorsOnRandomScopesTest {

    private static final List<String> CAST = List.of("soil", "blinding", "formwork");
    private static final List<String> EXPOSURE = List.of("X0", "XC1", "XC2", "XC3", "XC4", "XD1", "XD2", "XD3", "XS1",
            "XS2", "XS3", "XF1", "XA2");
    private static final int SCOPES = 25;

    @Test
    void compiledAndDecimalEvaluationAgreeOnRandomScopes() throws Exception {
        Random random = new Random(14);
        EvaluatorAgreement agreement = new EvaluatorAgreement();
        RulesetLoader loader = new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY);
        for (String id : List.of("en1992-recommended", "en1992-uk-na", "house-example")) {
            Ruleset rules = loader.load(id);
            new TreeMap<>(ProjectReviewer.RULE_VOCABULARY.elementTypes()).forEach((type, vocabulary) ->
                    compare(agreement, rules, type, vocabulary, random));
        }
        System.out.println("random scopes: " + agreement.counts());
        assertThat(agreement.compared()).isGreaterThan(5_000);
        assertThat(agreement.disagreements()).isEmpty();
        assertThat(agreement.nearTies()).isEmpty();
    }

    private static void compare(EvaluatorAgreement agreement, Ruleset rules, String type, ElementRules vocabulary,
                                Random random) {
        new TreeMap<>(vocabulary.scopes()).forEach((scope, declared) -> {
            for (String subject : vocabulary.subjectsOf(scope)) {
                for (int i = 0; i < SCOPES; i++) {
                    agreement.compare(rules, type, scope, declared, subject, invented(declared, random));
                }
            }
        });
    }

    private static Map<String, Object> invented(Map<String, Variable> declared, Random random) {
        Map<String, Object> values = new HashMap<>();
        new TreeMap<>(declared).forEach((name, v) -> values.put(name, switch (v.type()) {
            case NUMBER -> number(((Number) v.example()).doubleValue(), random);
            case BOOLEAN -> random.nextBoolean();
            case TEXT -> name.startsWith("cast_against") ? CAST.get(random.nextInt(CAST.size())) : v.example();
            case TEXT_LIST -> exposure(random);
        }));
        return values;
    }

    private static double number(double example, Random random) {
        double v = example * (0.1 + 2.9 * random.nextDouble());
        return random.nextBoolean() ? Math.rint(v) : v;
    }

    private static List<String> exposure(Random random) {
        List<String> classes = new ArrayList<>();
        int n = 1 + random.nextInt(3);
        while (classes.size() < n) {
            String c = EXPOSURE.get(random.nextInt(EXPOSURE.size()));
            if (!classes.contains(c)) {
                classes.add(c);
            }
        }
        return classes;
    }
}

package dev.countercheck.actions;

import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The combinations against published worked examples of EN 1990 combinations and against the
 * expressions applied by hand. Factors here are built in the test (the generator knows no ruleset).
 */
class CombinationGeneratorTest {

    /** EN 1990 Table A1.2(B) recommended: γG,sup 1.35, γG,inf 1.0, γQ 1.5 (from memory). */
    private static final Factors.Partial STR = new Factors.Partial(1.35, 1.0, 1.5, "Table A1.2(B)");
    /** Table A1.2(C): γG 1.0, γQ 1.3; Table A1.2(A): 1.10, 0.90, 1.5 (from memory). */
    private static final Factors.Partial GEO = new Factors.Partial(1.0, 1.0, 1.3, "Table A1.2(C)");
    private static final Factors.Partial EQU = new Factors.Partial(1.10, 0.90, 1.5, "Table A1.2(A)");

    private static Factors factors(boolean split, double xi, Map<String, Psi> psi) {
        return new Factors(STR, split, xi, GEO, EQU, 1.0, true, psi, "Table A1.1");
    }

    private static CharacteristicAction g(double n) {
        return new CharacteristicAction(Source.G, Optional.empty(), new Effects(n, 0, 0, 0, 0), false);
    }

    private static CharacteristicAction q(String category, double n) {
        return new CharacteristicAction(Source.Q, Optional.of(category), new Effects(n, 0, 0, 0, 0), false);
    }

    private static CharacteristicAction w(double n, double my, boolean reversible) {
        return new CharacteristicAction(Source.W, Optional.empty(), new Effects(n, 0, my, 0, 0), reversible);
    }

    private static Combination named(List<Combination> all, String name) {
        return all.stream().filter(c -> c.name().equals(name)).findFirst()
                .orElseThrow(() -> new AssertionError("no combination " + name + " among "
                        + all.stream().map(Combination::name).toList()));
    }

    /**
     * The Concrete Centre, "Worked Examples to Eurocode 2: Volume 1" (2009), wall example, "Combinations of
     * actions at ground floor" (seen in a reproduction at eurocode.us, concrete-structures-eurocode-3; example
     * number not captured): Exp. (6.10) with the UK annex's ψ0 = 0.5 for wind and 0.7 for the imposed load.
     * Gk = 214.6 + 50.1, Wk = 502.9, Qk = 35.7 kN/m:
     * (a) wind leading: 1.35·264.7 + 1.5·502.9 + 1.5·0.7·35.7 = 1149.2 kN/m;
     * (c) imposed leading: 1.35·264.7 + 1.5·35.7 + 1.5·0.5·502.9 = 788.1 kN/m.
     */
    @Test
    void expression610AgainstThePublishedWallExample() {
        Map<String, Psi> psi = Map.of("B", new Psi(0.7, 0.5, 0.3), "W", new Psi(0.5, 0.2, 0));
        List<Combination> all = CombinationGenerator.generate(List.of(g(214.6 + 50.1), w(502.9, 0, false),
                q("B", 35.7)), factors(false, 0.85, psi));
        assertThat(named(all, "6.10 G sup + W lead + Q(B) ψ0").effects().n()).isCloseTo(1149.2, within(0.05));
        assertThat(named(all, "6.10 G sup + Q(B) lead + W ψ0").effects().n()).isCloseTo(788.1, within(0.05));
    }

    /**
     * The same book, column example, "Design axial load ground floor NEd" (same reproduction): Exp. (6.10b)
     * with the UK annex's ξ = 0.925 (written there as ξ·γG = 1.25): Gk = 5553.6, imposed 0.6·2237.5
     * (αn = 0.6 applied to the floors' imposed load, as there) leading, roof 42.0 accompanying with
     * ψ0 = 0.7: NEd = 1.25·5553.6 + 1.5·2237.5·0.6 + 0.7·1.5·42.0 = 9000.0 kN. With ξ·γG = 0.925·1.35 =
     * 1.24875 unrounded the sum is 8993.1 kN, 0.08 % less than the printed value.
     */
    @Test
    void expression610bAgainstThePublishedColumnExample() {
        Map<String, Psi> psi = Map.of("B", new Psi(0.7, 0.5, 0.3), "H", new Psi(0.7, 0, 0));
        List<Combination> all = CombinationGenerator.generate(List.of(g(5553.6), q("B", 0.6 * 2237.5), q("H", 42.0)),
                factors(true, 0.925, psi));
        Combination b = named(all, "6.10b G sup + Q(B) lead + Q(H) ψ0");
        assertThat(b.effects().n()).isCloseTo(9000.0, within(9000.0 * 0.001));
        assertThat(b.selfWeightFactor()).isCloseTo(0.925 * 1.35, within(1e-12));
        // 6.10a puts ψ0 on every variable action: 1.35·5553.6 + 1.5·0.7·1342.5 + 1.5·0.7·42 (hand calculation)
        assertThat(named(all, "6.10a G sup + Q(B) ψ0 + Q(H) ψ0").effects().n())
                .isCloseTo(1.35 * 5553.6 + 1.05 * 1342.5 + 1.05 * 42.0, within(1e-9));
    }

    /**
     * Exp. (6.14b) and (6.16b) by hand (EN 1990 6.5.3, ψ of Table A1.1 for category B, from memory):
     * G 400, Q(B) 200, wind 100 with ψ0 0.6, ψ2 0: characteristic with Q leading 400 + 200 + 0.6·100 = 660;
     * quasi-permanent 400 + 0.3·200 = 460 (wind has ψ2 = 0, so it adds nothing and the case is not repeated).
     */
    @Test
    void serviceabilityCombinationsByHand() {
        Map<String, Psi> psi = Map.of("B", new Psi(0.7, 0.5, 0.3), "W", new Psi(0.6, 0.2, 0));
        List<Combination> all = CombinationGenerator.generate(List.of(g(400), q("B", 200), w(100, 0, false)),
                factors(false, 0.85, psi));
        assertThat(named(all, "6.14b G + Q(B) lead + W ψ0").effects().n()).isCloseTo(660, within(1e-9));
        assertThat(named(all, "6.16b G + Q(B) ψ2").effects().n()).isCloseTo(460, within(1e-9));
        assertThat(all.stream().filter(c -> c.kind() == Combination.Kind.SLS_QUASI_PERMANENT).map(Combination::name))
                .containsExactly("6.16b G", "6.16b G + Q(B) ψ2");
    }

    /**
     * Every ULS (6.10) case of G + Q + reversible W, listed: the permanent actions alone and each variable
     * action leading, with γG,sup and γG,inf, wind both ways; none repeated (hand enumeration).
     */
    @Test
    void eachVariableLeadsInTurnWithBothSignsAndBothPermanentFactors() {
        Map<String, Psi> psi = Map.of("B", new Psi(0.7, 0.5, 0.3), "W", new Psi(0.6, 0.2, 0));
        List<Combination> all = CombinationGenerator.generate(List.of(g(400), q("B", 200), w(-50, 300, true)),
                factors(false, 0.85, psi));
        List<String> uls = all.stream().filter(c -> c.kind() == Combination.Kind.ULS).map(Combination::name).toList();
        List<String> expected = new java.util.ArrayList<>();
        for (String gp : List.of("G sup", "G inf")) {
            expected.addAll(List.of("6.10 " + gp, "6.10 " + gp + " + Q(B) lead", "6.10 " + gp + " + Q(B) lead + W+ ψ0",
                    "6.10 " + gp + " + Q(B) lead + W− ψ0", "6.10 " + gp + " + W+ lead", "6.10 " + gp + " + W+ lead + Q(B) ψ0",
                    "6.10 " + gp + " + W− lead", "6.10 " + gp + " + W− lead + Q(B) ψ0"));
        }
        assertThat(uls).containsExactlyElementsOf(expected);
        Combination minus = named(all, "6.10 G inf + W− lead");
        // 1.0·400 + 1.5·(+50) and My = 1.5·(−300) (hand calculation)
        assertThat(minus.effects().n()).isCloseTo(475, within(1e-9));
        assertThat(minus.effects().my()).isCloseTo(-450, within(1e-9));
        assertThat(minus.selfWeightFactor()).isEqualTo(1.0);
        assertThat(CombinationGenerator.generate(List.of(g(400), q("B", 200), w(-50, 300, true)),
                factors(false, 0.85, psi))).isEqualTo(all);
    }

    /** A roof load with ψ0 = 0 (Table A1.1, category H) accompanies as nothing: that case is the one without it. */
    @Test
    void identicalCasesAreGeneratedOnce() {
        Map<String, Psi> psi = Map.of("B", new Psi(0.7, 0.5, 0.3), "H", new Psi(0, 0, 0));
        List<Combination> all = CombinationGenerator.generate(List.of(g(400), q("B", 200), q("H", 30)),
                factors(false, 0.85, psi));
        List<String> names = all.stream().map(Combination::name).toList();
        assertThat(names).contains("6.10 G sup + Q(B) lead").doesNotContain("6.10 G sup + Q(B) lead + Q(H) ψ0");
        assertThat(names).doesNotHaveDuplicates();
    }

    /**
     * GEO (DA1-2) and EQU sets (Table A1.2(C), (A), from memory): 1.0·400 + 1.3·200 = 660;
     * EQU with γG,inf: 0.9·400 + 1.5·(−80) = 240; the accidental set only when an accidental action is given.
     */
    @Test
    void geoAndEquSetsAndAccidentalOnlyWhenGiven() {
        Map<String, Psi> psi = Map.of("B", new Psi(0.7, 0.5, 0.3), "W", new Psi(0.6, 0.2, 0));
        List<Combination> all = CombinationGenerator.generate(List.of(g(400), q("B", 200), w(-80, 0, false)),
                factors(false, 0.85, psi));
        assertThat(named(all, "GEO G + Q(B) lead").effects().n()).isCloseTo(660, within(1e-9));
        assertThat(named(all, "EQU G inf + W lead").effects().n()).isCloseTo(240, within(1e-9));
        assertThat(all).noneMatch(c -> c.kind() == Combination.Kind.ACCIDENTAL);
        List<Combination> withImpact = CombinationGenerator.generate(List.of(g(400), q("B", 200),
                new CharacteristicAction(Source.A, Optional.empty(), new Effects(0, 0, 150, 0, 0), false)),
                factors(false, 0.85, psi));
        // Exp. (6.11b): 1.0·400 + Ad + ψ1·200 = 400 + 0.5·200 = 500 with My = 150 (hand calculation)
        Combination acc = named(withImpact, "6.11b G + A + Q(B) ψ1");
        assertThat(acc.effects().n()).isCloseTo(500, within(1e-9));
        assertThat(acc.effects().my()).isCloseTo(150, within(1e-9));
    }
}

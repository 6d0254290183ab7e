package dev.countercheck.statics;

import dev.countercheck.statics.Overturning.Edge;
import dev.countercheck.statics.PileGroupReactions.Load;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Overturning about the edges of a footing (EQU). Invented loads; hand calculations beside each value. */
class OverturningTest {

    @Test
    void eachEdgeWeighsTheHoldingLoadsAgainstTheTurningMoment() {
        // Hand calculation: 2000 × 1500 plan; holding down 90 kN (footing, at the centre) and 300 kN (column at
        // x = 200); My* = 250 kNm. Edge x = +1000: Ed,stb = 90·1.0 + 300·0.8 = 330 kNm, Ed,dst = 250 kNm.
        // Edge x = −1000: 90·1.0 + 300·1.2 = 450 kNm, nothing turns it. Edges y = ±750: 390·0.75 = 292.5.
        List<Load> loads = List.of(new Load("γG,inf·W", 90, new PlanPoint(0, 0)),
                new Load("γG,inf·G", 300, new PlanPoint(200, 0)));
        List<Edge> edges = Overturning.aboutEdges(2000, 1500, loads, 0, 250, "EQU-1");
        assertThat(edges.stream().mapToDouble(e -> e.mStb().value()).toArray())
                .containsExactly(new double[] {330, 450, 292.5, 292.5}, within(1e-9));
        assertThat(edges.stream().mapToDouble(e -> e.mDst().value()).toArray())
                .containsExactly(new double[] {250, 0, 0, 0}, within(1e-9));
        Edge governing = Overturning.governing(edges);
        assertThat(governing.edge()).isEqualTo("x = +Lx/2");
        assertThat(governing.utilisation()).isCloseTo(250.0 / 330, within(1e-12));
        assertThat(governing.mDst().symbol()).isEqualTo("Ed,dst (EQU-1)");
    }

    @Test
    void anUpliftTurnsTheFootingAndANegativeMomentTheOtherWay() {
        // Hand calculation: 2000 × 2000; 200 kN down at the centre, 50 kN uplift at (0, 600); Mx* = −100 kNm.
        // Edge y = −1000: holding 200·1.0 = 200; turning 100 + 50·1.6 = 180 kNm.
        // Edge y = +1000: holding 200, turning 50·0.4 = 20 kNm.
        List<Load> loads = List.of(new Load("W", 200, new PlanPoint(0, 0)), new Load("uplift", -50,
                new PlanPoint(0, 600)));
        List<Edge> edges = Overturning.aboutEdges(2000, 2000, loads, -100, 0, "");
        assertThat(edges.get(3).mDst().value()).isCloseTo(180, within(1e-9));
        assertThat(edges.get(3).mStb().value()).isCloseTo(200, within(1e-9));
        assertThat(edges.get(2).mDst().value()).isCloseTo(20, within(1e-9));
        assertThat(Overturning.governing(edges).edge()).isEqualTo("y = −Ly/2");
    }
}

package dev.countercheck.statics;

import java.util.function.DoubleBinaryOperator;

/**
 * An independent check of a pressure field: the midpoint rule on an n × n grid over the plan Lx × Ly centred on
 * the origin, knowing nothing of how the field was solved. Forces kN, moments kNm.
 */
record GridIntegral(double forceKn, double mxKnm, double myKnm, double contactFraction) {

    static GridIntegral of(DoubleBinaryOperator q, double lxMm, double lyMm, int n) {
        double dx = lxMm / n;
        double dy = lyMm / n;
        double f = 0;
        double mx = 0;
        double my = 0;
        int inContact = 0;
        for (int i = 0; i < n; i++) {
            double x = -lxMm / 2 + (i + 0.5) * dx;
            for (int j = 0; j < n; j++) {
                double y = -lyMm / 2 + (j + 0.5) * dy;
                double p = q.applyAsDouble(x, y);
                f += p;
                mx += p * y;
                my += p * x;
                inContact += p > 0 ? 1 : 0;
            }
        }
        double cell = dx * dy / 1e6;
        return new GridIntegral(f * cell, mx * cell / 1000, my * cell / 1000, inContact / (double) n / n);
    }
}

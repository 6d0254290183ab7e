package dev.countercheck.actions;

/**
 * Action effects at the top of an element: N (kN, compression positive), Mx, My (kNm), Hx, Hy (kN).
 */
public record Effects(double n, double mx, double my, double hx, double hy) {

    public static final Effects ZERO = new Effects(0, 0, 0, 0, 0);

    public Effects plus(Effects o) {
        return new Effects(n + o.n, mx + o.mx, my + o.my, hx + o.hx, hy + o.hy);
    }

    public Effects times(double f) {
        return new Effects(n * f, mx * f, my * f, hx * f, hy * f);
    }
}

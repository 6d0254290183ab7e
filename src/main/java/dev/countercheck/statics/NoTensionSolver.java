package dev.countercheck.statics;

/**
 * The plane q = α + β·u + γ·v, clipped at zero, that carries a resultant of unit mean pressure at (eu, ev) on
 * a convex plan in normalised coordinates: ∫q⁺ dA = A, ∫q⁺·u dA = A·eu, ∫q⁺·v dA = A·ev.
 *
 * <p>These three equations are the gradient of the convex function F(θ) = ½∫(q⁺)² dA − θ·g with
 * θ = (α, β, γ) and g = A·(1, eu, ev); its Hessian is the second-moment matrix of the zone in contact. So
 * Newton's method with a backtracking (Armijo) line search on F converges from the full-contact plane for
 * every resultant strictly inside the plan (F is bounded below exactly then), deterministically. The
 * integrals are exact (polygon clipping and the edge-midpoint rule). Close to the solution F is flat to
 * its last digit; there a step is taken when it lowers the residual instead.
 */
final class NoTensionSolver {

    /** Equilibrium to this fraction of the load (and its moments over the plan's half-widths). */
    private static final double TOLERANCE = 1e-11;
    private static final int MAX_ITERATIONS = 200;

    private NoTensionSolver() {
    }

    /** The solved plane and how many Newton steps it took. */
    record Plane(double alpha, double beta, double gamma, int iterations) {
    }

    static Plane solve(ConvexPolygon plan, double eu, double ev) {
        double area = plan.area();
        double[] g = {area, area * eu, area * ev};
        double[] theta = solve3(moments(plan), g);
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            ConvexPolygon contact = clip(plan, theta);
            double[] grad = gradient(contact, theta, g);
            if (norm(grad) <= TOLERANCE * area) {
                return new Plane(theta[0], theta[1], theta[2], iteration);
            }
            double[] step = solve3(moments(contact), grad); // the Newton step is −step
            double slope = dot(grad, step);
            double f0 = objective(plan, theta, g);
            double t = 1;
            double[] next = advance(theta, step, t);
            while (!acceptable(plan, next, g, f0, 1e-4 * t * slope, norm(grad)) && t > 1e-14) {
                t /= 2;
                next = advance(theta, step, t);
            }
            theta = next;
        }
        throw new ArithmeticException("contact pressure: no convergence in " + MAX_ITERATIONS
                + " Newton steps for the resultant at (" + eu + ", " + ev + ") of the half-widths");
    }

    /**
     * Armijo's sufficient decrease of F; or, where F changes by no more than its rounding (close to the
     * solution, where F is flat to the last digit), a smaller residual.
     */
    private static boolean acceptable(ConvexPolygon plan, double[] next, double[] g, double f0, double decrease,
                                      double residual) {
        double f = objective(plan, next, g);
        if (f <= f0 - decrease) {
            return true;
        }
        return Math.abs(f - f0) <= 1e-12 * (Math.abs(f0) + g[0])
                && norm(gradient(clip(plan, next), next, g)) < residual;
    }

    private static ConvexPolygon clip(ConvexPolygon plan, double[] t) {
        return plan.clip(t[0], t[1], t[2]);
    }

    private static double[] gradient(ConvexPolygon contact, double[] t, double[] g) {
        return new double[] {
            contact.integrate((u, v) -> t[0] + t[1] * u + t[2] * v) - g[0],
            contact.integrate((u, v) -> (t[0] + t[1] * u + t[2] * v) * u) - g[1],
            contact.integrate((u, v) -> (t[0] + t[1] * u + t[2] * v) * v) - g[2]};
    }

    private static double objective(ConvexPolygon plan, double[] t, double[] g) {
        ConvexPolygon contact = clip(plan, t);
        double q2 = contact.integrate((u, v) -> {
            double q = t[0] + t[1] * u + t[2] * v;
            return q * q;
        });
        return 0.5 * q2 - dot(t, g);
    }

    /** The symmetric matrix ∫ φ·φᵀ dA with φ = (1, u, v), row by row. */
    private static double[][] moments(ConvexPolygon p) {
        double a = p.integrate((u, v) -> 1);
        double su = p.integrate((u, v) -> u);
        double sv = p.integrate((u, v) -> v);
        double suu = p.integrate((u, v) -> u * u);
        double suv = p.integrate((u, v) -> u * v);
        double svv = p.integrate((u, v) -> v * v);
        return new double[][] {{a, su, sv}, {su, suu, suv}, {sv, suv, svv}};
    }

    /** x with m·x = r by Cramer's rule (m symmetric positive definite, 3 × 3). */
    private static double[] solve3(double[][] m, double[] r) {
        double det = det(m[0], m[1], m[2]);
        double[] x = new double[3];
        for (int k = 0; k < 3; k++) {
            double[][] c = {m[0].clone(), m[1].clone(), m[2].clone()};
            for (int i = 0; i < 3; i++) {
                c[i][k] = r[i];
            }
            x[k] = det(c[0], c[1], c[2]) / det;
        }
        return x;
    }

    private static double det(double[] a, double[] b, double[] c) {
        return a[0] * (b[1] * c[2] - b[2] * c[1]) - a[1] * (b[0] * c[2] - b[2] * c[0])
                + a[2] * (b[0] * c[1] - b[1] * c[0]);
    }

    private static double[] advance(double[] t, double[] step, double s) {
        return new double[] {t[0] - s * step[0], t[1] - s * step[1], t[2] - s * step[2]};
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    private static double norm(double[] a) {
        return Math.max(Math.abs(a[0]), Math.max(Math.abs(a[1]), Math.abs(a[2])));
    }
}

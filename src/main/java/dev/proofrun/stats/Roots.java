package dev.proofrun.stats;

import java.util.function.DoubleUnaryOperator;

/**
 * Brent's root finder on a bracket (Brent 1973, <i>Algorithms for Minimization without Derivatives</i>,
 * ch. 4, procedure "zero"): inverse quadratic interpolation or secant steps, with bisection whenever
 * they would leave the bracket or converge too slowly. It never evaluates outside [a, b] and always
 * keeps a sign change, so it converges for any continuous function with g(a)·g(b) ≤ 0.
 */
final class Roots {

    private static final double EPSILON = Math.ulp(1.0);
    private static final int MAX_ITERATIONS = 200;

    private Roots() {
    }

    /**
     * A root of g in [a, b] to within absolute tolerance tol (plus 4·ε·|x|).
     *
     * @param ga g(a), already computed
     * @param gb g(b), already computed; ga and gb must not have the same strict sign
     */
    static double brent(DoubleUnaryOperator g, double a, double b, double ga, double gb, double tol) {
        if (ga == 0) {
            return a;
        }
        if (gb == 0) {
            return b;
        }
        if (Math.signum(ga) == Math.signum(gb)) {
            throw new IllegalStateException("root is not bracketed");
        }
        double c = a;
        double gc = ga;
        double d = b - a;
        double e = d;
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            if (Math.abs(gc) < Math.abs(gb)) {
                a = b;
                b = c;
                c = a;
                ga = gb;
                gb = gc;
                gc = ga;
            }
            double tolerance = 2 * EPSILON * Math.abs(b) + 0.5 * tol;
            double m = 0.5 * (c - b);
            if (Math.abs(m) <= tolerance || gb == 0) {
                return b;
            }
            if (Math.abs(e) < tolerance || Math.abs(ga) <= Math.abs(gb)) {
                d = m;
                e = m;
            } else {
                double s = gb / ga;
                double p;
                double q;
                if (a == c) {
                    p = 2 * m * s;
                    q = 1 - s;
                } else {
                    double qa = ga / gc;
                    double r = gb / gc;
                    p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
                    q = (qa - 1) * (r - 1) * (s - 1);
                }
                if (p > 0) {
                    q = -q;
                } else {
                    p = -p;
                }
                if (2 * p < 3 * m * q - Math.abs(tolerance * q) && p < Math.abs(0.5 * e * q)) {
                    e = d;
                    d = p / q;
                } else {
                    d = m;
                    e = m;
                }
            }
            a = b;
            ga = gb;
            b += Math.abs(d) > tolerance ? d : (m > 0 ? tolerance : -tolerance);
            gb = g.applyAsDouble(b);
            if ((gb > 0) == (gc > 0)) {
                c = a;
                gc = ga;
                d = b - a;
                e = d;
            }
        }
        return b;
    }
}

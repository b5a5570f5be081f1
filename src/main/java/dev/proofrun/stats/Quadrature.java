package dev.proofrun.stats;

import java.util.function.DoubleUnaryOperator;

/**
 * Adaptive Gauss–Legendre quadrature on a finite interval, for the smooth one-dimensional integrals of
 * this package (normal probabilities weighted by the chi density).
 *
 * <p>Each panel [a, b] is integrated with the {@value #ORDER}-point Gauss–Legendre rule and, as an error
 * check, with the {@value #CHECK_ORDER}-point rule. If they differ by at most tol the {@value #ORDER}-point
 * value is accepted (its error is far below that of the coarser rule for analytic integrands, so the
 * check is conservative); otherwise the panel is halved and each half refined with tol/2, so the accepted
 * errors add up to at most tol. A difference at the rounding level (relative 1e-15) also ends the
 * refinement, and depth is capped at {@value #MAX_DEPTH} halvings.
 *
 * <p>Nodes and weights are computed once, at class initialisation, by Newton's method on the Legendre
 * polynomial P_n with its three-term recurrence (the rule itself: Golub &amp; Welsch 1969, Math. Comp.
 * 23:221–230).
 */
final class Quadrature {

    /** Points of the rule whose value is used. */
    static final int ORDER = 16;
    /** Points of the coarser rule used only to estimate the error. */
    static final int CHECK_ORDER = 10;
    private static final int MAX_DEPTH = 18;
    /** Differences below this share of the value are rounding, not discretisation error. */
    private static final double RELATIVE_FLOOR = 1e-15;
    /** Panel width in units of the integrand's scale. */
    static final double PANEL_WIDTH = 3;
    private static final int MAX_PANELS = 64;
    private static final double[][] RULE = legendre(ORDER);
    private static final double[][] CHECK = legendre(CHECK_ORDER);

    private Quadrature() {
    }

    /** Nodes (row 0) and weights (row 1) of the n-point Gauss–Legendre rule on [−1, 1]. */
    static double[][] legendre(int n) {
        double[] nodes = new double[n];
        double[] weights = new double[n];
        for (int i = 0; i < n; i++) {
            double x = Math.cos(Math.PI * (i + 0.75) / (n + 0.5));
            double derivative = 0;
            for (int iteration = 0; iteration < 100; iteration++) {
                double p0 = 1;
                double p1 = x;
                for (int k = 2; k <= n; k++) {
                    double p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
                    p0 = p1;
                    p1 = p2;
                }
                derivative = n * (x * p1 - p0) / (x * x - 1);
                double step = p1 / derivative;
                x -= step;
                if (Math.abs(step) < 1e-16) {
                    break;
                }
            }
            nodes[i] = x;
            weights[i] = 2 / ((1 - x * x) * derivative * derivative);
        }
        return new double[][] {nodes, weights};
    }

    /** The fixed {@value #ORDER}-point rule on [a, b]. */
    static double fixed(DoubleUnaryOperator f, double a, double b) {
        return apply(RULE, f, a, b);
    }

    private static double apply(double[][] rule, DoubleUnaryOperator f, double a, double b) {
        double[] nodes = rule[0];
        double[] weights = rule[1];
        double half = 0.5 * (b - a);
        double centre = 0.5 * (a + b);
        double sum = 0;
        for (int i = 0; i < nodes.length; i++) {
            sum += weights[i] * f.applyAsDouble(centre + half * nodes[i]);
        }
        return sum * half;
    }

    /**
     * ∫ f over [a, b], cut into equal panels no wider than {@code scale}·{@value #PANEL_WIDTH} (at most
     * {@value #MAX_PANELS}), each refined adaptively; the absolute tolerance is shared among the panels.
     * {@code scale} is the length over which the integrand changes by a factor of order e (for a normal
     * probability times the chi density, the smaller of the two scales): on panels of
     * {@value #PANEL_WIDTH} such units the {@value #ORDER}-point rule is exact to rounding for the normal
     * integral and the {@value #CHECK_ORDER}-point rule within about 1e-13, so most panels pass the check
     * at once.
     */
    static double integrate(DoubleUnaryOperator f, double a, double b, double scale, double tolerance) {
        if (!(b > a)) {
            return 0;
        }
        int panels = (int) Math.min(MAX_PANELS, Math.max(1, Math.ceil((b - a) / (PANEL_WIDTH * scale))));
        double width = (b - a) / panels;
        double share = tolerance / panels;
        double total = 0;
        for (int i = 0; i < panels; i++) {
            double left = a + i * width;
            double right = i == panels - 1 ? b : left + width;
            total += refine(f, left, right, share, 0);
        }
        return total;
    }

    private static double refine(DoubleUnaryOperator f, double a, double b, double tolerance, int depth) {
        double fine = apply(RULE, f, a, b);
        double coarse = apply(CHECK, f, a, b);
        double difference = Math.abs(fine - coarse);
        if (difference <= tolerance || difference <= RELATIVE_FLOOR * Math.abs(fine) || depth >= MAX_DEPTH) {
            return fine;
        }
        double m = 0.5 * (a + b);
        return refine(f, a, m, 0.5 * tolerance, depth + 1) + refine(f, m, b, 0.5 * tolerance, depth + 1);
    }
}

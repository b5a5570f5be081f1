package dev.proofrun.design;

/**
 * Fixed-order Gauss–Legendre quadrature on [a, b]; nodes and weights computed once by Newton's method on
 * the Legendre polynomial (Golub &amp; Welsch 1969, Math. Comp. 23:221–230, give the same nodes).
 */
final class GaussLegendre {

    private final double[] nodes;
    private final double[] weights;

    private GaussLegendre(int order) {
        nodes = new double[order];
        weights = new double[order];
        for (int i = 0; i < order; i++) {
            double x = Math.cos(Math.PI * (i + 0.75) / (order + 0.5));
            double dp = 0;
            for (int iter = 0; iter < 100; iter++) {
                double p0 = 1;
                double p1 = x;
                for (int j = 2; j <= order; j++) {
                    double p2 = ((2 * j - 1) * x * p1 - (j - 1) * p0) / j;
                    p0 = p1;
                    p1 = p2;
                }
                dp = order * (x * p1 - p0) / (x * x - 1);
                double dx = p1 / dp;
                x -= dx;
                if (Math.abs(dx) < 1e-15) {
                    break;
                }
            }
            nodes[i] = x;
            weights[i] = 2 / ((1 - x * x) * dp * dp);
        }
    }

    static GaussLegendre of(int order) {
        return new GaussLegendre(order);
    }

    int order() {
        return nodes.length;
    }

    /** The i-th node mapped to [a, b]. */
    double node(int i, double a, double b) {
        return 0.5 * (a + b) + 0.5 * (b - a) * nodes[i];
    }

    /** The i-th weight for [a, b]. */
    double weight(int i, double a, double b) {
        return 0.5 * (b - a) * weights[i];
    }
}

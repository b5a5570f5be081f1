package dev.proofrun.stats;

/**
 * A fixed-order Gauss–Legendre rule on [a, b], for callers outside this package that run their own
 * fixed-node integrals (the design's power integrals). Nodes and weights come from
 * {@link Quadrature#legendre(int)}, so there is one implementation of the rule (Golub &amp; Welsch 1969,
 * Math. Comp. 23:221–230, give the same nodes).
 */
public final class GaussLegendreRule {

    private final double[] nodes;
    private final double[] weights;

    private GaussLegendreRule(int order) {
        double[][] rule = Quadrature.legendre(order);
        nodes = rule[0];
        weights = rule[1];
    }

    /**
     * @throws IllegalArgumentException if order &lt; 2
     */
    public static GaussLegendreRule of(int order) {
        if (order < 2) {
            throw new IllegalArgumentException("order must be at least 2: " + order);
        }
        return new GaussLegendreRule(order);
    }

    public int order() {
        return nodes.length;
    }

    /** The i-th node mapped to [a, b]. */
    public double node(int i, double a, double b) {
        return 0.5 * (a + b) + 0.5 * (b - a) * nodes[i];
    }

    /** The i-th weight for [a, b]. */
    public double weight(int i, double a, double b) {
        return 0.5 * (b - a) * weights[i];
    }
}

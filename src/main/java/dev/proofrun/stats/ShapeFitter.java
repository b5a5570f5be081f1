package dev.proofrun.stats;

/**
 * Maximum-likelihood fits of one declared {@link ShapeFamily}; they never throw on the readings: extreme
 * values, constant readings or readings outside the model's support give an {@link Outcome} with the
 * {@link Failure} instead of a fit.
 *
 * <ul>
 * <li><b>Normal</b> and <b>lognormal</b>: mean and standard deviation (divisor N) of x, or of ln x — the
 *     closed-form MLE, computed on readings scaled by their largest magnitude so that 1e300 does not overflow.</li>
 * <li><b>Weibull</b>: on y = ln x the smallest-extreme-value MLE (Lawless 2003, <em>Statistical Models and
 *     Methods for Lifetime Data</em>, §5.2). With z = (y − ȳ)/s_y the shape k_z solves
 *     Σ zᵢ wᵢ / Σ wᵢ − 1/k_z − z̄ = 0, wᵢ = exp(k_z zᵢ), which rises in k_z from −∞ to max z − z̄; found by
 *     Newton's method kept inside a bisection bracket on [{@value #K_LOW}, {@value #K_HIGH}]. Then
 *     u = ȳ + s_y·ln(mean wᵢ)/k_z, b = s_y/k_z, and the Weibull shape is k = 1/b, scale c = eᵘ.
 *     SciPy's {@code weibull_min.fit(x, floc=0)} maximises the same likelihood.</li>
 * <li><b>Folded normal</b>: μ ≥ 0 and σ of the unfolded normal by the profile likelihood of
 *     {@link FoldedNormal}; readings at zero are allowed, negative ones are not.</li>
 * </ul>
 * Not fits: a root at the search limit, a Weibull shape above {@value #MAX_WEIBULL_SHAPE} (such readings are
 * indistinguishable from normal ones sitting far from zero, and the tails the index needs are then an
 * artefact of the model), no spread, fewer than {@value #MIN_READINGS} readings.
 */
public final class ShapeFitter {

    /** Fewest readings a fit is made from. */
    public static final int MIN_READINGS = 3;
    /** Above this Weibull shape a fit is refused. */
    public static final double MAX_WEIBULL_SHAPE = 50;
    static final double K_LOW = 1e-3;
    static final double K_HIGH = 1e3;

    private ShapeFitter() {
    }

    /** Why there is no fit. */
    public enum Failure {
        /** Fewer than {@value #MIN_READINGS} readings. */
        TOO_FEW,
        /** A reading is NaN or infinite. */
        NOT_FINITE,
        /** A reading at or below the model's lower bound (zero for the lognormal and Weibull). */
        AT_OR_BELOW_BOUND,
        /** All readings (or their logs) are equal. */
        NO_SPREAD,
        /** The likelihood's maximum lies at the edge of the search. */
        AT_SEARCH_LIMIT,
        /** A Weibull shape above {@value ShapeFitter#MAX_WEIBULL_SHAPE}. */
        SHAPE_TOO_LARGE
    }

    /**
     * A fit or the reason there is none.
     *
     * @param fit     the fit, or null
     * @param failure null when there is a fit
     * @param index   the position of the first offending reading for {@link Failure#NOT_FINITE} and
     *                {@link Failure#AT_OR_BELOW_BOUND}, −1 otherwise
     */
    public record Outcome(ShapeFit fit, Failure failure, int index) {

        static Outcome of(ShapeFit fit) {
            return new Outcome(fit, null, -1);
        }

        static Outcome failed(Failure f, int index) {
            return new Outcome(null, f, index);
        }

        public boolean fitted() {
            return fit != null;
        }
    }

    /** Fits {@code family} to the readings {@code x} (not changed). */
    public static Outcome fit(ShapeFamily family, double[] x) {
        return fit(family, x, true);
    }

    /** As {@link #fit} without the Weibull shape cap: for the pivot draws, whose standard samples have k = 1. */
    static Outcome fitUnbounded(ShapeFamily family, double[] x) {
        return fit(family, x, false);
    }

    private static Outcome fit(ShapeFamily family, double[] x, boolean capShape) {
        if (x.length < MIN_READINGS) {
            return Outcome.failed(Failure.TOO_FEW, -1);
        }
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            if (!Double.isFinite(x[i])) {
                return Outcome.failed(Failure.NOT_FINITE, i);
            }
            if (family == ShapeFamily.FOLDED_NORMAL ? x[i] < 0 : !(x[i] > family.lowerBound())) {
                return Outcome.failed(Failure.AT_OR_BELOW_BOUND, i);
            }
            y[i] = ShapeFit.toScale(family, x[i]);
        }
        if (family == ShapeFamily.FOLDED_NORMAL) {
            return folded(x);
        }
        double[] ms = meanSd(y);
        if (!(ms[1] > 0) || ms[1] <= 1e-13 * Math.abs(ms[0])) {
            return Outcome.failed(Failure.NO_SPREAD, -1);
        }
        if (family != ShapeFamily.WEIBULL) {
            return Outcome.of(new ShapeFit(family, ms[0], ms[1]));
        }
        return extremeValue(y, ms[0], ms[1], capShape);
    }

    private static Outcome folded(double[] x) {
        double[] ms = meanSd(x);
        if (!(ms[1] > 0) || ms[1] <= 1e-13 * Math.abs(ms[0])) {
            return Outcome.failed(Failure.NO_SPREAD, -1);
        }
        double[] f = FoldedNormal.fit(x);
        return f == null ? Outcome.failed(Failure.AT_SEARCH_LIMIT, -1) : Outcome.of(new ShapeFit(ShapeFamily.FOLDED_NORMAL, f[0], f[1]));
    }

    /** {mean, sd with divisor N}, computed on the values scaled by their largest magnitude. */
    static double[] meanSd(double[] y) {
        double m = 0;
        for (double v : y) {
            m = Math.max(m, Math.abs(v));
        }
        if (m == 0) {
            return new double[] {0, 0};
        }
        double sum = 0;
        for (double v : y) {
            sum += v / m;
        }
        double mean = sum / y.length;
        double ss = 0;
        for (double v : y) {
            double d = v / m - mean;
            ss += d * d;
        }
        return new double[] {mean * m, Math.sqrt(ss / y.length) * m};
    }

    private static Outcome extremeValue(double[] y, double mean, double sd, boolean capShape) {
        int n = y.length;
        double[] z = new double[n];
        double zMax = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            z[i] = (y[i] - mean) / sd;
            zMax = Math.max(zMax, z[i]);
        }
        // on standardised readings the score is below zero at K_LOW (weighted mean of z ≤ √N − 1000 < 0 for any
        // study below a million readings) and above zero at K_HIGH (it tends to max z > 0): the root is bracketed
        double lo = K_LOW;
        double hi = K_HIGH;
        double k = 1.28; // the standard smallest-extreme-value's k_z (π/√6 ≈ 1.28)
        for (int iter = 0; iter < 200 && hi - lo > 1e-12 * hi; iter++) {
            double[] g = score(z, zMax, k);
            if (g[0] == 0) {
                break;
            }
            if (g[0] < 0) {
                lo = k;
            } else {
                hi = k;
            }
            double next = k - g[0] / g[1];
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - k) <= 1e-13 * k) {
                k = next;
                break;
            }
            k = next;
        }
        if (k <= K_LOW * 1.000001 || k >= K_HIGH * 0.999999) {
            return Outcome.failed(Failure.AT_SEARCH_LIMIT, -1);
        }
        double s0 = 0;
        for (double v : z) {
            s0 += Math.exp(k * (v - zMax));
        }
        double uz = zMax + Math.log(s0 / n) / k;
        double b = sd / k;
        if (capShape && 1 / b > MAX_WEIBULL_SHAPE) {
            return Outcome.failed(Failure.SHAPE_TOO_LARGE, -1);
        }
        return Outcome.of(new ShapeFit(ShapeFamily.WEIBULL, mean + sd * uz, b));
    }

    /** {g(k), g′(k)}: the profile score in k and its derivative (weighted variance of z plus 1/k²). */
    private static double[] score(double[] z, double zMax, double k) {
        double s0 = 0;
        double s1 = 0;
        double s2 = 0;
        for (double v : z) {
            double w = Math.exp(k * (v - zMax));
            s0 += w;
            s1 += w * v;
            s2 += w * v * v;
        }
        double m1 = s1 / s0;
        return new double[] {m1 - 1 / k, s2 / s0 - m1 * m1 + 1 / (k * k)};
    }
}

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
 *     Halley's method kept inside a bisection bracket on [{@value #K_LOW}, {@value #K_HIGH}]. Then
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
    /** A Halley step below this share of k is the last one (see {@link #solveShape}). */
    static final double HALLEY_LAST = 1e-5;

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

    /** Fits {@code family} to the readings {@code x} (not changed); a threshold shape with θ = 0. */
    public static Outcome fit(ShapeFamily family, double[] x) {
        return family.hasThreshold() ? fit(family, 0, x) : fit(family, x, true);
    }

    /**
     * Fits {@code family} with the declared threshold θ: for {@link ShapeFamily#LOGNORMAL3} and
     * {@link ShapeFamily#WEIBULL3} the two-parameter {@link ShapeFamily#base()} fitted to x − θ (the maximum
     * likelihood with θ held at its declared value, as SciPy's {@code lognorm.fit(x, floc=θ)} and
     * {@code weibull_min.fit(x, floc=θ)}), returned with θ in the fit; a reading at or below θ is
     * {@link Failure#AT_OR_BELOW_BOUND}. θ is ignored for the other shapes.
     */
    public static Outcome fit(ShapeFamily family, double threshold, double[] x) {
        if (!family.hasThreshold()) {
            return fit(family, x, true);
        }
        double[] shifted = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            shifted[i] = x[i] - threshold;
        }
        Outcome o = fit(family.base(), shifted, true);
        return o.fitted() ? Outcome.of(o.fit().withThreshold(threshold)) : o;
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
        double[] d = new double[n]; // z − max z ≤ 0, so that the weights exp(k·d) never overflow
        double zMax = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            d[i] = (y[i] - mean) / sd;
            zMax = Math.max(zMax, d[i]);
        }
        for (int i = 0; i < n; i++) {
            d[i] -= zMax;
        }
        double[] k = solveShape(d, zMax);
        if (k[0] <= K_LOW * 1.000001 || k[0] >= K_HIGH * 0.999999) {
            return Outcome.failed(Failure.AT_SEARCH_LIMIT, -1);
        }
        double uz = zMax + (k[1] - Math.log(n)) / k[0];
        double b = sd / k[0];
        if (capShape && 1 / b > MAX_WEIBULL_SHAPE) {
            return Outcome.failed(Failure.SHAPE_TOO_LARGE, -1);
        }
        return Outcome.of(new ShapeFit(ShapeFamily.WEIBULL, mean + sd * uz, b));
    }

    /**
     * {k_z, ln Σ exp(k_z·dᵢ)}: the root of the profile score g(k) = Σ zᵢwᵢ/Σ wᵢ − 1/k (z̄ = 0), with dᵢ = zᵢ − max z.
     * Halley's method (g, g′, g″ from the weighted moments of d, one pass of N exponentials per step) kept inside a
     * bisection bracket on [{@value #K_LOW}, {@value #K_HIGH}], from the standard smallest-extreme-value's k_z.
     * Halley's error is cubic, so once a step is below {@value #HALLEY_LAST}·k the step itself leaves an error of
     * order 1e-15 and is taken as the last; the log-sum at the root is then carried from the last pass by its
     * Taylor series in the step (the weighted mean, variance and third moment of d are its derivatives), which
     * saves the pass of N exponentials that evaluating it afresh would cost.
     */
    static double[] solveShape(double[] d, double zMax) {
        double lo = K_LOW;
        double hi = K_HIGH;
        double k = 1.28; // the standard smallest-extreme-value's k_z (π/√6 ≈ 1.28)
        for (int iter = 0; iter < 200 && hi - lo > 1e-12 * hi; iter++) {
            double s0 = 0;
            double s1 = 0;
            double s2 = 0;
            double s3 = 0;
            for (double v : d) {
                double w = Math.exp(k * v);
                double wv = w * v;
                s0 += w;
                s1 += wv;
                s2 += wv * v;
                s3 += wv * v * v;
            }
            double m1 = s1 / s0; // weighted mean of d; that of z is m1 + zMax
            double var = s2 / s0 - m1 * m1;
            double mu3 = s3 / s0 - 3 * m1 * s2 / s0 + 2 * m1 * m1 * m1;
            double g = m1 + zMax - 1 / k;
            double g1 = var + 1 / (k * k);
            double g2 = mu3 - 2 / (k * k * k);
            double logSum = Math.log(s0);
            if (g == 0) {
                return new double[] {k, logSum};
            }
            if (g < 0) {
                lo = k;
            } else {
                hi = k;
            }
            double next = k - 2 * g * g1 / (2 * g1 * g1 - g * g2);
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            } else if (Math.abs(next - k) <= HALLEY_LAST * k) {
                double h = next - k;
                return new double[] {next, logSum + h * (m1 + h * (var / 2 + h * mu3 / 6))};
            }
            k = next;
        }
        double s0 = 0; // the bracket closed on its own (a root at a search limit): the log-sum at the last k
        for (double v : d) {
            s0 += Math.exp(k * v);
        }
        return new double[] {k, Math.log(s0)};
    }
}

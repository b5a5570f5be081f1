package dev.proofrun.stats;

import org.apache.commons.statistics.distribution.NormalDistribution;

/**
 * The folded normal distribution: X = |Y| with Y normal(μ, σ), μ ≥ 0 (Leone, Nelson &amp; Nottingham 1961,
 * <em>Technometrics</em> 3(4):543–550) — for characteristics bounded at zero whose underlying signed deviation
 * is normal (position, runout, perpendicularity; common practice).
 *
 * <ul>
 * <li>F(x) = Φ((x − μ)/σ) + Φ((x + μ)/σ) − 1 for x ≥ 0; the upper tail is Φ̄((x − μ)/σ) + Φ̄((x + μ)/σ).</li>
 * <li>f(x) = [φ((x − μ)/σ) + φ((x + μ)/σ)]/σ, written as φ((x − μ)/σ)·(1 + e^{−2μx/σ²})/σ.</li>
 * <li>Quantiles by Newton's method kept inside the bracket
 *     [max(0, μ + σΦ⁻¹(p)), μ + σΦ⁻¹((1 + p)/2)].</li>
 * <li>Maximum likelihood: the two score equations give Σ(2wᵢ − 1)xᵢ = Nμ and σ² = m₂ − μ² with
 *     m₂ = mean of x² (wᵢ the weight of the +xᵢ branch), so the likelihood is profiled over μ alone and the
 *     first equation is solved by Newton's method (see {@link #fit}); θ = μ/σ is searched on [0, {@value #THETA_MAX}].
 *     θ̂ = 0 is the half-normal, a member of the family; a maximum at {@value #THETA_MAX} is readings the
 *     model cannot tell from normal ones far from zero, and is not a fit. SciPy's
 *     {@code foldnorm.fit(x, floc=0)} (shape c = μ/σ, scale σ) maximises the same likelihood.</li>
 * </ul>
 * The declared shape {@code folded-normal}; its index bounds are {@link FoldedNormalBound}'s, its fit check
 * {@link FoldedNormalBootstrap}'s (coverage figures: {@code docs/decisions/declared-shape-grading.md}, "Folded normal").
 */
public final class FoldedNormal {

    /** The largest mean/σ searched. */
    public static final double THETA_MAX = 60;

    private static final NormalDistribution STANDARD = NormalDistribution.of(0, 1);
    private static final double LOG_ROOT_2PI = 0.5 * Math.log(2 * Math.PI);
    private static final int SCAN = 6;

    private FoldedNormal() {
    }

    /** F(x); 0 below zero. */
    public static double cdf(double mu, double sigma, double x) {
        if (!(x > 0)) {
            return 0;
        }
        double s = survival(mu, sigma, x);
        return s > 0.5 ? STANDARD.cumulativeProbability((x - mu) / sigma) - STANDARD.cumulativeProbability((-x - mu) / sigma)
                : 1 - s;
    }

    /** 1 − F(x), accurate far in the upper tail; 1 at or below zero. */
    public static double survival(double mu, double sigma, double x) {
        if (!(x > 0)) {
            return 1;
        }
        return STANDARD.survivalProbability((x - mu) / sigma) + STANDARD.survivalProbability((x + mu) / sigma);
    }

    /** ln f(x); −∞ below zero. */
    public static double logDensity(double mu, double sigma, double x) {
        if (x < 0) {
            return Double.NEGATIVE_INFINITY;
        }
        double z = (x - mu) / sigma;
        return -0.5 * z * z - LOG_ROOT_2PI + Math.log1p(Math.exp(-2 * mu * x / (sigma * sigma))) - Math.log(sigma);
    }

    /** The p-quantile, 0 &lt; p &lt; 1. */
    public static double quantile(double mu, double sigma, double p) {
        double lo = Math.max(0, mu + sigma * STANDARD.inverseCumulativeProbability(p));
        double hi = mu + sigma * STANDARD.inverseCumulativeProbability(0.5 * (1 + p));
        double tail = 1 - p;
        boolean upper = p > 0.5;
        double x = 0.5 * (lo + hi);
        for (int iter = 0; iter < 100 && hi - lo > 1e-14 * hi; iter++) {
            // g rises in x: F(x) − p, or (1 − p) − S(x) in the upper half (accurate there)
            double g = upper ? tail - survival(mu, sigma, x) : cdf(mu, sigma, x) - p;
            if (g == 0) {
                return x;
            }
            if (g < 0) {
                lo = x;
            } else {
                hi = x;
            }
            double next = x - g / Math.exp(logDensity(mu, sigma, x));
            x = next > lo && next < hi ? next : 0.5 * (lo + hi);
        }
        return x;
    }

    /**
     * The maximum-likelihood (μ̂, σ̂) of readings x ≥ 0, or null when the maximum lies at θ = {@value #THETA_MAX}
     * or the readings are all zero. The readings must be finite and not negative (not checked here).
     *
     * <p>On readings scaled to m₂ = 1 the profile score in μ is h(μ) = mean(y·tanh(μy/(1 − μ²))) − μ, with
     * σ² = 1 − μ². μ = 0 (the half-normal) is always a root; near it h(μ) ≈ μ³(1 − m₄/3), so the half-normal
     * is a local maximum exactly when the readings' fourth moment about zero m₄ ≥ 3. h is scanned at
     * {@value #SCAN} points of (0, μ_max); the last sign change from + to − (a local maximum) is refined by
     * Newton's method inside its bracket, and kept if its likelihood beats the half-normal's.
     *
     * @return {μ̂, σ̂}
     */
    public static double[] fit(double[] x) {
        double scale = 0;
        for (double v : x) {
            scale = Math.max(scale, v);
        }
        if (!(scale > 0)) {
            return null;
        }
        double m2 = 0;
        for (double v : x) {
            m2 += (v / scale) * (v / scale);
        }
        double root = Math.sqrt(m2 / x.length) * scale;
        double[] y = new double[x.length];
        for (int i = 0; i < y.length; i++) {
            y[i] = x[i] / root;
        }
        double muMax = THETA_MAX / Math.sqrt(1 + THETA_MAX * THETA_MAX);
        if (score(y, muMax)[0] > 0) {
            return null;
        }
        double m4 = 0;
        for (double v : y) {
            m4 += v * v * v * v;
        }
        boolean halfNormalIsLocalMaximum = m4 / y.length >= 3;
        // scan for the last + to − change; h > 0 just above 0 when m4 < 3
        double lo = Double.NaN;
        double hi = Double.NaN;
        double prev = muMax;
        for (int i = SCAN; i >= 1; i--) {
            double mu = muMax * i / (SCAN + 1);
            if (score(y, mu)[0] > 0) {
                lo = mu;
                hi = prev;
                break;
            }
            prev = mu;
        }
        if (Double.isNaN(lo)) {
            if (halfNormalIsLocalMaximum) {
                return new double[] {0, root};
            }
            lo = 0;
            hi = prev;
        }
        double mu = newton(y, lo, hi);
        if (halfNormalIsLocalMaximum && profile(y, mu) < profile(y, 0)) {
            mu = 0;
        }
        return new double[] {mu * root, Math.sqrt(1 - mu * mu) * root};
    }

    /** The root of h in (lo, hi), h(lo) ≥ 0 ≥ h(hi): Newton's method kept inside the bracket. */
    private static double newton(double[] y, double lo, double hi) {
        double mu = 0.5 * (lo + hi);
        for (int iter = 0; iter < 100 && hi - lo > 1e-15; iter++) {
            double[] h = score(y, mu);
            if (h[0] == 0) {
                return mu;
            }
            if (h[0] > 0) {
                lo = mu;
            } else {
                hi = mu;
            }
            double next = mu - h[0] / h[1];
            if (Math.abs(next - mu) < 1e-14) {
                return next > lo && next < hi ? next : mu;
            }
            mu = next > lo && next < hi ? next : 0.5 * (lo + hi);
        }
        return mu;
    }

    /** {h(μ), h′(μ)} on readings scaled to m₂ = 1. */
    private static double[] score(double[] y, double mu) {
        double s2 = 1 - mu * mu;
        double u = mu / s2;
        double h = 0;
        double d = 0;
        for (double v : y) {
            double e = Math.exp(-2 * u * v); // tanh(uv) for uv ≥ 0, without Math.tanh's cost
            double t = (1 - e) / (1 + e);
            h += v * t;
            d += v * v * (1 - t * t);
        }
        int n = y.length;
        return new double[] {h / n - mu, d / n * (1 + mu * mu) / (s2 * s2) - 1};
    }

    /** The log-likelihood at μ with σ² = 1 − μ², on readings scaled to m₂ = 1 (constants dropped). */
    private static double profile(double[] y, double mu) {
        double sigma = Math.sqrt(1 - mu * mu);
        double s = 0;
        for (double v : y) {
            double z = (v - mu) / sigma;
            s += -0.5 * z * z + Math.log1p(Math.exp(-2 * mu * v / (sigma * sigma)));
        }
        return s - y.length * Math.log(sigma);
    }
}

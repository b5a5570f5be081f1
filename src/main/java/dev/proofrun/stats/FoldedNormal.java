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
 *     m₂ = mean of x² (wᵢ the weight of the +xᵢ branch), so the likelihood is profiled over θ = μ/σ alone:
 *     σ² = m₂/(1 + θ²). θ is searched on a grid over [0, {@value #THETA_MAX}] and refined by golden section.
 *     θ̂ = 0 is the half-normal, a member of the family; a maximum at {@value #THETA_MAX} is readings the
 *     model cannot tell from normal ones far from zero, and is not a fit. SciPy's
 *     {@code foldnorm.fit(x, floc=0)} (shape c = μ/σ, scale σ) maximises the same likelihood.</li>
 * </ul>
 * Not yet a declared shape: the lower bound of the percentile index under this model has not been shown
 * to hold (see {@code docs/decisions/declared-shape-grading.md}, "Folded normal and the threshold forms").
 */
public final class FoldedNormal {

    /** The largest mean/σ searched. */
    public static final double THETA_MAX = 60;

    private static final NormalDistribution STANDARD = NormalDistribution.of(0, 1);
    private static final double LOG_ROOT_2PI = 0.5 * Math.log(2 * Math.PI);
    private static final int GRID = 32;
    private static final double[] THETAS = grid();

    private FoldedNormal() {
    }

    private static double[] grid() {
        double[] t = new double[GRID];
        t[0] = 0;
        double lo = Math.log(0.01);
        double hi = Math.log(THETA_MAX);
        for (int i = 1; i < GRID; i++) {
            t[i] = Math.exp(lo + (hi - lo) * (i - 1) / (GRID - 2));
        }
        return t;
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
        m2 /= x.length;
        int best = 0;
        double bestL = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < GRID; i++) {
            double l = profile(x, scale, m2, THETAS[i]);
            if (l > bestL) {
                bestL = l;
                best = i;
            }
        }
        if (best == GRID - 1) {
            return null;
        }
        double a = THETAS[Math.max(0, best - 1)];
        double b = THETAS[best + 1];
        double g = 0.5 * (Math.sqrt(5) - 1);
        double c = b - g * (b - a);
        double d = a + g * (b - a);
        double lc = profile(x, scale, m2, c);
        double ld = profile(x, scale, m2, d);
        for (int iter = 0; iter < 50 && b - a > 1e-9 * (1 + b); iter++) {
            if (lc >= ld) {
                b = d;
                d = c;
                ld = lc;
                c = b - g * (b - a);
                lc = profile(x, scale, m2, c);
            } else {
                a = c;
                c = d;
                lc = ld;
                d = a + g * (b - a);
                ld = profile(x, scale, m2, d);
            }
        }
        double theta = 0.5 * (a + b);
        if (profile(x, scale, m2, theta) < bestL) {
            theta = THETAS[best];
        }
        double sigma = Math.sqrt(m2 / (1 + theta * theta));
        return new double[] {theta * sigma * scale, sigma * scale};
    }

    /** The log-likelihood at θ = μ/σ with σ² = m₂/(1 + θ²), on readings divided by {@code scale} (constants dropped). */
    private static double profile(double[] x, double scale, double m2, double theta) {
        double sigma = Math.sqrt(m2 / (1 + theta * theta));
        double mu = theta * sigma;
        double s = 0;
        for (double v : x) {
            double y = v / scale;
            double z = (y - mu) / sigma;
            s += -0.5 * z * z + Math.log1p(Math.exp(-2 * mu * y / (sigma * sigma)));
        }
        return s - x.length * Math.log(sigma);
    }
}

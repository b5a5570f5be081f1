package dev.proofrun.stats;

import java.util.Arrays;
import java.util.Locale;

/**
 * The power of the grader's capability step under a declared lognormal or Weibull shape: the chance that the
 * lower bound of {@link PivotalBound} reaches c₀ when the true percentile index is c₁, for a one-sided
 * specification and N readings (the index is an overall one, so only N matters, not how it is split into
 * subgroups). The shape check and the stability step are not counted here.
 *
 * <p>Method (seeded simulation of the grader's own bound). With the truth at location 0 and scale b on ln x,
 * the study's estimates are (û, b̂) = (b·Û, b·B̂) with (Û, B̂) the estimates from a standard sample of N
 * ({@link PivotalBound#pivots}, a seed of its own). The grader's pivotal value C*ⱼ ≥ c₀ for an upper limit U is
 * equivalent to t = (ln U − û)/b̂ ≥ Eⱼ(b̂) = ln q(b̂/B₀ⱼ)/b̂ − P₀ⱼ, with q(b) = e^{b z₅₀} + c₀(e^{b z_H} − e^{b z₅₀}) and
 * P₀ⱼ = Û₀ⱼ/B̂₀ⱼ the grader's pivot draws (same seed, same count); for a lower limit L likewise with
 * t = (û − ln L)/b̂ and r(b) = (1 − c₀)e^{b z₅₀} + c₀e^{b z_L}. So the study demonstrates when t is at least the
 * (1 − α)-quantile of Eⱼ(b̂), a threshold computed on a grid of {@value #GRID} values of b̂ and interpolated.
 * {@link #studies} simulated studies (16,000 lognormal, 4,000 Weibull) give a Monte-Carlo standard error of at most
 * 0.004 or 0.008 on the power.
 */
public final class PercentilePower {

    static final int GRID = 48;
    /** The seed of the simulated studies (the grader's pivots keep {@link PivotalBound#DEFAULT_SEED}). */
    public static final long STUDY_SEED = 0x57d1e5L;

    private PercentilePower() {
    }

    /**
     * @param side      {@link IndexKind.Side#UPPER} or {@link IndexKind.Side#LOWER}
     * @param parameter σ of ln x (lognormal) or the Weibull shape k
     * @throws IllegalArgumentException for the normal family, a two-sided side, or a lower limit that c₁ would put at
     *                                  or below zero
     */
    public static double power(ShapeFamily family, double parameter, IndexKind.Side side, double c0, double c1,
            double confidence, int readings) {
        if (family.isNormal() || (side != IndexKind.Side.UPPER && side != IndexKind.Side.LOWER)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "percentile power is for a one-sided lognormal or Weibull characteristic: %s, %s", family, side));
        }
        double b = family == ShapeFamily.WEIBULL ? 1 / parameter : parameter;
        double zL = ShapeFit.standardQuantile(family, PercentileIndex.LOW);
        double z50 = ShapeFit.standardQuantile(family, 0.5);
        double zH = ShapeFit.standardQuantile(family, PercentileIndex.HIGH);
        double m = Math.exp(b * z50);
        boolean upper = side == IndexKind.Side.UPPER;
        double limit = upper ? m + c1 * (Math.exp(b * zH) - m) : m - c1 * (m - Math.exp(b * zL));
        if (!(limit > 0)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "with this shape an index of %.3f puts the lower"
                    + " limit at or below zero, where the %s model has no readings; such a limit cannot be missed", c1,
                    family.token()));
        }
        double logLimit = Math.log(limit);
        double[][] piv = PivotalBound.pivots(family, readings, PivotalBound.DEFAULT_SEED);
        double[][] obs = PivotalBound.pivots(family, readings, STUDY_SEED, studies(family));
        int studies = obs[0].length;
        double bMin = Double.POSITIVE_INFINITY;
        double bMax = 0;
        for (int s = 0; s < studies; s++) {
            bMin = Math.min(bMin, b * obs[1][s]);
            bMax = Math.max(bMax, b * obs[1][s]);
        }
        double[] grid = new double[GRID];
        double[] threshold = new double[GRID];
        int m0 = piv[0].length;
        double[] e = new double[m0];
        for (int g = 0; g < GRID; g++) {
            double bHat = bMin + (bMax - bMin) * g / (GRID - 1);
            grid[g] = bHat;
            for (int j = 0; j < m0; j++) {
                double bStar = bHat / piv[1][j];
                double p = piv[0][j] / piv[1][j];
                if (upper) {
                    double q = Math.exp(bStar * z50) + c0 * (Math.exp(bStar * zH) - Math.exp(bStar * z50));
                    e[j] = Math.log(q) / bHat - p;
                } else {
                    double r = (1 - c0) * Math.exp(bStar * z50) + c0 * Math.exp(bStar * zL);
                    e[j] = r > 0 ? p - Math.log(r) / bHat : Double.POSITIVE_INFINITY;
                }
            }
            Arrays.sort(e);
            threshold[g] = PivotalBound.orderStatistic(e, confidence);
        }
        int pass = 0;
        for (int s = 0; s < studies; s++) {
            double uHat = b * obs[0][s];
            double bHat = b * obs[1][s];
            double t = upper ? (logLimit - uHat) / bHat : (uHat - logLimit) / bHat;
            if (t >= interpolate(grid, threshold, bHat)) {
                pass++;
            }
        }
        return pass / (double) studies;
    }

    /** Simulated studies per N: 16,000 where the estimates have a closed form (lognormal), else 4,000 (refits). */
    public static int studies(ShapeFamily family) {
        return family == ShapeFamily.WEIBULL ? PivotalBound.DRAWS : 4 * PivotalBound.DRAWS;
    }

    private static double interpolate(double[] x, double[] y, double at) {
        if (x[x.length - 1] == x[0]) {
            return y[0];
        }
        double pos = (at - x[0]) / (x[x.length - 1] - x[0]) * (x.length - 1);
        int i = Math.max(0, Math.min(x.length - 2, (int) Math.floor(pos)));
        double f = pos - i;
        if (Double.isInfinite(y[i]) || Double.isInfinite(y[i + 1])) {
            return Math.max(y[i], y[i + 1]);
        }
        return y[i] + f * (y[i + 1] - y[i]);
    }
}

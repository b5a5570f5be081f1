package dev.proofrun.stats;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.IntStream;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * Confidence bounds of the percentile index ({@link PercentileIndex}) under a fitted folded normal
 * ({@link FoldedNormal}) by test inversion at the least favourable mean/σ.
 *
 * <p>For a fixed θ = μ/σ the folded normal is a scale family, so the estimated index Ĉ of N readings has a
 * distribution that depends only on θ, N and the true index c. For each θ on a grid of {@value #GRID_SIZE}
 * values in [0, 60], {@value #DRAWS} standard studies of N readings |θ + Z| are drawn and refitted; the test of
 * "index = c" at level α − γ that rejects for a large Ĉ is inverted in c, giving c_L(θ), and the lower bound is
 * the smallest c_L(θ) over the θ of a 1 − γ confidence set for θ — the p-value maximised over a confidence set
 * of the nuisance parameter (Berger &amp; Boos 1994, JASA 89:1012–1016), γ = {@value #GAMMA_SHARE}·α. The set
 * holds the grid values whose refitted θ̂ put at least γ/2 on each side of the observed θ̂ (the same draws).
 * Whatever the true θ, the bound exceeds the true index with probability at most γ + (α − γ) = α, up to the
 * Monte-Carlo error of the quantiles (about √(α(1 − α)/M) ≈ 0.007 at α = 0.05) and the spacing of the grid.
 * The price is some conservatism: the worst θ in the set is taken.
 *
 * <p>Upper limit: with u = USL/σ = q₅₀(θ) + c·(q₉₉.₈₆₅(θ) − q₅₀(θ)) (unit-σ quantiles of the true model) and
 * for draw j the refitted quantiles Q, Ĉⱼ ≥ ĉ ⇔ u ≥ vⱼ = Q₅₀ + ĉ(Q₉₉.₈₆₅ − Q₅₀), so
 * c_L(θ) = (v_α − q₅₀)/(q₉₉.₈₆₅ − q₅₀) with v_α the α-quantile of the vⱼ. The lower limit and the two-sided
 * spread index Pp are inverted the same way. For the nearest-limit index with two limits the lower bound is
 * the smaller of the two sides' lower bounds (each at α, which is valid at α for the minimum) and the upper
 * bound the smaller of their upper bounds at α/2 each. The upper bound is the largest c_U(θ).
 *
 * <p>The draws depend only on (N, seed) (common random numbers across θ), so they are kept in a small cache;
 * a grade with the same seed is reproducible bit for bit.
 */
public final class FoldedNormalBound {

    /** Standard studies per value of mean/σ. */
    public static final int DRAWS = 1000;
    /** The values of mean/σ at which the test is inverted. */
    static final double[] THETAS = thetas();
    /** How many values of mean/σ. */
    public static final int GRID_SIZE = 39;
    /** γ/α: the share of the error rate spent on the confidence set of mean/σ; the bounds use α − γ. */
    public static final double GAMMA_SHARE = 0.2;

    /** Standard studies drawn before they are refitted together. */
    private static final int BLOCK = 100;
    /** The tables of the study sizes met last, so a run of edits keeps the sizes it returns to. */
    private static final RecentResults<String, Table> TABLES = new RecentResults<>(16);

    private FoldedNormalBound() {
    }

    private static double[] thetas() {
        double[] t = new double[GRID_SIZE];
        for (int i = 0; i <= 24; i++) {
            t[i] = 0.125 * i;
        }
        double[] rest = {3.5, 4, 4.5, 5, 6, 7, 8, 10, 12, 16, 20, 30, 40, 60};
        System.arraycopy(rest, 0, t, 25, rest.length);
        return t;
    }

    /**
     * Per value of mean/σ g: the true unit-σ quantiles {low, median, high}[g] and, per draw j, the refitted ones.
     */
    record Table(double[][] truth, double[][] low, double[][] median, double[][] high, double[][] ratio) {
    }

    /**
     * The lower and upper bounds at {@code confidence}.
     *
     * @param kind     the index (its side only)
     * @param readings N, the number of readings the fit came from
     * @return {lower, upper}
     * @throws IllegalArgumentException if the fit is not a folded normal, the confidence is not in (0.5, 1), or
     *                                  N &lt; 3
     */
    public static double[] bounds(ShapeFit fit, IndexKind kind, SpecLimits limits, int readings, double confidence, long seed) {
        if (fit.family() != ShapeFamily.FOLDED_NORMAL) {
            throw new IllegalArgumentException("not a folded-normal fit: " + fit.family().token());
        }
        if (!(confidence > 0.5 && confidence < 1)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "confidence must be in (0.5, 1): %s", confidence));
        }
        if (readings < ShapeFitter.MIN_READINGS) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "at least 3 readings are needed: %d", readings));
        }
        Table t = table(readings, seed);
        double gamma = GAMMA_SHARE * (1 - confidence);
        boolean[] set = confidenceSet(t, fit.location() / fit.scale(), gamma);
        double alpha = 1 - confidence - gamma;
        double lo = fit.quantile(PercentileIndex.LOW);
        double med = fit.quantile(0.5);
        double hi = fit.quantile(PercentileIndex.HIGH);
        boolean upper = limits.upper().isPresent();
        boolean lower = limits.lower().isPresent();
        switch (kind.side()) {
            case BOTH:
                return limits.isTwoSided() ? side(t, set, Side.SPREAD, limits.width().getAsDouble() / (hi - lo), alpha, alpha)
                        : new double[] {Double.NaN, Double.NaN};
            case UPPER:
                return upper ? side(t, set, Side.UPPER, (limits.upper().getAsDouble() - med) / (hi - med), alpha, alpha)
                        : new double[] {Double.NaN, Double.NaN};
            case LOWER:
                return lower ? side(t, set, Side.LOWER, (med - limits.lower().getAsDouble()) / (med - lo), alpha, alpha)
                        : new double[] {Double.NaN, Double.NaN};
            default:
                if (!limits.isTwoSided()) {
                    return upper ? side(t, set, Side.UPPER, (limits.upper().getAsDouble() - med) / (hi - med), alpha, alpha)
                            : side(t, set, Side.LOWER, (med - limits.lower().getAsDouble()) / (med - lo), alpha, alpha);
                }
                double[] u = side(t, set, Side.UPPER, (limits.upper().getAsDouble() - med) / (hi - med), alpha, alpha / 2);
                double[] l = side(t, set, Side.LOWER, (med - limits.lower().getAsDouble()) / (med - lo), alpha, alpha / 2);
                return new double[] {Math.min(u[0], l[0]), Math.min(u[1], l[1])};
        }
    }

    private enum Side { UPPER, LOWER, SPREAD }

    /** {min over θ of c_L(θ) at a, max over θ of c_U(θ) at b} for the observed index c. */
    private static double[] side(Table t, boolean[] set, Side side, double c, double a, double b) {
        if (!Double.isFinite(c)) {
            return new double[] {Double.NaN, Double.NaN};
        }
        double lowest = Double.POSITIVE_INFINITY;
        double highest = Double.NEGATIVE_INFINITY;
        double[] v = new double[t.low()[0].length];
        for (int g = 0; g < THETAS.length; g++) {
            if (!set[g]) {
                continue;
            }
            double qL = t.truth()[g][0];
            double q50 = t.truth()[g][1];
            double qH = t.truth()[g][2];
            for (int j = 0; j < v.length; j++) {
                double lo = t.low()[g][j];
                double med = t.median()[g][j];
                double hi = t.high()[g][j];
                v[j] = switch (side) {
                    case UPPER -> med + c * (hi - med);
                    case LOWER -> med - c * (med - lo);
                    case SPREAD -> c * (hi - lo);
                };
            }
            Arrays.sort(v);
            double cl;
            double cu;
            switch (side) {
                case UPPER -> {
                    cl = (PivotalBound.orderStatistic(v, a) - q50) / (qH - q50);
                    cu = (PivotalBound.orderStatistic(v, 1 - b) - q50) / (qH - q50);
                }
                case LOWER -> {
                    cl = (q50 - PivotalBound.orderStatistic(v, 1 - a)) / (q50 - qL);
                    cu = (q50 - PivotalBound.orderStatistic(v, b)) / (q50 - qL);
                }
                default -> {
                    cl = PivotalBound.orderStatistic(v, a) / (qH - qL);
                    cu = PivotalBound.orderStatistic(v, 1 - b) / (qH - qL);
                }
            }
            lowest = Math.min(lowest, cl);
            highest = Math.max(highest, cu);
        }
        return new double[] {lowest, highest};
    }

    /**
     * The values of mean/σ whose central 1 − γ range of refitted mean/σ holds the observed one (at least γ/2 of
     * the refits on each side of it, counting ties); all of them if none does.
     */
    static boolean[] confidenceSet(Table t, double observed, double gamma) {
        boolean[] in = new boolean[THETAS.length];
        boolean any = false;
        for (int g = 0; g < THETAS.length; g++) {
            double[] r = t.ratio()[g];
            int atOrBelow = 0;
            int atOrAbove = 0;
            for (double v : r) {
                atOrBelow += v <= observed ? 1 : 0;
                atOrAbove += v >= observed ? 1 : 0;
            }
            in[g] = atOrBelow >= gamma / 2 * r.length && atOrAbove >= gamma / 2 * r.length;
            any |= in[g];
        }
        if (!any) {
            Arrays.fill(in, true);
        }
        return in;
    }

    /** The refitted standard studies for (N, seed), kept in a small cache. */
    static Table table(int readings, long seed) {
        return TABLES.get(readings + "/" + seed, id -> draw(readings, seed));
    }

    private static Table draw(int n, long seed) {
        int grid = THETAS.length;
        double[][] truth = new double[grid][];
        double[][] low = new double[grid][DRAWS];
        double[][] median = new double[grid][DRAWS];
        double[][] high = new double[grid][DRAWS];
        double[][] ratio = new double[grid][DRAWS];
        for (int g = 0; g < grid; g++) {
            truth[g] = new double[] {FoldedNormal.quantile(THETAS[g], 1, PercentileIndex.LOW),
                FoldedNormal.quantile(THETAS[g], 1, 0.5), FoldedNormal.quantile(THETAS[g], 1, PercentileIndex.HIGH)};
        }
        ZigguratSampler.NormalizedGaussian z = ZigguratSampler.NormalizedGaussian.of(RandomSource.XO_RO_SHI_RO_128_PP.create(seed));
        // a study whose refit fails (mean/σ beyond the search) is drawn again from its own stream, in the order
        // (draw, then value of mean/σ) of a one-by-one build
        ZigguratSampler.NormalizedGaussian again = ZigguratSampler.NormalizedGaussian.of(RandomSource.XO_RO_SHI_RO_128_PP.create(~seed));
        double[] x = new double[n];
        double[][] block = new double[BLOCK][n];
        boolean[][] failed = new boolean[BLOCK][];
        for (int j0 = 0; j0 < DRAWS; j0 += BLOCK) {
            int first = j0;
            int size = Math.min(BLOCK, DRAWS - j0);
            for (int s = 0; s < size; s++) {
                for (int i = 0; i < n; i++) {
                    block[s][i] = z.sample();
                }
            }
            // the first refits of the block and their quantiles on all cores (no random numbers are used there)
            IntStream.range(0, size).parallel().forEach(s -> {
                double[] xs = new double[n];
                failed[s] = new boolean[grid];
                for (int g = 0; g < grid; g++) {
                    double[] f = fit(block[s], THETAS[g], xs);
                    failed[s][g] = f == null;
                    if (f != null) {
                        record(f, g, first + s, low, median, high, ratio);
                    }
                }
            });
            for (int s = 0; s < size; s++) {
                for (int g = 0; g < grid; g++) {
                    if (failed[s][g]) {
                        double[] f = null;
                        while (f == null) {
                            for (int i = 0; i < n; i++) {
                                x[i] = again.sample();
                            }
                            f = fit(x.clone(), THETAS[g], x);
                        }
                        record(f, g, j0 + s, low, median, high, ratio);
                    }
                }
            }
        }
        for (double[] r : ratio) {
            Arrays.sort(r);
        }
        return new Table(truth, low, median, high, ratio);
    }

    /** Stores the refitted unit quantiles and mean/σ of draw j at grid value g. */
    private static void record(double[] f, int g, int j, double[][] low, double[][] median, double[][] high, double[][] ratio) {
        low[g][j] = FoldedNormal.quantile(f[0], f[1], PercentileIndex.LOW);
        median[g][j] = FoldedNormal.quantile(f[0], f[1], 0.5);
        high[g][j] = FoldedNormal.quantile(f[0], f[1], PercentileIndex.HIGH);
        ratio[g][j] = f[0] / f[1];
    }

    /** The fit of the readings |θ + eᵢ|, written into {@code x}. */
    private static double[] fit(double[] e, double theta, double[] x) {
        for (int i = 0; i < e.length; i++) {
            x[i] = Math.abs(theta + e[i]);
        }
        return FoldedNormal.fit(x);
    }
}

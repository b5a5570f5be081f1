package dev.proofrun.stats;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.IntStream;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.apache.commons.statistics.distribution.NormalDistribution;

/**
 * The power of the grader's capability step under a declared folded normal: the chance that the lower bound of
 * {@link FoldedNormalBound} (test inversion at the least favourable mean/σ of a confidence set, the grader's seed)
 * reaches c₀ when the readings are |θ + Z|·σ with true percentile index c₁, for one specification limit and N
 * readings (the index is an overall one, so only N matters). The shape check and the stability step are not counted
 * here.
 *
 * <p>Method (seeded simulation of the grader's own procedure). Each of {@value #STUDIES} studies draws N readings
 * |θ + Zᵢ|, fits them as the grader does ({@link ShapeFitter#fit}), and asks whether the grader's bound reaches c₀.
 * That bound is the smallest, over the values of mean/σ in the study's confidence set
 * ({@link FoldedNormalBound#confidenceSet}), of c_L(g; ĉ), and each c_L(g; ĉ) rises with the study's estimated index ĉ
 * (every refitted vⱼ = Q₅₀ + ĉ(Q₉₉.₈₆₅ − Q₅₀) rises with ĉ, so does their interpolated α-quantile). So the bound reaches
 * c₀ exactly when ĉ is at least every threshold c*(g) of the set, c*(g) solving c_L(g; c) = c₀; the thresholds are
 * found once per N by bisection, on the grader's own table (same draws, same seed), and a study within the
 * bisection's last bracket is decided by computing c_L(g; ĉ) itself. The result is the grader's decision for each
 * study (checked against {@link FoldedNormalBound#bounds} in the tests). {@value #STUDIES} studies give a Monte-Carlo
 * standard error of at most 0.5/√{@value #STUDIES} = 0.0079 on the power.
 *
 * <p>Speed. Building the grader's table (39,000 refits) at every N the planner visits is what made the table slow; for
 * N from 25 to 1,000 and the usual c₀ and confidences the thresholds and the confidence sets' ranges are read from
 * {@link FoldedNormalCutoffs} instead: at a stored N they are the table's own figures, between stored sizes they are
 * interpolated (a smoothed grader: the power then differs from the one on the grader's table at that N by the
 * table's Monte-Carlo error, measured in {@code docs/decisions/declared-shape-grading.md}). The studies' fits depend
 * on θ and N only and are kept per (θ, N) ({@link #fits}).
 *
 * <p>Skewness: for |Y|, Y normal(θ, 1), with E|Y| = √(2/π)e^{−θ²/2} + θ(1 − 2Φ(−θ)), E Y² = θ² + 1 and
 * E|Y|³ = (θ³ + 3θ)(1 − 2Φ(−θ)) + √(2/π)(θ² + 2)e^{−θ²/2}; it falls from 0.995 at the half-normal (θ = 0) towards 0.
 */
public final class FoldedNormalPower {

    /** Simulated studies per N. */
    public static final int STUDIES = 4000;
    /** The seed of the simulated studies (the grader's table keeps {@link PivotalBound#DEFAULT_SEED}). */
    public static final long STUDY_SEED = 0x5f01d3L;
    /** The largest mean/σ that a skewness is turned into (skewness about 1e-7 there). */
    static final double THETA_HIGH = 6;

    private static final NormalDistribution STANDARD = NormalDistribution.of(0, 1);
    /** The studies' fits per (θ, N), about 130 kB each. */
    private static final RecentResults<String, double[][]> FITS = new RecentResults<>(64);
    private static final double ROOT_2_OVER_PI = Math.sqrt(2 / Math.PI);

    private FoldedNormalPower() {
    }

    /** The skewness of |Y|, Y normal(θ, 1). */
    public static double skewness(double theta) {
        double t = 1 - 2 * STANDARD.cumulativeProbability(-theta);
        double e = ROOT_2_OVER_PI * Math.exp(-0.5 * theta * theta);
        double m1 = e + theta * t;
        double m2 = theta * theta + 1;
        double m3 = (theta * theta * theta + 3 * theta) * t + e * (theta * theta + 2);
        double var = m2 - m1 * m1;
        return (m3 - 3 * m1 * m2 + 2 * m1 * m1 * m1) / Math.pow(var, 1.5);
    }

    /**
     * The mean/σ θ giving skewness {@code g} (bisection on [0, {@value #THETA_HIGH}]).
     *
     * @throws IllegalArgumentException for a skewness a folded normal cannot have (the message gives the range)
     */
    public static double meanRatio(double g) {
        double max = skewness(0);
        double min = skewness(THETA_HIGH);
        if (g >= max && g <= max + 5e-4) {
            return 0;
        }
        if (!(g > min && g < max)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "a folded-normal shape has a skewness between %.3g and %.4g (the half-normal): %s", min, max, g));
        }
        double lo = 0;
        double hi = THETA_HIGH;
        for (int i = 0; i < 200 && hi - lo > 1e-13; i++) {
            double mid = 0.5 * (lo + hi);
            if (skewness(mid) > g) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /**
     * @param theta mean/σ of the true model (0: the half-normal)
     * @param side  {@link IndexKind.Side#UPPER} or {@link IndexKind.Side#LOWER}
     * @throws IllegalArgumentException for a two-sided side, or a lower limit that c₁ would put at or below zero
     */
    public static double power(double theta, IndexKind.Side side, double c0, double c1, double confidence, int readings) {
        return power(theta, side, c0, c1, confidence, readings, true);
    }

    /** @param stored whether the stored thresholds may be used (false: always the grader's table at N) */
    static double power(double theta, IndexKind.Side side, double c0, double c1, double confidence, int readings,
            boolean stored) {
        Decision d = new Decision(theta, side, c0, c1, confidence, readings, stored);
        double[][] fits = fits(theta, readings);
        long pass = Arrays.stream(fits).filter(d::fitted).count();
        return pass / (double) STUDIES;
    }

    /**
     * Per simulated study at (θ, N): {mean/σ, low, median, high quantile} of the grader's fit, or null when the fit
     * fails. They depend on θ and N only (not on c₀, c₁ or the confidence), so they are kept in a small cache: an edit
     * of the requirement or the expected index refits nothing at a study size met before.
     */
    static double[][] fits(double theta, int readings) {
        return FITS.get(Double.doubleToLongBits(theta) + "/" + readings, id -> {
            double[][] out = new double[STUDIES][];
            IntStream.range(0, STUDIES).parallel().forEach(s -> out[s] = fit(study(theta, readings, s)));
            return out;
        });
    }

    /** {mean/σ, low, median, high quantile} of the grader's fit of the readings, or null when it fails. */
    static double[] fit(double[] x) {
        ShapeFitter.Outcome o = ShapeFitter.fit(ShapeFamily.FOLDED_NORMAL, x);
        if (!o.fitted()) {
            return null;
        }
        ShapeFit fit = o.fit();
        return new double[] {fit.location() / fit.scale(), fit.quantile(PercentileIndex.LOW), fit.quantile(0.5),
            fit.quantile(PercentileIndex.HIGH)};
    }

    /**
     * The readings of simulated study s at N (σ = 1): its own stream, seed {@link #STUDY_SEED} + 1,000,003·N + s (a
     * long seed, which the generator mixes), so the result does not depend on threads.
     */
    static double[] study(double theta, int readings, int s) {
        ZigguratSampler.NormalizedGaussian z = ZigguratSampler.NormalizedGaussian.of(
                RandomSource.XO_RO_SHI_RO_128_PP.create(STUDY_SEED + 1_000_003L * readings + s));
        double[] x = new double[readings];
        for (int i = 0; i < readings; i++) {
            x[i] = Math.abs(theta + z.sample());
        }
        return x;
    }

    /**
     * The grader's decision at N for one limit placed at true index c₁: per value of mean/σ g, the range of the
     * study's mean/σ that puts g in its confidence set, and the threshold c*(g) that the study's index must reach.
     * From the stored table ({@link FoldedNormalCutoffs}) when it holds (N, side, c₀, confidence), else from the
     * grader's own table at N.
     */
    static final class Decision {
        private final boolean upper;
        private final double c0;
        private final double limit;
        private final double alpha;
        /** The grader's table at N, or null when the thresholds are stored ones. */
        private final FoldedNormalBound.Table table;
        private final double[] setLow;
        private final double[] setHigh;
        private final double[] below;
        private final double[] atOrAbove;

        Decision(double theta, IndexKind.Side side, double c0, double c1, double confidence, int readings) {
            this(theta, side, c0, c1, confidence, readings, true);
        }

        /** @param stored whether the stored thresholds may be used (false: always the grader's table) */
        Decision(double theta, IndexKind.Side side, double c0, double c1, double confidence, int readings, boolean stored) {
            if (side != IndexKind.Side.UPPER && side != IndexKind.Side.LOWER) {
                throw new IllegalArgumentException("folded-normal power is for one limit: " + side);
            }
            this.upper = side == IndexKind.Side.UPPER;
            this.c0 = c0;
            double qL = FoldedNormal.quantile(theta, 1, PercentileIndex.LOW);
            double q50 = FoldedNormal.quantile(theta, 1, 0.5);
            double qH = FoldedNormal.quantile(theta, 1, PercentileIndex.HIGH);
            this.limit = upper ? q50 + c1 * (qH - q50) : q50 - c1 * (q50 - qL);
            if (!(limit > 0)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "with this shape an index of %.3f puts the"
                        + " lower limit at or below zero, where the folded-normal model has no readings; such a limit cannot"
                        + " be missed", c1));
            }
            double gamma = FoldedNormalBound.GAMMA_SHARE * (1 - confidence);
            this.alpha = 1 - confidence - gamma;
            FoldedNormalCutoffs.Cut cut = stored ? FoldedNormalCutoffs.at(readings, upper, c0, confidence).orElse(null) : null;
            if (cut != null) {
                table = null;
                setLow = cut.setLow();
                setHigh = cut.setHigh();
                below = cut.cutoff();
                atOrAbove = cut.cutoff();
                return;
            }
            table = FoldedNormalBound.table(readings, PivotalBound.DEFAULT_SEED);
            double[][] set = setRanges(table, gamma);
            setLow = set[0];
            setHigh = set[1];
            double[][] b = brackets(table, upper, c0, alpha);
            below = b[0];
            atOrAbove = b[1];
        }

        /** Whether the thresholds came from the stored table. */
        boolean stored() {
            return table == null;
        }

        /** Whether the grader's lower bound from these readings reaches c₀ (a failed fit does not). */
        boolean demonstrates(double[] x) {
            return fitted(fit(x));
        }

        /** The same from the study's {@link FoldedNormalPower#fit} (null: the fit failed). */
        boolean fitted(double[] f) {
            if (f == null) {
                return false;
            }
            double lo = f[1];
            double med = f[2];
            double hi = f[3];
            double c = upper ? (limit - med) / (hi - med) : (med - limit) / (med - lo);
            if (!Double.isFinite(c)) {
                return false;
            }
            // the confidence set as FoldedNormalBound.confidenceSet counts it: all values when none holds the observed
            double observed = f[0];
            boolean none = true;
            for (int g = 0; g < setLow.length && none; g++) {
                none = !(observed >= setLow[g] && observed <= setHigh[g]);
            }
            for (int g = 0; g < setLow.length; g++) {
                boolean in = none || (observed >= setLow[g] && observed <= setHigh[g]);
                if (in && !(c >= atOrAbove[g] || (table != null && c > below[g] && lowerAt(table, upper, alpha, g, c) >= c0))) {
                    return false;
                }
            }
            return true;
        }
    }

    /**
     * Per value of mean/σ g, {lowest, highest} observed mean/σ that {@link FoldedNormalBound#confidenceSet} counts in
     * g's set: at least γ/2 of the sorted refits at or below it is the refit of rank ⌈γ/2·M⌉ at or below it, and the
     * same from above.
     */
    static double[][] setRanges(FoldedNormalBound.Table table, double gamma) {
        int grid = FoldedNormalBound.THETAS.length;
        double[][] range = new double[2][grid];
        for (int g = 0; g < grid; g++) {
            double[] r = table.ratio()[g];
            int k = (int) Math.ceil(gamma / 2 * r.length);
            range[0][g] = k <= 0 ? Double.NEGATIVE_INFINITY : r[k - 1];
            range[1][g] = k <= 0 ? Double.POSITIVE_INFINITY : r[r.length - k];
        }
        return range;
    }

    /** c_L(g; c) as {@link FoldedNormalBound} computes it for one value of mean/σ at level α. */
    static double lowerAt(FoldedNormalBound.Table table, boolean upper, double alpha, int g, double c) {
        double[] v = new double[table.low()[g].length];
        for (int j = 0; j < v.length; j++) {
            double med = table.median()[g][j];
            v[j] = upper ? med + c * (table.high()[g][j] - med) : med - c * (med - table.low()[g][j]);
        }
        Arrays.sort(v);
        double[] q = table.truth()[g];
        return upper ? (PivotalBound.orderStatistic(v, alpha) - q[1]) / (q[2] - q[1])
                : (q[1] - PivotalBound.orderStatistic(v, 1 - alpha)) / (q[1] - q[0]);
    }

    /**
     * {below[], atOrAbove[]}: per value of mean/σ g, below[g] &lt; c*(g) ≤ atOrAbove[g] within 1e-12 relative, by
     * bisection on the rising c_L(g; c); atOrAbove[g] is infinite when no index up to 10⁶ reaches c₀.
     */
    static double[][] brackets(FoldedNormalBound.Table table, boolean upper, double c0, double alpha) {
        int grid = FoldedNormalBound.THETAS.length;
        double[][] b = new double[2][grid];
        for (int g = 0; g < grid; g++) {
            double lo = 0;
            double hi = 1;
            while (lowerAt(table, upper, alpha, g, lo) >= c0 && lo > -1e6) {
                lo = 2 * lo - 1;
            }
            while (lowerAt(table, upper, alpha, g, hi) < c0 && hi < 1e6) {
                hi = 2 * hi;
            }
            for (int i = 0; i < 200 && hi - lo > 1e-12 * Math.max(1, Math.abs(hi)); i++) {
                double mid = 0.5 * (lo + hi);
                if (lowerAt(table, upper, alpha, g, mid) >= c0) {
                    hi = mid;
                } else {
                    lo = mid;
                }
            }
            b[0][g] = lo;
            b[1][g] = lowerAt(table, upper, alpha, g, hi) >= c0 ? hi : Double.POSITIVE_INFINITY;
        }
        return b;
    }
}

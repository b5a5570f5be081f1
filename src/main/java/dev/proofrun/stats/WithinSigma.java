package dev.proofrun.stats;

import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * Estimators of the within-subgroup standard deviation σ_w ({@link SigmaMethod}) and their degrees of
 * freedom.
 *
 * <h2>Estimators</h2>
 * <ul>
 * <li>{@link SigmaMethod#RBAR}: R̄/d2(n). Needs equal subgroup sizes 2 ≤ n ≤ 50; unequal sizes are
 *     refused (a mean of ranges of different sizes has no single d2).</li>
 * <li>{@link SigmaMethod#SBAR}: equal sizes S̄/c4(n). Unequal sizes: the weighted mean of the unbiased
 *     pieces sᵢ/c4(nᵢ) with weights hᵢ = c4(nᵢ)²/(1 − c4(nᵢ)²), the reciprocals of their variances over σ²
 *     (inverse-variance weighting, so the combination is unbiased with the least variance among such
 *     means; the same weights as Burr 1969, JQT 1:163–167 — citation from memory). Each nᵢ ≥ 2.</li>
 * <li>{@link SigmaMethod#POOLED}: s_p/c4(ν+1), s_p² = Σ(nᵢ−1)sᵢ²/ν, ν = Σ(nᵢ−1); any sizes ≥ 1 with ν ≥ 1.</li>
 * <li>{@link SigmaMethod#MOVING_RANGE}: MR̄/d2(2) over individuals in time order (every subgroup of size
 *     one), MR̄ the mean of |x_{i+1} − x_i|; d2(2) = 2/√π.</li>
 * </ul>
 *
 * <h2>Effective degrees of freedom (Patnaik 1950, Biometrika 37:78–87)</h2>
 * The estimator σ̂ is matched to a scaled chi variable σ·χ_ν/(√ν·c4(ν+1)) with the same squared
 * coefficient of variation CV² = Var(σ̂)/E[σ̂]², solving (1 − c4(ν+1)²)/c4(ν+1)² = CV² for a real ν
 * (c4 in its gamma-function form, {@link ChartConstants#chiCv2}). For k subgroups of size n:
 * <ul>
 * <li>R̄/d2: CV² = d3²/(k·d2²);</li>
 * <li>S̄/c4: CV² = (1 − c4²)/(k·c4²); unequal sizes CV² = 1/Σhᵢ;</li>
 * <li>pooled: ν = k(n−1) exactly (s_p²·ν/σ² is chi-square);</li>
 * <li>MR̄/d2(2) for k individuals, m = k − 1 ranges Mᵢ = |Dᵢ|, Dᵢ = x_{i+1} − x_i ~ N(0, 2σ²). Adjacent
 *     differences have correlation −½, others are independent, so
 *     Var(MR̄) = (2σ²/m²)·[m(1 − 2/π) + 2(m−1)·c] with c = Cov(|X|,|Y|) for standard normals of
 *     correlation ρ = −½: c = (2/π)(√(1−ρ²) + ρ·arcsin ρ − 1) = (2/π)(√3/2 + π/12 − 1). With
 *     E[MR̄] = 2σ/√π, CV² = (π/2)·[m(1 − 2/π) + 2(m−1)c]/m². For two individuals ν = 1 exactly.</li>
 * </ul>
 * For R̄/d2 with small n the result is close to 0.9·k·(n−1) (common practice).
 */
public final class WithinSigma {

    /** Cov(|X|, |Y|) of standard normals with correlation −½: (2/π)(√3/2 + π/12 − 1). */
    private static final double ADJACENT_ABS_COV = 2 / Math.PI * (Math.sqrt(3) / 2 + Math.PI / 12 - 1);

    private WithinSigma() {
    }

    /**
     * Degrees of freedom of the estimator for k subgroups of size n (n = 1 and k individuals for the
     * moving range).
     *
     * @throws IllegalArgumentException if subgroups &lt; 1 (&lt; 2 individuals for the moving range)
     * @throws IllegalArgumentException if the size does not suit the method (moving range needs n = 1,
     *                                  R̄/d2 2 ≤ n ≤ 50, S̄/c4 and pooled n ≥ 2)
     */
    public static double degreesOfFreedom(SigmaMethod method, int subgroupSize, int subgroups) {
        Objects.requireNonNull(method, "method");
        checkShape(method, subgroupSize, subgroups);
        switch (method) {
            case POOLED:
                return (double) subgroups * (subgroupSize - 1);
            case RBAR: {
                double ratio = ChartConstants.d3(subgroupSize) / ChartConstants.d2(subgroupSize);
                return effectiveDegreesOfFreedom(ratio * ratio / subgroups);
            }
            case SBAR:
                return effectiveDegreesOfFreedom(ChartConstants.chiCv2(subgroupSize) / subgroups);
            case MOVING_RANGE:
                return effectiveDegreesOfFreedom(movingRangeCv2(subgroups - 1));
            default:
                throw new AssertionError(method);
        }
    }

    /**
     * The real ν &gt; 0 whose scaled chi variable has squared coefficient of variation cv2, i.e.
     * (1 − c4(ν+1)²)/c4(ν+1)² = cv2. About 1/(2·cv2) for small cv2.
     *
     * @throws IllegalArgumentException if cv2 is not positive and finite
     */
    public static double effectiveDegreesOfFreedom(double cv2) {
        if (!(cv2 > 0) || !Double.isFinite(cv2)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "CV^2 must be positive and finite: %s", cv2));
        }
        // chiCv2(nu + 1) decreases in nu; bisection on ln(nu) inside a bracket found by doubling.
        double guess = 1 / (2 * cv2);
        double lo = Math.log(guess) - 1;
        double hi = Math.log(guess) + 1;
        while (cvAt(lo) < cv2) {
            lo -= 2;
        }
        while (cvAt(hi) > cv2) {
            hi += 2;
        }
        for (int i = 0; i < 200 && hi - lo > 1e-14; i++) {
            double mid = (lo + hi) / 2;
            if (cvAt(mid) > cv2) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return Math.exp((lo + hi) / 2);
    }

    private static double cvAt(double logNu) {
        return ChartConstants.chiCv2(Math.exp(logNu) + 1);
    }

    /** CV² of MR̄ for m moving ranges of span 2 (see the class comment). */
    static double movingRangeCv2(int m) {
        return Math.PI / 2 * (m * (1 - 2 / Math.PI) + 2.0 * (m - 1) * ADJACENT_ABS_COV) / ((double) m * m);
    }

    /**
     * Estimates σ_w from subgroups (for the moving range: individuals in time order, one per array).
     *
     * @throws IllegalArgumentException if a subgroup is empty or holds a value that is not finite
     * @throws IllegalArgumentException if the subgroups do not suit the method (see the class comment):
     *                                  unequal sizes for R̄/d2, a size above 50 for R̄/d2, a subgroup of
     *                                  one for S̄/c4, no degrees of freedom for pooled, subgroups larger
     *                                  than one or fewer than two individuals for the moving range
     */
    public static SigmaEstimate estimate(SigmaMethod method, List<double[]> subgroups) {
        Objects.requireNonNull(method, "method");
        checkValues(subgroups);
        switch (method) {
            case RBAR:
                return rangeEstimate(subgroups);
            case SBAR:
                return meanSdEstimate(subgroups);
            case POOLED:
                return pooledEstimate(subgroups);
            case MOVING_RANGE:
                return movingRangeEstimate(subgroups);
            default:
                throw new AssertionError(method);
        }
    }

    private static SigmaEstimate rangeEstimate(List<double[]> subgroups) {
        int n = subgroups.get(0).length;
        int min = n;
        int max = n;
        double sumRange = 0;
        for (double[] g : subgroups) {
            min = Math.min(min, g.length);
            max = Math.max(max, g.length);
            double lo = g[0];
            double hi = g[0];
            for (double x : g) {
                lo = Math.min(lo, x);
                hi = Math.max(hi, x);
            }
            sumRange += hi - lo;
        }
        if (min != max) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "R-bar/d2 needs equal subgroup sizes, found sizes from %d to %d (S-bar/c4 and pooled allow unequal sizes)",
                    min, max));
        }
        int k = subgroups.size();
        double df = degreesOfFreedom(SigmaMethod.RBAR, n, k);
        return new SigmaEstimate(sumRange / k / ChartConstants.d2(n), SigmaMethod.RBAR, df);
    }

    private static SigmaEstimate meanSdEstimate(List<double[]> subgroups) {
        int n = subgroups.get(0).length;
        boolean equal = true;
        double weighted = 0;
        double weights = 0;
        double plain = 0;
        for (double[] g : subgroups) {
            if (g.length < 2) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "S-bar/c4 needs subgroups of at least 2 readings, found one of %d", g.length));
            }
            equal &= g.length == n;
            double s = SampleMoments.standardDeviationOf(g);
            double c4 = ChartConstants.c4(g.length);
            double h = 1 / ChartConstants.chiCv2(g.length);
            weighted += h * s / c4;
            weights += h;
            plain += s;
        }
        int k = subgroups.size();
        if (equal) {
            return new SigmaEstimate(plain / k / ChartConstants.c4(n), SigmaMethod.SBAR,
                    degreesOfFreedom(SigmaMethod.SBAR, n, k));
        }
        return new SigmaEstimate(weighted / weights, SigmaMethod.SBAR, effectiveDegreesOfFreedom(1 / weights));
    }

    private static SigmaEstimate pooledEstimate(List<double[]> subgroups) {
        double sumSquares = 0;
        long nu = 0;
        for (double[] g : subgroups) {
            double mean = SampleMoments.meanOf(g);
            for (double x : g) {
                sumSquares += (x - mean) * (x - mean);
            }
            nu += g.length - 1;
        }
        if (nu < 1) {
            throw new IllegalArgumentException("the pooled estimate needs at least one subgroup of 2 or more readings");
        }
        double sp = Math.sqrt(sumSquares / nu);
        return new SigmaEstimate(sp / ChartConstants.c4Continuous(nu + 1.0), SigmaMethod.POOLED, nu);
    }

    private static SigmaEstimate movingRangeEstimate(List<double[]> subgroups) {
        int k = subgroups.size();
        for (double[] g : subgroups) {
            if (g.length != 1) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "the moving range is for individuals (subgroups of one), found a subgroup of %d", g.length));
            }
        }
        if (k < 2) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "the moving range needs at least 2 individuals: %d", k));
        }
        double sum = 0;
        for (int i = 1; i < k; i++) {
            sum += Math.abs(subgroups.get(i)[0] - subgroups.get(i - 1)[0]);
        }
        double mrBar = sum / (k - 1);
        return new SigmaEstimate(mrBar / ChartConstants.d2(2), SigmaMethod.MOVING_RANGE,
                degreesOfFreedom(SigmaMethod.MOVING_RANGE, 1, k));
    }

    private static void checkShape(SigmaMethod method, int n, int k) {
        if (method == SigmaMethod.MOVING_RANGE) {
            if (n != 1) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "the moving range is for individuals (subgroup size 1): %d", n));
            }
            if (k < 2) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "the moving range needs at least 2 individuals: %d", k));
            }
            return;
        }
        if (k < 1) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "need at least one subgroup: %d", k));
        }
        if (n < 2) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s needs subgroups of at least 2 readings: %d", method.token(), n));
        }
        if (method == SigmaMethod.RBAR && n > ChartConstants.MAX_SIZE) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "R-bar/d2 needs subgroups of at most %d readings: %d", ChartConstants.MAX_SIZE, n));
        }
    }

    private static void checkValues(List<double[]> subgroups) {
        Objects.requireNonNull(subgroups, "subgroups");
        if (subgroups.isEmpty()) {
            throw new IllegalArgumentException("need at least one subgroup");
        }
        for (double[] g : subgroups) {
            if (g.length == 0) {
                throw new IllegalArgumentException("a subgroup is empty");
            }
            for (double x : g) {
                if (!Double.isFinite(x)) {
                    throw new IllegalArgumentException(String.format(Locale.ROOT, "a reading is not finite: %s", x));
                }
            }
        }
    }
}

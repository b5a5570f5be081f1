package dev.proofrun.grade;

import dev.proofrun.stats.ChartConstants;
import dev.proofrun.stats.SigmaMethod;
import java.util.List;

/**
 * σ_w by the plan's estimator for equal subgroups of n, with its (effective) degrees of freedom.
 *
 * <ul>
 * <li>R̄/d2(n): ν from matching the coefficient of variation of R̄/d2 to that of a scaled chi with ν df,
 *     CV² = d3²/(k·d2²) ≈ 1/(2ν), so ν = k·d2²/(2·d3²) (Patnaik 1950, Biometrika 37:78–87; for n = 5 this
 *     is 3.63·k, against the common-practice 0.9·k·(n−1) = 3.6·k).</li>
 * <li>S̄/c4(n): the same matching with CV² = (1 − c4²)/(k·c4²), ν = k·c4²/(2(1 − c4²)).</li>
 * <li>pooled s_p/c4(ν+1): ν = k(n − 1) exactly.</li>
 * <li>MR̄/d2(2) for k individuals: ν ≈ 0.62·(k − 1) (Cryer &amp; Ryan 1990, JQT 22:187–192, from memory;
 *     the moving ranges overlap, so fewer df than k − 1 independent ranges would give).</li>
 * </ul>
 *
 * @param sigma σ̂_w
 * @param df    ν
 */
record WithinEstimate(double sigma, double df) {

    static WithinEstimate of(SigmaMethod method, List<double[]> subgroups) {
        int k = subgroups.size();
        int n = subgroups.get(0).length;
        switch (method) {
            case MOVING_RANGE: {
                double sum = 0;
                for (int i = 1; i < k; i++) {
                    sum += Math.abs(subgroups.get(i)[0] - subgroups.get(i - 1)[0]);
                }
                return new WithinEstimate(sum / (k - 1) / ChartConstants.d2(2), 0.62 * (k - 1));
            }
            case RBAR: {
                double sum = 0;
                for (double[] g : subgroups) {
                    double min = g[0];
                    double max = g[0];
                    for (double v : g) {
                        min = Math.min(min, v);
                        max = Math.max(max, v);
                    }
                    sum += max - min;
                }
                double d2 = ChartConstants.d2(n);
                double d3 = ChartConstants.d3(n);
                return new WithinEstimate(sum / k / d2, k * d2 * d2 / (2 * d3 * d3));
            }
            case SBAR: {
                double sum = 0;
                for (double[] g : subgroups) {
                    sum += Math.sqrt(sumSquares(g) / (n - 1));
                }
                double c4 = ChartConstants.c4(n);
                return new WithinEstimate(sum / k / c4, k * c4 * c4 / (2 * (1 - c4 * c4)));
            }
            default: {
                double ss = 0;
                for (double[] g : subgroups) {
                    ss += sumSquares(g);
                }
                int nu = k * (n - 1);
                return new WithinEstimate(Math.sqrt(ss / nu) / ChartConstants.c4(nu + 1), nu);
            }
        }
    }

    /** The df a study of {@code k2} subgroups would have, by the same rule. */
    static double dfFor(SigmaMethod method, int n, int k2) {
        switch (method) {
            case MOVING_RANGE:
                return 0.62 * (k2 - 1);
            case RBAR: {
                double d2 = ChartConstants.d2(n);
                double d3 = ChartConstants.d3(n);
                return k2 * d2 * d2 / (2 * d3 * d3);
            }
            case SBAR: {
                double c4 = ChartConstants.c4(n);
                return k2 * c4 * c4 / (2 * (1 - c4 * c4));
            }
            default:
                return k2 * (n - 1.0);
        }
    }

    private static double sumSquares(double[] g) {
        double m = 0;
        for (double v : g) {
            m += v;
        }
        m /= g.length;
        double ss = 0;
        for (double v : g) {
            ss += (v - m) * (v - m);
        }
        return ss;
    }
}

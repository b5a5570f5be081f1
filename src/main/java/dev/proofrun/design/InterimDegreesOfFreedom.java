package dev.proofrun.design;

import dev.proofrun.stats.SigmaMethod;
import org.apache.commons.numbers.gamma.LogGamma;

/**
 * INTERIM, until {@code stats.WithinSigma.degreesOfFreedom} lands on main: the effective degrees of
 * freedom of a within-sigma estimator by Patnaik's matching (Patnaik 1950, Biometrika 37:78–87): the ν
 * whose scaled chi variable χ_ν/√ν has the estimator's coefficient of variation.
 * R̄/d2: CV² = d3²/(k·d2²); S̄/c4: CV² = (1 − c4²)/(k·c4²); moving range of k individuals: the exact
 * variance of the mean of k − 1 correlated moving ranges (adjacent ones share a reading, correlation of the
 * differences −1/2); pooled: k(n − 1) exactly. d2, d3: ASTM E2587 table values (n = 2–25).
 */
final class InterimDegreesOfFreedom {

    private static final double[] D2 = {0, 0, 1.128, 1.693, 2.059, 2.326, 2.534, 2.704, 2.847, 2.970, 3.078,
        3.173, 3.258, 3.336, 3.407, 3.472, 3.532, 3.588, 3.640, 3.689, 3.735, 3.778, 3.819, 3.858, 3.895, 3.931};
    private static final double[] D3 = {0, 0, 0.853, 0.888, 0.880, 0.864, 0.848, 0.833, 0.820, 0.808, 0.797,
        0.787, 0.778, 0.770, 0.763, 0.756, 0.750, 0.744, 0.739, 0.734, 0.729, 0.724, 0.720, 0.716, 0.712, 0.708};

    private InterimDegreesOfFreedom() {
    }

    /** d2(n) from the ASTM E2587 table (interim, for tests until stats.ChartConstants lands). */
    static double d2(int n) {
        return D2[n];
    }

    static double of(SigmaMethod m, int n, int k) {
        switch (m) {
            case POOLED:
                return k * (n - 1.0);
            case RBAR:
                return fromCv2(D3[n] * D3[n] / (k * D2[n] * D2[n]));
            case SBAR: {
                double c4 = Math.exp(0.5 * Math.log(2.0 / (n - 1)) + LogGamma.value(n / 2.0)
                        - LogGamma.value((n - 1) / 2.0));
                return fromCv2((1 - c4 * c4) / (k * c4 * c4));
            }
            default: {
                int m1 = k - 1;
                double var = 2 - 4 / Math.PI;
                double cov = (4 / Math.PI) * (Math.sqrt(0.75) + 0.5 * Math.asin(0.5)) - 4 / Math.PI;
                double varMean = (m1 * var + 2 * (m1 - 1) * cov) / ((double) m1 * m1);
                return fromCv2(varMean / (4 / Math.PI));
            }
        }
    }

    /** ν with ν/E[χ_ν]² − 1 = cv2, by bisection on log ν. */
    static double fromCv2(double cv2) {
        double lo = 0.05;
        double hi = 1e7;
        for (int i = 0; i < 200; i++) {
            double mid = Math.sqrt(lo * hi);
            if (chiCv2(mid) > cv2) {
                lo = mid;
            } else {
                hi = mid;
            }
            if (hi / lo < 1 + 1e-12) {
                break;
            }
        }
        return Math.sqrt(lo * hi);
    }

    private static double chiCv2(double nu) {
        double logMean = 0.5 * Math.log(2) + LogGamma.value((nu + 1) / 2) - LogGamma.value(nu / 2);
        return nu * Math.exp(-2 * logMean) - 1;
    }
}

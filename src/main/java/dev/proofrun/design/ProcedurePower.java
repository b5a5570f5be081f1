package dev.proofrun.design;

import java.util.function.IntToDoubleFunction;

/**
 * The power of the whole grading procedure: the chance that the grader returns <em>demonstrated</em> for a
 * normal, stable process that is as expected — not only the chance that the lower bound reaches c₀.
 *
 * <p>The grader says demonstrated when every gate lets the study through and the lower bound reaches c₀ (which
 * implies the estimate is at least c₀, since the bound lies below the estimate). For k planned subgroups of n:
 * <pre>  P(demonstrated) = (1 − s)·(1 − u(n, k))·Σ_{L=0}^{A} C(k, L)·p^L·(1 − p)^(k−L)·B(k − L)</pre>
 * <ul>
 * <li>s = {@value #NORMAL_SHAPE_REJECTION}: the chance that the shape step rejects the normal model for normal
 * readings — the level of its normality check (one named constant here: the shape step is the grader's, and
 * {@code design} may not look into {@code grade}; a change of that level must change this constant).</li>
 * <li>u(n, k): the chance that the grader's stability decision calls a stable process unstable at this (n, k),
 * computed with the grader's own rule ({@code control.StabilityRisk}).</li>
 * <li>A = {@link LossAllowance#of}(k): the subgroups the plan may lose; p: the chance of losing one (binomial,
 * independent); a study that loses more than A is not valid. B(k − L): the exact power of the bound with the
 * subgroups left ({@link StudyPower}).</li>
 * </ul>
 *
 * <p>Why a product: the shape statistic (Anderson–Darling with estimated mean and s) and the stability decision
 * (counts of chart signals against limits from the data; the ANOVA F and σ_overall/σ_within) do not change when
 * the readings are shifted or scaled, so for normal readings they depend only on the standardized configuration,
 * which is independent of the sample mean and s (Basu 1955, Sankhyā 15:377–380). The bound on Ppk is a function of
 * the mean and s alone, so it is independent of both gates; for Cpk the within estimate is not a function of them
 * and the independence is close, not exact. The two gates are both functions of the configuration and are taken
 * as independent of each other (each is about 1 %, so their overlap moves the product by about 10⁻⁴). A lost
 * study's stability rate is taken at the planned k (it changes by tenths of a percent over a few subgroups).
 * {@code ProcedurePowerSimulationTest} checks the figure against the grader's own verdicts.
 */
public final class ProcedurePower {

    /** P(the grader's shape step rejects the normal model when the readings are normal). */
    public static final double NORMAL_SHAPE_REJECTION = 0.01;

    /** Binomial terms below this weight are left out of the sum over losses. */
    private static final double NEGLIGIBLE = 1e-12;

    private ProcedurePower() {
    }

    /**
     * The whole procedure's power.
     *
     * @param k             planned subgroups
     * @param lossRate      p, the chance that one subgroup is lost
     * @param smallestK     the fewest subgroups the bound can use (fewer left: no power)
     * @param boundPower    B(k'), the bound's power with k' subgroups
     * @param falseUnstable u(n, k)
     */
    static double of(int k, double lossRate, int smallestK, IntToDoubleFunction boundPower, double falseUnstable) {
        return (1 - NORMAL_SHAPE_REJECTION) * (1 - falseUnstable) * afterLosses(k, lossRate, smallestK, boundPower);
    }

    /** Σ_{L=0}^{A} C(k, L)·p^L·(1 − p)^(k−L)·B(k − L); B(k) when p = 0. */
    static double afterLosses(int k, double lossRate, int smallestK, IntToDoubleFunction boundPower) {
        if (lossRate == 0) {
            return boundPower.applyAsDouble(k);
        }
        int allowed = LossAllowance.of(k);
        double logP = Math.log(lossRate);
        double logQ = Math.log1p(-lossRate);
        double sum = 0;
        double logChoose = 0;
        for (int lost = 0; lost <= allowed && k - lost >= smallestK; lost++) {
            if (lost > 0) {
                logChoose += Math.log((k - lost + 1) / (double) lost);
            }
            double weight = Math.exp(logChoose + lost * logP + (k - lost) * logQ);
            if (weight < NEGLIGIBLE && lost > k * lossRate) {
                break;
            }
            sum += weight * boundPower.applyAsDouble(k - lost);
        }
        return sum;
    }
}

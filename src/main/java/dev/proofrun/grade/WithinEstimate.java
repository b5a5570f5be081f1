package dev.proofrun.grade;

import dev.proofrun.stats.SigmaEstimate;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.stats.WithinSigma;
import java.util.List;

/**
 * σ_w by the plan's estimator with its (effective) degrees of freedom, from {@link WithinSigma} — the same
 * estimator and ν the design and {@code estimate} use.
 *
 * @param sigma σ̂_w
 * @param df    ν
 */
record WithinEstimate(double sigma, double df) {

    static WithinEstimate of(SigmaMethod method, List<double[]> subgroups) {
        SigmaEstimate e = WithinSigma.estimate(method, subgroups);
        return new WithinEstimate(e.value(), e.degreesOfFreedom());
    }

    /** The ν a study of {@code k} subgroups of {@code n} would have. */
    static double dfFor(SigmaMethod method, int n, int k) {
        return WithinSigma.degreesOfFreedom(method, n, k);
    }
}

package dev.proofrun.design;

import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.IndexDistribution;
import org.apache.commons.statistics.distribution.NormalDistribution;

/**
 * The smallest α at which the grader's lower bound at confidence 1 − α still reaches c₀, for one study's
 * estimates: the study is demonstrated at a look of confidence 1 − a exactly when this value is at most a (and
 * the estimate is at least c₀, which the grader also asks). Each bound of {@code stats.CapabilityBounds} is the
 * true index L whose sampling distribution puts α above the observed estimate, and that chance increases with L,
 * so "bound ≥ c₀" is "P(Ĉ ≥ ĉ | C = c₀) ≤ α":
 * <ul>
 * <li>Cp, Pp: P(Ĉp ≥ ĉ | c₀) = F_{χ²_ν}(ν·(c₀/ĉ)²);</li>
 * <li>one-sided indices: the noncentral-t tail at noncentrality 3√N·c₀ (Chou, Owen &amp; Borrego 1990);</li>
 * <li>two-sided Cpk/Ppk, exact: the Pearn–Kotz–Johnson tail at Cpk = c₀ with the observed centring held
 * (Cp = c₀/(1 − k̂)); with Ĉpk ≤ 0 the bound falls back to the one-sided one, and so does this;</li>
 * <li>two-sided Cpk/Ppk, Bissell: 1 − Φ((ĉ − c₀)/√(1/(9N) + ĉ²/(2ν))).</li>
 * </ul>
 * {@code LookPValueTest} checks the round trip through the bound engine: the bound at 1 − p equals c₀.
 */
final class LookPValue {

    private static final NormalDistribution STANDARD = NormalDistribution.of(0, 1);

    private LookPValue() {
    }

    /**
     * @param shape    which distribution governs the estimate
     * @param method   the plan's bound method
     * @param c0       the required minimum
     * @param estimate ĉ
     * @param cp       Ĉp (Ĉpp) for a two-sided Cpk/Ppk, else NaN
     * @param readings N
     * @param nu       ν of the sigma estimate
     * @return a value in [0, 1]; 1 when the estimate is below c₀ (never demonstrated)
     */
    static double of(IndexShape shape, BoundMethod method, double c0, double estimate, double cp, int readings,
            double nu) {
        if (!(estimate >= c0)) {
            return 1;
        }
        switch (shape) {
            case SPREAD:
                return IndexDistribution.cpAtLeast(estimate, c0, nu);
            case ONE_SIDED:
                return IndexDistribution.oneSidedAtLeast(estimate, c0, readings, nu);
            default:
                if (method == BoundMethod.BISSELL) {
                    double se = Math.sqrt(1.0 / (9.0 * readings) + estimate * estimate / (2 * nu));
                    return STANDARD.survivalProbability((estimate - c0) / se);
                }
                if (Double.isNaN(cp) || estimate <= 0) {
                    return IndexDistribution.oneSidedAtLeast(estimate, c0, readings, nu);
                }
                double keep = Math.min(1, estimate / cp);
                return IndexDistribution.cpkAtLeast(estimate, c0, c0 / keep, readings, nu);
        }
    }
}

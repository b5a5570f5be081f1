package dev.proofrun.control;

import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.text.Token;
import java.util.Locale;

/**
 * Which pair of control charts a study uses. The location chart watches the mean, the spread chart the
 * variation inside subgroups; both estimate σ_w from the same statistic.
 *
 * <ul>
 * <li>{@link #XBAR_R}: mean and range. σ̂ = R̄/d2(n); mean chart x̿ ± 3σ̂/√n (= x̿ ± A2·R̄); range chart
 *     centre R̄, limits D3·R̄ and D4·R̄. For 2 ≤ n ≤ 10 (common practice).</li>
 * <li>{@link #XBAR_S}: mean and standard deviation. σ̂ = S̄/c4(n); mean chart x̿ ± 3σ̂/√n (= x̿ ± A3·S̄);
 *     s chart centre S̄, limits B3·S̄ and B4·S̄. For n &gt; 10, or when the plan estimates σ_w from
 *     standard deviations (S̄/c4 or pooled).</li>
 * <li>{@link #INDIVIDUALS}: individuals and moving range of span 2, for n = 1. σ̂ = MR̄/d2(2);
 *     individuals chart x̄ ± 3σ̂ (= x̄ ± 2.66·MR̄); moving-range chart centre MR̄, limits 0 and D4(2)·MR̄.</li>
 * </ul>
 * Sources: Montgomery, <em>Introduction to Statistical Quality Control</em>, chapter 6 (X̄–R, X̄–S) and
 * the individuals chart; ASTM E2587 (the factors).
 */
public enum ChartKind implements Token {
    XBAR_R(ChartStatistic.MEAN, ChartStatistic.RANGE),
    XBAR_S(ChartStatistic.MEAN, ChartStatistic.STANDARD_DEVIATION),
    INDIVIDUALS(ChartStatistic.INDIVIDUAL, ChartStatistic.MOVING_RANGE);

    private final ChartStatistic location;
    private final ChartStatistic spread;

    ChartKind(ChartStatistic location, ChartStatistic spread) {
        this.location = location;
        this.spread = spread;
    }

    /** The word in JSON: {@code xbar-r}, {@code xbar-s}, and {@code individuals-mr} for individuals and moving range. */
    @Override
    public String token() {
        return this == INDIVIDUALS ? "individuals-mr" : Token.super.token();
    }

    public ChartStatistic location() {
        return location;
    }

    public ChartStatistic spread() {
        return spread;
    }

    /**
     * The charts that match the study's within-sigma estimator: individuals for the moving range, X̄–S for
     * S̄/c4 and pooled, X̄–R for R̄/d2.
     */
    public static ChartKind forMethod(SigmaMethod method) {
        switch (method) {
            case MOVING_RANGE:
                return INDIVIDUALS;
            case SBAR:
            case POOLED:
                return XBAR_S;
            case RBAR:
                return XBAR_R;
            default:
                throw new IllegalArgumentException(String.format(Locale.ROOT, "no chart for %s", method));
        }
    }

    /** The default for subgroups of n: individuals for 1, X̄–R up to 10, X̄–S above. */
    public static ChartKind forSubgroupSize(int n) {
        return forMethod(SigmaMethod.defaultFor(n));
    }
}

package dev.proofrun.grade;

import dev.proofrun.design.Design;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.stats.Subgroups;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * The capability step: the required index under the chosen model, its bounds, and for an inconclusive
 * result how many more subgroups would settle it.
 *
 * <p>This is the normal model's step: normal theory with the plan's estimator and bound method. Declared
 * lognormal and Weibull shapes go through {@link PercentileJudge}.
 *
 * <p>More subgroups: holding the estimates where they are, the smallest k′ &gt; k whose lower bound (N′ = n·k′
 * readings, ν′ by the estimator's rule for k′ subgroups) reaches c₀, by bisection up to
 * {@value #MAX_SUBGROUPS} subgroups; reported as k′ − k. It is a planning figure, not a promise: the
 * estimate will move as data comes in.
 */
final class CapabilityJudge {

    static final int MAX_SUBGROUPS = 20_000;

    private CapabilityJudge() {
    }

    /** The required index under the normal model, or {@code null} when it does not exist for the limits. */
    static JudgedIndex judge(PlannedCharacteristic gc, Design design, List<double[]> subgroups) {
        IndexKind kind = gc.requirement().index();
        List<double[]> data = subgroups;
        SpecLimits limits = gc.limits();
        double[] x = Subgroups.flatten(data);
        int n = x.length;
        double mean = 0;
        for (double v : x) {
            mean += v;
        }
        mean /= n;
        double s = StabilityJudge.overallSd(data);
        double sigma;
        double df;
        if (kind.usesWithinSigma()) {
            WithinEstimate w = WithinEstimate.of(design.sigmaMethod(), data);
            sigma = w.sigma();
            df = w.df();
        } else {
            sigma = s;
            df = n - 1.0;
        }
        if (!(sigma > 0)) {
            return null;
        }
        double est = JudgedIndex.value(kind, limits, mean, sigma);
        if (Double.isNaN(est)) {
            return null;
        }
        double cp = limits.isTwoSided() ? limits.width().getAsDouble() / (6 * sigma) : Double.NaN;
        return new JudgedIndex(kind, est, cp, n, df, JudgedIndex.sideFor(kind, limits), design.boundMethod());
    }

    /** About how many more subgroups would bring the lower bound to c₀ with the same estimates; empty if none up to the cap. */
    static OptionalInt additionalSubgroups(JudgedIndex j, Design design, int subgroupsNow, double c0, double confidence) {
        int n = design.subgroupSize();
        int lo = subgroupsNow;
        int hi = MAX_SUBGROUPS;
        if (hi <= lo || j.lowerAt(n * hi, dfFor(j, design, n, hi), confidence) < c0) {
            return OptionalInt.empty();
        }
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (j.lowerAt(n * mid, dfFor(j, design, n, mid), confidence) >= c0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return OptionalInt.of(hi - subgroupsNow);
    }

    private static double dfFor(JudgedIndex j, Design design, int n, int k) {
        if (j.side() == JudgedIndex.BoundSide.APPROXIMATE || j.side() == JudgedIndex.BoundSide.APPROXIMATE_POTENTIAL
                || !j.kind().usesWithinSigma()) {
            return n * (double) k - 1;
        }
        return WithinEstimate.dfFor(design.sigmaMethod(), n, k);
    }
}

package dev.proofrun.grade;

import dev.proofrun.design.Design;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * The capability step: the required index under the chosen model, its bounds, and for an inconclusive
 * result how many more subgroups would settle it.
 *
 * <p>Under {@link ShapeModel#BOX_COX} and {@link ShapeModel#LOGNORMAL} the readings and the limits are
 * transformed (a limit at or below zero is dropped: positive readings cannot fall below it) and the normal
 * theory applies on the new scale, with the plan's estimator and bound method. Under
 * {@link ShapeModel#WEIBULL} the percentile method of ISO 22514-2 is used with the fitted quantiles
 * X₀.₁₃₅, X₅₀, X₉₉.₈₆₅ (Clements 1989); it has no within/overall distinction.
 *
 * <p>More subgroups: holding the estimates where they are, the smallest k′ &gt; k whose lower bound (N′ = n·k′
 * readings, ν′ by the estimator's rule for k′ subgroups) reaches c₀, by bisection up to
 * {@value #MAX_SUBGROUPS} subgroups; reported as k′ − k. It is a planning figure, not a promise: the
 * estimate will move as data comes in.
 */
final class CapabilityJudge {

    static final int MAX_SUBGROUPS = 20_000;
    static final double LOW_QUANTILE = 0.00135;
    static final double HIGH_QUANTILE = 0.99865;

    private CapabilityJudge() {
    }

    /** The required index, or {@code null} when it does not exist for the (transformed) limits. */
    static JudgedIndex judge(GradedCharacteristic gc, Design design, List<double[]> subgroups, Shape shape) {
        IndexKind kind = gc.requirement().index();
        ShapeModel model = shape.model();
        if (model == ShapeModel.WEIBULL) {
            return percentile(kind, gc.limits(), subgroups, shape.fits().get(0), design);
        }
        List<double[]> data = subgroups;
        SpecLimits limits = gc.limits();
        if (model == ShapeModel.BOX_COX || model == ShapeModel.LOGNORMAL) {
            double lambda = model == ShapeModel.LOGNORMAL ? 0 : shape.fits().get(0).first();
            data = transform(subgroups, lambda);
            limits = transform(limits, lambda);
            if (limits == null) {
                return null;
            }
        }
        double[] x = ShapeJudge.flatten(data);
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

    private static JudgedIndex percentile(IndexKind kind, SpecLimits limits, List<double[]> subgroups, ModelFit fit, Design design) {
        int n = subgroups.size() * subgroups.get(0).length;
        double q1 = DistributionFits.weibullQuantile(fit.first(), fit.second(), LOW_QUANTILE);
        double q50 = DistributionFits.weibullQuantile(fit.first(), fit.second(), 0.5);
        double q2 = DistributionFits.weibullQuantile(fit.first(), fit.second(), HIGH_QUANTILE);
        double upper = limits.upper().isPresent() ? (limits.upper().getAsDouble() - q50) / (q2 - q50) : Double.NaN;
        double lower = limits.lower().isPresent() ? (q50 - limits.lower().getAsDouble()) / (q50 - q1) : Double.NaN;
        double est;
        switch (kind.side()) {
            case BOTH:
                est = limits.isTwoSided() ? limits.width().getAsDouble() / (q2 - q1) : Double.NaN;
                break;
            case UPPER:
                est = upper;
                break;
            case LOWER:
                est = lower;
                break;
            default:
                est = limits.isTwoSided() ? Math.min(upper, lower) : (Double.isNaN(upper) ? lower : upper);
        }
        if (Double.isNaN(est)) {
            return null;
        }
        JudgedIndex.BoundSide side = kind.side() == IndexKind.Side.BOTH
                ? JudgedIndex.BoundSide.APPROXIMATE_POTENTIAL : JudgedIndex.BoundSide.APPROXIMATE;
        return new JudgedIndex(kind, est, Double.NaN, n, n - 1.0, side, design.boundMethod());
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

    static List<double[]> transform(List<double[]> subgroups, double lambda) {
        List<double[]> out = new ArrayList<>(subgroups.size());
        for (double[] g : subgroups) {
            double[] t = new double[g.length];
            for (int i = 0; i < g.length; i++) {
                t[i] = DistributionFits.boxCox(g[i], lambda);
            }
            out.add(t);
        }
        return out;
    }

    /** Limits under the Box–Cox transform; a limit ≤ 0 is dropped; {@code null} if none is left. */
    static SpecLimits transform(SpecLimits limits, double lambda) {
        OptionalDouble lo = limits.lower().isPresent() && limits.lower().getAsDouble() > 0
                ? OptionalDouble.of(DistributionFits.boxCox(limits.lower().getAsDouble(), lambda)) : OptionalDouble.empty();
        OptionalDouble hi = limits.upper().isPresent() && limits.upper().getAsDouble() > 0
                ? OptionalDouble.of(DistributionFits.boxCox(limits.upper().getAsDouble(), lambda)) : OptionalDouble.empty();
        if (lo.isEmpty() && hi.isEmpty()) {
            return null;
        }
        return new SpecLimits(lo, hi);
    }
}

package dev.proofrun.grade;

import dev.proofrun.design.Requirement;
import dev.proofrun.stats.BoundEngine;
import dev.proofrun.stats.FloorBound;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.PercentileEstimate;
import dev.proofrun.stats.PercentileIndex;
import dev.proofrun.stats.FoldedNormalBound;
import dev.proofrun.stats.PivotalBound;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.ShapeFit;
import dev.proofrun.stats.SpecLimits;
import java.util.List;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * The capability step under a declared lognormal or Weibull shape: the percentile index of ISO 22514-2
 * ({@link PercentileIndex}) from the fitted model, its bounds by generalized pivotal quantities
 * ({@link PivotalBound}; for the folded normal, which is not location–scale, test inversion at the least
 * favourable mean/σ, {@link FoldedNormalBound}; seeded, the seed in the result), and the expected ppm under the model.
 *
 * <p><b>Within versus overall.</b> The fit uses all readings, so the index is an overall (Pp-family) index.
 * A Cp-family requirement (Cpk, Cpu, …) under such a shape is judged on this overall index and the result says
 * so: once the stability step has found the process stable, within and overall spread estimate the same
 * quantity; the bound then accounts for the overall fit's estimation error only, which is what the coverage
 * figures of docs/decisions/declared-shape-grading.md measure.
 *
 * <p><b>Limits.</b> A lower limit at or below the model's lower bound (zero) cannot be missed by the model's
 * readings and is dropped with a note; when no limit is left the index does not exist.
 */
final class PercentileJudge {

    private PercentileJudge() {
    }

    /**
     * The required index with its bounds, or null when the index does not exist for the limits left.
     *
     * @param readings N, the number of readings the fit came from
     */
    static IndexEvidence judge(PlannedCharacteristic gc, Shape shape, int readings, List<Reason> reasons) {
        return judge(gc, shape, readings, reasons, gc.requirement().confidence());
    }

    /** As above, the bounds at {@code confidence} (a staged study's look) instead of the requirement's. */
    static IndexEvidence judge(PlannedCharacteristic gc, Shape shape, int readings, List<Reason> reasons,
            double confidence) {
        ShapeFit fit = shape.fit();
        ShapeFamily family = fit.family();
        Requirement req = gc.requirement();
        IndexKind kind = req.index();
        SpecLimits limits = gc.limits();
        ShapeFamily declared = gc.shape();
        if (limits.lower().isPresent() && limits.lower().getAsDouble() <= fit.lowerBound()) {
            String lsl = String.format(java.util.Locale.ROOT, "%s", limits.lower().getAsDouble());
            reasons.add(new Reason(Step.SHAPE, false, declared.hasThreshold()
                    ? GradeMessage.REASON_LOWER_LIMIT_AT_THRESHOLD.format(lsl,
                            String.format(java.util.Locale.ROOT, "%s", fit.threshold()), declared.token())
                    : GradeMessage.REASON_LOWER_LIMIT_DROPPED.format(lsl, family.token())));
            if (limits.upper().isEmpty()) {
                return null;
            }
            limits = new SpecLimits(OptionalDouble.empty(), limits.upper());
        }
        long seed = PivotalBound.DEFAULT_SEED;
        boolean pivotal = family.isLocationScale();
        FloorBound.ThresholdSet floorSet = shape.thresholds();
        BoundEngine bound = floorSet != null
                ? new FloorBound.Estimate(floorSet, kind, limits, seed, PercentileIndex.of(kind, limits, fit))
                : PercentileEstimate.of(fit, kind, limits, readings, seed);
        double estimate = bound.estimate();
        if (Double.isNaN(estimate)) {
            return null;
        }
        double f = shape.tailFactor();
        double ppm = PercentileIndex.expectedPpm(limits, fit);
        if (kind.usesWithinSigma()) {
            reasons.add(new Reason(Step.CAPABILITY, false, GradeMessage.REASON_OVERALL_ONLY.format(declared.token(),
                    kind.symbol(), overall(kind).symbol())));
        }
        double q0 = fit.quantile(PercentileIndex.LOW);
        double q50 = fit.quantile(0.5);
        double q1 = fit.quantile(PercentileIndex.HIGH);
        String method = pivotal
                ? GradeMessage.REASON_PERCENTILE_METHOD.format(kind.symbol(), modelWords(declared, fit, floorSet), q0, q50, q1, ppm, PivotalBound.DRAWS, seed)
                : GradeMessage.REASON_PERCENTILE_INVERTED.format(kind.symbol(), family.token(), q0, q50, q1, ppm,
                        FoldedNormalBound.GRID_SIZE, FoldedNormalBound.DRAWS, seed);
        reasons.add(new Reason(Step.CAPABILITY, false, method));
        double lower;
        double upper;
        double limitedAt = Double.NaN;
        if (floorSet != null) {
            FloorBound.Estimate floorBound = (FloorBound.Estimate) bound;
            FloorBound.ThresholdSet used = floorBound.setAt(confidence);
            double[] at = FloorBound.bounds(used, kind, limits, confidence, seed);
            double gamma = used.gamma();
            if (!used.empty()) {
                reasons.add(new Reason(Step.CAPABILITY, false, GradeMessage.REASON_FLOOR_BOUND.format(
                        number(used.thetas()[0]), number(used.highest()), number(at[2]),
                        100 * (confidence + gamma), 100 * gamma, 100 * confidence)));
            }
            reasons.add(new Reason(Step.CAPABILITY, false, GradeMessage.REASON_FLOOR_CAUTION.format(declared.token(),
                    String.format(java.util.Locale.ROOT, "%s", floorSet.floor()))));
            lower = at[0];
            upper = at[1];
            limitedAt = at[2];
        } else {
            if (declared.hasThreshold()) {
                reasons.add(new Reason(Step.CAPABILITY, false, GradeMessage.REASON_THRESHOLD_CAUTION.format(declared.token(),
                        String.format(java.util.Locale.ROOT, "%s", fit.threshold()))));
            }
            lower = bound.lower(confidence);
            upper = estimate < req.minimum() ? bound.upper(confidence) : Double.NaN;
        }
        upper = estimate < req.minimum() ? upper * f : Double.NaN;
        return new IndexEvidence(kind, req.minimum(), confidence, estimate * f, lower * f, upper,
                declared, pivotal ? IndexMethod.PERCENTILE : IndexMethod.PERCENTILE_INVERTED, ppm, seed, limitedAt);
    }

    private static String number(double v) {
        return String.format(java.util.Locale.ROOT, "%.6g", v);
    }

    /**
     * "lognormal", "lognormal3 (threshold 9.95)" for a declared threshold, or "lognormal3 (floor 9.95; fitted at the
     * threshold 9.9512)" for a floor.
     */
    static String modelWords(ShapeFamily declared, ShapeFit fit, FloorBound.ThresholdSet floorSet) {
        if (floorSet != null) {
            return String.format(java.util.Locale.ROOT, "%s (floor %s; fitted at the threshold %s)", declared.token(),
                    floorSet.floor(), number(fit.threshold()));
        }
        return declared.hasThreshold()
                ? String.format(java.util.Locale.ROOT, "%s (threshold %s)", declared.token(), fit.threshold()) : declared.token();
    }

    /** The overall-family index with the same side: Cpk → Ppk. */
    static IndexKind overall(IndexKind kind) {
        return IndexKind.fromToken("p" + kind.token().substring(1));
    }

    /**
     * About how many more subgroups would bring the lower bound to c₀ if the estimate held: the distance from
     * the estimate to the bound shrinks as 1/√N (a planning figure, not a promise); empty when none up to
     * {@link CapabilityJudge#MAX_SUBGROUPS}.
     */
    static OptionalInt additionalSubgroups(IndexEvidence ev, int subgroupSize, int subgroupsNow) {
        double gap = ev.estimate() - ev.lower();
        double needed = ev.estimate() - ev.required();
        if (!(needed > 0) || !(gap > 0)) {
            return OptionalInt.empty();
        }
        double readingsNow = (double) subgroupSize * subgroupsNow;
        double readings = readingsNow * (gap / needed) * (gap / needed);
        long k = (long) Math.ceil(readings / subgroupSize);
        if (k > CapabilityJudge.MAX_SUBGROUPS) {
            return OptionalInt.empty();
        }
        return OptionalInt.of((int) Math.max(1, k - subgroupsNow));
    }
}

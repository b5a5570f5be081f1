package dev.proofrun.grade;

import dev.proofrun.stats.AndersonDarling;
import dev.proofrun.stats.FloorBound;
import dev.proofrun.stats.FoldedNormalBootstrap;
import dev.proofrun.stats.PercentileIndex;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.ShapeFit;
import dev.proofrun.stats.ShapeFitter;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.stats.Subgroups;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;

/**
 * The shape step: does the shape the plan declared fit the readings? Only the declared model is fitted
 * ({@link ShapeFitter}, maximum likelihood); no other model is tried, because choosing among models after
 * seeing the data, each with its own index, let skewed processes at c₀ pass far more often than α.
 *
 * <p><b>The check</b> (level {@value #LEVEL}: a good process is voided by chance in 1 % of studies, not 5 %):
 * <ul>
 * <li>normal: Anderson–Darling A*² = A²(1 + 0.75/N + 2.25/N²) with Stephens' p-value ({@link AndersonDarling};
 *     D'Agostino &amp; Stephens 1986, <em>Goodness-of-Fit Techniques</em>, Table 4.9);</li>
 * <li>lognormal: the same test on ln x (a lognormal with estimated μ, σ is a normal with estimated mean and
 *     s on that scale, so the same p-value applies exactly);</li>
 * <li>Weibull: A² against the fitted Weibull, A*² = A²(1 + 0.2/√N), rejected above {@value #WEIBULL_CRITICAL_1}
 *     (D'Agostino &amp; Stephens 1986, Table 4.17, extreme-value distribution with both parameters estimated
 *     — from memory; the test {@code ShapeJudgeTest} checks the 1 % level by simulation).</li>
 * <li>folded normal: A² against the fitted model with a parametric-bootstrap p-value, each simulated study
 *     refitted ({@link FoldedNormalBootstrap#fitCheck}, seeded with {@value #CHECK_SEED}): no table exists for
 *     this model with both parameters estimated, and the null distribution depends on μ/σ.</li>
 * </ul>
 *
 * <p><b>Large studies.</b> With thousands of readings the test rejects departures too small to matter (readings
 * like Student's t with 20 degrees of freedom, N = 10,000). With at least {@value #TAIL_RULE_READINGS} readings a
 * rejected fit is judged where the index looks instead: for each side with a limit, the readings' own quantile
 * (0.135 % or 99.865 %, Hyndman–Fan type 7) is compared with the model's; the fit is kept when each lies within
 * {@value #TAIL_TOLERANCE} of the distance from the model's median to that limit. The index is then computed on
 * the wider of the two tails (the model's quantile spread scaled by {@link Shape#tailFactor()} ≤ 1), so the
 * rule never makes a verdict more favourable than the readings. Figures: docs/decisions/declared-shape-grading.md.
 *
 * <p><b>Gauge resolution.</b> The tests assume a continuous distribution; readings on a gauge's grid are tied,
 * so before the check each reading is spread uniformly over its resolution cell, x + r·(U − ½), U uniform,
 * seeded (a continuity correction; kept inside the model's support). The fit and the index use the readings as
 * returned.
 */
final class ShapeJudge {

    /**
     * The level of the fit check: a process of the declared shape is voided this often by chance, and the design's
     * power counts it ({@code design.ProcedurePower.NORMAL_SHAPE_REJECTION} must equal it; {@code ShapeLevelTest}).
     */
    static final double LEVEL = 0.01;
    static final double WEIBULL_CRITICAL_1 = 1.038;
    /** The seed of the folded normal's bootstrap fit check. */
    static final long CHECK_SEED = 0x5eed_2272L;
    static final int MIN_READINGS = 8;
    static final int TAIL_RULE_READINGS = 2000;
    static final double TAIL_TOLERANCE = 0.15;
    private static final long SPREAD_SEED = 0x5ba9eL;

    private ShapeJudge() {
    }

    /** The readings spread over their resolution cells (a copy; unchanged when r = 0), kept above {@code floor}. */
    static double[] spread(double[] x, double resolution, double floor) {
        if (!(resolution > 0)) {
            return x;
        }
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(SPREAD_SEED);
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            double v = x[i] + resolution * (rng.nextDouble() - 0.5);
            y[i] = v > floor ? v : x[i];
        }
        return y;
    }

    /**
     * Fits and checks the declared shape.
     *
     * @param slots  the slot id of each subgroup (to name a reading the model cannot produce)
     * @param limits the plan's limits (for the large-study rule)
     */
    static Shape judge(List<double[]> subgroups, List<String> slots, double resolution, ShapeFamily family,
            SpecLimits limits, List<Reason> reasons) {
        return judge(subgroups, slots, resolution, family, 0, limits, reasons);
    }

    /**
     * As above with the declared threshold θ of a threshold shape ({@code lognormal3}, {@code weibull3}): the
     * two-parameter model is fitted and checked on x − θ (θ is the plan's, never estimated); a reading at or
     * below θ is a finding naming its subgroup and position. θ is ignored for the other shapes (the overload
     * without θ takes θ = 0).
     */
    static Shape judge(List<double[]> subgroups, List<String> slots, double resolution, ShapeFamily family,
            double threshold, SpecLimits limits, List<Reason> reasons) {
        double[] x = Subgroups.flatten(subgroups);
        ShapeFitter.Outcome o = ShapeFitter.fit(family, threshold, x);
        if (!o.fitted()) {
            reasons.add(new Reason(Step.SHAPE, true, noFit(o, subgroups, slots, family, threshold, false, x.length)));
            return new Shape(Double.NaN, Double.NaN, false, family, List.of(), false, family, null, 1);
        }
        ShapeFit fit = o.fit();
        if (x.length < MIN_READINGS) {
            reasons.add(new Reason(Step.SHAPE, false, GradeMessage.REASON_TOO_FEW_FOR_SHAPE.format(x.length)));
            return new Shape(Double.NaN, Double.NaN, family.isNormal(), family, List.of(modelFit(family, fit, x, Double.NaN, true)),
                    true, family, fit, 1);
        }
        double[] checked = spread(x, resolution, fit.lowerBound());
        double[] test = test(fit.family(), fit, checked);
        boolean rejected = test[2] > 0;
        String evidence = fit.family() == ShapeFamily.WEIBULL
                ? String.format(Locale.ROOT, "1 %% critical value %.3f", WEIBULL_CRITICAL_1)
                : family == ShapeFamily.FOLDED_NORMAL
                ? String.format(Locale.ROOT, "bootstrap p = %.2g of %d refitted studies, seed %d", test[1],
                        FoldedNormalBootstrap.CHECK_DRAWS, CHECK_SEED)
                : String.format(Locale.ROOT, "p = %.2g", test[1]);
        if (!rejected) {
            reasons.add(new Reason(Step.SHAPE, false,
                    GradeMessage.REASON_SHAPE_FITS.format(family.token(), fit.describe(), test[0], evidence)));
            return new Shape(test[0], test[1], family.isNormal(), family, List.of(modelFit(family, fit, x, test[0], true)), true,
                    family, fit, 1);
        }
        double[] tail = x.length >= TAIL_RULE_READINGS ? tailDeparture(fit, x, limits) : null;
        if (tail != null && tail[0] <= TAIL_TOLERANCE) {
            reasons.add(new Reason(Step.SHAPE, false, GradeMessage.REASON_TAIL_RULE.format(family.token(), test[0], evidence,
                    x.length, 100 * tail[0], 100 * TAIL_TOLERANCE, tail[1])));
            return new Shape(test[0], test[1], family.isNormal(), family, List.of(modelFit(family, fit, x, test[0], true)), true,
                    family, fit, tail[1]);
        }
        reasons.add(new Reason(Step.SHAPE, true,
                GradeMessage.REASON_SHAPE_REJECTED.format(family.token(), fit.describe(), test[0], evidence)));
        return new Shape(test[0], test[1], false, family, List.of(modelFit(family, fit, x, test[0], false)), false, family, fit, 1);
    }

    /**
     * As above for a threshold shape whose plan gives a floor, not the threshold: the thresholds the readings leave
     * possible ({@link FloorBound#thresholds}, at 1 − γ); none left is a finding (the planned shape does not fit);
     * otherwise the declared shape is fitted and checked as above at the set's central threshold, and the set comes
     * along in the {@link Shape} for the capability step. A reading at or below the floor is a finding naming its
     * subgroup and position.
     *
     * @param gamma the error rate spent on the set of thresholds (γ = {@value FloorBound#GAMMA_SHARE}·α)
     */
    static Shape judgeFloor(List<double[]> subgroups, List<String> slots, double resolution, ShapeFamily family,
            double floor, double gamma, SpecLimits limits, List<Reason> reasons) {
        double[] x = Subgroups.flatten(subgroups);
        ShapeFitter.Outcome atFloor = ShapeFitter.fit(family, floor, x);
        if (!atFloor.fitted()) {
            reasons.add(new Reason(Step.SHAPE, true, noFit(atFloor, subgroups, slots, family, floor, true, x.length)));
            return new Shape(Double.NaN, Double.NaN, false, family, List.of(), false, family, null, 1);
        }
        String f = String.format(Locale.ROOT, "%s", floor);
        if (x.length > FloorBound.MAX_READINGS) {
            reasons.add(new Reason(Step.SHAPE, true, GradeMessage.REASON_FLOOR_TOO_MANY.format(family.token(), f, x.length,
                    FloorBound.MAX_READINGS)));
            return new Shape(Double.NaN, Double.NaN, false, family, List.of(), false, family, atFloor.fit(), 1);
        }
        FloorBound.ThresholdSet set = FloorBound.thresholds(family, floor, x, gamma);
        if (set.empty()) {
            double min = Arrays.stream(x).min().getAsDouble();
            reasons.add(new Reason(Step.SHAPE, true, GradeMessage.REASON_FLOOR_NO_THRESHOLD.format(f,
                    String.format(Locale.ROOT, "%s", min), family.token(), FloorBound.skewAt(x, floor), 100 * gamma,
                    set.critical(), FloorBound.SKEW_DRAWS, x.length, FloorBound.SKEW_SEED)));
            return new Shape(Double.NaN, Double.NaN, false, family, List.of(), false, family, atFloor.fit(), 1, set);
        }
        double central = set.central();
        reasons.add(new Reason(Step.SHAPE, false, GradeMessage.REASON_FLOOR_SET.format(family.token(), f,
                String.format(Locale.ROOT, "%.6g", set.thetas()[0]), String.format(Locale.ROOT, "%.6g", set.highest()),
                set.tried(), 100 * gamma, set.critical(), FloorBound.SKEW_DRAWS, FloorBound.SKEW_SEED,
                String.format(Locale.ROOT, "%.6g", central))));
        Shape s = judge(subgroups, slots, resolution, family, central, limits, reasons);
        return new Shape(s.andersonDarling(), s.pValue(), s.normal(), s.model(), s.fits(), s.modelFits(), s.family(), s.fit(),
                s.tailFactor(), set);
    }

    /** {A*², p (NaN for Weibull), 1 if rejected at 1 % else 0}. */
    static double[] test(ShapeFamily family, ShapeFit fit, double[] x) {
        int n = x.length;
        if (family == ShapeFamily.FOLDED_NORMAL) {
            double[] r = FoldedNormalBootstrap.fitCheck(fit, x, CHECK_SEED);
            return new double[] {r[0], r[1], r[1] < LEVEL ? 1 : 0};
        }
        if (family == ShapeFamily.WEIBULL) {
            double a2 = AndersonDarlingFit.statistic(x, fit::cdf) * (1 + 0.2 / Math.sqrt(n));
            return new double[] {a2, Double.NaN, a2 > WEIBULL_CRITICAL_1 ? 1 : 0};
        }
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = ShapeFit.toScale(family, x[i] - fit.threshold());
        }
        AndersonDarling.Result r = AndersonDarling.test(y);
        return new double[] {r.adjusted(), r.pValue(), r.pValue() < LEVEL ? 1 : 0};
    }

    /**
     * {largest departure, factor}: for each side with a limit, |X̂ₚ − Xₚ| / |limit − X₅₀| with X̂ₚ the readings'
     * own quantile and Xₚ the model's, and the factor min (Xₚ − X₅₀)/(X̂ₚ − X₅₀) capped at 1.
     */
    static double[] tailDeparture(ShapeFit fit, double[] x, SpecLimits limits) {
        double[] sorted = x.clone();
        Arrays.sort(sorted);
        double median = fit.quantile(0.5);
        double worst = 0;
        double factor = 1;
        double[] ps = {PercentileIndex.LOW, PercentileIndex.HIGH};
        boolean[] has = {limits.lower().isPresent() && limits.lower().getAsDouble() > fit.lowerBound(),
            limits.upper().isPresent()};
        double[] limit = {limits.lower().orElse(Double.NaN), limits.upper().orElse(Double.NaN)};
        for (int s = 0; s < 2; s++) {
            if (!has[s]) {
                continue;
            }
            double model = fit.quantile(ps[s]);
            double own = quantile(sorted, ps[s]);
            worst = Math.max(worst, Math.abs(own - model) / Math.abs(limit[s] - median));
            factor = Math.min(factor, (model - median) / (own - median));
        }
        return new double[] {worst, Math.min(1, factor)};
    }

    /** Hyndman–Fan type 7 quantile of sorted values. */
    static double quantile(double[] sorted, double p) {
        double h = (sorted.length - 1) * p;
        int i = (int) Math.floor(h);
        if (i + 1 >= sorted.length) {
            return sorted[sorted.length - 1];
        }
        return sorted[i] + (h - i) * (sorted[i + 1] - sorted[i]);
    }

    private static ModelFit modelFit(ShapeFamily model, ShapeFit fit, double[] x, double a2, boolean fits) {
        double logL = 0;
        for (double v : x) {
            logL += fit.logDensity(v);
        }
        return new ModelFit(model, fit.first(), fit.second(), logL, 4 - 2 * logL, a2, fits, fit.threshold());
    }

    private static String noFit(ShapeFitter.Outcome o, List<double[]> subgroups, List<String> slots, ShapeFamily family,
            double threshold, boolean floor, int n) {
        switch (o.failure()) {
            case AT_OR_BELOW_BOUND: {
                int i = o.index();
                for (int g = 0; g < subgroups.size(); g++) {
                    if (i < subgroups.get(g).length) {
                        String value = String.format(Locale.ROOT, "%s", subgroups.get(g)[i]);
                        String slot = g < slots.size() ? slots.get(g) : "#" + (g + 1);
                        if (floor) {
                            return GradeMessage.REASON_AT_OR_BELOW_FLOOR.format(family.token(),
                                    String.format(Locale.ROOT, "%s", threshold), value, slot, i + 1);
                        }
                        return family.hasThreshold()
                                ? GradeMessage.REASON_AT_OR_BELOW_THRESHOLD.format(family.token(),
                                        String.format(Locale.ROOT, "%s", threshold), value, slot, i + 1)
                                : GradeMessage.REASON_AT_OR_BELOW_ZERO.format(family.token(), value, slot, i + 1);
                    }
                    i -= subgroups.get(g).length;
                }
                return GradeMessage.REASON_SHAPE_NO_FIT.format("a reading lies outside the model's range");
            }
            case NO_SPREAD:
                return GradeMessage.REASON_SHAPE_NO_SPREAD.format(n, family.token());
            case SHAPE_TOO_LARGE:
                return GradeMessage.REASON_SHAPE_NO_FIT.format(String.format(Locale.ROOT,
                        "the Weibull fit's shape is above %.0f, readings a Weibull model cannot tell from normal ones far from zero",
                        ShapeFitter.MAX_WEIBULL_SHAPE));
            case AT_SEARCH_LIMIT:
                return GradeMessage.REASON_SHAPE_NO_FIT.format("the " + family.token() + " fit's maximum lies at the edge of its search");
            case TOO_FEW:
                return GradeMessage.REASON_SHAPE_NO_FIT.format("fewer than 3 readings");
            default:
                return GradeMessage.REASON_SHAPE_NO_FIT.format("a reading is not a finite number");
        }
    }
}

package dev.proofrun.grade;

import dev.proofrun.control.StabilityRule;
import dev.proofrun.stats.ReadingGrid;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.Subgroups;
import java.util.List;
import java.util.Locale;

/**
 * The gauge's step in grading: which step the readings are on, how finely it resolves the process, and whether it
 * is too coarse to judge the shape at all. Runs before the shape step; the shape step then spreads the readings
 * over this step (its continuity correction).
 *
 * <ul>
 * <li>The step: the plan's recorded resolution; without one, the readings' own grid ({@link ReadingGrid}), said
 * as found in the readings. Readings on no grid (more than six decimals) have no step to account for.</li>
 * <li>Discrimination: the step against the readings' standard deviation s, said as steps per s and as the
 * number of distinct values the process spread 6s covers.</li>
 * <li>Too coarse: a step larger than s ({@value #MAX_STEP_PER_SIGMA} s) leaves fewer than six distinct values
 * across the spread; rounding then shapes the readings more than the process does, and no shape test or
 * capability figure can be trusted. proofrun's rule: such a study is not valid, with a finding of its own (not
 * "normality rejected"). The threshold is our choice, in line with the common practice that a measurement system
 * should resolve at least five distinct categories of the process's variation; Wheeler's "effective resolution"
 * reasons the same way (from memory).</li>
 * </ul>
 *
 * @param step     the step used (0 when none is known)
 * @param detected whether it was found in the readings rather than recorded in the plan
 * @param sigma    the readings' standard deviation s
 */
record GaugeStep(double step, boolean detected, double sigma) {

    /** The largest step, in units of the readings' s, that still lets the shape and capability be judged. */
    static final double MAX_STEP_PER_SIGMA = 1.0;

    /** The step and the discrimination of these readings; {@code recorded} is the plan's resolution or 0. */
    static GaugeStep of(List<double[]> subgroups, double recorded) {
        double sigma = StabilityRule.overallSd(subgroups);
        if (recorded > 0) {
            return new GaugeStep(recorded, false, sigma);
        }
        return new GaugeStep(ReadingGrid.step(Subgroups.flatten(subgroups)), true, sigma);
    }

    /** The shape when it cannot be judged (a too coarse step): no model fits, no capability statement. */
    static Shape unjudged(ShapeFamily family) {
        return new Shape(Double.NaN, Double.NaN, false, family, List.of(), false, family, null, 1);
    }

    boolean known() {
        return step > 0;
    }

    boolean tooCoarse() {
        return known() && step > MAX_STEP_PER_SIGMA * sigma;
    }

    /** The finding in words (decisive when too coarse); null when no step is known. */
    Reason reason() {
        if (!known()) {
            return null;
        }
        String source = detected ? "found in the readings (every reading is a multiple of it)" : "recorded in the plan";
        String h = plain(step);
        double perSigma = sigma / step;
        double distinct = 6 * sigma / step;
        if (tooCoarse()) {
            return new Reason(Step.SHAPE, true, GradeMessage.REASON_GAUGE_TOO_COARSE.format(h, source,
                    fmt(sigma), distinct));
        }
        return new Reason(Step.SHAPE, false, GradeMessage.REASON_GAUGE_STEP.format(h, source, perSigma, fmt(sigma),
                distinct));
    }

    private static String plain(double v) {
        return NoSpread.plain(v);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}

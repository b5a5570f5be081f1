package dev.proofrun.grade;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;

/**
 * The required index as judged: estimate and confidence bounds under the declared model.
 *
 * @param index       the index the plan requires
 * @param required    c₀
 * @param confidence  1 − α
 * @param estimate    the estimate
 * @param lower       the lower confidence bound at 1 − α (what the verdict compares with c₀)
 * @param upper       the upper confidence bound at 1 − α; computed only when the estimate is below c₀
 *                    (for the not-demonstrated reason), NaN otherwise
 * @param model       the distribution model it was computed under
 * @param method      how the index and its bounds were computed
 * @param expectedPpm parts per million expected outside the limits under the fitted model (NaN when unknown)
 * @param seed        the seed of the pivotal draws behind the bounds ({@link IndexMethod#PERCENTILE}), or null
 * @param limitedAt   under a threshold shape planned with a floor: the threshold, among those the readings leave
 *                    possible, at which the lower bound was reached; NaN otherwise
 */
public record IndexEvidence(IndexKind index, double required, double confidence, double estimate, double lower,
        double upper, ShapeFamily model, IndexMethod method, double expectedPpm, Long seed, double limitedAt) {

    /** Evidence without a floor. */
    public IndexEvidence(IndexKind index, double required, double confidence, double estimate, double lower,
            double upper, ShapeFamily model, IndexMethod method, double expectedPpm, Long seed) {
        this(index, required, confidence, estimate, lower, upper, model, method, expectedPpm, seed, Double.NaN);
    }

    /** Normal theory, no pivotal draws. */
    public IndexEvidence(IndexKind index, double required, double confidence, double estimate, double lower,
            double upper, ShapeFamily model) {
        this(index, required, confidence, estimate, lower, upper, model, IndexMethod.NORMAL_THEORY, Double.NaN, null);
    }

    /** The same evidence with estimate and bounds multiplied by {@code factor} and the expected ppm set. */
    IndexEvidence scaled(double factor, double ppm) {
        return new IndexEvidence(index, required, confidence, estimate * factor, lower * factor, upper * factor, model,
                method, ppm, seed, limitedAt);
    }

    /** "Cpk under the normal model by normal theory, exact bounds: estimate 1.473, lower 95 % bound 1.285, required 1.33". */
    public String summary() {
        return GradeMessage.JUDGED.format(index.symbol(), model.token(), method.words(), estimate,
                GradedLook.percent(confidence), lower, required);
    }

    /** Whether the verdict rests on figures other than the normal-theory ones of the raw readings. */
    public boolean otherThanNormalTheory() {
        return method != IndexMethod.NORMAL_THEORY || model != ShapeFamily.NORMAL;
    }
}

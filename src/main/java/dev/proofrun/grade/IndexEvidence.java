package dev.proofrun.grade;

import dev.proofrun.stats.IndexKind;

/**
 * The required index as judged: estimate and confidence bounds under the chosen model.
 *
 * @param index      the index the plan requires
 * @param required   c₀
 * @param confidence 1 − α
 * @param estimate   the estimate
 * @param lower      the lower confidence bound at 1 − α (what the verdict compares with c₀)
 * @param upper      the upper confidence bound at 1 − α; computed only when the estimate is below c₀
 *                   (for the not-demonstrated reason), NaN otherwise
 * @param model      the distribution model it was computed under
 * @param method     how the index and its bounds were computed under that model
 */
public record IndexEvidence(IndexKind index, double required, double confidence, double estimate, double lower,
        double upper, ShapeModel model, IndexMethod method) {

    /** "Cpk by normal theory under the normal model: estimate 1.473, lower 95 % bound 1.285, required 1.33". */
    public String summary() {
        return GradeMessage.JUDGED.format(index.symbol(), method.words(), model.id(), estimate, 100 * confidence,
                lower, required);
    }

    /** Whether the verdict rests on figures other than the normal-theory ones of the raw readings. */
    public boolean otherThanNormalTheory() {
        return method != IndexMethod.NORMAL_THEORY || model != ShapeModel.NORMAL;
    }
}

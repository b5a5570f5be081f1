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
 */
public record IndexEvidence(IndexKind index, double required, double confidence, double estimate, double lower,
        double upper, ShapeModel model) {
}

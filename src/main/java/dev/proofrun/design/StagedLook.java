package dev.proofrun.design;

/**
 * What one look of a staged design means for the people (see {@link StagedDesign}).
 *
 * @param subgroups      subgroups at this look, from the start of the study
 * @param readings       readings at this look
 * @param confidence     the one-sided confidence of the bound at this look
 * @param efficacy       the estimate at which this look's bound equals c₀ at the expected centring: at or above
 *                       it the study is demonstrated here
 * @param futility       the estimate below which the study stops for futility; NaN where this look has none
 * @param stopAtTarget   the chance that the study stops at this look (demonstrated, futile, or voided by a gate)
 *                       when the true index is c₀
 * @param stopAtExpected the same when the process is as expected (c₁)
 */
public record StagedLook(int subgroups, int readings, double confidence, double efficacy, double futility,
        double stopAtTarget, double stopAtExpected) {
}

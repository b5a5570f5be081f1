package dev.proofrun.grade;

import dev.proofrun.text.MessageKey;

/** What the grading tells people: problems in returned files, reasons for verdicts, the caution. */
public enum GradeMessage implements MessageKey {
    // the file as a whole (fatal: a UserException)
    FILE_UNREADABLE("cannot read the file: %s"),
    DECIMAL_COMMA_READ("readings with a decimal comma, read as the decimal mark (never a thousands separator) in this %s: "
            + "%d; the first, '%s', is %s"),
    UNSUPPORTED_FORMAT("unsupported file type '%s': use .csv or .xlsx"),
    NO_HEADER("no header row: expected plan,slot,characteristic,planned,taken,lot,operator,x1..xn,remark or plan,slot,characteristic,taken,value"),
    MISSING_COLUMN("the header has no column '%s'"),
    NO_READING_COLUMNS("the header has neither a 'value' column nor reading columns x1, x2, ..."),
    PLAN_MISMATCH("the file was written for plan %s, but the plan given is %s; the plan wins: grade the file against its own plan"),
    NO_ROWS("the file has no data rows"),
    PLAN_NOT_ISSUED("the plan is a draft; grade against the issued plan"),
    DEMO_EXISTS("%s already exists; choose an empty directory"),
    // rows and cells
    UNKNOWN_SLOT("slot '%s' is not in the plan; the row is not used"),
    UNKNOWN_CHARACTERISTIC("characteristic '%s' is not in the plan; the row is not used"),
    DUPLICATE_ROW("slot %s of %s appears again (first at row %d); this row is not used"),
    MISSING_SLOT("slot %s of %s did not come back"),
    /** A slot's row came back with no reading at all: counted as missing, not as incomplete. */
    BLANK_SLOT("slot %s of %s came back with every box empty: counted as missing"),
    MISSING_READINGS("slot %s of %s has %d of %d readings; the subgroup is not graded"),
    EXTRA_READINGS("slot %s of %s has %d readings, the plan asks for %d; the subgroup is not graded"),
    NOT_NUMERIC("'%s' is not a number; the reading is missing"),
    NOT_FINITE("'%s' is not a finite number; the reading is missing, and the characteristic is not valid until it is corrected"),
    OUT_OF_REACH("%s lies too far beyond the limits to compute with (readings from %s to %s are): probably a typing error; the reading is missing, and the characteristic is not valid until it is corrected"),
    OFF_RESOLUTION("%s is not a multiple of the gauge's resolution %s; kept"),
    IMPLAUSIBLE("%s lies more than one tolerance width beyond the limits (%s to %s): probably a typing error; kept and graded, check it"),
    TAKEN_UNREADABLE("'%s' is not a time (ISO-8601, yyyy-MM-dd HH:mm, or HH:mm on the planned day)"),
    TAKEN_OUTSIDE_WINDOW("taken %s, outside the slot's window %s to %s; kept"),
    OUT_OF_ORDER("slot %s was taken %s, before slot %s (taken %s); kept"),
    MORE_LIKE_THIS("%d more problems like the one at %s (%s) are not listed"),
    // reasons
    REASON_COMPLETE("Complete: %d of %d planned subgroups of %d came back usable (%d readings)."),
    REASON_SHORT_ALLOWED("Usable: %d of %d planned subgroups (the plan allows %d unusable); %d incomplete, %d missing."),
    REASON_SHORT("Not complete: only %d of %d planned subgroups are usable (the plan allows %d unusable); %d incomplete, %d missing."),
    REASON_LATE("%d subgroups were taken outside their slot's window or out of order; they are graded, but the spread over time may differ from the plan."),
    REASON_OUT_OF_REACH("%d readings are not finite or lie too far beyond the limits to compute with, and were set aside; were they real parts, those parts would be far outside the tolerance: not valid until they are checked and corrected."),
    REASON_FLAGGED("%d readings are flagged (off the gauge's resolution or probably mistyped) and were kept."),
    REASON_STABLE_QUIET("Stable: no run rule fired on the %s chart or the %s chart (%d subgroups, in which a stable process gives about %.1f signals by chance)."),
    REASON_STABLE_CHANCE("Stable: %s on the %s chart and %d on the %s chart, within what chance explains for %d subgroups and these rules (a stable process gives about %.1f and %.1f by chance; the chance of as many or more: %s and %s). Signals: %s."),
    REASON_UNSTABLE_SIGNALS("Unstable: %s on the %s chart and %d on the %s chart, more than chance explains for %d subgroups (a stable process gives about %.1f and %.1f by chance; the chance of as many or more: %s and %s). Signals: %s."),
    REASON_UNSTABLE_BETWEEN("Unstable: the subgroup means vary more than the variation within explains: sigma overall/within = %.2f, ANOVA F = %.2f, p %s; Cpk then overstates what the process delivers."),
    REASON_MEANS_OWN_CHART("For an overall index the subgroup means are judged on their own chart (limits from their moving ranges), so means that vary at random but predictably do not make the process unstable (ISO 22514-2 describes such processes); sigma overall/within = %.2f (ANOVA F = %.2f, p %s) is shown, not used."),
    REASON_RATIO("Sigma overall/within = %.2f (ANOVA F = %.2f, p %s)."),
    REASON_RATIO_INDIVIDUALS("Sigma overall/within = %.2f (individuals: no ANOVA)."),
    REASON_CHARTS_ON_NORMAL_SCALE("The charts look at the readings on the normal scale of the planned %s model fitted to them (z = inverse normal of the model's F(x)), so that the run rules keep the chance rate they were built for; the chart limits are in that scale."),
    REASON_NO_SPREAD("No spread in the readings: all %d readings are %s. The gauge shows none of the process's variation, so its spread, stability and capability cannot be estimated; measure with a gauge whose step is small against the variation (common practice: at most a tenth of the tolerance)."),
    REASON_NO_SPREAD_WITHIN("No spread within the subgroups: the %d readings of each subgroup are equal, while the subgroup means differ (%s to %s). The gauge's step is too coarse for the variation between consecutive parts, so the within-subgroup sigma and the capability cannot be estimated; measure with a finer gauge."),
    REASON_GAUGE_STEP("Gauge: step %s, %s; %.1f steps per standard deviation of the readings (s = %s), about %.0f distinct values across the process spread 6s. The shape test spreads each reading over its step."),
    REASON_GAUGE_TOO_COARSE("Gauge: the step is too coarse for this spread: step %s, %s, against a standard deviation of the readings of s = %s, about %.0f distinct values across the process spread 6s (proofrun asks for at least 6: a step no larger than s). Rounding shapes these readings more than the process does, so neither their shape nor their capability can be judged; measure with a finer gauge."),
    REASON_TOO_FEW_FOR_CHARTS("Fewer than 2 usable subgroups: no control chart, no capability."),
    REASON_SHAPE_FITS("Shape: the planned %s model fits (%s; Anderson-Darling A2 = %.3f, %s)."),
    REASON_SHAPE_REJECTED("Shape: the planned shape does not fit these readings: the %s model (%s) is rejected at 1 %% (Anderson-Darling A2 = %.3f, %s). Re-plan the characteristic with the shape it really has (plan new --shape) and grade again; no other model is tried here."),
    REASON_SHAPE_NO_FIT("Shape: the planned shape does not fit these readings: %s. Re-plan the characteristic with the shape it really has (plan new --shape) and grade again; no other model is tried here."),
    REASON_SHAPE_NO_SPREAD("Shape: no spread in the readings (all %d are equal): no %s model can be fitted and no capability statement can be made."),
    REASON_AT_OR_BELOW_ZERO("Shape: a reading at or below zero cannot come from the planned shape (%s): %s in subgroup %s, reading %d."),
    REASON_AT_OR_BELOW_THRESHOLD("Shape: a reading at or below the declared threshold cannot come from the planned shape (%s, threshold %s): %s in subgroup %s, reading %d. Check the reading, or the threshold the plan declares."),
    REASON_TAIL_RULE("Shape: the planned %s model is rejected at 1 %% (A2 = %.3f, %s), but with %d readings the departure is small where the index looks: the readings' own 0.135 %% / 99.865 %% quantiles lie within %.1f %% of the distance from the median to the limit (at most %.0f %% accepted). The index is computed on the wider of the model's and the readings' tails (factor %.3f)."),
    REASON_LOWER_LIMIT_DROPPED("Shape: the lower limit %s lies at or below the %s model's lower bound 0, so no reading can fall below it; it is dropped."),
    REASON_LOWER_LIMIT_AT_THRESHOLD("Shape: the lower limit %s lies at or below the declared threshold %s of the %s model, so no reading can fall below it; it is dropped."),
    REASON_AT_OR_BELOW_FLOOR("Shape: a reading at or below the declared floor cannot come from the planned shape (%s, floor %s): %s in subgroup %s, reading %d. Check the reading, or the floor the plan declares."),
    REASON_FLOOR_NO_THRESHOLD("Shape: the planned shape does not fit these readings: no threshold from the floor %s up to the smallest reading %s leaves ln(reading - threshold) as skewed as the %s model allows (sample skewness at the floor %.3f, below the %.2g %% point %.3f of %d simulated studies of %d readings, seed %d). Re-plan the characteristic with the shape it really has (plan new --shape) and grade again."),
    REASON_FLOOR_TOO_MANY("Shape: the %s model with the floor %s is not graded for %d readings: its set of thresholds is simulated for at most %d readings. Declare the threshold itself where it is known exactly (plan new --threshold), or plan the study with fewer readings."),
    REASON_FLOOR_SET("Shape: the %s model with a floor: the threshold is not known, only that it lies at or above the floor %s. The readings leave thresholds from %s to %s possible (%d tried; one is left out when the skewness of ln(reading - threshold) is below the %.2g %% point %.3f of %d simulated studies, seed %d); the fit is checked at %s, where that skewness is nearest its median."),
    REASON_FLOOR_BOUND("Capability: the lower bound is the least over the thresholds from %s to %s, reached at %s; each threshold's bound at %.4g %% confidence, so that with the %.2g %% spent on the set of thresholds the bound holds at %.4g %% (Berger and Boos 1994). Not knowing the threshold costs power: a study that would pass with the threshold known exactly may not pass here."),
    REASON_FLOOR_CAUTION("Caution: the %s model takes %s as a floor of the process's threshold (a stop or datum the parts cannot go below), as the plan declares it, and lets the readings say where above it the threshold may lie; the bound is taken at the least favourable of those thresholds. The verdict still rests on the planned shape above the threshold and on the floor being a real stop of the part and process, subject to the customer's requirements, the applicable standards and the extra controls safety-critical characteristics need."),
    REASON_THRESHOLD_CAUTION("Caution: the %s model takes the threshold %s as the real stop or datum of the process, as the plan declares it; it is not estimated from the readings. A threshold declared below the real one makes the index look better than it is (the fit check does not reliably catch it), so the verdict stands only on a threshold known from the part and process, subject to the customer's requirements. Where the real start is not known exactly, declare the stop as a floor instead (plan new --floor)."),
    REASON_PERCENTILE_METHOD("Capability: %s by the percentile method of ISO 22514-2 under the fitted %s model (X0.135%% = %.4g, X50%% = %.4g, X99.865%% = %.4g); %.3g ppm expected outside the limits under the model. Bounds by generalized pivotal quantities (%d draws, seed %d)."),
    REASON_PERCENTILE_INVERTED("Capability: %s by the percentile method of ISO 22514-2 under the fitted %s model (X0.135%% = %.4g, X50%% = %.4g, X99.865%% = %.4g); %.3g ppm expected outside the limits under the model. Bounds by inverting the test of the index at each of %d values of mean/sigma (%d simulated studies each, seed %d) and keeping the least favourable: they hold whatever the true mean/sigma, and are wider than a bound that knew it."),
    REASON_OVERALL_ONLY("Capability: for the %s shape only the overall spread of all readings is used (no within-subgroup form is offered); %s is computed like %s, which for a process graded stable estimates the same quantity."),
    REASON_TOO_FEW_FOR_SHAPE("Shape: too few readings (%d) to judge the distribution."),
    REASON_DEMONSTRATED("Capability: %s = %.3f, lower %.0f%% bound %.3f >= %.2f required: demonstrated."),
    REASON_INCONCLUSIVE("Capability: %s = %.3f reaches %.2f, but the lower %.0f%% bound is %.3f: not yet shown."),
    REASON_MORE_SUBGROUPS("About %d more subgroups (%s at the plan's frequency) would settle it if the estimate holds."),
    REASON_NO_AMOUNT_SETTLES("No reasonable number of extra subgroups settles it: the estimate is too close to the requirement."),
    REASON_NOT_DEMONSTRATED("Capability: %s = %.3f is below %.2f required (upper %.0f%% bound %.3f)."),
    REASON_EVEN_UPPER_BELOW("Even the upper bound is below the requirement: the process does not reach it."),
    REASON_UPPER_ABOVE("The upper bound is above the requirement: the process might reach it, this study does not show it."),
    REASON_INDEX_UNDEFINED("Capability: %s is not defined for this specification."),
    REASON_CAPABILITY_NOT_VALID("Capability: %s = %.3f (lower bound %.3f) describes the study's past, not the process."),
    REASON_MORE_IS_A_NEW_LOOK("That figure is for planning only: grading again with more readings is a second look at the same question, and each new look raises the chance that a process at the requirement passes (in simulation about 3.4 %% to 6.1 %% at 95 %% confidence)."),
    REASON_MORE_BEYOND_TENFOLD("If the estimate holds, more than ten times this study's %d subgroups would be needed to settle it: no figure is given; the estimate is too close to the requirement for more of the same data to help."),
    REASON_EXTEND_PROPERLY("The sound way on: plan the rest as an extension of this study whose boundary keeps the overall false-pass risk (for example the conditional-error approach, Proschan & Hunsberger 1995, Biometrics 51:1315-1324), or plan a new study with planned looks (plan new --stages)."),
    REASON_LOOK("Look %d of %d, after slot %s (%d subgroups planned so far): the bound is taken at %s %% confidence, this look's share of the plan's false-pass risk (%s spending)%s."),
    REASON_LOOK_FUTILITY_RULE("; the study stops for futility when the estimate is below %.3f"),
    REASON_LOOK_EARLIER("Readings up to slot %s came back: graded at look %d, the furthest look the file completes, with all its readings so far; look %s before it, replayed on the readings up to it, did not settle this characteristic."),
    REASON_LOOK_SHORT("The file does not reach the end of stage 1 (slot %s): graded as look 1, the slots not yet taken count as missing."),
    REASON_DECIDED_EARLIER("Decided at look %d of %d (after slot %s), the first look that settled this characteristic: the readings after it do not change that decision (the file reaches look %d)."),
    REASON_LOOK_BEYOND("%d later slots came back too (up to %s): they belong to a stage not yet ended and are graded at its look, not at this one."),
    REASON_LOOK_DEMONSTRATED("Capability at look %d of %d: %s = %.3f, lower %s%% bound %.3f >= %.2f required: demonstrated%s."),
    REASON_LOOK_STOPS_EARLY("; the later stages are not collected"),
    REASON_LOOK_FUTILITY("Capability at look %d of %d: %s = %.3f is below the futility boundary %.3f (lower %s%% bound %.3f): the study stops here, not demonstrated."),
    REASON_LOOK_CONTINUE("Capability at look %d of %d: %s = %.3f, lower %s%% bound %.3f is below %.2f required%s: continue: collect stage %d, slots %s to %s, then send the whole file back."),
    REASON_LOOK_ABOVE_FUTILITY(" and the estimate is above the futility boundary %.3f"),
    REASON_LAST_LOOK_SHORT("Capability at the last look (%d of %d): %s = %.3f, lower %s%% bound %.3f is below %.2f required: not demonstrated. The planned stages are spent: grading more data against this plan would be a new look that raises the false-pass risk."),
    REASON_LOOK_NOT_VALID("At look %d of %d the evidence cannot carry a decision: what stands in the way applies at every look; correct it before stage %s is collected, or re-plan."),
    LOOK_LINE("Graded at look %d of %d (after slot %s, %d subgroups planned so far)%s."),
    LOOK_NEXT(": continue, collect stage %d, slots %s to %s, then send the whole file back"),
    JUDGED("%s under the %s model by %s: estimate %.3f, lower %s%% bound %.3f, required %.2f"),
    CAUTION("Caution: a statistical statement under assumptions (stability, independence, the fitted distribution, a capable gauge). It does not replace the customer's requirements, applicable standards or local codes, licensed practice, or the extra controls that safety-critical characteristics need.");

    private final String english;

    GradeMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}

package dev.proofrun.app.sizing;

import dev.proofrun.design.DesignRow;
import java.util.Locale;

/**
 * One candidate design as the table shows it: each figure as text, and the subgroup size that names the row.
 *
 * @param subgroupSize n, which identifies the row
 * @param recommended  whether it is the designer's recommendation
 */
public record SizingRow(int subgroupSize, boolean recommended, String n, String k, String readings, String power,
        String bound, String critical, String df, String limitedBy, String unstableWhenStable, String unstableAfterShift,
        String ruleWhenStable, String ruleAfterShift) {

    /** The core's row in the table's words. */
    static SizingRow of(DesignRow r, boolean recommended) {
        return new SizingRow(r.subgroupSize(), recommended, Integer.toString(r.subgroupSize()),
                Integer.toString(r.subgroups()), Integer.toString(r.readings()), SizingViewModel.fmt(r.power()),
                SizingViewModel.fmt(r.boundPower()), SizingViewModel.fmt(r.criticalEstimate()),
                String.format(Locale.ROOT, "%.1f", r.degreesOfFreedom()), r.limitedBy().token(),
                SizingViewModel.fmt(r.falseAlarm()), SizingViewModel.fmt(r.detection()),
                SizingViewModel.fmtOrDash(r.anySignalFalseAlarm().allRules()),
                SizingViewModel.fmtOrDash(r.anySignalDetection().allRules()));
    }
}

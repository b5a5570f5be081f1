package dev.proofrun.grade;

/**
 * How much of the planned data came back usable for one characteristic.
 *
 * @param plannedSubgroups   k in the plan
 * @param subgroupSize       n in the plan
 * @param completeSubgroups  subgroups with exactly n usable readings (only these are graded)
 * @param incompleteSubgroups subgroups that came back with missing, extra or unusable readings
 * @param missingSubgroups   planned slots with no row at all
 * @param readings           usable readings in the complete subgroups
 * @param flaggedReadings    readings kept but flagged (off resolution, probable typing error)
 * @param lateSubgroups      subgroups taken outside their slot's window or out of order
 * @param allowedShortfall   how many of the k subgroups may be unusable before the study is not valid
 */
public record Completeness(int plannedSubgroups, int subgroupSize, int completeSubgroups, int incompleteSubgroups,
        int missingSubgroups, long readings, int flaggedReadings, int lateSubgroups, int allowedShortfall) {

    /** Planned subgroups that are not usable. */
    public int shortfall() {
        return plannedSubgroups - completeSubgroups;
    }

    /** True when the shortfall is within what the plan allows and at least two subgroups are usable. */
    public boolean adequate() {
        return shortfall() <= allowedShortfall && completeSubgroups >= 2;
    }
}

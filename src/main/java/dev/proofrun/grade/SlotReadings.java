package dev.proofrun.grade;

import dev.proofrun.text.Location;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * What {@link ReturnedData} has collected of one characteristic, slot by slot, in primitive arrays (no row
 * objects, so a million readings fit in a small heap): the readings of slot s at {@code values[s·n ..]}, how many
 * came, the row they came on (0: none), when the subgroup was taken ({@code Long.MIN_VALUE}: not given, else epoch
 * seconds), whether a reading was unusable (spoiled) or the subgroup late, and the counts of flagged readings and of
 * readings beyond the reach. {@link #finish} turns it into the subgroups that are graded.
 */
final class SlotReadings {
    final double[] values;
    final int[] count;
    final long[] row;
    final long[] taken;
    final boolean[] spoiled;
    final boolean[] late;
    int flagged;
    int outOfReach;
    private final int n;

    SlotReadings(int k, int n) {
        this.n = n;
        values = new double[k * n];
        count = new int[k];
        row = new long[k];
        taken = new long[k];
        Arrays.fill(taken, Long.MIN_VALUE);
        spoiled = new boolean[k];
        late = new boolean[k];
    }

    /**
     * Which of the first {@code slotsSoFar} planned slots are graded (exactly n usable readings), and the problems
     * of the missing, blank, short, overfull, late and out-of-order ones, recorded in {@code log}.
     *
     * @param id          the characteristic's id, for the problems
     * @param display     the file as messages name it
     * @param takenColumn the header of the taken column, or null when the file has none
     */
    ReturnedData.Collection finish(GradingPlan plan, int slotsSoFar, int allowedShortfall, String id, String display,
            String takenColumn, ProblemLog log) {
        List<double[]> subgroups = new ArrayList<>();
        List<String> slots = new ArrayList<>();
        int missing = 0;
        int incomplete = 0;
        int lateCount = 0;
        int previous = -1;
        for (int s = 0; s < slotsSoFar; s++) {
            String slotId = plan.slots().get(s).id();
            if (row[s] == 0) {
                missing++;
                log.add(Location.file(display), Severity.ERROR, id, GradeMessage.MISSING_SLOT, slotId, id);
                continue;
            }
            if (count[s] == 0 && !spoiled[s]) {
                // the prefilled row came back with every box empty: the slot was not taken, not taken short
                missing++;
                log.add(Location.cell(display, row[s], null), Severity.ERROR, id, GradeMessage.BLANK_SLOT, slotId, id);
                continue;
            }
            boolean isLate = late[s];
            if (taken[s] != Long.MIN_VALUE) {
                if (previous >= 0 && taken[s] < taken[previous]) {
                    isLate = true;
                    log.add(Location.cell(display, row[s], takenColumn), Severity.WARNING, id, GradeMessage.OUT_OF_ORDER,
                            slotId, at(plan, taken[s]), plan.slots().get(previous).id(), at(plan, taken[previous]));
                }
                previous = s;
            }
            if (isLate) {
                lateCount++;
            }
            int c = count[s];
            if (c < n || spoiled[s]) {
                incomplete++;
                log.add(Location.cell(display, row[s], null), Severity.ERROR, id, GradeMessage.MISSING_READINGS,
                        slotId, id, c, n);
            } else if (c > n) {
                incomplete++;
                log.add(Location.cell(display, row[s], null), Severity.ERROR, id, GradeMessage.EXTRA_READINGS, slotId, id, c, n);
            } else {
                subgroups.add(Arrays.copyOfRange(values, s * n, s * n + n));
                slots.add(slotId);
            }
        }
        Completeness completeness = new Completeness(slotsSoFar, n, subgroups.size(), incomplete, missing,
                (long) subgroups.size() * n, flagged, lateCount, allowedShortfall);
        return new ReturnedData.Collection(completeness, subgroups, slots, outOfReach);
    }

    private static OffsetDateTime at(GradingPlan plan, long epochSecond) {
        return Instant.ofEpochSecond(epochSecond).atZone(plan.zone()).toOffsetDateTime();
    }
}

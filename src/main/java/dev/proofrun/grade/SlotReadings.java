package dev.proofrun.grade;

import java.util.Arrays;

/**
 * What {@link ReturnedData} has collected of one characteristic, slot by slot, in primitive arrays (no row
 * objects, so a million readings fit in a small heap): the readings of slot s at {@code values[s·n ..]}, how many
 * came, the row they came on (0: none), when the subgroup was taken ({@code Long.MIN_VALUE}: not given, else epoch
 * seconds), whether a reading was unusable (spoiled) or the subgroup late, and the counts of flagged readings and of
 * readings beyond the reach.
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

    SlotReadings(int k, int n) {
        values = new double[k * n];
        count = new int[k];
        row = new long[k];
        taken = new long[k];
        Arrays.fill(taken, Long.MIN_VALUE);
        spoiled = new boolean[k];
        late = new boolean[k];
    }
}

package dev.proofrun.design;

import java.util.Locale;

/**
 * Floors from practice that a study must meet beside the statistics: at least {@code minSubgroups}
 * subgroups and {@code minReadings} readings before control limits mean much. The defaults, 25 subgroups
 * and 100 readings, are common practice (Montgomery suggests 20–25 subgroups for preliminary control
 * limits — from memory).
 *
 * @param minSubgroups at least 2
 * @param minReadings  at least 2
 */
public record PracticeFloors(int minSubgroups, int minReadings) {

    /** Default floor on subgroups (common practice). */
    public static final int DEFAULT_MIN_SUBGROUPS = 25;
    /** Default floor on readings (common practice). */
    public static final int DEFAULT_MIN_READINGS = 100;

    /** @throws IllegalArgumentException if a floor is below 2 or above {@link StudyDesigner#MAX_READINGS} */
    public PracticeFloors {
        if (minSubgroups < 2 || minSubgroups > StudyDesigner.MAX_READINGS) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "minimum subgroups must be between 2 and %d: %d", StudyDesigner.MAX_READINGS, minSubgroups));
        }
        if (minReadings < 2 || minReadings > StudyDesigner.MAX_READINGS) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "minimum readings must be between 2 and %d: %d", StudyDesigner.MAX_READINGS, minReadings));
        }
    }

    /** 25 subgroups and 100 readings. */
    public static PracticeFloors defaults() {
        return new PracticeFloors(DEFAULT_MIN_SUBGROUPS, DEFAULT_MIN_READINGS);
    }

    /** No floors beyond the bare minimum of two subgroups and two readings. */
    public static PracticeFloors none() {
        return new PracticeFloors(2, 2);
    }

    /** The smallest k that meets both floors for subgroups of size n. */
    public int subgroupsFor(int subgroupSize) {
        int byReadings = (minReadings + subgroupSize - 1) / subgroupSize;
        return Math.max(minSubgroups, byReadings);
    }
}

package dev.proofrun.grade;

import java.time.ZonedDateTime;
import java.util.Objects;

/**
 * A slot of the plan: when the subgroup should be taken.
 *
 * @param id            e.g. "S07"
 * @param start         the planned time
 * @param windowMinutes the subgroup counts as on time this many minutes either side of {@code start}
 */
public record PlannedSlot(String id, ZonedDateTime start, int windowMinutes) {

    public PlannedSlot {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(start, "start");
    }

    /** The beginning of the window. */
    public ZonedDateTime begin() {
        return start.minusMinutes(windowMinutes);
    }

    /** The end of the window. */
    public ZonedDateTime end() {
        return start.plusMinutes(windowMinutes);
    }
}

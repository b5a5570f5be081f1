package dev.proofrun.schedule;

import java.time.OffsetDateTime;
import java.util.List;
import java.util.Locale;

/**
 * The k dated slots of a study and the facts behind them.
 *
 * @param slots          the slots in time order, ids S01…
 * @param subgroupSize   n, the consecutive parts taken at each slot
 * @param workingMinutes W, the running time of the span (breaks and time between shifts excluded)
 * @param spacingMinutes Δ = W/k, the spacing in running time
 * @param end            when the span ends
 * @param shifts         how many shifts the span covers (a started shift counts)
 * @param days           on how many distinct working dates those shifts start
 */
public record Schedule(List<Slot> slots, int subgroupSize, double workingMinutes, double spacingMinutes,
        OffsetDateTime end, int shifts, int days) {

    /**
     * @throws IllegalArgumentException if there are fewer than two slots or a count is not positive
     */
    public Schedule {
        if (slots == null || slots.size() < 2) {
            throw new IllegalArgumentException("a schedule has at least two slots");
        }
        slots = List.copyOf(slots);
        if (subgroupSize < 1 || shifts < 1 || days < 1 || end == null
                || !(workingMinutes > 0) || !(spacingMinutes > 0)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "schedule facts must be positive: n=%d, shifts=%d, days=%d, W=%s, spacing=%s",
                    subgroupSize, shifts, days, workingMinutes, spacingMinutes));
        }
    }

    /** The one-sentence frequency summary, e.g. "one subgroup of 5 consecutive parts about every 45 minutes over 3 shifts on 2 days". */
    public String summary() {
        return FrequencySummary.of(this);
    }
}

package dev.proofrun.schedule;

import java.time.OffsetDateTime;
import java.util.Locale;

/**
 * One planned sampling: take n consecutive parts starting at {@code start}, within ± {@code windowMinutes}.
 *
 * @param id              short id a person can write by hand: "S" and the 1-based number, zero-padded to
 *                        the width of k (at least two digits): S01…S25, S001…S125
 * @param start           planned start, whole minutes, with the zone's offset at that instant
 * @param windowMinutes   the tolerance either side of the start, minutes
 * @param shift           the name of the shift the slot falls in
 * @param partsSinceStart approximately how many parts the process has made since the study started
 *                        (running time × rate, rounded)
 */
public record Slot(String id, OffsetDateTime start, int windowMinutes, String shift, long partsSinceStart) {

    /**
     * @throws IllegalArgumentException if a field is missing or negative
     */
    public Slot {
        if (!isId(id)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "slot id must look like S07: '%s'", id));
        }
        if (start == null || shift == null || shift.isBlank()) {
            throw new IllegalArgumentException("slot start and shift are required");
        }
        if (windowMinutes < 0 || partsSinceStart < 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "slot window and parts must not be negative: %d, %d", windowMinutes, partsSinceStart));
        }
    }

    /** {@code S\d{2,}} (ASCII digits), checked by hand: a regex per slot cost a compiled pattern each on large plans. */
    private static boolean isId(String id) {
        if (id == null || id.length() < 3 || id.charAt(0) != 'S') {
            return false;
        }
        for (int i = 1; i < id.length(); i++) {
            char c = id.charAt(i);
            if (c < '0' || c > '9') {
                return false;
            }
        }
        return true;
    }

    /** The id of slot number {@code number} (1-based) out of {@code count}. */
    public static String idFor(int number, int count) {
        int width = Math.max(2, Integer.toString(count).length());
        return "S" + String.format(Locale.ROOT, "%0" + width + "d", number);
    }
}

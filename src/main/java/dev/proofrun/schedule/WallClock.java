package dev.proofrun.schedule;

import java.time.Instant;
import java.time.LocalDateTime;
import java.time.ZoneId;
import java.time.ZonedDateTime;
import java.time.zone.ZoneOffsetTransition;
import java.time.zone.ZoneRules;

/**
 * How a wall-clock time of the calendar becomes an instant, including on daylight-saving days.
 *
 * <ul>
 * <li>A wall time that occurs twice (clocks go back, e.g. 02:30 on the last Sunday of October in
 * Europe/Berlin) means its <em>first</em> occurrence, with the earlier (summer) offset.</li>
 * <li>A wall time that does not exist (clocks go forward, e.g. 02:30 on the last Sunday of March in
 * Europe/Berlin) means the instant at which the clocks jump (03:00 new time). A window lying wholly
 * inside the gap is therefore empty on that day, and a shift that starts inside it starts at the jump.</li>
 * </ul>
 * Every other wall time has exactly one instant. Running time is measured between instants, so a night
 * shift 22:00–06:00 runs 7 hours on the spring night and 9 hours on the autumn night.
 */
final class WallClock {

    private WallClock() {
    }

    static Instant instantOf(LocalDateTime wall, ZoneId zone) {
        ZoneRules rules = zone.getRules();
        if (rules.getValidOffsets(wall).isEmpty()) {
            ZoneOffsetTransition gap = rules.getTransition(wall);
            return gap.getInstant();
        }
        return ZonedDateTime.ofLocal(wall, zone, null).withEarlierOffsetAtOverlap().toInstant();
    }
}

package dev.proofrun.schedule;

import java.util.Locale;

/**
 * The frequency of a schedule in one plain sentence, for the printed plan and the wizard:
 * "one subgroup of 5 consecutive parts about every 45 minutes over 3 shifts on 2 days".
 *
 * <p>The spacing is Δ in running time, rounded for reading: under 10 minutes to the minute, under 90
 * minutes to 5 minutes, above that to half an hour. The exact slot times are in the slot list.
 */
public final class FrequencySummary {

    private FrequencySummary() {
    }

    public static String of(Schedule schedule) {
        String every = every(schedule.spacingMinutes());
        String shifts = schedule.shifts() == 1 ? ScheduleMessage.COUNT_SHIFT.format()
                : ScheduleMessage.COUNT_SHIFTS.format(schedule.shifts());
        String days = schedule.days() == 1 ? ScheduleMessage.COUNT_DAY.format()
                : ScheduleMessage.COUNT_DAYS.format(schedule.days());
        if (schedule.subgroupSize() == 1) {
            return ScheduleMessage.SUMMARY_SINGLE_PARTS.format(every, shifts, days);
        }
        return ScheduleMessage.SUMMARY_SUBGROUPS.format(schedule.subgroupSize(), every, shifts, days);
    }

    /** "45 minutes", "hour", "2.5 hours". */
    static String every(double minutes) {
        if (minutes < 10) {
            return ScheduleMessage.EVERY_MINUTES.format(Math.max(1, Math.round(minutes)));
        }
        if (minutes < 90) {
            long five = Math.round(minutes / 5) * 5;
            return five == 60 ? ScheduleMessage.EVERY_HOUR.format() : ScheduleMessage.EVERY_MINUTES.format(five);
        }
        double halfHours = Math.round(minutes / 30) / 2.0;
        String hours = halfHours == Math.rint(halfHours)
                ? String.format(Locale.ROOT, "%d", (long) halfHours)
                : String.format(Locale.ROOT, "%.1f", halfHours);
        return ScheduleMessage.EVERY_HOURS.format(hours);
    }
}

package dev.proofrun.schedule;

import java.time.ZoneId;

/**
 * What a new plan's calendar takes when nothing else is said, the same on the command line
 * ({@code plan new}) and in the wizard (a new draft): the plant is in this computer's time zone, and the
 * subgroups are spaced evenly over the running time ({@link Spacing#EVEN}: the schedule a reader can check
 * by hand; random spacing is one choice away where a periodic cause could line up with it), over
 * {@value #SPAN_DAYS} working days (common practice: a study spans several days and shifts, so that the causes that
 * change from one to the next have a chance to show within it).
 */
public final class CalendarDefaults {

    /** The spacing's token, a constant so that an option's default in an annotation can name it. */
    public static final String SPACING_TOKEN = "even";
    /** The working days a study spans when no span is given. */
    public static final int SPAN_DAYS = 5;

    private CalendarDefaults() {
    }

    /** {@link Spacing#EVEN}. */
    public static Spacing spacing() {
        return Spacing.fromToken(SPACING_TOKEN);
    }

    /** This computer's time zone ({@link ZoneId#systemDefault()}), read when asked. */
    public static ZoneId zone() {
        return ZoneId.systemDefault();
    }
}

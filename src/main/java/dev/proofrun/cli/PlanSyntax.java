package dev.proofrun.cli;

import java.util.Locale;


/**
 * Numbers as the command line prints them in its notes. The calendar options ({@code --days}, {@code --shifts},
 * {@code --breaks}, {@code --non-working}) are read by {@link dev.proofrun.schedule.CalendarSyntax}, the grammar the
 * wizard reads too.
 */
final class PlanSyntax {

    private PlanSyntax() {
    }

    static String number(double x) {
        return x == Math.rint(x) ? String.format(Locale.ROOT, "%d", (long) x) : String.format(Locale.ROOT, "%s", x);
    }
}

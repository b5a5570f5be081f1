package dev.proofrun.sheet;

import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.Gauge;
import java.math.BigDecimal;
import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.util.Locale;
import java.util.OptionalDouble;

/** How the sheet and the fill-in files write numbers and times. */
final class SheetNumbers {

    /** ISO-8601 local date-time with the offset, minutes precision, never "Z": 2027-03-01T06:40+01:00. */
    static final DateTimeFormatter PLANNED = DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mmxxx", Locale.ROOT);
    /** The day as people read it on the sheet: "Mon 2027-03-01". */
    static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("EEE uuuu-MM-dd", Locale.ENGLISH);
    /** Clock time: "06:40". */
    static final DateTimeFormatter CLOCK = DateTimeFormatter.ofPattern("HH:mm", Locale.ROOT);

    private SheetNumbers() {
    }

    /** The planned time as the fill-in files carry it. */
    static String planned(OffsetDateTime t) {
        return PLANNED.format(t);
    }

    /** Decimals a reading of this characteristic has: those of the gauge's resolution, or -1 if unknown. */
    static int decimals(Characteristic c) {
        return c.gauge().map(g -> Math.max(0, BigDecimal.valueOf(g.resolution()).stripTrailingZeros().scale()))
                .orElse(-1);
    }

    /**
     * A value of a characteristic: with the resolution's decimals (more if the value itself has more),
     * or as short as exact when there is no gauge.
     */
    static String number(double value, int decimals) {
        String plain = BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
        if (decimals < 0) {
            return plain;
        }
        int own = Math.max(0, BigDecimal.valueOf(value).stripTrailingZeros().scale());
        return BigDecimal.valueOf(value).setScale(Math.max(own, decimals), java.math.RoundingMode.UNNECESSARY)
                .toPlainString();
    }

    /** An optional value, or an em dash when absent. */
    static String number(OptionalDouble value, int decimals) {
        return value.isPresent() ? number(value.getAsDouble(), decimals) : "\u2014";
    }

    /** The resolution as written ("0.001"), or an em dash. */
    static String resolution(Characteristic c) {
        return c.gauge().map(Gauge::resolution).map(r -> BigDecimal.valueOf(r).stripTrailingZeros().toPlainString())
                .orElse("\u2014");
    }

    /** The tolerance in words: "11.950 to 12.050", "at most 0.80", "at least 25". */
    static String tolerance(Characteristic c) {
        int d = decimals(c);
        var lo = c.limits().lower();
        var hi = c.limits().upper();
        if (lo.isPresent() && hi.isPresent()) {
            return number(lo.getAsDouble(), d) + " to " + number(hi.getAsDouble(), d);
        }
        return hi.isPresent() ? "at most " + number(hi.getAsDouble(), d) : "at least " + number(lo.getAsDouble(), d);
    }

    /** The requirement: "Cpk ≥ 1.33 at 95 % confidence". */
    static String requirement(Characteristic c) {
        var r = c.requirement();
        return String.format(Locale.ROOT, "%s \u2265 %s at %s %% confidence", r.index().symbol(),
                BigDecimal.valueOf(r.minimum()).stripTrailingZeros().toPlainString(),
                BigDecimal.valueOf(r.confidence() * 100).stripTrailingZeros().toPlainString());
    }

    /** The tolerance in short: "11.950–12.050", "≤ 0.80", "≥ 25". */
    static String range(Characteristic c) {
        int d = decimals(c);
        var lo = c.limits().lower();
        var hi = c.limits().upper();
        if (lo.isPresent() && hi.isPresent()) {
            return number(lo.getAsDouble(), d) + "\u2013" + number(hi.getAsDouble(), d);
        }
        return hi.isPresent() ? "\u2264 " + number(hi.getAsDouble(), d) : "\u2265 " + number(lo.getAsDouble(), d);
    }
}

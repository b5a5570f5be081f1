package dev.proofrun.report;

import dev.proofrun.text.ProductVersion;
import java.time.Clock;
import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.util.Locale;
import java.util.Objects;

/**
 * When and by what the report was made: the date and time of grading with its offset from UTC, and the
 * tool's version. Both belong on evidence a customer files: they say which grade this is and which rules
 * made it.
 *
 * @param gradedAt when the grade was made, with the offset of the grading machine's zone
 * @param version  the tool's version ({@link ProductVersion})
 */
public record ReportStamp(OffsetDateTime gradedAt, String version) {

    /** "2027-04-02 14:07 +02:00": minutes, the offset written out, never a zone name that hides it. */
    static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("uuuu-MM-dd HH:mm xxx", Locale.ROOT);

    public ReportStamp {
        Objects.requireNonNull(gradedAt, "gradedAt");
        Objects.requireNonNull(version, "version");
    }

    /** Now on the given clock, with this build's version. */
    public static ReportStamp now(Clock clock) {
        return new ReportStamp(OffsetDateTime.now(clock), ProductVersion.get());
    }

    /** "Graded 2027-04-02 14:07 +02:00, proofrun 0.1.0". */
    String line() {
        return "Graded " + WHEN.format(gradedAt) + ", proofrun " + version;
    }
}

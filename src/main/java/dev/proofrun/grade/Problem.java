package dev.proofrun.grade;

import dev.proofrun.text.Location;
import java.util.Objects;

/**
 * One thing wrong with a returned file, where it is and how much it matters.
 *
 * @param location       file, row (1-based as a spreadsheet shows it) and column header
 * @param severity       how much it matters
 * @param key            the kind of problem
 * @param message        the text people read (without the location)
 * @param characteristic the characteristic id it concerns, or {@code null} for the whole file
 */
public record Problem(Location location, Severity severity, GradeMessage key, String message, String characteristic) {

    public Problem {
        Objects.requireNonNull(location, "location");
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(message, "message");
    }

    /** A problem with its message formatted from the key. */
    public static Problem of(Location location, Severity severity, String characteristic, GradeMessage key, Object... args) {
        return new Problem(location, severity, key, key.format(args), characteristic);
    }

    /** "data.csv, row 12, column x3: error: ..." */
    @Override
    public String toString() {
        return location + ": " + severity.token() + ": " + message;
    }
}

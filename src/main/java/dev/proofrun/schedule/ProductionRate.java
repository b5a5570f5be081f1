package dev.proofrun.schedule;

import java.util.Locale;

/**
 * How fast the process makes parts while it runs, given either as parts per hour or as a cycle time in
 * seconds per part (kept as given, so a plan file shows what the engineer typed).
 * parts per hour = 3600 / cycle seconds.
 *
 * @param value the number as given, positive and finite
 * @param unit  what the number means
 */
public record ProductionRate(double value, Unit unit) {

    /** The unit a rate was given in. */
    public enum Unit {
        /** Parts made per hour of running time. */
        PARTS_PER_HOUR,
        /** Seconds per part (cycle time). */
        SECONDS_PER_PART
    }

    /**
     * @throws IllegalArgumentException if the value is not positive and finite
     */
    public ProductionRate {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "production rate must be positive: %s", value));
        }
        if (unit == null) {
            throw new IllegalArgumentException("rate unit is required");
        }
    }

    public static ProductionRate perHour(double partsPerHour) {
        return new ProductionRate(partsPerHour, Unit.PARTS_PER_HOUR);
    }

    public static ProductionRate cycleSeconds(double secondsPerPart) {
        return new ProductionRate(secondsPerPart, Unit.SECONDS_PER_PART);
    }

    public double partsPerHour() {
        return unit == Unit.PARTS_PER_HOUR ? value : 3600.0 / value;
    }

    /** Minutes of running time that {@code parts} parts take. */
    public double minutesFor(long parts) {
        return parts * 60.0 / partsPerHour();
    }
}

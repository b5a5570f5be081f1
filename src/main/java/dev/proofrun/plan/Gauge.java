package dev.proofrun.plan;

import java.util.Locale;
import java.util.OptionalDouble;

/**
 * The measuring instrument for one characteristic.
 *
 * @param name       what it is ("bore gauge 12 mm", "torque analyser")
 * @param resolution the smallest step it reads, in the characteristic's unit, positive; the rule of ten
 *                   (common practice) wants it no coarser than a tenth of the tolerance
 * @param sd         the gauge's repeatability as a standard deviation in the same unit, if known; it adds
 *                   variance: σ²_observed = σ²_process + σ²_gauge
 */
public record Gauge(String name, double resolution, OptionalDouble sd) {

    /**
     * @throws IllegalArgumentException if the name is blank, the resolution not positive, or sd negative
     */
    public Gauge {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("gauge name is required");
        }
        if (!(resolution > 0) || !Double.isFinite(resolution)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "gauge resolution must be positive: %s", resolution));
        }
        sd = sd == null ? OptionalDouble.empty() : sd;
        if (sd.isPresent() && !(sd.getAsDouble() >= 0 && Double.isFinite(sd.getAsDouble()))) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "gauge sd must not be negative: %s", sd.getAsDouble()));
        }
    }

    public static Gauge of(String name, double resolution) {
        return new Gauge(name, resolution, OptionalDouble.empty());
    }
}

package dev.proofrun.design;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.UserException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * The process as the engineer describes it in units of the characteristic — specification limits, the
 * expected mean and standard deviation — and optional gauge facts, turned into an {@link Expectation}.
 *
 * <p>Gauge standard deviation σ_g: measurement error adds variance, σ²_observed = σ²_process + σ²_gauge,
 * and the study sees (and must demonstrate) the observed index, so the expectation is computed with
 * σ_observed and a note says so. Gauge resolution: common practice ("rule of ten") asks for a resolution
 * no coarser than a tenth of the tolerance USL − LSL; a coarser one gives a warning (two-sided only).
 *
 * @param limits     the specification
 * @param mean       the expected process mean μ
 * @param sd         the expected process standard deviation σ (&gt; 0)
 * @param gaugeSd    the gauge's standard deviation, or empty
 * @param resolution the gauge's resolution (smallest step it shows), or empty
 */
public record ProcessFacts(SpecLimits limits, double mean, double sd, OptionalDouble gaugeSd,
        OptionalDouble resolution) {

    /** @throws UserException if σ ≤ 0, or a gauge value is negative */
    public ProcessFacts {
        if (!(sd > 0) || !Double.isFinite(sd)) {
            throw new UserException(DesignMessage.SPREAD_NOT_POSITIVE, fmt(sd));
        }
        if (!Double.isFinite(mean)) {
            throw new UserException(DesignMessage.BAD_EXPECTATION, "expected mean is not a number");
        }
        if (gaugeSd.isPresent() && !(gaugeSd.getAsDouble() >= 0)) {
            throw new UserException(DesignMessage.BAD_EXPECTATION, "gauge standard deviation must not be negative");
        }
        if (resolution.isPresent() && !(resolution.getAsDouble() > 0)) {
            throw new UserException(DesignMessage.BAD_EXPECTATION, "gauge resolution must be positive");
        }
    }

    public static ProcessFacts of(SpecLimits limits, double mean, double sd) {
        return new ProcessFacts(limits, mean, sd, OptionalDouble.empty(), OptionalDouble.empty());
    }

    public ProcessFacts withGauge(OptionalDouble gaugeStandardDeviation, OptionalDouble gaugeResolution) {
        return new ProcessFacts(limits, mean, sd, gaugeStandardDeviation, gaugeResolution);
    }

    /** σ_observed = sqrt(σ² + σ_g²). */
    public double observedSd() {
        double g = gaugeSd.orElse(0);
        return Math.sqrt(sd * sd + g * g);
    }

    /** The expectation for the required index, with the observed sigma; notes collects the warnings. */
    public Expectation expectationFor(IndexKind kind, List<String> notes) {
        Expectation process = expectationWith(kind, sd);
        Expectation observed = expectationWith(kind, observedSd());
        if (resolution.isPresent() && limits.isTwoSided() && resolution.getAsDouble() > limits.width().getAsDouble() / 10) {
            notes.add(DesignMessage.GAUGE_RESOLUTION.format(fmt(resolution.getAsDouble()),
                    fmt(limits.width().getAsDouble())));
        }
        if (gaugeSd.isPresent() && gaugeSd.getAsDouble() > 0) {
            notes.add(DesignMessage.GAUGE_SPREAD.format(fmt(gaugeSd.getAsDouble()), fmt(observedSd()), fmt(sd),
                    kind.symbol(), process.index(), observed.index()));
        }
        return observed;
    }

    /** As {@link #expectationFor(IndexKind, List)}, returning the notes in a new list. */
    public List<String> notesFor(IndexKind kind) {
        List<String> notes = new ArrayList<>();
        expectationFor(kind, notes);
        return notes;
    }

    private Expectation expectationWith(IndexKind kind, double sigma) {
        double upper = limits.upper().isPresent() ? (limits.upper().getAsDouble() - mean) / (3 * sigma) : Double.NaN;
        double lower = limits.lower().isPresent() ? (mean - limits.lower().getAsDouble()) / (3 * sigma) : Double.NaN;
        double cp = limits.isTwoSided() ? limits.width().getAsDouble() / (6 * sigma) : Double.NaN;
        double index;
        switch (kind.side()) {
            case BOTH:
                index = cp;
                break;
            case UPPER:
                index = upper;
                break;
            case LOWER:
                index = lower;
                break;
            default:
                index = limits.isTwoSided() ? Math.min(upper, lower) : (Double.isNaN(upper) ? lower : upper);
        }
        if (!(index > 0)) {
            throw new UserException(DesignMessage.MEAN_OUTSIDE_LIMITS, fmt(mean));
        }
        if (kind.side() == IndexKind.Side.NEAREST && limits.isTwoSided()) {
            return Expectation.offCentre(index, cp);
        }
        return Expectation.centred(index);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}

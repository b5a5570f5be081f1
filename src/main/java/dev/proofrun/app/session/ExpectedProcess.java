package dev.proofrun.app.session;

import dev.proofrun.design.Expectation;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.util.Optional;

/**
 * Turns an expected process mean μ and sigma σ into the {@link Expectation} the designer needs, by the
 * definitions of the indices (ISO 22514-2 symbols): Cp = (USL−LSL)/(6σ), Cpu = (USL−μ)/(3σ),
 * Cpl = (μ−LSL)/(3σ), Cpk = min(Cpu, Cpl); the P-indices alike with the overall sigma. For a two-sided
 * Cpk/Ppk the centring is carried as the potential (Cp). Here the sigma is the one the user expects, so
 * there is no estimation and nothing the core computes from readings is repeated.
 */
public final class ExpectedProcess {

    private ExpectedProcess() {
    }

    /** Empty when the index does not exist for the limits or is not above zero (the mean outside the limits). */
    public static Optional<Expectation> expectation(IndexKind kind, SpecLimits limits, double mean, double sigma) {
        if (!(sigma > 0) || !Double.isFinite(mean)) {
            return Optional.empty();
        }
        double upper = limits.upper().isPresent() ? (limits.upper().getAsDouble() - mean) / (3 * sigma) : Double.NaN;
        double lower = limits.lower().isPresent() ? (mean - limits.lower().getAsDouble()) / (3 * sigma) : Double.NaN;
        double potential = limits.width().isPresent() ? limits.width().getAsDouble() / (6 * sigma) : Double.NaN;
        double value;
        switch (kind.side()) {
            case BOTH:
                value = potential;
                break;
            case UPPER:
                value = upper;
                break;
            case LOWER:
                value = lower;
                break;
            default:
                value = limits.isTwoSided() ? Math.min(upper, lower) : limits.upper().isPresent() ? upper : lower;
                break;
        }
        if (!(value > 0) || !Double.isFinite(value)) {
            return Optional.empty();
        }
        if (kind.side() == IndexKind.Side.NEAREST && limits.isTwoSided()) {
            return Optional.of(Expectation.offCentre(value, potential));
        }
        return Optional.of(Expectation.centred(value));
    }
}

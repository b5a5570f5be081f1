package dev.proofrun.stats;

/**
 * The percentile index of a fitted model (ISO 22514-2, Clements 1989) with its confidence bounds, by the method
 * its family allows: generalized pivotal quantities ({@link PivotalBound}) for the location–scale families
 * (lognormal, Weibull, with or without a declared threshold), the test inversion at the least favourable mean/σ
 * ({@link FoldedNormalBound}) for the folded normal.
 *
 * @param fit      the fitted model
 * @param kind     the index
 * @param limits   the specification limits the index is taken against
 * @param readings N, the number of readings the fit came from
 * @param seed     the seed of the simulated draws behind the bounds
 * @param estimate the index of the fitted model, {@link PercentileIndex#of(IndexKind, SpecLimits, ShapeFit)}
 */
public record PercentileEstimate(ShapeFit fit, IndexKind kind, SpecLimits limits, int readings, long seed, double estimate)
        implements BoundEngine {

    /** The estimate of {@code kind} from the fit, with the bounds its family allows. */
    public static PercentileEstimate of(ShapeFit fit, IndexKind kind, SpecLimits limits, int readings, long seed) {
        return new PercentileEstimate(fit, kind, limits, readings, seed, PercentileIndex.of(kind, limits, fit));
    }

    @Override
    public double lower(double confidence) {
        return bounds(confidence)[0];
    }

    @Override
    public double upper(double confidence) {
        return bounds(confidence)[1];
    }

    private double[] bounds(double confidence) {
        return fit.family().isLocationScale()
                ? PivotalBound.bounds(fit, kind, limits, readings, confidence, seed)
                : FoldedNormalBound.bounds(fit, kind, limits, readings, confidence, seed);
    }
}

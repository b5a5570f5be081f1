package dev.proofrun.grade;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import dev.proofrun.stats.AndersonDarling;

/**
 * The shape step: is the normal model fair, and if not, which alternative is.
 *
 * <p>Normality: Anderson–Darling A² against the normal with the readings' mean and s, p-value with
 * Stephens' adjustment ({@link AndersonDarling}, shared with {@code estimate}); not rejected when p ≥ {@value #NORMALITY_LEVEL}. When rejected and
 * every reading is positive, the Box–Cox, lognormal and Weibull models are fitted by maximum likelihood
 * ({@link DistributionFits}); a model "fits" when its own A² test does not reject it at 5 % (for Box–Cox and
 * lognormal: normality of the transformed readings — somewhat lenient for Box–Cox since λ is estimated).
 * The chosen model is the fitting one with the smallest AIC (Box–Cox counts λ as a third parameter);
 * when none fits the best by AIC is named and the shape step fails. With fewer than {@value #MIN_READINGS}
 * readings the shape is not judged and the normal model is assumed (said in the reasons).
 *
 * <p><b>Gauge resolution.</b> The tests assume a continuous distribution; readings on a gauge's grid are
 * tied, and with many readings (hundreds of thousands) the ties alone make A² reject any model. So before
 * the shape tests each reading is spread uniformly over its resolution cell, x + r·(U − ½), U uniform,
 * seeded (a continuity correction; it adds r²/12 to the variance, negligible when the gauge meets the rule
 * of ten). The capability figures use the readings as returned.
 */
final class ShapeJudge {

    static final double LEVEL = 0.05;
    /**
     * The level of the normality check: a normal process is rejected this often by chance, and the design's power
     * counts it ({@code design.ProcedurePower.NORMAL_SHAPE_REJECTION} must equal it).
     */
    static final double NORMALITY_LEVEL = 0.01;
    static final int MIN_READINGS = 8;

    private ShapeJudge() {
    }

    static double[] flatten(List<double[]> subgroups) {
        int total = 0;
        for (double[] g : subgroups) {
            total += g.length;
        }
        double[] x = new double[total];
        int i = 0;
        for (double[] g : subgroups) {
            System.arraycopy(g, 0, x, i, g.length);
            i += g.length;
        }
        return x;
    }

    private static final long SPREAD_SEED = 0x5ba9eL;

    /** The readings spread over their resolution cells (a copy; unchanged when r = 0). */
    static double[] spread(double[] x, double resolution) {
        if (!(resolution > 0)) {
            return x;
        }
        org.apache.commons.rng.UniformRandomProvider rng =
                org.apache.commons.rng.simple.RandomSource.XO_RO_SHI_RO_128_PP.create(SPREAD_SEED);
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = x[i] + resolution * (rng.nextDouble() - 0.5);
        }
        return y;
    }

    /** A² and p of the normal model with mean and s (divisor N − 1) from the readings. */
    static double[] normality(double[] x) {
        int n = x.length;
        double mean = DistributionFits.sum(x) / n;
        double s = Math.sqrt(DistributionFits.squaredDeviations(x, mean) / (n - 1));
        if (!(s > 0)) {
            return new double[] {Double.POSITIVE_INFINITY, 0};
        }
        AndersonDarling.Result r = AndersonDarling.test(x);
        return new double[] {r.adjusted(), r.pValue()};
    }

    static Shape judge(List<double[]> subgroups, double resolution, List<Reason> reasons) {
        double[] x = spread(flatten(subgroups), resolution);
        if (x.length < MIN_READINGS) {
            reasons.add(new Reason(Step.SHAPE, false, GradeMessage.REASON_TOO_FEW_FOR_SHAPE.format(x.length)));
            return new Shape(Double.NaN, Double.NaN, true, ShapeModel.NORMAL, List.of(), true);
        }
        double[] ad = normality(x);
        if (ad[1] >= NORMALITY_LEVEL) {
            reasons.add(new Reason(Step.SHAPE, false, GradeMessage.REASON_NORMAL.format(ad[0], ad[1])));
            return new Shape(ad[0], ad[1], true, ShapeModel.NORMAL, List.of(), true);
        }
        if (!DistributionFits.allPositive(x)) {
            reasons.add(new Reason(Step.SHAPE, true, GradeMessage.REASON_NO_MODEL.format(ad[0], ad[1])));
            return new Shape(ad[0], ad[1], false, ShapeModel.NORMAL, List.of(), false);
        }
        List<ModelFit> fits = alternatives(x);
        ModelFit best = fits.get(0);
        if (best.fits()) {
            reasons.add(new Reason(Step.SHAPE, false, GradeMessage.REASON_NOT_NORMAL_MODEL.format(ad[0], ad[1],
                    best.model().id(), describe(best))));
        } else {
            reasons.add(new Reason(Step.SHAPE, true, GradeMessage.REASON_NO_MODEL.format(ad[0], ad[1])));
        }
        return new Shape(ad[0], ad[1], false, best.model(), fits, best.fits());
    }

    /** The three alternatives, fitting ones first, then by AIC. */
    static List<ModelFit> alternatives(double[] x) {
        int n = x.length;
        List<ModelFit> fits = new ArrayList<>();
        double lambda = DistributionFits.boxCoxLambda(x);
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = DistributionFits.boxCox(x[i], lambda);
        }
        double[] ty = normality(y);
        double[] ny = DistributionFits.normal(y);
        double llBc = DistributionFits.boxCoxLogLikelihood(x, lambda);
        fits.add(new ModelFit(ShapeModel.BOX_COX, lambda, ny[1], llBc, 6 - 2 * llBc, ty[0], ty[1] >= LEVEL));

        double[] ln = DistributionFits.lognormal(x);
        double[] tl = normality(DistributionFits.logs(x));
        fits.add(new ModelFit(ShapeModel.LOGNORMAL, ln[0], ln[1], ln[2], 4 - 2 * ln[2], tl[0], tl[1] >= LEVEL));

        double[] wb = DistributionFits.weibull(x);
        double a2w = AndersonDarlingFit.statistic(x, v -> -Math.expm1(-Math.pow(v / wb[1], wb[0])));
        fits.add(new ModelFit(ShapeModel.WEIBULL, wb[0], wb[1], wb[2], 4 - 2 * wb[2], a2w,
                AndersonDarlingFit.weibullFits(a2w, n)));
        fits.sort(Comparator.comparing((ModelFit f) -> !f.fits()).thenComparingDouble(ModelFit::aic));
        return fits;
    }

    static String describe(ModelFit f) {
        switch (f.model()) {
            case BOX_COX:
                return String.format(Locale.ROOT, "lambda = %.3f, A2 of the transformed readings = %.3f", f.first(), f.andersonDarling());
            case LOGNORMAL:
                return String.format(Locale.ROOT, "mu = %.4g, sigma = %.4g of ln x, A2 = %.3f", f.first(), f.second(), f.andersonDarling());
            case WEIBULL:
                return String.format(Locale.ROOT, "shape = %.3f, scale = %.4g, A2 = %.3f", f.first(), f.second(), f.andersonDarling());
            default:
                return String.format(Locale.ROOT, "A2 = %.3f", f.andersonDarling());
        }
    }
}

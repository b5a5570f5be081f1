package dev.proofrun.report;

import dev.proofrun.grade.ModelFit;
import dev.proofrun.stats.ShapeFamily;
import org.apache.commons.statistics.distribution.NormalDistribution;

/**
 * The fitted distribution model of a characteristic, as the report draws it: its density on the readings'
 * scale (histogram curve) and the straightening transform and quantile function of its probability plot.
 *
 * <ul>
 * <li>normal: f(x) = φ((x−μ)/σ)/σ; plot x against Φ⁻¹(p).</li>
 * <li>lognormal: ln x normal(μ, σ); f(x) = φ((ln x − μ)/σ)/(σx); plot ln x against Φ⁻¹(p).</li>
 * <li>Weibull (shape k, scale η): f(x) = (k/η)(x/η)^(k−1)·exp(−(x/η)^k); plot ln x against ln(−ln(1−p)),
 *     on which the model is the line ln η + q/k.</li>
 * <li>folded normal (μ, σ of the unfolded normal): f(x) = [φ((x−μ)/σ) + φ((x+μ)/σ)]/σ for x ≥ 0; plot x
 *     against the fitted model's own p-quantile, on which the model is the line y = q.</li>
 * <li>lognormal3, weibull3: the same for x − θ with the declared threshold θ (plot ln(x − θ)).</li>
 * </ul>
 * Plotting positions p_i = (i − 3/8)/(N + 1/4) (Blom 1958, <i>Statistical Estimates and Transformed
 * Beta-Variables</i>).
 *
 * @param model  which model
 * @param first  μ (normal, lognormal, folded normal), k (Weibull)
 * @param second σ (normal, lognormal, folded normal), η (Weibull)
 * @param threshold θ of a threshold model, 0 otherwise
 */
record ModelCurve(ShapeFamily model, double first, double second, double threshold) {

    ModelCurve(ShapeFamily model, double first, double second) {
        this(model, first, second, 0);
    }

    private static final NormalDistribution STANDARD = NormalDistribution.of(0, 1);

    /** The curve for a model fit. */
    static ModelCurve of(ModelFit fit) {
        return new ModelCurve(fit.model(), fit.first(), fit.second(), fit.threshold());
    }

    /** The normal model with the readings' mean and standard deviation. */
    static ModelCurve normal(double mean, double sd) {
        return new ModelCurve(ShapeFamily.NORMAL, mean, sd);
    }

    /** Density at x on the readings' scale (0 outside the support). */
    double density(double at) {
        double x = at - threshold;
        switch (model.base()) {
            case NORMAL:
                return phi((x - first) / second) / second;
            case LOGNORMAL:
                return x <= 0 ? 0 : phi((Math.log(x) - first) / second) / (second * x);
            case WEIBULL:
                if (x <= 0) {
                    return 0;
                }
                double r = x / second;
                return first / second * Math.pow(r, first - 1) * Math.exp(-Math.pow(r, first));
            case FOLDED_NORMAL:
                return x < 0 ? 0 : (phi((x - first) / second) + phi((x + first) / second)) / second;
            default:
                throw new IllegalStateException(model.name());
        }
    }

    /** The probability plot's vertical value for a reading (NaN outside the support). */
    double straighten(double at) {
        double x = at - threshold;
        switch (model.base()) {
            case NORMAL:
            case FOLDED_NORMAL:
                return x;
            default:
                return x > 0 ? Math.log(x) : Double.NaN;
        }
    }

    /** The probability plot's horizontal value for a plotting position p. */
    double quantile(double p) {
        if (model == ShapeFamily.FOLDED_NORMAL) {
            return dev.proofrun.stats.FoldedNormal.quantile(first, second, p);
        }
        return model.base() == ShapeFamily.WEIBULL ? Math.log(-Math.log(1 - p)) : STANDARD.inverseCumulativeProbability(p);
    }

    /** The model's line on the probability plot at horizontal value q. */
    double line(double q) {
        switch (model.base()) {
            case NORMAL:
            case LOGNORMAL:
                return first + second * q;
            case WEIBULL:
                return Math.log(second) + q / first;
            case FOLDED_NORMAL:
                return q;
            default:
                throw new IllegalStateException(model.name());
        }
    }

    /** Axis words for the probability plot: {horizontal, vertical}. */
    String[] axisNames() {
        if (threshold != 0) {
            return new String[] {model.base() == ShapeFamily.WEIBULL ? "ln(\u2212ln(1\u2212p))" : "normal quantile", "ln(reading \u2212 threshold)"};
        }
        switch (model.base()) {
            case NORMAL:
                return new String[] {"normal quantile", "reading"};
            case LOGNORMAL:
                return new String[] {"normal quantile", "ln(reading)"};
            case FOLDED_NORMAL:
                return new String[] {"model quantile", "reading"};
            default:
                return new String[] {"ln(\u2212ln(1\u2212p))", "ln(reading)"};
        }
    }

    private static double phi(double z) {
        return Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
    }
}

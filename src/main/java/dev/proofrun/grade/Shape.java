package dev.proofrun.grade;

import dev.proofrun.stats.FloorBound;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.ShapeFit;
import java.util.List;

/**
 * The shape evidence for one characteristic: the plan's declared model, fitted to the readings and checked.
 *
 * @param andersonDarling A² of the fit check (A*² with the estimated-parameter adjustment of the model)
 * @param pValue          its p-value where one is known (normal, lognormal), NaN otherwise (Weibull: compared
 *                        with the 1 % critical value)
 * @param normal          true when the declared model is the normal one and it fits
 * @param model           the model the capability is computed under (the declared one)
 * @param fits            the declared model's fit as a {@link ModelFit} (empty when there is no fit)
 * @param modelFits       true when the declared model fits (or its departure is judged negligible where
 *                        the index looks)
 * @param family          the declared shape
 * @param fit             the fitted model, or null when there is no fit
 * @param tailFactor      ≤ 1: the factor on the index when the readings' tails are wider than the model's
 *                        (the large-N rule of {@link ShapeJudge}); 1 otherwise
 * @param thresholds      for a plan that gives a floor: the thresholds the readings leave possible (the fit is the
 *                        one at the set's central threshold); null otherwise
 */
public record Shape(double andersonDarling, double pValue, boolean normal, ShapeFamily model, List<ModelFit> fits,
        boolean modelFits, ShapeFamily family, ShapeFit fit, double tailFactor, FloorBound.ThresholdSet thresholds) {

    public Shape {
        fits = List.copyOf(fits);
    }

    /** Shape evidence without a floor. */
    public Shape(double andersonDarling, double pValue, boolean normal, ShapeFamily model, List<ModelFit> fits,
            boolean modelFits, ShapeFamily family, ShapeFit fit, double tailFactor) {
        this(andersonDarling, pValue, normal, model, fits, modelFits, family, fit, tailFactor, null);
    }
}

package dev.proofrun.grade;

import dev.proofrun.stats.ShapeFamily;

/**
 * One distribution fitted to a characteristic's readings.
 *
 * @param model          which model
 * @param first          μ of ln x (lognormal), shape k (Weibull), mean (normal)
 * @param second         σ of ln x (lognormal), scale c (Weibull), σ (normal, maximum likelihood)
 * @param logLikelihood  maximized log-likelihood of the readings on their original scale (Jacobian included)
 * @param aic            Akaike's criterion 4 − 2·logL (two parameters), for reference only: the model is never chosen by it
 * @param andersonDarling A² of the readings against the fitted model
 * @param fits           true when the declared model is kept (its check does not reject it at 1 %, or the large-study rule keeps it)
 * @param threshold      the declared threshold θ of a {@link ShapeFamily#LOGNORMAL3} or {@link ShapeFamily#WEIBULL3}
 *                       model (first and second are then those of x − θ); 0 otherwise
 */
public record ModelFit(ShapeFamily model, double first, double second, double logLikelihood, double aic,
        double andersonDarling, boolean fits, double threshold) {

    /** A fit without a threshold. */
    public ModelFit(ShapeFamily model, double first, double second, double logLikelihood, double aic,
            double andersonDarling, boolean fits) {
        this(model, first, second, logLikelihood, aic, andersonDarling, fits, 0);
    }
}

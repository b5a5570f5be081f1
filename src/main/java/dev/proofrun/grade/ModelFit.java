package dev.proofrun.grade;

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
 */
public record ModelFit(ShapeModel model, double first, double second, double logLikelihood, double aic,
        double andersonDarling, boolean fits) {
}

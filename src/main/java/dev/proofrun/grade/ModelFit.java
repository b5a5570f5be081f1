package dev.proofrun.grade;

/**
 * One distribution fitted to a characteristic's readings.
 *
 * @param model          which model
 * @param first          λ (Box–Cox), μ of log x (lognormal), shape k (Weibull), mean (normal)
 * @param second         σ of the transformed readings (Box–Cox), σ of log x (lognormal), scale (Weibull), s (normal)
 * @param logLikelihood  maximized log-likelihood of the readings on their original scale (Jacobian included)
 * @param aic            Akaike's criterion 2p − 2·logL with p = 3 for Box–Cox (λ, μ, σ), 2 otherwise
 * @param andersonDarling A² of the readings against the fitted model
 * @param fits           true when the goodness-of-fit test does not reject the model at 5 %
 */
public record ModelFit(ShapeModel model, double first, double second, double logLikelihood, double aic,
        double andersonDarling, boolean fits) {
}

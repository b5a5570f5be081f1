package dev.proofrun.grade;

import java.util.List;

/**
 * The shape evidence for one characteristic.
 *
 * @param andersonDarling A*² = A²(1 + 0.75/N + 2.25/N²) against the normal with estimated mean and s (as {@code estimate} reports it)
 * @param pValue          its p-value
 * @param normal          true when normality is not rejected (at the shape step's normality level, 1 %)
 * @param model           the model the capability is computed under
 * @param fits            the alternatives tried when normality was rejected (empty otherwise), best first
 * @param modelFits       true when the chosen model is not rejected
 */
public record Shape(double andersonDarling, double pValue, boolean normal, ShapeModel model, List<ModelFit> fits,
        boolean modelFits) {

    public Shape {
        fits = List.copyOf(fits);
    }
}

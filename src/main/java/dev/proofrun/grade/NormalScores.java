package dev.proofrun.grade;

import java.util.ArrayList;
import java.util.List;

/**
 * The readings on the normal scale of the fitted declared model, for the stability step: zᵢ = Φ⁻¹(F̂(xᵢ))
 * ({@link dev.proofrun.stats.ShapeFit#normalScore}; for the lognormal this is (ln x − μ̂)/σ̂, a straight-line
 * map of ln x). The run rules and the chance rate of {@link StabilityJudge} assume normal readings; on skewed
 * readings a stable process is called unstable far more often than on normal ones (issue figures: 23 % at
 * σ of ln x = 0.5). Scores keep the time order and subgroups, so shifts, trends and between-subgroup
 * variation still show. When the declared model has no fit the readings are charted as they are.
 */
final class NormalScores {

    private NormalScores() {
    }

    /** The scored subgroups (new arrays), or {@code subgroups} itself when there is no fit; says so in the reasons. */
    static List<double[]> of(Shape shape, List<double[]> subgroups, List<Reason> reasons) {
        if (shape.fit() == null) {
            return subgroups;
        }
        List<double[]> out = new ArrayList<>(subgroups.size());
        for (double[] g : subgroups) {
            double[] z = new double[g.length];
            for (int i = 0; i < g.length; i++) {
                z[i] = shape.fit().normalScore(g[i]);
            }
            out.add(z);
        }
        reasons.add(new Reason(Step.STABILITY, false, GradeMessage.REASON_CHARTS_ON_NORMAL_SCALE.format(shape.family().token())));
        return out;
    }
}

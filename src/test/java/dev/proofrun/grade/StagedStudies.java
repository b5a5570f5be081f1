package dev.proofrun.grade;

import java.util.List;
import java.util.Optional;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * Simulated staged studies graded look by look through the grader's own staged path ({@link Grader#look},
 * {@link CharacteristicGrader} with every gate): each study is k subgroups of n normal readings, graded at look 1
 * with its first subgroups and, while the verdict is continue, at the next look with all readings so far.
 */
final class StagedStudies {

    /** How the studies ended, counted by look. */
    record Outcome(int[] passedAt, int[] stoppedAt, int studies) {

        /** The share of studies demonstrated at some look. */
        double passed() {
            return java.util.Arrays.stream(passedAt).sum() / (double) studies;
        }
    }

    private StagedStudies() {
    }

    /**
     * @param plan    a one-characteristic plan with its stages
     * @param mean    the process mean
     * @param sd      the process standard deviation
     * @param studies how many studies
     * @param seed    the seed of the readings (drawn in order, study by study, subgroup by subgroup)
     */
    static Outcome run(GradingPlan plan, double mean, double sd, int studies, long seed) {
        var stages = plan.stages().orElseThrow();
        PlannedCharacteristic gc = plan.characteristics().get(0);
        int n = plan.design().subgroupSize();
        int k = stages.last().subgroups();
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
        int[] passedAt = new int[stages.count()];
        int[] stoppedAt = new int[stages.count()];
        for (int s = 0; s < studies; s++) {
            List<double[]> all = NormalReadings.subgroups(g, k, n, mean, sd);
            for (int j = 0; j < stages.count(); j++) {
                int m = stages.looks().get(j).subgroups();
                GradedLook look = Grader.look(plan, m);
                List<String> slots = plan.slots().subList(0, m).stream().map(PlannedSlot::id).toList();
                Completeness c = new Completeness(m, n, m, 0, 0, (long) n * m, 0, 0,
                        GradingPlan.defaultAllowedShortfall(m));
                Verdict v = CharacteristicGrader.grade(gc, plan.design(), plan.interval(),
                        new ReturnedData.Collection(c, all.subList(0, m), slots), Optional.of(look)).verdict();
                if (v == Verdict.DEMONSTRATED) {
                    passedAt[j]++;
                }
                if (v != Verdict.CONTINUE) {
                    stoppedAt[j]++;
                    break;
                }
            }
        }
        return new Outcome(passedAt, stoppedAt, studies);
    }
}

package dev.proofrun.grade;

import dev.proofrun.design.Requirement;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.PercentileIndex;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SpecLimits;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * Simulated studies of a characteristic with a declared shape, written as returned files and graded by
 * {@link Grader#grade} — the product's whole procedure (reading, completeness, stability, shape, capability).
 * All processes are invented; their true percentile index (ISO 22514-2) is set exactly by placing the upper
 * limit: USL = X₅₀ + C·(X₉₉.₈₆₅ − X₅₀) of the true distribution (upper limit only), or a centred two-sided
 * tolerance for the normal case when {@code twoSided}.
 */
final class ShapeStudies {

    /**
     * One simulated process.
     *
     * @param family    the true (and declared) shape
     * @param parameter σ of ln x (lognormal), shape k (Weibull), μ/σ of the unfolded normal (folded normal, σ = 1),
     *                  unused (normal)
     * @param index     the true percentile index
     * @param n         subgroup size
     * @param k         subgroups
     * @param twoSided  a centred two-sided tolerance (normal only), else an upper limit only
     * @param trueThreshold     for {@code lognormal3}/{@code weibull3}: the process's real threshold θ′; readings are
     *                          θ′ + {@value #THRESHOLD_SCALE}·(the two-parameter draw); 0 otherwise
     * @param declaredThreshold the threshold the plan declares (θ; NaN for the shapes without one)
     * @param floor             true when the plan gives {@code declaredThreshold} as a floor, not as the threshold
     */
    record Case(ShapeFamily family, double parameter, double index, int n, int k, boolean twoSided, double trueThreshold,
            double declaredThreshold, boolean floor) {

        /** A process whose plan declares the threshold itself (no floor). */
        Case(ShapeFamily family, double parameter, double index, int n, int k, boolean twoSided, double trueThreshold,
                double declaredThreshold) {
            this(family, parameter, index, n, k, twoSided, trueThreshold, declaredThreshold, false);
        }

        /** A threshold-shape process from {@code theta} whose plan gives the floor {@code floor}. */
        static Case floor(ShapeFamily family, double parameter, double theta, double floor, double index, int n, int k) {
            return new Case(family, parameter, index, n, k, false, theta, floor, true);
        }

        /** A process of a shape without a threshold. */
        Case(ShapeFamily family, double parameter, double index, int n, int k, boolean twoSided) {
            this(family, parameter, index, n, k, twoSided, 0, Double.NaN);
        }

        /** A threshold-shape process whose real threshold is the declared one. */
        static Case threshold(ShapeFamily family, double parameter, double theta, double index, int n, int k) {
            return new Case(family, parameter, index, n, k, false, theta, theta);
        }

        private double scale() {
            return family.hasThreshold() ? THRESHOLD_SCALE : 1;
        }

        String label() {
            String p = family == ShapeFamily.NORMAL ? "" : String.format(Locale.ROOT, " %.2f", parameter)
                    + (family.hasThreshold() ? String.format(Locale.ROOT, " from %s %s %s", trueThreshold,
                            floor ? "floor" : "declared", declaredThreshold) : "");
            return String.format(Locale.ROOT, "%s%s, index %.2f, %d x %d%s", family.token(), p, index, k, n,
                    twoSided ? ", two-sided" : "");
        }

        /** The true quantile: normal(10, 1), lognormal(median 1, σ), Weibull(k, scale 1), |normal(μ/σ, 1)|. */
        double quantile(double p) {
            return trueThreshold + scale() * baseQuantile(p);
        }

        private double baseQuantile(double p) {
            switch (family.base()) {
                case FOLDED_NORMAL:
                    return dev.proofrun.stats.FoldedNormal.quantile(parameter, 1, p);
                case LOGNORMAL:
                    return Math.exp(parameter * dev.proofrun.stats.ShapeFit.standardQuantile(ShapeFamily.NORMAL, p));
                case WEIBULL:
                    return Math.pow(-Math.log1p(-p), 1 / parameter);
                default:
                    return 10 + dev.proofrun.stats.ShapeFit.standardQuantile(ShapeFamily.NORMAL, p);
            }
        }

        double draw(ZigguratSampler.NormalizedGaussian g, ZigguratSampler.Exponential e) {
            return trueThreshold + scale() * baseDraw(g, e);
        }

        private double baseDraw(ZigguratSampler.NormalizedGaussian g, ZigguratSampler.Exponential e) {
            switch (family.base()) {
                case FOLDED_NORMAL:
                    return Math.abs(parameter + g.sample());
                case LOGNORMAL:
                    return Math.exp(parameter * g.sample());
                case WEIBULL:
                    return Math.pow(e.sample(), 1 / parameter);
                default:
                    return 10 + g.sample();
            }
        }

        SpecLimits limits() {
            double median = quantile(0.5);
            if (twoSided) {
                double half = index * (quantile(PercentileIndex.HIGH) - median);
                return SpecLimits.twoSided(median - half, median + half);
            }
            return SpecLimits.upperOnly(median + index * (quantile(PercentileIndex.HIGH) - median));
        }

        GradingPlan plan(double c0) {
            PlannedCharacteristic c = new PlannedCharacteristic("X1", "simulated characteristic", "mm", limits(), null, 0,
                    Requirement.of(IndexKind.CPK, c0, 0.95), family, floor ? Double.NaN : declaredThreshold,
                    floor ? declaredThreshold : Double.NaN);
            return TestPlans.plan(n, k, c);
        }
    }

    /** The spread of a threshold-shape process: readings θ′ + 0.05·(lognormal of median 1, or Weibull of scale 1). */
    static final double THRESHOLD_SCALE = 0.05;

    private ShapeStudies() {
    }

    /** Verdict counts of {@code studies} studies graded against c₀, seeds seed, seed + 1, … */
    static Map<Verdict, Integer> run(Case c, double c0, int studies, long seed, Path dir) {
        GradingPlan plan = c.plan(c0);
        Map<Verdict, Integer> counts = new EnumMap<>(Verdict.class);
        Path f = dir.resolve("study.csv");
        for (int s = 0; s < studies; s++) {
            write(plan, c, seed + s, f);
            GradeResult r = Grader.grade(plan, f, "study.csv");
            counts.merge(r.characteristics().get(0).verdict(), 1, Integer::sum);
        }
        return counts;
    }

    /** How many of {@code studies} studies the stability step calls unstable. */
    static int unstable(Case c, double c0, int studies, long seed, Path dir) {
        GradingPlan plan = c.plan(c0);
        Path f = dir.resolve("study.csv");
        int unstable = 0;
        for (int s = 0; s < studies; s++) {
            write(plan, c, seed + s, f);
            CharacteristicGrade g = Grader.grade(plan, f, "study.csv").characteristics().get(0);
            unstable += g.stability() != null && !g.stability().stable() ? 1 : 0;
        }
        return unstable;
    }

    /** The returned file of one study (the fill-in layout; readings written in full precision). */
    static void write(GradingPlan plan, Case c, long seed, Path out) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
        ZigguratSampler.Exponential e = ZigguratSampler.Exponential.of(rng);
        int n = plan.design().subgroupSize();
        try (BufferedWriter w = Files.newBufferedWriter(out, StandardCharsets.UTF_8)) {
            StringBuilder sb = new StringBuilder("plan,slot,characteristic,planned,taken,lot,operator");
            for (int j = 1; j <= n; j++) {
                sb.append(",x").append(j);
            }
            w.write(sb.append(",remark\n").toString());
            for (PlannedSlot slot : plan.slots()) {
                String t = slot.start().toOffsetDateTime().toString();
                sb.setLength(0);
                sb.append(plan.reference()).append(',').append(slot.id()).append(",X1,").append(t).append(',').append(t)
                        .append(",L1,MK");
                for (int j = 0; j < n; j++) {
                    sb.append(',').append(c.draw(g, e));
                }
                w.write(sb.append(",\n").toString());
            }
        } catch (IOException ex) {
            throw new UncheckedIOException(ex);
        }
    }

    /** α + 2 SE with SE = √(α(1 − α)/S): the most a check at the boundary lets through in S studies. */
    static double limit(double alpha, int studies) {
        return alpha + 2 * Math.sqrt(alpha * (1 - alpha) / studies);
    }

    /**
     * Grades {@code studies} seeded studies of each case at c₀ and fails unless every case's share demonstrated is at
     * most {@link #limit}; returns one line a case for the log.
     */
    static String assertAtMostAlpha(List<Case> cases, double c0, double alpha, int studies, long seed, Path dir) {
        StringBuilder all = new StringBuilder();
        boolean ok = true;
        for (Case c : cases) {
            Map<Verdict, Integer> v = run(c, c0, studies, seed, dir);
            double pass = v.getOrDefault(Verdict.DEMONSTRATED, 0) / (double) studies;
            all.append(c.label()).append(": demonstrated ").append(pass).append(' ').append(v).append('\n');
            ok &= pass <= limit(alpha, studies);
        }
        org.junit.jupiter.api.Assertions.assertTrue(ok, "more than " + limit(alpha, studies) + " demonstrated at c0:\n" + all);
        return all.toString();
    }
}

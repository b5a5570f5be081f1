package dev.proofrun.control;

import dev.proofrun.stats.SampleMoments;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentHashMap;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.hipparchus.distribution.continuous.NormalDistribution;

/**
 * How many signals a stable process gives by chance on a study's charts, found by simulation: stable
 * normal subgroups of the study's size and number, with limits estimated from each simulated study as the
 * real one estimates them (so the estimation of the limits is part of the chance), scanned with the same
 * rules. The count that matters is the number of <em>points</em> at which some rule fires (a long run fires
 * at several points in a row, so counts of points cluster; the simulation keeps that).
 *
 * <p>Work is bounded: about {@value #READINGS_BUDGET} simulated readings. When fewer than
 * {@value #BLOCKS} whole studies fit the budget, {@value #BLOCKS} shorter series ("blocks") of kb subgroups
 * are simulated instead and their mean and variance scaled by k/kb (counts over a long series are sums of
 * many weakly dependent blocks; the limits of a block of thousands of subgroups are as good as known).
 * With fewer than {@value #EMPIRICAL_STUDIES} simulated studies the tail probability comes from a normal
 * approximation with the simulated (scaled) mean and variance; otherwise it is the empirical share of
 * simulated studies with at least the observed count. Seeded: the same study gives the same figures.
 *
 * <p>Each simulation is kept for the life of the JVM by (chart, n, k, rules) ({@value #CACHE_SIZE} at most),
 * and {@link #prepare} can start one on a background thread before it is asked for; both only move work,
 * the figures are those of a fresh run.
 */
public final class ChanceSignalCounts {

    public static final long READINGS_BUDGET = 1_000_000L;
    static final int BLOCKS = 64;
    public static final int MAX_STUDIES = 2000;
    static final int EMPIRICAL_STUDIES = 400;
    private static final long SEED = 0x5eed_6a1eL;

    /** Simulated counts for the location and the spread chart. */
    private final double[] location;
    private final double[] spread;

    /** Per simulated study: the ANOVA part of {@link StabilityRule} calls it unstable (whole studies, n ≥ 2). */
    private final boolean[] between;

    /** k/kb when blocks were simulated, 1 otherwise. */
    private final double scale;

    private ChanceSignalCounts(double[] location, double[] spread, boolean[] between, double scale) {
        this.location = location;
        this.spread = spread;
        this.between = between;
        this.scale = scale;
    }

    /**
     * Simulates stable studies like the real one.
     *
     * @param kind  the charts
     * @param n     subgroup size
     * @param k     number of subgroups
     * @param rules the rules on the location chart
     */
    public static ChanceSignalCounts simulate(ChartKind kind, int n, int k, Set<RunRule> rules) {
        try {
            return future(kind, n, k, rules, false).join();
        } catch (java.util.concurrent.CompletionException e) {
            if (e.getCause() instanceof RuntimeException) {
                throw (RuntimeException) e.getCause();
            }
            throw e;
        }
    }

    /**
     * Starts the simulation for a study of this size on a background thread and returns at once, so that it
     * runs while the returned file is still being read (grading a large study); {@link #simulate} with the
     * same arguments then waits for it instead of starting again. Used only when the file is expected to
     * come back complete (k = the planned subgroups): if fewer usable subgroups come back, the work is spent
     * for nothing and the real k is simulated as usual — the figures never depend on the guess.
     */
    public static void prepare(ChartKind kind, int n, int k, Set<RunRule> rules) {
        future(kind, n, k, rules, true);
    }

    private static CompletableFuture<ChanceSignalCounts> future(ChartKind kind, int n, int k, Set<RunRule> rules,
            boolean background) {
        Key key = new Key(kind, n, k, Set.copyOf(rules));
        CompletableFuture<ChanceSignalCounts> known = CACHE.get(key);
        if (known != null) {
            return known;
        }
        if (CACHE.size() >= CACHE_SIZE) {
            CACHE.clear();
        }
        CompletableFuture<ChanceSignalCounts> mine = new CompletableFuture<>();
        CompletableFuture<ChanceSignalCounts> raced = CACHE.putIfAbsent(key, mine);
        if (raced != null) {
            return raced;
        }
        Runnable work = () -> {
            try {
                mine.complete(run(kind, n, k, rules));
            } catch (RuntimeException | Error e) {
                CACHE.remove(key, mine);
                mine.completeExceptionally(e);
            }
        };
        if (background) {
            Thread t = new Thread(work, "proofrun-chance-" + n + "x" + k);
            t.setDaemon(true);
            t.start();
        } else {
            work.run();
        }
        return mine;
    }

    /** What a simulation depends on; the seed follows from n and k, so equal keys give equal figures. */
    private record Key(ChartKind kind, int n, int k, Set<RunRule> rules) {
    }

    /**
     * Simulations already run in this JVM. A plan's characteristics share n and k, so a part with ten
     * characteristics runs one simulation, not ten; the figures are the same as a fresh run's (seeded).
     */
    private static final Map<Key, CompletableFuture<ChanceSignalCounts>> CACHE = new ConcurrentHashMap<>();
    static final int CACHE_SIZE = 32;

    public static ChanceSignalCounts run(ChartKind kind, int n, int k, Set<RunRule> rules) {
        long perStudy = (long) n * k;
        int studies = (int) Math.min(MAX_STUDIES, READINGS_BUDGET / Math.max(1, perStudy));
        int length = k;
        double scale = 1;
        if (studies < BLOCKS) {
            studies = BLOCKS;
            length = (int) Math.min(k, Math.max(2, READINGS_BUDGET / ((long) BLOCKS * n)));
            scale = k / (double) length;
        }
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(SEED ^ ((long) n << 32) ^ k);
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
        double[] loc = new double[studies];
        double[] spr = new double[studies];
        boolean[] between = new boolean[studies];
        for (int s = 0; s < studies; s++) {
            List<double[]> groups = new ArrayList<>(length);
            for (int i = 0; i < length; i++) {
                double[] x = new double[n];
                for (int j = 0; j < n; j++) {
                    x[j] = g.sample();
                }
                groups.add(x);
            }
            ChartPair p = ControlCharts.of(kind, groups, rules);
            loc[s] = RunRules.signalledPoints(p.location().z(), rules);
            spr[s] = p.spread().signals().size();
            if (n > 1 && scale == 1) {
                double ratio = p.sigmaWithin() > 0 ? StabilityRule.overallSd(groups) / p.sigmaWithin()
                        : Double.POSITIVE_INFINITY;
                between[s] = StabilityRule.anova(groups)[1] < StabilityRule.ANOVA_LEVEL
                        && ratio >= StabilityRule.RATIO_LIMIT;
            }
        }
        return new ChanceSignalCounts(loc, spr, between, scale);
    }

    /** The number of simulated studies (or blocks). */
    public int studies() {
        return location.length;
    }

    public double expectedLocation() {
        return SampleMoments.meanOf(location) * scale;
    }

    public double expectedSpread() {
        return SampleMoments.meanOf(spread) * scale;
    }

    /**
     * The smallest tail probability the simulation can give: 1/(S + 1) for S simulated studies when the tail is
     * their empirical share, (a + 1)/(S + 1) with a = 0 — no simulated stable study reached the count, so the
     * chance is below this (not equal to it). 0 when the tail comes from the normal approximation, which has no
     * such floor.
     */
    public double floor() {
        return empirical(location) ? 1.0 / (location.length + 1.0) : 0.0;
    }

    private boolean empirical(double[] counts) {
        return scale == 1 && counts.length >= EMPIRICAL_STUDIES;
    }

    /** P(a stable study signals at ≥ observed points of the location chart). */
    public double locationTail(int observed) {
        return tail(location, observed);
    }

    /** P(a stable study has ≥ observed points beyond the spread chart's limits). */
    public double spreadTail(int observed) {
        return tail(spread, observed);
    }

    /**
     * The share of the simulated stable studies that {@link StabilityRule} would call unstable, each judged
     * against the others (leave one out: a new stable study meets a reference of the other studies, so its own
     * count must not count for it). This is the grader's false-unstable rate at this (n, k), read from the same
     * simulation the grader uses, at no extra cost. NaN when blocks were simulated instead of whole studies (the
     * blocks are not studies the rule could judge).
     */
    public double falseUnstableShare() {
        if (scale != 1) {
            return Double.NaN;
        }
        double[] locSorted = location.clone();
        double[] sprSorted = spread.clone();
        java.util.Arrays.sort(locSorted);
        java.util.Arrays.sort(sprSorted);
        int unstable = 0;
        for (int s = 0; s < location.length; s++) {
            boolean signalled = tailOfOthers(location, locSorted, location[s]) < StabilityRule.CHANCE_LEVEL
                    || tailOfOthers(spread, sprSorted, spread[s]) < StabilityRule.CHANCE_LEVEL;
            if (signalled || between[s]) {
                unstable++;
            }
        }
        return unstable / (double) location.length;
    }

    /** The tail at one study's own count, that study left out of the empirical share. */
    private double tailOfOthers(double[] counts, double[] sorted, double own) {
        if (own <= 0) {
            return 1.0;
        }
        if (!empirical(counts)) {
            return tail(counts, (int) own);
        }
        int first = java.util.Arrays.binarySearch(sorted, own);
        while (first > 0 && sorted[first - 1] == own) {
            first--;
        }
        int atOthers = sorted.length - first - 1;
        return (atOthers + 1.0) / sorted.length;
    }

    private double tail(double[] counts, int observed) {
        if (observed <= 0) {
            return 1.0;
        }
        if (empirical(counts)) {
            int at = 0;
            for (double c : counts) {
                if (c >= observed) {
                    at++;
                }
            }
            // (at + 1)/(studies + 1): never exactly zero from a finite simulation
            return (at + 1.0) / (counts.length + 1.0);
        }
        double m0 = SampleMoments.meanOf(counts);
        double v = 0;
        for (double c : counts) {
            v += (c - m0) * (c - m0);
        }
        v = v / (counts.length - 1) * scale;
        double m = m0 * scale;
        double sd = Math.sqrt(Math.max(v, m)); // at least Poisson spread
        if (!(sd > 0)) {
            return observed > m ? 0.0 : 1.0;
        }
        return new NormalDistribution(0, 1).cumulativeProbability(-(observed - 0.5 - m) / sd);
    }
}

package dev.proofrun.design;

import dev.proofrun.stats.RecentResults;
import dev.proofrun.text.UserException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Plans a staged study: S planned looks at k_j ≈ j·K/S subgroups; at each look the grader computes its usual lower
 * bound (same index, model and bound method as a single stage) at a per-look confidence 1 − α′_j and says
 * demonstrated when it reaches c₀; it stops for futility at a look j &lt; S when the estimate is below f_j.
 *
 * <p><b>Efficacy (α spent across the looks).</b> At the boundary (true index c₀) the chance of a first
 * demonstrated at look j must be {@link Spending#spent}(α, t_j) − spent(α, t_{j−1}), t_j = k_j/K (Lan &amp; DeMets
 * 1983, Biometrika 70:659–663). The looks share readings, so α′_j comes from their joint distribution, simulated:
 * {@value #PATHS} studies ({@link StagedPaths}, fixed seed) read at every look; each study's {@link LookPValue} at
 * each look (the smallest α at which its bound reaches c₀); α′_j is the empirical quantile among the studies still
 * running that spends the look's share. The error of the cumulative α on new studies is √(α(1 − α)/{@value #PATHS})
 * ≈ 0.0017 at α = 0.05. Two-sided Cpk/Ppk are calibrated centred (Cp = c₀) and off centre (Cp =
 * {@value #OFF_CENTRE}·c₀) and each look takes the smaller α′ (the exact bound is conservative centred, so off centre
 * is the less favourable; {@code StagedDesignerTest} shows the figures). α′_j is at least {@value #LEAST_ALPHA}
 * (the bound engine's highest confidence is 0.9999): where a spending function asks for less at a first look, that
 * look spends this and the later looks spend the rest of the cumulative target.
 *
 * <p><b>Futility (non-binding, β spent by the same family).</b> At c₁ (the expected index and centring), f_j is the
 * estimate below which, among the studies still running and not demonstrated, the share spent(β, t_j) −
 * spent(β, t_{j−1}) of all studies stop, β = 1 − the wanted power. f_j is at most the smallest estimate that can
 * pass at the look (so the two boundaries never contradict). The efficacy boundaries are calibrated as if nobody
 * ever stopped for futility, so the false-pass risk holds whether or not people stop; the power counts the stops.
 *
 * <p><b>The whole procedure.</b> Each look is a new chance for the grader's gates to void the study: the shape check
 * ({@link ProcedurePower#NORMAL_SHAPE_REJECTION}) and the stability decision's false-unstable rate u(n, k_j)
 * ({@code control.StabilityRisk}). A study demonstrated at look j passed the gates at looks 1..j; they are taken as
 * independent, g_j = (1 − s)(1 − u(n, k_j)), power = Σ_j D_j·Π_{i≤j} g_i with D_j the chance of a first demonstrated
 * at j from the bounds. The looks share readings, so a gate that passed once is more likely to pass again: the
 * product understates the power slightly (on the safe side). A study voided at a look stops there.
 *
 * <p><b>Size.</b> K (the most subgroups) is the smallest, from the single-stage k up, whose whole-procedure power
 * reaches the wanted power (each try steps K by what the single stage's power curve says the shortfall costs, at
 * most doubling it, then the gap to the last K that fell short is halved until they are neighbours); the
 * single-stage floors apply to K. A design of one look is the single-stage design,
 * unchanged.
 *
 * <p>The simulation's seed is fixed, so a design is a function of what was asked: the last {@value #KEPT} are kept and
 * asking again (the wizard going back to a choice, the staged sizing and the plan of one session) costs nothing.
 */
public final class StagedDesigner {

    /** Simulated studies per evaluated K. */
    public static final int PATHS = 16_000;
    /** The seed of the simulated studies. */
    public static final long SEED = 20_140_521L;
    /** The off-centre calibration of a two-sided Cpk/Ppk: Cp = this × c₀ (2.0 for c₀ = 1.33). */
    static final double OFF_CENTRE = 1.5;
    /** The smallest per-look α: the bound engine accepts confidences below 0.9999. */
    static final double LEAST_ALPHA = 1.1e-4;
    /** Designs kept: each costs seconds, and the wizard asks again when the user goes back to a choice. */
    static final int KEPT = 16;

    /** What a design depends on (the request as asked); {@code subgroups} is 0 when the designer chooses K. */
    private record Asked(DesignRequest request, int subgroupSize, int subgroups, int stages, Spending spending) {
    }

    private static final RecentResults<Asked, StagedDesign> DESIGNS = new RecentResults<>(KEPT);

    private StagedDesigner() {
    }

    /**
     * The staged design of {@code stages} looks for subgroups of {@code n}.
     *
     * @throws UserException if the stages are outside 1..{@value Stages#MOST}, if the loss rate is not 0, if the
     *                       looks would be fewer than {@value Stages#LEAST_APART} subgroups apart, if no design
     *                       reaches the power within {@value StudyDesigner#MAX_READINGS} readings
     */
    public static StagedDesign design(DesignRequest request, int n, int stages, Spending spending) {
        return DESIGNS.get(new Asked(request, n, 0, stages, spending),
                asked -> search(request, n, stages, spending));
    }

    private static StagedDesign search(DesignRequest request, int n, int stages, Spending spending) {
        SizeSearch search = checkedSearch(request, n, stages);
        DesignRow single = singleStageRow(request, search, n);
        if (stages == 1) {
            return singleStage(request, search, single, spending);
        }
        StagedEvaluation eval = new StagedEvaluation(request, search, single, stages, spending);
        int fail = single.subgroups() - 1;
        int k = single.subgroups();
        StagedDesign found = eval.at(k);
        while (found.power() < request.power()) {
            fail = k;
            if (k == search.largestK()) {
                throw new UserException(StagedMessage.STAGED_UNREACHABLE, stages, n, request.power(),
                        StudyDesigner.MAX_READINGS);
            }
            k = nextTry(search, k, request.power() - found.power());
            found = eval.at(k);
        }
        // halve the gap between the last K that fell short and the first that reached the power (a walk down one at
        // a time once took ~2,000 evaluations, half an hour: docs/decisions/staged-search-and-cancelling.md)
        while (k - fail > 1) {
            int middle = (fail + k) >>> 1;
            StagedDesign tried = eval.at(middle);
            if (tried.power() >= request.power()) {
                k = middle;
                found = tried;
            } else {
                fail = middle;
            }
        }
        return found;
    }

    /**
     * The staged design of {@code stages} looks with the most subgroups fixed at {@code subgroups} (a plan whose k
     * is given, or shared with other characteristics): the looks' confidences and futility boundaries are
     * calibrated as in {@link #design}, and its power is whatever that K gives.
     *
     * @throws UserException as {@link #design}, and if the looks would be fewer than {@value Stages#LEAST_APART}
     *                       subgroups apart
     */
    public static StagedDesign at(DesignRequest request, int n, int subgroups, int stages, Spending spending) {
        return DESIGNS.get(new Asked(request, n, subgroups, stages, spending), asked -> {
            SizeSearch search = checkedSearch(request, n, stages);
            DesignRow single = singleStageRow(request, search, n);
            looks(subgroups, stages);
            return new StagedEvaluation(request, search, single, stages, spending).at(subgroups);
        });
    }

    /** The checks both entries make before searching: stages in range, no losses, an attainable request. */
    private static SizeSearch checkedSearch(DesignRequest request, int n, int stages) {
        if (stages < 1 || stages > Stages.MOST) {
            throw new UserException(StagedMessage.BAD_STAGES, Stages.MOST, stages);
        }
        if (request.lossRate() > 0) {
            throw new UserException(StagedMessage.STAGES_WITHOUT_LOSSES);
        }
        request.requireAttainable();
        return new SizeSearch(request, n);
    }

    /** The one-look design for subgroups of {@code n}, which every staged design starts from. */
    private static DesignRow singleStageRow(DesignRequest request, SizeSearch search, int n) {
        DesignRow single = search.row();
        if (single == null) {
            throw new UserException(DesignMessage.UNREACHABLE_FOR_SIZE, n, request.power(), StudyDesigner.MAX_READINGS);
        }
        return single;
    }

    /**
     * The next K to try when K = {@code k} falls {@code shortfall} short of the wanted power: the K whose
     * single-stage power is that much above k's (the staged power grows with K about as the single stage's does),
     * at least k + 1 and at most 2k: near the power's ceiling (the gates hold the single stage's below 1) no K of
     * the single stage has that much more, and the next try would otherwise be the largest K.
     */
    private static int nextTry(SizeSearch search, int k, double shortfall) {
        double wanted = search.powerWithUnstable(k, 0) + shortfall;
        int next = k + 1;
        while (next < search.largestK() && search.powerWithUnstable(next, 0) < wanted) {
            next += Math.max(1, (next - k) / 2);
        }
        return Math.min(next, Math.min(2 * k, search.largestK()));
    }

    /** The looks of a study of K subgroups in S stages: k_j = round(j·K/S). */
    static int[] looks(int subgroups, int stages) {
        int[] at = new int[stages];
        for (int j = 1; j <= stages; j++) {
            at[j - 1] = (int) Math.round(j * (double) subgroups / stages);
        }
        for (int j = 1; j < stages; j++) {
            if (at[j] - at[j - 1] < Stages.LEAST_APART) {
                throw new UserException(StagedMessage.LOOKS_TOO_CLOSE, stages, subgroups, Stages.LEAST_APART);
            }
        }
        return at;
    }

    private static StagedDesign singleStage(DesignRequest request, SizeSearch search, DesignRow row, Spending spending) {
        Look look = new Look(row.subgroups(), request.requirement().confidence(), Double.NaN);
        Expectation e = request.expectation();
        double c0 = request.requirement().minimum();
        double atTarget = search.powerAt(row.subgroups(), c0, c0 * e.potentialOrIndex() / e.index());
        StagedLook only = new StagedLook(row.subgroups(), row.readings(), look.confidence(), row.criticalEstimate(),
                Double.NaN, 1, 1);
        return new StagedDesign(new Stages(spending, List.of(look)), row.subgroupSize(), List.of(only), row.power(),
                row.boundPower(), atTarget, row.readings(), row.readings(), row.readings(), row, 0);
    }

    /**
     * The α′ of each look from the studies' p-values at c₀ (one array [look][study] per centring tried), see the
     * class notes: at each look the largest level at which, in every centring, the studies demonstrated so far are at
     * most the cumulative share spent; never above {@code ceiling} (p-values above it need not be exact).
     */
    static double[] calibrate(double alpha, Spending spending, int[] looks, List<double[][]> pValues, double ceiling) {
        int stages = looks.length;
        int paths = pValues.get(0)[0].length;
        double[] levels = new double[stages];
        List<boolean[]> stopped = new ArrayList<>();
        int[] spentCount = new int[pValues.size()];
        for (int c = 0; c < pValues.size(); c++) {
            stopped.add(new boolean[paths]);
        }
        for (int j = 0; j < stages; j++) {
            double t = looks[j] / (double) looks[stages - 1];
            long allowed = (long) Math.floor(spending.spent(alpha, t) * paths + 1e-9);
            double level = 1;
            for (int c = 0; c < pValues.size(); c++) {
                double[] p = pValues.get(c)[j];
                boolean[] out = stopped.get(c);
                int more = (int) (allowed - spentCount[c]);
                double[] running = new double[paths];
                int m = 0;
                for (int i = 0; i < paths; i++) {
                    if (!out[i]) {
                        running[m++] = p[i];
                    }
                }
                Arrays.sort(running, 0, m);
                // the largest level that stops at most `more` of the running studies: just below the next one
                double cap = more < m ? Math.nextDown(running[Math.max(0, more)]) : running[m - 1];
                level = Math.min(level, more <= 0 ? 0 : cap);
            }
            levels[j] = Math.max(LEAST_ALPHA, Math.min(level, ceiling));
            for (int c = 0; c < pValues.size(); c++) {
                double[] p = pValues.get(c)[j];
                boolean[] out = stopped.get(c);
                for (int i = 0; i < paths; i++) {
                    if (!out[i] && p[i] <= levels[j]) {
                        out[i] = true;
                        spentCount[c]++;
                    }
                }
            }
        }
        return levels;
    }
}

package dev.proofrun.design;

import dev.proofrun.control.ChartKind;
import dev.proofrun.control.StabilityRisk;
import dev.proofrun.stats.SigmaMethod;
import java.util.HashMap;
import java.util.Map;

/**
 * The search for k at one subgroup size n (see {@link StudyDesigner}); caches the powers at each k.
 *
 * <p>{@link #power} is the whole procedure's ({@link ProcedurePower}); {@link #boundPower} the bound's alone. The
 * stability gate's rate u(n, k) costs a simulation per k (shared with the grader's cache), so the search first
 * runs with u taken at the floor, then settles on the k whose own u gives the wanted power: it steps up while the
 * power falls short and down while one subgroup fewer still reaches it.
 */
final class SizeSearch {

    private final DesignRequest request;
    private final int n;
    private final SigmaMethod sigma;
    private final Map<Integer, StudyPower> models = new HashMap<>();
    private final Map<Integer, Double> boundPowers = new HashMap<>();
    private final Map<Integer, Double> powers = new HashMap<>();
    private final ChartKind chart;
    private double searchUnstable = Double.NaN;

    /**
     * The search's stand-in for u(n, k) when the floor is not simulated: about what the rule gives (0.3–0.8 % over
     * the designs measured); only where the search starts depends on it, not the row's power.
     */
    static final double TYPICAL_UNSTABLE = 0.006;
    private final int smallestK;
    private final int largestK;
    private double bestPower;

    SizeSearch(DesignRequest request, int n) {
        this.request = request;
        this.n = n;
        this.sigma = request.sigmaFor(n);
        this.chart = ChartKind.forMethod(sigma);
        int k = 2;
        while (nu(k) < 2 && k * n < StudyDesigner.MAX_READINGS) {
            k++;
        }
        this.smallestK = k;
        this.largestK = StudyDesigner.MAX_READINGS / n;
    }

    int subgroupSize() {
        return n;
    }

    int smallestK() {
        return smallestK;
    }

    int largestK() {
        return largestK;
    }

    double bestPower() {
        return bestPower;
    }

    double nu(int k) {
        return StudyDesigner.degreesOfFreedom(request.requirement().index(), sigma, n, k);
    }

    StudyPower model(int k) {
        return models.computeIfAbsent(k, kk -> new StudyPower(request.shape(), request.boundMethod(),
                request.requirement().minimum(), request.requirement().confidence(), n * kk, nu(kk),
                request.requirement().index().usesWithinSigma()));
    }

    /** The bound's power alone: P(lower bound ≥ c₀) with k subgroups, the process as expected. */
    double boundPower(int k) {
        return boundPowers.computeIfAbsent(k,
                kk -> model(kk).power(request.expectation().index(), request.expectation().potentialOrIndex()));
    }

    /** u(n, k): the chance that the grader calls a stable process unstable. */
    double falseUnstable(int k) {
        return StabilityRisk.falseUnstable(chart, n, k, overallIndex());
    }

    /** Whether the requirement is on an overall index (the grader then judges the means on their own chart). */
    private boolean overallIndex() {
        return !request.requirement().index().usesWithinSigma();
    }

    /** The chart pair the grader draws for this n. */
    ChartKind chart() {
        return chart;
    }

    /** The whole procedure's power with k planned subgroups (see {@link ProcedurePower}). */
    double power(int k) {
        Double known = powers.get(k);
        if (known != null) {
            return known;
        }
        double p = ProcedurePower.of(k, request.lossRate(), smallestK, this::boundPower, falseUnstable(k));
        powers.put(k, p);
        bestPower = Math.max(bestPower, p);
        return p;
    }

    /** The whole procedure's power at the true index c with Cp c/keep (the operating characteristic). */
    double powerAt(int k, double trueIndex, double trueCp) {
        return ProcedurePower.of(k, request.lossRate(), smallestK, kk -> model(kk).power(trueIndex, trueCp),
                falseUnstable(k));
    }

    /** The whole procedure's power with k subgroups and the stability gate's rate u given. */
    double powerWithUnstable(int k, double unstable) {
        return ProcedurePower.of(k, request.lossRate(), smallestK, this::boundPower, unstable);
    }

    /** The power the search uses: the gate's rate taken at the floor. */
    private double searchPower(int k) {
        double p = powerWithUnstable(k, searchUnstable);
        bestPower = Math.max(bestPower, p);
        return p;
    }

    private boolean passes(int k) {
        return searchPower(k) >= request.power();
    }

    /** The design row, or null when the power cannot be reached within the largest study. */
    DesignRow row() {
        PracticeFloors floors = request.floors();
        int floor = Math.max(smallestK, floors.subgroupsFor(n));
        if (floor > largestK) {
            return null;
        }
        LimitedBy floorKind = floors.minSubgroups() >= (floors.minReadings() + n - 1) / n
                ? LimitedBy.MIN_SUBGROUPS : LimitedBy.MIN_READINGS;
        double wanted = request.power();
        // the gate's rate for the search: simulated at the floor when the floor may well be the answer (its row
        // needs it anyway), else a typical rate; the settling below uses each k's own rate
        searchUnstable = powerWithUnstable(floor, 0) >= wanted ? falseUnstable(floor) : TYPICAL_UNSTABLE;
        int found = search(floor);
        if (found < 0) {
            return null;
        }
        int k = found;
        while (power(k) < wanted) {
            if (k == largestK) {
                return null;
            }
            k++;
        }
        // one subgroup fewer can only pass if it passes with no stability losses at all: simulate only then
        while (k > floor && powerWithUnstable(k - 1, 0) >= wanted && power(k - 1) >= wanted) {
            k--;
        }
        if (k == floor) {
            boolean powerAlone = floor > smallestK && !passes(floor - 1);
            return rowAt(floor, powerAlone ? LimitedBy.POWER : floorKind);
        }
        return rowAt(k, LimitedBy.POWER);
    }

    /**
     * The smallest k (from the floor up, no floors applied: from the smallest the estimator allows) whose bound
     * alone reaches the wanted power, or −1: the design the published sample-size tables give, which count no
     * gates (for checking against them).
     */
    int boundOnlySubgroups() {
        return search(smallestK, k -> boundPower(k) >= request.power());
    }

    /** The smallest k from the floor up that passes with the search's gate rate; −1 when none does. */
    private int search(int floor) {
        return search(floor, this::passes);
    }

    private int search(int floor, java.util.function.IntPredicate passes) {
        if (passes.test(floor)) {
            return floor;
        }
        int fail = floor;
        int step = Math.max(1, floor / 2);
        int pass = -1;
        while (pass < 0) {
            int next = Math.min(largestK, fail + step);
            if (passes.test(next)) {
                pass = next;
            } else if (next == largestK) {
                return -1;
            } else {
                fail = next;
                step *= 2;
            }
        }
        while (pass - fail > 1) {
            int mid = (pass + fail) >>> 1;
            if (passes.test(mid)) {
                pass = mid;
            } else {
                fail = mid;
            }
        }
        for (int back = 2; back <= StudyDesigner.STEP_BACK && pass - back > floor; back++) {
            if (passes.test(pass - back)) {
                pass -= back;
                back = 1;
            }
        }
        return pass;
    }

    DesignRow rowAt(int k, LimitedBy limitedBy) {
        Expectation e = request.expectation();
        double offset = 1 - e.index() / e.potentialOrIndex();
        double shift = request.shift();
        StabilityRisk.Figures grader = StabilityRisk.of(chart, n, k, shift, overallIndex());
        ChartRisk anyFalseAlarm = new ChartRisk(ChartRisks.falseAlarm(k), RuleRisks.falseAlarm(k));
        ChartRisk anyDetection = new ChartRisk(ChartRisks.detection(k, n, shift), RuleRisks.detection(k, n, shift));
        return new DesignRow(n, k, n * k, power(k), boundPower(k), model(k).criticalEstimate(offset), nu(k), limitedBy,
                grader.falseUnstable(), grader.detection(), shift, anyFalseAlarm, anyDetection);
    }
}

package dev.proofrun.design;

import dev.proofrun.stats.SigmaMethod;
import java.util.HashMap;
import java.util.Map;

/** The search for k at one subgroup size n (see {@link StudyDesigner}); caches the power at each k. */
final class SizeSearch {

    private final DesignRequest request;
    private final int n;
    private final SigmaMethod sigma;
    private final Map<Integer, StudyPower> models = new HashMap<>();
    private final Map<Integer, Double> powers = new HashMap<>();
    private final int smallestK;
    private final int largestK;
    private double bestPower;

    SizeSearch(DesignRequest request, int n) {
        this.request = request;
        this.n = n;
        this.sigma = request.sigmaFor(n);
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

    double power(int k) {
        return powers.computeIfAbsent(k, kk -> {
            double p = model(kk).power(request.expectation().index(), request.expectation().potentialOrIndex());
            bestPower = Math.max(bestPower, p);
            return p;
        });
    }

    private boolean passes(int k) {
        return power(k) >= request.power();
    }

    /** The design row, or null when the power cannot be reached within the largest study. */
    DesignRow row() {
        Floors floors = request.floors();
        int floor = Math.max(smallestK, floors.subgroupsFor(n));
        if (floor > largestK) {
            return null;
        }
        LimitedBy floorKind = floors.minSubgroups() >= (floors.minReadings() + n - 1) / n
                ? LimitedBy.MIN_SUBGROUPS : LimitedBy.MIN_READINGS;
        if (passes(floor)) {
            boolean powerAlone = floor > smallestK && !passes(floor - 1);
            return rowAt(floor, powerAlone ? LimitedBy.POWER : floorKind);
        }
        int fail = floor;
        int step = Math.max(1, floor / 2);
        int pass = -1;
        while (pass < 0) {
            int next = Math.min(largestK, fail + step);
            if (passes(next)) {
                pass = next;
            } else if (next == largestK) {
                return null;
            } else {
                fail = next;
                step *= 2;
            }
        }
        while (pass - fail > 1) {
            int mid = (pass + fail) >>> 1;
            if (passes(mid)) {
                pass = mid;
            } else {
                fail = mid;
            }
        }
        for (int back = 2; back <= StudyDesigner.STEP_BACK && pass - back > floor; back++) {
            if (passes(pass - back)) {
                pass -= back;
                back = 1;
            }
        }
        return rowAt(pass, LimitedBy.POWER);
    }

    private DesignRow rowAt(int k, LimitedBy limitedBy) {
        Expectation e = request.expectation();
        double offset = 1 - e.index() / e.potentialOrIndex();
        double shift = request.shift();
        ChartRisk falseAlarm = new ChartRisk(ChartRisks.falseAlarm(k), RuleRisks.falseAlarm(k));
        ChartRisk detection = new ChartRisk(ChartRisks.detection(k, n, shift), RuleRisks.detection(k, n, shift));
        return new DesignRow(n, k, n * k, power(k), model(k).criticalEstimate(offset), nu(k), limitedBy,
                falseAlarm, detection);
    }
}

package dev.proofrun.design;

import dev.proofrun.stats.Cancellation;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * One staged design evaluated at a given most subgroups K, for {@link StagedDesigner}: simulate, calibrate the
 * efficacy levels at c₀, the futility boundaries at c₁, then the chances and expected readings with every gate.
 */
final class StagedEvaluation {

    private final DesignRequest request;
    private final SizeSearch search;
    private final int stages;
    private final Spending spending;
    private final IndexShape shape;
    private final boolean usesWithin;
    private final double c0;
    private final double alpha;
    private final DesignRow single;

    StagedEvaluation(DesignRequest request, SizeSearch search, DesignRow single, int stages, Spending spending) {
        this.request = request;
        this.single = single;
        this.search = search;
        this.stages = stages;
        this.spending = spending;
        this.shape = request.shape();
        this.usesWithin = request.requirement().index().usesWithinSigma();
        this.c0 = request.requirement().minimum();
        this.alpha = 1 - request.requirement().confidence();
    }

    /** The staged design with K = {@code subgroups}. */
    StagedDesign at(int subgroups) {
        int n = search.subgroupSize();
        int[] looks = StagedDesigner.looks(subgroups, stages);
        StagedPaths paths = StagedPaths.simulate(n, looks, request.sigmaFor(n), StagedDesigner.PATHS,
                StagedDesigner.SEED);
        double ceiling = Math.min(0.45, 3 * alpha);
        List<double[][]> centrings = new ArrayList<>();
        List<Estimates> atTarget = new ArrayList<>();
        for (double cp : targetCentrings()) {
            Estimates e = new Estimates(paths, c0, cp);
            atTarget.add(e);
            centrings.add(pValues(paths, e, ceiling));
        }
        // no look is less strict than the plan's stated confidence (a reader of any look's bound can take it at
        // its word, and a plan file's looks can be checked against it); the last look may otherwise come out a
        // hair above α where the exact bound is conservative at the centrings tried
        double[] levels = StagedDesigner.calibrate(alpha, spending, looks, centrings, Math.min(ceiling, alpha));
        StudyPower[] bounds = new StudyPower[stages];
        for (int j = 0; j < stages; j++) {
            bounds[j] = new StudyPower(shape, request.boundMethod(), c0, 1 - levels[j], paths.readingsAt(j),
                    paths.nuAt(j, usesWithin), usesWithin);
        }
        Expectation exp = request.expectation();
        Estimates expected = new Estimates(paths, exp.index(), exp.potentialOrIndex());
        double[] futility = futility(paths, expected, bounds, looks);
        double[] gates = new double[stages];
        for (int j = 0; j < stages; j++) {
            gates[j] = (1 - ProcedurePower.NORMAL_SHAPE_REJECTION) * (1 - search.falseUnstable(looks[j]));
        }
        Outcome one = outcome(paths, expected, bounds, futility, gates);
        Outcome zero = null;
        for (Estimates e : atTarget) {
            Outcome o = outcome(paths, e, bounds, futility, gates);
            if (zero == null || o.pass > zero.pass) {
                zero = o;
            }
        }
        double offset = 1 - exp.index() / exp.potentialOrIndex();
        List<Look> contract = new ArrayList<>();
        List<StagedLook> shown = new ArrayList<>();
        for (int j = 0; j < stages; j++) {
            contract.add(new Look(looks[j], 1 - levels[j], futility[j]));
            shown.add(new StagedLook(looks[j], paths.readingsAt(j), 1 - levels[j],
                    bounds[j].criticalEstimate(offset), futility[j], zero.stop[j], one.stop[j]));
        }
        return new StagedDesign(new Stages(spending, contract), n, shown, one.pass, one.boundPass, zero.pass,
                zero.expectedReadings(paths), one.expectedReadings(paths), paths.readingsAt(stages - 1), single,
                paths.paths());
    }

    /**
     * The mean readings a study of these planned looks collects when the true index is each of {@code trueIndices}
     * at the expected centring (the expected Cp/Cpk ratio kept): the same simulated studies, bounds at the looks'
     * confidences, futility stops honoured and every gate counted, as {@link #at} computes them at c₀ and c₁; and
     * the chance of demonstrated at some look (the staged study's operating characteristic): [0] readings, [1] chance.
     */
    double[][] expectedReadings(Stages contract, double[] trueIndices) {
        int n = search.subgroupSize();
        int[] looks = contract.looks().stream().mapToInt(Look::subgroups).toArray();
        StagedPaths paths = StagedPaths.simulate(n, looks, request.sigmaFor(n), StagedDesigner.PATHS,
                StagedDesigner.SEED);
        StudyPower[] bounds = new StudyPower[stages];
        double[] futility = new double[stages];
        double[] gates = new double[stages];
        for (int j = 0; j < stages; j++) {
            Look l = contract.looks().get(j);
            bounds[j] = new StudyPower(shape, request.boundMethod(), c0, l.confidence(), paths.readingsAt(j),
                    paths.nuAt(j, usesWithin), usesWithin);
            futility[j] = l.futility();
            gates[j] = (1 - ProcedurePower.NORMAL_SHAPE_REJECTION) * (1 - search.falseUnstable(looks[j]));
        }
        Expectation exp = request.expectation();
        double ratio = exp.potentialOrIndex() / exp.index();
        double[][] out = new double[2][trueIndices.length];
        Cancellation cancel = Cancellation.ofCallingThread();
        for (int t = 0; t < trueIndices.length; t++) {
            cancel.check();
            Estimates e = new Estimates(paths, trueIndices[t], trueIndices[t] * ratio);
            Outcome o = outcome(paths, e, bounds, futility, gates);
            out[0][t] = o.expectedReadings(paths);
            out[1][t] = o.pass;
        }
        return out;
    }

    /** The true Cp values tried at c₀: centred and off centre for a two-sided Cpk/Ppk, else the index itself. */
    private double[] targetCentrings() {
        if (shape == IndexShape.TWO_SIDED_MIN) {
            return new double[] {c0, StagedDesigner.OFF_CENTRE * c0};
        }
        return new double[] {c0};
    }

    /** Each study's p-value at each look; 1 where the estimate is below the smallest that passes at the ceiling. */
    private double[][] pValues(StagedPaths paths, Estimates e, double ceiling) {
        double[][] p = new double[stages][paths.paths()];
        for (int j = 0; j < stages; j++) {
            int jj = j;
            StudyPower loosest = new StudyPower(shape, request.boundMethod(), c0, 1 - ceiling, paths.readingsAt(j),
                    paths.nuAt(j, usesWithin), usesWithin);
            // the smallest estimate that passes at the ceiling's level (centred: the exact bound's ĉ* rises with k̂),
            // with a margin so that no study whose p-value is below the ceiling is left out
            double screen = Math.max(c0, 0.98 * loosest.criticalEstimate(0));
            Cancellation cancel = Cancellation.ofCallingThread();
            java.util.stream.IntStream.range(0, paths.paths()).parallel().forEach(i -> {
                cancel.check();
                double est = e.estimate[jj][i];
                p[jj][i] = est < screen ? 1 : LookPValue.of(shape, request.boundMethod(), c0, est, e.cp[jj][i],
                        paths.readingsAt(jj), paths.nuAt(jj, usesWithin));
            });
        }
        return p;
    }

    /** Whether study i passes the bound at look j: the estimate at or above the look's ĉ* at its centring. */
    private static boolean passes(Estimates e, StudyPower bound, double c0, int j, int i) {
        double est = e.estimate[j][i];
        if (!(est >= c0)) {
            return false;
        }
        double offset = Double.isNaN(e.cp[j][i]) ? 0 : Math.max(0, 1 - est / e.cp[j][i]);
        return est >= bound.criticalEstimate(offset);
    }

    private double[] futility(StagedPaths paths, Estimates e, StudyPower[] bounds, int[] looks) {
        double[] f = new double[stages];
        Arrays.fill(f, Double.NaN);
        double beta = 1 - request.power();
        int total = paths.paths();
        boolean[] out = new boolean[total];
        long stoppedSoFar = 0;
        for (int j = 0; j < stages - 1; j++) {
            double t = looks[j] / (double) looks[stages - 1];
            long allowed = (long) Math.floor(spending.spent(beta, t) * total + 1e-9);
            double[] candidates = new double[total];
            int m = 0;
            for (int i = 0; i < total; i++) {
                if (!out[i] && passes(e, bounds[j], c0, j, i)) {
                    out[i] = true;
                } else if (!out[i]) {
                    candidates[m++] = e.estimate[j][i];
                }
            }
            Arrays.sort(candidates, 0, m);
            int more = (int) Math.min(m, allowed - stoppedSoFar);
            if (more > 0) {
                double at = more < m ? 0.5 * (candidates[more - 1] + candidates[more]) : Math.nextUp(candidates[m - 1]);
                f[j] = Math.min(at, bounds[j].criticalEstimate(0));
                for (int i = 0; i < total; i++) {
                    if (!out[i] && e.estimate[j][i] < f[j]) {
                        out[i] = true;
                        stoppedSoFar++;
                    }
                }
            }
        }
        return f;
    }

    private Outcome outcome(StagedPaths paths, Estimates e, StudyPower[] bounds, double[] futility, double[] gates) {
        int total = paths.paths();
        boolean[] out = new boolean[total];
        double[] reach = new double[stages + 1];
        double[] demonstrated = new double[stages];
        int running = total;
        for (int j = 0; j < stages; j++) {
            reach[j] = running / (double) total;
            int passed = 0;
            int stopped = 0;
            for (int i = 0; i < total; i++) {
                if (out[i]) {
                    continue;
                }
                if (passes(e, bounds[j], c0, j, i)) {
                    passed++;
                    out[i] = true;
                } else if (j == stages - 1 || e.estimate[j][i] < futility[j]) {
                    stopped++;
                    out[i] = true;
                }
            }
            demonstrated[j] = passed / (double) total;
            running -= passed + stopped;
        }
        return new Outcome(reach, demonstrated, gates);
    }

    /** The index estimate (and Ĉp for a two-sided Cpk/Ppk) of every study at every look, for one true process. */
    private final class Estimates {
        final double[][] estimate;
        final double[][] cp;

        /** σ = 1; two-sided: limits ±3·Cp, mean 3(Cp − C) above the middle; one-sided: limit 3C above a mean of 0. */
        Estimates(StagedPaths paths, double trueIndex, double trueCp) {
            estimate = new double[stages][paths.paths()];
            cp = new double[stages][paths.paths()];
            double half = 3 * trueCp;
            double mu = half - 3 * trueIndex;
            for (int j = 0; j < stages; j++) {
                for (int i = 0; i < paths.paths(); i++) {
                    double sigma = paths.sigmaAt(j, i, usesWithin);
                    double mean = paths.meanAt(j, i);
                    switch (shape) {
                        case SPREAD:
                            estimate[j][i] = trueIndex / sigma;
                            cp[j][i] = Double.NaN;
                            break;
                        case ONE_SIDED:
                            estimate[j][i] = (3 * trueIndex - mean) / (3 * sigma);
                            cp[j][i] = Double.NaN;
                            break;
                        default:
                            estimate[j][i] = (half - Math.abs(mu + mean)) / (3 * sigma);
                            cp[j][i] = half / (3 * sigma);
                    }
                }
            }
        }
    }

    /** The chances of one true process: bounds and futility from the studies, then the gates at every look. */
    private static final class Outcome {
        final double[] stop;
        final double pass;
        final double boundPass;

        Outcome(double[] reachBound, double[] demonstrated, double[] gates) {
            int stages = demonstrated.length;
            double survive = 1;
            double pass = 0;
            double boundPass = 0;
            double[] reach = new double[stages + 1];
            for (int j = 0; j < stages; j++) {
                reach[j] = reachBound[j] * survive;
                survive *= gates[j];
                pass += demonstrated[j] * survive;
                boundPass += demonstrated[j];
            }
            this.stop = new double[stages];
            for (int j = 0; j < stages; j++) {
                stop[j] = reach[j] - reach[j + 1];
            }
            this.pass = pass;
            this.boundPass = boundPass;
        }

        double expectedReadings(StagedPaths paths) {
            double sum = 0;
            for (int j = 0; j < stop.length; j++) {
                sum += stop[j] * paths.readingsAt(j);
            }
            return sum;
        }
    }
}

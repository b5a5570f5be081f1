package dev.proofrun.design;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.stats.WithinSigma;
import dev.proofrun.text.UserException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.TreeSet;

/**
 * Plans a capability study: for each candidate subgroup size n, the smallest number of subgroups k whose
 * power (the chance that the grader returns demonstrated when the process is as expected — the exact power of
 * the lower bound, see {@link StudyPower}, with every gate of the grader counted, see {@link ProcedurePower})
 * reaches the wanted power, raised to the practice {@link PracticeFloors};
 * the stability side of each design ({@link ChartRisks}, {@link RuleRisks}); a recommended design; the
 * operating-characteristic curve and the power curve.
 *
 * <p>Search for k (power need not be monotone in k: N is discrete and the effective degrees of freedom of
 * the range and moving-range estimators are approximations): start at the floor; if the floor already has
 * the power, test k − 1 to tell "power" from a floor; otherwise double the step until the power is reached,
 * bisect, then step back up to {@value #STEP_BACK} subgroups below the answer and keep the smallest k that
 * still reaches the power.
 *
 * <p>Refusals ({@link UserException}): c₁ ≤ c₀; the power not reachable within {@value #MAX_READINGS}
 * readings for any candidate n.
 */
public final class StudyDesigner {

    /** Largest study the designer considers. */
    public static final int MAX_READINGS = 10_000;
    static final int STEP_BACK = 3;
    private static final int OC_POINTS = 41;
    private static final int CURVE_POINTS = 20;

    private StudyDesigner() {
    }

    /**
     * The design table for one characteristic.
     *
     * @throws UserException if c₁ ≤ c₀, or the power cannot be reached within 10,000 readings
     */
    public static DesignTable design(DesignRequest request) {
        Requirement req = request.requirement();
        Expectation exp = request.expectation();
        request.requireAttainable();
        List<String> warnings = new ArrayList<>(request.notes());
        if (exp.potential().isPresent() && request.shape() != IndexShape.TWO_SIDED_MIN) {
            warnings.add(DesignMessage.POTENTIAL_IGNORED.format(req.index().symbol()));
        }
        List<DesignRow> rows = new ArrayList<>();
        double bestPower = 0;
        int bestN = request.subgroupSizes().get(0);
        // the sizes are independent searches (each may simulate the grader's stability decision): both cores
        List<SizeSearch> searches = request.subgroupSizes().stream().map(n -> new SizeSearch(request, n)).toList();
        List<Optional<DesignRow>> found = searches.parallelStream().map(s -> Optional.ofNullable(s.row())).toList();
        for (int i = 0; i < searches.size(); i++) {
            SizeSearch search = searches.get(i);
            int n = search.subgroupSize();
            DesignRow row = found.get(i).orElse(null);
            if (row == null) {
                warnings.add(DesignMessage.UNREACHABLE_FOR_SIZE.format(n, request.power(), MAX_READINGS));
                if (search.bestPower() > bestPower) {
                    bestPower = search.bestPower();
                    bestN = n;
                }
            } else {
                rows.add(row);
            }
        }
        if (rows.isEmpty()) {
            throw new UserException(DesignMessage.UNREACHABLE, request.power(), MAX_READINGS, bestPower, bestN);
        }
        DesignRow best = recommend(rows);
        String reason = reason(request, best, rows);
        SizeSearch chosen = searches.get(request.subgroupSizes().indexOf(best.subgroupSize()));
        return new DesignTable(rows, best, reason, operatingCharacteristic(request, chosen, best.subgroups()),
                powerCurve(chosen, best.subgroups()), warnings);
    }

    /** Fewest readings; on a tie, more subgroups. */
    static DesignRow recommend(List<DesignRow> rows) {
        return rows.stream().min(Comparator.comparingInt(DesignRow::readings)
                .thenComparing(Comparator.comparingInt(DesignRow::subgroups).reversed())).orElseThrow();
    }

    private static String reason(DesignRequest request, DesignRow best, List<DesignRow> rows) {
        long sameSize = rows.stream().filter(r -> r.readings() == best.readings()).count();
        String tie = sameSize > 1 ? "; of the designs with as many readings it has the most subgroups" : "";
        String why;
        switch (best.limitedBy()) {
            case POWER:
                why = String.format(Locale.ROOT, "the fewest readings that reach %.0f %% power", 100 * request.power());
                break;
            case MIN_SUBGROUPS:
                why = String.format(Locale.ROOT, "the fewest readings that meet the floor of %d subgroups (power %.3f)",
                        request.floors().minSubgroups(), best.power());
                break;
            default:
                why = String.format(Locale.ROOT, "the fewest readings that meet the floor of %d readings (power %.3f)",
                        request.floors().minReadings(), best.power());
        }
        return String.format(Locale.ROOT, "%d subgroups of %d (%d readings) is %s of every size tried%s.",
                best.subgroups(), best.subgroupSize(), best.readings(), why, tie);
    }

    /**
     * The power of one given design — k subgroups of n — for the request: the chance that the grader returns
     * demonstrated when the process is as expected, every gate counted ({@link ProcedurePower}), computed as the table's rows are (a plan that keeps its
     * own k needs its power, not a value read between points of the power curve).
     *
     * @throws IllegalArgumentException if n &lt; 1, if k is too small for the estimator to have 2 degrees of
     *         freedom, if n·k exceeds {@value #MAX_READINGS}
     */
    public static double power(DesignRequest request, int n, int k) {
        SizeSearch search = searchFor(request, n, k);
        return search.power(k);
    }

    /** The search for subgroups of {@code n}, refusing an n below 1 or a k it cannot evaluate. */
    private static SizeSearch searchFor(DesignRequest request, int n, int k) {
        if (n < 1) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "subgroup size %d is below 1", n));
        }
        SizeSearch search = new SizeSearch(request, n);
        if (k < search.smallestK() || k > search.largestK()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%d subgroups of %d is outside %d..%d, the studies the designer can evaluate", k, n,
                    search.smallestK(), search.largestK()));
        }
        return search;
    }

    /**
     * The operating characteristic of one given design — k subgroups of n — computed as the table's is for its
     * recommended row, so that a plan keeping another k (its own, or a design shared by several characteristics)
     * shows the curve of the k it will use.
     *
     * @throws IllegalArgumentException as {@link #power(DesignRequest, int, int)}
     */
    public static List<OcPoint> operatingCharacteristic(DesignRequest request, int n, int k) {
        SizeSearch search = searchFor(request, n, k);
        return operatingCharacteristic(request, search, k);
    }

    private static List<OcPoint> operatingCharacteristic(DesignRequest request, SizeSearch search, int k) {
        double c0 = request.requirement().minimum();
        double c1 = request.expectation().index();
        double lo = Math.max(0.05 * c0, c0 - (c1 - c0));
        double hi = c1 + (c1 - c0);
        double keep = c1 / request.expectation().potentialOrIndex();
        // an even grid, plus c0 and c1 themselves: the curve's two readings that matter (the customer's
        // risk at the requirement, the power at the expectation) are computed, not interpolated
        TreeSet<Double> at = new TreeSet<>(List.of(c0, c1));
        for (int i = 0; i < OC_POINTS; i++) {
            double c = lo + (hi - lo) * i / (OC_POINTS - 1);
            if (Math.abs(c - c0) > 1e-9 * c0 && Math.abs(c - c1) > 1e-9 * c1) {
                at.add(c);
            }
        }
        List<OcPoint> points = new ArrayList<>(at.size());
        for (double c : at) {
            points.add(new OcPoint(c, search.powerAt(k, c, c / keep)));
        }
        return points;
    }

    private static List<PowerPoint> powerCurve(SizeSearch search, int chosenK) {
        int first = search.smallestK();
        int last = Math.min(search.largestK(), Math.max(2 * chosenK, chosenK + 10));
        int step = Math.max(1, (last - first) / CURVE_POINTS);
        List<PowerPoint> points = new ArrayList<>();
        // the stability gate's rate costs a simulation per k; over the curve it changes by tenths of a percent,
        // so the curve takes it at the chosen k (the rows and power(request, n, k) take it at their own k)
        double unstable = search.falseUnstable(chosenK);
        for (int k = first; k <= last; k += step) {
            points.add(new PowerPoint(k, k * search.subgroupSize(), search.powerWithUnstable(k, unstable)));
        }
        return points;
    }

    /** The degrees of freedom of the sigma estimate behind the index for n, k. */
    static double degreesOfFreedom(IndexKind kind, SigmaMethod method, int n, int k) {
        if (!kind.usesWithinSigma()) {
            return n * k - 1.0;
        }
        return WithinSigma.degreesOfFreedom(method, n, k);
    }
}

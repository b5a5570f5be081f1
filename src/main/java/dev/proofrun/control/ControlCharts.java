package dev.proofrun.control;

import dev.proofrun.stats.ChartConstants;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Control-chart limits computed from the data (a study's own limits, "phase I"), with the run rules applied.
 *
 * <p>Limits are 3σ limits around the centre line; σ̂_w comes from the chart's own spread statistic (see
 * {@link ChartKind}). For a subgroup of size nᵢ the mean chart's point has σ = σ̂/√nᵢ; the range chart's
 * centre is d2(nᵢ)·σ̂ with σ = d3(nᵢ)·σ̂; the s chart's centre c4(nᵢ)·σ̂ with σ = σ̂·sqrt(1 − c4(nᵢ)²); the
 * moving-range chart's centre d2(2)·σ̂ with σ = d3(2)·σ̂. A lower limit below zero on a spread chart is
 * set to zero (the factors D3, B3 do the same).
 *
 * <p><b>Unequal subgroup sizes</b> (a subgroup came back short): σ̂ is the average of the per-subgroup
 * unbiased estimates, σ̂ = (1/k)·Σ Rᵢ/d2(nᵢ) or (1/k)·Σ sᵢ/c4(nᵢ), each point gets the limits of its
 * own size (Montgomery, ISQC, section 6.3.2 treats the s chart this way), the reported single limits are
 * those of the most frequent size, and the centre of the mean chart is the grand mean of all readings.
 *
 * <p><b>Rules</b>: the chosen run rules apply to the location chart. On the spread chart only
 * {@link RunRule#BEYOND_LIMITS} applies (common practice: ranges and standard deviations are skewed, and
 * moving ranges overlap and are correlated, so the zone rules' false-alarm rates do not hold there).
 *
 * <p><b>Zero spread</b> (σ̂ = 0, e.g. a gauge too coarse for the process): a point on the centre line has
 * z = 0, a point off it z = ±{@link Double#MAX_VALUE} — beyond the limits, which is what such a chart shows.
 */
public final class ControlCharts {

    private static final Set<RunRule> SPREAD_RULES = EnumSet.of(RunRule.BEYOND_LIMITS);

    private ControlCharts() {
    }

    /**
     * Builds both charts.
     *
     * @param kind          which pair
     * @param subgroups     the readings by subgroup, in time order
     * @param locationRules rules applied to the location chart
     * @throws IllegalArgumentException if fewer than 2 subgroups
     * @throws IllegalArgumentException if a subgroup has fewer than 2 readings for X̄–R/X̄–S, or not
     *                                  exactly 1 for individuals, or more than 50 for X̄–R
     * @throws IllegalArgumentException if a reading is not finite
     */
    public static ChartPair of(ChartKind kind, List<double[]> subgroups, Set<RunRule> locationRules) {
        int k = subgroups.size();
        if (k < 2) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "a control chart needs at least 2 subgroups: %d", k));
        }
        for (int i = 0; i < k; i++) {
            double[] g = subgroups.get(i);
            for (double v : g) {
                if (!Double.isFinite(v)) {
                    throw new IllegalArgumentException(String.format(Locale.ROOT, "subgroup %d has a reading that is not finite: %s", i + 1, v));
                }
            }
            if (kind == ChartKind.INDIVIDUALS ? g.length != 1 : g.length < 2) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "subgroup %d has %d readings, which does not suit a %s chart", i + 1, g.length, kind.token()));
            }
            if (kind == ChartKind.XBAR_R && g.length > ChartConstants.MAX_SIZE) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "subgroup %d has %d readings; ranges are used up to %d", i + 1, g.length, ChartConstants.MAX_SIZE));
            }
        }
        return kind == ChartKind.INDIVIDUALS ? individuals(subgroups, locationRules) : subgrouped(kind, subgroups, locationRules);
    }

    private static ChartPair subgrouped(ChartKind kind, List<double[]> subgroups, Set<RunRule> rules) {
        int k = subgroups.size();
        double[] means = new double[k];
        double[] spreads = new double[k];
        int[] sizes = new int[k];
        double total = 0;
        long count = 0;
        double sigmaSum = 0;
        boolean ranges = kind == ChartKind.XBAR_R;
        for (int i = 0; i < k; i++) {
            double[] g = subgroups.get(i);
            int n = g.length;
            sizes[i] = n;
            double sum = 0;
            double min = Double.POSITIVE_INFINITY;
            double max = Double.NEGATIVE_INFINITY;
            for (double v : g) {
                sum += v;
                min = Math.min(min, v);
                max = Math.max(max, v);
            }
            double mean = sum / n;
            means[i] = mean;
            total += sum;
            count += n;
            if (ranges) {
                spreads[i] = max - min;
                sigmaSum += spreads[i] / ChartConstants.d2(n);
            } else {
                double ss = 0;
                for (double v : g) {
                    ss += (v - mean) * (v - mean);
                }
                spreads[i] = Math.sqrt(ss / (n - 1));
                sigmaSum += spreads[i] / ChartConstants.c4(n);
            }
        }
        double sigma = sigmaSum / k;
        double grand = total / count;
        int nominal = mostFrequent(sizes);

        double[] zMean = new double[k];
        double[] uMean = new double[k];
        double[] lMean = new double[k];
        double[] zSpread = new double[k];
        double[] uSpread = new double[k];
        double[] lSpread = new double[k];
        for (int i = 0; i < k; i++) {
            double sdMean = sigma / Math.sqrt(sizes[i]);
            zMean[i] = standardize(means[i], grand, sdMean);
            uMean[i] = grand + 3 * sdMean;
            lMean[i] = grand - 3 * sdMean;
            double centre = spreadCentre(ranges, sizes[i]) * sigma;
            double sdSpread = spreadSd(ranges, sizes[i]) * sigma;
            zSpread[i] = standardize(spreads[i], centre, sdSpread);
            uSpread[i] = centre + 3 * sdSpread;
            lSpread[i] = Math.max(0, centre - 3 * sdSpread);
        }
        double sdNominal = sigma / Math.sqrt(nominal);
        ControlChart location = new ControlChart(ChartStatistic.MEAN, grand, grand + 3 * sdNominal, grand - 3 * sdNominal,
                means, zMean, uMean, lMean, 0, RunRules.scan(zMean, rules));
        double c = spreadCentre(ranges, nominal) * sigma;
        double sd = spreadSd(ranges, nominal) * sigma;
        ControlChart spread = new ControlChart(kind.spread(), c, c + 3 * sd, Math.max(0, c - 3 * sd),
                spreads, zSpread, uSpread, lSpread, 0, RunRules.scan(zSpread, SPREAD_RULES));
        return new ChartPair(kind, location, spread, sigma);
    }

    private static ChartPair individuals(List<double[]> subgroups, Set<RunRule> rules) {
        int k = subgroups.size();
        double[] x = new double[k];
        double sum = 0;
        for (int i = 0; i < k; i++) {
            x[i] = subgroups.get(i)[0];
            sum += x[i];
        }
        double mean = sum / k;
        double[] mr = new double[k - 1];
        double mrSum = 0;
        for (int i = 1; i < k; i++) {
            mr[i - 1] = Math.abs(x[i] - x[i - 1]);
            mrSum += mr[i - 1];
        }
        double mrBar = mrSum / (k - 1);
        double sigma = mrBar / ChartConstants.d2(2);
        double[] zx = new double[k];
        double[] ux = new double[k];
        double[] lx = new double[k];
        for (int i = 0; i < k; i++) {
            zx[i] = standardize(x[i], mean, sigma);
            ux[i] = mean + 3 * sigma;
            lx[i] = mean - 3 * sigma;
        }
        double sdMr = ChartConstants.d3(2) * sigma;
        double[] zmr = new double[k - 1];
        double[] umr = new double[k - 1];
        double[] lmr = new double[k - 1];
        for (int i = 0; i < k - 1; i++) {
            zmr[i] = standardize(mr[i], mrBar, sdMr);
            umr[i] = mrBar + 3 * sdMr;
            lmr[i] = Math.max(0, mrBar - 3 * sdMr);
        }
        ControlChart location = new ControlChart(ChartStatistic.INDIVIDUAL, mean, mean + 3 * sigma, mean - 3 * sigma,
                x, zx, ux, lx, 0, RunRules.scan(zx, rules));
        ControlChart spread = new ControlChart(ChartStatistic.MOVING_RANGE, mrBar, mrBar + 3 * sdMr,
                Math.max(0, mrBar - 3 * sdMr), mr, zmr, umr, lmr, 1, RunRules.scan(zmr, SPREAD_RULES));
        return new ChartPair(ChartKind.INDIVIDUALS, location, spread, sigma);
    }

    private static double spreadCentre(boolean ranges, int n) {
        return ranges ? ChartConstants.d2(n) : ChartConstants.c4(n);
    }

    private static double spreadSd(boolean ranges, int n) {
        if (ranges) {
            return ChartConstants.d3(n);
        }
        double c4 = ChartConstants.c4(n);
        return Math.sqrt(1 - c4 * c4);
    }

    private static double standardize(double point, double centre, double sd) {
        if (sd > 0) {
            return (point - centre) / sd;
        }
        if (point == centre) {
            return 0;
        }
        return Math.copySign(Double.MAX_VALUE, point - centre);
    }

    private static int mostFrequent(int[] sizes) {
        int[] sorted = sizes.clone();
        java.util.Arrays.sort(sorted);
        int best = sorted[0];
        int bestCount = 0;
        int run = 0;
        for (int i = 0; i < sorted.length; i++) {
            run = (i > 0 && sorted[i] == sorted[i - 1]) ? run + 1 : 1;
            if (run >= bestCount) {
                best = sorted[i];
                bestCount = run;
            }
        }
        return best;
    }
}

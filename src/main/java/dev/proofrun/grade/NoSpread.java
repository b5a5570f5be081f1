package dev.proofrun.grade;

import java.math.BigDecimal;
import java.util.List;
import java.util.Optional;

/**
 * Degenerate returns: readings without spread. When every reading is the same, or (subgroups of two or more) every
 * subgroup's readings are equal among themselves, the within-subgroup sigma is zero: control limits collapse onto
 * the centre line, σ_overall/σ_within is infinite and every index divides by zero. That is a measurement finding
 * (the gauge does not see the variation), not a statistical one, so the grader says it in words and the
 * characteristic is not valid — before the stability and shape steps, which would otherwise report the artefacts
 * of a zero sigma.
 */
final class NoSpread {

    private NoSpread() {
    }

    /** The finding, or empty when the readings have spread within the subgroups. */
    static Optional<Reason> check(List<double[]> subgroups) {
        double first = subgroups.get(0)[0];
        boolean allEqual = true;
        boolean eachEqual = true;
        double lowMean = Double.POSITIVE_INFINITY;
        double highMean = Double.NEGATIVE_INFINITY;
        long count = 0;
        for (double[] g : subgroups) {
            count += g.length;
            for (double v : g) {
                if (v != first) {
                    allEqual = false;
                }
                if (v != g[0]) {
                    eachEqual = false;
                }
            }
            lowMean = Math.min(lowMean, g[0]);
            highMean = Math.max(highMean, g[0]);
        }
        if (allEqual) {
            return Optional.of(new Reason(Step.STABILITY, true, GradeMessage.REASON_NO_SPREAD.format(count, plain(first))));
        }
        int n = subgroups.get(0).length;
        if (n > 1 && eachEqual) {
            return Optional.of(new Reason(Step.STABILITY, true,
                    GradeMessage.REASON_NO_SPREAD_WITHIN.format(n, plain(lowMean), plain(highMean))));
        }
        return Optional.empty();
    }

    /** 22.001, not 22.001000000000001 or 2.2001E1. */
    static String plain(double v) {
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
}

package dev.proofrun.design;

/**
 * ĉ*(k̂) for the exact two-sided Cpk bound: the smallest estimated Cpk that passes when the data show a
 * relative offset k̂ = 1 − Ĉpk/Ĉp. It depends on k̂ only through the term of the far specification limit,
 * whose weight falls with g = 6·c₀·√N·k̂/(1 − k̂) (the distance between the two limits' edges in standard
 * errors of the mean): ĉ* rises from its centred value at g = 0 to the one-sided value as g grows, and is
 * within 1e-6 of the one-sided value beyond g ≈ 13.
 *
 * <p>Tabulated lazily at fixed nodes in g and interpolated by a local cubic through the four nearest nodes;
 * {@code CriticalCurveTest} checks the interpolation against direct solutions.
 */
final class CriticalCurve {

    private static final double[] NODES = {0, 0.25, 0.5, 0.75, 1, 1.5, 2, 2.5, 3, 3.5, 4, 5, 6, 7, 8, 10, 13};
    private static final double LAST = NODES[NODES.length - 1];

    private final StudyPower power;
    private final double scale;
    private final double[] values = new double[NODES.length];
    private double oneSided = Double.NaN;

    CriticalCurve(StudyPower power) {
        this.power = power;
        this.scale = 6 * power.target() * power.rootN();
        java.util.Arrays.fill(values, Double.NaN);
    }

    /** ĉ* at relative offset k̂ ∈ [0, 1]. */
    double at(double relativeOffset) {
        if (relativeOffset >= 1) {
            return oneSided();
        }
        double g = scale * relativeOffset / (1 - relativeOffset);
        if (g >= LAST) {
            return oneSided();
        }
        int j = 0;
        while (NODES[j + 1] < g) {
            j++;
        }
        int first = Math.max(0, Math.min(j - 1, NODES.length - 4));
        double sum = 0;
        for (int a = first; a < first + 4; a++) {
            double l = 1;
            for (int b = first; b < first + 4; b++) {
                if (b != a) {
                    l *= (g - NODES[b]) / (NODES[a] - NODES[b]);
                }
            }
            sum += l * value(a);
        }
        return sum;
    }

    /** ĉ* solved directly at k̂ (for tests of the interpolation). */
    double direct(double relativeOffset) {
        return power.exactCriticalAt(relativeOffset, oneSided());
    }

    private double value(int i) {
        if (Double.isNaN(values[i])) {
            double g = NODES[i];
            double k = g / (g + scale);
            double guess = i > 0 && !Double.isNaN(values[i - 1]) ? values[i - 1] : oneSided();
            values[i] = power.exactCriticalAt(k, guess);
        }
        return values[i];
    }

    private double oneSided() {
        if (Double.isNaN(oneSided)) {
            oneSided = power.exactCriticalAt(1, power.bissellCritical());
        }
        return oneSided;
    }
}

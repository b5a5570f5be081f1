package dev.proofrun.design;

import java.util.Arrays;

/**
 * ĉ*(k̂) for the exact two-sided Cpk bound: the smallest estimated Cpk that passes when the data show a
 * relative offset k̂ = 1 − Ĉpk/Ĉp. It depends on k̂ only through the term of the far specification limit,
 * whose weight falls with g = 6·c₀·√N·k̂/(1 − k̂) (the distance between the two limits' edges in standard
 * errors of the mean): ĉ* rises from its centred value at g = 0 to the one-sided value as g grows, and is
 * within about 2e-5 of the one-sided value beyond g = {@value #LAST}.
 *
 * <p>Tabulated lazily at {@value #COUNT} Chebyshev–Lobatto nodes on g ∈ [0, {@value #LAST}] and interpolated
 * by the barycentric formula (Berrut &amp; Trefethen 2004, SIAM Review 46:501–517); beyond, the one-sided
 * value. Measured against direct solutions on a fine grid (N = 25–400, c₀ = 1–1.67) the error is below
 * 3e-5 in ĉ*; {@code CriticalCurveTest} checks it.
 */
final class CriticalCurve {

    static final int COUNT = 8;
    static final double LAST = 8;
    private static final double[] NODES = new double[COUNT];
    private static final double[] WEIGHTS = new double[COUNT];

    static {
        for (int j = 0; j < COUNT; j++) {
            NODES[j] = LAST * (1 - Math.cos(Math.PI * j / (COUNT - 1))) / 2;
            WEIGHTS[j] = ((j % 2 == 0) ? 1 : -1) * ((j == 0 || j == COUNT - 1) ? 0.5 : 1);
        }
    }

    private final StudyPower power;
    private final double scale;
    private double[] values;
    private double oneSided = Double.NaN;

    CriticalCurve(StudyPower power) {
        this.power = power;
        this.scale = 6 * power.target() * power.rootN();
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
        double[] v = values();
        double num = 0;
        double den = 0;
        for (int j = 0; j < COUNT; j++) {
            double diff = g - NODES[j];
            if (diff == 0) {
                return v[j];
            }
            double t = WEIGHTS[j] / diff;
            num += t * v[j];
            den += t;
        }
        return num / den;
    }

    /** ĉ* solved directly at k̂ (for tests of the interpolation). */
    double direct(double relativeOffset) {
        return power.exactCriticalAt(relativeOffset, oneSided());
    }

    private double[] values() {
        if (values == null) {
            double[] v = new double[COUNT];
            Arrays.fill(v, Double.NaN);
            double guess = oneSided();
            for (int j = COUNT - 1; j >= 0; j--) {
                double g = NODES[j];
                v[j] = power.exactCriticalAt(g / (g + scale), guess);
                guess = v[j];
            }
            values = v;
        }
        return values;
    }

    private double oneSided() {
        if (Double.isNaN(oneSided)) {
            oneSided = power.exactCriticalAt(1, power.bissellCritical());
        }
        return oneSided;
    }
}

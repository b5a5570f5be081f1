package dev.proofrun.stats;

/**
 * The grid the readings lie on: the largest step h such that every reading is a whole multiple of h (up to
 * {@value #MAX_DECIMALS} decimals), found from the readings themselves — the gauge's resolution when a plan does
 * not record it.
 *
 * <p>Method: the smallest d ≤ {@value #MAX_DECIMALS} for which every x·10^d is an integer (to 10⁻⁹ relative), then
 * the greatest common divisor g of the differences of those integers; h = g·10^(−d). A reading with more decimals
 * (a computed or continuous value) means there is no grid: 0. Readings that are all equal give 0 as well (no
 * difference to divide).
 */
public final class ReadingGrid {

    /** Readings with more decimals than this are taken as continuous. */
    public static final int MAX_DECIMALS = 6;

    private ReadingGrid() {
    }

    /** The grid step of the readings, or 0 when they lie on none (or are all equal). */
    public static double step(double[] x) {
        if (x.length < 2) {
            return 0;
        }
        for (int d = 0; d <= MAX_DECIMALS; d++) {
            double scale = Math.pow(10, d);
            if (allWhole(x, scale)) {
                long first = Math.round(x[0] * scale);
                long g = 0;
                for (double v : x) {
                    g = gcd(g, Math.abs(Math.round(v * scale) - first));
                    if (g == 1) {
                        break;
                    }
                }
                return g == 0 ? 0 : g / scale;
            }
        }
        return 0;
    }

    private static boolean allWhole(double[] x, double scale) {
        for (double v : x) {
            double y = v * scale;
            if (Math.abs(y) > 1e15 || Math.abs(y - Math.rint(y)) > 1e-9 * Math.max(1, Math.abs(y))) {
                return false;
            }
        }
        return true;
    }

    private static long gcd(long a, long b) {
        while (b != 0) {
            long t = a % b;
            a = b;
            b = t;
        }
        return a;
    }
}

package dev.proofrun.report;

import java.util.Locale;

/** Number formats of the report: fixed decimals, Locale.ROOT, a dash for a value that does not exist. */
final class Fmt {

    static final String NONE = "\u2014";

    private Fmt() {
    }

    /** An index: two decimals. */
    static String index(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.2f", v) : NONE;
    }

    /** A measured value: four significant digits at least, as many decimals as needed. */
    static String value(double v) {
        if (!Double.isFinite(v)) {
            return NONE;
        }
        double a = Math.abs(v);
        int decimals = a == 0 ? 3 : Math.max(0, Math.min(8, 4 - (int) Math.floor(Math.log10(a))));
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    /** Parts per million: no decimals above 10, one below. */
    static String ppm(double v) {
        if (!Double.isFinite(v)) {
            return NONE;
        }
        return v >= 10 ? String.format(Locale.ROOT, "%,.0f", v) : String.format(Locale.ROOT, "%.1f", v);
    }

    /** A probability or p-value: three decimals, "< 0.001" below. */
    static String p(double v) {
        if (!Double.isFinite(v)) {
            return NONE;
        }
        return v < 0.001 ? "< 0.001" : String.format(Locale.ROOT, "%.3f", v);
    }

    /** A plain number with the given decimals. */
    static String fixed(double v, int decimals) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : NONE;
    }
}

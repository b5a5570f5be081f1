package dev.proofrun.report;

import java.util.Locale;

/** Number formats of the report: fixed decimals, Locale.ROOT, a dash for a value that does not exist. */
final class ReportNumbers {

    static final String NONE = "\u2014";

    private ReportNumbers() {
    }

    /** Characters of a name from the plan (part, characteristic) printed in the report before it is cut. */
    static final int NAME_CHARACTERS = 120;

    /**
     * A name from the plan as the report prints it: cut after {@value #NAME_CHARACTERS} characters with an
     * ellipsis, so a name typed at any length never makes a heading or the verdict box taller than a page.
     */
    static String name(String text) {
        return text.length() <= NAME_CHARACTERS ? text : text.substring(0, NAME_CHARACTERS - 1) + "\u2026";
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

    /**
     * Decimals that show a span (e.g. UCL − LCL) to three significant digits, so that the limits and centre of
     * one chart are printed alike: 2 − ⌊log10 span⌋, within 0–8; −1 when the span is not a positive number.
     */
    static int decimalsForSpan(double span) {
        if (!(span > 0) || !Double.isFinite(span)) {
            return -1;
        }
        return Math.max(0, Math.min(8, 2 - (int) Math.floor(Math.log10(span))));
    }

    /** A value with the given decimals, or as {@link #value(double)} when decimals is negative. */
    static String value(double v, int decimals) {
        if (decimals < 0 || !Double.isFinite(v)) {
            return value(v);
        }
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    /** Parts per million: no decimals above 10, one below. */
    static String ppm(double v) {
        if (!Double.isFinite(v)) {
            return NONE;
        }
        return v >= 10 ? String.format(Locale.ROOT, "%,.0f", v) : String.format(Locale.ROOT, "%.1f", v);
    }

    /** A probability or p-value: three decimals, "below 0.001" below. */
    static String p(double v) {
        if (!Double.isFinite(v)) {
            return NONE;
        }
        return v < 0.001 ? "below 0.001" : String.format(Locale.ROOT, "%.3f", v);
    }

    /** A plain number with the given decimals. */
    static String fixed(double v, int decimals) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : NONE;
    }

    /**
     * The returned file by its name only: what follows the last {@code /} or {@code \\}. A report leaves the
     * grading machine; the folders it was graded from are nobody else's business and mean nothing elsewhere.
     */
    static String fileName(String file) {
        int cut = Math.max(file.lastIndexOf('/'), file.lastIndexOf('\\'));
        return cut >= 0 && cut < file.length() - 1 ? file.substring(cut + 1) : file;
    }
}

package dev.proofrun.text;

/**
 * The one CSV dialect proofrun reads — returned fill-in files, gauge files, files of readings: UTF-8 (a
 * byte-order mark is dropped), cells separated by {@code ,} or by {@code ;} — whichever the header line uses
 * more, as spreadsheets in decimal-comma locales write {@code ;} — and numbers by the one number rule with
 * the decimal comma allowed ({@link Decimals#parse}{@code (text, true)}): in a {@code ;} file a comma can only
 * be a decimal mark, in a {@code ,} file only inside quotes.
 */
public final class CsvDialect {

    private CsvDialect() {
    }

    /** The separator the header line uses: {@code ;} when it has more semicolons than commas, else {@code ,}. */
    public static char separator(String headerLine) {
        int commas = 0;
        int semicolons = 0;
        for (int i = 0; i < headerLine.length(); i++) {
            char c = headerLine.charAt(i);
            if (c == ',') {
                commas++;
            } else if (c == ';') {
                semicolons++;
            }
        }
        return semicolons > commas ? ';' : ',';
    }

    /** A cell's number by the dialect's rule: NaN when it is not one, infinite when it overflows. */
    public static double number(String cell) {
        return Decimals.parse(cell, true);
    }

    /**
     * Whether a cell, read as {@code number} by {@link #number}, holds a value that is not finite: a number that
     * overflows ({@code 1e309}) or a name of one ({@code Infinity}, {@code NaN}: {@link Decimals#namesNonFinite}).
     * Every reader says "not a finite number" for these, and "not a number" for any other NaN.
     */
    public static boolean namesNonFinite(String cell, double number) {
        return Double.isInfinite(number) || Decimals.namesNonFinite(cell);
    }
}

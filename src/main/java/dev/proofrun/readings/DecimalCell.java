package dev.proofrun.readings;

/**
 * Parses a cell as a plain decimal number: optional sign, digits with one optional decimal point, optional
 * exponent ({@code 12.5}, {@code -0.004}, {@code 1.2e-3}). Rejects what {@link Double#parseDouble} would
 * also take but people do not write in a measurement file: hexadecimal, {@code NaN}, {@code Infinity},
 * type suffixes such as {@code 1.5d}, a decimal comma.
 */
final class DecimalCell {

    private DecimalCell() {
    }

    /** The value, or NaN if the text is not a plain decimal number (the text is already trimmed). */
    static double parse(String text) {
        int n = text.length();
        int i = 0;
        if (i < n && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
            i++;
        }
        int digits = 0;
        while (i < n && isDigit(text.charAt(i))) {
            i++;
            digits++;
        }
        if (i < n && text.charAt(i) == '.') {
            i++;
            while (i < n && isDigit(text.charAt(i))) {
                i++;
                digits++;
            }
        }
        if (digits == 0) {
            return Double.NaN;
        }
        if (i < n && (text.charAt(i) == 'e' || text.charAt(i) == 'E')) {
            i++;
            if (i < n && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
                i++;
            }
            int exp = 0;
            while (i < n && isDigit(text.charAt(i))) {
                i++;
                exp++;
            }
            if (exp == 0) {
                return Double.NaN;
            }
        }
        return i == n ? Double.parseDouble(text) : Double.NaN;
    }

    /**
     * Whether the text names a value that is not finite ({@code NaN}, {@code Infinity}, {@code inf},
     * {@code ∞}, any letter case, with or without a sign): {@link #parse} takes none of them; the reader refuses
     * them as not finite, as it does a number that overflows ({@code 1e309}).
     */
    static boolean namesNonFinite(String text) {
        String t = text.startsWith("+") || text.startsWith("-") ? text.substring(1) : text;
        return t.equalsIgnoreCase("nan") || t.equalsIgnoreCase("inf") || t.equalsIgnoreCase("infinity") || t.equals("\u221E");
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }
}

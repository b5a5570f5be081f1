package dev.proofrun.text;

/**
 * The one rule for a number people type — in a returned file, a file of readings, a field of the wizard:
 * an optional sign, digits with at most one decimal mark, an optional exponent ({@code 12.5}, {@code -0.004},
 * {@code .5}, {@code 5.}, {@code 1.2e-3}, {@code +3E+2}). Not numbers: hexadecimal, {@code NaN},
 * {@code Infinity}, type suffixes ({@code 1.5d}), thousands separators, spaces inside, any other letter.
 * The decimal mark is a point; where the caller allows it ({@code decimalComma}), a single comma is one too
 * — returned files come from spreadsheets in decimal-comma locales. A number too large for a double
 * ({@code 1e309}) comes back infinite: callers say so as a finding of their own.
 *
 * <p>Fast path (exact, not an approximation): with at most {@value #FAST_DIGITS} digits and no exponent the
 * digits form an integer m &lt; 2<sup>53</sup> and the value is m / 10<sup>f</sup> for f ≤ 22 digits after the
 * mark; both are exact doubles and IEEE division rounds correctly, so the result is the same double as
 * {@link Double#parseDouble} gives (Clinger 1990, "How to read floating point numbers accurately", PLDI '90,
 * the "fast path"). Anything else goes through {@link Double#parseDouble}. A returned file of a million
 * readings is read through here, hence the care.
 */
public final class Decimals {

    /** Digits that always fit a double exactly: 10^15 &lt; 2^53. */
    public static final int FAST_DIGITS = 15;
    private static final double[] POWERS_OF_TEN = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12,
        1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};

    private Decimals() {
    }

    /**
     * @param text         the text, already trimmed
     * @param decimalComma whether a single comma (with no point) is a decimal mark
     * @return the value (infinite when it overflows), or NaN when the text is not a number
     */
    public static double parse(String text, boolean decimalComma) {
        int len = text.length();
        if (len == 0) {
            return Double.NaN;
        }
        int i = 0;
        char c = text.charAt(0);
        if (c == '+' || c == '-') {
            i++;
        }
        int digits = 0;
        int marks = 0;
        int commaAt = -1;
        boolean exponent = false;
        long mantissa = 0;
        int fraction = 0;
        for (; i < len; i++) {
            c = text.charAt(i);
            if (c >= '0' && c <= '9') {
                digits++;
                if (!exponent) {
                    mantissa = mantissa * 10 + (c - '0'); // overflow only past 18 digits; then not used
                    if (marks > 0) {
                        fraction++;
                    }
                }
            } else if ((c == '.' || (c == ',' && decimalComma)) && !exponent) {
                marks++;
                if (c == ',') {
                    commaAt = i;
                }
            } else if ((c == 'e' || c == 'E') && !exponent && digits > 0) {
                exponent = true;
                if (i + 1 < len && (text.charAt(i + 1) == '+' || text.charAt(i + 1) == '-')) {
                    i++;
                }
                if (i + 1 >= len) {
                    return Double.NaN;
                }
            } else {
                return Double.NaN;
            }
        }
        if (digits == 0 || marks > 1) {
            return Double.NaN;
        }
        if (!exponent && digits <= FAST_DIGITS && fraction < POWERS_OF_TEN.length) {
            double v = mantissa / POWERS_OF_TEN[fraction];
            return text.charAt(0) == '-' ? -v : v;
        }
        String s = commaAt >= 0 ? text.replace(',', '.') : text;
        return Double.parseDouble(s);
    }

    /**
     * Whether the text names a value that is not finite ({@code NaN}, {@code Infinity}, {@code inf}, {@code ∞},
     * any letter case, with or without a sign): {@link #parse} takes none of them, and readers say "not a
     * finite number" for them as for a number that overflows ({@code 1e309}): one rule for all.
     */
    public static boolean namesNonFinite(String text) {
        String t = text.startsWith("+") || text.startsWith("-") ? text.substring(1) : text;
        return t.equalsIgnoreCase("nan") || t.equalsIgnoreCase("inf") || t.equalsIgnoreCase("infinity") || t.equals("\u221E");
    }
}

package dev.proofrun.app.session;

import java.util.OptionalDouble;
import java.util.regex.Pattern;

/**
 * Reads numbers as people type them in the wizard: a point as the decimal mark (as the plan files and
 * the command line do), optional sign and exponent; no thousands separators, no NaN or infinity.
 */
public final class Numbers {

    private static final Pattern NUMBER = Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?");

    private Numbers() {
    }

    /** Empty for blank text. */
    public static boolean isBlank(String text) {
        return text == null || text.isBlank();
    }

    /** The number, or empty when the text is blank or not a number. */
    public static OptionalDouble parse(String text) {
        if (isBlank(text)) {
            return OptionalDouble.empty();
        }
        String t = text.trim();
        if (!NUMBER.matcher(t).matches()) {
            return OptionalDouble.empty();
        }
        double v = Double.parseDouble(t);
        return Double.isFinite(v) ? OptionalDouble.of(v) : OptionalDouble.empty();
    }

    /** True when the text is blank or a number. */
    public static boolean blankOrNumber(String text) {
        return isBlank(text) || parse(text).isPresent();
    }
}

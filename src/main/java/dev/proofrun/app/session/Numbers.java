package dev.proofrun.app.session;

import dev.proofrun.text.Decimals;
import java.util.OptionalDouble;

/**
 * Reads numbers as people type them in the wizard, by the one number rule ({@link Decimals}) with a point as
 * the decimal mark (as the plan files and the command line take them); no thousands separators, no NaN or
 * infinity (a number too large for a double is not one either).
 */
public final class Numbers {

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
        double v = Decimals.parse(text.trim(), false);
        return Double.isFinite(v) ? OptionalDouble.of(v) : OptionalDouble.empty();
    }

    /** True when the text is blank or a number. */
    public static boolean blankOrNumber(String text) {
        return isBlank(text) || parse(text).isPresent();
    }
}

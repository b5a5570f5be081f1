package dev.proofrun.app.session;

import dev.proofrun.text.DecimalMark;
import java.util.Optional;
import java.util.OptionalDouble;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;

/**
 * Reads numbers as people type them in the wizard, by the one number rule ({@link DecimalMark}, after
 * {@link dev.proofrun.text.Decimals}) with the decimal mark chosen in the window — a point unless the user
 * chooses a comma, as the command line reads its options; no thousands separators, no NaN or infinity (a
 * number too large for a double is not one either). The mark is the window's one setting for every field:
 * {@link #decimalMarkProperty()}, which bindings that parse numbers list among their dependencies so that
 * changing the mark checks every field again.
 */
public final class FieldNumbers {

    private static final ObjectProperty<DecimalMark> MARK = new SimpleObjectProperty<>(DecimalMark.POINT);

    private FieldNumbers() {
    }

    /** The decimal mark of the wizard's fields (the window's choice; {@link DecimalMark#POINT} to start). */
    public static ObjectProperty<DecimalMark> decimalMarkProperty() {
        return MARK;
    }

    /** Empty for blank text. */
    public static boolean isBlank(String text) {
        return text == null || text.isBlank();
    }

    /** The number, or empty when the text is blank or not a number with the chosen mark. */
    public static OptionalDouble parse(String text) {
        if (isBlank(text)) {
            return OptionalDouble.empty();
        }
        double v = MARK.get().parse(text.trim());
        return Double.isFinite(v) ? OptionalDouble.of(v) : OptionalDouble.empty();
    }

    /** True when the text is blank or a number. */
    public static boolean blankOrNumber(String text) {
        return isBlank(text) || parse(text).isPresent();
    }

    /**
     * "'1,33' has a decimal comma, and the decimal mark is set to a point …" when the text is a number written
     * with the other mark, else empty: what to say instead of a field's plain "not a number".
     */
    public static Optional<String> wrongMark(String text) {
        if (isBlank(text) || !MARK.get().otherMarkIn(text.trim())) {
            return Optional.empty();
        }
        return Optional.of(dev.proofrun.app.AppMessage.NUMBER_WRONG_MARK.format(text.trim()));
    }
}

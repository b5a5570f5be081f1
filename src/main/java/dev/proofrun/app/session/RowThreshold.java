package dev.proofrun.app.session;

import dev.proofrun.plan.Characteristic;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SpecLimits;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The declared threshold θ of one characteristic row ({@link CharacteristicField#THRESHOLD}), as the command line's
 * characteristics CSV gives it in its {@code threshold} column: a number for the threshold shapes ({@code lognormal3},
 * {@code weibull3}), blank for every other shape. The rules and their words are the plan model's
 * ({@link Characteristic#requireThreshold}), so the grid refuses what {@code plan new --threshold} and the CSV refuse.
 *
 * <p>The cell holds the number only. A later choice of how the number is meant (the exact threshold, or only a floor
 * below which θ lies) would be a cell of its own beside it, read here, so that the Part table, the draft and
 * {@link PlanDrafts#compose} keep asking this one class.
 */
public final class RowThreshold {

    /**
     * Stands in for limits not yet typed correctly: no upper limit, so only the threshold's own rules are checked
     * (the limit cells show their own problem).
     */
    private static final SpecLimits NO_UPPER = new SpecLimits(OptionalDouble.of(-Double.MAX_VALUE), OptionalDouble.empty());

    private RowThreshold() {
    }

    /**
     * True when the row's shape takes a threshold, or a threshold is typed that must be cleared (the cell stays
     * open to clear it); false when the cell has nothing to hold (shown empty and greyed).
     */
    public static boolean open(CharacteristicDraft row) {
        return takes(row) || !FieldNumbers.isBlank(row.text(CharacteristicField.THRESHOLD));
    }

    /** True when the row's shape (as typed; an unknown shape takes none) is a threshold shape. */
    public static boolean takes(CharacteristicDraft row) {
        return shape(row).map(ShapeFamily::hasThreshold).orElse(false);
    }

    /**
     * The problem of the threshold cell in the plan model's words (without the row's id, which the table's message
     * already names), or empty when it is fine or the shape itself is not understood (the shape cell says so).
     */
    public static Optional<String> problem(CharacteristicDraft row) {
        Optional<ShapeFamily> shape = shape(row);
        if (shape.isEmpty()) {
            return Optional.empty();
        }
        String text = row.text(CharacteristicField.THRESHOLD).trim();
        OptionalDouble theta = FieldNumbers.parse(text);
        if (!text.isEmpty() && theta.isEmpty()) {
            return Optional.of(FieldNumbers.wrongMark(text)
                    .orElseGet(() -> dev.proofrun.app.AppMessage.PART_NOT_A_NUMBER.format("Threshold", text)));
        }
        String id = row.id().isEmpty() ? "?" : row.id();
        try {
            Characteristic.requireThreshold(id, shape.get(), theta, row.limits().orElse(NO_UPPER));
            return Optional.empty();
        } catch (IllegalArgumentException refused) {
            String words = refused.getMessage();
            String prefix = id + ": ";
            return Optional.of(words.startsWith(prefix) ? words.substring(prefix.length()) : words);
        }
    }

    /**
     * The threshold the row declares: the typed number, empty when the cell is blank (the plan model then refuses a
     * threshold shape in words, and takes any other shape).
     *
     * @throws IllegalArgumentException when the cell holds text that is not a number
     */
    public static OptionalDouble of(CharacteristicDraft row) {
        String text = row.text(CharacteristicField.THRESHOLD).trim();
        OptionalDouble theta = FieldNumbers.parse(text);
        if (!text.isEmpty() && theta.isEmpty()) {
            throw new IllegalArgumentException(row.id() + ": the threshold is not a number: '" + dev.proofrun.text.Shown.cell(text) + "'");
        }
        return theta;
    }

    private static Optional<ShapeFamily> shape(CharacteristicDraft row) {
        try {
            return Optional.of(PlanDrafts.shapeOf(row));
        } catch (IllegalArgumentException unknown) {
            return Optional.empty();
        }
    }
}

package dev.proofrun.app.session;

import dev.proofrun.plan.Characteristic;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SpecLimits;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The threshold θ of one characteristic row, given one of two ways as the command line's characteristics CSV gives
 * it: the exact threshold ({@link CharacteristicField#THRESHOLD}, the {@code threshold} column) or a floor below
 * which θ lies ({@link CharacteristicField#FLOOR}, the {@code floor} column) — exactly one of the two for the threshold
 * shapes ({@code lognormal3}, {@code weibull3}), neither for every other shape. The rules and their words are the
 * plan model's ({@link Characteristic#requireThreshold}), so the grid refuses what {@code plan new --threshold} /
 * {@code --floor} and the CSV refuse; the Part table, the draft and {@link PlanDrafts#compose} all ask this one class.
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
     * True when the row's shape takes a threshold, or the cell ({@link CharacteristicField#THRESHOLD} or
     * {@link CharacteristicField#FLOOR}) holds a number that must be cleared (it stays open to clear it); false when
     * the cell has nothing to hold (shown empty and greyed).
     */
    public static boolean open(CharacteristicDraft row, CharacteristicField cell) {
        return takes(row) || !FieldNumbers.isBlank(row.text(cell));
    }

    /** True for the two cells this class reads. */
    public static boolean isThresholdCell(CharacteristicField field) {
        return field == CharacteristicField.THRESHOLD || field == CharacteristicField.FLOOR;
    }

    /** True when the row's shape (as typed; an unknown shape takes none) is a threshold shape. */
    public static boolean takes(CharacteristicDraft row) {
        return shape(row).map(ShapeFamily::hasThreshold).orElse(false);
    }

    /**
     * The problem of the threshold or floor cell in the plan model's words (without the row's id, which the table's
     * message already names), or empty when it is fine or the shape itself is not understood (the shape cell says so).
     * A rule on the pair (neither given, both given) is the problem of both cells.
     */
    public static Optional<String> problem(CharacteristicDraft row, CharacteristicField cell) {
        Optional<ShapeFamily> shape = shape(row);
        if (shape.isEmpty()) {
            return Optional.empty();
        }
        String text = row.text(cell).trim();
        if (!text.isEmpty() && FieldNumbers.parse(text).isEmpty()) {
            String label = cell == CharacteristicField.FLOOR ? "Floor" : "Threshold";
            return Optional.of(FieldNumbers.wrongMark(text)
                    .orElseGet(() -> dev.proofrun.app.AppMessage.PART_NOT_A_NUMBER.format(label, text)));
        }
        OptionalDouble theta = FieldNumbers.parse(row.text(CharacteristicField.THRESHOLD).trim());
        OptionalDouble floor = FieldNumbers.parse(row.text(CharacteristicField.FLOOR).trim());
        String id = row.id().isEmpty() ? "?" : row.id();
        try {
            Characteristic.requireThreshold(id, shape.get(), theta, floor, row.limits().orElse(NO_UPPER));
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
        return number(row, CharacteristicField.THRESHOLD, "threshold");
    }

    /**
     * The floor the row declares: the typed number, empty when the cell is blank.
     *
     * @throws IllegalArgumentException when the cell holds text that is not a number
     */
    public static OptionalDouble floorOf(CharacteristicDraft row) {
        return number(row, CharacteristicField.FLOOR, "floor");
    }

    private static OptionalDouble number(CharacteristicDraft row, CharacteristicField cell, String words) {
        String text = row.text(cell).trim();
        OptionalDouble value = FieldNumbers.parse(text);
        if (!text.isEmpty() && value.isEmpty()) {
            throw new IllegalArgumentException(row.id() + ": the " + words + " is not a number: '" + dev.proofrun.text.Shown.cell(text) + "'");
        }
        return value;
    }

    private static Optional<ShapeFamily> shape(CharacteristicDraft row) {
        try {
            return Optional.of(PlanDrafts.shapeOf(row));
        } catch (IllegalArgumentException unknown) {
            return Optional.empty();
        }
    }
}

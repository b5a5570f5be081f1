package dev.proofrun.app.session;

import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.stats.IndexKind;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The requirement and the expected centring of one characteristic row, as the command line's characteristics
 * CSV ({@code plan.CharacteristicsCsv}) gives them: the columns {@code index}, {@code target} (c₀) and
 * {@code confidence} set the row's own requirement, and where one is blank the plan's requirement (the Goal
 * step's) stands in; {@code expected_cp} is the expected Cp (Pp) of an off-centre process, blank for a centred
 * one. The checks on the typed text are the plan model's own ({@link Requirement}, {@link Expectation}), so the
 * grid refuses what a plan file would.
 */
public final class RowRequirement {

    private RowRequirement() {
    }

    /**
     * The row's requirement: its own cells where typed, the plan's where blank; empty when a typed cell is not
     * usable or a blank one has no plan value to stand in.
     */
    public static Optional<Requirement> of(CharacteristicDraft row, Optional<Requirement> plan) {
        Optional<IndexKind> index = index(row.text(CharacteristicField.INDEX));
        OptionalDouble minimum = row.number(CharacteristicField.TARGET);
        OptionalDouble confidence = row.number(CharacteristicField.CONFIDENCE);
        boolean typedBad = (!blank(row, CharacteristicField.INDEX) && index.isEmpty())
                || (!blank(row, CharacteristicField.TARGET) && minimum.isEmpty())
                || (!blank(row, CharacteristicField.CONFIDENCE) && confidence.isEmpty());
        if (typedBad) {
            return Optional.empty();
        }
        if (plan.isEmpty() && (index.isEmpty() || minimum.isEmpty() || confidence.isEmpty())) {
            return Optional.empty();
        }
        try {
            return Optional.of(Requirement.of(index.orElseGet(() -> plan.get().index()),
                    minimum.isPresent() ? minimum.getAsDouble() : plan.get().minimum(),
                    confidence.isPresent() ? confidence.getAsDouble() : plan.get().confidence()));
        } catch (IllegalArgumentException refused) {
            return Optional.empty();
        }
    }

    /**
     * The expectation for the row's expected index c₁: off centre with the row's expected Cp when one is typed
     * (the plan model refuses a Cp below c₁), centred otherwise.
     *
     * @throws IllegalArgumentException when the expected Cp is below c₁ or not a number
     */
    public static Expectation expectation(CharacteristicDraft row, double index) {
        if (blank(row, CharacteristicField.EXPECTED_CP)) {
            return Expectation.centred(index);
        }
        OptionalDouble cp = row.number(CharacteristicField.EXPECTED_CP);
        if (cp.isEmpty()) {
            throw new IllegalArgumentException("not a number: '" + row.text(CharacteristicField.EXPECTED_CP).trim() + "'");
        }
        return Expectation.offCentre(index, cp.getAsDouble());
    }

    /**
     * What is wrong with one of the row's requirement cells ({@code INDEX}, {@code TARGET}, {@code CONFIDENCE},
     * {@code EXPECTED_CP}), in the plan model's words; empty when it is blank or fine.
     */
    public static Optional<String> problem(CharacteristicDraft row, CharacteristicField field) {
        if (blank(row, field)) {
            return Optional.empty();
        }
        String text = row.text(field).trim();
        OptionalDouble v = row.number(field);
        if (v.isEmpty() && (field == CharacteristicField.TARGET || field == CharacteristicField.CONFIDENCE
                || field == CharacteristicField.EXPECTED_CP)) {
            return Optional.of(field.header() + ": not a number: '" + text + "'"); // the CSV reader's words
        }
        try {
            switch (field) {
                case INDEX -> {
                    IndexKind kind = IndexKind.fromToken(text);
                    if (!fits(kind, row)) {
                        return Optional.of(dev.proofrun.app.AppMessage.GOAL_INDEX_SIDES.format(kind.symbol(),
                                row.id().isEmpty() ? "this row" : row.id()));
                    }
                }
                case TARGET -> Requirement.of(IndexKind.CPK, v.orElse(Double.NaN), 0.95);
                case CONFIDENCE -> Requirement.of(IndexKind.CPK, 1, v.orElse(Double.NaN));
                case EXPECTED_CP -> {
                    if (!(v.orElse(Double.NaN) > 0)) {
                        throw new IllegalArgumentException("expected Cp must be a number above zero: '" + text + "'");
                    }
                    OptionalDouble c1 = row.number(CharacteristicField.EXPECTED);
                    if (c1.isPresent() && c1.getAsDouble() > 0) {
                        expectation(row, c1.getAsDouble());
                    }
                }
                default -> {
                    return Optional.empty();
                }
            }
            return Optional.empty();
        } catch (IllegalArgumentException e) {
            return Optional.of(e.getMessage());
        }
    }

    /** Whether the row's limits give this index (Cp/Pp need both, Cpu/Ppu an upper, Cpl/Ppl a lower limit). */
    private static boolean fits(IndexKind kind, CharacteristicDraft row) {
        Optional<dev.proofrun.stats.SpecLimits> limits = row.limits();
        if (limits.isEmpty()) {
            return true; // the limit cells say what is wrong
        }
        return switch (kind.side()) {
            case BOTH -> limits.get().isTwoSided();
            case UPPER -> limits.get().upper().isPresent();
            case LOWER -> limits.get().lower().isPresent();
            case NEAREST -> true;
        };
    }

    private static Optional<IndexKind> index(String text) {
        if (FieldNumbers.isBlank(text)) {
            return Optional.empty();
        }
        try {
            return Optional.of(IndexKind.fromToken(text));
        } catch (IllegalArgumentException e) {
            return Optional.empty();
        }
    }

    private static boolean blank(CharacteristicDraft row, CharacteristicField field) {
        return FieldNumbers.isBlank(row.text(field));
    }
}

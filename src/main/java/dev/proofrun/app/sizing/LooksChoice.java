package dev.proofrun.app.sizing;

import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.StudyDraft;
import dev.proofrun.design.Spending;
import dev.proofrun.design.Stages;
import dev.proofrun.text.Tokens;
import java.util.ArrayList;
import java.util.List;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.BooleanBinding;
import javafx.beans.binding.IntegerBinding;

/**
 * The Sample-size step's choice of looks (1 to {@value Stages#MOST}) and of how the false-pass risk is spent across
 * them, kept in the draft as {@code plan new --stages S --spending F} takes them (S, the spending function's token);
 * the step shows them in words. A value the draft holds that is no choice (typed into a saved draft by hand) counts
 * as one look, or as the first spending function.
 */
public final class LooksChoice {

    private final StudyDraft draft;
    private final IntegerBinding looksIndex;
    private final IntegerBinding spendingIndex;
    private final BooleanBinding staged;

    LooksChoice(StudyDraft draft) {
        this.draft = draft;
        looksIndex = Bindings.createIntegerBinding(() -> looks() - 1, draft.field(DraftField.STAGES));
        spendingIndex = Bindings.createIntegerBinding(() -> spending().ordinal(), draft.field(DraftField.SPENDING));
        staged = looksIndex.greaterThan(0);
    }

    /** The choices of looks, in words, the first one look. */
    public List<String> looksChoices() {
        List<String> choices = new ArrayList<>();
        choices.add(SizingMessage.LOOKS_ONE.format());
        for (int s = 2; s <= Stages.MOST; s++) {
            choices.add(SizingMessage.LOOKS_MANY.format(s, s));
        }
        return choices;
    }

    /** The spending functions in words, in the order of {@link #spendingIndex}. */
    public List<String> spendingChoices() {
        List<String> choices = new ArrayList<>();
        for (Spending f : Spending.values()) {
            choices.add(switch (f) {
                case OBRIEN_FLEMING -> SizingMessage.SPEND_LATE.format();
                case POCOCK -> SizingMessage.SPEND_EVEN.format();
                case KIM_DEMETS_2 -> SizingMessage.SPEND_GROWING.format();
            });
        }
        return choices;
    }

    /** The chosen looks less one (the index into {@link #looksChoices}). */
    public IntegerBinding looksIndex() {
        return looksIndex;
    }

    /** The index of the chosen spending in {@link #spendingChoices}. */
    public IntegerBinding spendingIndex() {
        return spendingIndex;
    }

    /** True when more than one look is chosen. */
    public BooleanBinding staged() {
        return staged;
    }

    /**
     * Chooses looks by their index in {@link #looksChoices}. A new number of looks is designed afresh: a k kept from
     * a plan file or the shared design is dropped, as picking a row drops it.
     */
    public void chooseLooks(int index) {
        int s = index + 1;
        if (s < 1 || s > Stages.MOST || s == looks()) {
            return;
        }
        draft.field(DraftField.CHOSEN_SUBGROUPS).set("");
        draft.field(DraftField.STAGES).set(Integer.toString(s));
    }

    /** Chooses the spending by its index in {@link #spendingChoices}. */
    public void chooseSpending(int index) {
        if (index < 0 || index >= Spending.values().length || index == spending().ordinal()) {
            return;
        }
        draft.field(DraftField.SPENDING).set(Spending.values()[index].token());
    }

    /** The looks the draft holds, 1 to {@value Stages#MOST}. */
    int looks() {
        try {
            int s = Integer.parseInt(draft.text(DraftField.STAGES));
            return s >= 1 && s <= Stages.MOST ? s : 1;
        } catch (NumberFormatException notANumber) {
            return 1;
        }
    }

    /** The spending the draft holds. */
    Spending spending() {
        return Tokens.find(Spending.class, draft.text(DraftField.SPENDING)).orElse(Spending.byDefault());
    }
}

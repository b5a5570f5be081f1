package dev.proofrun.app.sizing;

import dev.proofrun.text.MessageKey;

/** What the Sample-size step says beyond the shared wizard messages. */
public enum SizingMessage implements MessageKey {
    /** The design the plan will use, as both charts label it. */
    PLAN_DESIGN("plan: %d × %d"),
    /** The single-stage design the planned looks are compared with, as the charts label it. */
    SINGLE_DESIGN("single stage: %d × %d"),
    /** The chooser's label. */
    SIZED_FOR("Sized for"),
    /** The table is for one characteristic of several. */
    TABLE_FOR("The table sizes %s (%s ≥ %s at %.0f %% confidence, expected %s) on its own."),
    SHARED_LINE("One design for all %d characteristics, as the command line's plan new chooses it: %d subgroups of %d"
            + " (%d readings), the fewest readings that give each the wanted power; %s needs the most subgroups."),
    SHARED_BUSY("Working out one design for all characteristics…"),
    SHARED_NONE("No one design gives every characteristic the wanted power: %s"),
    SHARED_CHOSEN("Chosen: the design for all characteristics, %d subgroups of %d = %d readings (%s needs the most);"
            + " for %s alone %d subgroups would do. Power for %s at it %s."),
    USE_SHARED("Use one design for all"),
    SHAPE_NORMAL_MODEL(" %s is planned %s: its power here is the normal model's, as plan new sizes it; the percentile"
            + " bound of a skewed shape needs its expected skewness, which the plan does not keep (size it with"
            + " size --shape %s --skewness G)."),
    SHAPE_FLOOR(" %s is planned %s with a floor: no power is promised for it (a dash above), and the design is the normal"
            + " model's; not knowing the threshold costs most of the power (plan a much larger study, or give the"
            + " threshold where it is known exactly)."),
    /** The looks chooser's label and choices. */
    LOOKS_LABEL("Looks at the data (the study may stop early at a look when the answer is clear)"),
    LOOKS_ONE("1: grade once, at the end"),
    LOOKS_MANY("%d: grade at %d planned points"),
    /** The spending chooser's label and choices (the plan file keeps the spending function's token). */
    SPENDING_LABEL("How the false-pass risk is shared across the looks"),
    SPEND_LATE("most at the last look (O'Brien–Fleming)"),
    SPEND_EVEN("evenly across the looks (Pocock)"),
    SPEND_GROWING("a quarter by half-way (Kim–DeMets, ρ = 2)"),
    LOOK_GOES_ON("Look %d: %d subgroups (%d readings); demonstrated if %s ≥ %.3f (confidence %.3f %%); otherwise on to"
            + " the next look."),
    LOOK_SHARED("Look %d: %d subgroups (%d readings); each characteristic's bound at %.3f %% confidence decides;"
            + " otherwise on to the next look."),
    STAGES_NORMAL_ONLY("Planned looks use normal-theory bounds: %s is planned %s; plan a single stage."),
    STAGES_COMPLETE_FIRST("Planned looks need every characteristic complete: %s."),
    READINGS_TITLE("Readings expected"),
    STAGED_CURVE("staged, %d looks"),
    SINGLE_CURVE("single stage, %d readings"),
    STAGED_OC("staged: %d looks, up to %d × %d"),
    HINT("Pick a row to use another subgroup size; the line below says what it costs.");

    private final String english;

    SizingMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}

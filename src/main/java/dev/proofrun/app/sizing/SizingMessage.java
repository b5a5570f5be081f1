package dev.proofrun.app.sizing;

import dev.proofrun.text.MessageKey;

/** What the Sample-size step says beyond the shared wizard messages. */
public enum SizingMessage implements MessageKey {
    /** The design the plan will use, as both charts label it. */
    PLAN_DESIGN("plan: %d × %d"),
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

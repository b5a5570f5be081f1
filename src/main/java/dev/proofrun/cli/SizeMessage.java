package dev.proofrun.cli;

import dev.proofrun.text.MessageKey;

/** Messages of {@code proofrun size} that belong to the command line (the designer's own are DesignMessage). */
public enum SizeMessage implements MessageKey {
    TARGET_NEEDED("give --target (the required minimum), or --characteristics FILE.csv for several characteristics"),
    FILE_REPLACES_OPTIONS("--characteristics takes each characteristic's target, limits and expectation from the file;"
            + " leave out %s"),
    SHARED_HEADING("One design for %d characteristics measured on the same parts (%s):"),
    SHARED_REASON("%d subgroups of %d (%d readings of each characteristic) is the fewest readings that %s of every"
            + " size tried; %s needs the most subgroups."),
    SHARED_CHART_RISKS("'Called unstable' is the chance that grading calls one characteristic unstable (stable, and"
            + " after a mean shift for the second half); 'some rule fires' is one characteristic's mean chart. With %d"
            + " characteristics the chance that at least one is called unstable is higher."),
    POWER_EXPLAINED("power: the chance that grading returns 'demonstrated' when the process is as expected, every"
            + " check counted: the lower bound ('bound alone'), the shape check (%.0f %% of normal readings rejected),"
            + " grading's stability rule ('called unstable': stable; after a %.1f sigma mean shift for the second"
            + " half), subgroups lost at rate %s within the plan's allowance."),
    SHARED_ALL_TOGETHER("The part needs all %d demonstrated in this one study: if their readings are independent,"
            + " the chance of that is about %.3f (the product of their powers); correlated characteristics move it."
            + " To raise it, ask each characteristic for more power."),
    SHAPE_SIZED_AS_NORMAL("%s is planned %s, but its power here is the normal model's; size it alone with"
            + " 'size --shape %s --skewness G --spec upper|lower' and use the larger study"),
    SHAPE_NOT_SIZED("size --shape cannot plan the %s shape: its power is not computed yet; size --shape plans %s."
            + " Characteristics of that shape can still be planned (plan new --shape) and graded"),
    FLOOR_NOT_SIZED("%s is planned %s, but its power here is the normal model's, and no power is promised for a floor:"
            + " not knowing the threshold costs much of it (lognormal3, 125 readings, index 1.67 against 1.33: about"
            + " 0.04 with a floor against 0.7 with the threshold known; docs/decisions/declared-shape-grading.md, \"Floor\")."
            + " Plan a much larger study, or declare the threshold where it is known exactly"),
    FLOOR_REFUSED("size does not plan a threshold shape with a floor: its power depends on the grade's search for the"
            + " threshold and is far below the threshold-known power (lognormal3, 125 readings, index 1.67 against 1.33:"
            + " about 0.04 against 0.7), and no table of it is computed. Size without --floor (the power with the"
            + " threshold known is an upper limit), plan a much larger study and check it with simulated studies"),
    SHAPE_NOT_SIZED_AS_NORMAL("%s is planned %s, but its power here is the normal model's, and size --shape cannot"
            + " plan that shape yet (it plans %s): treat the promised power as approximate"),
    SHAPE_CAUTION("A demonstrated index is a statistical statement under assumptions (stability, independence, readings"
            + " of the planned shape, a capable gauge). It does not replace the customer's requirements, applicable"
            + " standards or local codes, licensed practice, or the extra controls that safety-critical characteristics need."),
    SHARED_LEFT_OUT("subgroups of %d cannot give every characteristic a power of %.3f within %d readings; left out"
            + " of the table");

    private final String english;

    SizeMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}

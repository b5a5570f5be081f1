package dev.proofrun.app.part;

import dev.proofrun.text.MessageKey;

/** What the Part step says about the characteristics' requirement columns. */
public enum PartMessage implements MessageKey {
    REQUIREMENT_TIP("%s of this characteristic's requirement, as the command line's characteristics CSV has it;"
            + " blank: the plan's, set on the Goal step"),
    EXPECTED_CP_TIP("The expected Cp (Pp) of a process that is not centred, for a two-sided Cpk or Ppk requirement:"
            + " at least the expected index; blank is centred (Cp = Cpk)"),
    EXPECTED_TIP("The expected value c₁ of the required index (the value the study is sized for). For a two-sided"
            + " Cpk or Ppk, the Expected Cp column says how far off centre: blank is centred (Cp = Cpk)"),
    THRESHOLD_TIP("The declared threshold θ of a lognormal3 or weibull3 shape: the stop or datum the readings cannot go"
            + " below, a plan value never estimated from the readings (the command line's --threshold). Give it only"
            + " when the readings' real start is known exactly; otherwise give a Floor. Greyed for the shapes that take"
            + " none"),
    FLOOR_TIP("The floor of a lognormal3 or weibull3 shape, instead of a Threshold: the stop the readings cannot go"
            + " below when their real start above it is not known exactly (the command line's --floor). The grade then"
            + " allows every start the readings leave possible, which costs much of the power, and the sample size is"
            + " not planned for it. Greyed for the shapes that take none");

    private final String english;

    PartMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}

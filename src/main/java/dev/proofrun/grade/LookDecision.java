package dev.proofrun.grade;

import java.util.List;

/**
 * The decision at a planned look of a staged study, for evidence that passed every gate (completeness at this
 * look, stability, shape): the lower bound at the look's confidence against c₀, the estimate against the look's
 * futility boundary.
 *
 * <ul>
 * <li>lower bound ≥ c₀: {@link Verdict#DEMONSTRATED} at this look;</li>
 * <li>otherwise, at the last look: {@link Verdict#NOT_DEMONSTRATED} (the planned stages are spent);</li>
 * <li>otherwise, estimate below the look's futility boundary: {@link Verdict#NOT_DEMONSTRATED}, stopped for
 *     futility;</li>
 * <li>otherwise {@link Verdict#CONTINUE}: collect the next stage, whose slots the reason names.</li>
 * </ul>
 *
 * The boundaries are the plan's; how they keep the whole study's false-pass risk is the designer's part
 * (Lan &amp; DeMets 1983, Biometrika 70:659–663; Jennison &amp; Turnbull 2000, <em>Group Sequential Methods with
 * Applications to Clinical Trials</em>). The futility boundary is compared with the estimate; a futility stop can
 * only lower the chance of a false pass.
 */
final class LookDecision {

    private LookDecision() {
    }

    /**
     * @param look    the look graded
     * @param symbol  the index symbol, e.g. "Cpk"
     * @param ev      the index with its lower bound at the look's confidence
     * @param reasons where the capability reason goes
     * @return the verdict at this look
     */
    static Verdict decide(GradedLook look, String symbol, IndexEvidence ev, List<Reason> reasons) {
        int j = look.number();
        int of = look.of();
        double c0 = ev.required();
        String pct = look.confidencePercent();
        if (ev.lower() >= c0) {
            reasons.add(new Reason(Step.CAPABILITY, true, GradeMessage.REASON_LOOK_DEMONSTRATED.format(j, of, symbol,
                    ev.estimate(), pct, ev.lower(), c0, look.last() ? "" : GradeMessage.REASON_LOOK_STOPS_EARLY.format())));
            return Verdict.DEMONSTRATED;
        }
        if (look.last()) {
            reasons.add(new Reason(Step.CAPABILITY, true, GradeMessage.REASON_LAST_LOOK_SHORT.format(j, of, symbol,
                    ev.estimate(), pct, ev.lower(), c0)));
            return Verdict.NOT_DEMONSTRATED;
        }
        double futility = look.look().futility();
        if (look.look().stopsForFutility() && ev.estimate() < futility) {
            reasons.add(new Reason(Step.CAPABILITY, true, GradeMessage.REASON_LOOK_FUTILITY.format(j, of, symbol,
                    ev.estimate(), futility, pct, ev.lower())));
            return Verdict.NOT_DEMONSTRATED;
        }
        String above = look.look().stopsForFutility() ? GradeMessage.REASON_LOOK_ABOVE_FUTILITY.format(futility) : "";
        reasons.add(new Reason(Step.CAPABILITY, true, GradeMessage.REASON_LOOK_CONTINUE.format(j, of, symbol,
                ev.estimate(), pct, ev.lower(), c0, above, j + 1, look.nextFrom().orElseThrow(),
                look.nextTo().orElseThrow())));
        return Verdict.CONTINUE;
    }

    /** The reasons that say which look was graded and what it rests on, in the completeness step. */
    static void describe(GradedLook look, List<Reason> reasons) {
        String futility = look.look().stopsForFutility()
                ? GradeMessage.REASON_LOOK_FUTILITY_RULE.format(look.look().futility()) : "";
        reasons.add(new Reason(Step.COMPLETENESS, false, GradeMessage.REASON_LOOK.format(look.number(), look.of(),
                look.endSlot(), look.look().subgroups(), look.confidencePercent(), look.spending().token(), futility)));
        if (!look.skipped().isEmpty()) {
            String which = look.skipped().stream().map(String::valueOf).reduce((a, b) -> a + " and " + b).orElseThrow();
            reasons.add(new Reason(Step.COMPLETENESS, false, GradeMessage.REASON_LOOK_EARLIER.format(
                    look.reachSlot().orElseThrow(), look.number(), which)));
        }
        if (!look.reached()) {
            reasons.add(new Reason(Step.COMPLETENESS, false, GradeMessage.REASON_LOOK_SHORT.format(look.endSlot())));
        }
        if (look.beyond() > 0) {
            reasons.add(new Reason(Step.COMPLETENESS, false, GradeMessage.REASON_LOOK_BEYOND.format(look.beyond(),
                    look.reachSlot().orElseThrow())));
        }
    }
}

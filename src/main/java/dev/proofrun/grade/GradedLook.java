package dev.proofrun.grade;

import dev.proofrun.design.Look;
import dev.proofrun.design.Spending;
import dev.proofrun.design.Stages;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The planned look of a staged study that a return was graded at.
 *
 * <p>Which look: the furthest whose last slot the return reaches ({@link ReturnedData#reach}: the last slot that
 * came back with a reading); look 1 when the return stops short of it (the missing slots of stage 1 then count
 * against its allowance). All readings up to the look's last slot are graded; readings of a stage not yet ended
 * wait for its look.
 *
 * @param number    1-based number of the look
 * @param look      the planned look (subgroups so far, confidence of the bound, futility boundary)
 * @param stages    the plan's looks
 * @param endSlot   the id of the look's last slot
 * @param nextFrom  the first slot of the next stage; empty at the last look
 * @param nextTo    the last slot of the next stage; empty at the last look
 * @param skipped   the earlier looks (1-based), taken to have said continue
 * @param reached   whether the return reaches the look's last slot (false only for look 1 of a short return)
 * @param beyond    slots after {@code endSlot} that came back with readings (they count at a later look)
 * @param reachSlot the last slot that came back with a reading, or empty when none did
 */
public record GradedLook(int number, Look look, Stages stages, String endSlot, Optional<String> nextFrom,
        Optional<String> nextTo, List<Integer> skipped, boolean reached, int beyond, Optional<String> reachSlot) {

    public GradedLook {
        Objects.requireNonNull(look, "look");
        Objects.requireNonNull(stages, "stages");
        skipped = List.copyOf(skipped);
        if (number < 1 || number > stages.count()) {
            throw new IllegalArgumentException("look " + number + " of " + stages.count());
        }
    }

    /** How many looks the plan has. */
    public int of() {
        return stages.count();
    }

    /** Whether this is the last look: nothing is left to collect. */
    public boolean last() {
        return number == stages.count();
    }

    /** The spending function the looks were planned with. */
    public Spending spending() {
        return stages.spending();
    }

    /**
     * One line for the part's grade, the same on the command line, in the report and in the wizard: "Graded at look 1
     * of 2 (after slot S18, 18 subgroups planned so far): continue, collect stage 2, slots S19 to S36, then send the
     * whole file back."
     *
     * @param part the part's verdict (the next stage is named only when it is {@link Verdict#CONTINUE})
     */
    public String line(Verdict part) {
        String next = part == Verdict.CONTINUE && nextFrom.isPresent()
                ? GradeMessage.LOOK_NEXT.format(number + 1, nextFrom.get(), nextTo.orElseThrow()) : "";
        return GradeMessage.LOOK_LINE.format(number, of(), endSlot, look.subgroups(), next);
    }

    /** The look's confidence as a percentage for people, e.g. "95" or "99.437" (never rounded up to 100). */
    public String confidencePercent() {
        return percent(look.confidence());
    }

    /** A confidence as a percentage with up to three decimals; one that would round to 100 is cut (99.999). */
    public static String percent(double confidence) {
        BigDecimal p = BigDecimal.valueOf(100 * confidence);
        BigDecimal shown = p.setScale(3, RoundingMode.HALF_EVEN);
        if (shown.compareTo(BigDecimal.valueOf(100)) >= 0) {
            shown = p.setScale(3, RoundingMode.FLOOR);
        }
        return shown.stripTrailingZeros().toPlainString();
    }
}

package dev.proofrun.grade;

import java.util.List;
import java.util.Objects;

/**
 * The grade of one returned file against its plan.
 *
 * @param planId          the plan's id
 * @param revision        the plan's revision fingerprint
 * @param file            the returned file as the user named it
 * @param problems        every problem found in the file, in file order
 * @param characteristics one grade per characteristic, in the plan's order
 * @param verdict         the part's verdict: the worst of its characteristics
 */
public record GradeResult(String planId, String revision, String file, List<Problem> problems,
        List<CharacteristicGrade> characteristics, Verdict verdict) {

    public GradeResult {
        Objects.requireNonNull(verdict, "verdict");
        problems = List.copyOf(problems);
        characteristics = List.copyOf(characteristics);
    }

    /** The caution that goes with every verdict. */
    public String caution() {
        return GradeMessage.CAUTION.format();
    }

    /** True when every characteristic is demonstrated. */
    public boolean allDemonstrated() {
        return characteristics.stream().allMatch(c -> c.verdict() == Verdict.DEMONSTRATED);
    }
}

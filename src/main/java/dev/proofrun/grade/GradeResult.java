package dev.proofrun.grade;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The grade of one returned file against its plan.
 *
 * @param planId          the plan's id
 * @param revision        the plan's revision fingerprint
 * @param file            the returned file as the user named it
 * @param problems        every problem found in the file, in file order
 * @param characteristics one grade per characteristic, in the plan's order
 * @param verdict         the part's verdict: the worst of its characteristics
 * @param look            the planned look graded, for a staged study; empty otherwise
 */
public record GradeResult(String planId, String revision, String file, List<Problem> problems,
        List<CharacteristicGrade> characteristics, Verdict verdict, Optional<GradedLook> look) {

    /** The grade of a single-stage study. */
    public GradeResult(String planId, String revision, String file, List<Problem> problems,
            List<CharacteristicGrade> characteristics, Verdict verdict) {
        this(planId, revision, file, problems, characteristics, verdict, Optional.empty());
    }

    public GradeResult {
        Objects.requireNonNull(verdict, "verdict");
        problems = List.copyOf(problems);
        characteristics = List.copyOf(characteristics);
        look = look == null ? Optional.empty() : look;
    }

    /** The caution that goes with every verdict. */
    public String caution() {
        return GradeMessage.CAUTION.format();
    }

    /** True when every characteristic is demonstrated (at a staged study's look: demonstrated at it). */
    public boolean allDemonstrated() {
        return characteristics.stream().allMatch(c -> c.verdict() == Verdict.DEMONSTRATED);
    }
}

package dev.proofrun.design;

import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.UserException;
import java.util.List;
import java.util.Optional;
import java.util.stream.IntStream;

/**
 * Everything the {@link StudyDesigner} needs for one characteristic.
 *
 * @param sides         which specification limits exist
 * @param requirement   index, c₀ and confidence
 * @param expectation   c₁ and centring (after any gauge adjustment, see {@link ProcessFacts})
 * @param power         wanted power 1−β, in (0.05, 0.9999)
 * @param subgroupSizes candidate n, each 1–{@link #MAX_SUBGROUP_SIZE}
 * @param sigmaMethod   the within estimator for n ≥ 2; empty = {@link SigmaMethod#defaultFor(int)}.
 *                      n = 1 always uses the moving range.
 * @param boundMethod   how the grade will compute the bound
 * @param floors        practice floors
 * @param shift         δ, the mean shift in within standard deviations for the second half of the study whose
 *                      detection the design reports (default {@value #DEFAULT_SHIFT})
 * @param lossRate      the chance that one planned subgroup is lost (binomial, independent; default 0): the power
 *                      counts the studies that lose at most the plan's allowance ({@link LossAllowance}) and
 *                      the smaller study they leave
 * @param notes         warnings already known about the expectation (pilot, gauge), shown with the table
 */
public record DesignRequest(SpecLimits.Sides sides, Requirement requirement, Expectation expectation, double power,
        List<Integer> subgroupSizes, Optional<SigmaMethod> sigmaMethod, BoundMethod boundMethod, PracticeFloors floors,
        double shift, double lossRate, List<String> notes) {

    /** Largest subgroup size the designer plans for. */
    public static final int MAX_SUBGROUP_SIZE = 25;
    /** Default wanted power. */
    public static final double DEFAULT_POWER = 0.90;
    /** Default shift to detect, in within standard deviations. */
    public static final double DEFAULT_SHIFT = 1.5;

    /**
     * @throws UserException if the power, a subgroup size, the shift or the sigma method is unusable, or the
     *                       index needs a limit the specification lacks
     */
    public DesignRequest {
        if (!(power > 0.05 && power < 0.9999)) {
            throw new UserException(DesignMessage.POWER_OUT_OF_RANGE, power);
        }
        if (subgroupSizes == null || subgroupSizes.isEmpty()) {
            throw new UserException(DesignMessage.NO_SUBGROUP_SIZES, MAX_SUBGROUP_SIZE);
        }
        subgroupSizes = subgroupSizes.stream().distinct().sorted().toList();
        for (int n : subgroupSizes) {
            if (n < 1 || n > MAX_SUBGROUP_SIZE) {
                throw new UserException(DesignMessage.BAD_SUBGROUP_SIZE, MAX_SUBGROUP_SIZE, n);
            }
        }
        if (sigmaMethod.isPresent() && sigmaMethod.get() == SigmaMethod.MOVING_RANGE
                && subgroupSizes.stream().anyMatch(n -> n > 1)) {
            throw new UserException(DesignMessage.SIGMA_DOES_NOT_SUIT, "mr", subgroupSizes.get(subgroupSizes.size() - 1));
        }
        if (!(shift > 0) || !Double.isFinite(shift)) {
            throw new UserException(DesignMessage.BAD_SHIFT, shift);
        }
        if (!(lossRate >= 0 && lossRate < 1)) {
            throw new UserException(DesignMessage.BAD_LOSS_RATE, lossRate);
        }
        notes = List.copyOf(notes);
        IndexShape.of(requirement.index(), sides);
    }

    /** Defaults: power 0.90, n = 1–10, default estimators, exact bound, floors 25/100, δ = 1.5, no losses. */
    public static DesignRequest of(SpecLimits.Sides sides, Requirement requirement, Expectation expectation) {
        return new DesignRequest(sides, requirement, expectation, DEFAULT_POWER,
                IntStream.rangeClosed(1, 10).boxed().toList(), Optional.empty(), BoundMethod.EXACT,
                PracticeFloors.defaults(), DEFAULT_SHIFT, 0, List.of());
    }

    public DesignRequest withPower(double p) {
        return new DesignRequest(sides, requirement, expectation, p, subgroupSizes, sigmaMethod, boundMethod, floors,
                shift, lossRate, notes);
    }

    public DesignRequest withSubgroupSizes(List<Integer> sizes) {
        return new DesignRequest(sides, requirement, expectation, power, sizes, sigmaMethod, boundMethod, floors,
                shift, lossRate, notes);
    }

    public DesignRequest withSigmaMethod(SigmaMethod m) {
        return new DesignRequest(sides, requirement, expectation, power, subgroupSizes, Optional.ofNullable(m),
                boundMethod, floors, shift, lossRate, notes);
    }

    public DesignRequest withBoundMethod(BoundMethod m) {
        return new DesignRequest(sides, requirement, expectation, power, subgroupSizes, sigmaMethod, m, floors,
                shift, lossRate, notes);
    }

    public DesignRequest withFloors(PracticeFloors f) {
        return new DesignRequest(sides, requirement, expectation, power, subgroupSizes, sigmaMethod, boundMethod, f,
                shift, lossRate, notes);
    }

    public DesignRequest withShift(double delta) {
        return new DesignRequest(sides, requirement, expectation, power, subgroupSizes, sigmaMethod, boundMethod,
                floors, delta, lossRate, notes);
    }

    public DesignRequest withLossRate(double p) {
        return new DesignRequest(sides, requirement, expectation, power, subgroupSizes, sigmaMethod, boundMethod,
                floors, shift, p, notes);
    }

    public DesignRequest withExpectation(Expectation e) {
        return new DesignRequest(sides, requirement, e, power, subgroupSizes, sigmaMethod, boundMethod, floors, shift,
                lossRate, notes);
    }

    public DesignRequest withRequirement(Requirement r) {
        return new DesignRequest(sides, r, expectation, power, subgroupSizes, sigmaMethod, boundMethod, floors, shift,
                lossRate, notes);
    }

    public DesignRequest withNotes(List<String> more) {
        return new DesignRequest(sides, requirement, expectation, power, subgroupSizes, sigmaMethod, boundMethod,
                floors, shift, lossRate, more);
    }

    /**
     * Checks that some study can show the requirement at all: the expected index must lie above the
     * required one (at c₁ ≤ c₀ the power cannot exceed 1 − confidence, whatever the size).
     *
     * @throws UserException if c₁ ≤ c₀
     */
    public void requireAttainable() {
        if (!(expectation.index() > requirement.minimum())) {
            throw new UserException(DesignMessage.NOT_BETTER_THAN_REQUIRED, requirement.index().symbol(),
                    expectation.index(), requirement.minimum());
        }
    }

    /** The within estimator for subgroups of size n: moving range for n = 1, else the chosen or default one. */
    public SigmaMethod sigmaFor(int n) {
        if (n == 1) {
            return SigmaMethod.MOVING_RANGE;
        }
        return sigmaMethod.orElse(SigmaMethod.defaultFor(n));
    }

    IndexShape shape() {
        return IndexShape.of(requirement.index(), sides);
    }
}

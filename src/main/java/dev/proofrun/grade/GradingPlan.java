package dev.proofrun.grade;

import dev.proofrun.design.Design;
import dev.proofrun.design.Stages;
import java.time.Duration;
import java.time.ZoneId;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * What grading needs of a plan: its identity, characteristics, design and slots. Built from the plan file's
 * model (see {@code GradingPlans}); the grade never takes any of this from the returned file.
 *
 * @param id               the plan's id, e.g. "PR-2027-0042"
 * @param revision         the issued revision fingerprint
 * @param zone             the plan's time zone (for "yyyy-MM-dd HH:mm" and "HH:mm" in the taken column)
 * @param characteristics  in the plan's order
 * @param design           subgroup size, number of subgroups, estimator, bound method
 * @param slots            the k slots in time order
 * @param allowedShortfall how many of the k subgroups may be unusable before the study is not valid
 * @param interval         the planned time between subgroups (the plan's frequency)
 * @param stages           the planned looks of a staged study; empty for a single-stage study
 */
public record GradingPlan(String id, String revision, ZoneId zone, List<PlannedCharacteristic> characteristics,
        Design design, List<PlannedSlot> slots, int allowedShortfall, Duration interval, Optional<Stages> stages) {

    /** A single-stage plan. */
    public GradingPlan(String id, String revision, ZoneId zone, List<PlannedCharacteristic> characteristics,
            Design design, List<PlannedSlot> slots, int allowedShortfall, Duration interval) {
        this(id, revision, zone, characteristics, design, slots, allowedShortfall, interval, Optional.empty());
    }

    /**
     * @throws IllegalArgumentException if there are no characteristics, duplicate ids, or the number of slots
     *                                  differs from the design's subgroups
     * @throws IllegalArgumentException if the last planned look is not at the last slot
     */
    public GradingPlan {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(revision, "revision");
        Objects.requireNonNull(zone, "zone");
        Objects.requireNonNull(design, "design");
        characteristics = List.copyOf(characteristics);
        slots = List.copyOf(slots);
        if (characteristics.isEmpty()) {
            throw new IllegalArgumentException("a plan needs at least one characteristic");
        }
        if (characteristics.stream().map(PlannedCharacteristic::id).distinct().count() != characteristics.size()) {
            throw new IllegalArgumentException("characteristic ids must be unique");
        }
        if (slots.stream().map(PlannedSlot::id).distinct().count() != slots.size()) {
            throw new IllegalArgumentException("slot ids must be unique");
        }
        if (allowedShortfall < 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "allowed shortfall must not be negative: %d", allowedShortfall));
        }
        stages = stages == null ? Optional.empty() : stages;
        if (stages.isPresent() && stages.get().last().subgroups() != slots.size()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "the last look is at %d subgroups, the plan has %d slots",
                    stages.get().last().subgroups(), slots.size()));
        }
    }

    /**
     * proofrun's default allowance when the plan states none: a tenth of the planned subgroups, rounded down
     * (our choice, not a trade rule: a study that lost more than that no longer has the design's power and
     * spread over time).
     */
    public static int defaultAllowedShortfall(int subgroups) {
        return dev.proofrun.design.LossAllowance.of(subgroups);
    }

    /** Whether the plan has planned looks before its end. */
    public boolean staged() {
        return stages.isPresent() && stages.get().staged();
    }

    /** The same plan with these planned looks. */
    public GradingPlan withStages(Stages planned) {
        return new GradingPlan(id, revision, zone, characteristics, design, slots, allowedShortfall, interval,
                Optional.of(planned));
    }

    /** "PR-2027-0042@1a2b3c4d5e6f", as in the fill-in file's plan cell. */
    public String reference() {
        return id + "@" + revision;
    }

    /** Slot id → position in {@link #slots}. */
    public Map<String, Integer> slotIndex() {
        Map<String, Integer> m = new HashMap<>(slots.size() * 2);
        for (int i = 0; i < slots.size(); i++) {
            m.put(slots.get(i).id(), i);
        }
        return m;
    }
}

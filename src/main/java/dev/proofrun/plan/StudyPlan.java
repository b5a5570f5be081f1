package dev.proofrun.plan;

import dev.proofrun.design.Design;
import dev.proofrun.design.Stages;
import dev.proofrun.schedule.ProductionCalendar;
import dev.proofrun.schedule.Schedule;
import dev.proofrun.schedule.Scheduler;
import dev.proofrun.schedule.Spacing;
import dev.proofrun.schedule.StudySpan;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

/**
 * A capability study plan: what is studied (part, characteristics with their requirements), by whom, with
 * which design, on which production calendar and span, and the resulting dated schedule.
 *
 * <p>One {@link Design} serves every characteristic: all of them are measured on the same n consecutive
 * parts at each slot, so the plan has one k and one n. The design engineer's multi-characteristic sizing
 * picks the k and n that suit the most demanding characteristic.
 *
 * <p>The schedule is stored, not recomputed on reading: an issued plan's slots are what the sheet printed.
 * {@link #draft} computes it from calendar, span, design, spacing and seed.
 *
 * @param id              the plan id, e.g. "PR-2027-0042": letters, digits, '.', '-', '_' (no '@')
 * @param part            the part
 * @param people          author and collector
 * @param characteristics one or more, ids unique
 * @param calendar        the production calendar
 * @param span            start and extent of the study
 * @param design          k subgroups of n, estimator and bound method
 * @param spacing         even or stratified random
 * @param seed            the seed of the random spacing (kept for every plan so a re-schedule is the same)
 * @param schedule        the k slots
 * @param state           draft or issued
 * @param revision        the fingerprint of the issued content (12 hex digits), empty for a draft
 * @param supersedes      the revision this plan replaces, if it was made by changing an issued plan
 * @param revisionNumber  the revision as people say it: 1 for a plan's first issue, one more for each issued
 *                        change after it (a draft carries the number it will be issued as). The fingerprint
 *                        stays the identity; the number is for speaking ("revision 2") and is covered by it
 * @param stages          the planned looks of a staged study (its last look at all k subgroups); empty for a
 *                        single-stage study, whose file then has no {@code stages} object
 */
public record StudyPlan(String id, Part part, People people, List<Characteristic> characteristics,
        ProductionCalendar calendar, StudySpan span, Design design, Spacing spacing, long seed, Schedule schedule,
        PlanState state, Optional<String> revision, Optional<String> supersedes, int revisionNumber,
        Optional<Stages> stages) {

    /**
     * The largest subgroup size a plan file may state: the fill-in workbook has one column per reading beside
     * eight others (plan, slot, characteristic, planned, taken, lot, operator, remark), and a sheet has 16,384
     * columns (A to XFD).
     */
    public static final int MAX_SUBGROUP_SIZE = 16_384 - 8;

    /** A revision fingerprint: 12 lower-case hex digits. */
    public static final String REVISION_PATTERN = "[0-9a-f]{12}";

    /**
     * @throws IllegalArgumentException if a part is missing, ids are bad or repeated
     * @throws IllegalArgumentException if the schedule does not have k slots of n parts
     * @throws IllegalArgumentException if an issued plan lacks a revision or a draft has one
     * @throws IllegalArgumentException if the revision number is below 1
     * @throws IllegalArgumentException if the stages' last look is not at the design's k subgroups
     */
    public StudyPlan {
        if (id == null || !id.matches("[A-Za-z0-9._-]{1,40}")) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "plan id must be 1-40 letters, digits, '.', '-' or '_': '%s'", id));
        }
        if (part == null || people == null || calendar == null || span == null || design == null
                || spacing == null || schedule == null || state == null) {
            throw new IllegalArgumentException("every part of a plan is required");
        }
        if (characteristics == null || characteristics.isEmpty()) {
            throw new IllegalArgumentException("a plan needs at least one characteristic");
        }
        characteristics = List.copyOf(characteristics);
        Set<String> ids = new HashSet<>();
        for (Characteristic c : characteristics) {
            if (!ids.add(c.id())) {
                throw new IllegalArgumentException("two characteristics have the id " + c.id());
            }
        }
        if (schedule.slots().size() != design.subgroups() || schedule.subgroupSize() != design.subgroupSize()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "the schedule (%d slots of %d) does not match the design (%d subgroups of %d)",
                    schedule.slots().size(), schedule.subgroupSize(), design.subgroups(), design.subgroupSize()));
        }
        revision = revision == null ? Optional.empty() : revision;
        supersedes = supersedes == null ? Optional.empty() : supersedes;
        if ((state == PlanState.ISSUED) != revision.isPresent()) {
            throw new IllegalArgumentException("an issued plan has a revision and a draft has none");
        }
        revision.ifPresent(StudyPlan::requireRevision);
        supersedes.ifPresent(StudyPlan::requireRevision);
        if (revisionNumber < 1) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "a revision number is 1 or more: %d", revisionNumber));
        }
        // one look is the single-stage study: stored as no stages, so its file is the single-stage file
        stages = stages == null || stages.isPresent() && !stages.get().staged() ? Optional.empty() : stages;
        if (stages.isPresent() && stages.get().last().subgroups() != design.subgroups()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "the last look is at %d subgroups, the design has %d", stages.get().last().subgroups(),
                    design.subgroups()));
        }
    }

    /** A single-stage plan with this revision number. */
    public StudyPlan(String id, Part part, People people, List<Characteristic> characteristics,
            ProductionCalendar calendar, StudySpan span, Design design, Spacing spacing, long seed, Schedule schedule,
            PlanState state, Optional<String> revision, Optional<String> supersedes, int revisionNumber) {
        this(id, part, people, characteristics, calendar, span, design, spacing, seed, schedule, state, revision,
                supersedes, revisionNumber, Optional.empty());
    }

    /** A plan of revision number 1 with these planned looks (or none). */
    public StudyPlan(String id, Part part, People people, List<Characteristic> characteristics,
            ProductionCalendar calendar, StudySpan span, Design design, Spacing spacing, long seed, Schedule schedule,
            PlanState state, Optional<String> revision, Optional<String> supersedes, Optional<Stages> stages) {
        this(id, part, people, characteristics, calendar, span, design, spacing, seed, schedule, state, revision,
                supersedes, 1, stages);
    }

    /** A single-stage plan of revision number 1: a first issue, or a plan written before revisions were numbered. */
    public StudyPlan(String id, Part part, People people, List<Characteristic> characteristics,
            ProductionCalendar calendar, StudySpan span, Design design, Spacing spacing, long seed, Schedule schedule,
            PlanState state, Optional<String> revision, Optional<String> supersedes) {
        this(id, part, people, characteristics, calendar, span, design, spacing, seed, schedule, state, revision,
                supersedes, 1, Optional.empty());
    }

    /**
     * The revision as people say it beside the fingerprint: "revision 2 (3f2a9c01b7de)" when issued, "draft of
     * revision 2" before.
     */
    public String revisionWords() {
        return revision.map(r -> PlanMessage.REVISION_ISSUED.format(revisionNumber, r))
                .orElseGet(() -> PlanMessage.REVISION_DRAFT.format(revisionNumber));
    }

    private static void requireRevision(String r) {
        if (!r.matches(REVISION_PATTERN)) {
            throw new IllegalArgumentException("a revision is 12 lower-case hex digits: " + r);
        }
    }

    /**
     * A new draft with its schedule computed by {@link Scheduler}.
     *
     * @throws dev.proofrun.text.UserException when the calendar cannot hold the schedule
     */
    public static StudyPlan draft(String id, Part part, People people, List<Characteristic> characteristics,
            ProductionCalendar calendar, StudySpan span, Design design, Spacing spacing, long seed) {
        Schedule schedule = Scheduler.schedule(calendar, span, design.subgroups(), design.subgroupSize(), spacing, seed);
        return new StudyPlan(id, part, people, characteristics, calendar, span, design, spacing, seed, schedule,
                PlanState.DRAFT, Optional.empty(), Optional.empty());
    }

    /** "PR-2027-0042@3f2a9c01b7de" as the fill-in files carry it; a draft reads "PR-2027-0042@draft". */
    public String reference() {
        return id + "@" + revision.orElse(PlanState.DRAFT.token());
    }

    public boolean isIssued() {
        return state == PlanState.ISSUED;
    }

    /** The characteristic with this id, if any. */
    public Optional<Characteristic> characteristic(String characteristicId) {
        return characteristics.stream().filter(c -> c.id().equals(characteristicId)).findFirst();
    }

    /** The one-sentence frequency summary of the schedule. */
    public String summary() {
        return schedule.summary();
    }

    /**
     * A draft to change an issued plan: same content, no revision, remembering the revision it replaces, and
     * numbered one more. Issuing it gives a new revision; the old issued file is never rewritten in place.
     */
    public StudyPlan reopen() {
        if (!isIssued()) {
            return this;
        }
        return new StudyPlan(id, part, people, characteristics, calendar, span, design, spacing, seed, schedule,
                PlanState.DRAFT, Optional.empty(), revision, revisionNumber + 1, stages);
    }

    /** The same plan, issued with the given fingerprint (package use: {@link PlanFiles#issue(StudyPlan)}). */
    StudyPlan issuedAs(String fingerprint) {
        return new StudyPlan(id, part, people, characteristics, calendar, span, design, spacing, seed, schedule,
                PlanState.ISSUED, Optional.of(fingerprint), supersedes, revisionNumber, stages);
    }

    /** The same plan with another schedule (re-scheduling a draft, e.g. after changing the seed). */
    public StudyPlan withSchedule(Schedule newSchedule) {
        if (isIssued()) {
            throw new IllegalStateException("an issued plan is frozen; reopen() it first");
        }
        return new StudyPlan(id, part, people, characteristics, calendar, span, design, spacing, seed, newSchedule,
                state, revision, supersedes, revisionNumber, stages);
    }

    /**
     * The same draft with these planned looks (or none, for a single-stage study).
     *
     * @throws IllegalStateException    for an issued plan
     * @throws IllegalArgumentException if the last look is not at the design's k subgroups
     */
    public StudyPlan withStages(Optional<Stages> newStages) {
        if (isIssued()) {
            throw new IllegalStateException("an issued plan is frozen; reopen() it first");
        }
        return new StudyPlan(id, part, people, characteristics, calendar, span, design, spacing, seed, schedule,
                state, revision, supersedes, revisionNumber, newStages);
    }

    /** Whether the plan has planned looks before its end. */
    public boolean isStaged() {
        return stages.isPresent() && stages.get().staged();
    }
}

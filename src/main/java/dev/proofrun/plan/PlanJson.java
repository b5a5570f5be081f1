package dev.proofrun.plan;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.List;

/**
 * The plan file as Jackson reads and writes it: plain values only (strings, numbers, lists), concrete
 * records, no type information taken from the file. {@link PlanCodec} converts to and from the model.
 * Fields written as {@code null} are left out of the file.
 *
 * <p>Format version 1; the property order below is the order in the file and in the canonical form.
 */
final class PlanJson {

    /** The value of {@code format}. */
    static final String FORMAT = "proofrun-plan";
    /** The format version this code reads and writes. */
    static final int VERSION = 1;

    private PlanJson() {
    }

    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"format", "formatVersion", "id", "state", "revision", "revisionNumber", "supersedes", "part",
        "people", "design", "stages", "characteristics", "calendar", "span", "spacing", "seed", "schedule"})
    record File(String format, Integer formatVersion, String id, String state, String revision, Integer revisionNumber,
            String supersedes, PartJ part, PeopleJ people, DesignJ design, StagesJ stages, List<CharacteristicJ> characteristics,
            CalendarJ calendar, SpanJ span, String spacing, Long seed, ScheduleJ schedule) {
    }

    @JsonPropertyOrder({"name", "number", "revision"})
    record PartJ(String name, String number, String revision) {
    }

    @JsonPropertyOrder({"author", "collector"})
    record PeopleJ(String author, String collector) {
    }

    @JsonPropertyOrder({"subgroupSize", "subgroups", "sigmaMethod", "boundMethod"})
    record DesignJ(Integer subgroupSize, Integer subgroups, String sigmaMethod, String boundMethod) {
    }

    /** A staged study's looks; left out of the file of a single-stage plan, so its revision is as before. */
    @JsonPropertyOrder({"spending", "looks"})
    record StagesJ(String spending, List<LookJ> looks) {
    }

    /** One planned look; {@code futility} left out where the look has none (always at the last look). */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"subgroups", "confidence", "futility"})
    record LookJ(Integer subgroups, Double confidence, Double futility) {
    }

    /**
     * {@code threshold} or {@code floor} is written only for the threshold shapes, so other plans keep their bytes and
     * revision.
     */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"id", "name", "unit", "nominal", "lsl", "usl", "shape", "threshold", "floor", "gauge", "requirement",
        "expectation"})
    record CharacteristicJ(String id, String name, String unit, Double nominal, Double lsl, Double usl, String shape,
            Double threshold, Double floor, GaugeJ gauge, RequirementJ requirement, ExpectationJ expectation) {
    }

    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"name", "resolution", "sd"})
    record GaugeJ(String name, Double resolution, Double sd) {
    }

    @JsonPropertyOrder({"index", "minimum", "confidence"})
    record RequirementJ(String index, Double minimum, Double confidence) {
    }

    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"index", "potential"})
    record ExpectationJ(Double index, Double potential) {
    }

    @JsonPropertyOrder({"zone", "workingDays", "shifts", "breaks", "nonWorkingDates", "rate"})
    record CalendarJ(String zone, List<String> workingDays, List<ShiftJ> shifts, List<BreakJ> breaks,
            List<String> nonWorkingDates, RateJ rate) {
    }

    @JsonPropertyOrder({"name", "start", "end"})
    record ShiftJ(String name, String start, String end) {
    }

    @JsonPropertyOrder({"start", "end"})
    record BreakJ(String start, String end) {
    }

    /** Exactly one of the two. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"partsPerHour", "cycleSeconds"})
    record RateJ(Double partsPerHour, Double cycleSeconds) {
    }

    /** {@code start} and exactly one of shifts, days, lots (with lotParts) or until. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"start", "shifts", "days", "lots", "lotParts", "until"})
    record SpanJ(String start, Integer shifts, Integer days, Integer lots, Long lotParts, String until) {
    }

    @JsonPropertyOrder({"workingMinutes", "spacingMinutes", "end", "shifts", "days", "slots"})
    record ScheduleJ(Double workingMinutes, Double spacingMinutes, String end, Integer shifts, Integer days,
            List<SlotJ> slots) {
    }

    @JsonPropertyOrder({"id", "start", "windowMinutes", "shift", "partsSinceStart"})
    record SlotJ(String id, String start, Integer windowMinutes, String shift, Long partsSinceStart) {
    }
}

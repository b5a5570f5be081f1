package dev.proofrun.app.session;

import dev.proofrun.design.Design;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.Gauge;
import dev.proofrun.plan.Part;
import dev.proofrun.plan.People;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.CalendarSyntax;
import dev.proofrun.schedule.ProductionCalendar;
import dev.proofrun.schedule.Spacing;
import dev.proofrun.schedule.StudySpan;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Function;

/**
 * Between the plan model and the draft the wizard edits: a plan file becomes text fields
 * ({@link #snapshotOf}), and the checked inputs of the steps become a plan again ({@link #compose}).
 * What the wizard does not edit (a gauge's repeatability) is carried over from the plan the draft was opened
 * from, matched by characteristic id. Each row keeps its own requirement and expected centring
 * ({@link RowRequirement}); the Goal step shows the first characteristic's requirement as the plan's.
 */
public final class PlanDrafts {

    private PlanDrafts() {
    }

    /**
     * The plan as the wizard's text fields. The first characteristic's requirement is the plan's (on Goal); a row
     * whose requirement differs keeps the differing cells, the others are left blank.
     */
    public static DraftSnapshot snapshotOf(StudyPlan plan, java.nio.file.Path file) {
        Map<String, String> f = new LinkedHashMap<>();
        for (DraftField d : DraftField.values()) {
            f.put(d.name(), d.initial());
        }
        f.put(DraftField.PLAN_ID.name(), plan.id());
        f.put(DraftField.PART_NAME.name(), plan.part().name());
        f.put(DraftField.PART_NUMBER.name(), plan.part().number());
        f.put(DraftField.PART_REVISION.name(), plan.part().revision());
        f.put(DraftField.PREPARED_BY.name(), plan.people().author());
        f.put(DraftField.COLLECTOR.name(), plan.people().collector());
        Characteristic first = plan.characteristics().get(0);
        f.put(DraftField.INDEX.name(), first.requirement().index().token());
        f.put(DraftField.MINIMUM.name(), num(first.requirement().minimum()));
        f.put(DraftField.CONFIDENCE.name(), num(first.requirement().confidence()));
        f.put(DraftField.FOCUS.name(), first.id());
        f.put(DraftField.CHOSEN_SUBGROUP_SIZE.name(), Integer.toString(plan.design().subgroupSize()));
        f.put(DraftField.CHOSEN_SUBGROUPS.name(), Integer.toString(plan.design().subgroups()));
        plan.stages().filter(dev.proofrun.design.Stages::staged).ifPresent(st -> {
            f.put(DraftField.STAGES.name(), Integer.toString(st.count()));
            f.put(DraftField.SPENDING.name(), st.spending().token());
        });
        StudySpan span = plan.span();
        f.put(DraftField.START.name(), CalendarText.start(span.start()));
        f.put(DraftField.SPAN_KIND.name(), span.kind().name().toLowerCase(Locale.ROOT));
        f.put(DraftField.SPAN_COUNT.name(), Integer.toString(span.count()));
        ProductionCalendar c = plan.calendar();
        f.put(DraftField.ZONE.name(), c.zone().getId());
        f.put(DraftField.WORKING_DAYS.name(), CalendarSyntax.workingDays(c.workingDaysInOrder()));
        f.put(DraftField.SHIFTS.name(), CalendarSyntax.shifts(c.shifts()));
        f.put(DraftField.BREAKS.name(), CalendarSyntax.breaks(c.breaks()));
        f.put(DraftField.NON_WORKING.name(), CalendarSyntax.dates(c.nonWorkingDates()));
        f.put(DraftField.RATE.name(), CalendarText.rate(c.rate()));
        f.put(DraftField.SPACING.name(), plan.spacing().token());
        f.put(DraftField.SEED.name(), Long.toString(plan.seed()));
        List<Map<String, String>> rows = new ArrayList<>();
        for (Characteristic ch : plan.characteristics()) {
            Map<String, String> r = new LinkedHashMap<>();
            r.put("id", ch.id());
            r.put("name", ch.name());
            r.put("unit", ch.unit());
            r.put("nominal", ch.nominal().isPresent() ? num(ch.nominal().getAsDouble()) : "");
            r.put("lsl", ch.limits().lower().isPresent() ? num(ch.limits().lower().getAsDouble()) : "");
            r.put("usl", ch.limits().upper().isPresent() ? num(ch.limits().upper().getAsDouble()) : "");
            // the row's own requirement where it differs from the plan's (the first characteristic's, on Goal)
            Requirement req = ch.requirement();
            Requirement shown = first.requirement();
            r.put("index", req.index() == shown.index() ? "" : req.index().token());
            r.put("target", req.minimum() == shown.minimum() ? "" : num(req.minimum()));
            r.put("confidence", req.confidence() == shown.confidence() ? "" : num(req.confidence()));
            r.put("expected", num(ch.expectation().index()));
            r.put("expected_cp", ch.expectation().potential().isPresent() ? num(ch.expectation().potential().getAsDouble()) : "");
            r.put("shape", ch.shape().token());
            r.put("threshold", ch.threshold().isPresent() ? num(ch.threshold().getAsDouble()) : "");
            r.put("floor", ch.floor().isPresent() ? num(ch.floor().getAsDouble()) : "");
            r.put("gauge", ch.gauge().map(Gauge::name).orElse(""));
            r.put("resolution", ch.gauge().map(g -> num(g.resolution())).orElse(""));
            rows.add(r);
        }
        return new DraftSnapshot(DraftSnapshot.FORMAT, file == null ? "" : file.toString(), f, rows);
    }

    /**
     * A draft plan from the steps' checked inputs.
     *
     * @param base        the plan the draft was opened from, for what the wizard does not edit
     * @param requirement the plan's requirement (the Goal step's), for the cells a row leaves blank
     *                    ({@link RowRequirement#of})
     * @param expectation the expectation for each characteristic row
     * @param schedule    the schedule computed for this calendar, span, design, spacing and seed
     * @throws IllegalArgumentException when a value is refused by the plan model
     */
    public static StudyPlan compose(StudyDraft d, Optional<StudyPlan> base, Requirement requirement,
            Function<CharacteristicDraft, Expectation> expectation, ProductionCalendar calendar, StudySpan span,
            Design design, Spacing spacing, long seed, dev.proofrun.schedule.Schedule schedule) {
        List<Characteristic> chars = new ArrayList<>();
        for (CharacteristicDraft row : d.characteristics()) {
            Optional<Characteristic> was = base.flatMap(b -> b.characteristic(row.id()));
            Optional<Gauge> gauge = gaugeOf(row, was.flatMap(Characteristic::gauge));
            Expectation e = expectation.apply(row);
            OptionalDouble nominal = row.number(CharacteristicField.NOMINAL);
            dev.proofrun.stats.ShapeFamily shape = shapeOf(row);
            chars.add(new Characteristic(row.id(), row.text(CharacteristicField.NAME).trim(),
                    row.text(CharacteristicField.UNIT).trim(), nominal, row.limits().orElseThrow(), gauge,
                    RowRequirement.of(row, Optional.of(requirement)).orElseThrow(() -> new IllegalArgumentException(
                            "the requirement of " + row.id() + " is not complete")), e,
                    shape, RowThreshold.of(row), RowThreshold.floorOf(row)));
        }
        Part part = new Part(d.text(DraftField.PART_NAME), d.text(DraftField.PART_NUMBER), d.text(DraftField.PART_REVISION));
        People people = new People(d.text(DraftField.PREPARED_BY), d.text(DraftField.COLLECTOR));
        // The schedule the Timing step already had the core compute for these inputs (not computed again).
        return new StudyPlan(d.text(DraftField.PLAN_ID), part, people, chars, calendar, span, design, spacing, seed,
                schedule, dev.proofrun.plan.PlanState.DRAFT, Optional.empty(), Optional.empty());
    }

    /**
     * The gauge typed in the row (name and resolution; both blank is no gauge), with the repeatability of
     * the gauge the plan had, which the wizard does not edit.
     *
     * @throws IllegalArgumentException when only one of name and resolution is given or the resolution is
     *                                  not a positive number
     */
    public static Optional<Gauge> gaugeOf(CharacteristicDraft row, Optional<Gauge> was) {
        String name = row.text(CharacteristicField.GAUGE).trim();
        String step = row.text(CharacteristicField.RESOLUTION).trim();
        if (name.isEmpty() && step.isEmpty()) {
            return Optional.empty();
        }
        OptionalDouble resolution = FieldNumbers.parse(step);
        if (resolution.isEmpty() && !step.isEmpty()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "gauge resolution must be positive: %s", step));
        }
        OptionalDouble sd = was.map(Gauge::sd).orElse(OptionalDouble.empty());
        return Optional.of(new Gauge(name, resolution.orElse(Double.NaN), sd));
    }

    /** The planned shape typed in the row; blank is normal. */
    public static dev.proofrun.stats.ShapeFamily shapeOf(CharacteristicDraft row) {
        String t = row.text(CharacteristicField.SHAPE).trim();
        return t.isEmpty() ? dev.proofrun.stats.ShapeFamily.NORMAL : dev.proofrun.stats.ShapeFamily.fromToken(t);
    }

    static String num(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return String.format(Locale.ROOT, "%.1f", v);
        }
        return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
}

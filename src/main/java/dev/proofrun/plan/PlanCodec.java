package dev.proofrun.plan;

import dev.proofrun.design.Design;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.design.Stages;
import dev.proofrun.schedule.BreakWindow;
import dev.proofrun.schedule.ProductionCalendar;
import dev.proofrun.schedule.ProductionRate;
import dev.proofrun.schedule.Schedule;
import dev.proofrun.schedule.Shift;
import dev.proofrun.schedule.Slot;
import dev.proofrun.schedule.Spacing;
import dev.proofrun.schedule.StudySpan;
import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.time.DateTimeException;
import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.util.AbstractList;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Supplier;

/**
 * Converts between the model ({@link StudyPlan}) and the file records ({@link PlanJson}). Reading checks
 * every value and names the JSON path of the first problem ("$.characteristics[1].lsl").
 */
final class PlanCodec {

    private final Location file;

    private PlanCodec(Location file) {
        this.file = file;
    }

    // ---- model -> file ----

    static PlanJson.File toJson(StudyPlan p) {
        List<PlanJson.CharacteristicJ> chars = new ArrayList<>();
        for (Characteristic c : p.characteristics()) {
            PlanJson.GaugeJ gauge = c.gauge().map(g -> new PlanJson.GaugeJ(g.name(), g.resolution(), boxed(g.sd())))
                    .orElse(null);
            chars.add(new PlanJson.CharacteristicJ(c.id(), c.name(), c.unit(), boxed(c.nominal()),
                    boxed(c.limits().lower()), boxed(c.limits().upper()),
                    c.shape().isNormal() ? null : c.shape().token(), boxed(c.threshold()), boxed(c.floor()), gauge,
                    new PlanJson.RequirementJ(c.requirement().index().token(), c.requirement().minimum(),
                            c.requirement().confidence()),
                    new PlanJson.ExpectationJ(c.expectation().index(), boxed(c.expectation().potential()))));
        }
        ProductionCalendar cal = p.calendar();
        List<String> days = cal.workingDaysInOrder().stream().map(d -> d.name().substring(0, 3)).toList();
        List<PlanJson.ShiftJ> shifts = cal.shifts().stream()
                .map(s -> new PlanJson.ShiftJ(s.name(), s.start().toString(), s.end().toString())).toList();
        List<PlanJson.BreakJ> breaks = cal.breaks().stream()
                .map(b -> new PlanJson.BreakJ(b.start().toString(), b.end().toString())).toList();
        List<String> off = cal.nonWorkingDates().stream().map(LocalDate::toString).toList();
        PlanJson.RateJ rate = cal.rate().unit() == ProductionRate.Unit.PARTS_PER_HOUR
                ? new PlanJson.RateJ(cal.rate().value(), null) : new PlanJson.RateJ(null, cal.rate().value());
        StudySpan sp = p.span();
        PlanJson.SpanJ span = new PlanJson.SpanJ(sp.start().toString(),
                sp.kind() == StudySpan.Kind.SHIFTS ? sp.count() : null,
                sp.kind() == StudySpan.Kind.DAYS ? sp.count() : null,
                sp.kind() == StudySpan.Kind.LOTS ? sp.count() : null,
                sp.kind() == StudySpan.Kind.LOTS ? sp.lotParts() : null,
                sp.kind() == StudySpan.Kind.UNTIL ? sp.until().toString() : null);
        Schedule s = p.schedule();
        List<Slot> model = s.slots();
        // a view, not a copy: each slot's record is made as the writer reaches it and dropped after (a plan can
        // have 200,000 slots, and the fingerprint writes them all once more)
        List<PlanJson.SlotJ> slots = new AbstractList<>() {
            @Override
            public PlanJson.SlotJ get(int i) {
                Slot x = model.get(i);
                return new PlanJson.SlotJ(x.id(), x.start().toString(), x.windowMinutes(), x.shift(), x.partsSinceStart());
            }

            @Override
            public int size() {
                return model.size();
            }
        };
        Design d = p.design();
        return new PlanJson.File(PlanJson.FORMAT, PlanJson.VERSION, p.id(), p.state().token(),
                // revision number 1 is left out: files written before the number existed keep their bytes and revision
                p.revision().orElse(null), p.revisionNumber() == 1 ? null : p.revisionNumber(), p.supersedes().orElse(null),
                new PlanJson.PartJ(p.part().name(), p.part().number(), p.part().revision()),
                new PlanJson.PeopleJ(p.people().author(), p.people().collector()),
                new PlanJson.DesignJ(d.subgroupSize(), d.subgroups(), d.sigmaMethod().token(), d.boundMethod().token()),
                p.stages().map(PlanCodec::stagesJson).orElse(null), chars,
                new PlanJson.CalendarJ(cal.zone().getId(), days, shifts, breaks, off, rate),
                span, p.spacing().token(), p.seed(),
                new PlanJson.ScheduleJ(s.workingMinutes(), s.spacingMinutes(), s.end().toString(), s.shifts(), s.days(),
                        slots));
    }

    private static PlanJson.StagesJ stagesJson(Stages st) {
        return new PlanJson.StagesJ(st.spending().token(), st.looks().stream().map(l -> new PlanJson.LookJ(l.subgroups(),
                l.confidence(), l.stopsForFutility() ? l.futility() : null)).toList());
    }

    private static Double boxed(OptionalDouble x) {
        return x.isPresent() ? x.getAsDouble() : null;
    }

    // ---- file -> model ----

    static StudyPlan fromJson(PlanJson.File f, Location file) {
        return new PlanCodec(file).plan(f);
    }

    private StudyPlan plan(PlanJson.File f) {
        String id = req(f.id(), "$.id");
        PlanState state = value("$.state", () -> PlanState.fromToken(req(f.state(), "$.state")));
        PlanJson.PartJ pj = req(f.part(), "$.part");
        Part part = value("$.part", () -> new Part(req(pj.name(), "$.part.name"), pj.number(), pj.revision()));
        People people = f.people() == null ? People.unnamed() : new People(f.people().author(), f.people().collector());
        PlanJson.DesignJ dj = req(f.design(), "$.design");
        int n = req(dj.subgroupSize(), "$.design.subgroupSize");
        if (n < 1 || n > StudyPlan.MAX_SUBGROUP_SIZE) {
            throw new UserException(file, PlanMessage.SUBGROUP_SIZE_RANGE, "$.design.subgroupSize", StudyPlan.MAX_SUBGROUP_SIZE, n);
        }
        Design design = value("$.design", () -> new Design(req(dj.subgroupSize(), "$.design.subgroupSize"),
                req(dj.subgroups(), "$.design.subgroups"),
                value("$.design.sigmaMethod", () -> SigmaMethod.fromToken(req(dj.sigmaMethod(), "$.design.sigmaMethod"))),
                value("$.design.boundMethod", () -> BoundMethod.fromToken(req(dj.boundMethod(), "$.design.boundMethod")))));
        List<PlanJson.CharacteristicJ> cjs = req(f.characteristics(), "$.characteristics");
        List<Characteristic> chars = new ArrayList<>();
        for (int i = 0; i < cjs.size(); i++) {
            chars.add(characteristic(req(cjs.get(i), at("$.characteristics", i)), at("$.characteristics", i)));
        }
        ProductionCalendar calendar = calendar(req(f.calendar(), "$.calendar"));
        StudySpan span = span(req(f.span(), "$.span"));
        Spacing spacing = value("$.spacing", () -> Spacing.fromToken(req(f.spacing(), "$.spacing")));
        long seed = req(f.seed(), "$.seed");
        Schedule schedule = schedule(req(f.schedule(), "$.schedule"), design.subgroupSize());
        Integer number = f.revisionNumber();
        if (number != null && number < 2) {
            throw new UserException(file, PlanMessage.REVISION_NUMBER_RANGE, number);
        }
        Optional<Stages> stages = f.stages() == null ? Optional.empty()
                : Optional.of(PlanStagesCodec.read(f.stages(), design.subgroups(), chars, file));
        return value("$", () -> new StudyPlan(id, part, people, chars, calendar, span, design, spacing, seed, schedule,
                state, Optional.ofNullable(f.revision()), Optional.ofNullable(f.supersedes()), number == null ? 1 : number,
                stages));
    }

    private Characteristic characteristic(PlanJson.CharacteristicJ c, String path) {
        SpecLimits limits = value(path, () -> SpecLimits.of(c.lsl(), c.usl()));
        Optional<Gauge> gauge = Optional.ofNullable(c.gauge()).map(g -> value(path + ".gauge",
                () -> new Gauge(req(g.name(), path + ".gauge.name"), req(g.resolution(), path + ".gauge.resolution"),
                        g.sd() == null ? OptionalDouble.empty() : OptionalDouble.of(g.sd()))));
        PlanJson.RequirementJ r = req(c.requirement(), path + ".requirement");
        Requirement requirement = value(path + ".requirement", () -> new Requirement(
                value(path + ".requirement.index", () -> IndexKind.fromToken(req(r.index(), path + ".requirement.index"))),
                req(r.minimum(), path + ".requirement.minimum"), req(r.confidence(), path + ".requirement.confidence")));
        PlanJson.ExpectationJ e = req(c.expectation(), path + ".expectation");
        Expectation expectation = value(path + ".expectation", () -> new Expectation(req(e.index(), path + ".expectation.index"),
                e.potential() == null ? OptionalDouble.empty() : OptionalDouble.of(e.potential())));
        // the shape is left out of the file when normal, so plans written before it existed keep their revision
        ShapeFamily shape = c.shape() == null ? ShapeFamily.NORMAL
                : value(path + ".shape", () -> ShapeFamily.fromToken(c.shape()));
        return value(path, () -> new Characteristic(req(c.id(), path + ".id"), req(c.name(), path + ".name"), c.unit(),
                c.nominal() == null ? OptionalDouble.empty() : OptionalDouble.of(c.nominal()), limits, gauge,
                requirement, expectation, shape,
                c.threshold() == null ? OptionalDouble.empty() : OptionalDouble.of(c.threshold()),
                c.floor() == null ? OptionalDouble.empty() : OptionalDouble.of(c.floor())));
    }

    private ProductionCalendar calendar(PlanJson.CalendarJ c) {
        ZoneId zone = value("$.calendar.zone", () -> ZoneId.of(req(c.zone(), "$.calendar.zone")));
        List<String> dayTokens = req(c.workingDays(), "$.calendar.workingDays");
        Set<DayOfWeek> days = EnumSet.noneOf(DayOfWeek.class);
        for (int i = 0; i < dayTokens.size(); i++) {
            String p = at("$.calendar.workingDays", i);
            String t = req(dayTokens.get(i), p);
            days.add(value(p, () -> dayOfWeek(t)));
        }
        List<PlanJson.ShiftJ> sj = req(c.shifts(), "$.calendar.shifts");
        List<Shift> shifts = new ArrayList<>();
        for (int i = 0; i < sj.size(); i++) {
            String p = at("$.calendar.shifts", i);
            PlanJson.ShiftJ s = req(sj.get(i), p);
            shifts.add(value(p, () -> new Shift(req(s.name(), p + ".name"), time(s.start(), p + ".start"), time(s.end(), p + ".end"))));
        }
        List<BreakWindow> breaks = new ArrayList<>();
        List<PlanJson.BreakJ> bj = c.breaks() == null ? List.of() : c.breaks();
        for (int i = 0; i < bj.size(); i++) {
            String p = at("$.calendar.breaks", i);
            PlanJson.BreakJ b = req(bj.get(i), p);
            breaks.add(value(p, () -> new BreakWindow(time(b.start(), p + ".start"), time(b.end(), p + ".end"))));
        }
        TreeSet<LocalDate> off = new TreeSet<>();
        List<String> oj = c.nonWorkingDates() == null ? List.of() : c.nonWorkingDates();
        for (int i = 0; i < oj.size(); i++) {
            String p = at("$.calendar.nonWorkingDates", i);
            off.add(date(oj.get(i), p));
        }
        PlanJson.RateJ r = req(c.rate(), "$.calendar.rate");
        if ((r.partsPerHour() == null) == (r.cycleSeconds() == null)) {
            throw new UserException(file, PlanMessage.BAD_VALUE, "$.calendar.rate", "give exactly one of partsPerHour or cycleSeconds");
        }
        ProductionRate rate = value("$.calendar.rate", () -> r.partsPerHour() != null
                ? ProductionRate.perHour(r.partsPerHour()) : ProductionRate.cycleSeconds(r.cycleSeconds()));
        return value("$.calendar", () -> new ProductionCalendar(zone, days, shifts, breaks, off, rate));
    }

    private StudySpan span(PlanJson.SpanJ s) {
        LocalDateTime start = value("$.span.start", () -> LocalDateTime.parse(req(s.start(), "$.span.start")));
        int given = (s.shifts() != null ? 1 : 0) + (s.days() != null ? 1 : 0) + (s.lots() != null ? 1 : 0)
                + (s.until() != null ? 1 : 0);
        if (given != 1) {
            throw new UserException(file, PlanMessage.BAD_VALUE, "$.span", "give exactly one of shifts, days, lots or until");
        }
        return value("$.span", () -> {
            if (s.shifts() != null) {
                return StudySpan.shifts(start, s.shifts());
            } else if (s.days() != null) {
                return StudySpan.days(start, s.days());
            } else if (s.lots() != null) {
                return StudySpan.lots(start, s.lots(), req(s.lotParts(), "$.span.lotParts"));
            }
            return StudySpan.until(start, date(s.until(), "$.span.until"));
        });
    }

    private Schedule schedule(PlanJson.ScheduleJ s, int subgroupSize) {
        List<PlanJson.SlotJ> sj = req(s.slots(), "$.schedule.slots");
        List<Slot> slots = new ArrayList<>();
        for (int i = 0; i < sj.size(); i++) {
            Slot slot = quickSlot(sj.get(i));
            if (slot == null) {
                slot = checkedSlot(sj.get(i), at("$.schedule.slots", i));
            }
            if (i > 0 && !slot.start().toInstant().isAfter(slots.get(i - 1).start().toInstant())) {
                throw new UserException(file, PlanMessage.BAD_VALUE, at("$.schedule.slots", i) + ".start",
                        "slots must be in time order");
            }
            slots.add(slot);
        }
        OffsetDateTime end = value("$.schedule.end", () -> OffsetDateTime.parse(req(s.end(), "$.schedule.end")));
        return value("$.schedule", () -> new Schedule(slots, subgroupSize, req(s.workingMinutes(), "$.schedule.workingMinutes"),
                req(s.spacingMinutes(), "$.schedule.spacingMinutes"), end, req(s.shifts(), "$.schedule.shifts"),
                req(s.days(), "$.schedule.days")));
    }

    /**
     * A complete, valid slot read without building its JSON paths (a plan can have 200,000 slots); null when
     * anything is missing or refused, and {@link #checkedSlot} then finds the same slot or the message.
     */
    private static Slot quickSlot(PlanJson.SlotJ x) {
        if (x == null || x.id() == null || x.start() == null || x.windowMinutes() == null || x.shift() == null
                || x.partsSinceStart() == null) {
            return null;
        }
        try {
            return new Slot(x.id(), OffsetTimes.parse(x.start()), x.windowMinutes(), x.shift(), x.partsSinceStart());
        } catch (IllegalArgumentException | DateTimeException e) {
            return null;
        }
    }

    private Slot checkedSlot(PlanJson.SlotJ y, String p) {
        PlanJson.SlotJ x = req(y, p);
        OffsetDateTime start = value(p + ".start", () -> OffsetDateTime.parse(req(x.start(), p + ".start")));
        return value(p, () -> new Slot(req(x.id(), p + ".id"), start, req(x.windowMinutes(), p + ".windowMinutes"),
                req(x.shift(), p + ".shift"), req(x.partsSinceStart(), p + ".partsSinceStart")));
    }

    private static DayOfWeek dayOfWeek(String token) {
        String t = token.trim().toUpperCase(Locale.ROOT);
        for (DayOfWeek d : DayOfWeek.values()) {
            if (d.name().equals(t) || d.name().substring(0, 3).equals(t)) {
                return d;
            }
        }
        throw new IllegalArgumentException("not a day of the week (MON..SUN): " + token);
    }

    private LocalTime time(String text, String path) {
        return value(path, () -> LocalTime.parse(req(text, path)));
    }

    private LocalDate date(String text, String path) {
        return value(path, () -> LocalDate.parse(req(text, path)));
    }

    private static String at(String list, int index) {
        return list + "[" + index + "]";
    }

    private <T> T req(T v, String path) {
        if (v == null) {
            throw new UserException(file, PlanMessage.MISSING, path);
        }
        return v;
    }

    /** Runs a model constructor; its refusal becomes a message at {@code path}. */
    private <T> T value(String path, Supplier<T> make) {
        try {
            return make.get();
        } catch (IllegalArgumentException | DateTimeException e) {
            throw new UserException(file, PlanMessage.BAD_VALUE, path, e.getMessage());
        }
    }
}

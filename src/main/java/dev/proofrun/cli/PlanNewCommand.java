package dev.proofrun.cli;

import static dev.proofrun.cli.OptionValues.option;

import dev.proofrun.design.Design;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.design.Spending;
import dev.proofrun.design.Stages;
import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.CharacteristicsCsv;
import dev.proofrun.plan.PlanDesign;
import dev.proofrun.plan.Gauge;
import dev.proofrun.plan.Part;
import dev.proofrun.plan.People;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.PlanMessage;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.CalendarSyntax;
import dev.proofrun.schedule.ProductionCalendar;
import dev.proofrun.schedule.ProductionRate;
import dev.proofrun.schedule.CalendarDefaults;
import dev.proofrun.schedule.Spacing;
import dev.proofrun.schedule.StudySpan;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.SecureRandom;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.ZoneId;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import picocli.CommandLine;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code proofrun plan new}: a draft plan from the command line, scheduled on the given calendar. */
@Command(name = "new", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Make a draft plan: characteristics, design (solved unless --subgroup-size and --subgroups"
                + " are given), calendar, span and the dated slots. Writes nothing when anything is refused.")
public final class PlanNewCommand implements Callable<Integer> {

    /** Assumed when neither --rate nor --cycle-seconds is given. */
    static final double DEFAULT_RATE = 60;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Option(names = "--out", required = true, paramLabel = "FILE.json", description = "The plan file to write.")
    Path out;
    @Option(names = "--force", description = "Replace an existing draft (kept as FILE.bak); an issued plan is never replaced.")
    boolean force;
    @Option(names = "--id", description = "Plan id (default PR-<start year>-<4 random digits>).")
    String id;
    @Option(names = "--part", required = true, paramLabel = "NAME", description = "Part name.")
    String part;
    @Option(names = "--part-number", description = "Drawing or part number.")
    String partNumber;
    @Option(names = "--part-revision", description = "Drawing revision.")
    String partRevision;
    @Option(names = "--author", description = "Who writes the plan.")
    String author;
    @Option(names = "--collector", description = "Who takes and measures the parts (team, supplier).")
    String collector;

    @Option(names = "--characteristics", paramLabel = "FILE.csv",
            description = "Many characteristics: columns id,name,unit,nominal,lsl,usl,target,expected (optional index,confidence,expected_cp).")
    Path characteristicsCsv;
    @Option(names = "--characteristic", paramLabel = "NAME", description = "One characteristic's name.")
    String characteristic;
    @Option(names = "--characteristic-id", paramLabel = "ID", description = "Its id on the drawing (default C1).")
    String characteristicId;
    @Option(names = "--unit", paramLabel = "U", description = "Unit of the readings.")
    String unit;
    @Mixin
    SpecLimitOptions limits;
    @Mixin
    NominalOption nominal;
    @Mixin
    ShapeOption planned;
    @Option(names = "--threshold", paramLabel = "X", description = "The declared threshold a lognormal3 or weibull3 shape"
            + " needs (or --floor): the stop or datum the readings cannot go below (a plan value, not estimated from the"
            + " readings).")
    Double threshold;
    @Option(names = "--floor", paramLabel = "X", description = "In place of --threshold when the real start of the readings"
            + " is not known exactly: a stop the threshold cannot lie below; the grade lets the readings say where above"
            + " it the threshold may lie, at a price in power.")
    Double floor;
    @Option(names = "--gauge", paramLabel = "NAME", description = "Gauge name (with --resolution; a resolution alone"
            + " is kept for an unnamed gauge).")
    String gauge;
    @Mixin
    GaugeOptions gaugeFacts;
    @Mixin
    StudyGoalOptions goal;
    @Option(names = "--subgroup-size", paramLabel = "N", description = "Subgroup size n (default: solved).")
    Integer subgroupSize;
    @Option(names = "--subgroups", paramLabel = "K", description = "Number of subgroups k (fixes k instead of solving for it).")
    Integer subgroups;

    @Mixin
    StagesOptions staging;

    @Option(names = "--zone", paramLabel = "ZONE", description = "Time zone of the plant (default: this computer's).")
    String zone;
    @Option(names = "--days", defaultValue = "MON-FRI", paramLabel = "MON-FRI",
            description = "Working days: a range MON-FRI or a list MON,TUE,SAT (default ${DEFAULT-VALUE}).")
    String days;
    @Option(names = "--shifts", defaultValue = "06:00-14:00,14:00-22:00", paramLabel = "SHIFTS",
            description = {"Shifts, comma-separated, each [NAME=]HH:MM-HH:MM; one may run past midnight; unnamed "
                    + "shifts are named A, B, C and on.", "Default: ${DEFAULT-VALUE}"})
    String shifts;
    @Option(names = "--breaks", paramLabel = "BREAKS",
            description = "Breaks repeated every working day, comma-separated, each HH:MM-HH:MM.")
    String breaks;
    @Option(names = "--non-working", paramLabel = "DATES",
            description = "Dates without shifts (holidays), comma-separated, each YYYY-MM-DD.")
    String nonWorking;
    @Option(names = "--rate", paramLabel = "PARTS_PER_HOUR", description = "Production rate (default 60 parts per hour).")
    Double rate;
    @Option(names = "--cycle-seconds", paramLabel = "S", description = "Cycle time instead of --rate.")
    Double cycleSeconds;
    @Option(names = "--start", required = true, paramLabel = "2027-03-01T06:00", description = "Study start, local time; must be inside a shift.")
    String start;

    @ArgGroup(exclusive = true, multiplicity = "0..1")
    SpanChoice span;

    /** The span options, one at most (default: {@link CalendarDefaults#SPAN_DAYS} working days, as the wizard's). */
    static final class SpanChoice {
        @Option(names = "--span-shifts", paramLabel = "S", description = "Span at least S shifts.")
        Integer shifts;
        @Option(names = "--span-days", paramLabel = "D", description = "Span D working days (default " + CalendarDefaults.SPAN_DAYS + ").")
        Integer days;
        @ArgGroup(exclusive = false)
        Lots lots;
        @Option(names = "--until", paramLabel = "DATE", description = "Span every shift starting up to DATE.")
        String until;
    }

    /** A span of material lots. */
    static final class Lots {
        @Option(names = "--span-lots", required = true, paramLabel = "L", description = "Span L material lots (with --lot-parts).")
        int lots;
        @Option(names = "--lot-parts", required = true, paramLabel = "P", description = "Parts in each material lot (with --span-lots).")
        long lotParts;
    }

    @Option(names = "--spacing", defaultValue = CalendarDefaults.SPACING_TOKEN, paramLabel = "even|random",
            description = "Even over the running time, or one random time in each interval (default ${DEFAULT-VALUE}).")
    String spacing;
    @Option(names = "--seed", paramLabel = "N", description = "Seed of the random spacing (default: a new one, stored in the plan).")
    Long seed;

    /** The name a gauge gets when only its resolution is given. */
    static final String UNNAMED_GAUGE = "gauge (not named)";

    @Override
    public Integer call() {
        if (Files.exists(out) && !force) {
            throw new UserException(PlanOptionMessage.OUT_EXISTS, out);
        }
        List<Characteristic> chars = characteristics();
        ProductionCalendar calendar = calendar();
        StudySpan studySpan = studySpan();
        PlanDesign design = design(chars);
        Optional<StagedLooks.Planned> staged = stages(design.design(), chars);
        Optional<Stages> looks = staged.map(StagedLooks.Planned::stages);
        Design chosen = staged.map(StagedLooks.Planned::design).orElse(design.design());
        Spacing sp = OptionValues.spacing(spacing);
        long s = seed != null ? seed : sp == Spacing.RANDOM ? new SecureRandom().nextInt(1_000_000_000) : 0L;
        String planId = id != null ? id : String.format(Locale.ROOT, "PR-%d-%04d", studySpan.start().getYear(),
                new SecureRandom().nextInt(10_000));
        StudyPlan plan = option("--id", () -> StudyPlan.draft(planId,
                new Part(part, partNumber, partRevision), new People(author, collector), chars, calendar, studySpan,
                chosen, sp, s)).withStages(looks);
        PlanFiles.write(out, plan);
        PrintWriter w = spec.commandLine().getOut();
        if (rate == null && cycleSeconds == null) {
            w.println(PlanOptionMessage.RATE_ASSUMED.format(PlanSyntax.number(DEFAULT_RATE)));
        }
        for (Characteristic c : chars) {
            GaugeCheck.ruleOfTen(c).ifPresent(w::println);
        }
        w.println(design.reason());
        staged.ifPresent(st -> st.lines().forEach(w::println));
        for (Characteristic c : chars) {
            if (c.floor().isPresent()) {
                w.println("warning: " + SizeMessage.FLOOR_NOT_SIZED.format(c.id(), c.shapeWords()));
            } else if (!c.shape().isNormal()) {
                w.println("warning: " + (ShapeSize.plans(c.shape()) ? SizeMessage.SHAPE_SIZED_AS_NORMAL.format(c.id(), c.shape().token(), c.shape().token())
                        : SizeMessage.SHAPE_NOT_SIZED_AS_NORMAL.format(c.id(), c.shape().token(), ShapeSize.plannable())));
            }
        }
        w.println(PlanOptionMessage.WROTE.format(out, plan.summary()));
        w.flush();
        return 0;
    }

    /** The planned looks for --stages and --spending; empty for one stage. */
    private Optional<StagedLooks.Planned> stages(Design design, List<Characteristic> chars) {
        if (staging.stages < 1 || staging.stages > Stages.MOST) {
            throw new UserException(PlanOptionMessage.STAGES_RANGE, Stages.MOST, staging.stages);
        }
        if (staging.stages == 1) {
            if (staging.spending != null) {
                throw new UserException(PlanOptionMessage.SPENDING_WITHOUT_STAGES, Stages.MOST);
            }
            return Optional.empty();
        }
        Spending how = staging.spending == null ? Spending.byDefault()
                : OptionValues.option("--spending", () -> Spending.fromToken(staging.spending));
        for (Characteristic c : chars) {
            if (c.requirement().confidence() != chars.get(0).requirement().confidence()) {
                throw new UserException(PlanOptionMessage.STAGES_ONE_CONFIDENCE);
            }
        }
        if (subgroups != null) {
            requireApart(subgroups);
        }
        return Optional.of(StagedLooks.of(chars, design, subgroups != null, goal.power, staging.stages, how));
    }

    /** A given k must split into looks at least {@value Stages#LEAST_APART} subgroups apart. */
    private void requireApart(int k) {
        int before = 0;
        for (int j = 1; j <= staging.stages; j++) {
            int at = (int) Math.round(k * (double) j / staging.stages);
            if (at - before < Stages.LEAST_APART) {
                throw new UserException(PlanOptionMessage.STAGES_TOO_CLOSE, staging.stages, k, Stages.LEAST_APART,
                        Stages.LEAST_APART * staging.stages);
            }
            before = at;
        }
    }

    /** The plan's design; a characteristic refused from --characteristics is named with its file. */
    private PlanDesign design(List<Characteristic> chars) {
        try {
            return PlanDesign.choose(chars, goal.power,
                    subgroupSize == null ? OptionalInt.empty() : OptionalInt.of(subgroupSize),
                    subgroups == null ? OptionalInt.empty() : OptionalInt.of(subgroups));
        } catch (UserException e) {
            throw characteristicsCsv != null && e.key() == PlanMessage.CHARACTERISTIC_REFUSED
                    ? e.placedIn(Location.file(characteristicsCsv.toString())) : e;
        }
    }

    private List<Characteristic> characteristics() {
        IndexKind kind = OptionValues.index(goal.index);
        OptionValues.confidence(goal.confidence());
        if (characteristicsCsv != null) {
            if (characteristic != null || goal.target != null || goal.expected != null || planned.shape != null || threshold != null
                    || floor != null || limits.given()) {
                throw new UserException(PlanOptionMessage.BOTH_CHARACTERISTIC_FORMS);
            }
            return CharacteristicsCsv.read(characteristicsCsv, kind, goal.confidence());
        }
        if (characteristic == null || unit == null || goal.target == null || goal.expected == null) {
            throw new UserException(PlanOptionMessage.NEED_CHARACTERISTIC);
        }
        SpecLimits specLimits = limits.limits();
        Requirement req = option("--target", () -> Requirement.of(kind, goal.target, goal.confidence()));
        Expectation exp = option("--expected", () -> goal.expectedCp == null ? Expectation.centred(goal.expected)
                : Expectation.offCentre(goal.expected, goal.expectedCp));
        // a resolution without a gauge name is kept (for an unnamed gauge): grading needs the step either way
        Optional<Gauge> g = gauge == null && gaugeFacts.resolution == null ? Optional.empty()
                : Optional.of(option(gauge != null ? "--gauge" : "--resolution", () -> new Gauge(
                        gauge != null ? gauge : UNNAMED_GAUGE, gaugeFacts.resolution == null ? Double.NaN : gaugeFacts.resolution,
                        gaugeFacts.gaugeSd == null ? OptionalDouble.empty() : OptionalDouble.of(gaugeFacts.gaugeSd))));
        ShapeFamily family = planned.shape == null ? ShapeFamily.NORMAL : OptionValues.shape(planned.shape);
        String id = characteristicId == null ? "C1" : characteristicId;
        OptionalDouble theta = threshold == null ? OptionalDouble.empty() : OptionalDouble.of(threshold);
        OptionalDouble stop = floor == null ? OptionalDouble.empty() : OptionalDouble.of(floor);
        option(floor != null ? "--floor" : threshold != null ? "--threshold" : "--shape", () -> {
            Characteristic.requireThreshold(id, family, theta, stop, specLimits);
            return theta;
        });
        return List.of(option("--characteristic", () -> new Characteristic(id,
                characteristic, unit, nominal.nominal == null ? OptionalDouble.empty() : OptionalDouble.of(nominal.nominal),
                specLimits, g, req, exp, family, theta, stop)));
    }

    private ProductionCalendar calendar() {
        ZoneId z = zone == null ? CalendarDefaults.zone() : option("--zone", () -> ZoneId.of(zone));
        if (rate != null && cycleSeconds != null) {
            throw new UserException(OptionMessage.BAD_VALUE, "--rate/--cycle-seconds", "give one of them, not both");
        }
        ProductionRate r = option(rate != null ? "--rate" : "--cycle-seconds", () -> cycleSeconds != null
                ? ProductionRate.cycleSeconds(cycleSeconds) : ProductionRate.perHour(rate != null ? rate : DEFAULT_RATE));
        return option("--shifts", () -> new ProductionCalendar(z, option("--days", () -> CalendarSyntax.workingDays(days)),
                option("--shifts", () -> CalendarSyntax.shifts(shifts)),
                option("--breaks", () -> CalendarSyntax.breaks(breaks)),
                option("--non-working", () -> CalendarSyntax.dates(nonWorking)), r));
    }

    private StudySpan studySpan() {
        LocalDateTime t = option("--start", () -> LocalDateTime.parse(start));
        if (span == null) {
            return StudySpan.days(t, CalendarDefaults.SPAN_DAYS);
        }
        if (span.shifts != null) {
            return option("--span-shifts", () -> StudySpan.shifts(t, span.shifts));
        }
        if (span.days != null) {
            return option("--span-days", () -> StudySpan.days(t, span.days));
        }
        if (span.lots != null) {
            return option("--span-lots", () -> StudySpan.lots(t, span.lots.lots, span.lots.lotParts));
        }
        return option("--until", () -> StudySpan.until(t, LocalDate.parse(span.until)));
    }
}

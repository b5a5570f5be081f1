package dev.proofrun.app.timing;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.CalendarText;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.LatestJob;
import dev.proofrun.app.session.StudyDraft;
import dev.proofrun.app.shell.StepViewModel;
import dev.proofrun.design.Design;
import dev.proofrun.schedule.CalendarSyntax;
import dev.proofrun.schedule.ProductionCalendar;
import dev.proofrun.schedule.Schedule;
import dev.proofrun.schedule.Scheduler;
import dev.proofrun.schedule.Spacing;
import dev.proofrun.schedule.StudySpan;
import dev.proofrun.text.UserException;
import java.time.LocalDateTime;
import java.time.ZoneId;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import javafx.beans.Observable;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.ObjectBinding;
import javafx.beans.binding.StringBinding;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.StringProperty;
import javafx.beans.value.ObservableValue;

/**
 * The plant calendar, the span of the study and the spacing of its subgroups; the schedule is the
 * core's {@link Scheduler} run on them for the chosen design, off the FX thread ({@link Background},
 * latest request wins), and the frequency sentence is the schedule's own summary. Each text field has
 * its own inline problem.
 */
public final class TimingViewModel extends StepViewModel {

    /** The fields this step owns, in screen order. */
    public static final List<DraftField> FIELDS = List.of(DraftField.START, DraftField.SPAN_KIND, DraftField.SPAN_COUNT,
            DraftField.ZONE, DraftField.WORKING_DAYS, DraftField.SHIFTS, DraftField.BREAKS, DraftField.NON_WORKING,
            DraftField.RATE, DraftField.SPACING, DraftField.SEED);

    private final StudyDraft draft;
    private final ObservableValue<Optional<Design>> design;
    private final Map<DraftField, StringBinding> problems = new EnumMap<>(DraftField.class);
    private final ObjectBinding<Optional<ProductionCalendar>> calendar;
    private final ObjectBinding<Optional<StudySpan>> span;
    private final ObjectBinding<Optional<Request>> request;
    private final ObjectProperty<Outcome> outcome = new SimpleObjectProperty<>(this, "outcome", new Outcome(Optional.empty(), ""));
    private final BooleanProperty busy = new SimpleBooleanProperty(this, "busy", false);
    private final LatestJob scheduling;

    /** The schedule, or why there is none. */
    private record Outcome(Optional<Schedule> schedule, String problem) {
    }

    /** Everything the scheduler needs. */
    private record Request(ProductionCalendar calendar, StudySpan span, Design design, Spacing spacing, long seed) {
    }

    public TimingViewModel(StudyDraft draft, ObservableValue<Optional<Design>> design, Background background) {
        super(AppMessage.STEP_TIMING.english(), AppMessage.STEP_TIMING_HINT.english());
        this.draft = draft;
        this.design = design;
        this.scheduling = new LatestJob(background);
        for (DraftField f : FIELDS) {
            problems.put(f, Bindings.createStringBinding(() -> check(f), draft.field(f)));
        }
        Observable[] fields = FIELDS.stream().map(draft::field).toArray(Observable[]::new);
        calendar = Bindings.createObjectBinding(this::buildCalendar, fields);
        span = Bindings.createObjectBinding(this::buildSpan, fields);
        request = Bindings.createObjectBinding(this::buildRequest, calendar, span, design,
                draft.field(DraftField.SPACING), draft.field(DraftField.SEED));
        request.addListener((o, a, b) -> reschedule());
        bindMissing(Bindings.createStringBinding(this::computeMissing, outcome, calendar, span, design, busy));
        reschedule();
    }

    public StringProperty field(DraftField f) {
        return draft.field(f);
    }

    /** The inline problem of one field, empty when fine. */
    public StringBinding problem(DraftField f) {
        return problems.get(f);
    }

    public ObjectBinding<Optional<ProductionCalendar>> calendarBinding() {
        return calendar;
    }

    public ObjectBinding<Optional<StudySpan>> spanBinding() {
        return span;
    }

    public Optional<Schedule> schedule() {
        return outcome.get().schedule();
    }

    public Optional<Spacing> spacing() {
        try {
            return Optional.of(Spacing.fromToken(draft.text(DraftField.SPACING)));
        } catch (IllegalArgumentException e) {
            return Optional.empty();
        }
    }

    public Optional<Long> seed() {
        try {
            return Optional.of(Long.parseLong(draft.text(DraftField.SEED)));
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
    }

    /** Observable for anything that redraws with the schedule. */
    public ObjectProperty<?> scheduleChanges() {
        return outcome;
    }

    /** True while the scheduler runs. */
    public BooleanProperty busyProperty() {
        return busy;
    }

    /** "one subgroup of 5 consecutive parts about every 45 minutes over 3 shifts on 2 days", or empty. */
    public String sentence() {
        return schedule().map(Schedule::summary).orElse("");
    }

    /** The schedule's problem (the calendar cannot hold it), empty when there is a schedule. */
    public String scheduleProblem() {
        return outcome.get().problem();
    }

    /** A new seed for the random spacing: the next one after the current (the plan keeps it). */
    public void nextSeed() {
        long s = seed().orElse(0L);
        draft.field(DraftField.SEED).set(Long.toString(s + 1));
    }

    private String check(DraftField f) {
        String t = draft.text(f);
        try {
            switch (f) {
                case START -> {
                    if (t.isBlank()) {
                        return AppMessage.TIMING_START_EMPTY.format();
                    }
                    CalendarText.start(t);
                }
                case SPAN_KIND -> kind(t);
                case SPAN_COUNT -> {
                    int n = Integer.parseInt(t);
                    if (n < 1) {
                        return AppMessage.TIMING_COUNT.format();
                    }
                }
                case ZONE -> ZoneId.of(t);
                case WORKING_DAYS -> CalendarSyntax.workingDays(t);
                case SHIFTS -> CalendarSyntax.shifts(t);
                case BREAKS -> CalendarSyntax.breaks(t);
                case NON_WORKING -> CalendarSyntax.dates(t);
                case RATE -> CalendarText.rate(t);
                case SPACING -> Spacing.fromToken(t);
                case SEED -> Long.parseLong(t);
                default -> {
                }
            }
            return "";
        } catch (NumberFormatException e) {
            return f == DraftField.SEED ? AppMessage.TIMING_SEED.format(t) : AppMessage.TIMING_COUNT.format();
        } catch (java.time.DateTimeException e) {
            return AppMessage.TIMING_ZONE.format(t);
        } catch (IllegalArgumentException | UserException e) {
            return e.getMessage();
        }
    }

    private static StudySpan.Kind kind(String t) {
        return switch (t.toLowerCase(Locale.ROOT)) {
            case "days" -> StudySpan.Kind.DAYS;
            case "shifts" -> StudySpan.Kind.SHIFTS;
            default -> throw new IllegalArgumentException(AppMessage.TIMING_KIND.format(t));
        };
    }

    private boolean fieldsFine() {
        return FIELDS.stream().allMatch(f -> problems.get(f).get().isEmpty());
    }

    private Optional<ProductionCalendar> buildCalendar() {
        if (!fieldsFine()) {
            return Optional.empty();
        }
        try {
            return Optional.of(new ProductionCalendar(ZoneId.of(draft.text(DraftField.ZONE)),
                    CalendarSyntax.workingDays(draft.text(DraftField.WORKING_DAYS)),
                    CalendarSyntax.shifts(draft.text(DraftField.SHIFTS)),
                    CalendarSyntax.breaks(draft.text(DraftField.BREAKS)),
                    CalendarSyntax.dates(draft.text(DraftField.NON_WORKING)),
                    CalendarText.rate(draft.text(DraftField.RATE))));
        } catch (IllegalArgumentException | UserException e) {
            return Optional.empty();
        }
    }

    private Optional<StudySpan> buildSpan() {
        if (!fieldsFine()) {
            return Optional.empty();
        }
        try {
            LocalDateTime start = CalendarText.start(draft.text(DraftField.START));
            int count = Integer.parseInt(draft.text(DraftField.SPAN_COUNT));
            return Optional.of(kind(draft.text(DraftField.SPAN_KIND)) == StudySpan.Kind.DAYS
                    ? StudySpan.days(start, count) : StudySpan.shifts(start, count));
        } catch (IllegalArgumentException | UserException e) {
            return Optional.empty();
        }
    }

    private Optional<Request> buildRequest() {
        Optional<Design> d = design.getValue();
        if (calendar.get().isEmpty() || span.get().isEmpty() || d == null || d.isEmpty()
                || spacing().isEmpty() || seed().isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Request(calendar.get().get(), span.get().get(), d.get(), spacing().get(), seed().get()));
    }

    /** Runs the scheduler for the current inputs in the background; the latest request wins. */
    private void reschedule() {
        Optional<Request> q = request.get();
        if (q.isEmpty()) {
            scheduling.forget();
            busy.set(false);
            outcome.set(new Outcome(Optional.empty(), ""));
            return;
        }
        Request r = q.get();
        busy.set(true);
        scheduling.submit(() -> Scheduler.schedule(r.calendar(), r.span(), r.design().subgroups(),
                r.design().subgroupSize(), r.spacing(), r.seed()), s -> {
                    busy.set(false);
                    outcome.set(new Outcome(Optional.of(s), ""));
                }, ex -> {
                    busy.set(false);
                    outcome.set(new Outcome(Optional.empty(), ex.getMessage()));
                });
    }

    private String computeMissing() {
        for (DraftField f : FIELDS) {
            String p = problems.get(f).get();
            if (!p.isEmpty()) {
                return p;
            }
        }
        if (design.getValue() == null || design.getValue().isEmpty()) {
            return AppMessage.TIMING_DESIGN_FIRST.format();
        }
        if (calendar.get().isEmpty()) {
            return AppMessage.TIMING_CALENDAR_BAD.format();
        }
        String p = outcome.get().problem();
        if (!p.isEmpty()) {
            return p;
        }
        if (busy.get()) {
            return AppMessage.TIMING_BUSY.format();
        }
        return outcome.get().schedule().isPresent() ? "" : AppMessage.TIMING_CALENDAR_BAD.format();
    }
}

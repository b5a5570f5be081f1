package dev.proofrun.app.goal;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.CharacteristicField;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.ExpectationSource;
import dev.proofrun.app.session.ExpectedProcess;
import dev.proofrun.app.session.FieldNumbers;
import dev.proofrun.app.session.LatestJob;
import dev.proofrun.app.session.StudyDraft;
import dev.proofrun.app.shell.IndexTip;
import dev.proofrun.app.shell.StepViewModel;
import dev.proofrun.capability.CapabilityResult;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.stats.Confidence;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.UserException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import javafx.beans.Observable;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.ObjectBinding;
import javafx.beans.binding.StringBinding;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.beans.value.ObservableValue;
import javafx.collections.ObservableList;

/**
 * The requirement (index, minimum, confidence) and the expectation of the process for the characteristic
 * in focus. {@link #requirementBinding()} and {@link #expectationBinding()} are what the sizing step designs
 * for; both are empty while the inputs are not usable, and {@link #missingProperty()} then says why.
 *
 * <p>The view sees no core type: the index as its symbol ({@link #indexSymbolProperty()}), its tooltip
 * ({@link #tipFor}), and the expectation as a sentence ({@link #expectationText()}). Pilot readings are read
 * and analysed on the background worker ({@link #loadPilot}); the latest file asked for wins.
 */
public final class GoalViewModel extends StepViewModel {

    private final StudyDraft draft;
    private final ObservableValue<StudyPlan> base;
    private final ObjectProperty<IndexKind> index = new SimpleObjectProperty<>(this, "index", IndexKind.CPK);
    private final ObjectProperty<ExpectationSource> source = new SimpleObjectProperty<>(this, "source", ExpectationSource.VALUE);
    private final ObjectBinding<Optional<CharacteristicDraft>> focus;
    private final ObjectBinding<Optional<Requirement>> requirement;
    private final ObjectBinding<Optional<Expectation>> expectation;
    private final ObjectProperty<CapabilityResult> pilot = new SimpleObjectProperty<>(this, "pilot");
    private final StringProperty pilotMessage = new SimpleStringProperty(this, "pilotMessage", "");
    private final BooleanProperty pilotLoading = new SimpleBooleanProperty(this, "pilotLoading", false);
    private final StringProperty indexSymbol = new SimpleStringProperty(this, "indexSymbol");
    private final LatestJob pilotReading;

    private StringBinding unit;

    /** For plain tests: pilot readings are read at once on the calling thread. */
    public GoalViewModel(StudyDraft draft, ObservableValue<StudyPlan> base) {
        this(draft, base, Background.inline());
    }

    /** @param background reads and analyses pilot readings off the FX thread */
    public GoalViewModel(StudyDraft draft, ObservableValue<StudyPlan> base, Background background) {
        super(AppMessage.STEP_GOAL.english(), AppMessage.STEP_GOAL_HINT.english());
        this.draft = draft;
        this.base = base;
        this.pilotReading = new LatestJob(background);
        syncEnum(index, draft.field(DraftField.INDEX), IndexKind::token, t -> {
            try {
                return IndexKind.fromToken(t);
            } catch (IllegalArgumentException e) {
                return IndexKind.CPK;
            }
        });
        syncEnum(source, draft.field(DraftField.EXPECTATION_SOURCE), ExpectationSource::token, ExpectationSource::fromToken);
        ObservableList<CharacteristicDraft> rows = draft.characteristics();
        focus = Bindings.createObjectBinding(this::findFocus, rows, draft.field(DraftField.FOCUS));
        Observable[] inputs = {rows, index, source, focus, base, pilot, FieldNumbers.decimalMarkProperty(), draft.editsProperty(),
            draft.field(DraftField.MINIMUM), draft.field(DraftField.CONFIDENCE),
            draft.field(DraftField.EXPECTED_MEAN), draft.field(DraftField.EXPECTED_SIGMA)};
        requirement = Bindings.createObjectBinding(this::computeRequirement, inputs);
        expectation = Bindings.createObjectBinding(this::computeExpectation, inputs);
        bindMissing(Bindings.createStringBinding(this::computeMissing, inputs));
        indexSymbol.set(index.get() == null ? "" : index.get().symbol());
        index.addListener((obs, was, now) -> indexSymbol.set(now == null ? "" : now.symbol()));
        indexSymbol.addListener((obs, was, now) -> indices().stream().filter(k -> k.symbol().equals(now))
                .findFirst().ifPresent(index::set));
    }

    /** The symbols of {@link #indices()}, in that order: what the index list shows. */
    public List<String> indexSymbols() {
        return indices().stream().map(IndexKind::symbol).toList();
    }

    /** The required index by its symbol ("Cpk"), kept in step with {@link #indexProperty()}. */
    public StringProperty indexSymbolProperty() {
        return indexSymbol;
    }

    /** The tooltip of an index named by its symbol, empty for none. */
    public String tipFor(String symbol) {
        return indices().stream().filter(k -> k.symbol().equals(symbol)).findFirst()
                .map(k -> IndexTip.of(k).english()).orElse("");
    }

    /** "Designing for a true Cpk of 1.800 (centred)", or empty while there is no expectation. */
    public StringBinding expectationText() {
        return Bindings.createStringBinding(() -> expectation.get()
                .map(e -> AppMessage.GOAL_DESIGNING_FOR.format(index.get().symbol(), e.index(), e.potential().isPresent()
                        ? AppMessage.GOAL_OFF_CENTRE.format(e.potential().getAsDouble()) : AppMessage.GOAL_CENTRED.format()))
                .orElse(""), expectation, index);
    }

    /** True while pilot readings are read and analysed in the background. */
    public BooleanProperty pilotLoadingProperty() {
        return pilotLoading;
    }

    private static <E> void syncEnum(ObjectProperty<E> value, StringProperty text,
            java.util.function.Function<E, String> token, java.util.function.Function<String, E> parse) {
        value.set(parse.apply(text.get()));
        text.addListener((obs, was, now) -> {
            E e = parse.apply(now);
            if (e != value.get()) {
                value.set(e);
            }
        });
        value.addListener((obs, was, now) -> {
            if (now != null && !token.apply(now).equals(text.get())) {
                text.set(token.apply(now));
            }
        });
    }

    public ObjectProperty<IndexKind> indexProperty() {
        return index;
    }

    public ObjectProperty<ExpectationSource> sourceProperty() {
        return source;
    }

    public StringProperty minimum() {
        return draft.field(DraftField.MINIMUM);
    }

    public StringProperty confidence() {
        return draft.field(DraftField.CONFIDENCE);
    }

    public StringProperty expectedMean() {
        return draft.field(DraftField.EXPECTED_MEAN);
    }

    public StringProperty expectedSigma() {
        return draft.field(DraftField.EXPECTED_SIGMA);
    }

    /** The id of the characteristic in focus (empty = the first). */
    public StringProperty focusId() {
        return draft.field(DraftField.FOCUS);
    }

    public ObservableList<CharacteristicDraft> characteristics() {
        return draft.characteristics();
    }

    public ObjectBinding<Optional<CharacteristicDraft>> focusBinding() {
        return focus;
    }

    /** The unit of the characteristic in focus, in brackets with a leading space (" (mm)"), or "". */
    public StringBinding unitBinding() {
        if (unit == null) {
            unit = Bindings.createStringBinding(() -> focusBinding().get()
                    .map(c -> c.text(CharacteristicField.UNIT).trim())
                    .map(u -> u.isEmpty() ? "" : " (" + u + ")").orElse(""), focusBinding(), draft.editsProperty());
        }
        return unit;
    }

    public ObjectBinding<Optional<Requirement>> requirementBinding() {
        return requirement;
    }

    public ObjectBinding<Optional<Expectation>> expectationBinding() {
        return expectation;
    }

    /** The indices the requirement can name for the focus characteristic's limits. */
    public List<IndexKind> indices() {
        return List.of(IndexKind.CPK, IndexKind.PPK, IndexKind.CP, IndexKind.PP,
                IndexKind.CPU, IndexKind.CPL, IndexKind.PPU, IndexKind.PPL);
    }

    private Optional<CharacteristicDraft> findFocus() {
        List<CharacteristicDraft> rows = draft.characteristics();
        String id = draft.text(DraftField.FOCUS);
        for (CharacteristicDraft r : rows) {
            if (r.id().equalsIgnoreCase(id)) {
                return Optional.of(r);
            }
        }
        return rows.isEmpty() ? Optional.empty() : Optional.of(rows.get(0));
    }

    private Optional<Requirement> computeRequirement() {
        OptionalDouble min = FieldNumbers.parse(draft.text(DraftField.MINIMUM));
        OptionalDouble conf = FieldNumbers.parse(draft.text(DraftField.CONFIDENCE));
        if (min.isEmpty() || !(min.getAsDouble() > 0) || conf.isEmpty()
                || !Confidence.isStatable(conf.getAsDouble()) || index.get() == null) {
            return Optional.empty();
        }
        return Optional.of(Requirement.of(index.get(), min.getAsDouble(), conf.getAsDouble()));
    }

    private Optional<Expectation> computeExpectation() {
        Optional<CharacteristicDraft> row = focus.get();
        if (row.isEmpty() || row.get().limits().isEmpty() || index.get() == null || !fits(index.get(), row.get().limits().get())) {
            return Optional.empty();
        }
        SpecLimits limits = row.get().limits().get();
        return switch (source.get()) {
            case VALUE -> ExpectedProcess.typed(row.get());
            case MEAN_SIGMA -> ExpectedProcess.fromMeanSigma(limits, draft.text(DraftField.EXPECTED_MEAN),
                    draft.text(DraftField.EXPECTED_SIGMA), index.get());
            case PILOT -> ExpectedProcess.fromPilot(pilot.get(), index.get());
        };
    }

    public ObjectProperty<CapabilityResult> pilotProperty() {
        return pilot;
    }

    /** What the pilot readings gave (estimate and lower bound of the index), or why they could not be used. */
    public StringProperty pilotMessageProperty() {
        return pilotMessage;
    }

    public StringProperty pilotFile() {
        return draft.field(DraftField.PILOT_FILE);
    }

    /**
     * Reads pilot readings (the core's readings reader) and estimates the index with its lower bound (the
     * core's capability analysis) against the limits of the characteristic in focus, on the background
     * worker; the answer lands on the FX thread. The estimate becomes the expectation; the bound is shown
     * beside it, because a pilot estimate is itself uncertain. A later call wins over an earlier one.
     *
     * @return true when the reading was started; false (and why, in {@link #pilotMessageProperty()}) when
     *         the earlier steps do not allow it yet
     */
    public boolean loadPilot(Path file) {
        pilot.set(null);
        Optional<CharacteristicDraft> row = focus.get();
        Optional<Requirement> req = requirement.get();
        if (row.isEmpty() || row.get().limits().isEmpty() || req.isEmpty()) {
            pilotReading.forget();
            pilotLoading.set(false);
            pilotMessage.set(AppMessage.GOAL_PILOT_BAD.format(AppMessage.HANDOUT_EARLIER.format()));
            return false;
        }
        SpecLimits limits = row.get().limits().get();
        OptionalDouble nominal = row.get().number(CharacteristicField.NOMINAL);
        double confidence = req.get().confidence();
        IndexKind k = index.get();
        pilotLoading.set(true);
        pilotMessage.set(AppMessage.GOAL_PILOT_READING.format(file.getFileName()));
        pilotReading.submit(() -> ExpectedProcess.readPilot(file, limits, nominal, confidence), r -> {
                    pilotLoading.set(false);
                    draft.field(DraftField.PILOT_FILE).set(file.toString());
                    pilot.set(r);
                    pilotMessage.set(ExpectedProcess.pilotShown(r, k, confidence));
                }, ex -> {
                    pilotLoading.set(false);
                    pilotMessage.set(AppMessage.GOAL_PILOT_BAD.format(ex instanceof UserException
                            || ex instanceof IllegalArgumentException ? ex.getMessage() : String.valueOf(ex)));
                });
        return true;
    }

    /**
     * The expectation for any characteristic of the plan: the one worked out on this step for the
     * characteristic in focus, the typed expected index (with the plan's centring) for the others.
     */
    public Optional<Expectation> expectationFor(CharacteristicDraft row) {
        if (focus.get().isPresent() && focus.get().get() == row) {
            return expectation.get();
        }
        return ExpectedProcess.typed(row);
    }

    /** Whether the index exists for these limits (Cp/Pp need both, Cpu an upper, Cpl a lower limit). */
    static boolean fits(IndexKind kind, SpecLimits limits) {
        return switch (kind.side()) {
            case BOTH -> limits.isTwoSided();
            case UPPER -> limits.upper().isPresent();
            case LOWER -> limits.lower().isPresent();
            case NEAREST -> true;
        };
    }

    private String computeMissing() {
        for (DraftField f : List.of(DraftField.MINIMUM, DraftField.CONFIDENCE, DraftField.EXPECTED_MEAN, DraftField.EXPECTED_SIGMA)) {
            Optional<String> mark = FieldNumbers.wrongMark(draft.text(f));
            if (mark.isPresent()) {
                return mark.get();
            }
        }
        Optional<String> expectedMark = focus.get().flatMap(r -> FieldNumbers.wrongMark(r.text(CharacteristicField.EXPECTED)));
        if (expectedMark.isPresent()) {
            return expectedMark.get();
        }
        if (computeRequirement().isEmpty()) {
            OptionalDouble min = FieldNumbers.parse(draft.text(DraftField.MINIMUM));
            return min.isEmpty() || !(min.getAsDouble() > 0) ? AppMessage.GOAL_MINIMUM_BAD.format() : AppMessage.GOAL_CONFIDENCE_BAD.format();
        }
        Optional<CharacteristicDraft> row = focus.get();
        if (row.isEmpty() || row.get().limits().isEmpty()) {
            return AppMessage.PART_NO_ROWS.format();
        }
        if (!fits(index.get(), row.get().limits().get())) {
            return AppMessage.GOAL_INDEX_SIDES.format(index.get().symbol(), row.get().id());
        }
        Optional<Expectation> e = expectation.get();
        if (e.isEmpty()) {
            return switch (source.get()) {
                case VALUE -> dev.proofrun.app.session.RowRequirement.problem(row.get(), CharacteristicField.EXPECTED_CP)
                        .map(p -> row.get().id() + ": " + p) // a typed expected Cp below the expected index
                        .orElse(AppMessage.GOAL_EXPECTED_MISSING.format(index.get().symbol(), row.get().id()));
                case MEAN_SIGMA -> AppMessage.GOAL_MEAN_SIGMA_BAD.format();
                case PILOT -> AppMessage.GOAL_PILOT_MISSING.format();
            };
        }
        double min = requirement.get().get().minimum();
        if (!(e.get().index() > min)) {
            return AppMessage.GOAL_EXPECTED_NOT_ABOVE.format(index.get().symbol(), e.get().index(), min);
        }
        return "";
    }
}

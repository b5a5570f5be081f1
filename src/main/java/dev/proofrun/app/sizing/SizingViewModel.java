package dev.proofrun.app.sizing;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.chart.CurvePlot.Line;
import dev.proofrun.app.goal.GoalViewModel;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.FieldNumbers;
import dev.proofrun.app.session.StudyDraft;
import dev.proofrun.app.shell.StepViewModel;
import dev.proofrun.design.Design;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.DesignRow;
import dev.proofrun.design.DesignTable;
import dev.proofrun.design.OcPoint;
import dev.proofrun.design.SharedDesign;
import dev.proofrun.design.Stages;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.text.UserException;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.BooleanBinding;
import javafx.beans.binding.IntegerBinding;
import javafx.beans.binding.ObjectBinding;
import javafx.beans.binding.StringBinding;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/**
 * The design table of one characteristic (the one in focus, which the step names and lets the user change),
 * recomputed whenever an input changes: the request is built on the FX thread, the designer runs in a JavaFX
 * Task on a worker thread ({@link SizingTable}), and only the latest request's answer is applied (an older task
 * is cancelled and its answer dropped). The user may pick a row other than the recommended one; its cost against
 * the recommendation is spelled out ({@link SizingCost}). With several characteristics the powers of all at the
 * chosen design and the one design for all are worked out beside it ({@link AllCharacteristics}).
 *
 * <p>The view gets display rows ({@link SizingRow}), column definitions ({@link SizingColumn}) and the charts'
 * lines ({@link SizingCurves}) from here, all naming one design: the plan's k × n.
 *
 * <p>With more than one look chosen, the plan's design is the looks' ({@link SizingStages}, a worker of its own):
 * the single-stage row chosen gives n (and k, when kept), the looks give the most subgroups K; until they are
 * computed there is no design.
 */
public final class SizingViewModel extends StepViewModel {

    private final StudyDraft draft;
    private final GoalViewModel goal;
    private final ObjectBinding<Optional<DesignRequest>> request;
    private final SizingTable sized;
    private final ObjectProperty<DesignTable> table;
    private final ObjectProperty<DesignTable> chosenTable;
    private final ObjectProperty<DesignRow> chosen;
    private final BooleanProperty busy;
    private final StringProperty refusal;
    private final ObjectProperty<List<Line>> powerLines = new SimpleObjectProperty<>(this, "powerLines", List.of());
    private final ObjectProperty<List<Line>> ocLines = new SimpleObjectProperty<>(this, "ocLines", List.of());
    private final ObservableList<String> ids = FXCollections.observableArrayList();
    private final StringBinding sizedFor;
    private final StringBinding reason;
    private final StringBinding warnings;
    private final AllCharacteristics all;
    private final StringBinding cost;
    private final ObjectBinding<Optional<Design>> designBinding;
    private final SizingStages staged;
    private final IntegerBinding chosenSize;

    public SizingViewModel(StudyDraft draft, GoalViewModel goal, Background background) {
        this(draft, goal, background, background);
    }

    /** @param looks the worker of the planned looks (they cost seconds; the design table should not wait) */
    public SizingViewModel(StudyDraft draft, GoalViewModel goal, Background background, Background looks) {
        super(AppMessage.STEP_SIZING.english(), AppMessage.STEP_SIZING_HINT.english());
        this.draft = draft;
        sized = new SizingTable(background, this::drawCurves);
        table = sized.table();
        chosenTable = sized.chosenTable();
        chosen = sized.chosen();
        busy = sized.busy();
        refusal = sized.refusal();
        chosenSize = Bindings.createIntegerBinding(() -> chosen.get() == null ? 0 : chosen.get().subgroupSize(), chosen);
        this.goal = goal;
        this.all = new AllCharacteristics(background);
        request = Bindings.createObjectBinding(this::buildRequest, goal.requirementBinding(), goal.expectationBinding(),
                goal.focusBinding(), draft.field(DraftField.POWER), draft.characteristics());
        request.addListener((obs, was, now) -> recompute());
        draft.field(DraftField.CHOSEN_SUBGROUP_SIZE).addListener((obs, was, now) -> recompute());
        cost = Bindings.createStringBinding(() -> SizingCost.describe(chosen.get(), table.get(), chosenTable.get(),
                keptSubgroups(), sized.keptPower(), all.shared().get(), all.driver(), focusName()), chosen, table, chosenTable,
                draft.field(DraftField.CHOSEN_SUBGROUPS), all.shared());
        LooksChoice choice = new LooksChoice(draft);
        staged = new SizingStages(looks, choice, () -> buildStagedAsking(choice), request, chosen,
                draft.field(DraftField.CHOSEN_SUBGROUPS), draft.field(DraftField.STAGES), draft.field(DraftField.SPENDING),
                draft.characteristics(), goal.requirementBinding(), goal.expectationBinding(), goal.focusBinding());
        designBinding = Bindings.createObjectBinding(this::design, chosen, draft.field(DraftField.CHOSEN_SUBGROUPS),
                draft.field(DraftField.STAGES), staged.answer(), staged.asking());
        designBinding.addListener((obs, was, now) -> {
            updateAll();
            drawCurves();
        });
        draft.editsProperty().addListener((obs, was, now) -> updateAll());
        // the list fires on any cell's edit too (its extractor), so an id typed shows in the chooser
        draft.characteristics().addListener((javafx.collections.ListChangeListener<CharacteristicDraft>) c -> refreshIds());
        refreshIds();
        sizedFor = Bindings.createStringBinding(() -> SizingCost.sizedFor(focusName(), request.get()), request, goal.focusBinding());
        reason = Bindings.createStringBinding(() -> table.get() == null ? "" : "Recommended: " + table.get().reason(), table);
        warnings = Bindings.createStringBinding(() -> table.get() == null ? "" : String.join("\n", table.get().warnings()), table);
        bindMissing(Bindings.createStringBinding(() -> {
            if (goal.requirementBinding().get().isEmpty() || goal.expectationBinding().get().isEmpty()) {
                return AppMessage.SIZING_GOAL_FIRST.format();
            }
            if (!refusal.get().isEmpty()) {
                return refusal.get();
            }
            if (busy.get() || chosen.get() == null) {
                return AppMessage.SIZING_BUSY.format();
            }
            if (looks() > 1 && !staged.refusal().get().isEmpty()) {
                return staged.refusal().get();
            }
            return looks() > 1 && design().isEmpty() ? dev.proofrun.design.StagedMessage.STAGED_BUSY.format() : "";
        }, goal.requirementBinding(), goal.expectationBinding(), refusal, busy, chosen, staged.refusal(), designBinding));
    }

    @Override
    public void entered() {
        if (table.get() == null && !busy.get()) {
            recompute();
        }
        staged.askAgain();
    }

    public StringProperty power() {
        return draft.field(DraftField.POWER);
    }

    /** The core's rows of the table. */
    public ObservableList<DesignRow> rows() {
        return sized.rows();
    }

    /** The rows as the table shows them. */
    public ObservableList<SizingRow> shownRows() {
        return sized.shownRows();
    }

    /** The table's columns, in order. */
    public List<SizingColumn> columns() {
        return List.of(SizingColumn.values());
    }

    public ObjectProperty<DesignTable> tableProperty() {
        return table;
    }

    /** The table computed for the chosen subgroup size alone (its power curve). */
    public ObjectProperty<DesignTable> chosenTableProperty() {
        return chosenTable;
    }

    public ObjectProperty<DesignRow> chosenProperty() {
        return chosen;
    }

    public BooleanProperty busyProperty() {
        return busy;
    }

    /** The designer's refusal (c₁ ≤ c₀, power out of reach), empty when there is a table. */
    public StringProperty refusalProperty() {
        return refusal;
    }

    public StringBinding costBinding() {
        return cost;
    }

    /** The designer's reason for its recommendation, empty without a table. */
    public StringBinding reasonBinding() {
        return reason;
    }

    /** The designer's warnings, one a line. */
    public StringBinding warningsBinding() {
        return warnings;
    }

    /**
     * With several characteristics: the chance that each is demonstrated at the chosen design and that all
     * are (the product, taken as independent), as the core computes each power; empty with one.
     */
    public StringProperty togetherProperty() {
        return all.together();
    }

    /** The line naming the one design for all characteristics and its driver; empty with one characteristic. */
    public StringProperty sharedLineProperty() {
        return all.sharedLine();
    }

    /** The one design for all characteristics, once worked out (null with one characteristic or before). */
    public ObjectProperty<SharedDesign> sharedProperty() {
        return all.shared();
    }

    /** The power chart's lines for the plan's design. */
    public ObjectProperty<List<Line>> powerLinesProperty() {
        return powerLines;
    }

    /** The OC chart's lines for the plan's design. */
    public ObjectProperty<List<Line>> ocLinesProperty() {
        return ocLines;
    }

    /** The planned looks: their choice, words, chart and busy state. */
    public SizingStages staged() {
        return staged;
    }

    /** The looks the plan carries: with more than one look chosen and computed for the inputs as they are now. */
    public Optional<Stages> plannedStages() {
        return staged.current().map(a -> a.planned().stages());
    }

    /** The looks chosen, 1 to 4. */
    public int looks() {
        return staged.choice().looks();
    }

    /** The subgroup size of the chosen row, 0 without one (the table's selection follows it). */
    public IntegerBinding chosenSizeBinding() {
        return chosenSize;
    }

    /** True when the one design for all characteristics is worked out (its button is enabled). */
    public BooleanBinding sharedReadyBinding() {
        return all.shared().isNotNull();
    }

    /** The ids of the characteristics, for the chooser of the one the table sizes. */
    public ObservableList<String> characteristicIds() {
        return ids;
    }

    /** The id of the characteristic the table sizes (empty = the first); the Goal step's focus. */
    public StringProperty focusId() {
        return draft.field(DraftField.FOCUS);
    }

    /** One sentence: which characteristic the table sizes, its requirement and expectation. */
    public StringBinding sizedForBinding() {
        return sizedFor;
    }

    public Optional<DesignRequest> request() {
        return request.get();
    }

    /**
     * The plan's design: with one look, the chosen row, or its size with the k kept (plan file, shared design);
     * with more, the looks' n and K once computed, empty until then.
     */
    public Optional<Design> design() {
        Optional<Design> single = singleStageDesign();
        if (looks() < 2 || single.isEmpty()) {
            return single;
        }
        return staged.current().map(a -> a.planned().design());
    }

    /** The chosen single-stage design: the chosen row, or its size with the k kept (plan file, shared design). */
    public Optional<Design> singleStageDesign() {
        DesignRow r = chosen.get();
        Optional<DesignRequest> q = request.get();
        if (r == null || q.isEmpty()) {
            return Optional.empty();
        }
        SigmaMethod m = r.subgroupSize() == 1 ? SigmaMethod.MOVING_RANGE
                : q.get().sigmaMethod().orElse(SigmaMethod.defaultFor(r.subgroupSize()));
        int k = keptSubgroups().orElse(r.subgroups());
        return Optional.of(new Design(r.subgroupSize(), k, m, q.get().boundMethod()));
    }

    public ObjectBinding<Optional<Design>> designBinding() {
        return designBinding;
    }

    /** The k kept from the plan file or the shared design, when there is one (at least 2). */
    public Optional<Integer> keptSubgroups() {
        OptionalDouble k = FieldNumbers.parse(draft.text(DraftField.CHOSEN_SUBGROUPS));
        return k.isPresent() && k.getAsDouble() >= 2 ? Optional.of((int) k.getAsDouble()) : Optional.empty();
    }

    /** Picks the row with this subgroup size (the choice survives recomputation). */
    public void choose(DesignRow row) {
        choose(row == null ? 0 : row.subgroupSize());
    }

    /** Picks the row with subgroup size n (0: none). */
    public void choose(int n) {
        DesignTable t = table.get();
        if (n < 1 || (chosen.get() != null && chosen.get().subgroupSize() == n)) {
            return;
        }
        boolean recommended = t != null && t.recommended().subgroupSize() == n;
        draft.field(DraftField.CHOSEN_SUBGROUPS).set("");
        draft.field(DraftField.CHOSEN_SUBGROUP_SIZE).set(recommended ? "" : Integer.toString(n));
    }

    /**
     * Takes the one design for all characteristics, as {@code plan new} would write it: its subgroup size as the
     * chosen row, its k (the driver's) as the plan's k.
     */
    public void useShared() {
        SharedDesign d = all.shared().get();
        if (d == null) {
            return;
        }
        DesignTable t = table.get();
        boolean recommended = t != null && t.recommended().subgroupSize() == d.subgroupSize();
        draft.field(DraftField.CHOSEN_SUBGROUPS).set(Integer.toString(d.subgroups()));
        draft.field(DraftField.CHOSEN_SUBGROUP_SIZE).set(recommended ? "" : Integer.toString(d.subgroupSize()));
        recompute();
    }

    private Optional<DesignRequest> buildRequest() {
        try {
            return SizingJob.request(goal, draft.text(DraftField.POWER));
        } catch (UserException | IllegalArgumentException e) {
            refusal.set(e.getMessage());
            return Optional.empty();
        }
    }

    /** Starts a new computation for the current inputs; any older one is cancelled and its answer dropped. */
    public void recompute() {
        OptionalDouble size = FieldNumbers.parse(draft.text(DraftField.CHOSEN_SUBGROUP_SIZE));
        sized.recompute(request.get(), size.isPresent() ? (int) size.getAsDouble() : 0, keptSubgroups());
    }

    private double wantedPower() {
        OptionalDouble p = FieldNumbers.parse(draft.text(DraftField.POWER));
        return p.isPresent() ? p.getAsDouble() : DesignRequest.DEFAULT_POWER;
    }

    private void updateAll() {
        all.update(draft.characteristics(), goal.requirementBinding().get(), goal::expectationFor, wantedPower(),
                singleStageDesign());
    }

    private SizingStages.Asking buildStagedAsking(LooksChoice choice) {
        if (choice.looks() < 2) {
            return SizingStages.Asking.NONE;
        }
        return SizingStages.asking(choice.looks(), choice.spending(), singleStageDesign(), keptSubgroups().isPresent(),
                AllCharacteristics.ask(draft.characteristics(), goal.requirementBinding().get(), goal::expectationFor,
                        wantedPower()), focusName());
    }

    private void drawCurves() {
        Optional<Design> d = singleStageDesign();
        List<OcPoint> oc = SizingCurves.ocOf(d, chosenTable.get(), sized.planCurve());
        Optional<SizingStages.Answer> looks = staged.current();
        powerLines.set(SizingCurves.named(SizingCurves.power(chosenTable.get(), d, request.get()), d, looks.isPresent()));
        List<Line> lines = new java.util.ArrayList<>(SizingCurves.named(SizingCurves.oc(oc, d, request.get()), d,
                looks.isPresent()));
        // the staged study's chance beside the single stage's
        looks.ifPresent(answer -> lines.add(lines.isEmpty() ? 0 : 1, StagedLines.oc(answer)));
        ocLines.set(lines);
    }

    private void refreshIds() {
        List<String> now = draft.characteristics().stream().map(CharacteristicDraft::id).toList();
        if (!now.equals(ids)) {
            ids.setAll(now);
        }
    }

    private String focusName() {
        return goal.focusBinding().get().map(CharacteristicDraft::id).orElse("");
    }

    /** "0.903", or "—" when the core has no value (NaN). */
    public static String fmtOrDash(double v) {
        return Double.isNaN(v) ? "—" : fmt(v);
    }

    /** "0.903" */
    public static String fmt(double v) {
        return String.format(Locale.ROOT, "%.3f", v);
    }
}

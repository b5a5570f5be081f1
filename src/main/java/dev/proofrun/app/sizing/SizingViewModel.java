package dev.proofrun.app.sizing;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.goal.GoalViewModel;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.Numbers;
import dev.proofrun.app.session.StudyDraft;
import dev.proofrun.app.shell.StepViewModel;
import dev.proofrun.design.Design;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.DesignRow;
import dev.proofrun.design.DesignTable;
import dev.proofrun.design.StudyDesigner;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.text.UserException;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.ObjectBinding;
import javafx.beans.binding.StringBinding;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/**
 * The design table, recomputed whenever an input changes: the request is built on the FX thread, the
 * designer runs in a JavaFX Task on a worker thread ({@link Background}), and only the latest request's answer is applied
 * (an older task is cancelled and its answer dropped). The user may pick a row other than the
 * recommended one; its cost against the recommendation is spelled out and its own power and OC curves
 * are computed the same way.
 */
public final class SizingViewModel extends StepViewModel {

    private final StudyDraft draft;
    private final GoalViewModel goal;
    private final ObjectBinding<Optional<DesignRequest>> request;
    private final ObjectProperty<DesignTable> table = new SimpleObjectProperty<>(this, "table");
    private final ObjectProperty<DesignTable> chosenTable = new SimpleObjectProperty<>(this, "chosenTable");
    private final ObservableList<DesignRow> rows = FXCollections.observableArrayList();
    private final ObjectProperty<DesignRow> chosen = new SimpleObjectProperty<>(this, "chosen");
    private final BooleanProperty busy = new SimpleBooleanProperty(this, "busy", false);
    private final StringProperty refusal = new SimpleStringProperty(this, "refusal", "");
    private final StringProperty together = new SimpleStringProperty(this, "together", "");
    private Background.Job togetherJob;
    private long togetherGeneration;
    private Together togetherAsked;
    private final StringBinding cost;
    private final ObjectBinding<Optional<Design>> designBinding;
    private final Background background;
    private Background.Job running;
    private long generation;
    private KeptPower keptPower;

    public SizingViewModel(StudyDraft draft, GoalViewModel goal, Background background) {
        this.draft = draft;
        this.background = background;
        this.goal = goal;
        request = Bindings.createObjectBinding(this::buildRequest, goal.requirementBinding(), goal.expectationBinding(),
                goal.focusBinding(), draft.field(DraftField.POWER), draft.characteristics());
        request.addListener((obs, was, now) -> recompute());
        draft.field(DraftField.CHOSEN_SUBGROUP_SIZE).addListener((obs, was, now) -> recompute());
        cost = Bindings.createStringBinding(this::describeCost, chosen, table, chosenTable, draft.field(DraftField.CHOSEN_SUBGROUPS));
        designBinding = Bindings.createObjectBinding(this::design, chosen, draft.field(DraftField.CHOSEN_SUBGROUPS));
        designBinding.addListener((obs, was, now) -> recomputeTogether());
        draft.editsProperty().addListener((obs, was, now) -> recomputeTogether());
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
            return "";
        }, goal.requirementBinding(), goal.expectationBinding(), refusal, busy, chosen));
    }

    @Override
    public String title() {
        return AppMessage.STEP_SIZING.english();
    }

    @Override
    public String hint() {
        return AppMessage.STEP_SIZING_HINT.english();
    }

    @Override
    public void entered() {
        if (table.get() == null && !busy.get()) {
            recompute();
        }
    }

    public StringProperty power() {
        return draft.field(DraftField.POWER);
    }

    public ObservableList<DesignRow> rows() {
        return rows;
    }

    public ObjectProperty<DesignTable> tableProperty() {
        return table;
    }

    /** The table computed for the chosen subgroup size alone (its power and OC curves). */
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

    /**
     * With several characteristics: the chance that each is demonstrated at the chosen design and that all
     * are (the product, taken as independent), as the core computes each power; empty with one.
     */
    public StringProperty togetherProperty() {
        return together;
    }

    public Optional<DesignRequest> request() {
        return request.get();
    }

    /** The chosen design as the plan keeps it: the chosen row, or its size with the k kept from the plan file. */
    public Optional<Design> design() {
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

    /** The k kept from the plan file, when there is one (at least 2). */
    public Optional<Integer> keptSubgroups() {
        OptionalDouble k = Numbers.parse(draft.text(DraftField.CHOSEN_SUBGROUPS));
        return k.isPresent() && k.getAsDouble() >= 2 ? Optional.of((int) k.getAsDouble()) : Optional.empty();
    }

    /** Picks the row with this subgroup size (the choice survives recomputation). */
    public void choose(DesignRow row) {
        if (row == null) {
            return;
        }
        DesignTable t = table.get();
        boolean recommended = t != null && t.recommended().subgroupSize() == row.subgroupSize();
        if (chosen.get() != null && chosen.get().subgroupSize() == row.subgroupSize()) {
            return;
        }
        draft.field(DraftField.CHOSEN_SUBGROUPS).set("");
        draft.field(DraftField.CHOSEN_SUBGROUP_SIZE).set(recommended ? "" : Integer.toString(row.subgroupSize()));
    }

    private Optional<DesignRequest> buildRequest() {
        Optional<dev.proofrun.design.Requirement> req = goal.requirementBinding().get();
        Optional<dev.proofrun.design.Expectation> exp = goal.expectationBinding().get();
        if (req.isEmpty() || exp.isEmpty() || goal.focusBinding().get().isEmpty()
                || goal.focusBinding().get().get().limits().isEmpty()) {
            return Optional.empty();
        }
        OptionalDouble p = Numbers.parse(draft.text(DraftField.POWER));
        double power = p.isPresent() ? p.getAsDouble() : DesignRequest.DEFAULT_POWER;
        try {
            DesignRequest r = DesignRequest.of(goal.focusBinding().get().get().limits().get().sides(), req.get(), exp.get());
            return Optional.of(p.isPresent() ? r.withPower(power) : r);
        } catch (UserException | IllegalArgumentException e) {
            refusal.set(e.getMessage());
            return Optional.empty();
        }
    }

    /** Starts a new computation for the current inputs; any older one is cancelled and its answer dropped. */
    public void recompute() {
        if (running != null) {
            running.cancel();
            running = null;
        }
        Optional<DesignRequest> q = request.get();
        if (q.isEmpty()) {
            busy.set(false);
            table.set(null);
            chosenTable.set(null);
            rows.clear();
            chosen.set(null);
            return;
        }
        refusal.set("");
        DesignRequest req = q.get();
        int wanted = Numbers.parse(draft.text(DraftField.CHOSEN_SUBGROUP_SIZE)).isPresent()
                ? (int) Numbers.parse(draft.text(DraftField.CHOSEN_SUBGROUP_SIZE)).getAsDouble() : 0;
        Optional<Integer> kept = keptSubgroups();
        long mine = ++generation;
        busy.set(true);
        running = background.submit(() -> {
            DesignTable all = StudyDesigner.design(req);
            DesignTable own = null;
            if (wanted > 0 && wanted != all.recommended().subgroupSize()
                    && all.rows().stream().anyMatch(r -> r.subgroupSize() == wanted)) {
                own = StudyDesigner.design(req.withSubgroupSizes(List.of(wanted)));
            }
            int n = (own != null ? own : all).recommended().subgroupSize();
            KeptPower keptPower = null;
            if (kept.isPresent()) {
                try {
                    keptPower = new KeptPower(n, kept.get(), StudyDesigner.power(req, n, kept.get()));
                } catch (IllegalArgumentException outsideTheDesignersRange) {
                    keptPower = null; // said as "power not computed for this k"
                }
            }
            return new Answer(all, own, keptPower);
        }, answer -> {
            if (mine == generation) {
                apply(answer);
            }
        }, ex -> {
            if (mine == generation) {
                busy.set(false);
                refusal.set(AppMessage.SIZING_FAILED.failure(ex));
                table.set(null);
                rows.clear();
                chosen.set(null);
            }
        });
    }

    /** What the "all characteristics" line is computed from: the design and one request per characteristic. */
    private record Together(int n, int k, double power, List<String> ids, List<DesignRequest> requests,
            List<String> leftOut) {
    }

    /**
     * Starts the powers of all characteristics at the chosen design (on the worker, after any design table
     * asked for before); the latest inputs win. Nothing is computed again for the same inputs.
     */
    private void recomputeTogether() {
        Optional<Design> d = designBinding.get();
        Optional<dev.proofrun.design.Requirement> req = goal.requirementBinding().get();
        if (d.isEmpty() || req.isEmpty() || draft.characteristics().size() < 2) {
            togetherAsked = null;
            together.set("");
            return;
        }
        OptionalDouble p = Numbers.parse(draft.text(DraftField.POWER));
        double power = p.isPresent() ? p.getAsDouble() : DesignRequest.DEFAULT_POWER;
        List<String> ids = new java.util.ArrayList<>();
        List<DesignRequest> requests = new java.util.ArrayList<>();
        List<String> leftOut = new java.util.ArrayList<>();
        for (dev.proofrun.app.session.CharacteristicDraft row : draft.characteristics()) {
            Optional<dev.proofrun.design.Expectation> e = goal.expectationFor(row);
            if (e.isEmpty() || row.limits().isEmpty()) {
                leftOut.add(row.id());
                continue;
            }
            try {
                requests.add(DesignRequest.of(row.limits().get().sides(), req.get(), e.get()).withPower(power));
                ids.add(row.id());
            } catch (UserException | IllegalArgumentException refused) {
                leftOut.add(row.id());
            }
        }
        Together asked = new Together(d.get().subgroupSize(), d.get().subgroups(), power, List.copyOf(ids),
                List.copyOf(requests), List.copyOf(leftOut));
        if (asked.equals(togetherAsked)) {
            return;
        }
        togetherAsked = asked;
        if (togetherJob != null) {
            togetherJob.cancel();
        }
        long mine = ++togetherGeneration;
        togetherJob = background.submit(() -> {
            double[] powers = new double[asked.requests().size()];
            for (int i = 0; i < powers.length; i++) {
                try {
                    powers[i] = StudyDesigner.power(asked.requests().get(i), asked.n(), asked.k());
                } catch (IllegalArgumentException | UserException outsideTheDesignersRange) {
                    powers[i] = Double.NaN;
                }
            }
            return powers;
        }, powers -> {
            if (mine == togetherGeneration) {
                together.set(togetherText(asked, powers));
            }
        }, ex -> {
            if (mine == togetherGeneration) {
                together.set("");
            }
        });
    }

    /** The line for these powers: each characteristic's, their product, and who falls short of the wanted power. */
    private static String togetherText(Together t, double[] powers) {
        if (powers.length == 0) {
            return "";
        }
        StringBuilder each = new StringBuilder();
        StringBuilder shortOf = new StringBuilder();
        double all = 1;
        for (int i = 0; i < powers.length; i++) {
            each.append(i == 0 ? "" : ", ").append(t.ids().get(i)).append(' ').append(fmtOrDash(powers[i]));
            all *= powers[i];
            if (!(powers[i] >= t.power())) {
                shortOf.append(shortOf.length() == 0 ? "" : ", ").append(t.ids().get(i));
            }
        }
        String line = AppMessage.SIZING_TOGETHER.format(powers.length + t.leftOut().size(), t.k(), t.n(), each, fmtOrDash(all));
        if (shortOf.length() > 0) {
            line += AppMessage.SIZING_TOGETHER_SHORT.format(fmt(t.power()), shortOf);
        }
        if (!t.leftOut().isEmpty()) {
            line += AppMessage.SIZING_TOGETHER_LEFT_OUT.format(String.join(", ", t.leftOut()));
        }
        return line;
    }

    /** The power of the k kept from the plan file, at subgroup size n, as the core computes it. */
    private record KeptPower(int n, int k, double power) {
    }

    /** What one background computation answers. */
    private record Answer(DesignTable all, DesignTable own, KeptPower kept) {
    }

    private void apply(Answer answer) {
        DesignTable all = answer.all();
        table.set(all);
        rows.setAll(all.rows());
        DesignRow pick = all.recommended();
        DesignTable own = all;
        if (answer.own() != null) {
            pick = answer.own().recommended();
            own = answer.own();
        }
        keptPower = answer.kept();
        chosenTable.set(own);
        chosen.set(pick);
        busy.set(false);
    }

    private String describeCost() {
        DesignRow c = chosen.get();
        DesignTable t = table.get();
        if (c == null || t == null) {
            return "";
        }
        DesignRow r = t.recommended();
        Optional<Integer> kept = keptSubgroups();
        if (kept.isPresent() && kept.get() != c.subgroups()) {
            DesignTable own = chosenTable.get();
            KeptPower computed = keptPower;
            String power = computed != null && computed.n() == c.subgroupSize() && computed.k() == kept.get()
                    ? AppMessage.SIZING_POWER_AT.format(fmt(computed.power())) : keptPower(own, kept.get());
            return AppMessage.SIZING_KEPT.format(kept.get(), c.subgroupSize(), kept.get() * c.subgroupSize(),
                    power, c.subgroups(), fmt(c.power()));
        }
        if (c.subgroupSize() == r.subgroupSize()) {
            return AppMessage.SIZING_RECOMMENDED_CHOSEN.format(c.subgroups(), c.subgroupSize(), c.readings(), c.power());
        }
        int extra = c.readings() - r.readings();
        return AppMessage.SIZING_OTHER_CHOSEN.format(c.subgroups(), c.subgroupSize(), c.readings(),
                extra >= 0 ? "+" + extra : Integer.toString(extra), r.readings(), c.power(), r.power(),
                fmtOrDash(c.falseAlarm()), fmtOrDash(r.falseAlarm()));
    }

    /**
     * The power of k subgroups read off the core's power curve: its value when the curve has a point at k,
     * else the values of the neighbouring points (power grows with k), else "not computed".
     */
    static String keptPower(DesignTable own, int k) {
        if (own == null || own.powerCurve().isEmpty()) {
            return AppMessage.SIZING_POWER_UNKNOWN.format();
        }
        OptionalDouble at = own.powerCurve().stream().filter(p -> p.subgroups() == k).mapToDouble(p -> p.power()).findFirst();
        if (at.isPresent()) {
            return AppMessage.SIZING_POWER_AT.format(fmt(at.getAsDouble()));
        }
        OptionalDouble below = own.powerCurve().stream().filter(p -> p.subgroups() < k).mapToDouble(p -> p.power()).max();
        OptionalDouble above = own.powerCurve().stream().filter(p -> p.subgroups() > k).mapToDouble(p -> p.power()).min();
        if (below.isPresent() && above.isPresent()) {
            return AppMessage.SIZING_POWER_BETWEEN.format(fmt(below.getAsDouble()), fmt(above.getAsDouble()));
        }
        return AppMessage.SIZING_POWER_UNKNOWN.format();
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

package dev.proofrun.app.sizing;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.chart.CurvePlot.Line;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.LatestJob;
import dev.proofrun.design.Design;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.Spending;
import dev.proofrun.design.StagedDesign;
import dev.proofrun.design.StagedReadingsCurve;
import dev.proofrun.plan.PlannedStages;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Supplier;
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

/**
 * The planned looks of the Sample-size step: the same {@link PlannedStages} call as {@code plan new --stages S
 * --spending F} for the plan's characteristics and the single-stage design chosen on the step, and the expected
 * readings of the characteristic in focus against the true index ({@link StagedReadingsCurve}). It costs seconds, so
 * it runs on a worker of its own.
 *
 * <p>The looks' most subgroups K become the plan's design, and the plan's design feeds the other steps; the request
 * is therefore built from the single-stage design only, never from K, and a request equal to the last one asked is
 * dropped <em>before</em> anything is cancelled: applying an answer that changes nothing the request rests on
 * cannot start the work again.
 */
public final class SizingStages {

    /**
     * Everything one computation rests on; equal requests give equal answers.
     *
     * @param each     each characteristic's design request (its power included), in the plan's order
     * @param focus    the index in {@code each} of the characteristic the step shows
     * @param focusId  its id
     * @param single   the single-stage design chosen on the step (its n; its k when given)
     * @param kGiven   whether k is the plan's own (kept from a plan file), as {@code plan new --subgroups}
     * @param stages   S, 2 to 4
     * @param spending how α is spent across the looks
     */
    record Request(List<DesignRequest> each, int focus, String focusId, Design single, boolean kGiven, int stages, Spending spending) {

        Request {
            each = List.copyOf(each);
        }
    }

    /** One computation's answer: the plan's looks and the focus characteristic's expected readings. */
    record Answer(Request request, PlannedStages planned, List<StagedReadingsCurve.Point> curve) {

        /** The staged design of the characteristic in focus at the plan's K (its own calibration). */
        StagedDesign focusDesign() {
            return planned.ownAtK().get(request.focus());
        }
    }

    /**
     * The request for the step's inputs, or why there is none.
     *
     * @param request the request; empty when one stage is wanted, or when looks cannot be planned
     * @param refused why looks cannot be planned; empty otherwise
     */
    record Asking(Optional<Request> request, String refused) {

        static final Asking NONE = new Asking(Optional.empty(), "");
    }

    /**
     * The request for these inputs: every characteristic counted as {@code plan new} counts it, the one in focus
     * named, the single-stage design chosen on the step.
     *
     * @param single the single-stage design (never the looks' K: that would feed the answer back into its request)
     */
    static Asking asking(int stages, Spending spending, Optional<Design> single, boolean kGiven,
            AllCharacteristics.Asked all, String focusId) {
        if (stages < 2 || single.isEmpty()) {
            return Asking.NONE;
        }
        if (!all.leftOut().isEmpty()) {
            return new Asking(Optional.empty(), SizingMessage.STAGES_COMPLETE_FIRST.format(String.join(", ", all.leftOut())));
        }
        for (int i = 0; i < all.shapes().size(); i++) {
            if (!all.shapes().get(i).isNormal()) {
                return new Asking(Optional.empty(),
                        SizingMessage.STAGES_NORMAL_ONLY.format(all.ids().get(i), all.shapes().get(i).token()));
            }
        }
        int focus = 0;
        for (int i = 0; i < all.ids().size(); i++) {
            if (all.ids().get(i).equalsIgnoreCase(focusId)) {
                focus = i;
            }
        }
        if (all.requests().isEmpty()) {
            return Asking.NONE;
        }
        return new Asking(Optional.of(new Request(all.requests(), focus, all.ids().get(focus), single.get(), kGiven,
                stages, spending)), "");
    }

    /** True indices at which the expected readings are drawn. */
    static final int CURVE_POINTS = 9;

    private final LatestJob computing;
    private final LooksChoice choice;
    private final ObjectBinding<Asking> asking;
    private final StringBinding text;
    private final ObjectBinding<List<Line>> readings;
    private final ObjectProperty<Answer> answer = new SimpleObjectProperty<>(this, "answer");
    private final BooleanProperty busy = new SimpleBooleanProperty(this, "busy", false);
    private final StringProperty refusal = new SimpleStringProperty(this, "refusal", "");
    private Request asked;

    /**
     * @param choice       the looks chosen
     * @param build        the request for the step's inputs as they are now ({@link #asking(int, Spending, Optional,
     *                     boolean, AllCharacteristics.Asked, String)})
     * @param dependencies what the request rests on
     */
    SizingStages(Background background, LooksChoice choice, Supplier<Asking> build, Observable... dependencies) {
        this.computing = new LatestJob(background);
        this.choice = choice;
        asking = Bindings.createObjectBinding(build::get, dependencies);
        // a request equal to the last is dropped before anything is cancelled (ask)
        asking.addListener((obs, was, now) -> ask(now));
        text = Bindings.createStringBinding(() -> current().map(StagedLines::text).orElse(refusal.get()), answer,
                asking, refusal);
        readings = Bindings.createObjectBinding(() -> current().map(StagedLines::readings).orElse(List.of()), answer,
                asking);
    }

    /** The choice of looks and spending. */
    public LooksChoice choice() {
        return choice;
    }

    /** The looks and figures of the characteristic in focus, one a line; empty with one look or before they are computed. */
    public StringBinding text() {
        return text;
    }

    /** The expected-readings chart's lines; none with one look or before the looks are computed. */
    public ObjectBinding<List<Line>> readings() {
        return readings;
    }

    /** True while the looks are computed. */
    public BooleanProperty busy() {
        return busy;
    }

    /** The answer for the request last asked; null while it is computed, or without a request. */
    ObjectProperty<Answer> answer() {
        return answer;
    }

    /** The request for the inputs as they are now. */
    ObjectBinding<Asking> asking() {
        return asking;
    }

    /** The looks computed for the inputs as they are now, if any. */
    Optional<Answer> current() {
        return answerFor(asking.get().request());
    }

    /** Asks for the looks of the inputs as they are now (nothing new when they are already asked). */
    void askAgain() {
        ask(asking.get());
    }

    /** Why no looks could be planned for the request last asked; empty otherwise. */
    StringProperty refusal() {
        return refusal;
    }

    /** The planned looks for exactly this request, if computed. */
    Optional<Answer> answerFor(Optional<Request> request) {
        Answer a = answer.get();
        return a != null && request.isPresent() && a.request().equals(request.get()) ? Optional.of(a) : Optional.empty();
    }

    /**
     * Asks for the looks of this request (empty: none wanted). The same request again changes nothing: the job
     * under way, or its answer, stands. A new one cancels the older job and drops its answer.
     */
    private void ask(Asking asking) {
        Request now = asking.request().orElse(null);
        String refused = asking.refused();
        if (Objects.equals(now, asked) && refused.equals(refusal.get())) {
            return;
        }
        asked = now;
        refusal.set(refused);
        answer.set(null);
        if (now == null) {
            computing.forget();
            busy.set(false);
            return;
        }
        busy.set(true);
        computing.submit(() -> compute(now), done -> {
            busy.set(false);
            answer.set(done);
        }, ex -> {
            busy.set(false);
            refusal.set(AppMessage.SIZING_FAILED.failure(ex));
        });
    }

    /** The core's work, on the worker. */
    static Answer compute(Request r) {
        PlannedStages planned = PlannedStages.of(r.each(), r.single(), r.kGiven(), r.stages(), r.spending());
        DesignRequest focus = r.each().get(r.focus());
        List<StagedReadingsCurve.Point> curve = StagedReadingsCurve.of(focus, planned.ownAtK().get(r.focus()),
                planned.stages(), StagedReadingsCurve.span(focus, CURVE_POINTS));
        return new Answer(r, planned, curve);
    }
}

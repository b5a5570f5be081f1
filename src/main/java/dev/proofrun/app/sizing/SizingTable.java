package dev.proofrun.app.sizing;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.LatestJob;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.DesignRow;
import dev.proofrun.design.DesignTable;
import java.util.Optional;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/**
 * The design table of the Sample-size step's characteristic in focus, as the worker computed it for the latest
 * request ({@link SizingJob}): an older job is cancelled and its answer dropped. Part of {@link SizingViewModel}.
 */
final class SizingTable {

    private final LatestJob computing;
    private final Runnable changed;
    private final ObjectProperty<DesignTable> table = new SimpleObjectProperty<>(this, "table");
    private final ObjectProperty<DesignTable> chosenTable = new SimpleObjectProperty<>(this, "chosenTable");
    private final ObservableList<DesignRow> rows = FXCollections.observableArrayList();
    private final ObservableList<SizingRow> shownRows = FXCollections.observableArrayList();
    private final ObjectProperty<DesignRow> chosen = new SimpleObjectProperty<>(this, "chosen");
    private final BooleanProperty busy = new SimpleBooleanProperty(this, "busy", false);
    private final StringProperty refusal = new SimpleStringProperty(this, "refusal", "");
    private SizingCost.KeptPower keptPower;
    private SizingCurves.PlanCurve planCurve;

    /** @param changed called on the FX thread whenever the table is applied or cleared */
    SizingTable(Background background, Runnable changed) {
        this.computing = new LatestJob(background);
        this.changed = changed;
    }

    ObjectProperty<DesignTable> table() {
        return table;
    }

    ObjectProperty<DesignTable> chosenTable() {
        return chosenTable;
    }

    ObservableList<DesignRow> rows() {
        return rows;
    }

    ObservableList<SizingRow> shownRows() {
        return shownRows;
    }

    ObjectProperty<DesignRow> chosen() {
        return chosen;
    }

    BooleanProperty busy() {
        return busy;
    }

    StringProperty refusal() {
        return refusal;
    }

    SizingCost.KeptPower keptPower() {
        return keptPower;
    }

    SizingCurves.PlanCurve planCurve() {
        return planCurve;
    }

    /**
     * Starts a new computation; any older one is cancelled and its answer dropped.
     *
     * @param q      the request (empty: no table, the refusal stays as the request's builder set it)
     * @param wanted the chosen subgroup size, 0 for the recommended one
     * @param kept   the plan's own k, if it keeps one
     */
    void recompute(Optional<DesignRequest> q, int wanted, Optional<Integer> kept) {
        if (q.isEmpty()) {
            computing.forget();
            busy.set(false);
            clear();
            return;
        }
        refusal.set("");
        DesignRequest req = q.get();
        busy.set(true);
        computing.submit(() -> SizingJob.compute(req, wanted, kept), this::apply, ex -> {
            busy.set(false);
            refusal.set(AppMessage.SIZING_FAILED.failure(ex));
            clear();
        });
    }

    private void clear() {
        table.set(null);
        chosenTable.set(null);
        rows.clear();
        shownRows.clear();
        chosen.set(null);
        changed.run();
    }

    private void apply(SizingJob.Answer answer) {
        DesignTable every = answer.all();
        keptPower = answer.kept();
        planCurve = answer.curve();
        table.set(every);
        rows.setAll(every.rows());
        shownRows.setAll(every.rows().stream()
                .map(r -> SizingRow.of(r, r.subgroupSize() == every.recommended().subgroupSize())).toList());
        DesignTable own = answer.own() != null ? answer.own() : every;
        chosenTable.set(own);
        chosen.set(own.recommended());
        busy.set(false);
        changed.run();
    }
}

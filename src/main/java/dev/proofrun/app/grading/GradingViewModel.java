package dev.proofrun.app.grading;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.grading.GradingDisplay.GradeRow;
import dev.proofrun.app.grading.GradingDisplay.ProblemRow;
import dev.proofrun.app.grading.GradingDisplay.Tone;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.LatestJob;
import dev.proofrun.app.session.Session;
import dev.proofrun.app.shell.StepViewModel;
import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.GradeResult;
import dev.proofrun.grade.Grader;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.grade.Problem;
import dev.proofrun.grade.IndexEvidence;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.report.GradeReport;
import dev.proofrun.paper.Paper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import javafx.beans.binding.BooleanBinding;
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
 * Grades a returned fill-in file against the issued plan: the core reads the file and grades it in a
 * JavaFX Task ({@link Background}); this model holds the result, the problems with their rows, and the characteristic the
 * user looks at. The caution goes with every verdict shown.
 */
public final class GradingViewModel extends StepViewModel {

    private final Session session;
    private final ObjectProperty<GradeResult> result = new SimpleObjectProperty<>(this, "result");
    private final ObservableList<ProblemRow> problemRows = FXCollections.observableArrayList();
    private final ObservableList<GradeRow> gradeRows = FXCollections.observableArrayList();
    private final List<CharacteristicGrade> grades = new ArrayList<>();
    private final StringProperty selected = new SimpleStringProperty(this, "selected");
    private final ObjectProperty<GradingDisplay.Characteristic> shown = new SimpleObjectProperty<>(this, "shown");
    private final BooleanBinding graded = result.isNotNull();
    private final StringBinding verdictLine = Bindings.createStringBinding(() -> result.get() == null ? ""
            : AppMessage.GRADING_VERDICT.format(result.get().planId(), this.gradedAgainst == null ? "revision " + result.get().revision()
                    : this.gradedAgainst.revisionWords(), result.get().verdict().words())
                    + result.get().look().map(l -> "\n" + l.line(result.get().verdict())).orElse(""), result);
    private final ObjectBinding<Tone> tone = Bindings.createObjectBinding(() -> result.get() == null ? Tone.OPEN
            : EvidenceDisplay.tone(result.get().verdict()), result);
    private final BooleanProperty busy = new SimpleBooleanProperty(this, "busy", false);
    private final BooleanProperty reporting = new SimpleBooleanProperty(this, "reporting", false);
    private final StringProperty message = new SimpleStringProperty(this, "message", "");
    private final Background background;
    private final LatestJob grading;
    private StudyPlan gradedAgainst;
    private String gradedFile;

    public GradingViewModel(Session session, Background background) {
        super(AppMessage.STEP_GRADING.english(), AppMessage.STEP_GRADING_HINT.english());
        this.session = session;
        this.background = background;
        this.grading = new LatestJob(background);
        bindMissing(Bindings.createStringBinding(() -> "", result));
        session.openedProperty().addListener((o, was, now) -> forget(true));
        selected.addListener((o, was, id) -> shown.set(grade(id).map(g -> EvidenceDisplay.of(g, gradedAgainst)).orElse(null)));
        returnedFile().addListener((o, was, now) -> {
            if (gradedFile != null && !gradedFile.equals(now == null ? "" : now.trim())) {
                forget(false);
            }
        });
    }

    /**
     * Drops the result (and with it the verdict and the report it could export) and any job still running:
     * it belonged to another plan or another returned file. The message goes too when the plan changed.
     */
    private void forget(boolean message) {
        grading.forget();
        busy.set(false);
        clearResult();
        if (message) {
            this.message.set("");
        }
    }

    private void clearResult() {
        result.set(null);
        problemRows.clear();
        gradeRows.clear();
        grades.clear();
        selected.set(null);
        gradedAgainst = null;
        gradedFile = null;
    }

    public StringProperty returnedFile() {
        return session.draft().field(DraftField.RETURNED_FILE);
    }

    public ObjectProperty<GradeResult> resultProperty() {
        return result;
    }

    /** Whether a grade is on screen (its verdict, problems and evidence). */
    public BooleanBinding gradedBinding() {
        return graded;
    }

    /** "Verdict for plan PR-2027-0311, revision 1 (31ec1269d925): Not valid", or "" with no grade. */
    public StringBinding verdictLineBinding() {
        return verdictLine;
    }

    /** The part verdict's mark. */
    public ObjectBinding<Tone> toneBinding() {
        return tone;
    }

    /** The problems of the returned file, in file order. */
    public ObservableList<ProblemRow> problemRows() {
        return problemRows;
    }

    /** One row per characteristic, in the plan's order. */
    public ObservableList<GradeRow> gradeRows() {
        return gradeRows;
    }

    /** The id of the characteristic looked at; setting it shows its evidence in {@link #shownProperty()}. */
    public StringProperty selectedProperty() {
        return selected;
    }

    /** The evidence of the characteristic looked at, or null. */
    public ObjectProperty<GradingDisplay.Characteristic> shownProperty() {
        return shown;
    }

    public BooleanProperty busyProperty() {
        return busy;
    }

    public StringProperty messageProperty() {
        return message;
    }

    /** The caution shown with every verdict. */
    public String caution() {
        GradeResult r = result.get();
        return r != null ? r.caution() : dev.proofrun.grade.GradeMessage.CAUTION.format();
    }

    /** Grades the file named in {@link #returnedFile()} against the issued plan, in the background. */
    public boolean grade() {
        StudyPlan plan = session.baseProperty().get();
        if (plan == null || !plan.isIssued()) {
            clearResult();
            message.set(AppMessage.GRADING_ISSUE_FIRST.format());
            return false;
        }
        String text = returnedFile().get().trim();
        if (text.isEmpty()) {
            clearResult();
            message.set(AppMessage.GRADING_NO_FILE.format());
            return false;
        }
        Path file = Path.of(text);
        if (!Files.isRegularFile(file)) {
            clearResult();
            message.set(AppMessage.GRADING_NOT_FOUND.format(text));
            return false;
        }
        String display = file.getFileName().toString();
        clearResult();
        busy.set(true);
        message.set("");
        grading.submit(() -> Grader.grade(GradingPlans.of(plan), file, display), r -> {
            gradedAgainst = plan;
            gradedFile = text;
            apply(r);
        }, ex -> {
            busy.set(false);
            clearResult();
            message.set(AppMessage.GRADING_FAILED.failure(ex));
        });
        return true;
    }

    private void apply(GradeResult r) {
        grades.addAll(r.characteristics());
        problemRows.setAll(r.problems().stream().map(GradingViewModel::row).toList());
        gradeRows.setAll(r.characteristics().stream().map(GradingViewModel::row).toList());
        result.set(r);
        selected.set(r.characteristics().isEmpty() ? null : r.characteristics().get(0).id());
        busy.set(false);
        message.set(AppMessage.GRADING_DONE.format(r.file(), verdictWords(r.verdict()).toLowerCase(Locale.ROOT), r.problems().size()));
    }

    /**
     * Writes the grade report PDF (the core's report writer) into the given file, in the background;
     * {@link #reportingProperty()} is true meanwhile and the message says where it went.
     */
    public boolean exportReport(Path target) {
        GradeResult r = result.get();
        StudyPlan against = gradedAgainst;
        if (r == null || against == null) {
            message.set(AppMessage.GRADING_NOTHING.format());
            return false;
        }
        reporting.set(true);
        LatestJob.Mark gradedFrom = grading.mark();
        message.set(AppMessage.GRADING_REPORTING.format(target));
        background.submit(() -> {
            GradeReport.write(r, against, Paper.A4, target);
            return target;
        }, written -> {
            reporting.set(false);
            if (gradedFrom.stillCurrent()) {
                message.set(AppMessage.GRADING_REPORT.format(written));
            }
        }, ex -> {
            reporting.set(false);
            if (gradedFrom.stillCurrent()) {
                message.set(AppMessage.GRADING_REPORT_FAILED.failure(ex));
            }
        });
        return true;
    }

    /** True while the report PDF is being written. */
    public BooleanProperty reportingProperty() {
        return reporting;
    }

    /** The report's default file: beside the returned file, "&lt;plan id&gt;-report.pdf". */
    public Path defaultReport() {
        GradeResult r = result.get();
        Path f = Path.of(returnedFile().get().trim()).toAbsolutePath();
        return f.resolveSibling((r == null ? "proofrun" : r.planId()) + "-report.pdf");
    }

    private static ProblemRow row(Problem p) {
        return new ProblemRow(p.location().row() > 0 ? Long.toString(p.location().row()) : "",
                p.location().column() == null ? "" : p.location().column(), p.severity().token(),
                p.characteristic() == null ? "" : p.characteristic(), p.message());
    }

    private static GradeRow row(CharacteristicGrade g) {
        // an estimate beside "Not valid" would be read as a capability statement (the report leaves it out too)
        IndexEvidence e = g.verdict() == dev.proofrun.grade.Verdict.NOT_VALID ? null : g.judged();
        return new GradeRow(g.id(), g.name(), g.verdict().words(), e == null ? "—" : e.index().symbol() + " " + fmt(e.estimate()),
                e == null ? "—" : fmt(e.lower()) + " vs " + fmt(e.required()));
    }

    /** "demonstrated" → "Demonstrated". */
    public static String verdictWords(dev.proofrun.grade.Verdict v) {
        return v.words();
    }

    /** The characteristic by id, if graded. */
    public Optional<CharacteristicGrade> grade(String id) {
        return grades.stream().filter(g -> g.id().equals(id)).findFirst();
    }

    static String fmt(double v) {
        return EvidenceDisplay.fmt(v);
    }
}

package dev.proofrun.app.grading;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.Session;
import dev.proofrun.app.shell.StepViewModel;
import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.GradeResult;
import dev.proofrun.grade.Grader;
import dev.proofrun.grade.PlanAdapter;
import dev.proofrun.grade.Problem;
import dev.proofrun.grade.Reason;
import dev.proofrun.grade.Step;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.report.GradeReport;
import dev.proofrun.paper.Paper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import javafx.beans.binding.Bindings;
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
    private final ObservableList<Problem> problems = FXCollections.observableArrayList();
    private final ObservableList<CharacteristicGrade> grades = FXCollections.observableArrayList();
    private final ObjectProperty<CharacteristicGrade> selected = new SimpleObjectProperty<>(this, "selected");
    private final BooleanProperty busy = new SimpleBooleanProperty(this, "busy", false);
    private final BooleanProperty reporting = new SimpleBooleanProperty(this, "reporting", false);
    private final StringProperty message = new SimpleStringProperty(this, "message", "");
    private final Background background;
    private Background.Job running;
    private long generation;
    private StudyPlan gradedAgainst;
    private String gradedFile;

    public GradingViewModel(Session session, Background background) {
        this.session = session;
        this.background = background;
        bindMissing(Bindings.createStringBinding(() -> "", result));
        session.openedProperty().addListener((o, was, now) -> forget(true));
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
        if (running != null) {
            running.cancel();
            running = null;
        }
        generation++;
        busy.set(false);
        clearResult();
        if (message) {
            this.message.set("");
        }
    }

    private void clearResult() {
        result.set(null);
        problems.clear();
        grades.clear();
        selected.set(null);
        gradedAgainst = null;
        gradedFile = null;
    }

    @Override
    public String title() {
        return AppMessage.STEP_GRADING.english();
    }

    @Override
    public String hint() {
        return AppMessage.STEP_GRADING_HINT.english();
    }

    public StringProperty returnedFile() {
        return session.draft().field(DraftField.RETURNED_FILE);
    }

    public ObjectProperty<GradeResult> resultProperty() {
        return result;
    }

    public ObservableList<Problem> problems() {
        return problems;
    }

    public ObservableList<CharacteristicGrade> grades() {
        return grades;
    }

    public ObjectProperty<CharacteristicGrade> selectedProperty() {
        return selected;
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
        if (running != null) {
            running.cancel();
        }
        String display = file.getFileName().toString();
        long mine = ++generation;
        clearResult();
        busy.set(true);
        message.set("");
        running = background.submit(() -> Grader.grade(PlanAdapter.of(plan), file, display), r -> {
            if (mine == generation) {
                gradedAgainst = plan;
                gradedFile = text;
                apply(r);
            }
        }, ex -> {
            if (mine == generation) {
                busy.set(false);
                clearResult();
                message.set(AppMessage.GRADING_FAILED.failure(ex));
            }
        });
        return true;
    }

    private void apply(GradeResult r) {
        result.set(r);
        problems.setAll(r.problems());
        grades.setAll(r.characteristics());
        selected.set(r.characteristics().isEmpty() ? null : r.characteristics().get(0));
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
        long mine = generation;
        message.set(AppMessage.GRADING_REPORTING.format(target));
        background.submit(() -> {
            GradeReport.write(r, against, Paper.A4, target);
            return target;
        }, written -> {
            reporting.set(false);
            if (mine == generation) {
                message.set(AppMessage.GRADING_REPORT.format(written));
            }
        }, ex -> {
            reporting.set(false);
            if (mine == generation) {
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

    /** The reasons of one step of the evidence chain, one sentence each. */
    public static List<String> reasons(CharacteristicGrade g, Step step) {
        return g.reasons().stream().filter(r -> r.step() == step).map(Reason::text).toList();
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
        return String.format(Locale.ROOT, "%.3f", v);
    }
}

package dev.proofrun.app;

import dev.proofrun.app.goal.GoalView;
import dev.proofrun.app.goal.GoalViewModel;
import dev.proofrun.app.grading.GradingView;
import dev.proofrun.app.grading.GradingViewModel;
import dev.proofrun.app.handout.HandoutView;
import dev.proofrun.app.handout.HandoutViewModel;
import dev.proofrun.app.part.PartView;
import dev.proofrun.app.part.PartViewModel;
import dev.proofrun.app.session.AppHome;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.Session;
import dev.proofrun.app.shell.CloseSave;
import dev.proofrun.app.shell.ShellView;
import dev.proofrun.app.shell.ShellViewModel;
import dev.proofrun.app.shell.StepView;
import dev.proofrun.app.shell.StepViewModel;
import dev.proofrun.app.start.StartView;
import dev.proofrun.app.start.StartViewModel;
import dev.proofrun.app.sizing.SizingView;
import dev.proofrun.app.sizing.SizingViewModel;
import dev.proofrun.app.timing.TimingView;
import dev.proofrun.app.timing.TimingViewModel;
import java.util.List;
import javafx.application.HostServices;

/**
 * Puts the wizard together: one session, one view-model per step, their views, and the shell.
 * Tests build it with a temporary {@link AppHome}.
 */
public final class Wizard {

    private final Session session;
    private final ShellViewModel shell;
    private final ShellView view;
    private final StartViewModel start;
    private final PartViewModel part;
    private final GoalViewModel goal;
    private final SizingViewModel sizing;
    private final TimingViewModel timing;
    private final HandoutViewModel handout;
    private final GradingViewModel grading;

    private Wizard(AppHome home, HostServices host) {
        session = new Session(home);
        start = new StartViewModel(session, Background.fx("proofrun-open"));
        part = new PartViewModel(session.draft());
        goal = new GoalViewModel(session.draft(), session.baseProperty(), Background.fx("proofrun-pilot"));
        sizing = new SizingViewModel(session.draft(), goal, Background.fx("proofrun-design"),
                Background.fx("proofrun-looks"));
        timing = new TimingViewModel(session.draft(), sizing.designBinding(), Background.fx("proofrun-schedule"));
        handout = new HandoutViewModel(session, goal, sizing, timing, Background.fx("proofrun-preview"),
                Background.fxFinishing("proofrun-plan-file"));
        if (host != null) {
            handout.setOpener(host::showDocument);
        }
        grading = new GradingViewModel(session, Background.fx("proofrun-grade"));
        List<StepViewModel> steps = List.of(start, part, goal, sizing, timing, handout, grading);
        shell = new ShellViewModel(session, steps);
        List<StepView> views = List.of(new StartView(start), new PartView(part), new GoalView(goal),
                new SizingView(sizing), new TimingView(timing), new HandoutView(handout),
                new GradingView(grading));
        view = new ShellView(shell, views);
        session.setPlanFileChooser(this::askWhere);
        shell.setSaver(this::saveOnClose);
    }

    /** "Save the plan" on close: what the steps describe, into the plan file; false (and why) when it cannot be. */
    private boolean saveOnClose() {
        HandoutViewModel.Composed composed = handout.composedBinding().get();
        String why = composed.problem().isEmpty() ? AppMessage.HANDOUT_EARLIER.format() : composed.problem();
        CloseSave.Outcome o = CloseSave.save(session, handout.issuedNow().or(composed::plan), why);
        shell.statusProperty().set(o.message());
        return o.saved();
    }

    /** A save dialog over the window, opening at the suggested file (tests install their own answer). */
    private java.util.Optional<java.nio.file.Path> askWhere(java.nio.file.Path suggested) {
        javafx.stage.FileChooser fc = new javafx.stage.FileChooser();
        fc.getExtensionFilters().add(new javafx.stage.FileChooser.ExtensionFilter("proofrun plan", "*.json"));
        java.io.File dir = suggested.getParent().toFile();
        if (dir.isDirectory() || dir.mkdirs()) {
            fc.setInitialDirectory(dir);
        }
        fc.setInitialFileName(suggested.getFileName().toString());
        javafx.stage.Window owner = view.root().getScene() == null ? null : view.root().getScene().getWindow();
        return java.util.Optional.ofNullable(fc.showSaveDialog(owner)).map(java.io.File::toPath);
    }

    public static Wizard create(AppHome home, HostServices host) {
        return new Wizard(home, host);
    }

    /**
     * Once the wizard is built: the first start opens the demo plan (read off the FX thread; it lands on the
     * FX thread once that is free) and goes to its first step, unless the user has moved on meanwhile;
     * later starts show the recent plans.
     */
    public void opened() {
        if (session.recent().isFirstStart()) {
            start.openDemo(() -> {
                if (shell.currentProperty().get() == 0) {
                    shell.goTo(1);
                }
            });
        }
    }

    /** True while a step computes in the background, a plan file is read or written, or a report is made. */
    public boolean busy() {
        return start.openingProperty().get() || goal.pilotLoadingProperty().get()
                || sizing.busyProperty().get() || sizing.staged().busy().get() || timing.busyProperty().get() || handout.busyProperty().get()
                || handout.exportingProperty().get()
                || handout.issuingProperty().get() || grading.busyProperty().get() || grading.reportingProperty().get();
    }

    public Session session() {
        return session;
    }

    public ShellViewModel shell() {
        return shell;
    }

    public ShellView view() {
        return view;
    }

    public StartViewModel start() {
        return start;
    }

    public PartViewModel part() {
        return part;
    }

    public GoalViewModel goal() {
        return goal;
    }

    public SizingViewModel sizing() {
        return sizing;
    }

    public TimingViewModel timing() {
        return timing;
    }

    public HandoutViewModel handout() {
        return handout;
    }

    public GradingViewModel grading() {
        return grading;
    }
}

package dev.proofrun.app.session;

import java.util.Objects;

/** The wizard's state for one window: the draft being edited and where its files go. */
public final class Session {

    private final AppHome home;
    private final StudyDraft draft = new StudyDraft();
    private final RecentPlans recent;
    private final DraftStore drafts;

    public Session(AppHome home) {
        this.home = Objects.requireNonNull(home, "home");
        this.recent = new RecentPlans(home);
        this.drafts = new DraftStore(home);
    }

    public AppHome home() {
        return home;
    }

    public StudyDraft draft() {
        return draft;
    }

    public RecentPlans recent() {
        return recent;
    }

    public DraftStore drafts() {
        return drafts;
    }

    /** Writes the draft's side file now. */
    public void autosave() {
        drafts.write(draft.snapshot());
    }
}

package dev.proofrun.app.shell;

/** The answers to "this plan has unsaved changes" when the window closes. */
public enum CloseChoice {
    /** Write the plan file, then close. */
    SAVE,
    /** Close; the autosaved draft stays and is restored next time. */
    KEEP_DRAFT,
    /** Do not close. */
    STAY
}

/**
 * What the wizard keeps between steps and on disk: {@code Session} (the open plan, its file and its draft),
 * {@code StudyDraft} with {@code DraftField} and {@code CharacteristicField} (every input kept as text, so
 * invalid input can be kept and nothing typed is lost), {@code DraftStore} and {@code DraftSnapshot} (autosave
 * two seconds after the last edit, beside the plan file as {@code <name>.draft.json}, or {@code
 * untitled.draft.json} in the wizard home; opening a plan restores a draft newer than the file), {@code
 * RecentPlans}, {@code AppHome} ({@code ~/.proofrun}, moved by the system property {@code proofrun.home};
 * plans default to {@code ./plans}), {@code PlanDrafts} between the draft and a {@code plan.StudyPlan} (a row's requirement and threshold read by
 * {@code RowRequirement} and {@code RowThreshold}), and
 * the wizard's parsers ({@code FieldNumbers}, {@code CalendarText}), and {@code ExpectedProcess}, the Goal step's
 * expectation from a typed index, a mean and σ, or pilot readings.
 *
 * {@code Background} runs long work as a JavaFX {@code Task} on a daemon worker; {@code LatestJob} in front of it
 * keeps the latest request's answer (it cancels the older job and drops its answer, {@code forget} drops a
 * pending one, and a {@code mark} tells a side job whether the answer it started from still stands).
 * {@code Background.fxFinishing} is the plan-file writer: not a daemon, so closing the window during an issue
 * still finishes the write, and it ends itself 2 s after its last job so it never holds the JVM open
 * ({@code BackgroundTest}). {@code Background.inline()} runs jobs at once, so view-models are tested in plain
 * JUnit without a toolkit.
 */
package dev.proofrun.app.session;

/**
 * The wizard: JavaFX 21 over the same core as the command line. {@code Wizard} wires one session, one
 * view-model per step, their views and the shell; {@code WizardApp} is the window (theme {@code proofrun.css},
 * the close question); {@code WizardLauncher} starts it from {@code Main}, so the jar starts on a plain JVM.
 * {@code AppMessage} holds the wizard's words. {@code TrainingRun} is the packaging build's training run for
 * the class-data-sharing archive ({@code docs/decisions/packaged-start-up.md}).
 *
 * One package per step with exactly an {@code XxxView} and an {@code XxxViewModel}: {@code start} (Open),
 * {@code part}, {@code goal}, {@code sizing} (Sample size), {@code timing}, {@code handout} (Hand-out), {@code
 * grading}; {@code shell} is the frame, {@code session} the draft and its files, {@code chart} the canvas
 * chart. View-models are the only callers of the core: a view binds to plain values and words its view-model
 * displays ({@code arch.ViewsTest} fails a {@code *View} that imports a core package, with a listed exception
 * for each view not yet moved).
 *
 * Long work runs off the FX thread through {@code session.Background}: opening plan files (read on a worker,
 * applied on the FX thread; the demo plan of a first start is read while the window is built), design tables,
 * schedules, sheet previews ({@code sheet.SheetPreview} renders the pages as images; {@code SwingFXUtils} here), grading, issuing the plan
 * (fingerprint and synced write off the FX thread, then adopted on it; edits made meanwhile stay unsaved and
 * are autosaved at once), and writing the sheet files and the report.
 *
 * Tests: plain JUnit for every view-model ({@code ShellViewModelTest}, {@code PartViewModelTest}, {@code
 * GoalViewModelTest}, {@code SizingViewModelTest}, {@code TimingViewModelTest}, {@code HandoutViewModelTest},
 * {@code StartViewModelTest}, {@code GradingViewModelTest}, {@code RecentPlansTest}); {@code DemoParityTest} (the wizard's demo return is
 * byte for byte {@code proofrun demo}'s and grades the same). TestFX robot tests, headless through Monocle:
 * {@code WizardSmokeTest}, {@code UnsavedChangesTest} (a cell marked while typing; the close question), {@code
 * IndexTooltipsTest} (every label naming an index has its tip), {@code KeyboardTest} (every step by the
 * documented keys), {@code FullFlowTest} (the whole job on the demo plan down to the verdict and the report,
 * with the FX-thread latency printed by {@code FxProbe}). They wait on observable state ({@code
 * Settle.onStep}: the step shown, nothing computing; 90 s for loaded machines), never for a fixed time.
 */
package dev.proofrun.app;

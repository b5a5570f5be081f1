/**
 * Sample size: the design table of the characteristic in focus ({@code design.StudyDesigner}, in the background,
 * {@link dev.proofrun.app.sizing.SizingJob}), named and chosen on the step and sized with the row's own
 * requirement; the OC and power curves ({@code app.chart.CurvePlot}, lines from
 * {@link dev.proofrun.app.sizing.SizingCurves}); the cost of a picked row against the recommendation
 * ({@link dev.proofrun.app.sizing.SizingCost}). The view binds display rows ({@link dev.proofrun.app.sizing.SizingRow},
 * {@link dev.proofrun.app.sizing.SizingColumn}: the command line's words) and texts; the view-model holds the state,
 * validates, and is the only caller of the core.
 *
 * Picking a row keeps its subgroup size across recomputation. A plan opened from a file keeps its own k
 * ({@code CHOSEN_SUBGROUPS}) until the user picks a row; its power and OC curve are computed by the core for that k
 * ({@code StudyDesigner.power} and {@code operatingCharacteristic(request, n, k)}), so the table's highlighted row,
 * the cost line and both charts name one design ("plan: k × n"). With several characteristics
 * ({@link dev.proofrun.app.sizing.AllCharacteristics}) a line gives each one's power at the chosen design and their
 * product (taken as independent, as {@code size --characteristics} says it), and the one design for all that
 * {@code plan new} chooses ({@code design.SharedDesigner}: one n, k the largest any needs, the driver named) can be
 * taken with one button. A characteristic planned with a skewed shape is sized with the normal model there, and the
 * line says so (docs/decisions/sizing-step-per-characteristic.md).
 *
 * <p>Planned looks ({@link dev.proofrun.app.sizing.LooksChoice}, {@link dev.proofrun.app.sizing.SizingStages}): 1 to 4
 * looks and how the false-pass risk is spent (in words on screen; the draft keeps {@code STAGES} and the spending
 * token as {@code plan new --stages S --spending F} takes them). With more than one, {@code plan.PlannedStages} is
 * called on a worker of its own for every characteristic and the single-stage design chosen in the table, exactly
 * as {@code plan new --stages} calls it (a k kept from a plan file is given, as {@code --subgroups}); its K is the
 * plan's design, and the design is empty until it is computed. The request rests on the single-stage design only,
 * never on K, and an identical request is dropped before anything is cancelled, so an answer cannot start the work
 * again. The step shows the looks of the characteristic in focus ({@link dev.proofrun.app.sizing.StagedLines}: the
 * boundaries on the index scale, the power, the readings expected at c₀ and c₁ against the single stage, the
 * designer's recommendation), the staged study's chance to demonstrate on the OC chart, and its expected readings
 * against the true index ({@code design.StagedReadingsCurve}) beside it. A skewed shape or an incomplete
 * characteristic is refused in words (docs/decisions/staged-studies-design.md, "The wizard").
 */
package dev.proofrun.app.sizing;

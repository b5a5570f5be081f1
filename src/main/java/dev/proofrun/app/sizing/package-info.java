/**
 * Sample size: the design table of the characteristic in focus ({@code design.StudyDesigner}, in the
 * background), the OC and power curves ({@code app.chart.CurvePlot}), and the cost of a picked row against the
 * recommendation. The view only binds and draws; the view-model holds the state, validates, and is the only
 * caller of the core.
 *
 * Picking a row keeps its subgroup size across recomputation. A plan opened from a file keeps its own k
 * ({@code CHOSEN_SUBGROUPS}) until the user picks a row; its power is computed by the core for that k ({@code
 * StudyDesigner.power(request, n, k)}, in the same background job as the table), not read between points of
 * the power curve, and the curve's vertical line marks it ("plan's k"). With several characteristics a line
 * under the cost gives each one's power at the chosen design (with its own limits and expected index) and
 * their product — the chance that all are demonstrated, taken as independent, as {@code size
 * --characteristics} says it — and names those below the wanted power. The design follows the characteristic
 * in focus; {@code plan new} sizes all at once with {@code plan.CommonDesign}, which the wizard does not yet
 * offer.
 */
package dev.proofrun.app.sizing;

/**
 * Control charts on a study's own data ("phase I"): {@code ControlCharts} makes the location and spread
 * charts ({@code ChartPair}) that fit the sigma estimator ({@code ChartKind.forMethod}: R̄/d2 → X̄–R, S̄/c4 or
 * pooled → X̄–S, moving range → individuals/MR) with 3σ limits from the data, per-point limits for unequal
 * subgroup sizes; {@code RunRules} applies the eight {@code RunRule}s ({@code beyond-limits},
 * {@code run-one-side}, {@code trend}, {@code alternating}, {@code two-of-three-outer},
 * {@code four-of-five-middle}, {@code hugging-centre}, {@code avoiding-centre}) and reports {@code RuleFiring}s.
 * Whether signals make a process unstable is the grader's question ({@code grade.StabilityJudge}); the
 * design's stored run-rule risk table ({@code design.RuleRiskTable}) must be remade after any change to
 * {@code RunRules}. The grader's stability decision ({@code StabilityRule}) and its risks for planning
 * ({@code StabilityRisk}) live here too, with two stored, seeded tables that must be remade (their writers are in
 * src/test) after any change to the rule or its chance reference ({@code ChanceSignalCounts}): the false-unstable rate on
 * a grid of k ({@code stability-risks.txt}) and the detection of a 1.5 σ shift at every k up to 500 readings
 * ({@code detection-risks.txt}); their tests fail when a stored cell no longer equals a fresh simulation.
 */
package dev.proofrun.control;

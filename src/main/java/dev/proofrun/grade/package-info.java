/**
 * Grading a returned file against its plan: {@code Grader.grade(GradingPlan, Path, display)} →
 * {@code GradeResult}. {@code GradingPlans.of(StudyPlan)} makes the {@code GradingPlan}; <b>the plan wins</b>
 * (limits, design, slots and requirement come from it; the file supplies readings and times). The allowed
 * shortfall is ⌊k/10⌋ subgroups (our choice). {@code CharacteristicGrader} grades one characteristic through
 * the {@code Step}s in order:
 *
 * <ol>
 * <li><b>Completeness</b> ({@code Completeness}, {@code Problem}, {@code ProblemLog}): every problem names
 * file, row and column; fatal ones are one line and exit 2, errors drop a row or subgroup, warnings keep it.
 * Nothing is dropped silently (the first 100 of each kind, the rest counted). A reading beyond the reach of the
 * limits ({@code Reach}) or not finite is set aside, located, and makes the characteristic not valid. Readings
 * with no spread ({@code NoSpread}) are a finding, not valid.</li>
 * <li><b>Stability</b> ({@code StabilityJudge} over {@code control.StabilityRule}, the rule the designer also
 * runs): the number of signalled points is compared with what {@code control.ChanceSignalCounts} finds for stable
 * normal studies of the same n, k, chart and rules (seeded); unstable when either chart's count has chance
 * &lt; 0.005, or, for a within (Cpk-like) requirement, when the ANOVA p &lt; 0.001 and σ_overall/σ_within ≥ 1.2
 * (our rule); for an overall (Ppk-like) requirement the subgroup means are judged on their own chart instead.
 * Under a declared skewed shape the charts see the readings' normal scores under the fitted model
 * ({@code NormalScores}).</li>
 * <li><b>Shape</b> ({@code GaugeStep}, then {@code ShapeJudge}): the gauge's step (the plan's resolution, or the
 * readings' own grid) is reported, and a step too coarse for the spread is its own finding; otherwise the plan's
 * declared shape — and only it — is fitted ({@code stats.ShapeFitter}) and checked at 1 % (with a large-study
 * rule that judges a departure where the index looks). When it does not fit, the characteristic is not valid
 * with "re-plan with the shape it really has"; no other model is tried.</li>
 * <li><b>Capability</b>: normal shape — {@code CapabilityJudge} → {@code JudgedIndex} → {@code IndexEvidence},
 * the required index with the plan's estimator and exact (or Bissell) bounds; lognormal or Weibull —
 * {@code PercentileJudge}, the ISO 22514-2 percentile index on the overall spread with generalized pivotal
 * bounds ({@code stats.PivotalBound}, seeded, the seed in the output); folded normal — the same index with bounds
 * by test inversion at the least favourable mean/σ ({@code stats.FoldedNormalBound}). {@code IndexEvidence} names the model and
 * {@code IndexMethod}; every output leads with them.</li>
 * </ol>
 * {@code Verdict}: not-valid, not-demonstrated, demonstrated (lower bound ≥ c0) or inconclusive (with about how
 * many more subgroups would settle it — a planning figure, warned, dropped beyond ten times the study); the
 * part's verdict is the worst. The caution ({@code GradeMessage.CAUTION}) goes with every verdict.
 *
 * <p>Staged plans ({@code GradingPlan.stages()}): {@code Grader.look} picks the furthest planned look the return
 * completes ({@code GradedLook}); the same steps run on the slots up to it with the bound at the look's confidence,
 * earlier looks are replayed so their decisions stand, and {@code LookDecision} says demonstrated, not
 * demonstrated (futility, or the last look short) or {@code Verdict.CONTINUE} with the next stage's slots.
 * See docs/decisions/staged-studies-grading.md.
 *
 * <p>Reading streams one row at a time: {@code CsvTable} (the one CSV reader, {@code text.CsvReader}: UTF-8,
 * {@code ,} or {@code ;} — whichever the header has more of) and {@code XlsxTable} (POI's SAX reader) feed
 * {@code ReturnedData}, which keeps primitive arrays. Numbers follow the one rule ({@code text.CsvDialect#number}:
 * {@code .} or a single {@code ,} as the decimal mark, the same double as {@code Double.parseDouble});
 * {@code CellValues} reads taken times. {@code DemoReturn} and
 * {@code SimulatedReturn} make the demo's seeded returned file, shared by {@code proofrun demo}, the wizard
 * and the tests.
 */
package dev.proofrun.grade;

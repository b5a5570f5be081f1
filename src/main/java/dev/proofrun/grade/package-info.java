/**
 * Grading a returned file against its plan: {@code Grader.grade(GradingPlan, Path, display)} →
 * {@code GradeResult}. {@code PlanAdapter.of(StudyPlan)} makes the {@code GradingPlan}; <b>the plan wins</b>
 * (limits, design, slots and requirement come from it; the file supplies readings and times). The allowed
 * shortfall is ⌊k/10⌋ subgroups (our choice). {@code CharacteristicGrader} grades one characteristic through
 * the {@code Step}s in order:
 *
 * <ol>
 * <li><b>Completeness</b> ({@code Completeness}, {@code Problem}, {@code ProblemLog}): every problem names
 * file, row and column; fatal ones are one line and exit 2, errors drop a row or subgroup, warnings keep it.
 * Nothing is dropped silently (the first 100 of each kind, the rest counted).</li>
 * <li><b>Stability</b> ({@code StabilityJudge}): the number of signalled points is compared with what
 * {@code ChanceSignals} finds for stable normal studies of the same n, k, chart and rules (seeded); unstable
 * when either chart's count has chance &lt; 0.005, or when the ANOVA p &lt; 0.001 and σ_overall/σ_within ≥ 1.2
 * (our rule).</li>
 * <li><b>Shape</b> ({@code ShapeJudge}): readings spread over their resolution cell (seeded) before
 * Anderson–Darling against the normal; if rejected, Box–Cox, lognormal and Weibull fits
 * ({@code DistributionFits}, {@code AndersonDarlingFit}), the fitting model with the smallest AIC chosen.</li>
 * <li><b>Capability</b> ({@code CapabilityJudge} → {@code JudgedIndex} → {@code IndexEvidence}): the required
 * index under the chosen model with the plan's estimator and bound method; the ISO 22514-2 percentile method
 * for Weibull.</li>
 * </ol>
 * {@code Verdict}: not-valid, not-demonstrated, demonstrated (lower bound ≥ c0) or inconclusive (with about how
 * many more subgroups would settle it); the part's verdict is the worst. The caution
 * ({@code GradeMessage.CAUTION}) goes with every verdict.
 *
 * <p>Reading streams one row at a time: {@code CsvLines}/{@code CsvTable} (UTF-8, {@code ,} or {@code ;} —
 * whichever the header has more of) and {@code XlsxTable} (POI's SAX reader) feed {@code ReturnedData}, which
 * keeps primitive arrays. {@code Cells} reads numbers ({@code .} or a single {@code ,} as the decimal mark,
 * the same double as {@code Double.parseDouble}) and taken times. {@code DemoReturn} and
 * {@code SimulatedReturn} make the demo's seeded returned file, shared by {@code proofrun demo}, the wizard
 * and the tests.
 */
package dev.proofrun.grade;

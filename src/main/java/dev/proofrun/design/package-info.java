/**
 * How many subgroups of what size: {@code StudyDesigner.design(DesignRequest)} → {@code DesignTable}
 * (rows, the recommended row with a one-sentence reason, OC curve, power curve against k, warnings);
 * {@code SharedDesigner} plans several characteristics measured on the same parts (one n, the largest k any
 * needs, each one's power, the driver named, {@code SharedDesign.allDemonstratedIfIndependent()} — the product
 * of the powers, a planning figure under independence). {@code ProcessFacts} and {@code PilotExpectation} turn
 * limits and a process (or a pilot's result) into an {@code Expectation}.
 *
 * <ul>
 * <li><b>OC curve</b>: 41 evenly spaced true indices from c0 − (c1 − c0) to c1 + (c1 − c0), plus c0 and c1
 * themselves, so the risk at the requirement and the power at the expectation are computed, not read between
 * grid points.</li>
 * <li><b>Power</b> ({@code StudyPower}): P(lower bound ≥ c0) = P(Ĉ ≥ c*), c* the smallest estimate whose bound
 * reaches c0. For the exact two-sided Cpk bound c* depends on the observed offset, so {@code CriticalCurve}
 * tabulates c*(k̂) at 8 Chebyshev nodes and the power integrates over the mean. {@code IndexTail} is a
 * fixed-node copy of {@code stats.IndexDistribution}'s integrals for speed. The estimator is modelled as
 * κ·W with κ = 1/E[W] ({@code ChiScale}); without it the power was about 0.01 too high against simulation.</li>
 * <li><b>Search</b> ({@code SizeSearch}): start at the floor (25 subgroups / 100 readings, {@code PracticeFloors});
 * gallop, bisect, step back; {@code LimitedBy} says what decided.</li>
 * <li><b>Stability side</b>: {@code ChartRisks} in closed form for the 3σ rule; {@code RuleRisks} for all eight
 * run rules from the stored seeded simulation {@code rule-risks.txt} ({@code RuleRiskTable}; its generator
 * {@code RuleRiskTableWriter} in src/test reproduces the file byte for byte).</li>
 * <li>Checked by {@code PowerSimulationTest} (real studies through {@code stats.WithinSigma} and
 * {@code stats.CapabilityBounds}, ±0.015; the whole grid with {@code -Dlong}: every row within ±0.007),
 * {@code DesignReferenceTest} (SciPy 1.17.1) and {@code DesignPropertiesTest}.</li>
 * </ul>
 * <b>Staged studies</b>: {@code StagedDesigner.design(request, n, looks, spending)} → {@code StagedDesign} (the
 * {@code Stages} contract the plan and the grader share, each look's boundaries and stop chances, expected readings
 * at c0 and c1, the single stage beside it); per-look confidences from simulated joint looks ({@code StagedPaths},
 * {@code LookPValue}), see {@code docs/decisions/staged-studies-design.md}. The last designs are kept
 * ({@code stats.RecentResults}): the same request gives the same design, at once. The staged and the shaped
 * simulations stop when the job that asked for them is cancelled ({@code stats.Cancellation}).
 * This package must not import {@code grade} (grade imports design).
 */
package dev.proofrun.design;

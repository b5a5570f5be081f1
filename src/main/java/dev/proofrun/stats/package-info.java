/**
 * Pure math: chart constants, within-subgroup sigma, moments, normality, the distributions of the
 * capability indices and their confidence bounds. No file, no UI; other packages depend on it, it depends
 * only on {@code text} and the math libraries.
 *
 * <ul>
 * <li>{@code ChartConstants}: d2, d3, c4 and the chart factors A2, A3, B3, B4, D3, D4 for n = 2–50, computed
 * from their definitions by composite 8-point Gauss–Legendre on [−9, 9] (d2 = ∫(1 − Φⁿ − (1−Φ)ⁿ)dx, d3 from
 * E[R²], c4 from the gamma function); {@code c4Continuous} and {@code chiCv2} for real m. Checked against
 * mpmath 1.3.0 and Montgomery's Appendix VI table (typed from memory, every cell cross-checked with mpmath;
 * 8 cells that differ by under one printed unit are listed in the resource with their mpmath values).</li>
 * <li>{@code WithinSigma} → {@code SigmaEstimate}: R̄/d2 (equal sizes only), S̄/c4 (inverse-variance weights
 * for
 * unequal sizes), pooled s_p/c4(ν+1), MR̄/d2(2); {@code degreesOfFreedom} is Patnaik's effective ν.
 * The conventions are the documented enums {@code SigmaMethod}, {@code BoundMethod}, {@code IndexKind} and
 * {@code SpecLimits.Sides}.</li>
 * <li>{@code SampleMoments}, {@code Nonconforming} (expected ppm under a normal model, observed count outside),
 * {@code AndersonDarling} (A², Stephens' adjustment, the D'Agostino &amp; Stephens p-value; N ≥ 8).</li>
 * <li>{@code NoncentralT} (cdf, sf, the noncentrality for a probability): an integral of normal probabilities
 * over the chi density ({@code ChiDensity}), adaptive Gauss–Legendre ({@code Quadrature},
 * {@code GaussLegendreRule}), Brent roots ({@code Roots}). Checked against 457 mpmath values; worst error
 * 9e-14 absolute. Below ν = 2 accuracy drops (1e-5 at ν = 0.6).</li>
 * <li>{@code IndexDistribution}: the sampling distributions of Ĉp (chi-square), one-sided indices (noncentral
 * t) and Ĉpk (the one-dimensional integral of Pearn, Kotz &amp; Johnson 1992).</li>
 * <li>{@code CapabilityBounds}: lower and upper bounds and two-sided intervals for Cp/Pp (chi-square),
 * one-sided
 * indices (Chou, Owen &amp; Borrego 1990) and Cpk/Ppk, {@code BoundMethod.EXACT} (centring taken from the data,
 * held fixed; falls back to the noncentral-t bound, the safe side) or {@code BISSELL}. Measured coverage of the
 * 95 % lower bounds with σ̂ = s (20,000 seeded studies a cell): exact Cp 94.8–95.3 %, exact Cpk off-centre
 * 94.8–95.1 %, centred 96.0–96.6 % (conservative); see {@code CapabilityBoundsCoverageTest}.</li>
 * <li>{@code BoundEngine}: the one entry point for a bound — {@code NormalTheoryBound} (which formula of
 * {@code CapabilityBounds} applies, decided once; its inverse {@code passingEstimate} for the designer) and
 * {@code PercentileEstimate} (the shapes' bound: generalized pivotal, or inverted for the folded normal),
 * {@code FloorBound.Estimate} (a threshold shape with only a floor for its threshold: the least pivotal bound over the
 * thresholds the readings' skewness leaves possible, Berger &amp; Boos 1994). {@code Confidence} holds the two ranges:
 * stated (0.5, 0.9999) and computable (0.5, 1), the latter for a staged study's per-look confidence.</li>
 * <li>{@code RecentResults}: the one small least-recently-used store for simulated tables and designs, which fixed
 * seeds make a function of their inputs (the folded-normal and floor tables here, staged designs and curves in
 * {@code design}).</li>
 * <li>{@code Cancellation}: a long simulation stops when the thread that asked for it is interrupted (the wizard
 * cancels a job that way), checked also from the threads of a parallel stream; uninterrupted, nothing changes.</li>
 * </ul>
 */
package dev.proofrun.stats;

package dev.proofrun.design;

import dev.proofrun.stats.GaussLegendreRule;
import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.NormalTheoryBound;
import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;

/**
 * The probability that one design (N readings, ν degrees of freedom) demonstrates c₀ at confidence 1−α:
 * P(lower bound ≥ c₀) = P(Ĉ ≥ ĉ*), ĉ* the smallest estimate whose bound reaches c₀.
 *
 * <p>ĉ* comes from the bound engine ({@link NormalTheoryBound#passingEstimate}) where it has a closed form; the
 * exact bounds' ĉ* is solved here from the estimate's distribution.
 *
 * <ul>
 * <li>Cp/Pp: ĉ* = c₀·sqrt(ν/χ²_{α,ν}); power = P(κW ≤ c₁/ĉ*) (chi-square; exact for Pp).</li>
 * <li>One-sided (Cpu, Cpl, Ppu, Ppl; Cpk/Ppk of a one-sided specification): ĉ* solves
 * P(Ĉ ≥ ĉ* | C = c₀) = α (noncentral t, the exact bound); power = P(Ĉ ≥ ĉ* | C = c₁).</li>
 * <li>Two-sided Cpk/Ppk, Bissell bound: ĉ* solves ĉ − z_{1−α}·sqrt(1/(9N) + ĉ²/(2ν)) = c₀ (a quadratic);
 * power = P(Ĉpk ≥ ĉ*) under the true centring.</li>
 * <li>Two-sided Cpk/Ppk, exact bound: the bound holds the observed relative offset k̂ = 1 − Ĉpk/Ĉp
 * fixed, so ĉ* depends on k̂: ĉ*(k̂) solves P(Ĉpk ≥ ĉ* | Cpk = c₀, Cp = c₀/(1−k̂)) = α. In units of σ,
 * with Z = (x̄ − m)/σ ~ N(3(Cp₁ − c₁), 1/N), k̂ = |Z|/(3Cp₁) depends on the mean alone, and the study
 * passes when κW ≤ (3Cp₁ − |Z|)/(3ĉ*(k̂)) (κ: see the constructor). Hence
 * <pre>  power = ∫ √N·φ(√N(z − 3(Cp₁ − c₁)))·F_W((3Cp₁ − |z|)/(3κĉ*(k̂(z)))) dz,</pre>
 * integrated by Gauss–Legendre on ±8.5 standard errors, split at z = 0. ĉ*(k̂) is tabulated by
 * {@link CriticalCurve}. Evaluating ĉ* only at the expected centring instead would overstate the power of
 * a centred process (the observed k̂ is never below the true 0, and a larger k̂ asks for a larger ĉ*).</li>
 * </ul>
 *
 * <p>Where the model is weakest: the within estimators enter through their effective degrees of freedom
 * (Patnaik's scaled chi matched in mean and variance). That is closest for R̄/d2 with n ≥ 4 and for the
 * pooled s (exact), and weakest for the moving range (n = 1: the ranges overlap and are correlated) and
 * for n = 2 (each range is a half-normal variable, far from chi-shaped); PowerSimulationTest measures the
 * difference against really simulated studies — within ±0.015 on the whole grid of the issue.
 */
final class StudyPower {

    private static final GaussLegendreRule GL = GaussLegendreRule.of(32);
    private static final double EDGE = 8.5;

    private final IndexShape shape;
    private final BoundMethod method;
    private final double target;
    private final double confidence;
    private final double alpha;
    private final int readings;
    private final double nu;
    private final IndexTail tail;
    private final double scale;
    private CriticalCurve curve;
    private double fixedCritical = Double.NaN;
    private OptionalDouble closedForm;

    StudyPower(IndexShape shape, BoundMethod method, double target, double confidence, int readings, double nu) {
        this(shape, method, target, confidence, readings, nu, false);
    }

    /**
     * @param meanUnbiased true for the within estimators (R̄/d2, S̄/c4, s_p/c4, MR̄/d2), which are unbiased
     *                     for σ itself: their ratio to σ is modelled as κ·W with κ = 1/E[W] =
     *                     sqrt(ν/2)·Γ(ν/2)/Γ((ν+1)/2), while the bound (like every capability bound) treats
     *                     σ̂/σ as W = sqrt(χ²_ν/ν); false for the overall s, which is W itself. Leaving κ
     *                     out overstates the power by about 0.01 at ν ≈ 100 (seen in PowerSimulationTest).
     */
    StudyPower(IndexShape shape, BoundMethod method, double target, double confidence, int readings, double nu,
            boolean meanUnbiased) {
        this.scale = meanUnbiased ? meanCorrection(nu) : 1;
        this.shape = shape;
        this.method = method;
        this.target = target;
        this.confidence = confidence;
        this.alpha = 1 - confidence;
        this.readings = readings;
        this.nu = nu;
        this.tail = new IndexTail(readings, nu);
    }

    /** κ = 1/E[sqrt(χ²_ν/ν)] = sqrt(ν/2)·Γ(ν/2)/Γ((ν+1)/2). */
    static double meanCorrection(double nu) {
        return Math.exp(0.5 * Math.log(nu / 2) + org.apache.commons.numbers.gamma.LogGamma.value(nu / 2)
                - org.apache.commons.numbers.gamma.LogGamma.value((nu + 1) / 2));
    }

    double degreesOfFreedom() {
        return nu;
    }

    double target() {
        return target;
    }

    double rootN() {
        return tail.rootN();
    }

    /**
     * ĉ* at the expected relative offset k₁ = 1 − c₁/Cp₁ (for Cp/Pp and one-sided indices it has no
     * offset). Infinite when no estimate can pass (Bissell with ν ≤ z²/2).
     */
    double criticalEstimate(double relativeOffset) {
        if (shape == IndexShape.TWO_SIDED_MIN && closedForm().isEmpty()) {
            return curve().at(relativeOffset);
        }
        return fixedCritical();
    }

    /** P(demonstrate) when the true index is c₁ with true Cp₁ (ignored unless two-sided Cpk/Ppk). */
    double power(double trueIndex, double trueCp) {
        switch (shape) {
            case SPREAD:
                return tail.spreadAtLeast(scale * fixedCritical(), trueIndex);
            case ONE_SIDED:
                return tail.oneSidedAtLeast(scale * fixedCritical(), trueIndex);
            default:
                if (closedForm().isPresent()) {
                    double c = fixedCritical();
                    return Double.isInfinite(c) ? 0 : tail.minAtLeast(scale * c, trueIndex, trueCp);
                }
                return exactTwoSidedPower(trueIndex, trueCp);
        }
    }

    private double exactTwoSidedPower(double trueCpk, double trueCp) {
        CriticalCurve cc = curve();
        double rootN = tail.rootN();
        double centre = 3 * (trueCp - trueCpk);
        double half = 3 * trueCp;
        double lo = centre - EDGE / rootN;
        double hi = Math.min(centre + EDGE / rootN, half);
        double sum = 0;
        if (lo < 0 && hi > 0) {
            sum += piece(cc, lo, 0, centre, half, rootN) + piece(cc, 0, hi, centre, half, rootN);
        } else {
            sum += piece(cc, Math.max(lo, -half), hi, centre, half, rootN);
        }
        return Math.max(0, Math.min(1, sum));
    }

    private double piece(CriticalCurve cc, double a, double b, double centre, double half, double rootN) {
        double sum = 0;
        for (int i = 0; b > a && i < GL.order(); i++) {
            double z = GL.node(i, a, b);
            double abs = Math.abs(z);
            if (abs >= half) {
                continue;
            }
            double u = rootN * (z - centre);
            double density = rootN * Math.exp(-0.5 * u * u) / Math.sqrt(2 * Math.PI);
            double crit = cc.at(abs / half);
            sum += GL.weight(i, a, b) * density * tail.chi().cdf((half - abs) / (3 * scale * crit));
        }
        return sum;
    }

    private double fixedCritical() {
        if (Double.isNaN(fixedCritical)) {
            fixedCritical = computeFixedCritical();
        }
        return fixedCritical;
    }

    private double computeFixedCritical() {
        OptionalDouble closed = closedForm();
        if (closed.isPresent()) {
            return closed.getAsDouble();
        }
        return shape == IndexShape.ONE_SIDED ? exactCriticalAt(1, bissellCritical()) : curve().at(1);
    }

    /** ĉ* from the bound engine where it has a closed form (Cp/Pp; two-sided Bissell); empty for the exact bounds. */
    private OptionalDouble closedForm() {
        if (closedForm == null) {
            closedForm = NormalTheoryBound.passingEstimate(form(shape), method, target, readings, nu, confidence);
        }
        return closedForm;
    }

    private static NormalTheoryBound.Form form(IndexShape shape) {
        switch (shape) {
            case SPREAD:
                return NormalTheoryBound.Form.SPREAD;
            case ONE_SIDED:
                return NormalTheoryBound.Form.ONE_SIDED;
            default:
                return NormalTheoryBound.Form.TWO_SIDED;
        }
    }

    /** The estimate whose Bissell bound equals c₀ (the starting guess of the exact searches). */
    double bissellCritical() {
        return NormalTheoryBound.bissellPassing(target, readings, nu, alpha);
    }

    CriticalCurve curve() {
        if (curve == null) {
            curve = new CriticalCurve(this);
        }
        return curve;
    }

    /** ĉ* for the exact two-sided bound at a relative offset k̂ ∈ [0, 1); k̂ = 1 gives the one-sided value. */
    double exactCriticalAt(double relativeOffset, double guess) {
        double cp = relativeOffset >= 1 ? Double.POSITIVE_INFINITY : target / (1 - relativeOffset);
        double c = newton(cp, guess);
        if (Double.isNaN(c)) {
            c = solveCritical(x -> tail.minAtLeast(x, target, cp), guess);
        }
        return c;
    }

    /** Newton's method on tail(c) − α from the guess; NaN when it leaves the safe region or stalls. */
    private double newton(double cp, double guess) {
        if (!(Double.isFinite(guess) && guess > target)) {
            return Double.NaN;
        }
        double[] slope = new double[1];
        double c = guess;
        for (int i = 0; i < 12; i++) {
            double f = tail.minAtLeast(c, target, cp, slope) - alpha;
            if (!(slope[0] < 0)) {
                return Double.NaN;
            }
            double next = c - f / slope[0];
            if (!(next > target) || next > 3 * guess) {
                return Double.NaN;
            }
            if (Math.abs(next - c) < 1e-9) {
                return next;
            }
            c = next;
        }
        return Double.NaN;
    }

    /**
     * The c with tail(c) = α, tail decreasing in c: bracket around the guess, then the Illinois variant
     * of false position (Dowell &amp; Jarratt 1971, BIT 11:168–174), to 1e-10 in c.
     */
    private double solveCritical(DoubleUnaryOperator tailOf, double guess) {
        double start = Double.isFinite(guess) && guess > target ? guess : target * 1.2;
        double step = Math.max(1e-3, 0.02 * (start - target));
        double a = Math.max(target, start - step);
        double b = start + step;
        double fa = tailOf.applyAsDouble(a) - alpha;
        double fb = tailOf.applyAsDouble(b) - alpha;
        for (int i = 0; fa < 0 && i < 60; i++) {
            b = a;
            fb = fa;
            a = target + 0.5 * (a - target);
            fa = tailOf.applyAsDouble(a) - alpha;
        }
        for (int i = 0; fb > 0 && i < 60; i++) {
            a = b;
            fa = fb;
            step *= 2;
            b += step;
            fb = tailOf.applyAsDouble(b) - alpha;
        }
        int side = 0;
        for (int i = 0; i < 100 && b - a > 1e-10; i++) {
            double c = (a * fb - b * fa) / (fb - fa);
            if (!(c > a && c < b)) {
                c = 0.5 * (a + b);
            }
            double fc = tailOf.applyAsDouble(c) - alpha;
            if (fc == 0) {
                return c;
            }
            if ((fc > 0) == (fa > 0)) {
                a = c;
                fa = fc;
                if (side == -1) {
                    fb *= 0.5;
                }
                side = -1;
            } else {
                b = c;
                fb = fc;
                if (side == 1) {
                    fa *= 0.5;
                }
                side = 1;
            }
            if (Math.abs(fc) < 1e-13) {
                return c;
            }
        }
        return 0.5 * (a + b);
    }
}

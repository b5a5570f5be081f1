package dev.proofrun.grade;

import dev.proofrun.design.Design;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.util.List;
import org.hipparchus.special.Erf;

/**
 * All indices of one characteristic on the readings' own scale under the normal model, with lower bounds
 * at the plan's confidence and expected/observed parts per million — the figures shown beside the judged
 * index (which may be computed under another model, see {@link CapabilityJudge}). Indices that do not
 * exist for the specification are NaN (shown as null).
 *
 * <p>Expected ppm: 10⁶·[Φ((LSL − x̄)/σ) + Φ((x̄ − USL)/σ)] with σ = σ_w (within) or s (overall); observed:
 * readings outside the tolerance per million readings. Cpm = (USL − LSL)/(6·sqrt(s² + (x̄ − T)²)), T the
 * nominal or the midpoint (Chan, Cheng &amp; Spiring 1988, JQT 20:162–175).
 */
public record CapabilityFigures(long readings, int subgroups, int subgroupSize, double mean, double sigmaWithin,
        double sigmaOverall, double cp, double cpu, double cpl, double cpk, double pp, double ppu, double ppl,
        double ppk, double cpm, double lowerCp, double lowerCpk, double lowerPp, double lowerPpk,
        double ppmWithin, double ppmOverall, double ppmObserved) {

    static CapabilityFigures of(GradedCharacteristic gc, Design design, List<double[]> subgroups) {
        double[] x = ShapeJudge.flatten(subgroups);
        int n = x.length;
        double mean = 0;
        for (double v : x) {
            mean += v;
        }
        mean /= n;
        double s = StabilityJudge.overallSd(subgroups);
        WithinEstimate w = WithinEstimate.of(design.sigmaMethod(), subgroups);
        SpecLimits l = gc.limits();
        double conf = gc.requirement().confidence();
        double cp = JudgedIndex.value(IndexKind.CP, l, mean, w.sigma());
        double cpu = JudgedIndex.value(IndexKind.CPU, l, mean, w.sigma());
        double cpl = JudgedIndex.value(IndexKind.CPL, l, mean, w.sigma());
        double cpk = JudgedIndex.value(IndexKind.CPK, l, mean, w.sigma());
        double pp = JudgedIndex.value(IndexKind.PP, l, mean, s);
        double ppu = JudgedIndex.value(IndexKind.PPU, l, mean, s);
        double ppl = JudgedIndex.value(IndexKind.PPL, l, mean, s);
        double ppk = JudgedIndex.value(IndexKind.PPK, l, mean, s);
        double cpm = Double.NaN;
        if (l.isTwoSided()) {
            double t = gc.nominal() != null ? gc.nominal() : l.midpoint().getAsDouble();
            cpm = l.width().getAsDouble() / (6 * Math.sqrt(s * s + (mean - t) * (mean - t)));
        }
        JudgedIndex.BoundSide side = JudgedIndex.sideFor(IndexKind.CPK, l);
        double lcp = Double.NaN;
        double lpp = Double.NaN;
        double lcpk = Double.NaN;
        double lppk = Double.NaN;
        if (w.sigma() > 0 && s > 0) {
            if (l.isTwoSided()) {
                lcp = new JudgedIndex(IndexKind.CP, cp, Double.NaN, n, w.df(), JudgedIndex.BoundSide.POTENTIAL, design.boundMethod()).lower(conf);
                lpp = new JudgedIndex(IndexKind.PP, pp, Double.NaN, n, n - 1.0, JudgedIndex.BoundSide.POTENTIAL, design.boundMethod()).lower(conf);
            }
            lcpk = new JudgedIndex(IndexKind.CPK, cpk, cp, n, w.df(), side, design.boundMethod()).lower(conf);
            lppk = new JudgedIndex(IndexKind.PPK, ppk, pp, n, n - 1.0, side, design.boundMethod()).lower(conf);
        }
        long outside = 0;
        for (double v : x) {
            if ((l.lower().isPresent() && v < l.lower().getAsDouble()) || (l.upper().isPresent() && v > l.upper().getAsDouble())) {
                outside++;
            }
        }
        return new CapabilityFigures(n, subgroups.size(), design.subgroupSize(), mean, w.sigma(), s, cp, cpu, cpl, cpk,
                pp, ppu, ppl, ppk, cpm, lcp, lcpk, lpp, lppk, ppm(l, mean, w.sigma()), ppm(l, mean, s), 1e6 * outside / n);
    }

    private static double ppm(SpecLimits l, double mean, double sigma) {
        if (!(sigma > 0)) {
            return Double.NaN;
        }
        double p = 0;
        if (l.lower().isPresent()) {
            p += 0.5 * Erf.erfc((mean - l.lower().getAsDouble()) / (sigma * Math.sqrt(2)));
        }
        if (l.upper().isPresent()) {
            p += 0.5 * Erf.erfc((l.upper().getAsDouble() - mean) / (sigma * Math.sqrt(2)));
        }
        return 1e6 * p;
    }
}

package dev.proofrun.cli;

import dev.proofrun.capability.CapabilityResult;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SigmaMethod;
import java.util.Locale;
import java.util.OptionalDouble;

/** The text report of {@code proofrun estimate}, for people. */
final class EstimateText {

    /**
     * Cpk above this multiple of Ppk is pointed out (a heuristic of ours: with a stable process the two
     * agree up to sampling error, which for the usual study sizes stays well below 25 %).
     */
    private static final double WITHIN_OVERALL_RATIO = 1.25;

    private EstimateText() {
    }

    static String of(String file, CapabilityResult r) {
        return of(file, r, java.util.Optional.empty());
    }

    /** @param rounding the sentence saying rounding likely made the normality test reject, when it did */
    static String of(String file, CapabilityResult r, java.util.Optional<String> rounding) {
        StringBuilder sb = new StringBuilder();
        line(sb, "Capability estimate for %s", file);
        String shape;
        if (r.subgroupSize().isPresent() && r.subgroupSize().getAsInt() == 1) {
            shape = String.format(Locale.ROOT, "%d individual readings", r.readings());
        } else if (r.subgroupSize().isPresent()) {
            shape = String.format(Locale.ROOT, "%d readings in %d subgroups of %d", r.readings(), r.subgroups(),
                    r.subgroupSize().getAsInt());
        } else {
            shape = String.format(Locale.ROOT, "%d readings in %d subgroups of unequal size", r.readings(), r.subgroups());
        }
        line(sb, "  %s; mean %s", shape, num(r.mean()));
        line(sb, "  Tolerance: LSL %s, USL %s; target for Cpm %s", opt(r.limits().lower()), opt(r.limits().upper()),
                opt(r.target()));
        line(sb, "  Sigma within  %s  (%s, %s degrees of freedom)", num(r.within().value()),
                describe(r.within().method()), df(r.within().degreesOfFreedom()));
        line(sb, "  Sigma overall %s  (sample standard deviation, %s degrees of freedom)", num(r.sigmaOverall()),
                df(r.overallDegreesOfFreedom()));
        sb.append('\n');
        line(sb, "  %-6s %10s   %s", "index", "estimate",
                String.format(Locale.ROOT, "lower bound (%s %% confidence)", percent(r.confidence())));
        for (IndexKind k : IndexKind.values()) {
            row(sb, k.symbol(), r.index(k), r.lowerBound(k), k, r);
        }
        row(sb, "Cpm", r.indices().cpm(), OptionalDouble.empty(), null, r);
        sb.append('\n');
        line(sb, "  Expected outside the tolerance (normal model): %s ppm within, %s ppm overall",
                ppm(r.ppm().within()), ppm(r.ppm().overall()));
        line(sb, "  Observed outside the tolerance: %d of %d readings (%s ppm)", r.ppm().observedOutside(), r.readings(),
                ppm(r.ppm().observed()));
        if (r.normality().isPresent()) {
            var ad = r.normality().get();
            line(sb, "  Normality: Anderson-Darling A2 = %.4f, adjusted A* = %.4f, p = %.4f", ad.statistic(), ad.adjusted(),
                    ad.pValue());
        }
        sb.append('\n');
        if (r.normality().isEmpty()) {
            line(sb, "%s", EstimateMessage.NORMALITY_NOT_TESTED.format());
        } else if (r.normality().get().pValue() < 0.05) {
            line(sb, "%s", EstimateMessage.NOT_NORMAL.format(r.normality().get().pValue()));
            rounding.ifPresent(t -> line(sb, "%s", t));
        }
        OptionalDouble cpk = r.indices().cpk();
        OptionalDouble ppk = r.indices().ppk();
        if (ppk.getAsDouble() > 0 && cpk.getAsDouble() > WITHIN_OVERALL_RATIO * ppk.getAsDouble()) {
            line(sb, "%s", EstimateMessage.WITHIN_ABOVE_OVERALL.format(cpk.getAsDouble(), ppk.getAsDouble()));
        }
        line(sb, "%s", EstimateMessage.NO_STABILITY_CHECK.format());
        sb.append(EstimateMessage.CAUTION.format());
        return sb.toString();
    }

    private static void row(StringBuilder sb, String symbol, OptionalDouble estimate, OptionalDouble lower, IndexKind k,
            CapabilityResult r) {
        if (estimate.isEmpty()) {
            line(sb, "  %-6s %10s", symbol, "-");
            return;
        }
        String bound = "";
        if (lower.isPresent()) {
            bound = String.format(Locale.ROOT, "%.3f", lower.getAsDouble());
            if (k == IndexKind.CPK || k == IndexKind.PPK) {
                bound += r.limits().isTwoSided() ? "  (" + r.bound().token() + ")" : "  (exact, one-sided)";
            } else {
                bound += "  (exact)";
            }
        }
        line(sb, "  %-6s %10.3f   %s", symbol, estimate.getAsDouble(), bound);
    }

    private static String describe(SigmaMethod m) {
        switch (m) {
            case RBAR:
                return "mean range / d2";
            case SBAR:
                return "mean standard deviation / c4";
            case POOLED:
                return "pooled standard deviation / c4";
            case MOVING_RANGE:
                return "mean moving range / d2(2)";
            default:
                throw new AssertionError(m);
        }
    }

    /** Six significant digits without trailing zeros. */
    private static String num(double x) {
        return new java.math.BigDecimal(String.format(Locale.ROOT, "%.6g", x)).stripTrailingZeros().toPlainString();
    }

    private static String opt(OptionalDouble x) {
        return x.isPresent() ? num(x.getAsDouble()) : "none";
    }

    private static String df(double nu) {
        return nu == Math.rint(nu) ? String.format(Locale.ROOT, "%.0f", nu) : String.format(Locale.ROOT, "%.1f", nu);
    }

    private static String ppm(double x) {
        if (x == 0) {
            return "0";
        }
        if (x < 0.001) {
            return "< 0.001";
        }
        return x >= 100 ? String.format(Locale.ROOT, "%.0f", x) : String.format(Locale.ROOT, "%.3g", x);
    }

    private static String percent(double confidence) {
        String s = String.format(Locale.ROOT, "%.2f", 100 * confidence);
        return s.replaceAll("\\.?0+$", "");
    }

    private static void line(StringBuilder sb, String format, Object... args) {
        sb.append(String.format(Locale.ROOT, format, args)).append('\n');
    }
}

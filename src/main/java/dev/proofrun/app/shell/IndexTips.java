package dev.proofrun.app.shell;

import dev.proofrun.stats.IndexKind;

/**
 * The tooltip text of every index the wizard shows: its formula (ISO 22514-2 symbols) and what it means.
 * σ_w is the within-subgroup sigma, s the overall sample standard deviation, μ the mean.
 */
public final class IndexTips {

    private IndexTips() {
    }

    public static String of(IndexKind k) {
        return switch (k) {
            case CP -> "Cp = (USL − LSL) / (6 σ_w)\nHow many times the short-term spread fits into the tolerance, "
                    + "ignoring where the process is centred. Needs both limits.";
            case CPU -> "Cpu = (USL − μ) / (3 σ_w)\nRoom between the mean and the upper limit, in units of three "
                    + "short-term sigmas.";
            case CPL -> "Cpl = (μ − LSL) / (3 σ_w)\nRoom between the lower limit and the mean, in units of three "
                    + "short-term sigmas.";
            case CPK -> "Cpk = min(Cpu, Cpl)\nThe short-term capability at the nearer limit: spread and centring "
                    + "together. With one limit it is the index of that limit.";
            case PP -> "Pp = (USL − LSL) / (6 s)\nLike Cp, with the overall standard deviation s of all readings "
                    + "(includes the drift between subgroups).";
            case PPU -> "Ppu = (USL − μ) / (3 s)\nRoom to the upper limit in units of three overall sigmas.";
            case PPL -> "Ppl = (μ − LSL) / (3 s)\nRoom to the lower limit in units of three overall sigmas.";
            case PPK -> "Ppk = min(Ppu, Ppl)\nWhat the process delivered over the whole span: spread between and "
                    + "within subgroups, and centring.";
        };
    }

    /** The lower confidence bound of an index. */
    public static String lowerBound(IndexKind k, double confidence) {
        return String.format(java.util.Locale.ROOT,
                "Lower %.0f %% bound of %s\nThe value the true %s exceeds with %.0f %% confidence, given the readings; "
                        + "the requirement is shown when this bound reaches the required minimum.",
                100 * confidence, k.symbol(), k.symbol(), 100 * confidence);
    }
}

package dev.proofrun.app.shell;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.text.MessageKey;

/**
 * The one source of what the wizard says about each index it shows: the formula (ISO 22514-2 symbols)
 * and what it means, in our own words. σ_w is the within-subgroup sigma, s the overall sample standard
 * deviation of all readings, μ the mean, T the target. {@link IndexTooltips} puts them on screen.
 */
public enum IndexTip implements MessageKey {
    CP("Cp = (USL − LSL) / (6 σ_w)\nHow many times the short-term spread fits into the tolerance, "
            + "ignoring where the process is centred. Needs both limits."),
    CPU("Cpu = (USL − μ) / (3 σ_w)\nRoom between the mean and the upper limit, in units of three "
            + "short-term sigmas."),
    CPL("Cpl = (μ − LSL) / (3 σ_w)\nRoom between the lower limit and the mean, in units of three "
            + "short-term sigmas."),
    CPK("Cpk = min(Cpu, Cpl)\nThe short-term capability at the nearer limit: spread and centring "
            + "together. With one limit it is the index of that limit."),
    PP("Pp = (USL − LSL) / (6 s)\nLike Cp, with the overall standard deviation s of all readings "
            + "(includes the drift between subgroups)."),
    PPU("Ppu = (USL − μ) / (3 s)\nRoom to the upper limit in units of three overall sigmas."),
    PPL("Ppl = (μ − LSL) / (3 s)\nRoom to the lower limit in units of three overall sigmas."),
    PPK("Ppk = min(Ppu, Ppl)\nWhat the process delivered over the whole span: spread between and "
            + "within subgroups, and centring."),
    CPM("Cpm = (USL − LSL) / (6 √(s² + (μ − T)²))\nLike Pp, but every step the mean takes away from the "
            + "target T counts as spread; equals Pp when the process runs on target."),
    LOWER_BOUND("Lower confidence bound: the value the true index exceeds with the stated "
            + "confidence, given the readings. The requirement is shown when this bound reaches the required "
            + "minimum; with few readings it lies well below the estimate.");

    private final String english;

    IndexTip(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }

    /** The tip of a capability or performance index. */
    public static IndexTip of(IndexKind k) {
        return valueOf(k.name());
    }
}

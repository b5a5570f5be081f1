package dev.proofrun.grade;

/**
 * The distribution model under which the capability is computed.
 *
 * <ul>
 * <li>{@link #NORMAL}: the readings as they are.</li>
 * <li>{@link #BOX_COX}: y = (x^λ − 1)/λ (λ ≠ 0), λ by maximum likelihood (Box &amp; Cox 1964, JRSS B
 *     26:211–252); limits transformed the same way, indices and bounds computed on the normal scale.</li>
 * <li>{@link #LOGNORMAL}: log x normal, fitted by maximum likelihood; indices by the percentile method
 *     (ISO 22514-2; Clements 1989, Quality Progress 22(9):95–100), which for the lognormal equal the normal
 *     indices of log x with log-limits in the Pp family's sense.</li>
 * <li>{@link #WEIBULL}: two-parameter Weibull fitted by maximum likelihood; indices by the percentile method:
 *     Ppu = (USL − X₅₀)/(X₉₉.₈₆₅ − X₅₀), Ppl = (X₅₀ − LSL)/(X₅₀ − X₀.₁₃₅), Pp = (USL − LSL)/(X₉₉.₈₆₅ − X₀.₁₃₅).</li>
 * </ul>
 */
public enum ShapeModel {
    NORMAL("normal"),
    BOX_COX("box-cox"),
    LOGNORMAL("lognormal"),
    WEIBULL("weibull");

    private final String id;

    ShapeModel(String id) {
        this.id = id;
    }

    public String id() {
        return id;
    }
}

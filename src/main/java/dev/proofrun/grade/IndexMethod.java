package dev.proofrun.grade;

/**
 * How the required index and its bounds were computed — what a verdict rests on, named in every output (JSON
 * {@code method}, the text, the report and the screen).
 *
 * <ul>
 * <li>{@link #NORMAL_THEORY}: the usual index of the readings with the plan's sigma estimator, bounds from normal
 * theory (chi-square, noncentral t, the exact Cpk integral or Bissell).</li>
 * <li>{@link #TRANSFORMED}: the readings and the limits transformed (Box–Cox, logarithm), then normal theory on
 * the new scale.</li>
 * <li>{@link #PERCENTILE}: the percentile method of ISO 22514-2 with the fitted model's quantiles X₀.₁₃₅, X₅₀,
 * X₉₉.₈₆₅ (Clements 1989).</li>
 * </ul>
 * A method added for a new model (a bootstrap bound, say) is a new constant here and a case in {@link #forModel}.
 */
public enum IndexMethod {
    NORMAL_THEORY("normal-theory", "normal theory"),
    TRANSFORMED("transformed-normal", "normal theory on transformed readings"),
    PERCENTILE("percentile", "the percentile method");

    private final String id;
    private final String words;

    IndexMethod(String id, String words) {
        this.id = id;
        this.words = words;
    }

    /** The JSON value. */
    public String id() {
        return id;
    }

    /** As a sentence says it: "by normal theory". */
    public String words() {
        return words;
    }

    /** The method the capability step uses under each model. */
    public static IndexMethod forModel(ShapeModel model) {
        switch (model) {
            case BOX_COX:
            case LOGNORMAL:
                return TRANSFORMED;
            case WEIBULL:
                return PERCENTILE;
            default:
                return NORMAL_THEORY;
        }
    }
}

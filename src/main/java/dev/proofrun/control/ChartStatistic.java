package dev.proofrun.control;

/** The statistic a control chart plots, one point per subgroup (moving range: per pair of subgroups). */
public enum ChartStatistic {
    /** Subgroup mean x̄ᵢ. */
    MEAN("mean"),
    /** Subgroup range Rᵢ = max − min. */
    RANGE("range"),
    /** Subgroup standard deviation sᵢ (divisor nᵢ − 1). */
    STANDARD_DEVIATION("sd"),
    /** The single reading of an individuals chart. */
    INDIVIDUAL("individual"),
    /** |xᵢ − xᵢ₋₁|, the moving range of span 2. */
    MOVING_RANGE("moving-range");

    private final String id;

    ChartStatistic(String id) {
        this.id = id;
    }

    /** The word used in JSON, e.g. {@code mean}. */
    public String id() {
        return id;
    }
}

package dev.proofrun.app.session;

/**
 * The columns of one characteristic as the wizard edits it, in the order of the import list
 * {@code id,name,unit,nominal,lsl,usl,index,target,confidence,expected,expected_cp,shape,threshold,floor,gauge,resolution} (the header
 * names are the lower-case names, the same as the command line's characteristics CSV). {@link #INDEX}, {@link #TARGET}
 * (the required minimum c₀) and {@link #CONFIDENCE} are the row's own requirement, blank for the plan's (the Goal
 * step's); {@link #EXPECTED} is the expected index c₁ and {@link #EXPECTED_CP} the expected Cp (Pp) of an off-centre
 * process, blank for a centred one ({@link RowRequirement}).
 * {@link #SHAPE} is the planned shape ({@code normal}, {@code lognormal}, {@code weibull}, {@code folded-normal},
 * {@code lognormal3}, {@code weibull3}; blank is normal) and {@link #THRESHOLD} the declared threshold θ of the two
 * threshold shapes ({@code lognormal3}, {@code weibull3}), blank for every other shape (the rules are the plan model's,
 * {@code plan.Characteristic.requireThreshold}); {@link #FLOOR} is the other way to give it, a floor: the stop the
 * readings cannot go below when the real start above it is not known exactly (exactly one of the two for a threshold
 * shape);
 * {@link #GAUGE} and {@link #RESOLUTION} name the measuring instrument and the smallest step it reads (both
 * blank: no gauge in the plan).
 */
public enum CharacteristicField {
    ID, NAME, UNIT, NOMINAL, LSL, USL, INDEX, TARGET, CONFIDENCE, EXPECTED, EXPECTED_CP, SHAPE, THRESHOLD, FLOOR, GAUGE, RESOLUTION;

    /** All headers in column order, comma-separated, as the import list's header row has them. */
    public static String headers() {
        return java.util.Arrays.stream(values()).map(CharacteristicField::header)
                .collect(java.util.stream.Collectors.joining(","));
    }

    /** The column header of the import list. */
    public String header() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}

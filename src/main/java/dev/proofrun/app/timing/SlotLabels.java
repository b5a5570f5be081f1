package dev.proofrun.app.timing;

/**
 * Where the slot ids of one timeline row go: each label is centred over its mark (pushed inside the row's
 * ends) in the first of a few stacked lanes where it clears the label before it by a gap; a label that
 * fits in no lane is left out (its mark stays). So labels never overlap, whatever the width of the window
 * or the density of the slots; the count left out is what the width costs.
 */
final class SlotLabels {

    /** Lane of each label (0 = top), or {@link #LEFT_OUT}. */
    static final int LEFT_OUT = -1;

    private SlotLabels() {
    }

    /**
     * @param centres the marks' x, ascending
     * @param widths  each label's width
     * @param gap     the least space between two labels in one lane
     * @param min     the row's left end
     * @param max     the row's right end
     * @param lanes   how many lanes there are, 1 or more
     * @return for each label its lane or {@link #LEFT_OUT}; {@link #left(double, double, double, double)} gives its left edge
     */
    static int[] place(double[] centres, double[] widths, double gap, double min, double max, int lanes) {
        double[] laneEnd = new double[lanes];
        java.util.Arrays.fill(laneEnd, Double.NEGATIVE_INFINITY);
        int[] lane = new int[centres.length];
        for (int i = 0; i < centres.length; i++) {
            double from = left(centres[i], widths[i], min, max);
            lane[i] = LEFT_OUT;
            for (int l = 0; l < lanes; l++) {
                if (from >= laneEnd[l] + gap) {
                    lane[i] = l;
                    laneEnd[l] = from + widths[i];
                    break;
                }
            }
        }
        return lane;
    }

    /** The label's left edge: centred on the mark, moved inside {@code [min, max]}. */
    static double left(double centre, double width, double min, double max) {
        return Math.max(min, Math.min(centre - width / 2, max - width));
    }
}

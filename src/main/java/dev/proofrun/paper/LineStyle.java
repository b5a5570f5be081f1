package dev.proofrun.paper;

/**
 * How a line is stroked: width in points, grey level (0 black … 1 white) and an optional dash pattern
 * (on/off lengths in points). Black and white printing tells lines apart by width and dash, not colour.
 *
 * @param width line width in points, &gt; 0
 * @param gray  0 (black) to 1 (white)
 * @param dash  dash pattern, empty for a solid line
 */
public record LineStyle(float width, float gray, float[] dash) {

    /** A thin black hairline for cell borders. */
    public static final LineStyle HAIR = solid(0.4f);
    /** A firm black rule. */
    public static final LineStyle RULE = solid(0.9f);

    public LineStyle {
        if (!(width > 0) || !(gray >= 0 && gray <= 1)) {
            throw new IllegalArgumentException("pen width must be > 0 and gray in [0, 1]");
        }
        dash = dash.clone();
    }

    /** A solid black line. */
    public static LineStyle solid(float width) {
        return new LineStyle(width, 0, new float[0]);
    }

    /** A dashed black line. */
    public static LineStyle dashed(float width, float on, float off) {
        return new LineStyle(width, 0, new float[] {on, off});
    }

    /** The same pen in a grey level. */
    public LineStyle gray(float level) {
        return new LineStyle(width, level, dash);
    }

    @Override
    public float[] dash() {
        return dash.clone();
    }
}

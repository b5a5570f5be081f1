package dev.proofrun.report;

import dev.proofrun.paper.Block;
import dev.proofrun.paper.PageCanvas;
import dev.proofrun.paper.PlotArea;
import dev.proofrun.paper.Typeface;

/**
 * The frame the report's charts share: a block of fixed height with an optional bold title on its first
 * line, a plot area {@value #AXIS_LABELS} pt in from the left edge (room for the value axis's labels), and a
 * one-line caption on the block's last line, under the plot area. A chart draws only its own content into
 * it ({@link #drawPlot}).
 */
abstract class PlotBlock implements Block {

    /** Room left of the plot area for the value axis's labels, in points. */
    static final float AXIS_LABELS = 46f;
    /** Room right of the plot area when nothing is labelled there, in points. */
    static final float MARGIN = 20f;
    /** Room under the plot area for the tick labels and the caption, in points. */
    static final float FOOT = 24f;

    final Typeface regular;
    final Typeface bold;
    private final float height;
    private final String title;

    /**
     * @param height the frame's height in points
     * @param title  the chart's title, or {@code null} for none
     */
    PlotBlock(float height, String title, Typeface regular, Typeface bold) {
        this.height = height;
        this.title = title;
        this.regular = regular;
        this.bold = bold;
    }

    @Override
    public float height(float width) {
        return height;
    }

    @Override
    public final void draw(PageCanvas c, float left, float top, float width) {
        if (title != null) {
            c.text(bold, 8.5f, left, top - 9, title);
        }
        drawPlot(c, left, top, width);
    }

    /** Draws the chart's content below its title; same arguments as {@link #draw}. */
    abstract void drawPlot(PageCanvas c, float left, float top, float width);

    /**
     * The plot area of a frame whose top edge is {@code top}: {@value #AXIS_LABELS} pt in from the left,
     * {@code right} in from the right, its bottom {@code foot} above the frame's bottom edge, {@code plotHeight}
     * tall, mapping the given data ranges.
     */
    final PlotArea plotArea(float left, float top, float width, float right, float foot, float plotHeight,
            double xMin, double xMax, double yMin, double yMax) {
        return PlotArea.of(left + AXIS_LABELS, top - height + foot, width - AXIS_LABELS - right, plotHeight, xMin,
                xMax, yMin, yMax);
    }

    /** The caption, on the last line of the frame whose top edge is {@code top}, starting under the plot area. */
    final void caption(PageCanvas c, PlotArea area, float top, String text) {
        c.text(regular, 7.5f, area.left(), top - height + 1, text);
    }
}

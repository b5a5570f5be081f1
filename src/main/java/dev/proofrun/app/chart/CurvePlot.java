package dev.proofrun.app.chart;

import dev.proofrun.app.shell.FontScale;
import dev.proofrun.paper.PlotArea;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javafx.geometry.VPos;
import javafx.scene.AccessibleRole;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.Region;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;

/**
 * A probability curve with its reference lines drawn on one {@link Canvas}: title, x and y axes with ticks
 * and numbers, axis names, the lines, and a legend naming every line with its value. It replaces a JavaFX
 * {@code LineChart} where the picture is redrawn after each recomputation: a line chart is a tree of axis
 * labels, paths and legend items that is styled and laid out again on every change, while this is one node
 * whose drawing costs a few hundred line segments. The y axis is fixed to [0, 1]. Sizes are in em. The
 * tooltip gives the curve's value under the pointer; the accessible text names the lines.
 */
public final class CurvePlot extends Region {

    /** How a line is drawn. Colours are the theme's (proofrun.css): copper, amber, moss, slate, brick. */
    public enum Pen {
        /** The curve itself (or the readings): copper, solid. */
        CURVE(Color.web("#a8552b"), false, 0.14, false),
        /** A wanted or required value: amber, dashed. */
        WANTED(Color.web("#946300"), true, 0.12, false),
        /** A chosen or expected value: moss, solid. */
        CHOSEN(Color.web("#3f7a52"), false, 0.12, false),
        /** A control chart's centre line: slate, solid. */
        CENTRE(Color.web("#3b4a5a"), false, 0.1, false),
        /** A control limit or a specification limit: brick, dashed. */
        LIMIT(Color.web("#a23b36"), true, 0.12, false),
        /** Flagged points (signals): brick rings at the points, no line between them. */
        FLAGGED(Color.web("#a23b36"), false, 0.14, true);

        final Color colour;
        final boolean dashed;
        final double widthEm;
        final boolean marks;

        Pen(Color colour, boolean dashed, double widthEm, boolean marks) {
            this.colour = colour;
            this.dashed = dashed;
            this.widthEm = widthEm;
            this.marks = marks;
        }
    }

    /** One named line: points in data coordinates (x ascending for the curve). */
    public record Line(String name, Pen pen, double[] xs, double[] ys) {
        public static Line vertical(String name, Pen pen, double x) {
            return new Line(name, pen, new double[] {x, x}, new double[] {0, 1});
        }

        public static Line horizontal(String name, Pen pen, double y, double x0, double x1) {
            return new Line(name, pen, new double[] {x0, x1}, new double[] {y, y});
        }
    }

    private static final Color INK = Color.web("#1d2733");
    private static final Color GRID = Color.web("#dfe3e6");
    private static final Color CARD = Color.web("#fffdf9");

    private final Canvas canvas = new Canvas();
    private String title;
    private final boolean unitY;
    private final String xLabel;
    private final String yLabel;
    private final Tooltip tip = new Tooltip();
    private List<Line> lines = List.of();
    private double x0 = 0;
    private double x1 = 1;
    private double y0 = 0;
    private double y1 = 1;
    // plot area in pixels, set by draw()
    private double left;
    private double right;
    private double top;
    private double bottom;

    /** A probability curve: the y axis is fixed to [0, 1]. */
    public CurvePlot(String id, String title, String xLabel, String yLabel) {
        this(id, title, xLabel, yLabel, true);
    }

    /** A plot whose y axis spans the lines shown (a control chart, readings against their limits). */
    public static CurvePlot spanning(String id, String title, String xLabel, String yLabel) {
        return new CurvePlot(id, title, xLabel, yLabel, false);
    }

    private CurvePlot(String id, String title, String xLabel, String yLabel, boolean unitY) {
        this.title = title;
        this.unitY = unitY;
        this.xLabel = xLabel;
        this.yLabel = yLabel;
        setId(id);
        getStyleClass().add("pr-curve-plot");
        getChildren().add(canvas);
        setPrefHeight(FontScale.of(19.5));
        setMinHeight(FontScale.of(15));
        setPrefWidth(FontScale.of(24));
        setMinWidth(FontScale.of(14));
        setAccessibleRole(AccessibleRole.IMAGE_VIEW);
        setAccessibleText(title);
        Tooltip.install(this, tip);
        tip.setText(title);
        setOnMouseMoved(e -> tip.setText(valueAt(e.getX())));
    }

    /** Shows these lines; the x range spans all of them. */
    public void show(List<Line> shown) {
        lines = List.copyOf(shown);
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Line l : lines) {
            for (double x : l.xs()) {
                lo = Math.min(lo, x);
                hi = Math.max(hi, x);
            }
        }
        if (!(lo < hi)) {
            lo = Double.isFinite(lo) ? lo - 0.5 : 0;
            hi = Double.isFinite(hi) ? hi + 0.5 : 1;
        }
        x0 = lo;
        x1 = hi;
        if (!unitY) {
            double ylo = Double.POSITIVE_INFINITY;
            double yhi = Double.NEGATIVE_INFINITY;
            for (Line l : lines) {
                for (double y : l.ys()) {
                    if (Double.isFinite(y)) {
                        ylo = Math.min(ylo, y);
                        yhi = Math.max(yhi, y);
                    }
                }
            }
            if (!(ylo < yhi)) {
                ylo = Double.isFinite(ylo) ? ylo - 0.5 : 0;
                yhi = Double.isFinite(yhi) ? yhi + 0.5 : 1;
            }
            double pad = (yhi - ylo) * 0.05;
            y0 = ylo - pad;
            y1 = yhi + pad;
        }
        List<String> names = new ArrayList<>();
        for (Line l : lines) {
            names.add(l.name());
        }
        setAccessibleText(title + (names.isEmpty() ? "" : ": " + String.join("; ", names)));
        tip.setText(title);
        draw();
    }

    /** The title (with the unit, if any); {@link #show} draws it. */
    public void setTitle(String t) {
        title = t;
    }

    public String title() {
        return title;
    }

    /** The names in the legend, in order (for tests and the accessible text). */
    public List<String> legend() {
        return lines.stream().map(Line::name).toList();
    }

    @Override
    protected void layoutChildren() {
        double w = snapSizeX(getWidth());
        double h = snapSizeY(getHeight());
        if (canvas.getWidth() != w || canvas.getHeight() != h) {
            canvas.setWidth(w);
            canvas.setHeight(h);
            draw();
        }
    }

    private double px(double x) {
        return left + (x - x0) / (x1 - x0) * (right - left);
    }

    private double py(double y) {
        return bottom - (y - y0) / (y1 - y0) * (bottom - top);
    }

    private void draw() {
        double w = canvas.getWidth();
        double h = canvas.getHeight();
        GraphicsContext g = canvas.getGraphicsContext2D();
        g.clearRect(0, 0, w, h);
        if (w < 10 || h < 10) {
            return;
        }
        double em = FontScale.of(1);
        Font normal = Font.font(Font.getDefault().getFamily(), em * 0.85);
        Font heading = Font.font(Font.getDefault().getFamily(), FontWeight.BOLD, em);
        g.setFill(CARD);
        g.fillRect(0, 0, w, h);

        // title
        g.setFill(INK);
        g.setFont(heading);
        g.setTextAlign(TextAlignment.CENTER);
        g.setTextBaseline(VPos.TOP);
        g.fillText(title, w / 2, 0.3 * em, w);

        // legend: one entry per line, wrapped onto as many rows as needed, at the bottom
        g.setFont(normal);
        double sample = 1.6 * em;
        List<double[]> at = new ArrayList<>();
        double lx = 0.5 * em;
        double rows = 1;
        for (Line l : lines) {
            double tw = textWidth(l.name(), normal);
            double width = sample + 0.4 * em + tw + 1.2 * em;
            if (lx + width > w - 0.5 * em && lx > 0.5 * em) {
                lx = 0.5 * em;
                rows++;
            }
            at.add(new double[] {lx, rows});
            lx += width;
        }
        double legendTop = h - rows * 1.3 * em - 0.3 * em;

        left = (unitY ? 3.6 : 5.0) * em;
        right = w - 1.0 * em;
        top = 2.0 * em;
        bottom = legendTop - 2.6 * em;
        if (right - left < 2 * em || bottom - top < 2 * em) {
            return;
        }

        // y grid, ticks and numbers (probabilities: 0 to 1 by 0.1, numbers every 0.2; otherwise a 1-2-5
        // step giving about one number per 2.5 em)
        g.setLineDashes();
        g.setTextAlign(TextAlignment.RIGHT);
        g.setTextBaseline(VPos.CENTER);
        g.setFill(INK);
        if (unitY) {
            for (int i = 0; i <= 10; i++) {
                double y = py(i / 10.0);
                g.setStroke(GRID);
                g.setLineWidth(1);
                g.strokeLine(left, y, right, y);
                g.setStroke(INK);
                g.strokeLine(left - 0.3 * em, y, left, y);
                if (i % 2 == 0) {
                    g.fillText(String.format(Locale.ROOT, "%.1f", i / 10.0), left - 0.4 * em, y);
                }
            }
        } else {
            // the one tick rule (PlotArea.step), as many steps as 3.75 em each: labels at least 2.5 em apart
            double ystep = PlotArea.step(y1 - y0, Math.max(2, (int) Math.floor((bottom - top) / (3.75 * em))));
            int yd = Math.max(0, (int) Math.ceil(-Math.log10(ystep) - 1e-9));
            for (double t = Math.ceil(y0 / ystep - 1e-9) * ystep; t <= y1 + ystep * 1e-9; t += ystep) {
                double y = py(t);
                g.setStroke(GRID);
                g.setLineWidth(1);
                g.strokeLine(left, y, right, y);
                g.setStroke(INK);
                g.strokeLine(left - 0.3 * em, y, left, y);
                double shown = Math.abs(t) < ystep * 1e-6 ? 0 : t; // no "-0.000"
                g.fillText(String.format(Locale.ROOT, "%." + yd + "f", shown), left - 0.4 * em, y);
            }
        }
        // x ticks on the same rule, as many steps as 7.5 em each: numbers at least 5 em apart (the nearest
        // 1-2-5 step is at least two thirds of the raw one)
        double step = PlotArea.step(x1 - x0, Math.max(2, (int) Math.floor((right - left) / (7.5 * em))));
        g.setTextAlign(TextAlignment.CENTER);
        g.setTextBaseline(VPos.TOP);
        int decimals = Math.max(0, (int) Math.ceil(-Math.log10(step) - 1e-9));
        for (double t = Math.ceil(x0 / step - 1e-9) * step; t <= x1 + step * 1e-9; t += step) {
            double x = px(t);
            g.setStroke(GRID);
            g.strokeLine(x, top, x, bottom);
            g.setStroke(INK);
            g.strokeLine(x, bottom, x, bottom + 0.3 * em);
            g.fillText(String.format(Locale.ROOT, "%." + decimals + "f", t), x, bottom + 0.35 * em);
        }
        // axes and their names
        g.setStroke(INK);
        g.setLineWidth(1);
        g.strokeLine(left, top, left, bottom);
        g.strokeLine(left, bottom, right, bottom);
        g.fillText(xLabel, (left + right) / 2, bottom + 1.35 * em);
        g.save();
        g.translate(0.3 * em, (top + bottom) / 2);
        g.rotate(-90);
        g.fillText(yLabel, 0, 0);
        g.restore();

        // the lines, clipped to the plot area
        g.save();
        g.beginPath();
        g.rect(left, top - 1, right - left, bottom - top + 2);
        g.clip();
        for (Line l : lines) {
            pen(g, l.pen(), em);
            double[] xs = l.xs();
            double[] ys = l.ys();
            if (l.pen().marks) {
                double r = 0.35 * em;
                for (int i = 0; i < xs.length; i++) {
                    g.strokeOval(px(xs[i]) - r, py(ys[i]) - r, 2 * r, 2 * r);
                }
                continue;
            }
            g.beginPath();
            for (int i = 0; i < xs.length; i++) {
                if (i == 0) {
                    g.moveTo(px(xs[i]), py(ys[i]));
                } else {
                    g.lineTo(px(xs[i]), py(ys[i]));
                }
            }
            g.stroke();
        }
        g.restore();

        // legend
        g.setFont(normal);
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.CENTER);
        for (int i = 0; i < lines.size(); i++) {
            Line l = lines.get(i);
            double x = at.get(i)[0];
            double y = legendTop + (at.get(i)[1] - 0.5) * 1.3 * em;
            pen(g, l.pen(), em);
            if (l.pen().marks) {
                g.strokeOval(x + sample / 2 - 0.35 * em, y - 0.35 * em, 0.7 * em, 0.7 * em);
            } else {
                g.strokeLine(x, y, x + sample, y);
            }
            g.setLineDashes();
            g.setFill(INK);
            g.fillText(l.name(), x + sample + 0.4 * em, y);
        }
    }

    private static void pen(GraphicsContext g, Pen p, double em) {
        g.setStroke(p.colour);
        g.setLineWidth(Math.max(1, p.widthEm * em));
        if (p.dashed) {
            g.setLineDashes(0.5 * em, 0.3 * em);
        } else {
            g.setLineDashes();
        }
    }

    private static double textWidth(String s, Font f) {
        javafx.scene.text.Text t = new javafx.scene.text.Text(s);
        t.setFont(f);
        return t.getLayoutBounds().getWidth();
    }

    /** The text under the pointer: the x there and each curve's value (reference lines by their names). */
    private String valueAt(double mouseX) {
        if (lines.isEmpty() || mouseX < left || mouseX > right) {
            return title;
        }
        return PointerText.at(title, lines, xLabel, yLabel, x0 + (mouseX - left) / (right - left) * (x1 - x0));
    }
}

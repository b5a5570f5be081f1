package dev.proofrun.app.chart;

import java.util.List;
import javafx.scene.chart.LineChart;
import javafx.scene.chart.NumberAxis;
import javafx.scene.chart.XYChart;

/** Small helpers for the wizard's line charts: series from points, and labelled reference lines. */
public final class Charts {

    private Charts() {
    }

    /** A line chart without symbols and animation (redrawn often). */
    public static LineChart<Number, Number> lines(String id, String title, String xLabel, String yLabel) {
        NumberAxis x = new NumberAxis();
        x.setLabel(xLabel);
        x.setForceZeroInRange(false);
        NumberAxis y = new NumberAxis();
        y.setLabel(yLabel);
        y.setForceZeroInRange(false);
        LineChart<Number, Number> c = new LineChart<>(x, y);
        c.setId(id);
        c.setTitle(title);
        c.setAnimated(false);
        c.setCreateSymbols(false);
        c.setPrefHeight(dev.proofrun.app.shell.Em.of(19.5));
        c.setMinHeight(dev.proofrun.app.shell.Em.of(15));
        c.getStyleClass().add("pr-chart");
        return c;
    }

    /**
     * Shows the given series, reusing the series already in the chart (their paths and legend items) and
     * only replacing names and points: redrawing after each recomputation then costs the FX thread far
     * less than clearing and adding.
     */
    public static void show(LineChart<Number, Number> chart, List<XYChart.Series<Number, Number>> wanted) {
        var data = chart.getData();
        while (data.size() > wanted.size()) {
            data.remove(data.size() - 1);
        }
        for (int i = 0; i < wanted.size(); i++) {
            XYChart.Series<Number, Number> w = wanted.get(i);
            if (i < data.size()) {
                data.get(i).setName(w.getName());
                data.get(i).getData().setAll(w.getData());
            } else {
                data.add(w);
            }
        }
    }

    public static XYChart.Series<Number, Number> series(String name, List<double[]> points) {
        XYChart.Series<Number, Number> s = new XYChart.Series<>();
        s.setName(name);
        for (double[] p : points) {
            s.getData().add(new XYChart.Data<>(p[0], p[1]));
        }
        return s;
    }

    /** A vertical line at x from y0 to y1, named for the legend ("required 1.33"). */
    public static XYChart.Series<Number, Number> vertical(String name, double x, double y0, double y1) {
        return series(name, List.of(new double[] {x, y0}, new double[] {x, y1}));
    }

    /** A horizontal line at y from x0 to x1. */
    public static XYChart.Series<Number, Number> horizontal(String name, double y, double x0, double x1) {
        return series(name, List.of(new double[] {x0, y}, new double[] {x1, y}));
    }
}

package dev.proofrun.app.chart;

import dev.proofrun.app.chart.CurvePlot.Line;
import dev.proofrun.app.chart.CurvePlot.Pen;
import java.util.List;
import java.util.Locale;

/** The tooltip text of a {@link CurvePlot} at an x under the pointer: each curve's nearest point, each reference line's name. */
final class PointerText {

    private PointerText() {
    }

    static String at(String title, List<Line> lines, String xLabel, String yLabel, double x) {
        StringBuilder s = new StringBuilder(title);
        for (Line l : lines) {
            if (l.pen() == Pen.CURVE) {
                double[] xs = l.xs();
                int i = nearest(xs, x);
                s.append(String.format(Locale.ROOT, "%n%s: at %s = %s, %s %.3f", l.name(), xLabel,
                        number(xs[i]), yLabel, l.ys()[i]));
            } else {
                s.append(System.lineSeparator()).append(l.name());
            }
        }
        return s.toString();
    }

    private static int nearest(double[] xs, double x) {
        int best = 0;
        for (int i = 1; i < xs.length; i++) {
            if (Math.abs(xs[i] - x) < Math.abs(xs[best] - x)) {
                best = i;
            }
        }
        return best;
    }

    private static String number(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e9 ? Long.toString((long) v) : String.format(Locale.ROOT, "%.3f", v);
    }
}

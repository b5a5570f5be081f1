package dev.proofrun.report;

import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.ModelFit;
import dev.proofrun.grade.Shape;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.stats.Subgroups;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A histogram of the readings with the specification limits, the nominal and the planned shape's fitted
 * density, as numbers: the report's {@link HistogramBlock} draws it on paper and the wizard on screen, so both
 * show the same bins and the same curve. Bins as {@link #bins} says (they follow the gauge's step
 * when it is known). The curve is the fitted density scaled to counts, N × bin width × f(x), at 201 points
 * across the horizontal range; the horizontal range spans the readings and the limits with 6 % to spare.
 *
 * @param bins    the bins
 * @param counts  readings per bin (a reading on an edge goes to the bin on its right; the last bin is closed)
 * @param lo      left end of the horizontal range
 * @param hi      right end of the horizontal range
 * @param curveX  the curve's horizontal values, ascending
 * @param curveY  the curve's heights in counts (NaN where the density is not finite)
 * @param yMax    the top of the vertical range: the tallest bar, or the curve's peak up to three times it, plus 12 %
 * @param limits  the specification limits
 * @param nominal the nominal, or NaN
 * @param model   the fitted model's name ("normal", "lognormal", "weibull")
 */
public record Histogram(Bins bins, long[] counts, double lo, double hi, double[] curveX, double[] curveY,
        double yMax, SpecLimits limits, double nominal, String model) {

    private static final int CURVE_STEPS = 200;

    /**
     * The histogram of a graded characteristic under its planned shape's fit, or empty when the grade has no
     * shape evidence or no readings (fewer than 8 usable readings, say).
     *
     * @param nominal the plan's nominal, or NaN
     * @param step    the gauge's step (resolution), or NaN when the plan names no gauge
     */
    public static Optional<Histogram> of(CharacteristicGrade g, double nominal, double step) {
        Shape sh = g.shape();
        double[] x = Subgroups.flatten(g.subgroups());
        if (sh == null || x.length == 0) {
            return Optional.empty();
        }
        return Optional.of(of(x, g.limits(), nominal, step, curve(sh, x)));
    }

    /** The planned shape's fitted curve; the normal with the readings' mean and sd if its fit is missing. */
    static ModelCurve curve(Shape sh, double[] x) {
        for (ModelFit f : sh.fits()) {
            if (f.model() == sh.model()) {
                return ModelCurve.of(f);
            }
        }
        return ModelCurve.normal(dev.proofrun.stats.SampleMoments.meanOf(x),
                dev.proofrun.stats.SampleMoments.standardDeviationOf(x));
    }

    static Histogram of(double[] readings, SpecLimits limits, double nominal, double step, ModelCurve curve) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double x : readings) {
            min = Math.min(min, x);
            max = Math.max(max, x);
        }
        Bins b = bins(min, max, readings.length, step);
        long[] counts = new long[b.count()];
        for (double x : readings) {
            counts[Math.max(0, Math.min(b.count() - 1, (int) Math.floor((x - b.start()) / b.width())))]++;
        }
        double lo = min;
        double hi = max;
        for (OptionalDouble limit : new OptionalDouble[] {limits.lower(), limits.upper()}) {
            if (limit.isPresent()) {
                lo = Math.min(lo, limit.getAsDouble());
                hi = Math.max(hi, limit.getAsDouble());
            }
        }
        double pad = (hi - lo) * 0.06;
        lo -= pad;
        hi += pad;
        long most = 1;
        for (long k : counts) {
            most = Math.max(most, k);
        }
        double[] xs = new double[CURVE_STEPS + 1];
        double[] ys = new double[CURVE_STEPS + 1];
        double peak = 0;
        for (int i = 0; i <= CURVE_STEPS; i++) {
            xs[i] = lo + (hi - lo) * i / CURVE_STEPS;
            double y = readings.length * b.width() * curve.density(xs[i]);
            ys[i] = Double.isFinite(y) ? y : Double.NaN;
            if (Double.isFinite(y)) {
                peak = Math.max(peak, y);
            }
        }
        double yMax = Math.max(most, Math.min(peak, most * 3.0)) * 1.12;
        return new Histogram(b, counts, lo, hi, xs, ys, yMax, limits, nominal, curve.model().token());
    }

    /** Left edge of bin i. */
    public double edge(int i) {
        return bins.start() + i * bins.width();
    }

    /** The caption both pictures carry: "reading; bars: counts in 12 bins of 2 gauge steps; curve: fitted normal model". */
    public String caption() {
        return "reading; bars: counts in " + bins.count() + " bins" + bins.words() + "; curve: fitted " + model + " model"
                + (Double.isFinite(nominal) ? "; dotted: nominal" : "");
    }

    /**
     * The bins of a histogram.
     *
     * @param start left edge of the first bin
     * @param width width of every bin
     * @param count number of bins
     * @param steps gauge steps per bin, or 0 when the step is unknown
     */
    public record Bins(double start, double width, int count, int steps) {

        /** What the caption says about the bins: "of 2 gauge steps", or nothing without a step. */
        public String words() {
            return steps == 0 ? "" : steps == 1 ? " of one gauge step" : " of " + steps + " gauge steps";
        }
    }

    /**
     * Bins for readings from min to max: about ⌈√N⌉ (8 to 40); with a gauge step h, m·h wide with m the smallest
     * whole number that keeps the count at most that many, edges at min − h/2 + j·m·h.
     */
    public static Bins bins(double min, double max, int n, double step) {
        int wanted = (int) Math.max(8, Math.min(40, Math.ceil(Math.sqrt(n))));
        if (step > 0 && Double.isFinite(step)) {
            long grid = Math.round((max - min) / step) + 1; // possible readings from min to max
            int m = (int) Math.max(1, (grid + wanted - 1) / wanted);
            double width = m * step;
            double start = min - step / 2;
            int count = (int) Math.max(1, (grid + m - 1) / m);
            return new Bins(start, width, count, m);
        }
        double width = max > min ? (max - min) / wanted : 1;
        return new Bins(min, width, wanted, 0);
    }
}

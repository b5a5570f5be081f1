package dev.proofrun.design;

import dev.proofrun.stats.RecentResults;
import java.util.ArrayList;
import java.util.List;

/**
 * The expected readings of a staged study against the true index, beside the single stage's (which collects all
 * its readings whatever the process): the staged designer's simulated studies ({@value StagedDesigner#PATHS},
 * fixed seed) read at the planned looks, at a few true indices at the expected centring. Each curve takes about
 * as long as one evaluation of the designer, so the last few are kept ({@value #KEPT}); the same inputs give the
 * same curve. The same studies give the staged study's operating characteristic.
 */
public final class StagedReadingsCurve {

    /**
     * One true index: the staged study's mean readings, the single stage's, and the staged study's chance of
     * demonstrated at some look (gates counted; NaN for a single stage, whose OC the designer's table gives).
     */
    public record Point(double trueIndex, double staged, double singleStage, double demonstrated) {
    }

    /** Curves kept. */
    static final int KEPT = 8;

    private record Key(DesignRequest request, int subgroupSize, Stages stages, List<Double> trueIndices) {
    }

    private static final RecentResults<Key, List<Point>> CURVES = new RecentResults<>(KEPT);

    private StagedReadingsCurve() {
    }

    /**
     * @param request     the characteristic's request (its expectation gives the centring)
     * @param design      the characteristic's staged design ({@link StagedDesigner#design} or
     *                    {@link StagedDesigner#at}); its single stage is the flat line
     * @param looks       the looks the plan carries (the design's own, or the strictest of several
     *                    characteristics' at the same subgroups)
     * @param trueIndices where to evaluate, each positive
     */
    public static List<Point> of(DesignRequest request, StagedDesign design, Stages looks, double[] trueIndices) {
        List<Double> at = new ArrayList<>();
        for (double t : trueIndices) {
            if (!(t > 0)) {
                throw new IllegalArgumentException("a true index must be positive: " + t);
            }
            at.add(t);
        }
        int n = design.subgroupSize();
        DesignRequest sized = request.withSubgroupSizes(List.of(n));
        return CURVES.get(new Key(sized, n, looks, List.copyOf(at)), key -> curve(sized, design, looks, trueIndices));
    }

    private static List<Point> curve(DesignRequest sized, StagedDesign design, Stages looks, double[] trueIndices) {
        int n = design.subgroupSize();
        int single = design.singleStage().readings();
        List<Point> points = new ArrayList<>();
        if (!looks.staged()) {
            for (double t : trueIndices) {
                points.add(new Point(t, single, single, Double.NaN));
            }
        } else {
            SizeSearch search = new SizeSearch(sized, n);
            StagedEvaluation eval = new StagedEvaluation(sized, search, design.singleStage(),
                    looks.count(), looks.spending());
            double[][] figures = eval.expectedReadings(looks, trueIndices);
            for (int i = 0; i < trueIndices.length; i++) {
                points.add(new Point(trueIndices[i], figures[0][i], single, figures[1][i]));
            }
        }
        return List.copyOf(points);
    }

    /**
     * {@code points} true indices evenly from 0.75·c₀ to 1.25·c₁ (c₀ the required, c₁ the expected index): the span
     * where the staged study's readings change.
     */
    public static double[] span(DesignRequest request, int points) {
        double lo = 0.75 * request.requirement().minimum();
        double hi = 1.25 * request.expectation().index();
        double[] t = new double[points];
        for (int i = 0; i < points; i++) {
            t[i] = lo + (hi - lo) * i / (points - 1);
        }
        return t;
    }
}

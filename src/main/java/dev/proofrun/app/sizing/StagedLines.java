package dev.proofrun.app.sizing;

import dev.proofrun.app.chart.CurvePlot.Line;
import dev.proofrun.app.chart.CurvePlot.Pen;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.Look;
import dev.proofrun.design.StagedDesign;
import dev.proofrun.design.StagedLook;
import dev.proofrun.design.StagedMessage;
import dev.proofrun.design.StagedReadingsCurve;
import java.util.ArrayList;
import java.util.List;

/**
 * What the Sample-size step shows of planned looks, in words and lines: each look (subgroups, readings, the
 * boundaries on the index scale), the power, the readings expected at the requirement and as expected against the
 * single stage, the designer's recommendation; the expected readings and the chance to demonstrate against the true
 * index. The sentences are the staged designer's own ({@link StagedMessage}).
 */
final class StagedLines {

    private StagedLines() {
    }

    /** The looks and figures of the characteristic in focus, one a line. */
    static String text(SizingStages.Answer a) {
        StagedDesign d = a.focusDesign();
        DesignRequest r = a.request().each().get(a.request().focus());
        String index = r.requirement().index().symbol();
        List<String> lines = new ArrayList<>();
        List<StagedLook> looks = d.looks();
        boolean several = a.request().each().size() > 1;
        for (int j = 0; j < looks.size(); j++) {
            StagedLook l = looks.get(j);
            double percent = 100 * l.confidence();
            if (several) {
                // the plan's looks: the strictest confidence of all, no futility stop; the focus's own boundary
                // on the index scale belongs to its own confidence, so none is shown
                Look planned = a.planned().stages().looks().get(j);
                lines.add(SizingMessage.LOOK_SHARED.format(j + 1, planned.subgroups(), planned.subgroups() * d.subgroupSize(),
                        100 * planned.confidence()));
            } else if (j == looks.size() - 1) {
                lines.add(StagedMessage.STAGED_LAST_LOOK.format(j + 1, l.subgroups(), l.readings(), index, l.efficacy(),
                        percent));
            } else if (Double.isNaN(l.futility())) {
                lines.add(SizingMessage.LOOK_GOES_ON.format(j + 1, l.subgroups(), l.readings(), index, l.efficacy(),
                        percent));
            } else {
                lines.add(StagedMessage.STAGED_LOOK.format(j + 1, l.subgroups(), l.readings(), index, l.efficacy(),
                        percent, index, SizingViewModel.fmt(l.futility())));
            }
        }
        lines.add(StagedMessage.STAGED_FIGURES.format(d.power(), d.expectedReadingsAtTarget(),
                d.expectedReadingsAtExpected(), d.maxReadings(), d.singleStage().readings()));
        lines.add(d.reason());
        if (several) {
            lines.add(StagedMessage.STAGED_SHARED_LOOKS.format(a.request().each().size(),
                    a.planned().design().subgroups(), a.request().focusId()));
        }
        return String.join("\n", lines);
    }

    /** The expected readings of the staged study and of the single stage against the true index. */
    static List<Line> readings(SizingStages.Answer a) {
        List<StagedReadingsCurve.Point> points = a.curve();
        DesignRequest r = a.request().each().get(a.request().focus());
        double[] x = points.stream().mapToDouble(StagedReadingsCurve.Point::trueIndex).toArray();
        double most = a.focusDesign().maxReadings();
        List<Line> lines = new ArrayList<>();
        lines.add(new Line(SizingMessage.STAGED_CURVE.format(a.request().stages()), Pen.CURVE, x,
                points.stream().mapToDouble(StagedReadingsCurve.Point::staged).toArray()));
        lines.add(new Line(SizingMessage.SINGLE_CURVE.format(a.focusDesign().singleStage().readings()), Pen.CENTRE, x,
                points.stream().mapToDouble(StagedReadingsCurve.Point::singleStage).toArray()));
        lines.add(new Line("required c₀ = " + r.requirement().minimum(), Pen.WANTED,
                new double[] {r.requirement().minimum(), r.requirement().minimum()}, new double[] {0, most}));
        lines.add(new Line("expected " + SizingViewModel.fmt(r.expectation().index()), Pen.CHOSEN,
                new double[] {r.expectation().index(), r.expectation().index()}, new double[] {0, most}));
        return lines;
    }

    /** The staged study's chance to demonstrate against the true index (gates counted), for the OC chart. */
    static Line oc(SizingStages.Answer a) {
        List<StagedReadingsCurve.Point> points = a.curve();
        return new Line(SizingMessage.STAGED_OC.format(a.request().stages(), a.planned().design().subgroups(),
                a.planned().design().subgroupSize()), Pen.LIMIT,
                points.stream().mapToDouble(StagedReadingsCurve.Point::trueIndex).toArray(),
                points.stream().mapToDouble(StagedReadingsCurve.Point::demonstrated).toArray());
    }
}

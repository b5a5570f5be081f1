package dev.proofrun.app.sizing;

import dev.proofrun.app.chart.CurvePlot.Line;
import dev.proofrun.app.chart.CurvePlot.Pen;
import dev.proofrun.design.Design;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.DesignTable;
import dev.proofrun.design.OcPoint;
import dev.proofrun.design.PowerPoint;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The lines of the two charts for the design the plan will use: the power curve of its subgroup size with the
 * wanted power and a mark at the plan's k, and the operating characteristic of exactly that k × n (computed for
 * that k when the plan keeps another k than the row's, so that both charts and the table name one design).
 */
final class SizingCurves {

    private SizingCurves() {
    }

    /** The OC curve of the plan's own k at subgroup size n, computed when the plan keeps another k than the row's. */
    record PlanCurve(int n, int k, List<OcPoint> points) {
    }

    /**
     * The OC curve of exactly the plan's design: the chosen row's when the plan uses the row's k, the one computed
     * for the kept k otherwise, none when neither is for this design.
     */
    static List<OcPoint> ocOf(Optional<Design> design, DesignTable own, PlanCurve kept) {
        if (design.isEmpty() || own == null) {
            return List.of();
        }
        int n = design.get().subgroupSize();
        int k = design.get().subgroups();
        if (own.recommended().subgroupSize() == n && own.recommended().subgroups() == k) {
            return own.operatingCharacteristic();
        }
        return kept != null && kept.n() == n && kept.k() == k ? kept.points() : List.of();
    }

    /**
     * @param own    the table computed for the chosen subgroup size (its power curve)
     * @param design the design the plan will use
     */
    static List<Line> power(DesignTable own, Optional<Design> design, Optional<DesignRequest> request) {
        List<Line> lines = new ArrayList<>();
        if (own == null || own.powerCurve().isEmpty() || design.isEmpty()) {
            return lines;
        }
        List<PowerPoint> pc = own.powerCurve();
        int n = design.get().subgroupSize();
        int k = design.get().subgroups();
        lines.add(new Line("power, n = " + n, Pen.CURVE, pc.stream().mapToDouble(PowerPoint::subgroups).toArray(),
                pc.stream().mapToDouble(PowerPoint::power).toArray()));
        double wanted = request.map(DesignRequest::power).orElse(DesignRequest.DEFAULT_POWER);
        lines.add(Line.horizontal("wanted " + SizingViewModel.fmt(wanted), Pen.WANTED, wanted,
                Math.min(pc.get(0).subgroups(), k), Math.max(pc.get(pc.size() - 1).subgroups(), k)));
        lines.add(Line.vertical(SizingMessage.PLAN_DESIGN.format(k, n), Pen.CHOSEN, k));
        return lines;
    }

    /**
     * The lines as named for a plan with looks: the single-stage design is then not the plan's design but the one
     * the looks are compared with ("single stage: k × n" for "plan: k × n").
     */
    static List<Line> named(List<Line> lines, Optional<Design> single, boolean staged) {
        if (!staged || single.isEmpty()) {
            return lines;
        }
        String plan = SizingMessage.PLAN_DESIGN.format(single.get().subgroups(), single.get().subgroupSize());
        String instead = SizingMessage.SINGLE_DESIGN.format(single.get().subgroups(), single.get().subgroupSize());
        return lines.stream().map(l -> l.name().equals(plan) ? new Line(instead, l.pen(), l.xs(), l.ys()) : l).toList();
    }

    /** The operating characteristic of the plan's design with the required and expected index marked. */
    static List<Line> oc(List<OcPoint> oc, Optional<Design> design, Optional<DesignRequest> request) {
        List<Line> lines = new ArrayList<>();
        if (oc.isEmpty() || design.isEmpty()) {
            return lines;
        }
        lines.add(new Line(SizingMessage.PLAN_DESIGN.format(design.get().subgroups(), design.get().subgroupSize()),
                Pen.CURVE, oc.stream().mapToDouble(OcPoint::trueIndex).toArray(),
                oc.stream().mapToDouble(OcPoint::probability).toArray()));
        request.ifPresent(r -> {
            lines.add(Line.vertical("required c₀ = " + r.requirement().minimum(), Pen.WANTED, r.requirement().minimum()));
            lines.add(Line.vertical("expected " + SizingViewModel.fmt(r.expectation().index()), Pen.CHOSEN,
                    r.expectation().index()));
        });
        return lines;
    }
}

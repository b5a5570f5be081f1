package dev.proofrun.cli;

import dev.proofrun.control.ChartPair;
import dev.proofrun.control.ControlChart;
import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.SlotSignal;
import dev.proofrun.grade.GradeResult;
import dev.proofrun.grade.IndexEvidence;
import dev.proofrun.grade.Problem;
import dev.proofrun.grade.Reason;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The {@code proofrun grade --json} object: plan {id, revision}, problems, characteristics, verdict.
 * Undefined values are {@code null}.
 *
 * <p>Each characteristic leads with what its verdict rests on: {@code index} (the required index), {@code method}
 * ({@link dev.proofrun.grade.IndexMethod}), {@code model} (the distribution model; for lognormal3/weibull3 followed by {@code threshold}, the declared θ or, with a floor, the fitted one, then {@code floor}, {@code thresholdsFrom}, {@code thresholdsTo} and {@code boundLimitedAt}), {@code estimate},
 * {@code lower} and {@code upper} (its confidence bounds, numbers; {@code upper} only when the estimate is below
 * the requirement), {@code required}, {@code confidence}, then {@code verdict}. The normal-theory capability
 * figures of the raw readings — the keys and meanings of {@code proofrun estimate --json}, from
 * {@link CapabilityKeys} — sit under {@code normalTheory}, never at the top level, so that a figure another model
 * contradicts cannot be read beside the verdict as if it carried it ({@code normalTheory.carriesVerdict} says
 * whether it did).
 *
 * <p>For a staged plan the root and each characteristic carry {@code look}: {@code {number, of, subgroups,
 * confidence, efficacy, futility}} — the look graded, how many the plan has, the subgroups planned up to it, the
 * confidence of its bound, the efficacy boundary (c₀, which the bound must reach) and the futility boundary
 * (null where the look has none); {@code null} for a single-stage plan. The verdict {@code continue} says to
 * collect the next stage ({@code look.next: {from, to}} names its slots).
 */
final class GradeJson {

    private GradeJson() {
    }

    static Map<String, Object> of(GradeResult r, dev.proofrun.plan.StudyPlan graded) {
        Map<String, Object> root = new LinkedHashMap<>();
        Map<String, Object> plan = new LinkedHashMap<>();
        plan.put("id", r.planId());
        plan.put("revision", r.revision());
        plan.put("revisionNumber", graded.revisionNumber());
        root.put("plan", plan);
        List<Object> problems = new ArrayList<>();
        for (Problem p : r.problems()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("file", p.location().file());
            m.put("row", p.location().row() > 0 ? p.location().row() : null);
            m.put("column", p.location().column());
            m.put("severity", p.severity().token());
            m.put("message", p.message());
            problems.add(m);
        }
        root.put("problems", problems);
        List<Object> cs = new ArrayList<>();
        for (CharacteristicGrade g : r.characteristics()) {
            cs.add(characteristic(g));
        }
        root.put("characteristics", cs);
        root.put("verdict", r.verdict().token());
        root.put("look", look(r.look(), r.characteristics().isEmpty() ? Double.NaN
                : r.characteristics().get(0).requirement().minimum()));
        root.put("caution", r.caution());
        return root;
    }

    private static Map<String, Object> characteristic(CharacteristicGrade g) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", g.id());
        m.put("name", g.name());
        IndexEvidence e = g.judged();
        m.put("index", g.requirement().index().symbol());
        m.put("method", e == null ? null : e.method().token());
        m.put("model", e == null ? null : e.model().token());
        if (g.shape() != null && g.shape().family().hasThreshold() && g.shape().fit() != null) {
            m.put("threshold", g.shape().fit().threshold()); // only for lognormal3/weibull3: other outputs keep their bytes
        }
        if (g.shape() != null && g.shape().thresholds() != null) { // only with a floor
            var set = g.shape().thresholds();
            m.put("floor", set.floor());
            m.put("thresholdsFrom", set.empty() ? null : set.thetas()[0]);
            m.put("thresholdsTo", set.empty() ? null : set.highest());
            m.put("boundLimitedAt", e == null ? null : finite(e.limitedAt()));
        }
        m.put("estimate", e == null ? null : finite(e.estimate()));
        m.put("lower", e == null ? null : finite(e.lower()));
        m.put("upper", e == null ? null : finite(e.upper()));
        m.put("required", g.requirement().minimum());
        m.put("confidence", g.requirement().confidence());
        m.put("verdict", g.verdict().token());
        m.put("expectedPpm", e == null ? null : finite(e.expectedPpm()));
        m.put("seed", e == null ? null : e.seed());
        m.put("readings", g.completeness().readings());
        m.put("subgroups", g.completeness().completeSubgroups());
        m.put("subgroupSize", g.completeness().subgroupSize());
        Map<String, Object> normalTheory = new LinkedHashMap<>();
        normalTheory.put("carriesVerdict", e != null && !e.otherThanNormalTheory());
        normalTheory.putAll(CapabilityKeys.of(g));
        m.put("normalTheory", normalTheory);
        Map<String, Object> control = null;
        Double ratio = null;
        if (g.stability() != null) {
            ChartPair charts = g.stability().charts();
            control = new LinkedHashMap<>();
            control.put("location", limits(charts.location()));
            control.put("spread", limits(charts.spread()));
            List<Object> signals = new ArrayList<>();
            for (SlotSignal s : g.stability().signals()) {
                Map<String, Object> sm = new LinkedHashMap<>();
                sm.put("chart", s.chart().token());
                sm.put("rule", s.rule().token());
                sm.put("subgroup", s.slot());
                signals.add(sm);
            }
            control.put("signals", signals);
            control.put("chance", chance(g.stability()));
            ratio = finite(g.stability().stabilityRatio());
        }
        m.put("control", control);
        m.put("stabilityRatio", ratio);
        Map<String, Object> normality = null;
        if (g.shape() != null) {
            normality = new LinkedHashMap<>();
            normality.put("andersonDarling", finite(g.shape().andersonDarling()));
            normality.put("pValue", finite(g.shape().pValue()));
            normality.put("model", g.shape().model().token());
            normality.put("fits", g.shape().modelFits());
        }
        m.put("normality", normality);
        List<String> reasons = new ArrayList<>();
        for (Reason reason : g.reasons()) {
            reasons.add(reason.text());
        }
        m.put("reasons", reasons);
        m.put("additionalSubgroups", g.additionalSubgroups().isPresent() ? g.additionalSubgroups().getAsInt() : null);
        m.put("look", look(g.look(), g.requirement().minimum()));
        return m;
    }

    /** The look a staged return was graded at, or null. */
    private static Map<String, Object> look(java.util.Optional<dev.proofrun.grade.GradedLook> graded, double efficacy) {
        if (graded.isEmpty()) {
            return null;
        }
        dev.proofrun.grade.GradedLook l = graded.get();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("number", l.number());
        m.put("of", l.of());
        m.put("subgroups", l.look().subgroups());
        m.put("confidence", l.look().confidence());
        m.put("efficacy", finite(efficacy));
        m.put("futility", l.look().stopsForFutility() ? l.look().futility() : null);
        m.put("spending", l.spending().token());
        m.put("endSlot", l.endSlot());
        if (l.nextFrom().isPresent()) {
            Map<String, Object> next = new LinkedHashMap<>();
            next.put("from", l.nextFrom().get());
            next.put("to", l.nextTo().orElseThrow());
            m.put("next", next);
        } else {
            m.put("next", null);
        }
        return m;
    }

    /**
     * What chance explains, numeric: points signalling, expected by chance, and P (the chance of as many on a
     * stable process). {@code floor} is the smallest P the simulation gives (1/(S + 1) for S simulated stable
     * studies; null when P comes from a normal approximation): a P equal to it means "below floor".
     */
    private static Map<String, Object> chance(dev.proofrun.grade.Stability st) {
        Map<String, Object> m = new LinkedHashMap<>();
        Map<String, Object> loc = new LinkedHashMap<>();
        loc.put("points", st.locationSignalPoints());
        loc.put("expected", finite(st.expectedLocationByChance()));
        loc.put("p", finite(st.locationChance()));
        m.put("location", loc);
        Map<String, Object> spr = new LinkedHashMap<>();
        spr.put("points", st.spreadSignalPoints());
        spr.put("expected", finite(st.expectedSpreadByChance()));
        spr.put("p", finite(st.spreadChance()));
        m.put("spread", spr);
        m.put("floor", st.chanceFloor() > 0 ? st.chanceFloor() : null);
        return m;
    }

    private static Map<String, Object> limits(ControlChart c) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("center", finite(c.center()));
        m.put("ucl", finite(c.ucl()));
        m.put("lcl", finite(c.lcl()));
        return m;
    }

    static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }
}

package dev.proofrun.cli;

import dev.proofrun.design.ChartRisk;
import dev.proofrun.design.DesignRow;
import dev.proofrun.design.DesignTable;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The JSON shape of {@code proofrun size --json}: {@code designs} (one object per subgroup size),
 * {@code recommended} (one of them plus {@code reason}), {@code operatingCharacteristic}
 * ({@code trueIndex}, {@code probability}: the whole procedure's) and {@code warnings}. {@code power} is the
 * chance that the grader returns demonstrated (every gate counted), {@code boundPower} the lower bound's alone.
 * {@code falseAlarm} and {@code detection} are the grader's chances of calling the process unstable (stable;
 * mean moved by {@code shift}·σ_w for the second half). {@code anySignalFalseAlarm} and
 * {@code anySignalDetection} are objects with {@code beyondLimits} (3σ rule alone) and {@code allRules} (all
 * eight run rules; null when not computed): the chance that some rule fires, not the grader's decision.
 */
final class SizeJson {

    private SizeJson() {
    }

    static Map<String, Object> of(DesignTable table) {
        Map<String, Object> root = new LinkedHashMap<>();
        List<Object> designs = new ArrayList<>();
        for (DesignRow r : table.rows()) {
            designs.add(row(r));
        }
        root.put("designs", designs);
        Map<String, Object> recommended = row(table.recommended());
        recommended.put("reason", table.reason());
        root.put("recommended", recommended);
        List<Object> oc = new ArrayList<>();
        table.operatingCharacteristic().forEach(p -> {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("trueIndex", round(p.trueIndex(), 4));
            m.put("probability", round(p.probability(), 4));
            oc.add(m);
        });
        root.put("operatingCharacteristic", oc);
        root.put("warnings", table.warnings());
        return root;
    }

    static Map<String, Object> row(DesignRow r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("subgroupSize", r.subgroupSize());
        m.put("subgroups", r.subgroups());
        m.put("readings", r.readings());
        m.put("power", round(r.power(), 4));
        m.put("boundPower", round(r.boundPower(), 4));
        m.put("criticalEstimate", round(r.criticalEstimate(), 4));
        m.put("degreesOfFreedom", round(r.degreesOfFreedom(), 2));
        m.put("limitedBy", r.limitedBy().token());
        m.put("falseAlarm", round(r.falseAlarm(), 4));
        m.put("detection", round(r.detection(), 4));
        m.put("shift", r.shift());
        m.put("anySignalFalseAlarm", risk(r.anySignalFalseAlarm()));
        m.put("anySignalDetection", risk(r.anySignalDetection()));
        return m;
    }

    static Map<String, Object> risk(ChartRisk risk) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("beyondLimits", round(risk.beyondLimits(), 4));
        m.put("allRules", Double.isNaN(risk.allRules()) ? null : round(risk.allRules(), 3));
        return m;
    }

    static Double round(double v, int digits) {
        if (!Double.isFinite(v)) {
            return null;
        }
        double f = Math.pow(10, digits);
        return Math.round(v * f) / f;
    }
}

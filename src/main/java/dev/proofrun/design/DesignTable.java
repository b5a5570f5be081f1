package dev.proofrun.design;

import java.util.List;

/**
 * The answer of {@link StudyDesigner#design(DesignRequest)}.
 *
 * @param rows                    one design per candidate subgroup size that can reach the power
 * @param recommended             the design with the fewest readings (on a tie, the most subgroups)
 * @param reason                  one sentence saying why it is recommended
 * @param operatingCharacteristic probability of demonstrating against the true index, recommended design
 * @param powerCurve              the whole procedure's power against k for the recommended subgroup size, the
 *                                stability gate's rate taken at the recommended k
 * @param warnings                things the engineer must know (pilot uncertainty, gauge, unreachable sizes)
 */
public record DesignTable(List<DesignRow> rows, DesignRow recommended, String reason,
        List<OcPoint> operatingCharacteristic, List<PowerPoint> powerCurve, List<String> warnings) {

    public DesignTable {
        rows = List.copyOf(rows);
        operatingCharacteristic = List.copyOf(operatingCharacteristic);
        powerCurve = List.copyOf(powerCurve);
        warnings = List.copyOf(warnings);
    }
}

package dev.proofrun.cli;

import static dev.proofrun.cli.GradeJson.finite;

import dev.proofrun.grade.CapabilityFigures;
import dev.proofrun.grade.CharacteristicGrade;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The capability keys of {@code grade --json}: readings, subgroups, subgroupSize, mean, sigmaWithin,
 * sigmaOverall, cp, cpu, cpl, cpk, pp, ppu, ppl, ppk, cpm, lower {cp, cpk, pp, ppk}, ppm {within, overall,
 * observed}; null where undefined.
 */
final class CapabilityKeys {

    private CapabilityKeys() {
    }

    static Map<String, Object> of(CharacteristicGrade g) {
        Map<String, Object> m = new LinkedHashMap<>();
        CapabilityFigures f = g.capability();
        m.put("readings", g.completeness().readings());
        m.put("subgroups", g.completeness().completeSubgroups());
        m.put("subgroupSize", g.completeness().subgroupSize());
        String[] keys = {"mean", "sigmaWithin", "sigmaOverall", "cp", "cpu", "cpl", "cpk", "pp", "ppu", "ppl", "ppk", "cpm"};
        double[] values = f == null ? null : new double[] {f.mean(), f.sigmaWithin(), f.sigmaOverall(), f.cp(), f.cpu(),
            f.cpl(), f.cpk(), f.pp(), f.ppu(), f.ppl(), f.ppk(), f.cpm()};
        for (int i = 0; i < keys.length; i++) {
            m.put(keys[i], values == null ? null : finite(values[i]));
        }
        Map<String, Object> lower = new LinkedHashMap<>();
        lower.put("cp", f == null ? null : finite(f.lowerCp()));
        lower.put("cpk", f == null ? null : finite(f.lowerCpk()));
        lower.put("pp", f == null ? null : finite(f.lowerPp()));
        lower.put("ppk", f == null ? null : finite(f.lowerPpk()));
        m.put("lower", lower);
        Map<String, Object> ppm = new LinkedHashMap<>();
        ppm.put("within", f == null ? null : finite(f.ppmWithin()));
        ppm.put("overall", f == null ? null : finite(f.ppmOverall()));
        ppm.put("observed", f == null ? null : finite(f.ppmObserved()));
        m.put("ppm", ppm);
        return m;
    }
}

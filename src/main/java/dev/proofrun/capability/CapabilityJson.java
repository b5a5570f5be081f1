package dev.proofrun.capability;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * The JSON view of a {@link CapabilityResult}, shared by {@code estimate --json} and {@code grade --json}.
 * One object with exactly these keys, in this order, {@code null} where undefined:
 * {@code readings, subgroups, subgroupSize, mean, sigmaWithin, sigmaOverall, sigmaMethod, cp, cpu, cpl,
 * cpk, pp, ppu, ppl, ppk, cpm, confidence, bound, lower {cp, cpk, pp, ppk},
 * degreesOfFreedom {within, overall}, ppm {within, overall, observed}, normality {andersonDarling, pValue}}.
 *
 * <p>{@code subgroupSize} is null when the sizes differ; {@code sigmaMethod} and {@code bound} are the
 * command-line tokens; {@code ppm.observed} is the observed fraction outside the tolerance in ppm;
 * {@code normality.andersonDarling} is the adjusted statistic A* (null, like the p-value, below 8 readings).
 * Numbers are written at full double precision. The map serializes with a plain Jackson ObjectMapper.
 */
public final class CapabilityJson {

    private CapabilityJson() {
    }

    /** The JSON object as an ordered map (values: Long, Integer, Double, String, nested maps, or null). */
    public static Map<String, Object> of(CapabilityResult r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("readings", r.readings());
        m.put("subgroups", r.subgroups());
        m.put("subgroupSize", r.subgroupSize().isPresent() ? r.subgroupSize().getAsInt() : null);
        m.put("mean", r.mean());
        m.put("sigmaWithin", r.within().value());
        m.put("sigmaOverall", r.sigmaOverall());
        m.put("sigmaMethod", r.within().method().token());
        Indices i = r.indices();
        m.put("cp", value(i.cp()));
        m.put("cpu", value(i.cpu()));
        m.put("cpl", value(i.cpl()));
        m.put("cpk", value(i.cpk()));
        m.put("pp", value(i.pp()));
        m.put("ppu", value(i.ppu()));
        m.put("ppl", value(i.ppl()));
        m.put("ppk", value(i.ppk()));
        m.put("cpm", value(i.cpm()));
        m.put("confidence", r.confidence());
        m.put("bound", r.bound().token());
        Map<String, Object> lower = new LinkedHashMap<>();
        lower.put("cp", value(r.lower().cp()));
        lower.put("cpk", value(r.lower().cpk()));
        lower.put("pp", value(r.lower().pp()));
        lower.put("ppk", value(r.lower().ppk()));
        m.put("lower", lower);
        Map<String, Object> df = new LinkedHashMap<>();
        df.put("within", r.within().degreesOfFreedom());
        df.put("overall", r.overallDegreesOfFreedom());
        m.put("degreesOfFreedom", df);
        Map<String, Object> ppm = new LinkedHashMap<>();
        ppm.put("within", r.ppm().within());
        ppm.put("overall", r.ppm().overall());
        ppm.put("observed", r.ppm().observed());
        m.put("ppm", ppm);
        Map<String, Object> normality = new LinkedHashMap<>();
        normality.put("andersonDarling", r.normality().map(a -> (Object) a.adjusted()).orElse(null));
        normality.put("pValue", r.normality().map(a -> (Object) a.pValue()).orElse(null));
        m.put("normality", normality);
        return m;
    }

    private static Double value(OptionalDouble d) {
        return d.isPresent() && Double.isFinite(d.getAsDouble()) ? d.getAsDouble() : null;
    }
}

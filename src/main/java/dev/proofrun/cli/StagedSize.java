package dev.proofrun.cli;

import dev.proofrun.design.Spending;
import dev.proofrun.design.StagedDesign;
import dev.proofrun.design.StagedLook;
import dev.proofrun.design.StagedMessage;
import dev.proofrun.design.Stages;
import dev.proofrun.text.UserException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * {@code size --stages S}: the staged design of the recommended subgroup size (computed only for that n, and only
 * when asked: each evaluated study size simulates {@value dev.proofrun.design.StagedDesigner#PATHS} studies), as a
 * text section and as the JSON object {@code staged}: {@code spending}, {@code subgroupSize}, {@code stages}
 * ({@code subgroups}, {@code readings}, {@code confidence}, {@code efficacy}, {@code futility} — null at the last
 * look —, {@code stopAtTarget}, {@code stopAtExpected}), {@code power}, {@code boundPower}, {@code passAtTarget},
 * {@code expectedReadings} ({@code atTarget}, {@code atExpected}), {@code maxReadings},
 * {@code singleStageReadings}, {@code saving}, {@code extra}, {@code recommended}, {@code reason},
 * {@code simulatedStudies}.
 */
final class StagedSize {

    private StagedSize() {
    }

    /** The number of looks from the option, checked. */
    static int stages(int given) {
        if (given < 1 || given > Stages.MOST) {
            throw new UserException(StagedMessage.BAD_STAGES, Stages.MOST, given);
        }
        return given;
    }

    /** The spending function from the option, checked; {@link Spending#byDefault()} when none is given. */
    static Spending spending(String token) {
        if (token == null) {
            return Spending.byDefault();
        }
        return OptionValues.option("--spending", () -> Spending.fromToken(token));
    }

    /** The sentence that says whether the staged design is recommended, and why. */
    static String reason(StagedDesign d) {
        return d.reason();
    }

    static void print(PrintWriter out, StagedDesign d, String symbol) {
        out.printf(Locale.ROOT, "Staged study (%d looks, %s spending, subgroups of %d):%n", d.looks().size(),
                d.stages().spending().token(), d.subgroupSize());
        out.printf(Locale.ROOT, "  look  subgroups  readings  confidence  demonstrated if  stop if       stops at %s%n",
                symbol);
        out.printf(Locale.ROOT, "                                         %-4s at least    %-4s below   target  expected%n",
                symbol, symbol);
        int j = 1;
        for (StagedLook l : d.looks()) {
            String futility = Double.isNaN(l.futility()) ? "   -" : String.format(Locale.ROOT, "%6.3f", l.futility());
            out.printf(Locale.ROOT, "  %4d  %9d  %8d  %10.5f  %15.3f  %-11s  %6.3f  %8.3f%n", j++, l.subgroups(),
                    l.readings(), l.confidence(), l.efficacy(), futility, l.stopAtTarget(), l.stopAtExpected());
        }
        out.printf(Locale.ROOT, "  power %.3f (bound and futility alone %.3f); chance of demonstrated at the requirement"
                + " %.3f%n", d.power(), d.boundPower(), d.passAtTarget());
        out.printf(Locale.ROOT, "  readings expected: %.1f at the requirement, %.1f as expected; at most %d"
                + " (single stage: %d)%n", d.expectedReadingsAtTarget(), d.expectedReadingsAtExpected(),
                d.maxReadings(), d.singleStage().readings());
        out.printf(Locale.ROOT, "  (from %d simulated studies per size: standard error about %.3f on a chance near the"
                + " power)%n", d.paths(), Math.sqrt(d.power() * (1 - d.power()) / Math.max(1, d.paths())));
        out.println("  " + reason(d));
        out.println("  " + StagedMessage.STAGED_HOW_TO_READ.english());
    }

    static Map<String, Object> json(StagedDesign d) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("spending", d.stages().spending().token());
        m.put("subgroupSize", d.subgroupSize());
        List<Object> looks = new ArrayList<>();
        for (StagedLook l : d.looks()) {
            Map<String, Object> s = new LinkedHashMap<>();
            s.put("subgroups", l.subgroups());
            s.put("readings", l.readings());
            s.put("confidence", SizeJson.round(l.confidence(), 6));
            s.put("efficacy", SizeJson.round(l.efficacy(), 4));
            s.put("futility", SizeJson.round(l.futility(), 4));
            s.put("stopAtTarget", SizeJson.round(l.stopAtTarget(), 4));
            s.put("stopAtExpected", SizeJson.round(l.stopAtExpected(), 4));
            looks.add(s);
        }
        m.put("stages", looks);
        m.put("power", SizeJson.round(d.power(), 4));
        m.put("boundPower", SizeJson.round(d.boundPower(), 4));
        m.put("passAtTarget", SizeJson.round(d.passAtTarget(), 4));
        Map<String, Object> expected = new LinkedHashMap<>();
        expected.put("atTarget", SizeJson.round(d.expectedReadingsAtTarget(), 1));
        expected.put("atExpected", SizeJson.round(d.expectedReadingsAtExpected(), 1));
        m.put("expectedReadings", expected);
        m.put("maxReadings", d.maxReadings());
        m.put("singleStageReadings", d.singleStage().readings());
        m.put("saving", SizeJson.round(d.saving(), 4));
        m.put("extra", SizeJson.round(d.extra(), 4));
        m.put("recommended", d.recommended());
        m.put("reason", reason(d));
        m.put("simulatedStudies", d.paths());
        return m;
    }
}

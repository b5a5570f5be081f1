package dev.proofrun.cli;

import dev.proofrun.design.DesignTerm;
import dev.proofrun.design.DesignMessage;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.SharedDesign;
import dev.proofrun.design.SharedDesigner;
import dev.proofrun.design.StudyDesigner;
import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.CharacteristicsCsv;
import dev.proofrun.plan.PlanDesign;
import dev.proofrun.plan.PlanMessage;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;

/**
 * {@code proofrun size --characteristics FILE.csv}: several characteristics measured on the same parts get
 * one design from {@link SharedDesigner} — one n, k the largest any of them needs, the power of each at that
 * design, and the one that drives k named. The file is read by {@link CharacteristicsCsv}, as
 * {@code plan new --characteristics} reads it.
 */
final class SharedSize {

    private final String file;
    private final List<Characteristic> characteristics;
    private final List<SharedDesign> designs;
    private final String reason;
    private final List<String> warnings;

    private SharedSize(String file, List<Characteristic> characteristics, List<SharedDesign> designs, String reason,
            List<String> warnings) {
        this.file = file;
        this.characteristics = characteristics;
        this.designs = designs;
        this.reason = reason;
        this.warnings = warnings;
    }

    /**
     * @param request        the command's design options (power, sizes, estimator, bound, floors, shift) applied
     *                       to one characteristic
     * @param refusedOptions single-characteristic options given beside the file (refused when any)
     * @throws UserException for a refused option, a bad file (file, row, column), a characteristic that
     *                       cannot be planned (file and id), or no subgroup size that suits them all
     */
    static SharedSize design(Path path, Function<Characteristic, DesignRequest> request, IndexKind defaultIndex, double defaultConfidence,
            List<String> refusedOptions) {
        if (!refusedOptions.isEmpty()) {
            throw new UserException(SizeMessage.FILE_REPLACES_OPTIONS, String.join(", ", refusedOptions));
        }
        String file = path.toString();
        List<Characteristic> chars = CharacteristicsCsv.read(path, defaultIndex, defaultConfidence);
        List<SharedDesign> designs;
        try {
            designs = PlanDesign.solve(chars, request);
        } catch (UserException e) {
            throw e.key() == PlanMessage.CHARACTERISTIC_REFUSED ? e.placedIn(Location.file(file)) : e;
        }
        DesignRequest first = request.apply(chars.get(0));
        List<String> warnings = new ArrayList<>();
        for (Characteristic c : chars) {
            if (c.floor().isPresent()) {
                warnings.add(SizeMessage.FLOOR_NOT_SIZED.format(c.id(), c.shapeWords()));
            } else if (!c.shape().isNormal()) {
                warnings.add((ShapeSize.plans(c.shape()) ? SizeMessage.SHAPE_SIZED_AS_NORMAL.format(c.id(), c.shape().token(), c.shape().token())
                        : SizeMessage.SHAPE_NOT_SIZED_AS_NORMAL.format(c.id(), c.shape().token(), ShapeSize.plannable())));
            }
        }
        for (int n : first.subgroupSizes()) {
            if (designs.stream().noneMatch(d -> d.subgroupSize() == n)) {
                warnings.add(SizeMessage.SHARED_LEFT_OUT.format(n, first.power(), StudyDesigner.MAX_READINGS));
            }
        }
        SharedDesign best = designs.get(0);
        String why = switch (best.limitedBy()) {
            case POWER -> String.format(Locale.ROOT, "give every characteristic %.0f %% power", 100 * first.power());
            case MIN_SUBGROUPS -> String.format(Locale.ROOT, "meet the floor of %d subgroups",
                    first.floors().minSubgroups());
            case MIN_READINGS -> String.format(Locale.ROOT, "meet the floor of %d readings", first.floors().minReadings());
        };
        String reason = SizeMessage.SHARED_REASON.format(best.subgroups(), best.subgroupSize(), best.readings(), why,
                chars.get(best.driver()).id());
        return new SharedSize(file, chars, designs, reason, warnings);
    }

    void print(PrintWriter out) {
        int w = Math.max(6, characteristics.stream().mapToInt(c -> c.id().length()).max().orElse(0));
        out.println(SizeMessage.SHARED_HEADING.format(characteristics.size(), file));
        out.printf(Locale.ROOT, "   n     k      N  %-" + w + "s  %-13s lowest   called unstable    some rule fires%n",
                "driver", DesignTerm.LIMITED_BY.english());
        out.printf(Locale.ROOT, "                   %" + w + "s  %13s  power   stable   shift    stable   shift%n", "", "");
        for (SharedDesign d : bySize()) {
            double lowest = d.powers().stream().mapToDouble(Double::doubleValue).min().orElseThrow();
            out.printf(Locale.ROOT, "%s%3d %5d %6d  %-" + w + "s  %-13s %6.3f  %6.3f  %6.3f  %6.3f  %6.3f%n",
                    d == designs.get(0) ? "*" : " ", d.subgroupSize(), d.subgroups(), d.readings(),
                    characteristics.get(d.driver()).id(), d.limitedBy().token(), lowest, d.falseAlarm(),
                    d.detection(), d.anySignalFalseAlarm().allRules(), d.anySignalDetection().allRules());
        }
        out.println(SizeMessage.SHARED_CHART_RISKS.format(characteristics.size()));
        out.println();
        out.println("Recommended: " + reason);
        out.println();
        SharedDesign best = designs.get(0);
        out.printf(Locale.ROOT, "Each characteristic at %d subgroups of %d:%n", best.subgroups(), best.subgroupSize());
        out.printf(Locale.ROOT, "  %-" + w + "s  index  target  confidence  expected  alone k   power%n", "id");
        for (int i = 0; i < characteristics.size(); i++) {
            Characteristic c = characteristics.get(i);
            out.printf(Locale.ROOT, "  %-" + w + "s  %-5s  %6.3f  %10.3f  %8.3f  %7d  %6.3f%s%n", c.id(),
                    c.requirement().index().symbol(), c.requirement().minimum(), c.requirement().confidence(),
                    c.expectation().index(), best.ownSubgroups().get(i), best.powers().get(i),
                    i == best.driver() ? "  drives k" : "");
        }
        if (characteristics.size() > 1) {
            out.println(SizeMessage.SHARED_ALL_TOGETHER.format(characteristics.size(),
                    best.allDemonstratedIfIndependent()));
        }
        for (String warning : warnings) {
            out.println("warning: " + warning);
        }
        out.println();
        out.println(DesignMessage.CAUTION.english());
    }

    /**
     * {@code characteristics} ({@code id, index, target, confidence, expected}), {@code designs} (one per
     * subgroup size every characteristic can use, by size: {@code subgroupSize, subgroups, readings,
     * driver, limitedBy, characteristics: [{id, power, subgroupsAlone}], allDemonstratedIfIndependent,
     * falseAlarm, detection (the grader's: numbers), anySignalFalseAlarm, anySignalDetection}),
     * {@code recommended} (the first design plus {@code reason}) and {@code warnings}.
     */
    Map<String, Object> json() {
        Map<String, Object> root = new LinkedHashMap<>();
        List<Object> chars = new ArrayList<>();
        for (Characteristic c : characteristics) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("id", c.id());
            m.put("index", c.requirement().index().token());
            m.put("target", c.requirement().minimum());
            m.put("confidence", c.requirement().confidence());
            m.put("expected", c.expectation().index());
            chars.add(m);
        }
        root.put("characteristics", chars);
        List<Object> rows = new ArrayList<>();
        for (SharedDesign d : bySize()) {
            rows.add(design(d));
        }
        root.put("designs", rows);
        Map<String, Object> recommended = design(designs.get(0));
        recommended.put("reason", reason);
        root.put("recommended", recommended);
        root.put("warnings", warnings);
        return root;
    }

    private List<SharedDesign> bySize() {
        return designs.stream().sorted(java.util.Comparator.comparingInt(SharedDesign::subgroupSize)).toList();
    }

    private Map<String, Object> design(SharedDesign d) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("subgroupSize", d.subgroupSize());
        m.put("subgroups", d.subgroups());
        m.put("readings", d.readings());
        m.put("driver", characteristics.get(d.driver()).id());
        m.put("limitedBy", d.limitedBy().token());
        List<Object> each = new ArrayList<>();
        for (int i = 0; i < characteristics.size(); i++) {
            Map<String, Object> c = new LinkedHashMap<>();
            c.put("id", characteristics.get(i).id());
            c.put("power", SizeJson.round(d.powers().get(i), 4));
            c.put("subgroupsAlone", d.ownSubgroups().get(i));
            each.add(c);
        }
        m.put("characteristics", each);
        m.put("allDemonstratedIfIndependent", SizeJson.round(d.allDemonstratedIfIndependent(), 4));
        m.put("falseAlarm", SizeJson.round(d.falseAlarm(), 4));
        m.put("detection", SizeJson.round(d.detection(), 4));
        m.put("anySignalFalseAlarm", SizeJson.risk(d.anySignalFalseAlarm()));
        m.put("anySignalDetection", SizeJson.risk(d.anySignalDetection()));
        return m;
    }
}

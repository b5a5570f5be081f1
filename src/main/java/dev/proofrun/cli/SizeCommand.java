package dev.proofrun.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.proofrun.design.DesignTerm;
import dev.proofrun.design.ChartRisk;
import dev.proofrun.design.DesignMessage;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.DesignRow;
import dev.proofrun.design.DesignTable;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.PracticeFloors;
import dev.proofrun.design.OcPoint;
import dev.proofrun.design.PowerPoint;
import dev.proofrun.design.ProcedurePower;
import dev.proofrun.design.ProcessFacts;
import dev.proofrun.design.Requirement;
import dev.proofrun.design.Spending;
import dev.proofrun.design.StagedDesign;
import dev.proofrun.design.StagedDesigner;
import dev.proofrun.design.StagedMessage;
import dev.proofrun.design.StudyDesigner;
import dev.proofrun.plan.Characteristic;
import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.UserException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import java.util.stream.IntStream;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code proofrun size}: how many subgroups of what size demonstrate the required index. */
@Command(name = "size", mixinStandardHelpOptions = true,
        description = "How many subgroups of what size show the required index with the wanted power.")
public final class SizeCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Option(names = "--spec", paramLabel = "two-sided|upper|lower",
            description = "Which specification limits exist (default two-sided, or as --lsl/--usl give).")
    String sides;

    @Mixin
    StudyGoalOptions goal;

    @Mixin
    SpecLimitOptions limits;

    @Option(names = "--mean", description = "Expected process mean (with --sd and --lsl/--usl, instead of --expected).")
    Double mean;

    @Option(names = "--sd", description = "Expected process standard deviation; with --gauge-sd the plan is for the"
            + " observed index (process and gauge together).")
    Double sd;

    @Mixin
    GaugeOptions gauge;

    @Option(names = "--subgroup-size", paramLabel = "N", description = "Candidate subgroup size (repeatable; default 1-10).")
    List<Integer> subgroupSizes;

    @Mixin
    EstimatorOptions estimator;

    @Option(names = "--min-subgroups", defaultValue = "25", description = "Floor on subgroups (default ${DEFAULT-VALUE}).")
    int minSubgroups;

    @Option(names = "--min-readings", defaultValue = "100", description = "Floor on readings (default ${DEFAULT-VALUE}).")
    int minReadings;

    @Option(names = "--shift", defaultValue = "1.5", paramLabel = "DELTA",
            description = "Mean shift for the second half of the study, in within standard deviations, whose detection"
                    + " is shown (default ${DEFAULT-VALUE}).")
    double shift;

    @Option(names = "--loss-rate", defaultValue = "0", paramLabel = "P",
            description = "Chance that one planned subgroup is lost; the power counts the losses the plan allows"
                    + " (a tenth of the subgroups) and the smaller study they leave (default ${DEFAULT-VALUE}).")
    double lossRate;

    @Option(names = "--pilot", paramLabel = "FILE.csv",
            description = "Pilot readings (read as 'estimate' reads them, needs --lsl/--usl): the expected index.")
    java.nio.file.Path pilot;

    @Option(names = "--pilot-subgroup-size", paramLabel = "N",
            description = "Consecutive readings per subgroup in a one-column pilot file.")
    Integer pilotSubgroupSize;

    @Option(names = "--characteristics", paramLabel = "FILE.csv",
            description = "Several characteristics measured on the same parts, in the columns 'plan new --characteristics'"
                    + " reads, for one shared design (--index and --confidence are the defaults for empty cells).")
    java.nio.file.Path characteristics;

    @Mixin
    ShapeOption planned;

    @Option(names = "--skewness", paramLabel = "G", description = "The expected skewness of the readings, which a --shape"
            + " other than normal needs (or --pilot, for a shape without a threshold).")
    Double skewness;

    @Option(names = "--floor", paramLabel = "X", description = "Refused, with the reason: a threshold shape planned with a"
            + " floor has no computed power (see plan new --floor).")
    Double floor;

    @Mixin
    StagesOptions staging;

    @Mixin
    JsonOption output;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        if (floor != null) {
            throw new UserException(SizeMessage.FLOOR_REFUSED);
        }
        OptionValues.confidence(goal.confidence());
        int looks = StagedSize.stages(staging.stages);
        Spending spendingFunction = StagedSize.spending(staging.spending);
        if (looks > 1 && characteristics != null) {
            throw new UserException(StagedMessage.STAGES_NEED_ONE_CHARACTERISTIC);
        }
        if (looks > 1 && planned.shape != null && !OptionValues.shape(planned.shape).isNormal()) {
            throw new UserException(StagedMessage.STAGES_NEED_NORMAL, planned.shape);
        }
        if (characteristics != null) {
            SharedSize shared = SharedSize.design(characteristics, this::sharedRequest, OptionValues.index(goal.index),
                    goal.confidence(), refusedBesideFile());
            if (output.json) {
                ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
                out.println(mapper.writeValueAsString(shared.json()));
            } else {
                shared.print(out);
            }
            out.flush();
            return 0;
        }
        if (goal.target == null) {
            throw new UserException(SizeMessage.TARGET_NEEDED);
        }
        ShapeFamily family = planned.shape == null ? ShapeFamily.NORMAL : OptionValues.shape(planned.shape);
        if (!family.isNormal() && !ShapeSize.plans(family)) {
            throw new UserException(SizeMessage.SHAPE_NOT_SIZED, family.token(), ShapeSize.plannable());
        }
        if (!family.isNormal()) {
            List<Integer> sizes = candidateSizes();
            PracticeFloors floors = floors();
            ShapeSize sized;
            if (pilot != null && skewness == null && family.hasThreshold()) {
                throw new UserException(OptionMessage.BAD_VALUE, "--pilot", "a " + family.token()
                        + " shape is planned from --skewness G (the pilot's fit would need the plan's threshold)");
            }
            if (pilot != null && skewness == null) {
                if (!limits.given()) {
                    throw new UserException(DesignMessage.BAD_EXPECTATION, "--pilot needs the specification limits --lsl/--usl");
                }
                sized = ShapeSize.fromPilot(family, dev.proofrun.readings.ReadingsCsv.read(pilot, pilotSubgroupSize == null
                        ? OptionalInt.empty() : OptionalInt.of(pilotSubgroupSize)), limits.limits(),
                        OptionValues.index(goal.index), goal.target, goal.expected, goal.confidence(), goal.power, sizes, floors);
            } else {
                sized = ShapeSize.design(family.base(), skewness, OptionValues.sides(sides, limits.lsl, limits.usl),
                        goal.target, goal.expected, goal.confidence(), goal.power, sizes, floors);
                if (family.hasThreshold()) {
                    sized.asThresholdShape(family);
                }
            }
            if (output.json) {
                out.println(new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(sized.json()));
            } else {
                sized.print(out);
            }
            out.flush();
            return 0;
        }
        if (skewness != null) {
            throw new UserException(OptionMessage.BAD_VALUE, "--skewness", "only with --shape lognormal, weibull or folded-normal");
        }
        DesignRequest request = request();
        if (looks > 1 && request.lossRate() > 0) {
            throw new UserException(StagedMessage.STAGES_WITHOUT_LOSSES);
        }
        DesignTable table = StudyDesigner.design(request);
        StagedDesign staged = looks > 1
                ? StagedDesigner.design(request, table.recommended().subgroupSize(), looks, spendingFunction) : null;
        if (output.json) {
            ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
            java.util.Map<String, Object> root = SizeJson.of(table);
            if (staged != null) {
                root.put("staged", StagedSize.json(staged));
            }
            out.println(mapper.writeValueAsString(root));
        } else {
            print(out, table, request, staged);
        }
        out.flush();
        return 0;
    }

    /** The options that describe one characteristic, which --characteristics takes from its file instead. */
    private List<String> refusedBesideFile() {
        List<String> given = new ArrayList<>();
        Object[][] options = {{"--target", goal.target}, {"--expected", goal.expected}, {"--expected-cp", goal.expectedCp},
            {"--lsl", limits.lsl}, {"--usl", limits.usl}, {"--mean", mean}, {"--sd", sd}, {"--gauge-sd", gauge.gaugeSd},
            {"--resolution", gauge.resolution}, {"--pilot", pilot}, {"--spec", sides}};
        for (Object[] o : options) {
            if (o[1] != null) {
                given.add((String) o[0]);
            }
        }
        return given;
    }

    /** The design options of this command applied to one characteristic from the file. */
    private DesignRequest sharedRequest(Characteristic c) {
        return designOptions(c.limits().sides(), c.requirement(), c.expectation(), List.of());
    }

    /** The design options of this command (power, sizes, estimator, bound, floors, shift) around one characteristic. */
    private DesignRequest designOptions(SpecLimits.Sides specSides, Requirement requirement, Expectation expectation,
            List<String> notes) {
        return new DesignRequest(specSides, requirement, expectation, goal.power, candidateSizes(), OptionValues.sigma(estimator.sigma),
                OptionValues.bound(estimator.bound), floors(), shift, lossRate, notes);
    }

    /** The subgroup sizes given with --subgroup-size, or 1 to 10. */
    private List<Integer> candidateSizes() {
        return subgroupSizes == null || subgroupSizes.isEmpty() ? IntStream.rangeClosed(1, 10).boxed().toList() : subgroupSizes;
    }

    /** The floors of --min-subgroups and --min-readings. */
    private PracticeFloors floors() {
        return wrap(() -> new PracticeFloors(minSubgroups, minReadings));
    }

    DesignRequest request() {
        IndexKind kind = OptionValues.index(goal.index);
        SpecLimits.Sides specSides = OptionValues.sides(sides, limits.lsl, limits.usl);
        List<String> notes = new ArrayList<>();
        Expectation expectation;
        if (pilot != null) {
            if (goal.expected != null || mean != null || sd != null || gauge.gaugeSd != null) {
                throw new UserException(DesignMessage.BAD_EXPECTATION,
                        "--pilot replaces --expected, --mean, --sd and --gauge-sd; give one of them");
            }
            expectation = fromPilot(kind, notes);
        } else if (goal.expected != null) {
            expectation = goal.expectedCp == null ? Expectation.centred(goal.expected)
                    : wrap(() -> Expectation.offCentre(goal.expected, goal.expectedCp));
        } else {
            if (mean == null || sd == null) {
                throw new UserException(DesignMessage.BAD_EXPECTATION,
                        "give --expected (with --expected-cp if off centre), or --mean and --sd with --lsl/--usl");
            }
            ProcessFacts facts = ProcessFacts.of(limits.limits(), mean, sd)
                    .withGauge(optional(gauge.gaugeSd), optional(gauge.resolution));
            expectation = facts.expectationFor(kind, notes);
        }
        if (goal.expected != null && (gauge.gaugeSd != null || gauge.resolution != null)) {
            throw new UserException(DesignMessage.BAD_EXPECTATION, "--gauge-sd and --resolution need --mean, --sd and the limits");
        }
        return designOptions(specSides, Requirement.of(kind, goal.target, goal.confidence()), expectation, notes);
    }

    private Expectation fromPilot(IndexKind kind, List<String> notes) {
        if (!limits.given()) {
            throw new UserException(DesignMessage.BAD_EXPECTATION, "--pilot needs the specification limits --lsl/--usl");
        }
        SpecLimits specLimits = limits.limits();
        SigmaMethod method = OptionValues.sigma(estimator.sigma).orElse(null);
        BoundMethod boundMethod = OptionValues.bound(estimator.bound);
        dev.proofrun.readings.Readings readings = dev.proofrun.readings.ReadingsCsv.read(pilot,
                pilotSubgroupSize == null ? OptionalInt.empty() : OptionalInt.of(pilotSubgroupSize));
        dev.proofrun.capability.CapabilityResult result;
        try {
            result = dev.proofrun.capability.CapabilityAnalysis.of(readings.subgroups(), specLimits, null, method,
                    goal.confidence(), boundMethod);
        } catch (UserException e) {
            throw e.placedIn(dev.proofrun.text.Location.file(pilot.toString()));
        }
        return dev.proofrun.design.PilotExpectation.from(result, kind, notes);
    }

    private static OptionalDouble optional(Double v) {
        return v == null ? OptionalDouble.empty() : OptionalDouble.of(v);
    }

    private static <T> T wrap(java.util.function.Supplier<T> s) {
        try {
            return s.get();
        } catch (IllegalArgumentException e) {
            throw new UserException(DesignMessage.BAD_EXPECTATION, e.getMessage());
        }
    }

    private void print(PrintWriter out, DesignTable t, DesignRequest request, StagedDesign staged) {
        out.printf(Locale.ROOT, "   n     k      N   power   bound  %6s  %6s  %-13s called unstable   some rule fires%n",
                DesignTerm.CRITICAL.english(), DesignTerm.DF.english(), DesignTerm.LIMITED_BY.english());
        out.println("                          alone                                  stable   shift    stable   shift");
        for (DesignRow r : t.rows()) {
            out.printf(Locale.ROOT, "%s%3d %5d %6d  %6.3f  %6.3f  %6.3f  %6.1f  %-13s %6.3f  %6.3f    %6s  %6s%n",
                    r == t.recommended() ? "*" : " ", r.subgroupSize(), r.subgroups(), r.readings(), r.power(),
                    r.boundPower(), r.criticalEstimate(), r.degreesOfFreedom(), r.limitedBy().token(), r.falseAlarm(),
                    r.detection(), rules(r.anySignalFalseAlarm()), rules(r.anySignalDetection()));
        }
        out.println(SizeMessage.POWER_EXPLAINED.format(100 * ProcedurePower.NORMAL_SHAPE_REJECTION,
                t.recommended().shift(), PlanSyntax.number(request.lossRate())));
        out.println();
        out.println("Recommended: " + t.reason());
        out.println();
        String symbol = request.requirement().index().symbol();
        double c0 = request.requirement().minimum();
        double c1 = request.expectation().index();
        out.println("Probability of demonstrating against the true index (recommended design):");
        out.printf(Locale.ROOT, "  %6s  %11s%n", "true " + symbol, "probability");
        List<OcPoint> oc = t.operatingCharacteristic();
        int grid = 0;
        for (OcPoint p : oc) {
            String note = p.trueIndex() == c0 ? "  the requirement: the customer's risk"
                    : p.trueIndex() == c1 ? "  the expected process: the power" : "";
            if (!note.isEmpty() || grid++ % 4 == 0) {
                out.printf(Locale.ROOT, "  %8.3f  %11.3f%s%n", p.trueIndex(), p.probability(), note);
            }
        }
        out.println();
        out.printf(Locale.ROOT, "Power against the number of subgroups (n = %d):%n", t.recommended().subgroupSize());
        List<PowerPoint> curve = t.powerCurve();
        int stride = Math.max(1, curve.size() / 10);
        for (int i = 0; i < curve.size(); i += stride) {
            out.printf(Locale.ROOT, "  k = %4d  N = %5d  %6.3f%n", curve.get(i).subgroups(), curve.get(i).readings(),
                    curve.get(i).power());
        }
        if (staged != null) {
            out.println();
            StagedSize.print(out, staged, symbol);
        }
        for (String w : t.warnings()) {
            out.println("warning: " + w);
        }
        out.println();
        out.println(DesignMessage.CAUTION.english());
    }

    private static String rules(ChartRisk r) {
        return Double.isNaN(r.allRules()) ? "n/a" : String.format(Locale.ROOT, "%.3f", r.allRules());
    }
}

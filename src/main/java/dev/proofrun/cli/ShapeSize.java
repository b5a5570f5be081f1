package dev.proofrun.cli;

import dev.proofrun.design.DesignMessage;
import dev.proofrun.design.PracticeFloors;
import dev.proofrun.design.ShapeSizing;
import dev.proofrun.stats.FoldedNormalBound;
import dev.proofrun.stats.FoldedNormalPower;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.PercentileIndex;
import dev.proofrun.stats.PercentilePower;
import dev.proofrun.stats.ShapeFit;
import dev.proofrun.stats.ShapeFitter;
import dev.proofrun.stats.PivotalBound;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.ShapeSkewness;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.UserException;
import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * {@code size --shape lognormal|weibull|folded-normal --skewness G}: study sizes for a one-sided characteristic planned with a
 * skewed shape, by {@link ShapeSizing}. The expected and required indices are percentile indices (ISO 22514-2).
 */
final class ShapeSize {

    private final ShapeFamily family;
    private final double skewness;
    private final double parameter;
    private final IndexKind.Side side;
    private final double c0;
    private final double c1;
    private final double confidence;
    private final double power;
    private final List<ShapeSizing.Row> rows;

    private ShapeSize(ShapeFamily family, double skewness, double parameter, IndexKind.Side side, double c0, double c1,
            double confidence, double power, List<ShapeSizing.Row> rows) {
        this.family = family;
        this.skewness = skewness;
        this.parameter = parameter;
        this.side = side;
        this.c0 = c0;
        this.c1 = c1;
        this.confidence = confidence;
        this.power = power;
        this.rows = rows;
    }

    /** The skewed shapes {@code size --shape} can plan, comma separated. */
    static String plannable() {
        return java.util.Arrays.stream(ShapeFamily.values()).filter(ShapeSize::plans)
                .map(ShapeFamily::token).collect(java.util.stream.Collectors.joining(", "));
    }

    /** Whether {@code size --shape} plans this skewed shape: the location–scale ones and the folded normal. */
    static boolean plans(ShapeFamily family) {
        return !family.isNormal() && (family.isLocationScale() || family == ShapeFamily.FOLDED_NORMAL);
    }

    private static boolean folded(ShapeFamily family) {
        return family == ShapeFamily.FOLDED_NORMAL;
    }

    /**
     * From pilot readings: the declared shape fitted to them gives the shape parameter (hence the skewness) and,
     * unless {@code c1} is given, the expected index (the pilot's estimate; its own uncertainty is not in the
     * power, and a note gives its pivotal lower bound).
     *
     * @throws UserException naming the pilot file when the shape cannot be fitted to its readings
     */
    static ShapeSize fromPilot(ShapeFamily family, dev.proofrun.readings.Readings pilot, SpecLimits limits, IndexKind kind,
            double c0, Double c1, double confidence, double power, List<Integer> sizes, PracticeFloors floors) {
        double[] x = pilot.subgroups().stream().flatMapToDouble(java.util.Arrays::stream).toArray();
        ShapeFitter.Outcome o = ShapeFitter.fit(family, x);
        if (!o.fitted()) {
            throw new UserException(dev.proofrun.text.Location.file(pilot.file()), OptionMessage.BAD_VALUE, "--pilot",
                    "the " + family.token() + " shape cannot be fitted to these readings ("
                    + o.failure().name().toLowerCase(Locale.ROOT).replace('_', ' ') + ")");
        }
        ShapeFit fit = o.fit();
        double parameter = folded(family) ? fit.location() / fit.scale() : family == ShapeFamily.WEIBULL ? fit.first() : fit.scale();
        double expected = c1 != null ? c1 : PercentileIndex.of(kind, limits, fit);
        ShapeSize s = design(family, folded(family) ? FoldedNormalPower.skewness(parameter) : ShapeSkewness.of(family, parameter),
                limits.sides(), c0, expected, confidence, power, sizes, floors);
        double[] b = folded(family) ? FoldedNormalBound.bounds(fit, kind, limits, x.length, confidence, PivotalBound.DEFAULT_SEED)
                : PivotalBound.bounds(fit, kind, limits, x.length, confidence, PivotalBound.DEFAULT_SEED);
        s.pilotNote = DesignMessage.PILOT_UNCERTAINTY.format(x.length, kind.symbol(), PercentileIndex.of(kind, limits, fit),
                100 * confidence, b[0]) + "; the pilot's fit to the " + family.token() + " shape is not checked here";
        return s;
    }

    private String pilotNote;
    /** The declared threshold shape planned as its two-parameter {@link ShapeFamily#base()}, or null. */
    private ShapeFamily declared;

    /**
     * A {@code lognormal3}/{@code weibull3} plan: the threshold shifts the readings but not the pivot, so the plan
     * is the two-parameter shape's (same N, same power) and the output says so.
     */
    ShapeSize asThresholdShape(ShapeFamily threshold) {
        this.declared = threshold;
        return this;
    }

    private String thresholdNote() {
        return String.format(Locale.ROOT, "%s is planned exactly as %s: with the threshold declared in the plan, x - threshold"
                + " follows the %s model, so the study size and power are the same (the threshold shifts the readings, not"
                + " the bound)", declared.token(), family.token(), family.token());
    }

    /** @throws UserException for a skewness the shape cannot have, two-sided limits, or c₁ ≤ c₀ */
    static ShapeSize design(ShapeFamily family, Double skewness, SpecLimits.Sides sides, double c0, Double c1,
            double confidence, double power, List<Integer> sizes, PracticeFloors floors) {
        if (skewness == null) {
            throw new UserException(OptionMessage.BAD_VALUE, "--shape", "a " + family.token()
                    + " shape needs --skewness G, the expected skewness of the readings, or --pilot FILE with --lsl/--usl");
        }
        if (c1 == null) {
            throw new UserException(DesignMessage.BAD_EXPECTATION, "--shape needs --expected C1, the expected percentile index");
        }
        if (sides == SpecLimits.Sides.TWO_SIDED) {
            throw new UserException(OptionMessage.BAD_VALUE, "--spec",
                    "a skewed shape is planned here for one limit only: give --spec upper or --spec lower");
        }
        double parameter;
        try {
            parameter = folded(family) ? FoldedNormalPower.meanRatio(skewness) : ShapeSkewness.parameter(family, skewness);
        } catch (IllegalArgumentException e) {
            throw new UserException(OptionMessage.BAD_VALUE, "--skewness", e.getMessage());
        }
        IndexKind.Side side = sides == SpecLimits.Sides.UPPER_ONLY ? IndexKind.Side.UPPER : IndexKind.Side.LOWER;
        List<ShapeSizing.Row> rows;
        try {
            rows = ShapeSizing.design(family, parameter, side, c0, c1, confidence, power, sizes, floors);
        } catch (IllegalArgumentException e) {
            throw new UserException(DesignMessage.BAD_EXPECTATION, e.getMessage());
        }
        return new ShapeSize(family, skewness, parameter, side, c0, c1, confidence, power, rows);
    }

    private String parameterWords() {
        if (folded(family)) {
            return String.format(Locale.ROOT, "mean/sigma of the unfolded normal = %.4g", parameter);
        }
        return family == ShapeFamily.WEIBULL ? String.format(Locale.ROOT, "Weibull shape k = %.4g", parameter)
                : String.format(Locale.ROOT, "sigma of ln x = %.4g", parameter);
    }

    void print(PrintWriter out) {
        out.printf(Locale.ROOT, "Planned shape %s, skewness %.3g (%s); %s limit only; percentile index (ISO 22514-2),"
                + " required %.3f at %.0f %%, expected %.3f.%n", family.token(), skewness, parameterWords(),
                side == IndexKind.Side.UPPER ? "upper" : "lower", c0, 100 * confidence, c1);
        if (rows.isEmpty()) {
            out.printf(Locale.ROOT, "No study up to %d readings reaches a power of %.3f.%n", ShapeSizing.MAX_READINGS, power);
        } else {
            out.println("   n     k      N   power  bound alone");
            ShapeSizing.Row best = recommended();
            for (ShapeSizing.Row r : rows) {
                out.printf(Locale.ROOT, "%s%3d %5d %6d  %6.3f  %11.3f%n", r == best ? "*" : " ", r.subgroupSize(), r.subgroups(),
                        r.readings(), r.power(), r.boundPower());
            }
        }
        if (pilotNote != null) {
            out.println("note: " + pilotNote);
        }
        if (declared != null) {
            out.println("note: " + thresholdNote());
        }
        out.println();
        if (folded(family)) {
            out.printf(Locale.ROOT, "Power: the chance that grading says demonstrated: the grader's lower bound (test inversion at"
                    + " the least favourable mean/sigma of a confidence set, seed %d) reaches the requirement — simulated with"
                    + " seed %d (%d studies of readings of this shape, each fitted and bounded as the grader does; standard"
                    + " error at most %.3f; only N matters, the index uses the overall spread) and shown alone as 'bound"
                    + " alone' — times the chances that the shape check (1 %%) and the stability step let a stable process of"
                    + " this shape through.%n", PivotalBound.DEFAULT_SEED, FoldedNormalPower.STUDY_SEED,
                    FoldedNormalPower.STUDIES, 0.5 / Math.sqrt(FoldedNormalPower.STUDIES));
            out.println();
            out.println(SizeMessage.SHAPE_CAUTION.english());
            return;
        }
        out.printf(Locale.ROOT, "Power: the chance that grading says demonstrated: the grader's lower bound (generalized pivotal,"
                + " seed %d) reaches the requirement — simulated with seed %d (%d studies, standard error at most %.3f; only N"
                + " matters, the index uses the overall spread) and shown alone as 'bound alone' — times the chances that"
                + " the shape check (1 %%) and the stability step let a stable process of this shape through.%n",
                PivotalBound.DEFAULT_SEED, PercentilePower.STUDY_SEED, PercentilePower.studies(family),
                0.5 / Math.sqrt(PercentilePower.studies(family)));
        out.println();
        out.println(SizeMessage.SHAPE_CAUTION.english());
    }

    /** The row with the fewest readings (the smallest n among equals). */
    ShapeSizing.Row recommended() {
        ShapeSizing.Row best = null;
        for (ShapeSizing.Row r : rows) {
            if (best == null || r.readings() < best.readings()) {
                best = r;
            }
        }
        return best;
    }

    Map<String, Object> json() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("shape", declared != null ? declared.token() : family.token());
        if (declared != null) {
            m.put("plannedAs", family.token());
            m.put("thresholdNote", thresholdNote());
        }
        m.put("skewness", skewness);
        m.put(folded(family) ? "meanRatio" : family == ShapeFamily.WEIBULL ? "weibullShape" : "sigmaOfLog", parameter);
        m.put("side", side == IndexKind.Side.UPPER ? "upper" : "lower");
        m.put("method", "iso-22514-2-percentile");
        m.put("required", c0);
        m.put("confidence", confidence);
        m.put("expected", c1);
        m.put("wantedPower", power);
        m.put("pilot", pilotNote);
        m.put("boundSeed", PivotalBound.DEFAULT_SEED);
        m.put("studySeed", folded(family) ? FoldedNormalPower.STUDY_SEED : PercentilePower.STUDY_SEED);
        m.put("rows", rows.stream().map(r -> {
            Map<String, Object> row = new LinkedHashMap<>();
            row.put("subgroupSize", r.subgroupSize());
            row.put("subgroups", r.subgroups());
            row.put("readings", r.readings());
            row.put("power", r.power());
            row.put("boundPower", r.boundPower());
            row.put("recommended", r == recommended());
            return row;
        }).toList());
        return m;
    }
}

package dev.proofrun.grade;

import dev.proofrun.capability.CapabilityAnalysis;
import dev.proofrun.capability.CapabilityResult;
import dev.proofrun.control.ChartKind;
import dev.proofrun.text.UserException;
import dev.proofrun.design.Design;
import dev.proofrun.design.Requirement;
import dev.proofrun.stats.FloorBound;
import dev.proofrun.stats.PercentileIndex;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;

/**
 * Grades one characteristic from its usable subgroups: completeness, stability, shape, capability, then the
 * verdict with its reasons in that order.
 *
 * <p>Verdict rules (first that applies): not valid when the shortfall exceeds the plan's allowance, when
 * fewer than 2 subgroups are usable, when the process is unstable ({@link StabilityJudge}), when the shape the
 * plan declared does not fit ({@link ShapeJudge}) or when the required index does not exist for the limits
 * (normal model: {@link CapabilityJudge}; lognormal and Weibull: the percentile index, {@link PercentileJudge}); not demonstrated when the estimate is below c₀; demonstrated when the lower bound is
 * at or above c₀; otherwise inconclusive, with about how many more subgroups would settle it — a planning
 * figure, said with the warning that grading more data again is a new look that raises the false-pass risk and
 * with the sound way on (an extension whose boundary keeps the risk), and left out when it is beyond
 * {@value #TENFOLD} times the study. When the process is unstable the capability is still computed and shown,
 * labelled as describing the past.
 *
 * <p>At a planned look of a staged study ({@link GradedLook}) the gates are the same; the bound is taken at the
 * look's confidence and {@link LookDecision} decides: demonstrated, stopped (not demonstrated), or continue.
 */
final class CharacteristicGrader {

    private CharacteristicGrader() {
    }

    /** The "more subgroups" figure is left out beyond this many times the study's subgroups. */
    static final int TENFOLD = 10;

    static CharacteristicGrade grade(PlannedCharacteristic gc, Design design, Duration interval, ReturnedData.Collection data) {
        return grade(gc, design, interval, data, Optional.empty());
    }

    /**
     * @param look the planned look of a staged study this return is graded at; empty for a single-stage study
     */
    static CharacteristicGrade grade(PlannedCharacteristic gc, Design design, Duration interval, ReturnedData.Collection data,
            Optional<GradedLook> look) {
        Completeness c = data.completeness();
        List<double[]> subgroups = data.subgroups();
        Requirement req = gc.requirement();
        List<Reason> reasons = new ArrayList<>();
        boolean valid = true;
        look.ifPresent(l -> LookDecision.describe(l, reasons));

        if (c.adequate() && c.shortfall() == 0) {
            reasons.add(new Reason(Step.COMPLETENESS, false, GradeMessage.REASON_COMPLETE.format(c.completeSubgroups(),
                    c.plannedSubgroups(), c.subgroupSize(), c.readings())));
        } else if (c.adequate()) {
            reasons.add(new Reason(Step.COMPLETENESS, false, GradeMessage.REASON_SHORT_ALLOWED.format(c.completeSubgroups(),
                    c.plannedSubgroups(), c.allowedShortfall(), c.incompleteSubgroups(), c.missingSubgroups())));
        } else {
            valid = false;
            reasons.add(new Reason(Step.COMPLETENESS, true, GradeMessage.REASON_SHORT.format(c.completeSubgroups(),
                    c.plannedSubgroups(), c.allowedShortfall(), c.incompleteSubgroups(), c.missingSubgroups())));
        }
        if (data.outOfReach() > 0) {
            valid = false; // set aside, never passed over: see Reach
            reasons.add(new Reason(Step.COMPLETENESS, true, GradeMessage.REASON_OUT_OF_REACH.format(data.outOfReach())));
        }
        if (c.lateSubgroups() > 0) {
            reasons.add(new Reason(Step.COMPLETENESS, false, GradeMessage.REASON_LATE.format(c.lateSubgroups())));
        }
        if (c.flaggedReadings() > 0) {
            reasons.add(new Reason(Step.COMPLETENESS, false, GradeMessage.REASON_FLAGGED.format(c.flaggedReadings())));
        }
        if (subgroups.size() < 2) {
            reasons.add(new Reason(Step.STABILITY, true, GradeMessage.REASON_TOO_FEW_FOR_CHARTS.format()));
            return new CharacteristicGrade(gc.id(), gc.name(), gc.unit(), gc.limits(), req, c, subgroups, data.slots(),
                    null, null, null, null, Verdict.NOT_VALID, reasons, OptionalInt.empty(), look);
        }

        java.util.Optional<Reason> noSpread = NoSpread.check(subgroups);
        if (noSpread.isPresent()) {
            reasons.add(noSpread.get());
            return new CharacteristicGrade(gc.id(), gc.name(), gc.unit(), gc.limits(), req, c, subgroups, data.slots(),
                    null, null, null, null, Verdict.NOT_VALID, reasons, OptionalInt.empty(), look);
        }

        // the shape step (a sort of all readings) runs beside the stability step; each is seeded on its own,
        // so the result does not depend on the order, and the reasons keep the order of the steps
        List<Reason> shapeReasons = new ArrayList<>();
        GaugeStep step = GaugeStep.of(subgroups, gc.resolution());
        if (step.known()) {
            shapeReasons.add(step.reason());
        }
        FutureTask<Shape> shapeTask = new FutureTask<>(() -> step.tooCoarse() ? GaugeStep.unjudged(gc.shape())
                : gc.hasFloor()
                ? ShapeJudge.judgeFloor(subgroups, data.slots(), step.step(), gc.shape(), gc.floor(),
                        FloorBound.GAMMA_SHARE * (1 - req.confidence()), gc.limits(), shapeReasons)
                : ShapeJudge.judge(subgroups, data.slots(), step.step(), gc.shape(), gc.threshold(),
                        gc.limits(), shapeReasons));
        boolean declaredSkew = !gc.shape().isNormal();
        if (!declaredSkew && (long) subgroups.size() * subgroups.get(0).length >= PARALLEL_READINGS) {
            Thread worker = new Thread(shapeTask, "proofrun-shape-" + gc.id());
            worker.setDaemon(true);
            worker.start();
        } else {
            shapeTask.run();
        }
        // under a declared skewed shape the charts look at the readings on the normal scale of the fitted model,
        // so that the chance rate of the run rules is the one they were built for (NormalScores)
        List<double[]> charted = declaredSkew ? NormalScores.of(join(shapeTask), subgroups, reasons) : subgroups;
        Stability stability = StabilityJudge.judge(ChartKind.forMethod(design.sigmaMethod()), charted, data.slots(), reasons,
                !req.index().usesWithinSigma());
        valid &= stability.stable();
        CapabilityResult figures = figures(gc, design, subgroups);
        Shape shape = join(shapeTask);
        reasons.addAll(shapeReasons);
        valid &= shape.modelFits();

        JudgedIndex judged = null;
        IndexEvidence ev = null;
        int readings = subgroups.size() * subgroups.get(0).length;
        double conf = look.map(l -> l.look().confidence()).orElse(req.confidence());
        if (shape.modelFits() && shape.family().isNormal()) {
            judged = CapabilityJudge.judge(gc, design, subgroups);
            ev = judged == null ? null : judged.evidence(req, shape.model(), conf).scaled(shape.tailFactor(),
                    PercentileIndex.expectedPpm(gc.limits(), shape.fit()));
        } else if (shape.modelFits()) {
            ev = PercentileJudge.judge(gc, shape, readings, reasons, conf);
        }
        String symbol = req.index().symbol();
        if (ev == null) {
            if (shape.modelFits()) {
                reasons.add(new Reason(Step.CAPABILITY, true, GradeMessage.REASON_INDEX_UNDEFINED.format(symbol)));
            }
            return new CharacteristicGrade(gc.id(), gc.name(), gc.unit(), gc.limits(), req, c, subgroups, data.slots(),
                    stability, shape, null, figures, Verdict.NOT_VALID, reasons, OptionalInt.empty(), look);
        }
        double c0 = req.minimum();
        double percent = 100 * conf;
        Verdict verdict;
        OptionalInt more = OptionalInt.empty();
        if (!valid) {
            verdict = Verdict.NOT_VALID;
            reasons.add(new Reason(Step.CAPABILITY, false,
                    GradeMessage.REASON_CAPABILITY_NOT_VALID.format(symbol, ev.estimate(), ev.lower())));
            look.filter(l -> !l.last()).ifPresent(l -> reasons.add(new Reason(Step.CAPABILITY, false,
                    GradeMessage.REASON_LOOK_NOT_VALID.format(l.number(), l.of(), l.number() + 1))));
        } else if (look.isPresent()) {
            verdict = LookDecision.decide(look.get(), symbol, ev, reasons);
        } else if (ev.estimate() < c0) {
            verdict = Verdict.NOT_DEMONSTRATED;
            reasons.add(new Reason(Step.CAPABILITY, true,
                    GradeMessage.REASON_NOT_DEMONSTRATED.format(symbol, ev.estimate(), c0, percent, ev.upper())));
            reasons.add(new Reason(Step.CAPABILITY, false, ev.upper() < c0
                    ? GradeMessage.REASON_EVEN_UPPER_BELOW.format() : GradeMessage.REASON_UPPER_ABOVE.format()));
        } else if (ev.lower() >= c0) {
            verdict = Verdict.DEMONSTRATED;
            reasons.add(new Reason(Step.CAPABILITY, true,
                    GradeMessage.REASON_DEMONSTRATED.format(symbol, ev.estimate(), percent, ev.lower(), c0)));
        } else {
            verdict = Verdict.INCONCLUSIVE;
            reasons.add(new Reason(Step.CAPABILITY, true,
                    GradeMessage.REASON_INCONCLUSIVE.format(symbol, ev.estimate(), c0, percent, ev.lower())));
            more = judged != null && shape.tailFactor() == 1
                    ? CapabilityJudge.additionalSubgroups(judged, design, subgroups.size(), c0, conf)
                    : PercentileJudge.additionalSubgroups(ev, design.subgroupSize(), subgroups.size());
            if (more.isPresent() && more.getAsInt() > TENFOLD * subgroups.size()) {
                more = OptionalInt.empty();
                reasons.add(new Reason(Step.CAPABILITY, false, GradeMessage.REASON_MORE_BEYOND_TENFOLD.format(subgroups.size())));
            } else if (more.isPresent()) {
                reasons.add(new Reason(Step.CAPABILITY, false,
                        GradeMessage.REASON_MORE_SUBGROUPS.format(more.getAsInt(), span(interval.multipliedBy(more.getAsInt())))));
                reasons.add(new Reason(Step.CAPABILITY, false, GradeMessage.REASON_MORE_IS_A_NEW_LOOK.format()));
            } else {
                reasons.add(new Reason(Step.CAPABILITY, false, GradeMessage.REASON_NO_AMOUNT_SETTLES.format()));
            }
            reasons.add(new Reason(Step.CAPABILITY, false, GradeMessage.REASON_EXTEND_PROPERLY.format()));
        }
        return new CharacteristicGrade(gc.id(), gc.name(), gc.unit(), gc.limits(), req, c, subgroups, data.slots(),
                stability, shape, ev, figures, verdict, reasons, more, look);
    }

    /** Below this many readings the shape step runs on the calling thread (a thread costs more than it saves). */
    static final long PARALLEL_READINGS = 50_000;

    private static <T> T join(FutureTask<T> task) {
        try {
            return task.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while grading", e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException) {
                throw (RuntimeException) cause;
            }
            if (cause instanceof Error) {
                throw (Error) cause;
            }
            throw new IllegalStateException(cause);
        }
    }

    /**
     * The shared capability figures (as {@code estimate} computes them, less the normality test, which the shape
     * step makes on the readings spread over the gauge's resolution), or null when they cannot be computed.
     */
    private static CapabilityResult figures(PlannedCharacteristic gc, Design design, List<double[]> subgroups) {
        try {
            return CapabilityAnalysis.withoutNormality(subgroups, gc.limits(), gc.nominal(), design.sigmaMethod(),
                    gc.requirement().confidence(), design.boundMethod());
        } catch (UserException e) {
            return null;
        }
    }

    /** "about 6 h 30 min of running time". */
    static String span(Duration d) {
        long minutes = Math.round(d.getSeconds() / 60.0);
        if (minutes < 60) {
            return String.format(Locale.ROOT, "about %d min of running time", minutes);
        }
        long h = minutes / 60;
        long m = minutes % 60;
        return m == 0 ? String.format(Locale.ROOT, "about %d h of running time", h)
                : String.format(Locale.ROOT, "about %d h %d min of running time", h, m);
    }
}

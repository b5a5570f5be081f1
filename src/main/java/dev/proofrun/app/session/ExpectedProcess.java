package dev.proofrun.app.session;

import dev.proofrun.app.AppMessage;
import dev.proofrun.capability.CapabilityAnalysis;
import dev.proofrun.capability.CapabilityResult;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.ProcessFacts;
import dev.proofrun.readings.ReadingsCsv;
import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.UserException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * The expectation of the process the Goal step designs for, from each {@link ExpectationSource}: a typed
 * expected index (with the row's centring), an expected mean and σ against the limits, or pilot readings
 * (the core's readings reader and capability analysis; the estimate becomes the expectation, its lower bound
 * is shown beside it, because a pilot estimate is itself uncertain). Each answer is empty when the inputs
 * give none.
 */
public final class ExpectedProcess {

    private ExpectedProcess() {
    }

    /** The row's typed expected index with the row's centring; empty when blank, not above 0 or below the index. */
    public static Optional<Expectation> typed(CharacteristicDraft row) {
        OptionalDouble v = row.number(CharacteristicField.EXPECTED);
        if (v.isEmpty() || !(v.getAsDouble() > 0)) {
            return Optional.empty();
        }
        try {
            return Optional.of(RowRequirement.expectation(row, v.getAsDouble()));
        } catch (IllegalArgumentException belowTheIndex) {
            return Optional.empty(); // the Part table marks the Expected Cp cell
        }
    }

    /** The index a process of this mean and σ (as typed in the wizard's fields) has against the limits. */
    public static Optional<Expectation> fromMeanSigma(SpecLimits limits, String meanText, String sigmaText, IndexKind kind) {
        OptionalDouble mean = FieldNumbers.parse(meanText);
        OptionalDouble sigma = FieldNumbers.parse(sigmaText);
        if (mean.isEmpty() || sigma.isEmpty() || !(sigma.getAsDouble() > 0)) {
            return Optional.empty();
        }
        try {
            return Optional.of(ProcessFacts.of(limits, mean.getAsDouble(), sigma.getAsDouble())
                    .expectationFor(kind, new ArrayList<>()));
        } catch (UserException | IllegalArgumentException e) {
            return Optional.empty();
        }
    }

    /** The pilot's estimate of the index, off-centre when the pilot's Cp lies above it for a nearest-limit index. */
    public static Optional<Expectation> fromPilot(CapabilityResult pilot, IndexKind kind) {
        if (pilot == null) {
            return Optional.empty();
        }
        OptionalDouble est = pilot.indices().of(kind);
        if (est.isEmpty() || !(est.getAsDouble() > 0)) {
            return Optional.empty();
        }
        OptionalDouble cp = pilot.indices().cp();
        boolean offCentre = kind.side() == IndexKind.Side.NEAREST && cp.isPresent() && cp.getAsDouble() >= est.getAsDouble();
        return Optional.of(offCentre ? Expectation.offCentre(est.getAsDouble(), cp.getAsDouble())
                : Expectation.centred(est.getAsDouble()));
    }

    /**
     * Reads a file of pilot readings and analyses them against the limits, with exact bounds at the confidence.
     *
     * @throws UserException for a file the readings reader refuses
     */
    public static CapabilityResult readPilot(Path file, SpecLimits limits, OptionalDouble nominal, double confidence) {
        return CapabilityAnalysis.of(ReadingsCsv.read(file, OptionalInt.empty()).subgroups(), limits,
                nominal.isPresent() ? nominal.getAsDouble() : null, null, confidence, BoundMethod.EXACT);
    }

    /** What the pilot readings gave: counts, the estimate of the index and its lower bound at the confidence. */
    public static String pilotShown(CapabilityResult r, IndexKind kind, double confidence) {
        OptionalDouble est = r.indices().of(kind);
        OptionalDouble low = lowerOf(r, kind);
        return AppMessage.GOAL_PILOT_SHOWN.format(r.readings(), r.subgroups(), kind.symbol(), fixed(est),
                Math.round(100 * confidence), fixed(low));
    }

    private static String fixed(OptionalDouble v) {
        return v.isPresent() ? String.format(Locale.ROOT, "%.3f", v.getAsDouble()) : "—";
    }

    private static OptionalDouble lowerOf(CapabilityResult r, IndexKind k) {
        return switch (k) {
            case CP -> r.lower().cp();
            case CPK -> r.lower().cpk();
            case PP -> r.lower().pp();
            case PPK -> r.lower().ppk();
            default -> OptionalDouble.empty();
        };
    }
}

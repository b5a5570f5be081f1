package dev.proofrun.design;

import dev.proofrun.capability.CapabilityResult;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.text.UserException;
import java.util.List;
import java.util.OptionalDouble;

/**
 * An expectation estimated from pilot readings (analysed by {@code capability.CapabilityAnalysis}, the
 * same code as {@code proofrun estimate}): c₁ = the pilot's estimate of the required index and, for a
 * two-sided Cpk (Ppk), the centring from the pilot's Cp (Pp). The pilot's own sampling error is NOT in the
 * power — the power is computed as if the estimate were the truth — so a note says so and shows the
 * pilot's lower bound, which is what the process can be trusted to reach.
 */
public final class PilotExpectation {

    private PilotExpectation() {
    }

    /**
     * @throws UserException if the pilot does not define the required index
     */
    public static Expectation from(CapabilityResult pilot, IndexKind kind, List<String> notes) {
        OptionalDouble estimate = pilot.index(kind);
        if (estimate.isEmpty() || !(estimate.getAsDouble() > 0)) {
            throw new UserException(DesignMessage.BAD_EXPECTATION,
                    "the pilot readings give no positive " + kind.symbol() + " for these limits");
        }
        double c1 = estimate.getAsDouble();
        OptionalDouble bound = pilot.lowerBound(kind);
        notes.add(DesignMessage.PILOT_UNCERTAINTY.format(pilot.readings(), kind.symbol(), c1,
                100 * pilot.confidence(), bound.orElse(Double.NaN)));
        if (kind.side() == IndexKind.Side.NEAREST && pilot.limits().isTwoSided()) {
            IndexKind spread = kind.usesWithinSigma() ? IndexKind.CP : IndexKind.PP;
            double cp = pilot.index(spread).orElse(c1);
            return Expectation.offCentre(c1, Math.max(cp, c1));
        }
        return Expectation.centred(c1);
    }
}

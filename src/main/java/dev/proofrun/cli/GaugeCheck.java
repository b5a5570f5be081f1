package dev.proofrun.cli;

import dev.proofrun.design.DesignMessage;
import dev.proofrun.plan.Characteristic;
import java.util.Optional;

/**
 * The planning-time check of a characteristic's gauge: a resolution coarser than a tenth of the tolerance gets a
 * warning (common practice, the "rule of ten"), the same words {@code size --resolution} uses.
 */
final class GaugeCheck {

    private GaugeCheck() {
    }

    /** "warning: gauge resolution 0.5 is coarser than a tenth of the tolerance (2) …", or empty. */
    static Optional<String> ruleOfTen(Characteristic c) {
        if (c.gauge().isEmpty() || !c.limits().isTwoSided()) {
            return Optional.empty();
        }
        double r = c.gauge().get().resolution();
        double width = c.limits().width().getAsDouble();
        if (!(r > width / 10)) {
            return Optional.empty();
        }
        return Optional.of("warning: " + c.id() + ": " + DesignMessage.GAUGE_RESOLUTION.format(PlanSyntax.number(r),
                PlanSyntax.number(width)));
    }
}

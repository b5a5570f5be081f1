package dev.proofrun.app.sizing;

import dev.proofrun.app.AppMessage;
import dev.proofrun.design.DesignRow;
import dev.proofrun.design.DesignTable;
import dev.proofrun.design.SharedDesign;
import java.util.Optional;
import java.util.OptionalDouble;

/** The sentence under the table: what the chosen design is and what it costs against the recommendation. */
final class SizingCost {

    private SizingCost() {
    }

    /** Which characteristic the table sizes, with its requirement and expectation; empty without a request. */
    static String sizedFor(String id, Optional<dev.proofrun.design.DesignRequest> request) {
        if (request.isEmpty()) {
            return "";
        }
        dev.proofrun.design.Requirement r = request.get().requirement();
        return SizingMessage.TABLE_FOR.format(id, r.index().symbol(), SizingViewModel.fmt(r.minimum()),
                100 * r.confidence(), SizingViewModel.fmt(request.get().expectation().index()));
    }

    /** The power of the plan's own k at subgroup size n, as the core computed it. */
    record KeptPower(int n, int k, double power) {
    }

    /**
     * @param chosen the chosen row of the table (its subgroup size)
     * @param all    the table of every subgroup size
     * @param own    the table computed for the chosen size
     * @param kept   the plan's own k, if it keeps one
     * @param power  the core's power at the kept k, if computed
     * @param shared the one design for all characteristics, if there is one, with its driver's and the focus's id
     */
    static String describe(DesignRow chosen, DesignTable all, DesignTable own, Optional<Integer> kept, KeptPower power,
            SharedDesign shared, String driver, String focus) {
        if (chosen == null || all == null) {
            return "";
        }
        DesignRow r = all.recommended();
        if (kept.isPresent() && kept.get() != chosen.subgroups()) {
            String p = power != null && power.n() == chosen.subgroupSize() && power.k() == kept.get()
                    ? SizingViewModel.fmt(power.power()) : null;
            if (shared != null && shared.subgroupSize() == chosen.subgroupSize() && shared.subgroups() == kept.get()) {
                return SizingMessage.SHARED_CHOSEN.format(kept.get(), chosen.subgroupSize(), kept.get() * chosen.subgroupSize(),
                        driver, focus, chosen.subgroups(), focus, p == null ? "—" : p);
            }
            String words = p != null ? AppMessage.SIZING_POWER_AT.format(p) : keptPower(own, kept.get());
            return AppMessage.SIZING_KEPT.format(kept.get(), chosen.subgroupSize(), kept.get() * chosen.subgroupSize(),
                    words, chosen.subgroups(), SizingViewModel.fmt(chosen.power()));
        }
        if (chosen.subgroupSize() == r.subgroupSize()) {
            return AppMessage.SIZING_RECOMMENDED_CHOSEN.format(chosen.subgroups(), chosen.subgroupSize(), chosen.readings(),
                    chosen.power());
        }
        int extra = chosen.readings() - r.readings();
        return AppMessage.SIZING_OTHER_CHOSEN.format(chosen.subgroups(), chosen.subgroupSize(), chosen.readings(),
                extra >= 0 ? "+" + extra : Integer.toString(extra), r.readings(), chosen.power(), r.power(),
                SizingViewModel.fmtOrDash(chosen.falseAlarm()), SizingViewModel.fmtOrDash(r.falseAlarm()));
    }

    /**
     * The power of k subgroups read off the core's power curve: its value when the curve has a point at k,
     * else the values of the neighbouring points (power grows with k), else "not computed".
     */
    static String keptPower(DesignTable own, int k) {
        if (own == null || own.powerCurve().isEmpty()) {
            return AppMessage.SIZING_POWER_UNKNOWN.format();
        }
        OptionalDouble at = own.powerCurve().stream().filter(p -> p.subgroups() == k).mapToDouble(p -> p.power()).findFirst();
        if (at.isPresent()) {
            return AppMessage.SIZING_POWER_AT.format(SizingViewModel.fmt(at.getAsDouble()));
        }
        OptionalDouble below = own.powerCurve().stream().filter(p -> p.subgroups() < k).mapToDouble(p -> p.power()).max();
        OptionalDouble above = own.powerCurve().stream().filter(p -> p.subgroups() > k).mapToDouble(p -> p.power()).min();
        if (below.isPresent() && above.isPresent()) {
            return AppMessage.SIZING_POWER_BETWEEN.format(SizingViewModel.fmt(below.getAsDouble()),
                    SizingViewModel.fmt(above.getAsDouble()));
        }
        return AppMessage.SIZING_POWER_UNKNOWN.format();
    }
}

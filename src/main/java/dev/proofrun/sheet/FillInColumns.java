package dev.proofrun.sheet;

import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.Slot;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The columns of the fill-in file, shared by the CSV and the XLSX writer (the team's contract):
 * {@code plan,slot,characteristic,planned,taken,lot,operator,x1,...,xn,remark}, one row per slot and
 * characteristic, slots in time order and characteristics in plan order within a slot. The first four
 * are filled from the plan; people fill the rest.
 */
final class FillInColumns {

    /** Index of the first editable column ({@code taken}). */
    static final int FIRST_EDITABLE = 4;
    /** Index of the first reading column ({@code x1}). */
    static final int FIRST_READING = 7;

    private FillInColumns() {
    }

    /** The header for subgroups of n. */
    static List<String> header(int n) {
        List<String> h = new ArrayList<>(List.of("plan", "slot", "characteristic", "planned", "taken", "lot",
                "operator"));
        for (int i = 1; i <= n; i++) {
            h.add("x" + i);
        }
        h.add("remark");
        return Collections.unmodifiableList(h);
    }

    /** Number of columns for subgroups of n. */
    static int width(int n) {
        return FIRST_READING + n + 1;
    }

    /** The four prefilled cells of a row, as plain values (not yet made inert). */
    static List<String> prefilled(StudyPlan plan, Slot slot, Characteristic c) {
        return List.of(plan.reference(), slot.id(), c.id(), Values.planned(slot.start()));
    }
}

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
 * are filled from the plan; people fill the rest. A staged plan's file ends with one more prefilled column,
 * {@code stage}: the number of the stage the slot belongs to (the grader reads the plan's stages, not this
 * column, and reads files without it).
 */
final class FillInColumns {

    /** Index of the first editable column ({@code taken}). */
    static final int FIRST_EDITABLE = 4;
    /** Index of the first reading column ({@code x1}). */
    static final int FIRST_READING = 7;

    private FillInColumns() {
    }

    /** The header for subgroups of n, with the {@code stage} column for a staged plan. */
    static List<String> header(StudyPlan plan) {
        List<String> h = new ArrayList<>(header(plan.design().subgroupSize()));
        if (plan.isStaged()) {
            h.add("stage");
        }
        return Collections.unmodifiableList(h);
    }

    /** Number of columns of the plan's file. */
    static int width(StudyPlan plan) {
        return width(plan.design().subgroupSize()) + (plan.isStaged() ? 1 : 0);
    }

    /**
     * The stage of each slot, 1-based, in slot order: slot i belongs to the first stage whose look is at or after
     * it. All 1 for a single-stage plan.
     */
    static int[] stageOfSlot(StudyPlan plan) {
        int[] stage = new int[plan.schedule().slots().size()];
        java.util.Arrays.fill(stage, 1);
        plan.stages().ifPresent(st -> {
            int from = 0;
            for (int j = 0; j < st.count(); j++) {
                int to = st.looks().get(j).subgroups();
                java.util.Arrays.fill(stage, from, to, j + 1);
                from = to;
            }
        });
        return stage;
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
        return List.of(plan.reference(), slot.id(), c.id(), SheetNumbers.planned(slot.start()));
    }
}

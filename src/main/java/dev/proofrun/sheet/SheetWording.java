package dev.proofrun.sheet;

import java.util.List;
import java.util.Locale;

/**
 * The words of the collection sheet: the instructions for the people who take the readings and the
 * caution about what a capability study shows. Plain sentences, one idea each, in the order a collector
 * needs them.
 */
final class SheetWording {

    /** The caution shown wherever a study's outcome is discussed (team rule; see DOMAIN.md "Cautions"). */
    static final List<String> CAUTION = List.of(
            "A capability study gives a statistical statement under assumptions: a stable process, independent "
                    + "readings, a fitting distribution model and a capable gauge.",
            "Its result does not replace the customer's requirements, the applicable standards and local codes, "
                    + "licensed professional practice, or the extra controls that safety-critical characteristics "
                    + "need.");

    /** The reaction line's lead, bold on the sheet. */
    static final String REACTION_HEAD = "A reading outside its limits:";
    /** What to do with it (common practice for a nonconforming part found during a study). */
    static final String REACTION = "stop collecting, tag the part and keep it apart, note slot and box in the "
            + "remark.";
    /** Whom to call, before the next reading: the name is written by hand on the ruled field after it. */
    static final String REACTION_CALL = "Call before going on:";
    /** The hint under the right end of the call field. */
    static final String REACTION_FIELD = "(name and phone)";

    private SheetWording() {
    }

    /**
     * The mark after the last slot of a stage that is not the last: where the collectors stop and send the file.
     *
     * @param stage    the stage that ends, 1-based
     * @param of       how many stages the plan has
     * @param endSlot  its last slot
     * @param nextFrom the first slot of the next stage
     * @param nextTo   the last slot of the next stage
     */
    static String stageEnds(int stage, int of, String endSlot, String nextFrom, String nextTo) {
        return String.format(Locale.ROOT, "Stage %d of %d ends after slot %s: stop here and send the fill-in file back"
                + " now, with every reading so far. Collect stage %d (slots %s to %s) only when the grade says"
                + " continue.", stage, of, endSlot, stage + 1, nextFrom, nextTo);
    }

    /** The paragraph of the opening pages that explains a staged plan. */
    static String stagesIntro(int of, String ends) {
        ends = ends.contains(",") ? ends.substring(0, ends.lastIndexOf(',')) + " and" + ends.substring(ends.lastIndexOf(',') + 1)
                : ends;
        return String.format(Locale.ROOT, "This study is collected in %d stages. After each stage but the last the"
                + " fill-in file goes back for grading: it may settle the question early, and then the later stages"
                + " are not collected. The stages before the last end after slot %s; the slot table marks each end.", of, ends);
    }

    /**
     * The numbered instructions.
     *
     * @param n subgroup size
     */
    static List<String> instructions(int n) {
        String parts = n == 1 ? "one part" : String.format(Locale.ROOT, "%d consecutive parts", n);
        String readings = n == 1 ? "its reading" : String.format(Locale.ROOT, "the %d readings", n);
        return List.of(
                String.format(Locale.ROOT, "At each slot, take %s as they come off the process, inside the slot's "
                        + "window. Do not pick parts, do not skip parts.", parts),
                String.format(Locale.ROOT, "Measure every characteristic listed above on each part and write %s in "
                        + "the boxes 1 to %d of its line, in the order the parts were made.", readings, n),
                "Write each reading to the gauge's resolution, exactly as the gauge shows it: no rounding, no "
                        + "dropped digits, no units in the boxes.",
                "Write the time the parts were taken (hh:mm), the material lot and your initials for every slot.",
                "Run the process as usual. Do not adjust, re-set or tune it because of the study; a change that "
                        + "production needs anyway goes in the remark with its time.",
                "Slot missed (no production, machine down, too late for the window): leave its boxes empty and "
                        + "write the reason in the remark. Do not make it up later.",
                "Part scrapped, damaged or lost before it was measured: leave its box empty, write which box and "
                        + "why in the remark. Do not replace it with another part.",
                "A reading that looks wrong: measure again, write the value you trust, note it in the remark; "
                        + "never erase. Outside its limits: as the line above the table says.",
                "Return this sheet and the fill-in file (CSV or XLSX) unchanged in layout: the prefilled plan, "
                        + "slot, characteristic and planned columns must stay as they are.");
    }
}

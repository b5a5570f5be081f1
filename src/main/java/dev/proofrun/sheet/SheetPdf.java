package dev.proofrun.sheet;

import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.Slot;
import dev.proofrun.paper.Flow;
import dev.proofrun.paper.Framed;
import dev.proofrun.paper.Paragraph;
import dev.proofrun.paper.LineStyle;
import dev.proofrun.text.UserException;
import dev.proofrun.paper.PageHeading;
import dev.proofrun.paper.Pages;
import dev.proofrun.paper.Paper;
import java.io.OutputStream;
import java.util.List;

/**
 * Writes the printed collection sheet: the opening pages ({@link IntroPage}), then the slot table
 * ({@link SlotTable}) from a new page. Every page carries the part, the plan id with its revision and
 * "page x of y"; a draft is marked DRAFT across every page. A staged plan's table carries a framed line after the
 * last slot of each stage but the last: stop, send the file back, collect the next stage only on "continue".
 */
public final class SheetPdf {

    private SheetPdf() {
    }

    /**
     * Writes the sheet. The caller decides whether a draft may be printed ({@link SheetFiles} refuses it
     * without {@code --draft}); here an unissued plan is always marked DRAFT.
     *
     * @param plan  the plan
     * @param paper A4 or Letter
     * @param out   where to write; not closed
     * @throws UserException if one slot's boxes (characteristics × lines of boxes) are taller than a page
     */
    public static void write(StudyPlan plan, Paper paper, OutputStream out) {
        boolean draft = !plan.isIssued();
        // the revision as people say it beside the fingerprint: "Plan PR-2027-0311, revision 2 (3f2a9c01b7de)"
        String identity = "Plan " + plan.id() + ", " + plan.revisionWords();
        PageHeading heading = new PageHeading(plan.part().name() + partSuffix(plan), "Collection sheet", identity,
                "Fill-in file: " + plan.id() + "-fill-in.csv or .xlsx (keep the prefilled columns as printed)",
                draft);
        try (Pages pages = Pages.open(paper, heading)) {
            Flow flow = new Flow(pages);
            new IntroPage(plan, pages).place(flow, draft);
            SlotTable table = new SlotTable(plan.characteristics(), plan.design().subgroupSize(), pages.regular(),
                    pages.bold(), flow.width());
            float room = pages.bodyHeight() - table.header().height(flow.width());
            if (table.blockHeight() > room) {
                String sheet = paper.token();
                int largest = table.largestSubgroupSize(room);
                throw largest > 0
                        ? new UserException(SheetMessage.SLOT_TOO_TALL, plan.characteristics().size(), plan.design().subgroupSize(),
                                sheet, largest)
                        : new UserException(SheetMessage.TOO_MANY_CHARACTERISTICS, plan.characteristics().size(), sheet,
                                SlotTable.characteristicsPerPage(room));
            }
            flow.newPage();
            flow.startTable(table.header());
            List<Slot> slots = plan.schedule().slots();
            float block = table.blockHeight();
            int[] stage = FillInColumns.stageOfSlot(plan);
            for (int i = 0; i < slots.size(); i++) {
                if (lastWouldBeAlone(slots.size() - i, flow.remaining(), block)) {
                    flow.newPage(); // the last two slots share the last page: none stands alone on it
                }
                flow.place(table.slot(slots.get(i)));
                if (i + 1 < slots.size() && stage[i + 1] != stage[i]) {
                    int next = plan.stages().orElseThrow().looks().get(stage[i]).subgroups();
                    flow.place(new Framed(List.of(Paragraph.of(SheetWording.stageEnds(stage[i], stage[slots.size() - 1],
                            slots.get(i).id(), slots.get(i + 1).id(), slots.get(next - 1).id()), pages.bold(), 9f)),
                            4f, LineStyle.RULE, 1f));
                }
            }
            flow.endTable();
            pages.write(out);
        }
    }

    /**
     * Whether placing the next slot here would leave the last slot alone on a page of its own: two slots are
     * left and the page has room for this one but not both. Then both go to the next page together.
     *
     * @param left      slots still to place, this one included
     * @param remaining room left on the current page
     * @param block     height of one slot block
     */
    static boolean lastWouldBeAlone(int left, float remaining, float block) {
        return left == 2 && remaining >= block && remaining < 2 * block;
    }

    private static String partSuffix(StudyPlan plan) {
        String number = plan.part().number();
        return number == null || number.isBlank() ? "" : "  (" + number + ")";
    }
}

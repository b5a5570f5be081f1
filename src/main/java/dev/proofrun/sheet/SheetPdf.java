package dev.proofrun.sheet;

import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.Slot;
import dev.proofrun.paper.Flow;
import dev.proofrun.text.UserException;
import dev.proofrun.paper.PageHeading;
import dev.proofrun.paper.Pages;
import dev.proofrun.paper.Paper;
import java.io.OutputStream;
import java.util.List;

/**
 * Writes the printed collection sheet: the opening pages ({@link IntroPage}), then the slot table
 * ({@link SlotTable}) from a new page. Every page carries the part, the plan id with its revision and
 * "page x of y"; a draft is marked DRAFT across every page.
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
        String identity = "Plan " + plan.id() + " @ " + plan.revision().orElse("DRAFT");
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
                String sheet = paper.name().toLowerCase(java.util.Locale.ROOT);
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
            for (int i = 0; i < slots.size(); i++) {
                if (lastWouldBeAlone(slots.size() - i, flow.remaining(), block)) {
                    flow.newPage(); // the last two slots share the last page: none stands alone on it
                }
                flow.place(table.slot(slots.get(i)));
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

package dev.proofrun.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.Slot;
import dev.proofrun.paper.Ink;
import dev.proofrun.paper.Paper;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;

/** The printed collection sheet, read back with PDFBox. */
class SheetPdfTest {

    static byte[] pdf(StudyPlan plan, Paper paper) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        SheetPdf.write(plan, paper, out);
        return out.toByteArray();
    }

    static String text(PDDocument doc, int from, int to) throws IOException {
        PDFTextStripper s = new PDFTextStripper();
        s.setStartPage(from);
        s.setEndPage(to);
        return s.getText(doc);
    }

    @Test
    void theDemoSheetCarriesEverySlotCharacteristicLimitAndTheFingerprint() throws IOException {
        StudyPlan plan = DemoPlan.create();
        try (PDDocument doc = Loader.loadPDF(pdf(plan, Paper.A4))) {
            String all = text(doc, 1, doc.getNumberOfPages());
            for (Slot s : plan.schedule().slots()) {
                assertTrue(all.contains(s.id()), s.id());
            }
            for (Characteristic c : plan.characteristics()) {
                assertTrue(all.contains(c.id()), c.id());
                assertTrue(all.contains(c.name()), c.name());
                assertTrue(all.contains(c.gauge().orElseThrow().name()), "gauge of " + c.id());
            }
            // the limits of plans/demo-valve-body.json, written to the gauges' resolution (0.0005, 0.01, 0.01)
            assertTrue(all.contains("21.9870 to 22.0130"), "D1 limits");
            assertTrue(all.contains("at most 0.80"), "R4 upper limit");
            assertTrue(all.contains("at least 4.50"), "F7 lower limit");
            // the frequency sentence is wrapped over lines and starts with a capital on the sheet
            assertTrue(all.replaceAll("\\s+", " ").contains(plan.summary().substring(1)), "frequency sentence");
            assertTrue(all.contains("5 consecutive parts"), "subgroup size");
            assertTrue(all.contains("does not replace the customer's requirements"), "caution");
            String revision = plan.revision().orElseThrow();
            int pages = doc.getNumberOfPages();
            for (int p = 1; p <= pages; p++) {
                String page = text(doc, p, p);
                // the revision said aloud beside the fingerprint (the demo plan is its first issue: revision 1)
                assertTrue(page.contains("Plan " + plan.id() + ", revision 1 (" + revision + ")"), "fingerprint on page " + p);
                assertTrue(page.contains("page " + p + " of " + pages), "page number on page " + p);
                assertTrue(page.contains("valve body"), "part on page " + p);
                assertTrue(!page.contains("DRAFT"), "an issued plan is not marked DRAFT");
            }
        }
    }

    /**
     * Every slot band prints its characteristic's limits, two-sided ones too (D1's "21.9870–22.0130" was left
     * out when it did not fit the column); every table page opens with the reaction line and its call field;
     * the last page holds at least two slots; names in the opening lines do not run into the next label.
     */
    @Test
    void everyBandCarriesItsLimitsAndEveryTablePageTheReactionLine() throws IOException {
        StudyPlan plan = DemoPlan.create();
        try (PDDocument doc = Loader.loadPDF(pdf(plan, Paper.A4))) {
            int pages = doc.getNumberOfPages();
            int slotsSeen = 0;
            int lastPageSlots = 0;
            for (int p = 1; p <= pages; p++) {
                String page = text(doc, p, p);
                int slotsHere = 0;
                for (Slot s : plan.schedule().slots()) {
                    if (page.contains(s.id() + " ")) {
                        slotsHere++;
                    }
                }
                if (!page.contains("Readings, part 1 to")) {
                    continue; // an opening page (it names the first and last slot)
                }
                slotsSeen += slotsHere;
                lastPageSlots = slotsHere;
                assertTrue(page.contains(SheetWording.REACTION_HEAD), "reaction line on page " + p);
                assertTrue(page.contains(SheetWording.REACTION_CALL), "call field on page " + p);
                // each characteristic's limits once per slot block on the page
                for (Characteristic c : plan.characteristics()) {
                    assertEquals(slotsHere, count(page, SheetNumbers.range(c)), SheetNumbers.range(c) + " on page " + p);
                }
            }
            assertEquals(plan.schedule().slots().size(), slotsSeen, "every slot once");
            assertTrue(lastPageSlots >= 2, "the last page holds " + lastPageSlots + " slot(s)");
            String opening = text(doc, 1, 1);
            assertTrue(opening.contains("Prepared by: " + plan.people().author() + "\n")
                    || opening.contains("Prepared by: " + plan.people().author() + "\r"), "author on a line of its own");
        }
        // the demo's limits as the bands print them (plans/demo-valve-body.json, gauges' resolution)
        assertEquals("21.9870\u201322.0130", SheetNumbers.range(plan.characteristics().get(0)));
    }

    @Test
    void theLastSlotNeverStandsAloneOnAPage() {
        assertTrue(SheetPdf.lastWouldBeAlone(2, 60f, 57f), "room for one of the last two: break before them");
        assertTrue(!SheetPdf.lastWouldBeAlone(2, 120f, 57f), "room for both");
        assertTrue(!SheetPdf.lastWouldBeAlone(3, 60f, 57f), "three left: the last page gets two anyway");
        assertTrue(!SheetPdf.lastWouldBeAlone(1, 60f, 57f), "a one-slot plan");
    }

    /**
     * 500 slots × 5 characteristics × n = 5 on A4: the body is 841.89 − 2·32 (margins) − 34 (heading) − 20
     * (footer) = 723.89 pt; the table header takes 53 pt (26 reaction line + 27 labels), leaving 670.89 pt; a
     * slot block is 5 bands × 19 pt = 95 pt, so 7 blocks fit a page (665 pt; 8 would need 760). 500 / 7 → 72
     * table pages (the last with 3 slots), plus the one opening page: 73. On Letter (792 pt): 792 − 118 − 53 =
     * 621 pt → 6 blocks (570 pt), 84 table pages (the last with 2); Letter is
     * 50 pt shorter and the five-row characteristic table pushes the signature block onto a second opening
     * page (the table always starts on a fresh page): 86 in all.
     */
    @Test
    void a500SlotPlanRunsOverTheExpectedNumberOfPagesWithEverySlotOnce() throws IOException {
        StudyPlan plan = SheetFixtures.plan("PR-BIG-1", 500, 5, 5, true);
        try (PDDocument doc = Loader.loadPDF(pdf(plan, Paper.A4))) {
            assertEquals(73, doc.getNumberOfPages());
            StringBuilder all = new StringBuilder();
            for (int p = 2; p <= doc.getNumberOfPages(); p++) {
                String page = text(doc, p, p);
                all.append(page);
                assertTrue(page.contains("Readings, part 1 to 5"), "table header repeats on page " + p);
                long blocks = java.util.regex.Pattern.compile("\\bS\\d{3}\\b").matcher(page).results().count();
                assertTrue(blocks <= 7 && (blocks == 7 || p == doc.getNumberOfPages()),
                        "page " + p + " has " + blocks + " slots");
            }
            for (Slot s : plan.schedule().slots()) {
                assertEquals(1, count(all.toString(), s.id()), s.id() + " once in the slot table");
            }
        }
        try (PDDocument doc = Loader.loadPDF(pdf(plan, Paper.LETTER))) {
            assertEquals(86, doc.getNumberOfPages());
            assertTrue(text(doc, 2, 2).contains("Signatures"), "signatures on the second opening page");
            assertEquals(612f, doc.getPage(0).getMediaBox().getWidth(), 0.01f);
        }
    }

    @Test
    void largeSubgroupsWrapTheirBoxesOntoSeveralLines() throws IOException {
        StudyPlan plan = SheetFixtures.plan("PR-WIDE", 12, 2, 12, true);
        try (PDDocument doc = Loader.loadPDF(pdf(plan, Paper.A4))) {
            String table = text(doc, 2, doc.getNumberOfPages());
            assertTrue(table.contains("numbered in the box"));
            assertTrue(table.contains("12"), "box 12 is labelled");
        }
    }

    @Test
    void renderedPagesAreNotBlank() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf(DemoPlan.create(), Paper.A4))) {
            PDFRenderer r = new PDFRenderer(doc);
            for (int p : List.of(0, 1)) {
                BufferedImage image = r.renderImage(p, 0.5f);
                long dark = Ink.darkPixels(image);
                long total = (long) image.getWidth() * image.getHeight();
                assertTrue(dark > total / 100, "page " + (p + 1) + " has ink: " + dark + " of " + total);
                assertTrue(dark < total / 2, "page " + (p + 1) + " is not a black block");
            }
        }
    }

    @Test
    void aDraftIsMarkedOnEveryPage() throws IOException {
        StudyPlan plan = SheetFixtures.plan("PR-D", 40, 2, 5, false);
        try (PDDocument doc = Loader.loadPDF(pdf(plan, Paper.A4))) {
            assertTrue(doc.getNumberOfPages() >= 3);
            for (int p = 1; p <= doc.getNumberOfPages(); p++) {
                assertTrue(text(doc, p, p).contains("DRAFT"), "DRAFT on page " + p);
            }
        }
    }

    static int count(String text, String part) {
        int n = 0;
        for (int i = text.indexOf(part); i >= 0; i = text.indexOf(part, i + part.length())) {
            n++;
        }
        return n;
    }
}

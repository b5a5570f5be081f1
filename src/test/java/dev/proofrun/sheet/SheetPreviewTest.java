package dev.proofrun.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.plan.StudyPlan;
import dev.proofrun.paper.Ink;
import dev.proofrun.paper.Paper;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.Test;

/** The preview is the sheet's own PDF, page by page, at the size the paper and resolution give. */
class SheetPreviewTest {

    @Test
    void oneImagePerPageOfTheSheetAtThePapersSize() throws Exception {
        StudyPlan plan = SheetFixtures.plan("PV-1", 30, 2, 5, true);
        ByteArrayOutputStream pdf = new ByteArrayOutputStream();
        SheetPdf.write(plan, Paper.A4, pdf);
        int pageCount;
        try (PDDocument doc = Loader.loadPDF(pdf.toByteArray())) {
            pageCount = doc.getNumberOfPages();
        }
        List<BufferedImage> pages = SheetPreview.pages(plan, Paper.A4, 60f, () -> false);
        assertEquals(pageCount, pages.size());
        // A4 is 595.28 x 841.89 pt (ISO 216: 210 x 297 mm); at 60 dpi floor(595.28 * 60 / 72) = 496 and
        // floor(841.89 * 60 / 72) = 701 pixels
        assertEquals(496, pages.get(0).getWidth());
        assertEquals(701, pages.get(0).getHeight());
        // Letter is 612 x 792 pt (8.5 x 11 in): 510 x 660 pixels at 60 dpi
        BufferedImage letter = SheetPreview.pages(plan, Paper.LETTER, 60f, () -> false).get(0);
        assertEquals(510, letter.getWidth());
        assertEquals(660, letter.getHeight());
        assertTrue(Ink.darkPixels(pages.get(0)) > 1000, "the first page carries print");
    }

    @Test
    void stopsWhenCancelledAndRefusesANonsenseResolution() {
        StudyPlan plan = SheetFixtures.plan("PV-2", 30, 1, 5, false);
        assertEquals(0, SheetPreview.pages(plan, Paper.A4, 60f, () -> true).size());
        int[] asked = {0};
        assertEquals(1, SheetPreview.pages(plan, Paper.A4, 30f, () -> asked[0]++ >= 1).size());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SheetPreview.pages(plan, Paper.A4, 0f, () -> false));
        assertEquals("dpi must be positive: 0.0", e.getMessage());
    }
}

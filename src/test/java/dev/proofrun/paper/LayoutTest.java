package dev.proofrun.paper;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;

/** The layout toolkit: wrapping, pagination, running headings, embedded fonts. */
class LayoutTest {

    private static final PageHeading HEADING =
            new PageHeading("Bracket 4711", "layout test", "T-1 @ 0123456789ab", "footnote here", false);

    @Test
    void wrappedLinesFitTheirWidthAndKeepEveryWord() {
        try (Pages pages = Pages.open(Paper.A4, HEADING)) {
            Typeface face = pages.regular();
            String text = "Take five consecutive parts at each slot and write the time they were taken. "
                    + "Averyveryveryverylongwordwithoutanyspacesthatmustbecut somewhere.";
            List<String> lines = LineBreaker.wrap(text, face, 9, 120);
            assertTrue(lines.size() > 3);
            for (String line : lines) {
                assertTrue(face.width(line, 9) <= 120.001f, line);
            }
            assertEquals(text.replace(" ", ""), String.join("", lines).replace(" ", ""));
            assertEquals(List.of("a", "", "b"), LineBreaker.wrap("a\n\nb", face, 9, 100));
        }
    }

    @Test
    void unknownGlyphsAndControlCharactersArePrintable() {
        try (Pages pages = Pages.open(Paper.A4, HEADING)) {
            Typeface face = pages.regular();
            assertEquals("a b", face.printable("a\tb"));
            // U+4E2D (a CJK ideograph) is not in DejaVu Sans 2.37 (no CJK block)
            assertEquals("x?", face.printable("x\u4E2D"));
            assertEquals("µm ±0.05 – Ø", face.printable("µm ±0.05 – Ø"));
        }
    }

    @Test
    void tableRowsNeverSplitAndTheHeaderRepeats() throws IOException {
        int rowsWanted = 150;
        byte[] pdf;
        try (Pages pages = Pages.open(Paper.LETTER, HEADING)) {
            TextTable table = TextTable.of(List.of(TextTable.Column.left("Which", 1),
                    TextTable.Column.left("Note", 3)), pages.regular(), pages.bold(), 9);
            Flow flow = new Flow(pages);
            flow.place(Paragraph.of("Before the table.", pages.regular(), 10));
            flow.startTable(table.header());
            for (int i = 1; i <= rowsWanted; i++) {
                String note = i % 7 == 0 ? "first line of R" + i + "\nsecond line of R" + i : "one line R" + i;
                flow.place(table.row("R" + i + ";", note));
            }
            flow.endTable();
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            pages.write(out);
            pdf = out.toByteArray();
        }
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            int n = doc.getNumberOfPages();
            assertTrue(n >= 4, "150 rows run over several pages, got " + n);
            List<String> seen = new ArrayList<>();
            for (int p = 1; p <= n; p++) {
                String text = pageText(doc, p);
                assertTrue(text.contains("Which") && text.contains("Note"), "header on page " + p);
                assertTrue(text.contains("page " + p + " of " + n), "page number on page " + p);
                assertTrue(text.contains("T-1 @ 0123456789ab"), "identity on page " + p);
                for (int i = 1; i <= rowsWanted; i++) {
                    if (text.contains("R" + i + ";")) {
                        seen.add("R" + i);
                        if (i % 7 == 0) {
                            assertTrue(text.contains("first line of R" + i) && text.contains("second line of R" + i),
                                    "row R" + i + " split");
                        }
                    }
                }
            }
            assertEquals(rowsWanted, seen.size(), "every row exactly once");
            for (PDPage page : doc.getPages()) {
                for (COSName name : page.getResources().getFontNames()) {
                    PDFont font = page.getResources().getFont(name);
                    assertTrue(font.isEmbedded(), font.getName() + " embedded");
                }
            }
            BufferedImage image = new PDFRenderer(doc).renderImage(0, 0.5f);
            assertTrue(Ink.darkPixels(image) > 500, "the first page has ink");
        }
    }

    @Test
    void aBlockTallerThanAPageIsRefused() {
        try (Pages pages = Pages.open(Paper.A4, HEADING)) {
            Flow flow = new Flow(pages);
            assertThrows(IllegalArgumentException.class, () -> flow.place(Block.space(pages.bodyHeight() + 1)));
            flow.place(Block.space(pages.bodyHeight()));
            assertEquals(1, pages.pageCount());
            assertFalse(flow.remaining() > 0.01f);
        }
    }

    static String pageText(PDDocument doc, int page) throws IOException {
        PDFTextStripper stripper = new PDFTextStripper();
        stripper.setStartPage(page);
        stripper.setEndPage(page);
        return stripper.getText(doc);
    }
}

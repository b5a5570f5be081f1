package dev.proofrun.sheet;

import dev.proofrun.plan.StudyPlan;
import dev.proofrun.paper.Paper;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.BooleanSupplier;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;

/**
 * The collection sheet as pictures of its pages, for a preview on screen: the same PDF {@link SheetPdf} writes
 * (an unissued plan marked DRAFT), each page rendered to an RGB image by PDFBox. The caller turns the images
 * into whatever its toolkit shows; nothing here knows a window.
 */
public final class SheetPreview {

    private SheetPreview() {
    }

    /**
     * Renders every page of the plan's sheet.
     *
     * @param plan      the plan, issued or not
     * @param paper     A4 or Letter
     * @param dpi       pixels per inch of paper (60 gives an A4 page of 496 × 702 pixels)
     * @param cancelled asked before each page; rendering stops with the pages done so far when it says true
     * @return one image per page, in page order
     * @throws IllegalArgumentException if dpi is not a positive finite number
     * @throws dev.proofrun.text.UserException as {@link SheetPdf#write} does (a slot taller than a page)
     */
    public static List<BufferedImage> pages(StudyPlan plan, Paper paper, float dpi, BooleanSupplier cancelled) {
        if (!(dpi > 0) || !Float.isFinite(dpi)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "dpi must be positive: %s", dpi));
        }
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        SheetPdf.write(plan, paper, bytes);
        List<BufferedImage> out = new ArrayList<>();
        try (PDDocument doc = Loader.loadPDF(bytes.toByteArray())) {
            PDFRenderer renderer = new PDFRenderer(doc);
            for (int i = 0; i < doc.getNumberOfPages() && !cancelled.getAsBoolean(); i++) {
                out.add(renderer.renderImageWithDPI(i, dpi));
            }
        } catch (IOException e) {
            throw new UncheckedIOException("the sheet written in memory could not be read back", e);
        }
        return out;
    }
}

package dev.proofrun.paper;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.util.Locale;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.PDPageContentStream.AppendMode;

/**
 * A PDF being built page by page, with a {@link PageHeading} on every page.
 *
 * <p>The body of each page is drawn first; the heading, footer and "page x of y" are added in a final
 * pass when the document is written, because only then is the page count known. A draft's DRAFT mark is
 * put beneath the body (prepended), so it never hides what is written over it.
 *
 * <p>Geometry (points): margins {@value #MARGIN} on every side; the heading band takes
 * {@value #HEAD} below the top margin, the footer band {@value #FOOT} above the bottom margin.
 */
public final class Pages implements AutoCloseable {

    /** Margin on every side, about 11 mm: inside what office printers can reach. */
    public static final float MARGIN = 32f;
    /** Height of the heading band. */
    public static final float HEAD = 34f;
    /** Height of the footer band. */
    public static final float FOOT = 20f;

    private static final float TITLE_SIZE = 11f;
    private static final float SMALL = 8f;

    private final PDDocument document = new PDDocument();
    private final Paper paper;
    private final PageHeading heading;
    private final Typeface regular;
    private final Typeface bold;
    private PageCanvas canvas;

    private Pages(Paper paper, PageHeading heading) {
        this.paper = paper;
        this.heading = heading;
        this.regular = Typeface.load(document, Typeface.Style.REGULAR);
        this.bold = Typeface.load(document, Typeface.Style.BOLD);
    }

    /** Starts an empty document on the given paper. */
    public static Pages open(Paper paper, PageHeading heading) {
        return new Pages(paper, heading);
    }

    public Typeface regular() {
        return regular;
    }

    public Typeface bold() {
        return bold;
    }

    public Paper paper() {
        return paper;
    }

    /** Starts a new page and returns its canvas (the previous page's canvas is closed). */
    public PageCanvas newPage() {
        closeCanvas();
        PDPage page = new PDPage(paper.mediaBox());
        document.addPage(page);
        try {
            canvas = new PageCanvas(new PDPageContentStream(document, page, AppendMode.APPEND, true, true));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return canvas;
    }

    /** The canvas of the current page; starts the first page if there is none yet. */
    public PageCanvas canvas() {
        return canvas == null ? newPage() : canvas;
    }

    /** Pages so far. */
    public int pageCount() {
        return document.getNumberOfPages();
    }

    public float bodyLeft() {
        return MARGIN;
    }

    public float bodyRight() {
        return paper.width() - MARGIN;
    }

    public float bodyTop() {
        return paper.height() - MARGIN - HEAD;
    }

    public float bodyBottom() {
        return MARGIN + FOOT;
    }

    public float bodyWidth() {
        return bodyRight() - bodyLeft();
    }

    public float bodyHeight() {
        return bodyTop() - bodyBottom();
    }

    /**
     * Adds the headings and writes the document. The document is closed afterwards.
     *
     * @param out where to write
     */
    public void write(OutputStream out) {
        closeCanvas();
        if (document.getNumberOfPages() == 0) {
            newPage();
            closeCanvas();
        }
        try {
            int pages = document.getNumberOfPages();
            for (int i = 0; i < pages; i++) {
                PDPage page = document.getPage(i);
                try (PageCanvas c = new PageCanvas(new PDPageContentStream(document, page, AppendMode.APPEND, true, true))) {
                    decorate(c, i + 1, pages);
                }
                if (heading.draft()) {
                    try (PageCanvas c = new PageCanvas(new PDPageContentStream(document, page, AppendMode.PREPEND, true, true))) {
                        draftMark(c);
                    }
                }
            }
            PDDocumentInformation info = document.getDocumentInformation();
            info.setTitle(heading.title() + " - " + heading.subtitle());
            info.setSubject(heading.identity());
            info.setCreator("proofrun");
            document.save(out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } finally {
            close();
        }
    }

    private void decorate(PageCanvas c, int page, int pages) {
        float top = paper.height() - MARGIN;
        float left = bodyLeft();
        float right = bodyRight();
        c.fillGray(0);
        float titleBase = top - bold.ascent(TITLE_SIZE);
        float identityWidth = bold.width(heading.identity(), 10f);
        float titleRoom = right - left - identityWidth - 12;
        c.text(bold, TITLE_SIZE, left, titleBase, LineBreaker.fit(heading.title(), bold, TITLE_SIZE, titleRoom));
        c.textRight(bold, 10f, right, titleBase, heading.identity());
        c.text(regular, SMALL + 1, left, titleBase - 13, LineBreaker.fit(heading.subtitle(), regular, SMALL + 1, right - left));
        c.pen(LineStyle.RULE);
        float rule = top - HEAD + 6;
        c.line(left, rule, right, rule);

        float footRule = MARGIN + FOOT - 6;
        c.pen(LineStyle.HAIR);
        c.line(left, footRule, right, footRule);
        String pageText = String.format(Locale.ROOT, "page %d of %d", page, pages);
        float footBase = MARGIN + 2;
        c.textRight(bold, SMALL + 1, right, footBase, pageText);
        float room = right - left - bold.width(pageText, SMALL + 1) - 12;
        c.text(regular, SMALL, left, footBase, LineBreaker.fit(heading.footnote(), regular, SMALL, room));
    }

    private void draftMark(PageCanvas c) {
        float size = 120f;
        String word = "DRAFT";
        double angle = Math.atan2(paper.height(), paper.width());
        float w = bold.width(word, size);
        float cx = paper.width() / 2;
        float cy = paper.height() / 2;
        // start point so that the rotated word is centred on the page
        float x = (float) (cx - Math.cos(angle) * w / 2 + Math.sin(angle) * bold.capHeight(size) / 2);
        float y = (float) (cy - Math.sin(angle) * w / 2 - Math.cos(angle) * bold.capHeight(size) / 2);
        c.fillGray(0.85f);
        c.textRotated(bold, size, x, y, angle, word);
        c.fillGray(0);
    }

    private void closeCanvas() {
        if (canvas != null) {
            canvas.close();
            canvas = null;
        }
    }

    @Override
    public void close() {
        closeCanvas();
        try {
            document.close();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}

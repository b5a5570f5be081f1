package dev.proofrun.paper;

import java.util.List;
import java.util.Locale;

/**
 * Places blocks down the body of successive pages. A block never splits (save a paragraph taller than a
 * page, see {@link #place}): when it does not fit in what is left of a page, a new page starts. Inside a table ({@link #startTable}) the table's header block is
 * repeated at the top of every page the table runs onto.
 */
public final class Flow {

    private final Pages pages;
    private PageCanvas canvas;
    private float cursor;
    private Block tableHeader;

    /** A flow over the document's pages, starting on a new page. */
    public Flow(Pages pages) {
        this.pages = pages;
    }

    /** The width blocks are laid out in. */
    public float width() {
        return pages.bodyWidth();
    }

    /** Space left on the current page, in points (the full body height before the first page). */
    public float remaining() {
        return canvas == null ? pages.bodyHeight() : cursor - pages.bodyBottom();
    }

    /**
     * Places one block, on a new page if it does not fit on this one. A {@link Paragraph} taller than a page is
     * placed in parts, page by page; any other block must fit a page.
     */
    public void place(Block block) {
        float room = pages.bodyHeight() - (tableHeader == null ? 0 : tableHeader.height(width()));
        if (block instanceof Paragraph p && p.height(width()) > room) {
            for (Paragraph part : p.split(width(), room)) {
                placeTogether(List.of(part));
            }
            return;
        }
        placeTogether(List.of(block));
    }

    /**
     * Places blocks so that they stay on one page together (a heading with the first lines under it).
     *
     * @throws IllegalArgumentException if they are taller than an empty page can hold
     */
    public void placeTogether(List<? extends Block> blocks) {
        float w = width();
        float total = 0;
        for (Block b : blocks) {
            total += b.height(w);
        }
        float headerHeight = tableHeader == null ? 0 : tableHeader.height(w);
        if (total + headerHeight > pages.bodyHeight()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "a block of %.0f pt does not fit on a page body of %.0f pt", total + headerHeight,
                    pages.bodyHeight()));
        }
        if (canvas == null || total > remaining()) {
            newPage();
        }
        for (Block b : blocks) {
            float h = b.height(w);
            b.draw(canvas, pages.bodyLeft(), cursor, w);
            cursor -= h;
        }
    }

    /** Vertical space; dropped at the top of a page. */
    public void gap(float points) {
        if (canvas != null && points < remaining()) {
            cursor -= points;
        }
    }

    /** Starts a table: the header is placed now and again at the top of every following page. */
    public void startTable(Block header) {
        tableHeader = null;
        float h = header.height(width());
        if (canvas == null || remaining() < 2 * h) {
            newPage();
        }
        tableHeader = header;
        drawHeader();
    }

    /** Ends the current table: its header no longer repeats. */
    public void endTable() {
        tableHeader = null;
    }

    /** Ends the current page; the next block starts a new one. */
    public void newPage() {
        canvas = pages.newPage();
        cursor = pages.bodyTop();
        if (tableHeader != null) {
            drawHeader();
        }
    }

    private void drawHeader() {
        float w = width();
        tableHeader.draw(canvas, pages.bodyLeft(), cursor, w);
        cursor -= tableHeader.height(w);
    }

    /** The canvas of the current page (for drawing beside the flow). */
    public PageCanvas canvas() {
        if (canvas == null) {
            newPage();
        }
        return canvas;
    }
}

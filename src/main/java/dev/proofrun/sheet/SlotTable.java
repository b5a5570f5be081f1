package dev.proofrun.sheet;

import dev.proofrun.plan.Characteristic;
import dev.proofrun.schedule.Slot;
import dev.proofrun.paper.Block;
import dev.proofrun.paper.PageCanvas;
import dev.proofrun.paper.LineStyle;
import dev.proofrun.paper.LineBreaker;
import dev.proofrun.paper.TextTable;
import dev.proofrun.paper.Typeface;
import java.util.List;
import java.util.Locale;

/**
 * The slot table of the collection sheet: one block per slot, one band per characteristic inside it.
 *
 * <p><b>Why one block per slot, not one table per characteristic, and not all readings in one row.</b> At a
 * slot a collector takes n parts and measures every characteristic on them at once; the sheet follows that
 * work: the slot's id, planned time and window, shift, time taken, lot, operator and remark appear once, and
 * each characteristic gets its own band of n boxes below the previous one. The width of a box therefore
 * does not depend on the number of characteristics: boxes stay at least {@value #MIN_BOX} pt (12 mm) wide
 * and {@value #LINE} pt (6.7 mm) tall, enough to write a six-digit reading by hand, and no text on the sheet
 * is set below 7.5 pt. Putting all characteristics' readings in one row would shrink each box below
 * handwriting size as soon as there are more than one or two characteristics; a table per characteristic
 * would make the collector page back and forth for one subgroup and repeat time, lot and operator per
 * characteristic (and give them the chance to disagree). When n boxes do not fit across the page at the
 * minimum width, a characteristic's band takes two or more lines of boxes, numbered inside the box.
 * A block never splits across pages ({@link dev.proofrun.paper.Flow}).
 *
 * <p>Every band prints its characteristic's limits under the id; the characteristic column is at least
 * {@value #CHAR_W} pt and wider when the widest id or limits need it ("21.9870–22.0130"), so that no limits
 * are ever left out. The header, repeated on every page, opens with the reaction line: what to do with a
 * reading outside its limits, with a field for the name to call ({@link SheetWording#REACTION}).
 */
final class SlotTable {

    /** Minimum box width for one handwritten reading (12 mm). */
    static final float MIN_BOX = 34f;
    /** Boxes wider than this (20 mm) give their room to the remark. */
    static final float MAX_BOX = 56f;
    /** Height of one line of boxes (6.7 mm). */
    static final float LINE = 19f;
    /** Smallest slot block: room for the slot cell's three lines. */
    static final float MIN_BLOCK = 38f;

    static final float SLOT_W = 84f;
    static final float CHAR_W = 70f;
    static final float TAKEN_W = 44f;
    static final float LOT_W = 46f;
    static final float OPERATOR_W = 46f;
    static final float REMARK_MIN = 52f;

    private static final float PAD = 3f;
    private static final float ID_SIZE = 10f;
    private static final float TEXT = 8f;
    private static final float SMALL = 7.5f;
    /** The reaction line's strip above the column labels. */
    static final float REACTION_H = 26f;

    private final List<Characteristic> characteristics;
    private final int n;
    private final Typeface regular;
    private final Typeface bold;
    private final float width;
    private final float box;
    private final int perLine;
    private final int linesPerBand;
    private final float remark;
    private final float charW;

    SlotTable(List<Characteristic> characteristics, int n, Typeface regular, Typeface bold, float width) {
        this.characteristics = characteristics;
        this.n = n;
        this.regular = regular;
        this.bold = bold;
        this.width = width;
        this.charW = charWidth(characteristics, regular, bold);
        float fixed = SLOT_W + charW + TAKEN_W + LOT_W + OPERATOR_W + REMARK_MIN;
        float area = width - fixed;
        if (area < MIN_BOX) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "page too narrow for the slot table: %.0f pt", width));
        }
        this.perLine = Math.min(n, (int) Math.floor(area / MIN_BOX));
        this.linesPerBand = (n + perLine - 1) / perLine;
        this.box = Math.min(MAX_BOX, area / perLine);
        this.remark = width - (SLOT_W + charW + TAKEN_W + LOT_W + OPERATOR_W) - box * perLine;
    }

    /** The characteristic column: {@link #CHAR_W}, or wider so that every id with its unit and every range fits. */
    static float charWidth(List<Characteristic> characteristics, Typeface regular, Typeface bold) {
        float w = CHAR_W;
        for (Characteristic ch : characteristics) {
            w = Math.max(w, bold.width(idLine(ch), TEXT) + 2 * PAD);
            w = Math.max(w, regular.width(SheetNumbers.range(ch), SMALL) + 2 * PAD);
        }
        return (float) Math.ceil(w);
    }

    /** Width of the characteristic column as laid out. */
    float charColumn() {
        return charW;
    }

    private static String idLine(Characteristic ch) {
        return ch.id() + (ch.unit().isEmpty() ? "" : " " + ch.unit());
    }

    /** Height of every slot block. */
    float blockHeight() {
        return Math.max(characteristics.size() * linesPerBand * LINE, MIN_BLOCK);
    }

    /**
     * The largest subgroup size whose slot block fits in {@code room} points with these characteristics, or 0
     * when not even one line of boxes per characteristic fits.
     */
    int largestSubgroupSize(float room) {
        int lines = (int) Math.floor(room / LINE) / Math.max(1, characteristics.size());
        return lines * perLineAtMinimum();
    }

    /** The most characteristics whose slot block, one line of boxes each, fits in {@code room} points. */
    static int characteristicsPerPage(float room) {
        return (int) Math.floor(room / LINE);
    }

    private int perLineAtMinimum() {
        return (int) Math.floor((width - (SLOT_W + CHAR_W + TAKEN_W + LOT_W + OPERATOR_W + REMARK_MIN)) / MIN_BOX);
    }

    /** Boxes across one line. */
    int boxesPerLine() {
        return perLine;
    }

    /** The header block, repeated on every page of the table. */
    Block header() {
        return new Block() {
            @Override
            public float height(float w) {
                return REACTION_H + 27f;
            }

            @Override
            public void draw(PageCanvas c, float left, float top, float w) {
                drawReaction(c, left, top);
                top -= REACTION_H;
                float h = 27f;
                c.fillRect(left, top - h, width, h, TextTable.HEADER_GRAY);
                c.pen(LineStyle.HAIR);
                c.rect(left, top - h, width, h);
                float b1 = top - 11;
                float b2 = top - 22;
                float x = left;
                label(c, x, SLOT_W, b1, b2, "Slot", "planned, window");
                x += SLOT_W;
                label(c, x, charW, b1, b2, "Char.", "limits");
                x += charW;
                float readingsW = box * perLine;
                c.line(x, top, x, top - h);
                if (linesPerBand == 1) {
                    c.textCentred(bold, TEXT, x + readingsW / 2, b1, "Readings, part 1 to " + n);
                    for (int i = 0; i < perLine; i++) {
                        c.textCentred(bold, TEXT, x + box * i + box / 2, b2, Integer.toString(i + 1));
                    }
                } else {
                    c.textCentred(bold, TEXT, x + readingsW / 2, b1, "Readings, part 1 to " + n);
                    c.textCentred(regular, TEXT, x + readingsW / 2, b2, "numbered in the box");
                }
                x += readingsW;
                label(c, x, TAKEN_W, b1, b2, "Taken", "hh:mm");
                x += TAKEN_W;
                label(c, x, LOT_W, b1, b2, "Lot", "");
                x += LOT_W;
                label(c, x, OPERATOR_W, b1, b2, "Operator", "initials");
                x += OPERATOR_W;
                label(c, x, remark, b1, b2, "Remark", "if any");
            }
        };
    }

    /**
     * The reaction lines above the column labels: what to do with a reading outside its limits, then whom to
     * call, on a ruled field to be filled in by hand.
     */
    private void drawReaction(PageCanvas c, float left, float top) {
        float base = top - 9f;
        float x = left + c.text(bold, TEXT, left, base, SheetWording.REACTION_HEAD + " ");
        c.text(regular, TEXT, x, base, SheetWording.REACTION);
        base -= 11f;
        x = left + c.text(regular, TEXT, left, base, SheetWording.REACTION_CALL + " ");
        c.pen(LineStyle.HAIR);
        c.line(x, base - 1.5f, left + width * 0.75f, base - 1.5f);
        c.textRight(regular, SMALL, left + width, base, SheetWording.REACTION_FIELD);
    }

    private void label(PageCanvas c, float x, float w, float b1, float b2, String head, String hint) {
        c.line(x, b1 + 11, x, b2 - 5);
        c.text(bold, TEXT, x + PAD, b1, head);
        if (!hint.isEmpty()) {
            c.text(regular, SMALL, x + PAD, b2, LineBreaker.fit(hint, regular, SMALL, w - 2 * PAD));
        }
    }

    /** The block of one slot. */
    Block slot(Slot slot) {
        return new Block() {
            @Override
            public float height(float w) {
                return blockHeight();
            }

            @Override
            public void draw(PageCanvas c, float left, float top, float w) {
                drawSlot(c, slot, left, top);
            }
        };
    }

    private void drawSlot(PageCanvas c, Slot slot, float left, float top) {
        float h = blockHeight();
        float bottom = top - h;
        c.pen(LineStyle.HAIR);
        c.rect(left, bottom, width, h);
        // slot cell
        float base = top - PAD - bold.ascent(ID_SIZE);
        c.text(bold, ID_SIZE, left + PAD, base, slot.id());
        c.textRight(regular, TEXT, left + SLOT_W - PAD, base, LineBreaker.fit(slot.shift(), regular, TEXT, SLOT_W - 40));
        base -= 11;
        c.text(regular, TEXT, left + PAD, base, SheetNumbers.DAY.format(slot.start()));
        base -= 10.5f;
        String window = SheetNumbers.CLOCK.format(slot.start().minusMinutes(slot.windowMinutes())) + "\u2013"
                + SheetNumbers.CLOCK.format(slot.start().plusMinutes(slot.windowMinutes()));
        float tw = c.text(bold, TEXT + 1, left + PAD, base, SheetNumbers.CLOCK.format(slot.start()));
        c.text(regular, SMALL, left + PAD + tw + 3, base, window);
        float x = left + SLOT_W;
        c.line(x, top, x, bottom);
        // characteristic bands
        float band = h / characteristics.size();
        float readingsLeft = x + charW;
        for (int k = 0; k < characteristics.size(); k++) {
            Characteristic ch = characteristics.get(k);
            float bandTop = top - k * band;
            if (k > 0) {
                c.line(x, bandTop, readingsLeft + box * perLine, bandTop);
            }
            float b = bandTop - 8.5f;
            c.text(bold, TEXT, x + PAD, b, idLine(ch));
            // the column is wide enough for both (charWidth), and a band is at least LINE (19 pt) tall
            c.text(regular, SMALL, x + PAD, b - 8f, SheetNumbers.range(ch));
            float line = band / linesPerBand;
            for (int i = 0; i < n; i++) {
                int row = i / perLine;
                int col = i % perLine;
                float bx = readingsLeft + col * box;
                float by = bandTop - (row + 1) * line;
                c.rect(bx, by, box, line);
                if (linesPerBand > 1) {
                    c.text(regular, SMALL, bx + 2, by + line - SMALL, Integer.toString(i + 1));
                }
            }
        }
        c.line(readingsLeft, top, readingsLeft, bottom);
        x = readingsLeft + box * perLine;
        for (float w : new float[] {TAKEN_W, LOT_W, OPERATOR_W}) {
            c.line(x, top, x, bottom);
            x += w;
        }
        c.line(x, top, x, bottom);
        c.pen(LineStyle.RULE);
        c.line(left, top, left + width, top);
    }
}

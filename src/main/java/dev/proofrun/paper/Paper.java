package dev.proofrun.paper;

import dev.proofrun.text.Token;
import dev.proofrun.text.Tokens;
import org.apache.pdfbox.pdmodel.common.PDRectangle;

/** Paper sizes we print on, portrait, in PDF points (1/72 inch). */
public enum Paper implements Token {
    /** ISO 216 A4, 210 mm × 297 mm = 595.28 pt × 841.89 pt. */
    A4(PDRectangle.A4),
    /** US Letter (ANSI/ASME Y14.1 size A), 8.5 in × 11 in = 612 pt × 792 pt. */
    LETTER(PDRectangle.LETTER);

    private final PDRectangle size;

    Paper(PDRectangle size) {
        this.size = size;
    }

    /** Width in points. */
    public float width() {
        return size.getWidth();
    }

    /** Height in points. */
    public float height() {
        return size.getHeight();
    }

    /** A fresh media box of this size (PDFBox rectangles are mutable). */
    public PDRectangle mediaBox() {
        return new PDRectangle(size.getWidth(), size.getHeight());
    }

    /**
     * The paper for a command-line word, {@code a4} or {@code letter} (any case).
     *
     * @throws IllegalArgumentException for any other word
     */
    public static Paper of(String word) {
        return Tokens.parse(Paper.class, "paper", word);
    }
}

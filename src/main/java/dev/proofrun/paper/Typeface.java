package dev.proofrun.paper;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.Map;
import org.apache.pdfbox.io.RandomAccessReadBuffer;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType0Font;

/**
 * An embedded font for one document, with the text measurements layout needs.
 *
 * <p>The faces are DejaVu Sans (regular and bold), shipped inside the jar (licence beside the font files in
 * {@code dev/proofrun/paper/fonts/}) and embedded as subsets, so a PDF prints the same on any
 * machine. PDFBox's Standard 14 fonts are not used: they are not embedded and cover only WinAnsi text.
 *
 * <p>Characters the font has no glyph for are printed as {@code ?} (see {@link #printable}); control
 * characters become spaces. Widths are cached per code point, which keeps long tables fast.
 */
public final class Typeface {

    /** The faces we ship. */
    public enum Style {
        /** DejaVu Sans Book. */
        REGULAR("DejaVuSans.ttf"),
        /** DejaVu Sans Bold. */
        BOLD("DejaVuSans-Bold.ttf");

        private final String file;

        Style(String file) {
            this.file = file;
        }
    }

    /** Ascender of DejaVu Sans as a fraction of the em (hhea ascender 1901 / 2048 units). */
    private static final float ASCENT = 0.928f;
    /** Descender of DejaVu Sans as a fraction of the em (hhea descender 483 / 2048 units). */
    private static final float DESCENT = 0.236f;
    /** Cap height of DejaVu Sans as a fraction of the em (OS/2 capHeight 1493 / 2048 units). */
    private static final float CAP_HEIGHT = 0.729f;

    private static final Map<Style, byte[]> FILES = new EnumMap<>(Style.class);

    private final PDFont font;
    private final Map<Integer, Float> widths = new HashMap<>();

    private Typeface(PDFont font) {
        this.font = font;
    }

    /**
     * Loads a face into a document (embedded as a subset when the document is saved).
     *
     * @param document the document that will use the face
     * @param style    which face
     * @return the face
     */
    public static Typeface load(PDDocument document, Style style) {
        try {
            return new Typeface(PDType0Font.load(document, new RandomAccessReadBuffer(bytes(style)), true, false));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static synchronized byte[] bytes(Style style) throws IOException {
        byte[] b = FILES.get(style);
        if (b == null) {
            try (InputStream in = Typeface.class.getResourceAsStream("fonts/" + style.file)) {
                if (in == null) {
                    throw new IOException("font resource missing: " + style.file);
                }
                b = in.readAllBytes();
            }
            FILES.put(style, b);
        }
        return b;
    }

    /** The PDFBox font. */
    public PDFont font() {
        return font;
    }

    /**
     * The text as this face can print it: unknown glyphs become {@code ?}, control characters (tab, CR, LF,
     * ...) become spaces.
     */
    public String printable(String text) {
        StringBuilder sb = null;
        for (int i = 0; i < text.length(); ) {
            int cp = text.codePointAt(i);
            int n = Character.charCount(cp);
            int replacement = Character.isISOControl(cp) ? ' ' : (advance(cp) < 0 ? '?' : -1);
            if (replacement >= 0 && sb == null) {
                sb = new StringBuilder(text.length()).append(text, 0, i);
            }
            if (sb != null) {
                if (replacement >= 0) {
                    sb.append((char) replacement);
                } else {
                    sb.appendCodePoint(cp);
                }
            }
            i += n;
        }
        return sb == null ? text : sb.toString();
    }

    /**
     * Width of the text set at the given size, in points. Unknown glyphs count as {@code ?}.
     *
     * @param text the text (need not be {@link #printable} already)
     * @param size font size in points
     * @return width in points
     */
    public float width(String text, float size) {
        float units = 0;
        for (int i = 0; i < text.length(); ) {
            int cp = text.codePointAt(i);
            float w = advance(Character.isISOControl(cp) ? ' ' : cp);
            units += w < 0 ? advance('?') : w;
            i += Character.charCount(cp);
        }
        return units / 1000f * size;
    }

    /** Distance from the baseline to the top of capitals, in points. */
    public float capHeight(float size) {
        return CAP_HEIGHT * size;
    }

    /** Distance from the baseline to the top of the tallest glyphs, in points. */
    public float ascent(float size) {
        return ASCENT * size;
    }

    /** Distance from the baseline down to the bottom of descenders (positive), in points. */
    public float descent(float size) {
        return DESCENT * size;
    }

    /** The advance width in 1/1000 em, or -1 when the font has no glyph for the code point. */
    private float advance(int codePoint) {
        Float w = widths.get(codePoint);
        if (w == null) {
            String s = new String(Character.toChars(codePoint));
            try {
                // Identity-H encoding: the two bytes are the glyph id; 0 is .notdef, i.e. no glyph.
                byte[] code = font.encode(s);
                boolean known = code.length == 2 && ((code[0] & 0xff) << 8 | (code[1] & 0xff)) != 0;
                w = known ? font.getStringWidth(s) : -1f;
            } catch (IllegalArgumentException | IOException e) {
                w = -1f;
            }
            widths.put(codePoint, w);
        }
        return w;
    }
}

package dev.proofrun.text;

import java.text.DecimalFormatSymbols;
import java.util.Locale;

/**
 * The decimal mark of numbers a person types: in the wizard's fields, by the window's choice; on the command
 * line always {@link #POINT} (option values, as picocli reads them), which is also the wizard's default. One
 * rule either way ({@link Decimals}): at most one mark and never a thousands separator, anywhere in proofrun.
 * Under {@link #POINT} a comma is refused, with a line that says which mark is set ({@code 1,33} is never read
 * as 133 nor silently as 1.33); under {@link #COMMA} a comma is the mark, and so is a point, because plan
 * files and the values the wizard fills in from them are written with points, and with no thousands
 * separator a point can only be a decimal mark.
 *
 * <p>Files carry their own mark ({@link CsvDialect}): a {@code ;}-separated file takes a comma as its
 * decimal mark (a point too), a {@code ,}-separated one a point (a comma only inside quotes); the grader
 * says which it found.
 */
public enum DecimalMark implements Token {
    /** {@code 1.33}. */
    POINT('.'),
    /** {@code 1,33}. */
    COMMA(',');

    private final char mark;

    DecimalMark(char mark) {
        this.mark = mark;
    }

    /** The character itself. */
    public char mark() {
        return mark;
    }

    /** {@code 1.33} or {@code 1,33}: how a number looks with this mark. */
    public String example() {
        return "1" + mark + "33";
    }

    /** The mark a locale writes (a comma for {@code de}, {@code fr}; a point for {@code en}). */
    public static DecimalMark of(Locale locale) {
        return DecimalFormatSymbols.getInstance(locale).getDecimalSeparator() == ',' ? COMMA : POINT;
    }

    /** The mark named by its word in settings files ({@code point}, {@code comma}), as {@link Tokens#parse} reads it. */
    public static DecimalMark fromToken(String token) {
        return Tokens.parse(DecimalMark.class, "decimal mark", token);
    }

    /** The number in the text (already trimmed): NaN when it is not one, infinite when it overflows. */
    public double parse(String text) {
        return Decimals.parse(text, this == COMMA);
    }

    /** True under {@link #POINT} when the text would be a number with a decimal comma: the reason to say which mark is set. */
    public boolean otherMarkIn(String text) {
        return this == POINT && text.indexOf(',') >= 0 && !Double.isNaN(Decimals.parse(text, true));
    }
}

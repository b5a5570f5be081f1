package dev.proofrun.text;

/**
 * The one rule that keeps text inert in files a spreadsheet opens, shared by the writer of the fill-in files
 * ({@code sheet.CellText}) and the reader of returned files ({@code grade}), which may not depend on each
 * other.
 *
 * <p>Spreadsheet programs evaluate a cell that starts with {@code =}, {@code +}, {@code -} or {@code @} as a
 * formula, and some also act on a leading tab or carriage return (OWASP, "CSV Injection"). Such text is
 * written with a single quote in front ({@link #inert}); a reader removes a leading quote that stands before
 * one of those six characters ({@link #restore}) and leaves every other cell as it is.
 */
public final class FormulaGuard {

    private FormulaGuard() {
    }

    /** Whether a spreadsheet could evaluate the text: it starts with = + - @, a tab or a carriage return. */
    public static boolean risky(String text) {
        if (text.isEmpty()) {
            return false;
        }
        char c = text.charAt(0);
        return c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r';
    }

    /** The text, with a single quote in front when it is {@link #risky}. */
    public static String inert(String text) {
        return risky(text) ? "'" + text : text;
    }

    /** Undoes {@link #inert}: a leading quote before a risky character is removed; other text is unchanged. */
    public static String restore(String cell) {
        return cell.length() > 1 && cell.charAt(0) == '\'' && risky(cell.substring(1)) ? cell.substring(1) : cell;
    }
}

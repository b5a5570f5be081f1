package dev.proofrun.sheet;

import dev.proofrun.text.FormulaGuard;

/**
 * Keeps text in the fill-in files inert when a spreadsheet opens them.
 *
 * <p>Spreadsheet programs evaluate a CSV cell that starts with {@code =}, {@code +}, {@code -} or
 * {@code @} as a formula, and some also act on a leading tab or carriage return ("CSV injection",
 * described by OWASP as CSV Injection). Every cell of the CSV that comes from text a person typed into
 * the plan (plan id, characteristic id, names) goes through {@link #inert}: a cell starting with one of
 * those six characters gets a single quote in front, which spreadsheets show as text and do not evaluate.
 *
 * <p>Readers of the fill-in file (the grading step) undo it with {@link #restore}: a cell that starts with a
 * single quote followed by one of the six characters loses the quote. Readings typed by people
 * ({@code -0.5}) are not touched: those cells are written empty and filled in by the collector.
 *
 * <p>In the XLSX file the same cells are string cells with the "quote prefix" style instead: the value is
 * kept exactly, and the spreadsheet program keeps it as text even when the cell is edited.
 *
 * <p>The rule itself lives in {@link FormulaGuard} (package {@code text}), so that the grade reader, which may
 * not use this package, applies the same one.
 */
public final class CellText {

    private CellText() {
    }

    /** Whether a spreadsheet could evaluate the text: it starts with = + - @, a tab or a carriage return. */
    public static boolean risky(String text) {
        return FormulaGuard.risky(text);
    }

    /** The text, with a single quote in front when it is {@link #risky}. */
    public static String inert(String text) {
        return FormulaGuard.inert(text);
    }

    /** Undoes {@link #inert}: a leading quote before a risky character is removed. */
    public static String restore(String cell) {
        return FormulaGuard.restore(cell);
    }
}

package dev.proofrun.grade;

/** Receives a returned table one row at a time, so large files never sit in memory. */
interface RowHandler {

    /**
     * Whether these cells, the first non-blank row of a sheet, are a header this handler reads (a workbook's
     * reader uses it to find the fill-in sheet among others).
     */
    default boolean isHeader(String[] cells) {
        return true;
    }

    /**
     * The first non-blank row.
     *
     * @param row   its 1-based row number as a spreadsheet shows it
     * @param cells the header cells, trimmed
     */
    void header(long row, String[] cells);

    /**
     * A data row that is not blank. The array may be reused for the next row; copy what you keep.
     *
     * @param row   its 1-based row number
     * @param cells the cells, trimmed; {@code count} of them are valid, missing trailing cells are absent
     * @param count how many cells the row has
     */
    void row(long row, String[] cells, int count);

    /** The cell separator a text file was found to use ({@code ,} or {@code ;}), told before its header. */
    default void separator(char separator) {
    }
}

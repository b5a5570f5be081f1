package dev.proofrun.readings;

import dev.proofrun.text.CsvDialect;

/**
 * Parses a cell of a readings file by the dialect's number rule ({@link CsvDialect#number}), as a returned
 * file's cell is read: a point or a single comma as the decimal mark.
 */
final class DecimalCell {

    private DecimalCell() {
    }

    /** The value, or NaN if the text is not a plain decimal number (the text is already trimmed). */
    static double parse(String text) {
        return CsvDialect.number(text);
    }

}

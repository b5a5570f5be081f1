package dev.proofrun.readings;

import dev.proofrun.text.Decimals;

/**
 * Parses a cell of a readings file by the one number rule ({@link Decimals}) with a decimal point only: a
 * comma separates the file's cells, so a decimal comma there is a mistake the reader names.
 */
final class DecimalCell {

    private DecimalCell() {
    }

    /** The value, or NaN if the text is not a plain decimal number (the text is already trimmed). */
    static double parse(String text) {
        return Decimals.parse(text, false);
    }

}

/**
 * A small PDF toolkit over PDFBox, shared by {@code sheet} and {@code report}: {@code Pages} (a document
 * with a {@code PageHeading} on every page; "page x of y" and the DRAFT mark added at {@code write}),
 * {@code Flow} (places {@code Block}s down the pages; a block never splits; a table header repeats),
 * {@code Paragraph}, {@code Item}, {@code Framed}, {@code TextTable}, {@code PageCanvas} (lines, text, dashed
 * {@code LineStyle}s, markers), {@code PlotArea} (data to points, axes with 1-2-5 ticks) and {@code Typeface} (DejaVu
 * Sans, embedded as subsets; characters without a glyph print as {@code ?}). Coordinates are PDF points, origin
 * bottom left; {@code Paper} is A4 or Letter.
 */
package dev.proofrun.paper;

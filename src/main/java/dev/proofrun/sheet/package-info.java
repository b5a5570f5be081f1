/**
 * The printed collection plan and the fill-in files: {@code SheetFiles.write} writes
 * {@code <plan id>-sheet.pdf} ({@code SheetPdf}, {@code IntroPage}, {@code SlotTable}), {@code -fill-in.csv}
 * ({@code FillInCsv}: RFC 4180, CRLF, UTF-8 without byte-order mark) and {@code -fill-in.xlsx}
 * ({@code FillInXlsx}, streamed with SXSSF, protected, prefilled columns locked) to temporary files and moves
 * them into place only when all three are complete. An unissued plan is refused unless {@code --draft}, which
 * marks every page DRAFT. Prefilled cells are formula-guarded ({@code CellText}, delegating to
 * {@code text.FormulaGuard}). {@code SlotTable}'s Javadoc says why a slot is one block with a band of boxes per
 * characteristic (A4: 7 slots of 5 characteristics per page; Letter: 6).
 */
package dev.proofrun.sheet;

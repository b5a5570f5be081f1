/**
 * Hand-out: issuing the plan (fingerprint and synced write off the FX thread), the sheet preview and exporting
 * the PDF, CSV and XLSX files ({@code sheet.SheetFiles}). The view only binds and draws; the view-model holds
 * the state, validates, and is the only caller of the core.
 */
package dev.proofrun.app.handout;

/**
 * Hand-out: issuing the plan (fingerprint and synced write off the FX thread), the sheet preview (pages rendered
 * by {@code sheet.SheetPreview} in the background, turned into JavaFX images here) and exporting the PDF, CSV and
 * XLSX files ({@code sheet.SheetFiles}) — a DRAFT's, marked on every page, before the plan is issued, as {@code
 * proofrun sheet --draft} writes them. The plan's revision is said as people say it beside its fingerprint
 * ("revision 2 (3f2a9c01b7de)"). {@code HandoutViewModel} holds the state and validates; the plan the steps
 * describe, and whether it is the issued one, is {@code ComposedPlan}'s; the plan file's writes (issue, Save
 * as…) are {@code PlanWrites}'. The view only binds and draws.
 */
package dev.proofrun.app.handout;

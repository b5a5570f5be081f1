/**
 * Grading: a returned file graded against the issued plan ({@code grade.Grader}, in the background), the
 * verdicts with their reasons and every index with its bounds, the control and readings charts, and the report
 * PDF ({@code report.GradeReport}). The view only binds and draws; the view-model holds the state, validates,
 * and is the only caller of the core.
 */
package dev.proofrun.app.grading;

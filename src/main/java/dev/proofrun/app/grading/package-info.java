/**
 * Grading: a returned file graded against the issued plan ({@code grade.Grader}, in the background) and the
 * report PDF ({@code report.GradeReport}). {@code GradingViewModel} holds the state and is the only caller of
 * the core; it hands the view a display model ({@code GradingDisplay}: the verdict line and its tone, the problem
 * and grade rows, and per characteristic the steps of the argument with their reasons, every index, the control
 * charts, the readings and their histogram), made from the grade by {@code EvidenceDisplay} in the words of the
 * message keys the command line and the report use. A step the argument did not reach is named once, not shown
 * as an empty heading; the caution stands once on the page, under the part's verdict. The histogram is the
 * report's ({@code report.Histogram}: bins of whole gauge steps, the planned shape's fitted curve), drawn here
 * as lines on the canvas chart. {@code GradingView} only binds and draws.
 */
package dev.proofrun.app.grading;

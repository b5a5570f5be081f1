/**
 * The grade report: {@code GradeReport.write(GradeResult, StudyPlan, Paper, …)} renders a grade as a PDF with
 * {@code paper}. Page 1 is the verdict box ({@code VerdictSection}: the part's verdict, each
 * characteristic's verdict with its decisive reasons, the caution last) and the problems found in the file;
 * then one section per characteristic ({@code EvidenceSection}): completeness, stability
 * ({@code ControlChartBlock}), shape ({@code HistogramBlock} with the fitted {@code ModelCurve},
 * {@code ProbabilityPlotBlock}) and capability ({@code BoundBlock}). The charts share their frame,
 * {@code PlotBlock}; chart limits print with one precision per chart ({@code ReportNumbers}). Large studies are thinned
 * for drawing only. Look at one with
 * {@code mvn -o -q test -Dtest=GradeReportTest -Dproofrun.keepReport=/tmp/report.pdf} and {@code pdftoppm}.
 */
package dev.proofrun.report;

/**
 * {@code CurvePlot}: one {@code Canvas} chart (title, axes with ticks and numbers, the lines, a legend naming
 * every line with its value, a tooltip with the value under the pointer; colours from the theme's palette,
 * sizes in em). The design step's OC and power curves use it, and the grading step's three charts use
 * {@code CurvePlot.spanning} (a y axis that spans the lines shown).
 */
package dev.proofrun.app.chart;

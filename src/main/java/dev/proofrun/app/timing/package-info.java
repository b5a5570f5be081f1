/**
 * Timing: the production calendar and span typed as text, the schedule ({@code schedule.Scheduler}, in the
 * background) drawn by {@code Timeline}, one row per date. The view only binds and draws; the view-model holds
 * the state, validates, and is the only caller of the core.
 */
package dev.proofrun.app.timing;

/**
 * Timing: the production calendar and span typed as text, the schedule ({@code schedule.Scheduler}, in the
 * background) drawn by {@code Timeline}, one row per date. The view only binds and draws; the view-model holds
 * the state, validates, and is the only caller of the core. {@code Timeline} draws what the schedule says:
 * {@code WorkingHours} gives each date's working minutes (shifts less breaks, a night shift's tail on the next
 * date), to which every collection window is clipped; {@code SlotLabels} puts the slot ids in two lanes so
 * that no two overlap, leaving out (and counting) an id that fits in neither. A new draft's zone and spacing
 * are the command line's ({@code schedule.CalendarDefaults}).
 */
package dev.proofrun.app.timing;

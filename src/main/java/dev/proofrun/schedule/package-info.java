/**
 * The production calendar and the dated slots of a study.
 *
 * <ul>
 * <li>{@code ProductionCalendar}(zone, working days, {@code Shift}s, {@code BreakWindow}s, non-working dates,
 * {@code ProductionRate}). A shift runs past midnight when its end is not after its start and belongs to the
 * date it starts on; breaks repeat every working day; shifts may not overlap.</li>
 * <li>{@code StudySpan}: SHIFTS, DAYS, LOTS or UNTIL a date.</li>
 * <li>{@code Scheduler.schedule(calendar, span, k, n, spacing, seed)} → {@code Schedule} of {@code Slot}s
 * (ids S01…, zero-padded to the width of k). Slots are placed on running time ({@code WorkingTime}): Δ = W/k;
 * EVEN puts slot i at iΔ + (Δ − d)/2, RANDOM at iΔ + u(Δ − d) with {@code java.util.Random(seed)}, d the
 * minutes
 * n consecutive parts take; refused when Δ &lt; max(d, 1 min). The window is ± min(⌊Δ/2⌋, 30) minutes (our
 * choice). {@code FrequencySummary} writes the frequency sentence.</li>
 * <li>Daylight-saving changes ({@code WallClock}): a wall time that occurs twice means its first occurrence;
 * one
 * that does not exist means the instant the clocks jump. Tested for Europe/Berlin and America/Chicago.</li>
 * <li>{@code CalendarSyntax}: the one text grammar of shifts ({@code early 06:00-14:00} or
 * {@code early=06:00-14:00}), breaks, working days and dates, read by {@code plan new} and the wizard alike.</li>
 * <li>Known limit: a subgroup that starts just before a break finishes after it; calendars are searched
 * {@code Scheduler.HORIZON_DAYS} ahead.</li>
 * </ul>
 */
package dev.proofrun.schedule;

package dev.proofrun.grade;

import dev.proofrun.plan.OffsetTimes;
import dev.proofrun.text.CsvDialect;
import dev.proofrun.text.FormulaGuard;
import dev.proofrun.text.Location;
import dev.proofrun.text.Shown;
import dev.proofrun.text.UserException;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * Collects a returned table against its plan, row by row, into primitive arrays per characteristic (no row
 * objects are kept, so a million readings fit in a small heap), and records every problem with its file,
 * row and column.
 *
 * <p>Two layouts, told apart by the header: the fill-in form (one row per slot and characteristic with
 * readings in {@code x1..xn}) and the long form automatic gauges write (one reading per row in
 * {@code value}). Columns are found by header name, in any order and any letter case. Rules:
 * <ul>
 * <li>The prefilled cells ({@code plan}, {@code slot}, {@code characteristic}) lose the leading quote the
 *     sheet puts before text a spreadsheet would evaluate ({@link FormulaGuard#restore}).</li>
 * <li>A {@code plan} cell other than the plan's "id@revision" refuses the whole file (the plan wins);
 *     a blank plan cell is accepted.</li>
 * <li>Unknown slot or characteristic: the row is not used (error). In the fill-in form a second row for
 *     the same slot and characteristic is not used (error).</li>
 * <li>A non-numeric reading is missing (error). One that is not finite ({@code NaN}, {@code Infinity},
 *     {@code 1e309}, which overflows) or lies beyond the characteristic's {@link Reach} is missing too (error),
 *     and the characteristic is then not valid: such a value may stand for a real part far outside the
 *     tolerance (a gauge over its range), so it is never simply passed over; a subgroup with fewer or more readings than the plan's n is
 *     not graded (error) — a reading is never moved between subgroups.</li>
 * <li>Kept but flagged (warning): a reading not on the gauge's resolution; a reading more than one tolerance
 *     width beyond a limit (probable typing error — for a one-sided specification the width is the distance
 *     from the limit to the nominal, and without a nominal no such check is made); a subgroup taken
 *     outside its slot's window or before the slot planned ahead of it.</li>
 * </ul>
 */
final class ReturnedData implements RowHandler {

    private static final double RESOLUTION_SLACK = 1e-6;

    private final GradingPlan plan;
    /** {@link GradingPlan#reference()}, built once: every row is compared with it. */
    private final String reference;
    private final String display;
    private final Map<String, Integer> slotIndex;
    private final Map<String, Integer> characteristicIndex = new HashMap<>();
    private final SlotReadings[] collected;
    private final Reach[] reach;
    private final ProblemLog log = new ProblemLog();
    /** Readings written with a decimal comma: how many, and the first, said once as a note. */
    private long decimalCommas;
    private Location firstComma;
    private String firstCommaText;
    private double firstCommaValue;
    private String layout = "workbook";
    private boolean commaNoted;
    private final int n;
    private final java.time.LocalDate[] plannedDay;
    private final long[] windowBegin;
    private final long[] windowEnd;

    private boolean longForm;
    private int planCol = -1;
    private int slotCol = -1;
    private int characteristicCol = -1;
    private int takenCol = -1;
    private int valueCol = -1;
    private int[] readingCols;
    private String[] header;
    private long rows;

    ReturnedData(GradingPlan plan, String display) {
        this.plan = plan;
        this.reference = plan.reference();
        this.display = display;
        this.slotIndex = plan.slotIndex();
        this.n = plan.design().subgroupSize();
        int k = plan.slots().size();
        this.plannedDay = new java.time.LocalDate[k];
        this.windowBegin = new long[k];
        this.windowEnd = new long[k];
        for (int s = 0; s < k; s++) {
            // minutes are added on the instant time-line (as PlannedSlot.begin/end do), so plain seconds suffice
            PlannedSlot slot = plan.slots().get(s);
            long start = slot.start().toEpochSecond();
            windowBegin[s] = start - 60L * slot.windowMinutes();
            windowEnd[s] = start + 60L * slot.windowMinutes();
        }
        this.collected = new SlotReadings[plan.characteristics().size()];
        this.reach = new Reach[collected.length];
        for (int c = 0; c < collected.length; c++) {
            characteristicIndex.put(plan.characteristics().get(c).id(), c);
            collected[c] = new SlotReadings(plan.slots().size(), n);
            reach[c] = Reach.of(plan.characteristics().get(c).limits(), plan.characteristics().get(c).nominal());
        }
    }

    /** A fill-in or long-form header: it names a slot, characteristic or value column, or reading columns. */
    @Override
    public boolean isHeader(String[] cells) {
        for (String cell : cells) {
            String h = cell.toLowerCase(Locale.ROOT);
            if (h.equals("slot") || h.equals("characteristic") || h.equals("value") || readingColumn(h)) {
                return true;
            }
        }
        return false;
    }

    private static boolean readingColumn(String h) {
        // x1 .. x9999999: ASCII digits only, few enough that the number fits an int
        return h.length() > 1 && h.length() <= 8 && h.charAt(0) == 'x' && h.substring(1).chars().allMatch(c -> c >= '0' && c <= '9');
    }

    @Override
    public void separator(char separator) {
        layout = "'" + separator + "'-separated file";
    }

    @Override
    public void header(long row, String[] cells) {
        header = cells;
        TreeMap<Integer, Integer> readings = new TreeMap<>();
        for (int i = 0; i < cells.length; i++) {
            String h = cells[i].toLowerCase(Locale.ROOT);
            switch (h) {
                case "plan": planCol = i; break;
                case "slot": slotCol = i; break;
                case "characteristic": characteristicCol = i; break;
                case "taken": takenCol = i; break;
                case "value": valueCol = i; break;
                default:
                    if (readingColumn(h)) {
                        readings.put(Integer.parseInt(h.substring(1)), i);
                    }
            }
        }
        if (slotCol < 0 && characteristicCol < 0 && valueCol < 0 && readings.isEmpty()) {
            throw new UserException(Location.cell(display, row, null), GradeMessage.NO_HEADER);
        }
        for (String[] need : new String[][] {{"slot", String.valueOf(slotCol)}, {"characteristic", String.valueOf(characteristicCol)}}) {
            if (Integer.parseInt(need[1]) < 0) {
                throw new UserException(Location.cell(display, row, null), GradeMessage.MISSING_COLUMN, need[0]);
            }
        }
        if (valueCol < 0 && readings.isEmpty()) {
            throw new UserException(Location.cell(display, row, null), GradeMessage.NO_READING_COLUMNS);
        }
        longForm = valueCol >= 0 && readings.isEmpty();
        readingCols = readings.values().stream().mapToInt(Integer::intValue).toArray();
    }

    private String cell(String[] cells, int count, int col) {
        return col >= 0 && col < count ? cells[col] : "";
    }

    /**
     * A cell the fill-in file prefilled from the plan (plan, slot, characteristic): the sheet wrote risky text
     * with a leading quote, and a spreadsheet may have kept it, so {@link FormulaGuard#restore} undoes it.
     */
    private String prefilled(String[] cells, int count, int col) {
        return FormulaGuard.restore(cell(cells, count, col));
    }

    private String name(int col) {
        return header[col];
    }

    @Override
    public void row(long row, String[] cells, int count) {
        rows++;
        String planCell = prefilled(cells, count, planCol);
        if (!planCell.isEmpty() && !planCell.equals(reference)) {
            throw new UserException(Location.cell(display, row, name(planCol)), GradeMessage.PLAN_MISMATCH, Shown.cell(planCell),
                    reference);
        }
        String charCell = prefilled(cells, count, characteristicCol);
        Integer ci = characteristicIndex.get(charCell);
        if (ci == null) {
            log.add(Location.cell(display, row, name(characteristicCol)), Severity.ERROR, null, GradeMessage.UNKNOWN_CHARACTERISTIC,
                    Shown.cell(charCell));
            return;
        }
        String id = plan.characteristics().get(ci).id();
        String slotCell = prefilled(cells, count, slotCol);
        Integer si = slotIndex.get(slotCell);
        if (si == null) {
            log.add(Location.cell(display, row, name(slotCol)), Severity.ERROR, id, GradeMessage.UNKNOWN_SLOT, Shown.cell(slotCell));
            return;
        }
        SlotReadings col = collected[ci];
        if (longForm) {
            if (col.row[si] == 0) {
                col.row[si] = row;
                taken(col, si, row, cells, count, id);
            }
            reading(col, ci, si, row, cell(cells, count, valueCol), valueCol, id);
            return;
        }
        if (col.row[si] != 0) {
            log.add(Location.cell(display, row, name(slotCol)), Severity.ERROR, id, GradeMessage.DUPLICATE_ROW,
                    slotCell, id, col.row[si]);
            return;
        }
        col.row[si] = row;
        taken(col, si, row, cells, count, id);
        for (int j = 0; j < readingCols.length; j++) {
            int c = readingCols[j];
            String text = cell(cells, count, c);
            if (!text.isEmpty()) {
                reading(col, ci, si, row, text, c, id);
            }
        }
    }

    private void taken(SlotReadings col, int si, long row, String[] cells, int count, String id) {
        String text = cell(cells, count, takenCol);
        if (text.isEmpty()) {
            return;
        }
        long epoch = OffsetTimes.epochSecond(text); // the fast path alone first: no planned day to look up
        if (epoch == OffsetTimes.NOT_FIXED) {
            epoch = CellValues.takenEpochSecond(text, plan.zone(), plannedDay(si));
        }
        if (epoch == CellValues.NOT_A_TIME) {
            log.add(Location.cell(display, row, name(takenCol)), Severity.WARNING, id, GradeMessage.TAKEN_UNREADABLE, Shown.cell(text));
            return;
        }
        col.taken[si] = epoch;
        if (epoch < windowBegin[si] || epoch > windowEnd[si]) {
            PlannedSlot slot = plan.slots().get(si);
            col.late[si] = true;
            log.add(Location.cell(display, row, name(takenCol)), Severity.WARNING, id, GradeMessage.TAKEN_OUTSIDE_WINDOW,
                    Shown.cell(text), slot.begin().toOffsetDateTime(), slot.end().toOffsetDateTime());
        }
    }

    /** The slot's planned day in the plan's zone (for a taken time of day), computed when first needed. */
    private java.time.LocalDate plannedDay(int si) {
        if (plannedDay[si] == null) {
            plannedDay[si] = plan.slots().get(si).start().withZoneSameInstant(plan.zone()).toLocalDate();
        }
        return plannedDay[si];
    }

    private void reading(SlotReadings col, int ci, int si, long row, String text, int column, String id) {
        double v = CsvDialect.number(text);
        if (CsvDialect.namesNonFinite(text, v)) { // 1e309 overflows; a gauge may write "Infinity"
            col.spoiled[si] = true;
            col.outOfReach++;
            log.add(Location.cell(display, row, name(column)), Severity.ERROR, id, GradeMessage.NOT_FINITE, Shown.cell(text));
            return;
        }
        if (Double.isNaN(v)) {
            col.spoiled[si] = true;
            log.add(Location.cell(display, row, name(column)), Severity.ERROR, id, GradeMessage.NOT_NUMERIC, Shown.cell(text));
            return;
        }
        if (text.indexOf(',') >= 0 && decimalCommas++ == 0) {
            firstComma = Location.cell(display, row, name(column));
            firstCommaText = text;
            firstCommaValue = v;
        }
        PlannedCharacteristic gc = plan.characteristics().get(ci);
        if (!reach[ci].contains(v)) {
            col.spoiled[si] = true;
            col.outOfReach++;
            log.add(Location.cell(display, row, name(column)), Severity.ERROR, id, GradeMessage.OUT_OF_REACH, Shown.cell(text),
                    CellValues.brief(reach[ci].low()), CellValues.brief(reach[ci].high()));
            return;
        }
        boolean flagged = false;
        double res = gc.resolution();
        if (res > 0) {
            double steps = v / res;
            if (Math.abs(steps - Math.rint(steps)) > RESOLUTION_SLACK * Math.max(1, Math.abs(steps))) {
                flagged = true;
                log.add(Location.cell(display, row, name(column)), Severity.WARNING, id, GradeMessage.OFF_RESOLUTION,
                        Shown.cell(text), CellValues.show(res));
            }
        }
        if (implausible(gc, v)) {
            flagged = true;
            log.add(Location.cell(display, row, name(column)), Severity.WARNING, id, GradeMessage.IMPLAUSIBLE, Shown.cell(text),
                    gc.limits().lower().isPresent() ? CellValues.show(gc.limits().lower().getAsDouble()) : "-",
                    gc.limits().upper().isPresent() ? CellValues.show(gc.limits().upper().getAsDouble()) : "-");
        }
        if (flagged) {
            col.flagged++;
        }
        int k = col.count[si];
        if (k < n) {
            col.values[si * n + k] = v;
        }
        col.count[si] = k + 1;
    }

    private static boolean implausible(PlannedCharacteristic gc, double v) {
        double width;
        if (gc.limits().isTwoSided()) {
            width = gc.limits().width().getAsDouble();
        } else if (gc.nominal() != null) {
            double limit = gc.limits().lower().isPresent() ? gc.limits().lower().getAsDouble() : gc.limits().upper().getAsDouble();
            width = Math.abs(limit - gc.nominal());
            if (!(width > 0)) {
                return false;
            }
        } else {
            return false;
        }
        return (gc.limits().lower().isPresent() && v < gc.limits().lower().getAsDouble() - width)
                || (gc.limits().upper().isPresent() && v > gc.limits().upper().getAsDouble() + width);
    }

    /** Rows read (not blank, header excluded). */
    long rows() {
        return rows;
    }

    /** Finishes one characteristic: which subgroups are graded, and the problems of missing, short and late ones. */
    Collection finish(int ci) {
        return finish(ci, plan.slots().size(), plan.allowedShortfall());
    }

    /**
     * How far the return reaches: the number of planned slots up to and including the last one that came back
     * with a reading (or an unusable entry in a reading box) for any characteristic; 0 when none did. A staged
     * study's fill-in file carries the rows of every stage, so rows whose boxes are all empty do not count.
     */
    int reach() {
        int last = 0;
        for (SlotReadings col : collected) {
            for (int s = col.count.length - 1; s >= last; s--) {
                if (col.row[s] != 0 && (col.count[s] > 0 || col.spoiled[s])) {
                    last = s + 1;
                    break;
                }
            }
        }
        return last;
    }

    /**
     * Finishes one characteristic at a staged study's look: only the first {@code slotsSoFar} planned slots are
     * graded, against the allowance of a study of that many subgroups; the slots of later stages are neither
     * graded nor missing.
     */
    Collection finish(int ci, int slotsSoFar, int allowedShortfall) {
        return finish(ci, slotsSoFar, allowedShortfall, log);
    }

    /** As above, for an earlier look replayed: its problems are those of the look graded, so none are recorded twice. */
    Collection replay(int ci, int slotsSoFar, int allowedShortfall) {
        return finish(ci, slotsSoFar, allowedShortfall, new ProblemLog());
    }

    private Collection finish(int ci, int slotsSoFar, int allowedShortfall, ProblemLog log) {
        return collected[ci].finish(plan, slotsSoFar, allowedShortfall, plan.characteristics().get(ci).id(),
                display, takenCol >= 0 ? name(takenCol) : null, log);
    }

    /** All problems so far, in the order found, then the counts of those not listed. */
    List<Problem> problems() {
        if (decimalCommas > 0 && !commaNoted) {
            commaNoted = true;
            log.add(firstComma, Severity.NOTE, null, GradeMessage.DECIMAL_COMMA_READ, layout, decimalCommas,
                    Shown.cell(firstCommaText), CellValues.brief(firstCommaValue));
        }
        return log.all(display);
    }

    /**
     * One characteristic's graded subgroups.
     *
     * @param outOfReach readings set aside because they lie beyond the {@link Reach}
     */
    record Collection(Completeness completeness, List<double[]> subgroups, List<String> slots, int outOfReach) {

        /** Subgroups with no reading set aside (simulated studies). */
        Collection(Completeness completeness, List<double[]> subgroups, List<String> slots) {
            this(completeness, subgroups, slots, 0);
        }
    }
}

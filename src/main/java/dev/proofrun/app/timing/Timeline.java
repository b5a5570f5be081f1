package dev.proofrun.app.timing;

import dev.proofrun.app.AppMessage;
import dev.proofrun.schedule.BreakWindow;
import dev.proofrun.schedule.ProductionCalendar;
import dev.proofrun.schedule.Schedule;
import dev.proofrun.schedule.Shift;
import dev.proofrun.schedule.Slot;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.format.DateTimeFormatter;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javafx.geometry.BoundingBox;
import javafx.geometry.VPos;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.layout.Pane;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import javafx.scene.text.Text;
import javafx.scene.text.TextAlignment;

/**
 * Draws the schedule as one row per calendar date (0–24 h across): shifts as bands, breaks as gaps,
 * dates without shifts greyed, and each slot as a mark with its id and its time window. A window is shaded
 * only over working minutes; ids sit in two lanes and one that fits in neither is left out (its mark stays,
 * and a note under the rows says how many; the hand-out lists every slot). Only draws what the schedule
 * and calendar say; computes nothing of the plan.
 */
final class Timeline extends Pane {

    private static final Color[] SHIFT_COLOURS = {Color.web("#dfe9e2"), Color.web("#e6e1ef"), Color.web("#efe4d6")};
    private static final Color SLOT = Color.web("#a8552b");
    private static final Color INK = Color.web("#1d2733");
    private static final int MAX_ROWS = 42;

    private final Canvas canvas = new Canvas();
    private ProductionCalendar calendar;
    private Schedule schedule;

    Timeline() {
        setId("timeline");
        getChildren().add(canvas);
        widthProperty().addListener((o, a, b) -> draw());
        sceneProperty().addListener((o, a, b) -> {
            if (b != null && pending) {
                draw();
            }
        });
        getStyleClass().add("pr-timeline");
    }

    /** True when a schedule came while the timeline was out of the window: it is drawn on arriving there. */
    private boolean pending;

    void show(ProductionCalendar c, Schedule s) {
        this.calendar = c;
        this.schedule = s;
        draw();
    }

    /** The number of slots drawn (tests read it). */
    int slotsDrawn() {
        return schedule == null ? 0 : schedule.slots().size();
    }

    /** The boxes of the slot ids drawn, in the canvas's coordinates (tests read them). */
    List<BoundingBox> labelBoxes() {
        return List.copyOf(labelBoxes);
    }

    /** The number of slot ids left out because they fit in no lane (tests and the note read it). */
    int labelsLeftOut() {
        return leftOut;
    }

    private final List<BoundingBox> labelBoxes = new ArrayList<>();
    private int leftOut;

    private void draw() {
        if (getScene() == null) {
            pending = true;
            return;
        }
        pending = false;
        labelBoxes.clear();
        leftOut = 0;
        double em = Font.getDefault().getSize();
        double w = Math.max(getWidth(), 40 * em);
        GraphicsContext g = canvas.getGraphicsContext2D();
        if (calendar == null || schedule == null) {
            canvas.setWidth(w);
            canvas.setHeight(3 * em);
            g.clearRect(0, 0, w, 3 * em);
            g.setFill(INK);
            g.setFont(Font.font(em));
            g.setTextAlign(TextAlignment.LEFT);
            g.setTextBaseline(VPos.CENTER);
            g.fillText(AppMessage.TIMING_NO_SCHEDULE.format(), em, 1.5 * em);
            setPrefHeight(3 * em);
            setMinHeight(3 * em);
            return;
        }
        List<Slot> slots = schedule.slots();
        LocalDate first = local(slots.get(0)).toLocalDate();
        LocalDate last = schedule.end().atZoneSameInstant(calendar.zone()).toLocalDate();
        int rows = (int) Math.min(MAX_ROWS, ChronoUnit.DAYS.between(first, last) + 1);
        double row = 3.4 * em;
        double top = 1.8 * em;
        double left = 8.5 * em;
        double right = w - 1.8 * em; // room for half of the "24:00" centred on the right edge
        double h = top + rows * row + 2 * em;
        canvas.setWidth(w);
        canvas.setHeight(h);
        setPrefHeight(h);
        setMinHeight(h);
        g.clearRect(0, 0, w, h);
        g.setFont(Font.font(0.85 * em));
        g.setTextBaseline(VPos.CENTER);
        g.setFill(INK);
        g.setTextAlign(TextAlignment.CENTER);
        for (int hour = 0; hour <= 24; hour += 2) {
            double x = left + (right - left) * hour / 24.0;
            g.fillText(String.format(Locale.ROOT, "%02d:00", hour), x, top / 2);
            g.setStroke(Color.web("#dfe3e6"));
            g.strokeLine(x, top, x, top + rows * row);
        }
        DateTimeFormatter day = DateTimeFormatter.ofPattern("EEE yyyy-MM-dd", Locale.ENGLISH);
        for (int r = 0; r < rows; r++) {
            LocalDate d = first.plusDays(r);
            double y = top + r * row;
            g.setTextAlign(TextAlignment.LEFT);
            g.setFill(INK);
            g.fillText(d.format(day), 0.3 * em, y + row / 2);
            boolean working = calendar.isWorkingDate(d);
            if (!working) {
                g.setFill(Color.web("#eeeeea"));
                g.fillRect(left, y + 0.2 * em, right - left, row - 0.4 * em);
            }
            for (int s = 0; s < calendar.shifts().size(); s++) {
                Shift shift = calendar.shifts().get(s);
                Color c = SHIFT_COLOURS[s % SHIFT_COLOURS.length];
                if (working) {
                    band(g, c, shift.start(), shift.crossesMidnight() || shift.end().equals(shift.start()) ? LocalTime.MAX : shift.end(),
                            y, row, left, right, em, shift.name());
                }
                if (shift.crossesMidnight() && calendar.isWorkingDate(d.minusDays(1))) {
                    band(g, c, LocalTime.MIN, shift.end(), y, row, left, right, em, null);
                }
            }
            for (BreakWindow b : calendar.breaks()) {
                if (!b.crossesMidnight() && (working || calendar.isWorkingDate(d.minusDays(1)))) {
                    double x0 = x(b.start(), left, right);
                    double x1 = x(b.end(), left, right);
                    g.setFill(Color.web("#ffffffcc"));
                    g.fillRect(x0, y + 0.2 * em, Math.max(1, x1 - x0), row - 0.4 * em);
                }
            }
            if (!working) {
                g.setTextAlign(TextAlignment.CENTER);
                g.setFill(Color.web("#5a6673"));
                g.fillText("no shifts on this date", x(LocalTime.NOON, left, right), y + row / 2);
            }
            slotsOfRow(g, slots, d, y, row, left, right, em);
        }
        g.setTextAlign(TextAlignment.LEFT);
        g.setFill(INK);
        if (leftOut > 0) {
            g.fillText(AppMessage.TIMING_IDS_LEFT_OUT.format(leftOut), left, h - 1.4 * em);
        }
        if (rows == MAX_ROWS) {
            g.fillText("… the span goes on beyond these " + MAX_ROWS + " days", left, h - 0.5 * em);
        }
    }

    /**
     * One date's slots: each collection window shaded only where it lies in working minutes
     * ({@link WorkingHours}), the mark at the planned start, the ids in two lanes above the marks
     * ({@link SlotLabels}), so that no two ids overlap.
     */
    private void slotsOfRow(GraphicsContext g, List<Slot> slots, LocalDate d, double y, double row,
            double left, double right, double em) {
        List<Slot> here = new ArrayList<>();
        for (Slot s : slots) {
            if (local(s).toLocalDate().equals(d)) {
                here.add(s);
            }
        }
        if (here.isEmpty()) {
            return;
        }
        List<WorkingHours.Span> working = WorkingHours.of(calendar, d);
        double perMinute = (right - left) / WorkingHours.DAY;
        double markTop = y + 2.0 * em;
        double markHeight = row - 2.2 * em;
        Font font = Font.font(0.85 * em);
        double[] centres = new double[here.size()];
        double[] widths = new double[here.size()];
        for (int i = 0; i < here.size(); i++) {
            Slot s = here.get(i);
            LocalTime t = local(s).toLocalTime();
            double minute = t.toSecondOfDay() / 60.0;
            g.setFill(Color.web("#a8552b40"));
            for (WorkingHours.Span part : WorkingHours.clip(working, minute - s.windowMinutes(), minute + s.windowMinutes())) {
                g.fillRect(left + part.from() * perMinute, markTop, (part.to() - part.from()) * perMinute, markHeight);
            }
            centres[i] = x(t, left, right);
            g.setFill(SLOT);
            g.fillRect(centres[i] - 1.5, markTop, 3, markHeight);
            Text probe = new Text(s.id());
            probe.setFont(font);
            widths[i] = probe.getLayoutBounds().getWidth();
        }
        int[] lanes = SlotLabels.place(centres, widths, 0.4 * em, left, right, 2);
        g.setFont(font);
        g.setFill(INK);
        g.setTextAlign(TextAlignment.LEFT);
        for (int i = 0; i < here.size(); i++) {
            if (lanes[i] == SlotLabels.LEFT_OUT) {
                leftOut++;
                continue;
            }
            double x0 = SlotLabels.left(centres[i], widths[i], left, right);
            double yc = y + (0.65 + 0.9 * lanes[i]) * em;
            g.fillText(here.get(i).id(), x0, yc);
            labelBoxes.add(new BoundingBox(x0, yc - 0.45 * em, widths[i], 0.9 * em));
        }
    }

    private static void band(GraphicsContext g, Color c, LocalTime from, LocalTime to, double y, double row,
            double left, double right, double em, String name) {
        double x0 = x(from, left, right);
        double x1 = to == LocalTime.MAX ? right : x(to, left, right);
        g.setFill(c);
        g.fillRect(x0, y + 0.2 * em, x1 - x0, row - 0.4 * em);
        if (name != null) {
            g.setFill(Color.web("#5a6673"));
            g.setTextAlign(TextAlignment.LEFT);
            g.setFont(Font.font(0.75 * em));
            g.fillText(name, x0 + 0.2 * em, y + row - 0.55 * em);
            g.setFont(Font.font(0.85 * em));
        }
    }

    private static double x(LocalTime t, double left, double right) {
        return left + (right - left) * (t.toSecondOfDay() / 86400.0);
    }

    private LocalDateTime local(Slot s) {
        return s.start().atZoneSameInstant(calendar.zone()).toLocalDateTime();
    }
}

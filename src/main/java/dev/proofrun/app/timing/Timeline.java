package dev.proofrun.app.timing;

import dev.proofrun.schedule.BreakWindow;
import dev.proofrun.schedule.ProductionCalendar;
import dev.proofrun.schedule.Schedule;
import dev.proofrun.schedule.Shift;
import dev.proofrun.schedule.Slot;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import javafx.geometry.VPos;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.layout.Pane;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import javafx.scene.text.TextAlignment;

/**
 * Draws the schedule as one row per calendar date (0–24 h across): shifts as bands, breaks as gaps,
 * dates without shifts greyed, and each slot as a mark with its id and its time window. Only draws what
 * the schedule and calendar say; computes nothing of the plan.
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

    private void draw() {
        if (getScene() == null) {
            pending = true;
            return;
        }
        pending = false;
        double em = Font.getDefault().getSize();
        double w = Math.max(getWidth(), 40 * em);
        if (calendar == null || schedule == null) {
            canvas.setWidth(w);
            canvas.setHeight(3 * em);
            GraphicsContext g = canvas.getGraphicsContext2D();
            g.clearRect(0, 0, w, 3 * em);
            g.setFill(INK);
            g.setFont(Font.font(em));
            g.fillText("No schedule yet.", em, 2 * em);
            setPrefHeight(3 * em);
            return;
        }
        List<Slot> slots = schedule.slots();
        LocalDate first = local(slots.get(0)).toLocalDate();
        LocalDate last = schedule.end().atZoneSameInstant(calendar.zone()).toLocalDate();
        int rows = (int) Math.min(MAX_ROWS, java.time.temporal.ChronoUnit.DAYS.between(first, last) + 1);
        double row = 2.6 * em;
        double top = 1.8 * em;
        double left = 8.5 * em;
        double right = w - em;
        double h = top + rows * row + em;
        canvas.setWidth(w);
        canvas.setHeight(h);
        setPrefHeight(h);
        setMinHeight(h);
        GraphicsContext g = canvas.getGraphicsContext2D();
        g.clearRect(0, 0, w, h);
        g.setFont(Font.font(0.85 * em));
        g.setTextBaseline(VPos.CENTER);
        g.setFill(INK);
        g.setTextAlign(TextAlignment.CENTER);
        for (int hour = 0; hour <= 24; hour += 2) {
            double x = left + (right - left) * hour / 24.0;
            g.fillText(String.format(Locale.ROOT, "%02d:00", hour % 24 == 0 && hour > 0 ? 24 : hour), x, top / 2);
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
                if (calendar.isWorkingDate(d)) {
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
        }
        g.setTextAlign(TextAlignment.CENTER);
        g.setFill(Color.web("#5a6673"));
        for (int r = 0; r < rows; r++) {
            if (!calendar.isWorkingDate(first.plusDays(r))) {
                g.fillText("no shifts on this date", x(LocalTime.NOON, left, right), top + r * row + row / 2);
            }
        }
        for (Slot s : slots) {
            LocalDateTime t = local(s);
            int r = (int) java.time.temporal.ChronoUnit.DAYS.between(first, t.toLocalDate());
            if (r < 0 || r >= rows) {
                continue;
            }
            double y = top + r * row;
            double x = x(t.toLocalTime(), left, right);
            double win = (right - left) * s.windowMinutes() / (24.0 * 60);
            g.setFill(Color.web("#a8552b40"));
            g.fillRect(x - win, y + 0.9 * em, 2 * win, row - 1.1 * em);
            g.setFill(SLOT);
            g.fillRect(x - 1.5, y + 0.9 * em, 3, row - 1.1 * em);
            g.setFill(INK);
            g.fillText(s.id(), Math.min(Math.max(x, left + em), w - 1.2 * em), y + 0.5 * em);
        }
        if (rows == MAX_ROWS) {
            g.setTextAlign(TextAlignment.LEFT);
            g.fillText("… the span goes on beyond these " + MAX_ROWS + " days", left, h - 0.5 * em);
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

package dev.proofrun.app.part;

import static dev.proofrun.app.session.CharacteristicField.EXPECTED;
import static dev.proofrun.app.session.CharacteristicField.ID;
import static dev.proofrun.app.session.CharacteristicField.LSL;
import static dev.proofrun.app.session.CharacteristicField.NOMINAL;
import static dev.proofrun.app.session.CharacteristicField.THRESHOLD;
import static dev.proofrun.app.session.CharacteristicField.UNIT;
import static dev.proofrun.app.session.CharacteristicField.USL;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.CharacteristicField;
import dev.proofrun.app.session.CharacteristicListFile;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.FieldNumbers;
import dev.proofrun.app.session.PlanDrafts;
import dev.proofrun.app.session.RowRequirement;
import dev.proofrun.app.session.RowThreshold;
import dev.proofrun.app.session.StudyDraft;
import dev.proofrun.app.shell.StepViewModel;
import dev.proofrun.text.UserException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.regex.Pattern;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.StringBinding;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.ObservableList;

/**
 * The part and its characteristics. Every cell is validated as it is typed: {@link #problem} gives the
 * cell's message (the view marks the cell and shows the message under the table), {@link #firstProblemBinding}
 * the first problem of the whole table, which is also what the step misses.
 */
public final class PartViewModel extends StepViewModel {

    /** Units: a letter or unit sign first, then letters, digits and the usual joiners (mm, N·m, m/s^2, %). */
    private static final Pattern UNIT_TEXT = Pattern.compile("[\\p{L}µ°%Ω‰][\\p{L}\\p{N}µ°%Ω‰/·.^*²³-]{0,15}");

    private final StudyDraft draft;
    private final IntegerProperty selected = new SimpleIntegerProperty(this, "selected", -1);
    private final StringProperty importMessage = new SimpleStringProperty(this, "importMessage", "");
    private final StringProperty typing = new SimpleStringProperty(this, "typing", "");
    private final StringBinding firstProblem;
    private final StringBinding selectedProblem;

    public PartViewModel(StudyDraft draft) {
        super(AppMessage.STEP_PART.english(), AppMessage.STEP_PART_HINT.english());
        this.draft = draft;
        ObservableList<CharacteristicDraft> rows = draft.characteristics();
        firstProblem = Bindings.createStringBinding(this::computeFirstProblem, rows,
                draft.field(DraftField.PLAN_ID), draft.field(DraftField.PART_NAME));
        selectedProblem = Bindings.createStringBinding(() -> {
            int i = selected.get();
            return i >= 0 && i < rows.size() ? rowProblem(i).orElse("") : "";
        }, rows, selected);
        bindMissing(firstProblem);
    }

    public StringProperty planId() {
        return draft.field(DraftField.PLAN_ID);
    }

    public StringProperty partNumber() {
        return draft.field(DraftField.PART_NUMBER);
    }

    public StringProperty partName() {
        return draft.field(DraftField.PART_NAME);
    }

    public StringProperty preparedBy() {
        return draft.field(DraftField.PREPARED_BY);
    }

    public ObservableList<CharacteristicDraft> rows() {
        return draft.characteristics();
    }

    /** The table row the user is on (-1 for none); its problem is shown under the table. */
    public IntegerProperty selectedProperty() {
        return selected;
    }

    public StringBinding firstProblemBinding() {
        return firstProblem;
    }

    /** The problem of the selected row, empty when it is fine. */
    public StringBinding selectedProblemBinding() {
        return selectedProblem;
    }

    public StringProperty importMessageProperty() {
        return importMessage;
    }

    public CharacteristicDraft addRow() {
        CharacteristicDraft d = CharacteristicDraft.empty();
        d.cell(ID).set("C" + (rows().size() + 1));
        rows().add(d);
        selected.set(rows().size() - 1);
        return d;
    }

    public void removeRow(int index) {
        if (index >= 0 && index < rows().size()) {
            rows().remove(index);
            selected.set(Math.min(index, rows().size() - 1));
        }
    }

    /**
     * Replaces the table with the characteristics of a CSV list. On a bad file the table is left as it
     * was and the message (file, row, column) is shown.
     */
    public boolean importList(Path file) {
        try {
            List<CharacteristicDraft> read = CharacteristicListFile.read(file);
            rows().setAll(read);
            undo.clear();
            selected.set(0);
            importMessage.set(AppMessage.PART_IMPORTED.format(read.size(), file.getFileName()));
            return true;
        } catch (UserException e) {
            importMessage.set(e.getMessage());
            return false;
        }
    }

    /** One cell's text before an edit: undoing puts it back. */
    private record Change(CharacteristicDraft row, CharacteristicField field, String before) {
    }

    /** One undoable edit: the cells it changed and the rows it added at the end. */
    private record Edit(List<Change> changes, List<CharacteristicDraft> added) {
    }

    private final java.util.Deque<Edit> undo = new java.util.ArrayDeque<>();

    /** Sets one cell of the grid (an edit committed, a cell cleared) as one undoable edit. */
    public void setCell(int row, CharacteristicField field, String text) {
        if (row < 0 || row >= rows().size()) {
            return;
        }
        CharacteristicDraft r = rows().get(row);
        String now = text == null ? "" : text;
        String before = r.cell(field).get();
        if (!now.equals(before)) {
            List<Change> changes = new ArrayList<>(List.of(new Change(r, field, before)));
            r.cell(field).set(now);
            if (field == CharacteristicField.SHAPE && !RowThreshold.takes(r)) {
                // a shape that takes no threshold empties the threshold's and the floor's cells, in the same undoable edit
                for (CharacteristicField cell : List.of(THRESHOLD, CharacteristicField.FLOOR)) {
                    if (!r.text(cell).isEmpty()) {
                        changes.add(new Change(r, cell, r.text(cell)));
                        r.cell(cell).set("");
                    }
                }
            }
            undo.push(new Edit(List.copyOf(changes), List.of()));
        }
    }

    /**
     * Pastes a tab-separated block (rows on lines, as a spreadsheet copies them) with its top-left cell at
     * ({@code row}, {@code column}), adding rows at the end as needed; columns past the last are left out.
     * Each cell is then checked as if typed. One undoable edit.
     *
     * @return the number of cells pasted
     */
    public int paste(int row, int column, String block) {
        if (block == null || block.isEmpty() || row < 0 || column < 0) {
            return 0;
        }
        String[] lines = block.replace("\r\n", "\n").replace('\r', '\n').split("\n", -1);
        int count = lines.length;
        while (count > 0 && lines[count - 1].isEmpty()) {
            count--; // the line break a spreadsheet puts after its last row
        }
        CharacteristicField[] fields = CharacteristicField.values();
        List<Change> changes = new ArrayList<>();
        List<CharacteristicDraft> added = new ArrayList<>();
        int pasted = 0;
        for (int i = 0; i < count; i++) {
            int at = Math.min(row, rows().size()) + i;
            if (at >= rows().size()) {
                added.add(addRow());
            }
            CharacteristicDraft r = rows().get(at);
            String[] cells = lines[i].split("\t", -1);
            for (int j = 0; j < cells.length && column + j < fields.length; j++) {
                CharacteristicField f = fields[column + j];
                changes.add(new Change(r, f, r.cell(f).get()));
                r.cell(f).set(cells[j].trim());
                pasted++;
            }
        }
        if (!changes.isEmpty() || !added.isEmpty()) {
            undo.push(new Edit(List.copyOf(changes), List.copyOf(added)));
        }
        return pasted;
    }

    /** Undoes the latest grid edit (a cell, a clear, a paste); false when there is nothing to undo. */
    public boolean undo() {
        Edit e = undo.poll();
        if (e == null) {
            return false;
        }
        for (int i = e.changes().size() - 1; i >= 0; i--) {
            Change c = e.changes().get(i);
            c.row().cell(c.field()).set(c.before());
        }
        rows().removeAll(e.added());
        selected.set(Math.min(selected.get(), rows().size() - 1));
        return true;
    }

    /** The problem of the cell being typed into, checked on each keystroke before it is committed. */
    public StringProperty typingProblemProperty() {
        return typing;
    }

    /**
     * Checks text being typed into a cell with the same rules as a committed cell, on a copy of the row,
     * so the message follows each keystroke.
     */
    public void typing(CharacteristicDraft row, CharacteristicField field, String text) {
        CharacteristicDraft copy = CharacteristicDraft.of(row.values());
        copy.cell(field).set(text);
        int i = rows().indexOf(row);
        String id = copy.id().isEmpty() ? "?" : copy.id();
        for (CharacteristicField f : CharacteristicField.values()) {
            Optional<String> p = f == CharacteristicField.ID ? idProblem(copy, row) : problem(copy, f);
            if (p.isPresent()) {
                typing.set(AppMessage.PART_ROW_PROBLEM.format(i + 1, id, p.get()));
                return;
            }
        }
        typing.set("");
    }

    /** The edit ended (committed or cancelled). */
    public void typingDone() {
        typing.set("");
    }

    private Optional<String> idProblem(CharacteristicDraft copy, CharacteristicDraft original) {
        String text = copy.id();
        if (text.isEmpty()) {
            return Optional.of(AppMessage.PART_ID_MISSING.format());
        }
        boolean clash = rows().stream().anyMatch(r -> r != original && r.id().equalsIgnoreCase(text));
        return clash ? Optional.of(AppMessage.PART_ID_REPEATED.format(text)) : Optional.empty();
    }

    /** False for a cell with nothing to hold (a threshold or floor on a shape that takes none): empty, greyed, not edited. */
    public boolean cellOpen(CharacteristicDraft row, CharacteristicField field) {
        return !RowThreshold.isThresholdCell(field) || RowThreshold.open(row, field);
    }

    /** The problem of one cell, or empty when the cell is fine. */
    public Optional<String> problem(CharacteristicDraft row, CharacteristicField field) {
        String text = row.text(field).trim();
        switch (field) {
            case ID:
                if (text.isEmpty()) {
                    return Optional.of(AppMessage.PART_ID_MISSING.format());
                }
                long same = rows().stream().filter(r -> r.text(ID).trim().equalsIgnoreCase(text)).count();
                return same > 1 ? Optional.of(AppMessage.PART_ID_REPEATED.format(text)) : Optional.empty();
            case NAME:
                return Optional.empty();
            case GAUGE:
                return row.text(CharacteristicField.RESOLUTION).isBlank() || !text.isEmpty() ? Optional.empty()
                        : Optional.of(AppMessage.PART_GAUGE_UNNAMED.format());
            case RESOLUTION:
                if (text.isEmpty()) {
                    String gauge = row.text(CharacteristicField.GAUGE).trim();
                    return gauge.isEmpty() ? Optional.empty() : Optional.of(AppMessage.PART_RESOLUTION_MISSING.format(gauge));
                }
                OptionalDouble step = FieldNumbers.parse(text);
                return step.isPresent() && step.getAsDouble() > 0 ? Optional.empty()
                        : Optional.of(AppMessage.PART_RESOLUTION_BAD.format(text));
            case SHAPE:
                try {
                    PlanDrafts.shapeOf(row);
                    return Optional.empty();
                } catch (IllegalArgumentException e) {
                    return Optional.of(e.getMessage());
                }
            case THRESHOLD, FLOOR:
                return RowThreshold.problem(row, field);
            case INDEX, TARGET, CONFIDENCE, EXPECTED_CP:
                return RowRequirement.problem(row, field);
            case UNIT:
                if (text.isEmpty()) {
                    return Optional.of(AppMessage.PART_UNIT_MISSING.format());
                }
                return UNIT_TEXT.matcher(text).matches() ? Optional.empty()
                        : Optional.of(AppMessage.PART_UNIT_BAD.format(text));
            default:
                break;
        }
        if (!FieldNumbers.blankOrNumber(text)) {
            return Optional.of(AppMessage.PART_NOT_A_NUMBER.format(label(field), text));
        }
        OptionalDouble lsl = FieldNumbers.parse(row.text(LSL));
        OptionalDouble usl = FieldNumbers.parse(row.text(USL));
        boolean limitsTyped = FieldNumbers.blankOrNumber(row.text(LSL)) && FieldNumbers.blankOrNumber(row.text(USL));
        if (field == LSL || field == USL) {
            if (limitsTyped && lsl.isEmpty() && usl.isEmpty()) {
                return Optional.of(AppMessage.PART_NO_LIMIT.format());
            }
            if (lsl.isPresent() && usl.isPresent() && !(lsl.getAsDouble() < usl.getAsDouble())) {
                return Optional.of(AppMessage.PART_LIMITS_ORDER.format(row.text(LSL).trim(), row.text(USL).trim()));
            }
            return Optional.empty();
        }
        if (field == NOMINAL) {
            OptionalDouble v = FieldNumbers.parse(text);
            if (v.isPresent() && ((lsl.isPresent() && v.getAsDouble() < lsl.getAsDouble())
                    || (usl.isPresent() && v.getAsDouble() > usl.getAsDouble()))) {
                return Optional.of(AppMessage.PART_OUTSIDE.format(label(field), text));
            }
            return Optional.empty();
        }
        if (field == EXPECTED) {
            OptionalDouble v = FieldNumbers.parse(text);
            return v.isPresent() && !(v.getAsDouble() > 0) ? Optional.of(AppMessage.PART_EXPECTED_BAD.format()) : Optional.empty();
        }
        return Optional.empty();
    }

    /** The first problem of row i as "row 2 (C2): ...". */
    public Optional<String> rowProblem(int i) {
        CharacteristicDraft row = rows().get(i);
        for (CharacteristicField f : CharacteristicField.values()) {
            Optional<String> p = problem(row, f);
            if (p.isPresent()) {
                String id = row.text(ID).isBlank() ? "?" : row.text(ID).trim();
                return Optional.of(AppMessage.PART_ROW_PROBLEM.format(i + 1, id, p.get()));
            }
        }
        return Optional.empty();
    }

    private String computeFirstProblem() {
        if (draft.text(DraftField.PLAN_ID).isEmpty()) {
            return AppMessage.PART_PLAN_ID_MISSING.format();
        }
        if (draft.text(DraftField.PART_NAME).isEmpty()) {
            return AppMessage.PART_NAME_MISSING.format();
        }
        if (rows().isEmpty()) {
            return AppMessage.PART_NO_ROWS.format();
        }
        for (int i = 0; i < rows().size(); i++) {
            Optional<String> p = rowProblem(i);
            if (p.isPresent()) {
                return p.get();
            }
        }
        return "";
    }

    /** The column title as the table shows it. */
    public static String label(CharacteristicField f) {
        return switch (f) {
            case ID -> "Id";
            case NAME -> "Name";
            case UNIT -> "Unit";
            case NOMINAL -> "Nominal";
            case LSL -> "LSL";
            case USL -> "USL";
            case INDEX -> "Index";
            case TARGET -> "Required c₀";
            case CONFIDENCE -> "Confidence";
            case EXPECTED -> "Expected index";
            case EXPECTED_CP -> "Expected Cp";
            case SHAPE -> "Shape";
            case THRESHOLD -> "Threshold";
            case FLOOR -> "Floor";
            case GAUGE -> "Gauge";
            case RESOLUTION -> "Resolution";
        };
    }
}

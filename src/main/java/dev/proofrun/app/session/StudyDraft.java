package dev.proofrun.app.session;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ListChangeListener;
import javafx.collections.ObservableList;

/**
 * Everything the user has typed into the wizard for one study, as text properties shared by the steps.
 * Any edit raises {@link #dirtyProperty()} and bumps {@link #editsProperty()} (the shell autosaves on
 * it, the sizing step recomputes on it). {@link #snapshot()} and {@link #restore} copy it to and from
 * the side file.
 */
public final class StudyDraft {

    private final EnumMap<DraftField, StringProperty> fields = new EnumMap<>(DraftField.class);
    private final ObservableList<CharacteristicDraft> characteristics =
            FXCollections.observableArrayList(CharacteristicDraft::observables);
    private final ObjectProperty<Path> planFile = new SimpleObjectProperty<>(this, "planFile");
    private final BooleanProperty dirty = new SimpleBooleanProperty(this, "dirty", false);
    private final IntegerProperty edits = new SimpleIntegerProperty(this, "edits", 0);
    private boolean quiet;

    public StudyDraft() {
        for (DraftField f : DraftField.values()) {
            StringProperty p = new SimpleStringProperty(this, f.name(), f.initial());
            if (f != DraftField.RETURNED_FILE) {
                // the returned file is remembered in the draft but is not a change to the plan
                p.addListener((obs, was, now) -> touched());
            }
            fields.put(f, p);
        }
        characteristics.addListener((ListChangeListener<CharacteristicDraft>) c -> touched());
    }

    private void touched() {
        if (quiet) {
            return;
        }
        dirty.set(true);
        edits.set(edits.get() + 1);
    }

    public StringProperty field(DraftField f) {
        return fields.get(f);
    }

    public String text(DraftField f) {
        return fields.get(f).get().trim();
    }

    public ObservableList<CharacteristicDraft> characteristics() {
        return characteristics;
    }

    /** The plan file this draft was opened from or saved to; null for a plan never saved. */
    public ObjectProperty<Path> planFileProperty() {
        return planFile;
    }

    /** True while there are edits not written into the plan file. */
    public BooleanProperty dirtyProperty() {
        return dirty;
    }

    /** Counts edits; listeners use it as "something changed". */
    public ReadOnlyIntegerProperty editsProperty() {
        return edits;
    }

    public DraftSnapshot snapshot() {
        Map<String, String> f = new java.util.LinkedHashMap<>();
        fields.forEach((k, v) -> f.put(k.name(), v.get() == null ? "" : v.get()));
        List<Map<String, String>> rows = new ArrayList<>();
        characteristics.forEach(c -> rows.add(c.values()));
        Path p = planFile.get();
        return new DraftSnapshot(DraftSnapshot.FORMAT, p == null ? "" : p.toString(), f, rows);
    }

    /**
     * Replaces every field and row with the snapshot's.
     *
     * @param s     the snapshot
     * @param dirty whether the restored content counts as unsaved (true for a draft restored over a plan)
     */
    public void restore(DraftSnapshot s, boolean dirty) {
        quiet = true;
        try {
            for (DraftField f : DraftField.values()) {
                String v = s.fields().get(f.name());
                fields.get(f).set(v == null ? f.initial() : v);
            }
            characteristics.setAll(s.characteristics().stream().map(CharacteristicDraft::of).toList());
            planFile.set(s.planFile().isEmpty() ? null : Path.of(s.planFile()));
        } finally {
            quiet = false;
        }
        this.dirty.set(dirty);
        edits.set(edits.get() + 1);
    }

    /** Marks the current content as written to the plan file. */
    public void markSaved() {
        dirty.set(false);
    }
}

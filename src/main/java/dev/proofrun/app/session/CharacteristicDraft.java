package dev.proofrun.app.session;

import java.util.EnumMap;
import java.util.Map;
import javafx.beans.Observable;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;

/** One characteristic as typed: one text property per {@link CharacteristicField}. */
public final class CharacteristicDraft {

    private final EnumMap<CharacteristicField, StringProperty> cells = new EnumMap<>(CharacteristicField.class);

    private CharacteristicDraft() {
        for (CharacteristicField f : CharacteristicField.values()) {
            cells.put(f, new SimpleStringProperty(this, f.header(), ""));
        }
    }

    public static CharacteristicDraft empty() {
        return new CharacteristicDraft();
    }

    /** From header → text; missing keys stay empty. */
    public static CharacteristicDraft of(Map<String, String> values) {
        CharacteristicDraft d = new CharacteristicDraft();
        for (CharacteristicField f : CharacteristicField.values()) {
            String v = values.get(f.header());
            d.cell(f).set(v == null ? "" : v);
        }
        return d;
    }

    public StringProperty cell(CharacteristicField field) {
        return cells.get(field);
    }

    public String text(CharacteristicField field) {
        return cells.get(field).get();
    }

    /** The cell as a number, empty when blank or not a number. */
    public java.util.OptionalDouble number(CharacteristicField field) {
        return FieldNumbers.parse(text(field));
    }

    /** The specification limits when they are typed correctly. */
    public java.util.Optional<dev.proofrun.stats.SpecLimits> limits() {
        if (!FieldNumbers.blankOrNumber(text(CharacteristicField.LSL)) || !FieldNumbers.blankOrNumber(text(CharacteristicField.USL))) {
            return java.util.Optional.empty();
        }
        java.util.OptionalDouble lsl = number(CharacteristicField.LSL);
        java.util.OptionalDouble usl = number(CharacteristicField.USL);
        if (lsl.isEmpty() && usl.isEmpty()) {
            return java.util.Optional.empty();
        }
        if (lsl.isPresent() && usl.isPresent() && !(lsl.getAsDouble() < usl.getAsDouble())) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(new dev.proofrun.stats.SpecLimits(lsl, usl));
    }

    /** The id as typed, trimmed. */
    public String id() {
        return text(CharacteristicField.ID).trim();
    }

    /** The properties, for list extractors that fire on any edit. */
    public Observable[] observables() {
        return cells.values().toArray(new Observable[0]);
    }

    /** header → text, in column order. */
    public Map<String, String> values() {
        Map<String, String> m = new java.util.LinkedHashMap<>();
        for (CharacteristicField f : CharacteristicField.values()) {
            m.put(f.header(), text(f));
        }
        return m;
    }
}

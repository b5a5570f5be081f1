package dev.proofrun.app.shell;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javafx.scene.control.Labeled;
import javafx.scene.control.Tooltip;
import javafx.util.Duration;

/**
 * Puts the {@link IndexTip} texts on screen: a text that names indices (Cpk, Pp, …) or a lower bound gets a
 * tooltip with the tip of each, in the order they appear. {@link #follow} keeps a label's tooltip in step
 * with its text, so every label that shows an index explains it with the same words.
 */
public final class IndexTooltips {

    /** Index symbols as whole words; "Cpk" before "Cp" so the longer one wins. */
    private static final Pattern SYMBOL = Pattern.compile("\\b(Cpk|Cpu|Cpl|Cpm|Cp|Ppk|Ppu|Ppl|Pp)\\b");
    private static final Pattern BOUND = Pattern.compile("\\b(lower|Lower)\\b[^.;]*?\\bbound\\b");

    private IndexTooltips() {
    }

    /** The tips a text calls for, in order of appearance, the lower bound last; empty if it names no index. */
    public static List<IndexTip> tipsFor(String text) {
        Set<IndexTip> tips = new LinkedHashSet<>();
        if (text == null) {
            return List.of();
        }
        Matcher m = SYMBOL.matcher(text);
        while (m.find()) {
            tips.add(IndexTip.valueOf(m.group(1).toUpperCase(Locale.ROOT)));
        }
        if (!tips.isEmpty() && BOUND.matcher(text).find()) {
            tips.add(IndexTip.LOWER_BOUND);
        }
        return new ArrayList<>(tips);
    }

    /** The tooltip text for a text: the tips it calls for, separated by a blank line; "" if none. */
    public static String textFor(String text) {
        StringBuilder b = new StringBuilder();
        for (IndexTip t : tipsFor(text)) {
            b.append(b.length() == 0 ? "" : "\n\n").append(t.english());
        }
        return b.toString();
    }

    /** A tooltip with the given tips (wrapped, shown quickly, stays while read). */
    public static Tooltip tooltip(String tipText) {
        Tooltip t = new Tooltip(tipText);
        t.setWrapText(true);
        t.setMaxWidth(FontScale.of(34));
        t.setShowDelay(Duration.millis(300));
        t.setShowDuration(Duration.seconds(30));
        return t;
    }

    /** Sets the label's tooltip from its text now and whenever the text changes. */
    public static <T extends Labeled> T follow(T label) {
        apply(label);
        label.textProperty().addListener((o, a, b) -> apply(label));
        return label;
    }

    /** Sets (or clears) the tooltip of a label or table cell from its current text. */
    public static void apply(Labeled label) {
        String tip = textFor(label.getText());
        if (tip.isEmpty()) {
            label.setTooltip(null);
        } else if (label.getTooltip() == null) {
            label.setTooltip(tooltip(tip));
        } else {
            label.getTooltip().setText(tip);
        }
    }
}

package dev.proofrun.text;

import java.util.Locale;

/**
 * A message that people read, identified by a stable key with its English text inline.
 *
 * <p>Each layer keeps its messages in an enum implementing this interface, so that the wizard and the
 * command line show the same words. Templates use {@link String#format} syntax and are formatted with
 * {@link Locale#ROOT}, so numbers never depend on the machine's locale.
 */
public interface MessageKey {

    /** The stable key, by convention the enum constant's name. */
    String name();

    /** The English template. */
    String english();

    /**
     * Formats the template with the given arguments. Text arguments are shown {@link Shown#escaped escaped}, so
     * a value with a line break in it cannot split the message into two lines.
     *
     * @param args the values the template refers to
     * @return the text to show
     */
    default String format(Object... args) {
        Object[] shown = args;
        for (int i = 0; i < args.length; i++) {
            if (args[i] instanceof CharSequence) {
                if (shown == args) {
                    shown = args.clone();
                }
                shown[i] = Shown.escaped(args[i].toString());
            }
        }
        return String.format(Locale.ROOT, english(), shown);
    }
}

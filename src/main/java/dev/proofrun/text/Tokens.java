package dev.proofrun.text;

import java.util.Arrays;
import java.util.Optional;
import java.util.function.Function;

/**
 * The one rule for reading an enum constant from its word in a file or an option: the word as given, white
 * space around it ignored, any case ({@code " Even "} names {@code even}). Each enum keeps its own message for a
 * word it does not know.
 */
public final class Tokens {

    private Tokens() {
    }

    /**
     * The constant of {@code type} whose word equals {@code text}, ignoring case and the white space around it.
     *
     * @param type the enum
     * @param word the constant's word ({@code Spacing::token})
     * @param text what the user wrote; {@code null} matches nothing
     * @return the constant, or empty when no constant has that word
     */
    public static <E extends Enum<E>> Optional<E> find(Class<E> type, Function<E, String> word, String text) {
        if (text == null) {
            return Optional.empty();
        }
        String wanted = text.trim();
        return Arrays.stream(type.getEnumConstants()).filter(e -> word.apply(e).equalsIgnoreCase(wanted)).findFirst();
    }
}

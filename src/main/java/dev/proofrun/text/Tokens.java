package dev.proofrun.text;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Function;

/**
 * The one rule for reading an enum constant from its word in a file or an option: the word as given, white
 * space around it ignored, any case ({@code " Even "} names {@code even}). An enum that implements {@link Token}
 * is read by {@link #parse}, which refuses an unknown word with one message that lists the words it knows:
 * {@code unknown spacing 'odd' (even or random)}.
 */
public final class Tokens {

    private Tokens() {
    }

    /**
     * The constant of {@code type} whose word equals {@code text}, ignoring case and the white space around it.
     *
     * @param type the enum
     * @param word the constant's word ({@code Token::token}, or another word of its own)
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

    /**
     * The constant of {@code type} whose {@link Token#token() token} equals {@code text}, as {@link #find}.
     *
     * @param type the enum
     * @param text what the user wrote; {@code null} matches nothing
     * @return the constant, or empty when no constant has that word
     */
    public static <E extends Enum<E> & Token> Optional<E> find(Class<E> type, String text) {
        return find(type, Token::token, text);
    }

    /**
     * The constant of {@code type} whose {@link Token#token() token} equals {@code text}, as {@link #find}.
     *
     * @param type the enum
     * @param what what the enum names, for the message ({@code "spacing"}, {@code "sigma method"})
     * @param text what the user wrote
     * @return the constant
     * @throws IllegalArgumentException {@code unknown WHAT 'TEXT' (a, b or c)} when no constant has that word; the
     *                                  text is shown trimmed, escaped and cut ({@link Shown#cell})
     */
    public static <E extends Enum<E> & Token> E parse(Class<E> type, String what, String text) {
        return find(type, text).orElseThrow(() -> new IllegalArgumentException(String.format(Locale.ROOT,
                "unknown %s '%s' (%s)", what, text == null ? "" : Shown.cell(text.trim()), known(type))));
    }

    /** The tokens of {@code type}, each once, in order: {@code "a"}, {@code "a or b"}, {@code "a, b or c"}. */
    private static <E extends Enum<E> & Token> String known(Class<E> type) {
        List<String> words = Arrays.stream(type.getEnumConstants()).map(Token::token).distinct().toList();
        int last = words.size() - 1;
        return last == 0 ? words.get(0) : String.join(", ", words.subList(0, last)) + " or " + words.get(last);
    }
}

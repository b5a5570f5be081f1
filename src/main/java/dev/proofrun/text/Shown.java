package dev.proofrun.text;

/**
 * How text from a user's file is shown inside a message, so that every message stays one readable line.
 *
 * <p>{@link #escaped}: control characters (category Cc: line feed, carriage return, tab, NUL, …), the line and
 * paragraph separators U+2028/U+2029, the byte-order mark U+FEFF and the bidirectional overrides
 * (U+202A–U+202E, U+2066–U+2069) are written as escapes: {@code \n}, {@code \r}, {@code \t}, otherwise
 * {@code \}{@code u} with four hex digits. Everything else is kept, including non-Latin letters. Applying it twice
 * gives the same text as once (an escape is plain ASCII).
 *
 * <p>{@link #cell}: a cell's value escaped and, when longer than {@value #CELL_CHARACTERS} characters, cut with
 * its length said ({@code "22.0015xxxx…" (10007 characters)}), so a 10,000-character remark does not become a
 * 10,000-character message.
 */
public final class Shown {

    /** Characters of a cell's value shown in a message before it is cut. */
    public static final int CELL_CHARACTERS = 60;

    private Shown() {
    }

    /** The text with every character that would break or reorder a line escaped. */
    public static String escaped(String text) {
        StringBuilder sb = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            String escape = escape(c);
            if (escape != null && sb == null) {
                sb = new StringBuilder(text.length() + 8).append(text, 0, i);
            }
            if (sb != null) {
                if (escape != null) {
                    sb.append(escape);
                } else {
                    sb.append(c);
                }
            }
        }
        return sb == null ? text : sb.toString();
    }

    /** A cell's value for a message: {@link #escaped}, cut after {@value #CELL_CHARACTERS} characters. */
    public static String cell(String text) {
        if (text.length() <= CELL_CHARACTERS) {
            return escaped(text);
        }
        int end = CELL_CHARACTERS;
        if (Character.isHighSurrogate(text.charAt(end - 1))) {
            end--; // never cut a character in two
        }
        return escaped(text.substring(0, end)) + "\u2026 (" + text.length() + " characters)";
    }

    private static String escape(char c) {
        switch (c) {
            case '\n':
                return "\\n";
            case '\r':
                return "\\r";
            case '\t':
                return "\\t";
            default:
                boolean hidden = Character.getType(c) == Character.CONTROL || c == '\u2028' || c == '\u2029' || c == '\uFEFF'
                        || (c >= '\u202A' && c <= '\u202E') || (c >= '\u2066' && c <= '\u2069');
                return hidden ? String.format(java.util.Locale.ROOT, "\\u%04X", (int) c) : null;
        }
    }
}

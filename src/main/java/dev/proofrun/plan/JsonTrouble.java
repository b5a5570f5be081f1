package dev.proofrun.plan;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.exc.InputCoercionException;
import com.fasterxml.jackson.core.io.JsonEOFException;
import dev.proofrun.text.Location;
import dev.proofrun.text.Shown;
import dev.proofrun.text.UserException;
import java.nio.charset.StandardCharsets;
import java.util.Locale;

/**
 * A plan file that is not well-formed JSON, said in our words with the JSON path and the line: the parser's
 * own message (its class names, token names and "code 120") is looked at here and never shown.
 *
 * <p>A key that appears twice in one object is refused ({@link PlanMessage#DUPLICATE_KEY}) naming the key and
 * its path: a plan is fingerprinted and handed to suppliers, so it must say each thing once (the parser
 * would otherwise keep the last value and the revision check would pass).
 */
final class JsonTrouble {

    private JsonTrouble() {
    }

    /** The refusal for a file the parser stopped on. */
    static UserException of(JsonProcessingException e, Location where, byte[] bytes) {
        int line = e.getLocation() == null ? 0 : e.getLocation().getLineNr();
        int column = e.getLocation() == null ? 0 : e.getLocation().getColumnNr();
        String path = "$";
        String key = null;
        if (e.getProcessor() instanceof JsonParser) {
            JsonStreamContext ctx = ((JsonParser) e.getProcessor()).getParsingContext();
            path = JsonPaths.of(ctx);
            key = ctx == null ? null : ctx.getCurrentName();
        }
        String m = String.valueOf(e.getOriginalMessage());
        if (m.startsWith("Duplicate field") && key != null) {
            return new UserException(where, PlanMessage.DUPLICATE_KEY, path, Shown.cell(key), line);
        }
        long offset = e.getLocation() == null ? -1 : e.getLocation().getByteOffset();
        if (e instanceof JsonEOFException || offset >= bytes.length) {
            return new UserException(where, PlanMessage.TRUNCATED, path, line);
        }
        return new UserException(where, PlanMessage.NOT_JSON, path, line, column, words(e, m, bytes, offset));
    }

    /** What is wrong at the place the parser stopped. */
    private static String words(JsonProcessingException e, String m, byte[] bytes, long offset) {
        String lower = m.toLowerCase(Locale.ROOT);
        if (e instanceof InputCoercionException || lower.contains("out of range")) {
            return "the number is too large";
        }
        if (lower.contains("invalid utf-8") || lower.contains("invalid utf8")) {
            return "the file is not UTF-8 text";
        }
        if (lower.contains("illegal unquoted character") || lower.contains("ctrl-char")) {
            return "a control character (a line break, a tab) inside text must be written as an escape such as \\n";
        }
        if (lower.contains("unrecognized token")) {
            return "a value that is not JSON (text needs double quotes; numbers use a decimal point)";
        }
        if (lower.contains("leading zero") || lower.contains("numeric value") || lower.contains("number")) {
            return "a number that is not written as JSON writes numbers";
        }
        if (lower.contains("unexpected close marker")) {
            return "a closing bracket or brace that does not match the one opened";
        }
        String at = offset >= 0 && offset < bytes.length
                ? new String(bytes, (int) offset, Math.min(4, bytes.length - (int) offset), StandardCharsets.UTF_8).substring(0, 1)
                : "";
        return at.isEmpty() || at.charAt(0) == '\uFFFD' ? "unexpected text"
                : "unexpected '" + Shown.cell(at) + "' (a missing comma, colon or quote?)";
    }
}

package dev.proofrun.plan;

import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.databind.JsonMappingException;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;

/** JSON paths as people read them: {@code $.characteristics[1].lsl}. */
final class JsonPaths {

    private JsonPaths() {
    }

    /** The path of a Jackson mapping problem. */
    static String of(List<JsonMappingException.Reference> refs) {
        StringBuilder sb = new StringBuilder("$");
        for (JsonMappingException.Reference r : refs) {
            if (r.getFieldName() != null) {
                sb.append('.').append(r.getFieldName());
            } else if (r.getIndex() >= 0) {
                sb.append('[').append(r.getIndex()).append(']');
            }
        }
        return sb.toString();
    }

    /** The path where a parser stopped. */
    static String of(JsonStreamContext ctx) {
        Deque<String> parts = new ArrayDeque<>();
        for (JsonStreamContext c = ctx; c != null && !c.inRoot(); c = c.getParent()) {
            if (c.inArray()) {
                parts.push("[" + Math.max(0, c.getCurrentIndex()) + "]");
            } else if (c.inObject() && c.getCurrentName() != null) {
                parts.push("." + c.getCurrentName());
            }
        }
        return "$" + String.join("", parts);
    }

    /** "a number", "text", ... for a target type. */
    static String kind(Class<?> type) {
        if (Number.class.isAssignableFrom(type) || (type.isPrimitive() && type != boolean.class)) {
            return type == Integer.class || type == Long.class ? "a whole number" : "a number";
        }
        if (type == String.class) {
            return "text";
        }
        if (List.class.isAssignableFrom(type)) {
            return "a list";
        }
        return "an object";
    }
}

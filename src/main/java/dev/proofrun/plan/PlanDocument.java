package dev.proofrun.plan;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * The plan as one JSON object for other programs ({@code proofrun plan show --json}): the plan file's
 * fields, plus {@code reference} ("id@revision"), {@code summary} (the frequency sentence),
 * {@code integrity} (draft, intact, changed-after-issue) and {@code slots} at the top level:
 * {@code [{id, start, windowMinutes, shift, partsSinceStart}]}, start as ISO-8601 with offset.
 */
public final class PlanDocument {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private PlanDocument() {
    }

    public static ObjectNode tree(StudyPlan plan, PlanFiles.Integrity integrity) {
        ObjectNode file = MAPPER.valueToTree(PlanCodec.toJson(plan));
        ObjectNode out = MAPPER.createObjectNode();
        out.put("id", plan.id());
        out.put("reference", plan.reference());
        out.put("state", plan.state().token());
        if (plan.revision().isPresent()) {
            out.put("revision", plan.revision().get());
        } else {
            out.putNull("revision");
        }
        out.put("revisionNumber", plan.revisionNumber());
        out.put("integrity", integrity.token());
        out.put("summary", plan.summary());
        ArrayNode slots = (ArrayNode) file.path("schedule").path("slots");
        out.set("slots", slots.deepCopy());
        file.fieldNames().forEachRemaining(name -> {
            if (!out.has(name) && !name.equals("format")) {
                out.set(name, file.get(name));
            }
        });
        return out;
    }

    public static String json(StudyPlan plan, PlanFiles.Integrity integrity) {
        try {
            return MAPPER.writeValueAsString(tree(plan, integrity));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("plan could not be written as JSON", e);
        }
    }
}

package dev.rootform.api.batch;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/** What one command made of one request: its JSON answer, or why there is none; each with the command's exit code. */
sealed interface Reply permits Reply.Answered, Reply.Failed {
    /** The exit code the command would give for this request. */
    int exit();

    /** Puts this reply's keys into the answer line, after {@code "id"}. */
    void writeTo(ObjectNode line);

    /** The answer line: {@code {"id", "exit", ...answer}} or {@code {"id", "error", "exit"}}. */
    default BatchAnswer toAnswer(JsonNode id) {
        ObjectNode line = Json.object();
        line.set("id", id);
        writeTo(line);
        return BatchAnswer.of(id.asText(), Json.line(line), exit());
    }

    /** @param body the command's own JSON answer */
    record Answered(ObjectNode body, int exit) implements Reply {
        @Override
        public void writeTo(ObjectNode line) {
            line.put("exit", exit);
            line.setAll(body);
        }
    }

    /** @param message one line naming the problem */
    record Failed(String message, int exit) implements Reply {
        @Override
        public void writeTo(ObjectNode line) {
            line.put("error", message);
            line.put("exit", exit);
        }
    }
}

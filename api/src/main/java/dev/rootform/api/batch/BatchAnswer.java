package dev.rootform.api.batch;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import java.util.Objects;
import java.util.Optional;

/**
 * The answer to one batch request, as the line to write.
 *
 * @param id the request's id as text (a string id as it is, a number in decimal)
 * @param json one line of JSON without a line break: the command's JSON answer with {@code "id"}
 *     and {@code "exit"} added, or an error object {@code {"id", "error", "exit"}}
 * @param exit the exit code the command would give for this request alone
 * @param status how the summary counts it
 * @since 0.2
 */
public record BatchAnswer(String id, String json, int exit, Status status) {
    public BatchAnswer {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(json, "json");
        Objects.requireNonNull(status, "status");
    }

    /** How a batch summary counts an answer. */
    public enum Status {
        /** Exit code 0: answered and verified (a general solution included). */
        SOLVED,
        /** Exit code 2: bad or out-of-scope input, contradictory or underdetermined conditions. */
        REFUSED,
        /** Any other exit code: a check failed (3), the time limit ran out or an internal error (1). */
        FAILED
    }

    static BatchAnswer of(String id, String json, int exit) {
        Status status = exit == 0 ? Status.SOLVED : exit == 2 ? Status.REFUSED : Status.FAILED;
        return new BatchAnswer(id, json, exit, status);
    }

    /**
     * The id of an answer line written before, as in {@link #id()}; empty for a line that is not a
     * complete JSON object with an id (such as the torn last line of a killed run).
     */
    public static Optional<String> idOf(String answerLine) {
        try {
            JsonNode node = Json.read(answerLine);
            JsonNode id = node.isObject() ? node.get("id") : null;
            return id != null && (id.isTextual() || id.isIntegralNumber()) ? Optional.of(id.asText()) : Optional.empty();
        } catch (JsonProcessingException e) {
            return Optional.empty();
        }
    }
}

package dev.rootform.api.batch;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.LongNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.api.ResultText;
import dev.rootform.symbolic.model.InputException;
import java.time.Duration;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * One line of a batch: a JSON object naming a command and its options, such as
 * <pre>{@code {"id": "a1", "command": "solve", "problem": "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1",
 *  "digits": 30, "valuesAt": ["10", "1e3"], "format": "json"}}</pre>
 * Fields: {@code id} (a string or a whole number; default the line number), {@code command}
 * (default {@code solve}), then the command's options by their long names in camelCase.
 *
 * <p>Answering never throws: a line that is not JSON, an unknown command or field, bad input, the
 * time limit and even an internal error each give an error object with the command's exit code.
 * Instances are immutable; {@link #answer} may be called from any thread, one line per call, which
 * is how a batch runner or a distributed engine uses it:
 * <pre>{@code
 * String out = BatchRequest.parse(line, lineNumber).answer(BatchRequest.DEFAULT_TIME_LIMIT).json();
 * }</pre>
 *
 * @since 0.2
 */
public final class BatchRequest {
    /** The time limit of a request that sets no {@code timeLimit}, unless the runner chooses another. */
    public static final Duration DEFAULT_TIME_LIMIT = Duration.ofSeconds(60);

    private final JsonNode id;
    private final Optional<ObjectNode> fields;
    private final String problem;

    private BatchRequest(JsonNode id, Optional<ObjectNode> fields, String problem) {
        this.id = id;
        this.fields = fields;
        this.problem = problem;
    }

    /**
     * Reads one line. Nothing is run yet.
     *
     * @param lineNumber the 1-based line number, the id of a request that has none
     */
    public static BatchRequest parse(String line, long lineNumber) {
        JsonNode byLine = LongNode.valueOf(lineNumber);
        JsonNode node;
        try {
            node = Json.read(line);
        } catch (JsonProcessingException e) {
            return new BatchRequest(byLine, Optional.empty(), "line " + lineNumber + " is not JSON: " + e.getOriginalMessage());
        }
        if (node == null || !node.isObject()) {
            return new BatchRequest(byLine, Optional.empty(), "line " + lineNumber + " is not a JSON object");
        }
        JsonNode id = node.get("id");
        if (id == null || id.isNull()) {
            return new BatchRequest(byLine, Optional.of((ObjectNode) node), "");
        }
        if (!id.isTextual() && !id.isIntegralNumber()) {
            return new BatchRequest(byLine, Optional.empty(), "line " + lineNumber + ": \"id\" must be a string or a whole number");
        }
        return new BatchRequest(id, Optional.of((ObjectNode) node), "");
    }

    /** The request's id as text, as in {@link BatchAnswer#id()}. */
    public String id() {
        return id.asText();
    }

    /** The names of the commands a request may name. */
    public static List<String> commands() {
        return Commands.names();
    }

    /**
     * Runs the request and gives its answer line; never throws.
     *
     * @param defaultTimeLimit the time limit when the request sets no {@code timeLimit}
     */
    public BatchAnswer answer(Duration defaultTimeLimit) {
        return reply(defaultTimeLimit).toAnswer(id);
    }

    private Reply reply(Duration defaultTimeLimit) {
        if (fields.isEmpty()) {
            return new Reply.Failed(problem, 2);
        }
        try {
            Fields f = new Fields(fields.get());
            f.accept("id");
            String name = f.text("command").orElse(Commands.DEFAULT);
            Command command = Commands.byName(name).orElseThrow(() -> new InputException(
                    "unknown command \"" + name + "\" (one of " + String.join(", ", Commands.names()) + ")", "", -1));
            Supplier<Reply> call = command.prepare(f, defaultTimeLimit);
            f.rejectUnknown(name);
            return call.get();
        } catch (InputException e) {
            return new Reply.Failed(ResultText.refusal(e.getMessage(), e.source(), e.position()), 2);
        } catch (RuntimeException e) {
            return new Reply.Failed("internal error: " + e, 1);
        }
    }
}

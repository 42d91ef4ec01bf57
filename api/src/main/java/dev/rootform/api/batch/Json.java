package dev.rootform.api.batch;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.UncheckedIOException;

/**
 * The one JSON mapper of the batch layer: decimals read as exact {@code BigDecimal}s, repeated keys
 * and text after the object refused, output on one line.
 */
final class Json {
    private static final JsonMapper MAPPER = JsonMapper.builder()
            .enable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .build();

    private Json() {
    }

    /** @throws JsonProcessingException if {@code text} is not one JSON value */
    static JsonNode read(String text) throws JsonProcessingException {
        return MAPPER.readTree(text);
    }

    /** {@code node} as JSON text on one line. */
    static String line(JsonNode node) {
        try {
            return MAPPER.writeValueAsString(node);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A new empty object. */
    static ObjectNode object() {
        return MAPPER.createObjectNode();
    }
}

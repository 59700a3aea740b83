package org.inkgate.format.json;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.datatype.jsr310.JavaTimeModule;
import java.io.IOException;
import org.inkgate.format.refusal.MalformedJson;

/**
 * The one JSON configuration of Inkgate's files. Reading is strict: duplicate keys, unknown
 * fields, trailing content and nulls for numbers are refused, because a signed file with two
 * readings is a hole. Writing is deterministic: record fields in declaration order, map keys
 * sorted, no nulls, ISO-8601 times.
 */
public final class Json {

    private static final ObjectMapper MAPPER = configured().addModule(new InstantModule()).build();

    /** Every setting but the fast instants: the reference {@code InstantModuleTest} compares them with. */
    static JsonMapper.Builder configured() {
        return JsonMapper.builder()
                .addModule(new JavaTimeModule())
                .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
                .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
                .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
                .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
                .enable(DeserializationFeature.FAIL_ON_READING_DUP_TREE_KEY)
                // "60" or 60.5 for a number, 0 or "true" for a boolean: refused, not converted
                .disable(com.fasterxml.jackson.databind.MapperFeature.ALLOW_COERCION_OF_SCALARS)
                .disable(DeserializationFeature.ACCEPT_FLOAT_AS_INT)
                .enable(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS)
                .enable(SerializationFeature.INDENT_OUTPUT)
                .disable(SerializationFeature.WRITE_DATES_AS_TIMESTAMPS)
                .serializationInclusion(JsonInclude.Include.NON_NULL);
    }

    private static final ObjectMapper COMPACT = MAPPER.copy().disable(SerializationFeature.INDENT_OUTPUT);

    private Json() {
    }

    public static ObjectMapper mapper() {
        return MAPPER;
    }

    /** Deterministic, indented UTF-8 bytes. */
    public static byte[] write(Object value) {
        try {
            return MAPPER.writeValueAsBytes(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("could not write " + value.getClass().getSimpleName() + " as JSON", e);
        }
    }

    /** Deterministic single-line UTF-8 bytes (for JSON lines). */
    public static byte[] writeLine(Object value) {
        try {
            return COMPACT.writeValueAsBytes(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("could not write " + value.getClass().getSimpleName() + " as JSON", e);
        }
    }

    public static JsonNode tree(String file, String entry, byte[] bytes) throws MalformedJson {
        try {
            JsonNode node = MAPPER.readTree(bytes);
            if (node == null || node.isMissingNode()) {
                throw new MalformedJson(file, entry, 1, 1, "the entry is empty", null);
            }
            return node;
        } catch (JsonProcessingException e) {
            throw located(file, entry, e);
        } catch (IOException e) {
            throw new MalformedJson(file, entry, 1, 1, e.getMessage(), e);
        }
    }

    public static <T> T bind(String file, String entry, byte[] bytes, Class<T> type) throws MalformedJson {
        return bind(file, entry, bytes, 0, bytes.length, type);
    }

    /** Binds {@code length} bytes from {@code offset}: one line of a larger buffer, without copying it out. */
    public static <T> T bind(String file, String entry, byte[] bytes, int offset, int length, Class<T> type)
            throws MalformedJson {
        try {
            return MAPPER.readValue(bytes, offset, length, type);
        } catch (JsonProcessingException e) {
            throw located(file, entry, e);
        } catch (IOException | IllegalArgumentException e) {
            throw new MalformedJson(file, entry, 1, 1, String.valueOf(e.getMessage()), e);
        }
    }

    /**
     * Syntax errors carry the parser's line and column. Binding errors also name the JSON path
     * (e.g. {@code forms[0].slots[1].policy.spelling}), because Jackson binds records after
     * reading the whole object and so reports the object's end as the location.
     */
    private static MalformedJson located(String file, String entry, JsonProcessingException e) {
        JsonLocation at = e.getLocation();
        long line = at == null ? 1 : Math.max(1, at.getLineNr());
        long column = at == null ? 1 : Math.max(1, at.getColumnNr());
        // Jackson's hints are for programmers ("set ... to 'false' to allow"); the reader of the message cannot act on them
        String problem = e.getOriginalMessage().replaceAll("\\s*\\(set [^)]*\\)", "")
                .replaceAll("\\s*\\(enable [^)]*\\)", "");
        if (e instanceof JsonMappingException mapping && !mapping.getPath().isEmpty()) {
            problem = "at " + path(mapping.getPath()) + ": " + problem;
        }
        return new MalformedJson(file, entry, line, column, problem, e);
    }

    private static String path(java.util.List<JsonMappingException.Reference> references) {
        StringBuilder out = new StringBuilder();
        for (JsonMappingException.Reference ref : references) {
            if (ref.getIndex() >= 0) {
                out.append('[').append(ref.getIndex()).append(']');
            } else if (ref.getFieldName() != null) {
                if (!out.isEmpty()) {
                    out.append('.');
                }
                out.append(ref.getFieldName());
            }
        }
        return out.toString();
    }
}

package org.inkgate.admin.core.source;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.io.IOException;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A YAML document read as a tree, remembering the line and column of every value, so that a
 * problem found while checking the tree can still point at the place in the file.
 */
public final class LocatedYaml {

    private static final YAMLFactory FACTORY = YAMLFactory.builder()
            .enable(com.fasterxml.jackson.core.StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .build();
    private static final ObjectMapper MAPPER = new YAMLMapper(FACTORY);

    private final String file;
    private final JsonNode root;
    private final Map<String, JsonLocation> locations;

    private LocatedYaml(String file, JsonNode root, Map<String, JsonLocation> locations) {
        this.file = file;
        this.root = root;
        this.locations = locations;
    }

    /** Parses the text; a syntax error becomes a located {@link Problem} in the returned list. */
    public static Optional<LocatedYaml> parse(String file, byte[] bytes, List<Problem> problems) {
        Map<String, JsonLocation> locations = new HashMap<>();
        try (JsonParser parser = FACTORY.createParser(bytes)) {
            JsonToken token;
            while ((token = parser.nextToken()) != null) {
                if (token != JsonToken.FIELD_NAME && token != JsonToken.END_OBJECT && token != JsonToken.END_ARRAY) {
                    locations.putIfAbsent(parser.getParsingContext().pathAsPointer().toString(),
                            parser.currentTokenLocation());
                }
            }
            JsonNode root = MAPPER.readTree(bytes);
            if (root == null || root.isMissingNode() || root.isNull()) {
                problems.add(new Problem(file, 0, 0, "", "the file is empty; see docs/test-owner-guide.md for its fields"));
                return Optional.empty();
            }
            return Optional.of(new LocatedYaml(file, root, locations));
        } catch (JsonProcessingException e) {
            JsonLocation at = e.getLocation();
            problems.add(new Problem(file, at == null ? 0 : at.getLineNr(), at == null ? 0 : at.getColumnNr(), "",
                    "not valid YAML: " + e.getOriginalMessage() + ". Check indentation and quoting near this line"));
            return Optional.empty();
        } catch (IOException e) {
            problems.add(new Problem(file, 0, 0, "", "cannot be read: " + e.getMessage()));
            return Optional.empty();
        }
    }

    public String file() {
        return file;
    }

    public JsonNode root() {
        return root;
    }

    /** A problem at the value with the given JSON pointer (or its nearest located parent). */
    public Problem problemAt(String pointer, String field, String message) {
        String p = pointer;
        while (true) {
            JsonLocation at = locations.get(p);
            if (at != null) {
                return new Problem(file, at.getLineNr(), at.getColumnNr(), field, message);
            }
            if (p.isEmpty()) {
                return new Problem(file, 0, 0, field, message);
            }
            int slash = p.lastIndexOf('/');
            p = slash <= 0 ? "" : p.substring(0, slash);
        }
    }
}

package org.inkgate.admin.core.source;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Pattern;

/**
 * Reads typed values out of a located YAML tree, adding a located problem (and returning a
 * fallback) for every missing or ill-typed value instead of stopping at the first.
 */
final class YamlChecker {

    /** Ids travel into file names, bundle entries and CSV columns: keep them plain. */
    static final Pattern ID = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]{0,63}");

    /** A place in the tree: its JSON pointer (for the line) and its readable field path. */
    record At(String pointer, String field) {
        At child(String name) {
            return new At(pointer + "/" + name, field.isEmpty() ? name : field + "." + name);
        }

        At index(int i) {
            return new At(pointer + "/" + i, field + "[" + i + "]");
        }
    }

    private final LocatedYaml yaml;
    private final List<Problem> problems;

    YamlChecker(LocatedYaml yaml, List<Problem> problems) {
        this.yaml = yaml;
        this.problems = problems;
    }

    static At root() {
        return new At("", "");
    }

    void problem(At at, String message) {
        problems.add(yaml.problemAt(at.pointer(), at.field(), message));
    }

    /** Reports keys the file does not define; a typo in a key would otherwise be silently ignored. */
    void onlyKeys(JsonNode node, At at, Set<String> allowed) {
        if (node == null || !node.isObject()) {
            return;
        }
        for (Iterator<String> it = node.fieldNames(); it.hasNext();) {
            String key = it.next();
            if (!allowed.contains(key)) {
                problem(at.child(key), "unknown field \"" + key + "\"; the fields allowed here are "
                        + String.join(", ", new TreeSet<>(allowed)) + " (check the spelling)");
            }
        }
    }

    boolean isObject(JsonNode node, At at, boolean required) {
        if (node == null || node.isMissingNode() || node.isNull()) {
            if (required) {
                problem(at, "is missing; add it");
            }
            return false;
        }
        if (!node.isObject()) {
            problem(at, "must be a mapping of fields (key: value lines), not " + describe(node));
            return false;
        }
        return true;
    }

    List<JsonNode> list(JsonNode parent, At at, boolean required) {
        JsonNode node = child(parent, at);
        if (node == null || node.isNull()) {
            if (required) {
                problem(at, "is missing; add a list (lines starting with \"- \")");
            }
            return List.of();
        }
        if (!node.isArray()) {
            problem(at, "must be a list (lines starting with \"- \"), not " + describe(node));
            return List.of();
        }
        List<JsonNode> items = new ArrayList<>();
        node.forEach(items::add);
        return items;
    }

    String text(JsonNode parent, At at, boolean required) {
        JsonNode node = child(parent, at);
        if (node == null || node.isNull()) {
            if (required) {
                problem(at, "is missing; add it");
            }
            return null;
        }
        if (node.isBoolean()) {
            problem(at, "must be a text, not " + describe(node) + " (YAML reads yes, no, on, off, true and false"
                    + " without quotes as true/false: put the text in quotes)");
            return null;
        }
        if (!node.isTextual() && !node.isNumber()) {
            problem(at, "must be a text, not " + describe(node));
            return null;
        }
        String text = node.asText().strip();
        if (text.isEmpty() && required) {
            problem(at, "is empty; give a value");
            return null;
        }
        return text;
    }

    String id(JsonNode parent, At at) {
        String id = text(parent, at, true);
        if (id != null && !ID.matcher(id).matches()) {
            problem(at, "\"" + id + "\" is not a usable id: use 1-64 letters, digits, '.', '_' or '-', starting with a letter or digit");
            return null;
        }
        return id;
    }

    Integer integer(JsonNode parent, At at, boolean required, int min, int max) {
        JsonNode node = child(parent, at);
        if (node == null || node.isNull()) {
            if (required) {
                problem(at, "is missing; add a whole number from " + min + " to " + max);
            }
            return null;
        }
        if (!node.isIntegralNumber() || !node.canConvertToInt()) {
            problem(at, "must be a whole number from " + min + " to " + max + ", not " + describe(node));
            return null;
        }
        int value = node.intValue();
        if (value < min || value > max) {
            problem(at, value + " is outside the allowed range " + min + " to " + max);
            return null;
        }
        return value;
    }

    Boolean bool(JsonNode parent, At at, boolean fallback) {
        JsonNode node = child(parent, at);
        if (node == null || node.isNull()) {
            return fallback;
        }
        if (!node.isBoolean()) {
            problem(at, "must be true or false, not " + describe(node));
            return fallback;
        }
        return node.booleanValue();
    }

    /** The value at {@code at} inside {@code parent}, which may be a mapping or a list. */
    private static JsonNode child(JsonNode parent, At at) {
        if (parent == null) {
            return null;
        }
        String key = last(at);
        if (parent.isArray()) {
            try {
                return parent.get(Integer.parseInt(key));
            } catch (NumberFormatException e) {
                return null;
            }
        }
        return parent.get(key);
    }

    private static String last(At at) {
        String p = at.pointer();
        return p.substring(p.lastIndexOf('/') + 1);
    }

    static String describe(JsonNode node) {
        if (node.isTextual()) {
            return "the text \"" + node.asText() + "\"";
        }
        if (node.isArray()) {
            return "a list";
        }
        if (node.isObject()) {
            return "a mapping";
        }
        return node.getNodeType().name().toLowerCase(java.util.Locale.ROOT) + " " + node;
    }
}

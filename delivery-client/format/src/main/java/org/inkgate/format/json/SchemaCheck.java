package org.inkgate.format.json;

import com.fasterxml.jackson.databind.JsonNode;
import org.inkgate.format.refusal.UnsupportedSchema;

/**
 * The two questions every Inkgate JSON document answers first: what kind of document it is
 * ({@code format}) and which schema it follows ({@code schemaVersion}). The advice differs by
 * reader, so callers say what to do about another kind or a newer version.
 */
public final class SchemaCheck {

    private SchemaCheck() {
    }

    /**
     * @param kind        the kind of document with its article ("an exam bundle", "a response")
     * @param otherAdvice what to do when the file is of another kind
     */
    public static void requireFormat(String file, JsonNode tree, String format, String kind, String otherAdvice)
            throws UnsupportedSchema {
        String actual = tree.path("format").asText("");
        if (!format.equals(actual)) {
            throw new UnsupportedSchema(file, "this is not " + kind + " (format \"" + actual + "\" where \"" + format
                    + "\" was expected). " + otherAdvice);
        }
    }

    /** @param newerAdvice what to do when the version is newer than this build reads */
    public static void requireVersion(String file, JsonNode tree, int newest, String what, String newerAdvice)
            throws UnsupportedSchema {
        JsonNode version = tree.path("schemaVersion");
        if (!version.isIntegralNumber() || !version.canConvertToInt() || version.asInt() < 1) {
            throw new UnsupportedSchema(file, "the " + what + " has no valid schemaVersion; the file is damaged.");
        }
        if (version.asInt() > newest) {
            throw new UnsupportedSchema(file, "the " + what + " uses schema version " + version.asInt()
                    + ", newer than the " + newest + " this version reads. " + newerAdvice);
        }
    }
}

package org.inkgate.admin.core.store;

import java.nio.charset.StandardCharsets;
import java.util.Map;
import org.inkgate.format.json.Json;

/**
 * An event's data written out once as the two texts collect needs: the compact JSON the store keeps
 * ({@code Json.writeLine} of the sorted map) and the map's {@code toString} the content digest
 * hashes. Both used to be made separately, the JSON by Jackson for every event; here the common
 * case (keys and values that are text, whole numbers or booleans, text without characters JSON
 * escapes) is written directly in one pass, and anything else goes through Jackson and
 * {@code toString} exactly as before, so both texts stay byte for byte what they were
 * (StoredEventsUnchangedTest, EventTextTest).
 */
public final class EventText {

    private EventText() {
    }

    /**
     * The store's JSON of an event's data, as {@code Json.writeLine} writes it; appends the data's
     * {@code toString} to {@code digestText} on the way.
     *
     * @param data       an event's data (sorted by key as {@code ProcessEvent} keeps it, else written the slow way)
     * @param json       a buffer to reuse; its content is replaced
     * @param digestText where the content digest's text of the data is appended
     */
    public static String json(Map<String, Object> data, StringBuilder json, StringBuilder digestText) {
        json.setLength(0);
        if (!write(data, json, "\"", digestText)) {
            digestText.append(data);
            return new String(Json.writeLine(data), StandardCharsets.UTF_8);
        }
        return json.toString();
    }

    /**
     * Appends {@code data}'s compact JSON, as {@link #json} writes it, to {@code log} as a JSON string (its
     * quotes escaped, nothing else needs it), and its {@code toString} to {@code digestText}; one pass, no
     * intermediate text. Returns false, with both left as they were, when the data is not of the common kind
     * {@link #json} writes directly; the caller then takes the slow way.
     */
    static boolean appendJsonString(Map<String, Object> data, StringBuilder log, StringBuilder digestText) {
        int logMark = log.length();
        log.append('"');
        if (!write(data, log, "\\\"", digestText)) {
            log.setLength(logMark);
            return false;
        }
        log.append('"');
        return true;
    }

    /**
     * Writes the common kind of data (keys and values that are text, whole numbers or booleans, text without
     * characters JSON escapes, keys in Jackson's sorted order) as compact JSON to {@code out}, each of its
     * quotes written as {@code quote}, and its {@code toString} to {@code digestText}. Returns false, with
     * both left as they were, for any other data.
     */
    private static boolean write(Map<String, Object> data, StringBuilder out, String quote, StringBuilder digestText) {
        int outMark = out.length();
        int digestMark = digestText.length();
        out.append('{');
        digestText.append('{');
        String previous = null;
        for (Map.Entry<String, Object> e : data.entrySet()) {
            String key = e.getKey();
            Object value = e.getValue();
            // Jackson sorts the keys (ORDER_MAP_ENTRIES_BY_KEYS); a map not in that order takes the slow path
            if (!plain(key) || previous != null && previous.compareTo(key) >= 0
                    || !(value instanceof String || value instanceof Integer || value instanceof Long
                            || value instanceof Boolean)
                    || value instanceof String s && !plain(s)) {
                out.setLength(outMark);
                digestText.setLength(digestMark);
                return false;
            }
            if (previous != null) {
                out.append(',');
                digestText.append(", ");
            }
            previous = key;
            out.append(quote).append(key).append(quote).append(':');
            digestText.append(key).append('=');
            if (value instanceof String s) {
                out.append(quote).append(s).append(quote);
                digestText.append(s);
            } else {
                out.append(value);
                digestText.append(value);
            }
        }
        out.append('}');
        digestText.append('}');
        return true;
    }

    /** Jackson writes such text as it is: no control character, quote, backslash or surrogate. */
    private static boolean plain(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c < 0x20 || c == '"' || c == '\\' || Character.isSurrogate(c)) {
                return false;
            }
        }
        return true;
    }
}

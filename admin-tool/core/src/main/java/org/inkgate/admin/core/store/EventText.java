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
        int mark = digestText.length();
        json.setLength(0);
        json.append('{');
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
                digestText.setLength(mark);
                digestText.append(data);
                return new String(Json.writeLine(data), StandardCharsets.UTF_8);
            }
            if (previous != null) {
                json.append(',');
                digestText.append(", ");
            }
            previous = key;
            json.append('"').append(key).append("\":");
            digestText.append(key).append('=');
            if (value instanceof String s) {
                json.append('"').append(s).append('"');
                digestText.append(s);
            } else {
                json.append(value);
                digestText.append(value);
            }
        }
        json.append('}');
        digestText.append('}');
        return json.toString();
    }

    /** Seconds from the epoch to 10000-01-01T00:00:00Z: later times print with a sign, left to the JDK. */
    private static final long YEAR_10000 = 253_402_300_800L;

    /**
     * An event's time as the store keeps it: exactly {@link Instant#toString()} (ISO 8601 in UTC with
     * 0, 3, 6 or 9 decimals), written directly for the years 1970 to 9999 and by the JDK otherwise.
     * Why: the JDK's formatter was about a twentieth of a collect's reading time (docs/benchmarks.md,
     * issue 16); {@code EventTextTest} compares the two over every kind of fraction.
     */
    public static String time(java.time.Instant t) {
        long seconds = t.getEpochSecond();
        if (seconds < 0 || seconds >= YEAR_10000) {
            return t.toString();
        }
        long days = seconds / 86_400;
        int secondOfDay = (int) (seconds - days * 86_400);
        java.time.LocalDate date = java.time.LocalDate.ofEpochDay(days);
        int nano = t.getNano();
        int decimals = nano == 0 ? 0 : nano % 1_000_000 == 0 ? 3 : nano % 1_000 == 0 ? 6 : 9;
        byte[] out = new byte[20 + (decimals == 0 ? 0 : decimals + 1)];
        digits(out, 0, date.getYear(), 4);
        out[4] = '-';
        digits(out, 5, date.getMonthValue(), 2);
        out[7] = '-';
        digits(out, 8, date.getDayOfMonth(), 2);
        out[10] = 'T';
        digits(out, 11, secondOfDay / 3600, 2);
        out[13] = ':';
        digits(out, 14, secondOfDay / 60 % 60, 2);
        out[16] = ':';
        digits(out, 17, secondOfDay % 60, 2);
        if (decimals > 0) {
            out[19] = '.';
            int fraction = decimals == 3 ? nano / 1_000_000 : decimals == 6 ? nano / 1_000 : nano;
            digits(out, 20, fraction, decimals);
        }
        out[out.length - 1] = 'Z';
        return new String(out, StandardCharsets.US_ASCII);
    }

    /** {@code value} as {@code count} decimal digits, leading zeros included. */
    private static void digits(byte[] out, int at, int value, int count) {
        for (int i = at + count - 1; i >= at; i--) {
            out[i] = (byte) ('0' + value % 10);
            value /= 10;
        }
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

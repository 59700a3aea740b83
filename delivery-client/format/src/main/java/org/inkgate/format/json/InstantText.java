package org.inkgate.format.json;

import java.nio.charset.StandardCharsets;
import java.time.DateTimeException;
import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.ZoneOffset;

/**
 * Instants as Inkgate's files and stores write them, {@code 2026-03-14T09:00:18.180Z} (ISO 8601 in UTC,
 * as {@link java.time.format.DateTimeFormatter#ISO_INSTANT} prints it), written and read by counting
 * digits in the common case and by the JDK otherwise, with exactly the JDK's results. Why: the JDK's
 * formatter and parser are general; a collect writes and reads millions of event times and paid for
 * both, in running time and in compiling them (docs/benchmarks.md, issue 16). {@link Json}'s mapper
 * writes and reads every {@link Instant} through this class.
 */
public final class InstantText {

    private InstantText() {
    }

    /**
     * The time if {@code s} is {@code YYYY-MM-DDTHH:MM:SS[.F{1,9}]Z} with valid fields, else null (the caller
     * then asks the JDK's parser, which decides every other form; {@code InstantTextTest}).
     */
    public static Instant parse(String s) {
        int n = s.length();
        if (n < 20 || n > 30 || s.charAt(n - 1) != 'Z' || s.charAt(4) != '-' || s.charAt(7) != '-' || s.charAt(10) != 'T'
                || s.charAt(13) != ':' || s.charAt(16) != ':') {
            return null;
        }
        int year = digits(s, 0, 4);
        int month = digits(s, 5, 2);
        int day = digits(s, 8, 2);
        int hour = digits(s, 11, 2);
        int minute = digits(s, 14, 2);
        int second = digits(s, 17, 2);
        if ((year | month | day | hour | minute | second) < 0) {
            return null;
        }
        int nano = 0;
        if (n > 20) {
            int fraction = n - 21;
            if (s.charAt(19) != '.' || fraction < 1 || fraction > 9) {
                return null;
            }
            nano = digits(s, 20, fraction);
            if (nano < 0) {
                return null;
            }
            for (int i = fraction; i < 9; i++) {
                nano *= 10;
            }
        } else if (s.charAt(19) != 'Z') {
            return null;
        }
        try {
            return LocalDateTime.of(year, month, day, hour, minute, second, nano).toInstant(ZoneOffset.UTC);
        } catch (DateTimeException e) {
            return null; // e.g. a leap second or 30 February: the standard parser decides
        }
    }

    /** Seconds from the epoch to 10000-01-01T00:00:00Z: later times print with a sign, left to the JDK. */
    private static final long YEAR_10000 = 253_402_300_800L;

    /**
     * Exactly {@link Instant#toString()} (ISO 8601 in UTC with 0, 3, 6 or 9 decimals), written directly
     * for the years 1970 to 9999 and by the JDK otherwise. Why: the JDK's formatter was about a twentieth
     * of a collect's reading time (docs/benchmarks.md, issue 16); {@code InstantTextTest} compares the two
     * over every kind of fraction.
     */
    public static String text(Instant t) {
        long seconds = t.getEpochSecond();
        if (seconds < 0 || seconds >= YEAR_10000) {
            return t.toString();
        }
        long days = seconds / 86_400;
        int secondOfDay = (int) (seconds - days * 86_400);
        LocalDate date = LocalDate.ofEpochDay(days);
        int nano = t.getNano();
        int decimals = decimals(nano);
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

    /**
     * Whether {@link #text} writes {@code t} in exactly {@code length} characters by its direct way (the
     * years 1970 to 9999). For a time {@link #parse} read from a text of that length this means {@link #text}
     * gives that very text back: the fields are the same, and the number of decimals is the one {@link #text}
     * chooses for its fraction (so {@code .000} or {@code .5} are not its spelling). Readers that keep a time's
     * text use this to keep the bytes they read instead of writing the time out again.
     */
    public static boolean writesIn(Instant t, int length) {
        long seconds = t.getEpochSecond();
        if (seconds < 0 || seconds >= YEAR_10000) {
            return false;
        }
        int nano = t.getNano();
        int decimals = decimals(nano);
        return length == 20 + (decimals == 0 ? 0 : decimals + 1);
    }

    /** How many decimals {@link Instant#toString()} gives a fraction of a second: 0, 3, 6 or 9. */
    private static int decimals(int nano) {
        return nano == 0 ? 0 : nano % 1_000_000 == 0 ? 3 : nano % 1_000 == 0 ? 6 : 9;
    }

    /** {@code value} as {@code count} decimal digits, leading zeros included. */
    private static void digits(byte[] out, int at, int value, int count) {
        for (int i = at + count - 1; i >= at; i--) {
            out[i] = (byte) ('0' + value % 10);
            value /= 10;
        }
    }

    /** The value of {@code count} ASCII digits from {@code at}, or -1 if any is not one. */
    private static int digits(String s, int at, int count) {
        int v = 0;
        for (int i = at; i < at + count; i++) {
            char c = s.charAt(i);
            if (c < '0' || c > '9') {
                return -1;
            }
            v = v * 10 + (c - '0');
        }
        return v;
    }
}

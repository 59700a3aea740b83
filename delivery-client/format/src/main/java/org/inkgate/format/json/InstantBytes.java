package org.inkgate.format.json;

import java.time.DateTimeException;
import java.time.Instant;
import java.time.LocalDate;

/**
 * Reads times in the writer's form ({@link InstantText#parse}'s forms) from ASCII bytes, with exactly
 * {@link InstantText#parse}'s results, remembering the last day it read. Why: an event log gives thousands of
 * times a sitting, nearly all on one day, and making a text and a date-time of each was a part of a collect's
 * reading time (docs/benchmarks.md, issue 16). One instance serves one reader at a time.
 */
public final class InstantBytes {

    private int lastYear = -1;
    private int lastMonth;
    private int lastDay;
    private long lastEpochDay;

    /** The time the bytes {@code from} to {@code to} spell, or null where {@link InstantText#parse} gives null. */
    public Instant parse(byte[] b, int from, int to) {
        int n = to - from;
        if (n < 20 || n > 30 || b[to - 1] != 'Z' || b[from + 4] != '-' || b[from + 7] != '-' || b[from + 10] != 'T'
                || b[from + 13] != ':' || b[from + 16] != ':') {
            return null;
        }
        int year = digits(b, from, 4);
        int month = digits(b, from + 5, 2);
        int day = digits(b, from + 8, 2);
        int hour = digits(b, from + 11, 2);
        int minute = digits(b, from + 14, 2);
        int second = digits(b, from + 17, 2);
        if ((year | month | day | hour | minute | second) < 0 || hour > 23 || minute > 59 || second > 59) {
            return null;
        }
        int nano = 0;
        if (n > 20) {
            int fraction = n - 21;
            if (b[from + 19] != '.' || fraction < 1 || fraction > 9) {
                return null;
            }
            nano = digits(b, from + 20, fraction);
            if (nano < 0) {
                return null;
            }
            for (int i = fraction; i < 9; i++) {
                nano *= 10;
            }
        } else if (b[from + 19] != 'Z') {
            return null;
        }
        if (year != lastYear || month != lastMonth || day != lastDay) {
            try {
                lastEpochDay = LocalDate.of(year, month, day).toEpochDay();
            } catch (DateTimeException e) {
                return null; // 30 February and the like: the standard parser decides
            }
            lastYear = year;
            lastMonth = month;
            lastDay = day;
        }
        return Instant.ofEpochSecond(lastEpochDay * 86_400 + hour * 3_600 + minute * 60 + second, nano);
    }

    /** The value of {@code count} ASCII digits from {@code at}, or -1 if any is not one. */
    private static int digits(byte[] b, int at, int count) {
        int v = 0;
        for (int i = at; i < at + count; i++) {
            int c = b[i] - '0';
            if (c < 0 || c > 9) {
                return -1;
            }
            v = v * 10 + c;
        }
        return v;
    }
}

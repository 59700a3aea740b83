package org.inkgate.format.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.response.EventChain;
import org.inkgate.format.response.ProcessEvent;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * InstantText writes and reads times exactly as the JDK does: {@link Instant#toString} (ISO_INSTANT) for
 * writing, {@link Instant#parse} for the writer's own form, and null (the JDK's reader decides) for
 * every other form.
 */
class InstantTextTest {

    @ParameterizedTest
    @ValueSource(strings = {"2026-03-14T09:00:18.180Z", "2026-03-14T09:00:18Z", "1970-01-01T00:00:00Z",
        "2024-02-29T23:59:59.999999999Z", "2026-12-31T23:59:59.1Z", "0001-01-01T00:00:00.000001Z"})
    void theWritersOwnForm_readsAsTheJdkReadsIt_andRoundTripsThroughTheLog(String text) throws FormatRefusal {
        assertEquals(Instant.parse(text), InstantText.parse(text));
        ProcessEvent e = new ProcessEvent(1, Instant.parse(text), 0, "text.insert", "t1", Map.of("len", 1));
        assertEquals(List.of(e), EventChain.decode("f", "events.jsonl", EventChain.encode(List.of(e))));
    }

    @ParameterizedTest
    @ValueSource(strings = {"2026-03-14T09:00:18+01:00", "2026-03-14 09:00:18Z", "2026-03-14T09:00Z",
        "2026-03-14T09:00:18.1234567890Z", "2026-03-14T09:00:18.Z", "+2026-03-14T09:00:18Z", "2026-3-14T09:00:18.18Z",
        "2026-03-14T23:59:60Z", "2026-02-30T00:00:00Z", "2026-03-14T09:00:1xZ"})
    void anyOtherForm_isLeftToTheStandardReader(String text) {
        assertNull(InstantText.parse(text));
    }

    @ParameterizedTest
    @ValueSource(strings = {"2026-02-30T00:00:00Z", "2026-03-14T25:00:00Z", "not a time"})
    void anImpossibleTime_isStillRefused_withTheLine(String text) {
        String line = "{\"seq\":1,\"at\":\"" + text + "\",\"mono\":0,\"type\":\"text.insert\",\"task\":\"t1\",\"data\":{},"
                + "\"prev\":\"" + EventChain.GENESIS + "\"}\n";
        FormatRefusal refusal = assertThrows(FormatRefusal.class,
                () -> EventChain.decode("f", "events.jsonl", line.getBytes(StandardCharsets.UTF_8)));
        assertEquals(true, refusal.getMessage().contains("line 1"), refusal.getMessage());
    }

    /** The reference is the JDK's {@code Instant.toString} (ISO_INSTANT), over every kind of fraction and year. */
    @Test
    void times_areWrittenAsTheJdkWritesThem() {
        for (Instant t : times()) {
            assertEquals(t.toString(), InstantText.text(t));
        }
    }

    /**
     * {@code writesIn} says that {@code text} gives back the very text a time was read from exactly when it
     * does, by the JDK's {@code Instant.toString} (the reference): over texts of every fraction length from 0
     * to 9 digits, including zero fractions such as {@code .000}, in the years it writes directly (1970 to 9999);
     * before 1970 it answers no, and the reader writes the time out again as before.
     */
    @Test
    void writesIn_saysWhetherTheTextReadIsTheTextWritten() {
        SplittableRandom random = new SplittableRandom(31);
        int same = 0;
        int other = 0;
        for (int i = 0; i < 100_000; i++) {
            StringBuilder s = new StringBuilder(String.format("%04d-%02d-%02dT%02d:%02d:%02d", random.nextInt(1970, 10_000),
                    1 + random.nextInt(12), 1 + random.nextInt(28), random.nextInt(24), random.nextInt(60), random.nextInt(60)));
            int fraction = random.nextInt(10);
            if (fraction > 0) {
                s.append('.');
                for (int d = 0; d < fraction; d++) {
                    s.append(random.nextInt(4) == 0 ? '0' : (char) ('0' + random.nextInt(10)));
                }
            }
            String text = s.append('Z').toString();
            Instant t = InstantText.parse(text);
            boolean written = t.toString().equals(text);
            assertEquals(written, InstantText.writesIn(t, text.length()), text);
            if (written) {
                same++;
            } else {
                other++;
            }
        }
        assertEquals(true, same > 10_000 && other > 10_000, same + " written as read, " + other + " not");
        assertEquals(false, InstantText.writesIn(Instant.parse("1969-12-31T23:59:59Z"), 20));
    }

    /** Edges and 200,000 random instants with 0, 3, 6 and 9 decimals, from before 1970 to after 9999. */
    static List<Instant> times() {
        SplittableRandom random = new SplittableRandom(29);
        List<Instant> times = new ArrayList<>(List.of(Instant.EPOCH, Instant.parse("1969-12-31T23:59:59.999999999Z"),
                Instant.parse("2000-02-29T12:00:00Z"), Instant.parse("2026-06-15T09:00:00.100Z"),
                Instant.parse("2026-06-15T09:00:00.000100Z"), Instant.parse("2026-06-15T09:00:00.000000100Z"),
                Instant.parse("9999-12-31T23:59:59.999999999Z"), Instant.parse("+10000-01-01T00:00:00Z"),
                Instant.parse("-0001-01-01T00:00:00Z"), Instant.MIN, Instant.MAX));
        for (int i = 0; i < 200_000; i++) {
            long seconds = random.nextLong(-100_000_000_000L, 300_000_000_000L);
            int nano = switch (random.nextInt(4)) {
                case 0 -> 0;
                case 1 -> random.nextInt(1000) * 1_000_000;
                case 2 -> random.nextInt(1_000_000) * 1_000;
                default -> random.nextInt(1_000_000_000);
            };
            times.add(Instant.ofEpochSecond(seconds, nano));
        }
        return times;
    }
}
